/**
 * Phasecell cell functions (namespace PHASE). Each one coerces its arguments, broadcasts
 * ranges, calls the core in SI units and converts the answer back to the caller's units. The
 * JSDoc of each function is what Excel shows; functions.json is generated from it at build time.
 */
import { boundarySlope, crossingsAlongPath, marginToBoundary, parseBoundary } from "../core/boundaries";
import { constantOf, CONSTANT_CATALOG } from "../core/constants";
import {
  meltingPressure,
  meltingTemperature,
  phaseAt,
  saturationPressure,
  saturationTemperature,
} from "../core/phase";
import { endState, isobaricPath, latentHeat, parseTransition, pathEnergyOnIsobar, specificEnthalpy } from "../core/path";
import type { SubstanceDefinition } from "../core/substances/types";
import { PROVENANCE_HEADER, provenanceFor } from "../core/sources/provenance";
import { findSubstance, SUBSTANCES } from "../core/substances/registry";
import { fromSI, toSI } from "../core/units/units";
import { readFlag, readNumber, readOptionalText, readText, singleCell, substanceReader } from "./coerce";
import { evaluate, table } from "./evaluate";

/**
 * Phase of a pure substance at a temperature and pressure: solid, liquid, vapor, gas (above Tc,
 * below Pc) or supercritical fluid. With detail TRUE: the ice form for water (ice Ih … ice VII),
 * compressed liquid or superheated vapor.
 * @customfunction STATE
 * @param substance Name, formula, CAS number or refrigerant number, e.g. "water", "H2O", "R-718".
 * @param temperature Temperature (K unless units say otherwise). A range spills.
 * @param pressure Absolute pressure (Pa unless units say otherwise; gauge with barg, psig, kPag).
 * @param [units] Unit symbols in any order, e.g. "C bar" or "F psig". Default K and Pa.
 * @param [detail] TRUE for the finer label. Default FALSE.
 * @returns The phase name.
 */
export function state(substance: any[][], temperature: any[][], pressure: any[][], units?: any, detail?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, temperature, pressure], ["substance", "temperature", "pressure"], units, (cells, system) => {
    const fine = readFlag(singleCell(detail ?? null, "detail"), "detail");
    const found = readSubstance(cells[0]);
    const temperatureK = toSI(system, "temperature", readNumber(cells[1], "temperature"));
    const pressurePa = toSI(system, "pressure", readNumber(cells[2], "pressure"));
    const result = phaseAt(found, temperatureK, pressurePa);
    return fine ? result.detail : result.phase;
  });
}

/**
 * Saturation pressure: where vapor coexists with the liquid (triple to critical temperature) or,
 * below the triple point, with the solid (sublimation).
 * @customfunction SATPRESSURE
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param temperature Temperature (K unless units say otherwise). A range spills.
 * @param [units] Unit symbols, e.g. "C kPa". Result in the pressure unit given (default Pa).
 * @returns Saturation or sublimation pressure.
 */
export function satPressure(substance: any[][], temperature: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, temperature], ["substance", "temperature"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const temperatureK = toSI(system, "temperature", readNumber(cells[1], "temperature"));
    return fromSI(system, "pressure", saturationPressure(found, temperatureK));
  });
}

/**
 * Saturation temperature: boiling temperature between the triple-point and critical pressures,
 * sublimation temperature below the triple-point pressure.
 * @customfunction SATTEMP
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param pressure Absolute pressure (Pa unless units say otherwise). A range spills.
 * @param [units] Unit symbols, e.g. "C bar". Result in the temperature unit given (default K).
 * @returns Boiling or sublimation temperature.
 */
export function satTemp(substance: any[][], pressure: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, pressure], ["substance", "pressure"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const pressurePa = toSI(system, "pressure", readNumber(cells[1], "pressure"));
    return fromSI(system, "temperature", saturationTemperature(found, pressurePa));
  });
}

/**
 * Melting temperature at a pressure, through the solid stable there (water: ice Ih, III, V, VI
 * or VII).
 * @customfunction MELTTEMP
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param pressure Absolute pressure, at or above the triple-point pressure. A range spills.
 * @param [units] Unit symbols, e.g. "C MPa". Result in the temperature unit given (default K).
 * @returns Melting temperature.
 */
export function meltTemp(substance: any[][], pressure: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, pressure], ["substance", "pressure"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const pressurePa = toSI(system, "pressure", readNumber(cells[1], "pressure"));
    return fromSI(system, "temperature", meltingTemperature(found, pressurePa));
  });
}

/**
 * Melting pressure at a temperature. Where several solids melt at one temperature (water between
 * 251.165 K and 273.31 K), the lowest-pressure one unless form names another.
 * @customfunction MELTPRESSURE
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param temperature Temperature (K unless units say otherwise). A range spills.
 * @param [units] Unit symbols, e.g. "C MPa". Result in the pressure unit given (default Pa).
 * @param [form] Solid form, e.g. "ice V" (water only). Default: the lowest-pressure branch.
 * @returns Melting pressure.
 */
export function meltPressure(substance: any[][], temperature: any[][], units?: any, form?: any[][]): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, temperature, form], ["substance", "temperature", "form"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const temperatureK = toSI(system, "temperature", readNumber(cells[1], "temperature"));
    const solid = readOptionalText(cells[2], "form");
    return fromSI(system, "pressure", meltingPressure(found, temperatureK, solid === "" ? undefined : solid));
  });
}

/**
 * A constant of a substance by symbol or name: Tt, Pt, Tc, Pc, rhoc, Tb, Tm, M.
 * @customfunction CONSTANT
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param name Symbol or name of the constant, e.g. "Tc" or "critical pressure". A range spills.
 * @param [units] Unit symbols, e.g. "C bar"; molar mass in mass/amount units, e.g. "g mol".
 * @returns The constant in the units given.
 */
export function constant(substance: any[][], name: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, name], ["substance", "name"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const resolved = constantOf(found, readText(cells[1], "name"));
    return fromSI(system, resolved.entry.dimension, resolved.value, found.constants.molarMass?.value);
  });
}

/**
 * Where a number comes from: model, grade, citation, validity range and stated uncertainty of
 * the correlation behind a quantity. A table with a header row.
 * @customfunction SOURCE
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param [quantity] "state", "boiling", "sublimation", "melting", a solid such as "ice V", a constant symbol such as "Tc", or "constants". Default: everything.
 * @returns Provenance table.
 */
export function source(substance: any, quantity?: any): any[][] {
  return table(null, () => {
    const found = findSubstance(readText(singleCell(substance, "substance"), "substance"));
    const rows = provenanceFor(found, readOptionalText(singleCell(quantity ?? null, "quantity"), "quantity"));
    return [
      [...PROVENANCE_HEADER],
      ...rows.map((row) => [row.quantity, row.model, row.grade, row.source, row.validity, row.uncertainty]),
    ];
  });
}

/**
 * The substances Phasecell knows, with their formula, CAS number, refrigerant number, accepted
 * names, model grade, constants and main hazards. A table with a header row.
 * @customfunction SUBSTANCES
 * @returns Substance table.
 */
export function substances(): any[][] {
  return table(null, () => [
    ["substance", "formula", "CAS", "refrigerant", "accepted names", "grade", "constants", "hazards"],
    ...SUBSTANCES.map((s) => [
      s.name,
      s.formula,
      s.cas,
      s.refrigerant ?? "",
      s.aliases.join(", "),
      s.grade,
      CONSTANT_CATALOG.filter((c) => s.constants[c.key]).map((c) => c.symbol).join(" "),
      (s.hazards ?? []).join("; "),
    ]),
  ]);
}

/**
 * Signed distance in temperature from a state to the nearest phase boundary on its isobar,
 * T − T_boundary (melting, boiling or sublimation): positive on the warm side.
 * @customfunction MARGIN
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param temperature Temperature (K unless units say otherwise). A range spills.
 * @param pressure Absolute pressure (Pa unless units say otherwise).
 * @param [units] Unit symbols, e.g. "C bar". Result is a temperature difference in that unit.
 * @returns Temperature margin to the nearest boundary.
 */
export function margin(substance: any[][], temperature: any[][], pressure: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, temperature, pressure], ["substance", "temperature", "pressure"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const temperatureK = toSI(system, "temperature", readNumber(cells[1], "temperature"));
    const pressurePa = toSI(system, "pressure", readNumber(cells[2], "pressure"));
    return fromSI(system, "temperatureDifference", marginToBoundary(found, temperatureK, pressurePa).marginK);
  });
}

/**
 * Slope dP/dT of a phase boundary at a temperature. Its sign says which phase is denser: negative
 * for water's ice Ih melting curve (ice floats), positive for most substances.
 * @customfunction SLOPE
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param boundary "melting", "boiling" or "sublimation".
 * @param temperature Temperature (K unless units say otherwise). A range spills.
 * @param [units] Unit symbols, e.g. "C bar": result in bar per °C (default Pa/K).
 * @returns Slope of the boundary.
 */
export function slope(substance: any[][], boundary: any[][], temperature: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, boundary, temperature], ["substance", "boundary", "temperature"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const which = parseBoundary(readText(cells[1], "boundary"));
    const temperatureK = toSI(system, "temperature", readNumber(cells[2], "temperature"));
    return (boundarySlope(found, which, temperatureK) * system.temperature.scale) / system.pressure.scale;
  });
}

/**
 * The phase changes met along the straight path from (T1, P1) to (T2, P2), in order: what
 * happens, where, and the phases on either side. A table with a header row.
 * @customfunction CROSSINGS
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param t1 Start temperature.
 * @param p1 Start pressure (absolute unless a gauge unit is given).
 * @param t2 End temperature.
 * @param p2 End pressure.
 * @param [units] Unit symbols, e.g. "C bar".
 * @returns Table of crossings.
 */
export function crossings(substance: any, t1: any, p1: any, t2: any, p2: any, units?: any): any[][] {
  return table(units, (system) => {
    const found = findSubstance(readText(singleCell(substance, "substance"), "substance"));
    const startK = toSI(system, "temperature", readNumber(singleCell(t1, "T1"), "T1"));
    const startPa = toSI(system, "pressure", readNumber(singleCell(p1, "P1"), "P1"));
    const endK = toSI(system, "temperature", readNumber(singleCell(t2, "T2"), "T2"));
    const endPa = toSI(system, "pressure", readNumber(singleCell(p2, "P2"), "P2"));
    const found2 = crossingsAlongPath(found, startK, startPa, endK, endPa);
    const header = ["change", "temperature", "pressure", "from", "to", "fraction of path"];
    if (found2.length === 0) {
      const only = phaseAt(found, startK, startPa).phase;
      return [header, ["no phase change", "", "", only, only, ""]];
    }
    return [
      header,
      ...found2.map((c) => [
        c.change,
        fromSI(system, "temperature", c.temperatureK),
        fromSI(system, "pressure", c.pressurePa),
        c.from.phase === "solid" ? c.from.detail : c.from.phase,
        c.to.phase === "solid" ? c.to.detail : c.to.phase,
        c.fraction,
      ]),
    ];
  });
}

/**
 * Heat to take a mass from T1 to T2 at constant pressure, latent heats included: positive when
 * heat is added, negative when removed.
 * @customfunction PATHENERGY
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param mass Mass (kg unless units say otherwise; an amount such as mol with an amount unit).
 * @param t1 Start temperature.
 * @param t2 End temperature.
 * @param pressure Absolute pressure of the isobar (gauge with barg, psig, kPag).
 * @param [units] Unit symbols, e.g. "C bar kJ kg". Result in the energy unit (default J).
 * @returns Heat for the whole mass.
 */
export function pathEnergyFn(substance: any[][], mass: any[][], t1: any[][], t2: any[][], pressure: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  // One isobar serves every cell with the same substance and pressure (a column of states on one line).
  let isobar: { substance: SubstanceDefinition; pressurePa: number; energy: (m: number, a: number, b: number) => number } | undefined;
  return evaluate([substance, mass, t1, t2, pressure], ["substance", "mass", "T1", "T2", "pressure"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const molarMass = found.constants.molarMass?.value;
    const massKg = toSI(system, "mass", readNumber(cells[1], "mass"), molarMass);
    const startK = toSI(system, "temperature", readNumber(cells[2], "T1"));
    const endK = toSI(system, "temperature", readNumber(cells[3], "T2"));
    const pressurePa = toSI(system, "pressure", readNumber(cells[4], "pressure"));
    if (!isobar || isobar.substance !== found || isobar.pressurePa !== pressurePa) {
      isobar = { substance: found, pressurePa, energy: pathEnergyOnIsobar(found, pressurePa) };
    }
    return fromSI(system, "energy", isobar.energy(massKg, startK, endK));
  });
}

/**
 * The steps of heating or cooling a mass from T1 to T2 at constant pressure: one row per step
 * (heat or cool a phase, melt, freeze, boil, condense, sublime, deposit) with its temperatures,
 * energy and running total. A table with a header row.
 * @customfunction PATH
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param mass Mass (kg unless units say otherwise).
 * @param t1 Start temperature.
 * @param t2 End temperature.
 * @param pressure Absolute pressure of the isobar.
 * @param [units] Unit symbols, e.g. "C bar kJ kg".
 * @returns Step table.
 */
export function path(substance: any, mass: any, t1: any, t2: any, pressure: any, units?: any): any[][] {
  return table(units, (system) => {
    const found = findSubstance(readText(singleCell(substance, "substance"), "substance"));
    const massKg = toSI(system, "mass", readNumber(singleCell(mass, "mass"), "mass"), found.constants.molarMass?.value);
    const startK = toSI(system, "temperature", readNumber(singleCell(t1, "T1"), "T1"));
    const endK = toSI(system, "temperature", readNumber(singleCell(t2, "T2"), "T2"));
    const pressurePa = toSI(system, "pressure", readNumber(singleCell(pressure, "pressure"), "pressure"));
    const steps = isobaricPath(found, massKg, startK, endK, pressurePa);
    const rows: (string | number)[][] = [["step", "what happens", "from", "to", "energy", "running total"]];
    let total = 0;
    steps.forEach((step, index) => {
      total += step.energyJ;
      rows.push([
        index + 1,
        step.action,
        fromSI(system, "temperature", step.fromK),
        fromSI(system, "temperature", step.toK),
        fromSI(system, "energy", step.energyJ),
        fromSI(system, "energy", total),
      ]);
    });
    if (steps.length === 0) rows.push([0, "no change (T1 equals T2)", fromSI(system, "temperature", startK), fromSI(system, "temperature", endK), 0, 0]);
    return rows;
  });
}

/**
 * Where a mass ends after adding (or, if negative, removing) a heat at constant pressure: final
 * temperature, final state (e.g. "ice Ih + liquid" when it stops inside a phase change) and the
 * mass fraction converted by that change. The inverse of PATHENERGY.
 * @customfunction ENDSTATE
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param mass Mass (kg unless units say otherwise).
 * @param t1 Start temperature.
 * @param heat Heat added (negative: removed), in the energy unit (default J).
 * @param pressure Absolute pressure of the isobar.
 * @param [units] Unit symbols, e.g. "C bar kJ kg".
 * @returns One row: final temperature, final state, converted fraction (blank outside a phase change).
 */
export function endStateFn(substance: any, mass: any, t1: any, heat: any, pressure: any, units?: any): any[][] {
  return table(units, (system) => {
    const found = findSubstance(readText(singleCell(substance, "substance"), "substance"));
    const massKg = toSI(system, "mass", readNumber(singleCell(mass, "mass"), "mass"), found.constants.molarMass?.value);
    const startK = toSI(system, "temperature", readNumber(singleCell(t1, "T1"), "T1"));
    const heatJ = toSI(system, "energy", readNumber(singleCell(heat, "heat"), "heat"));
    const pressurePa = toSI(system, "pressure", readNumber(singleCell(pressure, "pressure"), "pressure"));
    const result = endState(found, massKg, startK, heatJ, pressurePa);
    return [[fromSI(system, "temperature", result.temperatureK), result.state, result.convertedFraction ?? ""]];
  });
}

/**
 * Specific enthalpy at a temperature and pressure on the substance's reference state (water:
 * IAPWS, zero internal energy and entropy of the saturated liquid at the triple point), so any
 * change of state is mass × (h2 − h1).
 * @customfunction ENTHALPY
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param temperature Temperature. A range spills.
 * @param pressure Absolute pressure.
 * @param [units] Unit symbols, e.g. "C bar kJ kg" (result in kJ/kg); an amount unit gives molar values.
 * @returns Specific enthalpy (default J/kg).
 */
export function enthalpy(substance: any[][], temperature: any[][], pressure: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, temperature, pressure], ["substance", "temperature", "pressure"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const temperatureK = toSI(system, "temperature", readNumber(cells[1], "temperature"));
    const pressurePa = toSI(system, "pressure", readNumber(cells[2], "pressure"));
    return fromSI(system, "specificEnergy", specificEnthalpy(found, temperatureK, pressurePa), found.constants.molarMass?.value);
  });
}

/**
 * Specific latent heat of fusion, vaporization or sublimation at the coexistence point at a
 * temperature.
 * @customfunction LATENTHEAT
 * @param substance Name, formula, CAS number or refrigerant number.
 * @param transition "fusion", "vaporization" or "sublimation".
 * @param temperature Temperature on the coexistence curve. A range spills.
 * @param [units] Unit symbols, e.g. "C kJ kg" (result in kJ/kg).
 * @returns Specific latent heat (default J/kg).
 */
export function latentHeatFn(substance: any[][], transition: any[][], temperature: any[][], units?: any): any[][] {
  const readSubstance = substanceReader();
  return evaluate([substance, transition, temperature], ["substance", "transition", "temperature"], units, (cells, system) => {
    const found = readSubstance(cells[0]);
    const which = parseTransition(readText(cells[1], "transition"));
    const temperatureK = toSI(system, "temperature", readNumber(cells[2], "temperature"));
    return fromSI(system, "specificEnergy", latentHeat(found, which, temperatureK), found.constants.molarMass?.value);
  });
}
