/**
 * The named constants a user can ask for, by symbol or by name, and their look-up on a substance.
 */
import { BadInputError, NoSuchStateError, type Dimension } from "./errors";
import { foldName, nearestNames } from "./names";
import type { ConstantKey, ConstantValue, SubstanceDefinition } from "./substances/types";

/** How a constant is named and shown. */
export interface ConstantEntry {
  readonly key: ConstantKey;
  /** Short symbol, e.g. "Tc". */
  readonly symbol: string;
  /** Label in tables, e.g. "critical temperature". */
  readonly label: string;
  /** Other names a user may type. */
  readonly names: readonly string[];
  readonly dimension: Dimension;
}

/** Every constant name, in the order tables show them. */
export const CONSTANT_CATALOG: readonly ConstantEntry[] = [
  { key: "tripleTemperature", symbol: "Tt", label: "triple-point temperature", names: ["triple temperature", "triple point temperature"], dimension: "temperature" },
  { key: "triplePressure", symbol: "Pt", label: "triple-point pressure", names: ["triple pressure", "triple point pressure"], dimension: "pressure" },
  { key: "criticalTemperature", symbol: "Tc", label: "critical temperature", names: [], dimension: "temperature" },
  { key: "criticalPressure", symbol: "Pc", label: "critical pressure", names: [], dimension: "pressure" },
  { key: "criticalDensity", symbol: "rhoc", label: "critical density", names: ["ρc", "Dc"], dimension: "density" },
  { key: "normalBoilingPoint", symbol: "Tb", label: "normal boiling point (101.325 kPa)", names: ["normal boiling point", "boiling point", "NBP"], dimension: "temperature" },
  { key: "normalMeltingPoint", symbol: "Tm", label: "normal melting point (101.325 kPa)", names: ["normal melting point", "melting point", "freezing point"], dimension: "temperature" },
  { key: "normalSublimationPoint", symbol: "Tsub", label: "normal sublimation point (101.325 kPa)", names: ["normal sublimation point", "sublimation point"], dimension: "temperature" },
  { key: "molarMass", symbol: "M", label: "molar mass", names: ["molar mass", "molecular weight", "MW"], dimension: "molarMass" },
  { key: "acentricFactor", symbol: "omega", label: "acentric factor", names: ["acentric factor", "ω", "w"], dimension: "dimensionless" },
  { key: "enthalpyOfFusion", symbol: "Hfus", label: "enthalpy of fusion (at the triple point)", names: ["enthalpy of fusion", "heat of fusion", "latent heat of fusion", "ΔHfus", "dHfus"], dimension: "specificEnergy" },
  { key: "enthalpyOfVaporization", symbol: "Hvap", label: "enthalpy of vaporization at Tb", names: ["enthalpy of vaporization", "heat of vaporization", "latent heat of vaporization", "ΔHvap", "dHvap"], dimension: "specificEnergy" },
];

/** A constant of a substance with its catalogue entry. */
export interface ResolvedConstant extends ConstantValue {
  readonly entry: ConstantEntry;
}

function findEntry(name: string): ConstantEntry {
  const folded = foldName(name);
  const entry = CONSTANT_CATALOG.find(
    (candidate) =>
      foldName(candidate.symbol) === folded ||
      foldName(candidate.label) === folded ||
      foldName(candidate.key) === folded ||
      candidate.names.some((alias) => foldName(alias) === folded),
  );
  if (entry) return entry;
  const near = nearestNames(name, CONSTANT_CATALOG.flatMap((c) => [c.symbol, c.label, ...c.names]));
  throw new BadInputError([
    `unknown constant "${name.trim()}". ${near.length > 0 ? `Did you mean ${near.map((n) => `"${n}"`).join(" or ")}? ` : ""}` +
      `Known: ${CONSTANT_CATALOG.map((c) => `${c.symbol} (${c.label})`).join(", ")}`,
  ]);
}

/**
 * A constant of a substance by symbol or name.
 * @throws BadInputError for an unknown name; NoSuchStateError when the substance lacks it.
 */
export function constantOf(substance: SubstanceDefinition, name: string): ResolvedConstant {
  const entry = findEntry(name);
  const value = substance.constants[entry.key];
  if (!value) {
    const triple = substance.constants.triplePressure?.value;
    if (entry.key === "normalBoilingPoint" && triple !== undefined && triple > 101325) {
      throw new NoSuchStateError([
        `${substance.name} has no normal boiling point: its triple-point pressure is above one ` +
          "standard atmosphere, so at 101.325 kPa the solid sublimes (PHASE.CONSTANT with \"Tsub\", " +
          "or PHASE.SATTEMP at that pressure)",
      ]);
    }
    throw new NoSuchStateError([`no ${entry.label} is recorded for ${substance.name}`]);
  }
  return { ...value, entry };
}

/** All constants a substance carries, in catalogue order. */
export function constantsOf(substance: SubstanceDefinition): ResolvedConstant[] {
  return CONSTANT_CATALOG.flatMap((entry) => {
    const value = substance.constants[entry.key];
    return value ? [{ ...value, entry }] : [];
  });
}
