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
import { PROVENANCE_HEADER, provenanceFor } from "../core/sources/provenance";
import { findSubstance, SUBSTANCES } from "../core/substances/registry";
import { fromSI, toSI } from "../core/units/units";
import { readFlag, readNumber, readOptionalText, readText, readUnits, singleCell } from "./coerce";
import { evaluate, table } from "./evaluate";
import { toExcelError } from "./excel-error";

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
  return evaluate([substance, temperature, pressure], ["substance", "temperature", "pressure"], units, (cells, system) => {
    const fine = readFlag(singleCell(detail ?? null, "detail"), "detail");
    const found = findSubstance(readText(cells[0], "substance"));
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
  return evaluate([substance, temperature], ["substance", "temperature"], units, (cells, system) => {
    const found = findSubstance(readText(cells[0], "substance"));
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
  return evaluate([substance, pressure], ["substance", "pressure"], units, (cells, system) => {
    const found = findSubstance(readText(cells[0], "substance"));
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
  return evaluate([substance, pressure], ["substance", "pressure"], units, (cells, system) => {
    const found = findSubstance(readText(cells[0], "substance"));
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
  return evaluate([substance, temperature, form], ["substance", "temperature", "form"], units, (cells, system) => {
    const found = findSubstance(readText(cells[0], "substance"));
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
  return evaluate([substance, name], ["substance", "name"], units, (cells, system) => {
    const found = findSubstance(readText(cells[0], "substance"));
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
  return table(() => {
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
 * names and model grade. A table with a header row.
 * @customfunction SUBSTANCES
 * @returns Substance table.
 */
export function substances(): any[][] {
  return table(() => [
    ["substance", "formula", "CAS", "refrigerant", "accepted names", "grade", "constants"],
    ...SUBSTANCES.map((s) => [
      s.name,
      s.formula,
      s.cas,
      s.refrigerant ?? "",
      s.aliases.join(", "),
      s.grade,
      CONSTANT_CATALOG.filter((c) => s.constants[c.key]).map((c) => c.symbol).join(" "),
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
  return evaluate([substance, temperature, pressure], ["substance", "temperature", "pressure"], units, (cells, system) => {
    const found = findSubstance(readText(cells[0], "substance"));
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
  return evaluate([substance, boundary, temperature], ["substance", "boundary", "temperature"], units, (cells, system) => {
    const found = findSubstance(readText(cells[0], "substance"));
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
  return table(() => {
    const system = readUnits(units);
    try {
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
    } catch (error) {
      throw toExcelError(error, system);
    }
  });
}
