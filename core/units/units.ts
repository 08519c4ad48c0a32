/**
 * The `units` argument: a text of tokens separated by spaces or commas, each recognised by its
 * dimension, so order does not matter ("C bar", "F psig BTU lb"). Converts to and from SI.
 *
 * Conversion factors are exact by definition unless a source is named:
 * - 0 °C = 273.15 K and the Fahrenheit and Rankine scales: ITS-90 and NIST SP 811 (2008) App. B.
 * - lb = 0.45359237 kg, in = 0.0254 m, ft = 0.3048 m, standard gravity 9.80665 m/s², so
 *   psi = lbf/in² = 0.45359237 · 9.80665 / 0.0254² Pa: exact by definition (NIST SP 811 App. B).
 * - atm = 101 325 Pa; torr = atm/760; bar = 10^5 Pa: exact by definition.
 * - mmHg and inHg are the conventional units: a column of mercury of density 13 595.1 kg/m³ under
 *   standard gravity (NIST SP 811 App. B: 1 mmHg = 133.322 387 415 Pa, 1 inHg = 3386.389 Pa).
 * - BTU and kcal are the International Table units: 1 cal_IT = 4.1868 J exactly, 1 BTU_IT =
 *   1055.055 852 62 J exactly (NIST SP 811 App. B).
 * - kWh = 3.6 MJ; lbmol = 453.592 37 mol: exact by definition.
 * Gauge pressures (barg, psig, kPag) are relative to the standard atmosphere, 101 325 Pa.
 */
import { BadInputError, type Dimension } from "../errors";

/** Dimensions a token can carry. */
export type TokenDimension = "temperature" | "pressure" | "energy" | "mass" | "amount" | "density";

/** One accepted unit token. */
export interface UnitToken {
  /** How the token is printed back to the user. */
  readonly symbol: string;
  readonly dimension: TokenDimension;
  /** SI value = scale · value + offset. */
  readonly scale: number;
  readonly offset: number;
  /** Other spellings accepted for the same unit. */
  readonly spellings: readonly string[];
  /** A note shown when the unit needs one (gauge pressures). */
  readonly note?: string;
}

const ATM_PA = 101325;
const LB_KG = 0.45359237;
const INCH_M = 0.0254;
const FOOT_M = 0.3048;
const STANDARD_GRAVITY = 9.80665;
const PSI_PA = (LB_KG * STANDARD_GRAVITY) / (INCH_M * INCH_M);
const MERCURY_DENSITY = 13595.1;
const MMHG_PA = MERCURY_DENSITY * STANDARD_GRAVITY * 1e-3;
const INHG_PA = MERCURY_DENSITY * STANDARD_GRAVITY * INCH_M;
const CAL_IT_J = 4.1868;
const BTU_IT_J = 1055.05585262;
const GAUGE_NOTE = "gauge pressure, relative to the standard atmosphere (101.325 kPa)";

function token(
  symbol: string,
  dimension: TokenDimension,
  scale: number,
  spellings: readonly string[] = [],
  offset = 0,
  note?: string,
): UnitToken {
  return note === undefined
    ? { symbol, dimension, scale, offset, spellings }
    : { symbol, dimension, scale, offset, spellings, note };
}

/** Every accepted token, grouped by dimension in the order the error message lists them. */
export const UNIT_TOKENS: readonly UnitToken[] = [
  token("K", "temperature", 1, ["kelvin"]),
  token("C", "temperature", 1, ["°C", "degC", "celsius"], 273.15),
  token("F", "temperature", 5 / 9, ["°F", "degF", "fahrenheit"], (459.67 * 5) / 9),
  token("R", "temperature", 5 / 9, ["°R", "degR", "rankine"]),
  token("Pa", "pressure", 1),
  token("kPa", "pressure", 1e3),
  token("MPa", "pressure", 1e6),
  token("GPa", "pressure", 1e9),
  token("bar", "pressure", 1e5, ["bara"]),
  token("mbar", "pressure", 1e2),
  token("atm", "pressure", ATM_PA),
  token("psi", "pressure", PSI_PA, ["psia"]),
  token("torr", "pressure", ATM_PA / 760),
  token("mmHg", "pressure", MMHG_PA),
  token("inHg", "pressure", INHG_PA),
  token("barg", "pressure", 1e5, [], ATM_PA, GAUGE_NOTE),
  token("psig", "pressure", PSI_PA, [], ATM_PA, GAUGE_NOTE),
  token("kPag", "pressure", 1e3, [], ATM_PA, GAUGE_NOTE),
  token("J", "energy", 1),
  token("kJ", "energy", 1e3),
  token("MJ", "energy", 1e6),
  token("kWh", "energy", 3.6e6),
  token("BTU", "energy", BTU_IT_J),
  token("kcal", "energy", CAL_IT_J * 1e3),
  token("kg", "mass", 1),
  token("g", "mass", 1e-3),
  token("t", "mass", 1e3, ["tonne"]),
  token("lb", "mass", LB_KG, ["lbm"]),
  token("mol", "amount", 1),
  token("kmol", "amount", 1e3),
  token("lbmol", "amount", LB_KG * 1e3),
  token("kg/m3", "density", 1, ["kg/m³"]),
  token("g/cm3", "density", 1e3, ["g/cm³", "g/mL"]),
  token("lb/ft3", "density", LB_KG / FOOT_M ** 3, ["lb/ft³", "lbm/ft3"]),
];

const exactLookup = new Map<string, UnitToken>();
const foldedLookup = new Map<string, { unit: UnitToken; spelling: string } | "ambiguous">();
for (const unit of UNIT_TOKENS) {
  for (const spelling of [unit.symbol, ...unit.spellings]) {
    exactLookup.set(spelling, unit);
    const folded = spelling.toLowerCase();
    const seen = foldedLookup.get(folded);
    foldedLookup.set(folded, seen && (seen === "ambiguous" || seen.unit !== unit) ? "ambiguous" : { unit, spelling });
  }
}

function lookupToken(text: string): UnitToken | undefined {
  const exact = exactLookup.get(text);
  if (exact) return exact;
  const folded = foldedLookup.get(text.toLowerCase());
  if (folded === undefined || folded === "ambiguous") return undefined;
  // Case is ignored, except where a token written in mixed case would turn milli into mega or
  // back ("mPa" is not "MPa", "Mbar" is not "mbar"): a factor of 10^9 must never come from a
  // typing slip. All-lower or all-upper tokens carry no case intent ("mpa" is MPa).
  const typed = text[0]!;
  const canonical = folded.spelling[0]!;
  const mixedCase = text !== text.toLowerCase() && text !== text.toUpperCase();
  if (mixedCase && typed !== canonical && typed.toLowerCase() === "m") {
    throw new BadInputError([
      `unit "${text}" reads as ${typed === "m" ? "milli" : "mega"}-${folded.spelling.slice(1)}, which Phasecell ` +
        `does not offer; write "${folded.spelling}" if that is what you mean (case matters for m and M)`,
    ]);
  }
  return folded.unit;
}

/** The units a call works in: one token per dimension (SI where none was given). */
export interface UnitSystem {
  readonly temperature: UnitToken;
  readonly pressure: UnitToken;
  readonly energy: UnitToken;
  readonly mass: UnitToken;
  /** Set when the user gave an amount token: specific quantities are then molar. */
  readonly amount?: UnitToken;
  readonly density: UnitToken;
  /** The text the system was parsed from, trimmed. */
  readonly text: string;
}

const SI_UNITS: UnitSystem = {
  temperature: UNIT_TOKENS[0]!,
  pressure: UNIT_TOKENS.find((u) => u.symbol === "Pa")!,
  energy: UNIT_TOKENS.find((u) => u.symbol === "J")!,
  mass: UNIT_TOKENS.find((u) => u.symbol === "kg")!,
  density: UNIT_TOKENS.find((u) => u.symbol === "kg/m3")!,
  text: "",
};

/** SI base units: K, Pa, J, kg, kg/m3. */
export const SI: UnitSystem = SI_UNITS;

/** A list of accepted tokens by dimension, for error messages and the docs. */
export function acceptedTokensText(): string {
  const groups = new Map<TokenDimension, string[]>();
  for (const unit of UNIT_TOKENS) {
    const list = groups.get(unit.dimension) ?? [];
    list.push(unit.symbol);
    groups.set(unit.dimension, list);
  }
  return [...groups].map(([dimension, list]) => `${dimension}: ${list.join(", ")}`).join("; ");
}

/**
 * Parses a units text such as "C bar" or "F, psig, BTU, lb" (also "kJ/kg": energy per mass).
 * An empty text means SI.
 * @throws BadInputError for an unknown token or two tokens of one dimension.
 */
export function parseUnits(text: string): UnitSystem {
  const trimmed = text.trim();
  if (trimmed === "") return SI_UNITS;
  const chosen: Partial<Record<TokenDimension, UnitToken>> = {};
  const place = (unit: UnitToken, raw: string): void => {
    const already = chosen[unit.dimension];
    if (already && already !== unit) {
      throw new BadInputError([
        `units "${trimmed}" name two ${unit.dimension} units (${already.symbol} and ${raw}): ` +
          `keep one`,
      ]);
    }
    chosen[unit.dimension] = unit;
  };
  for (const raw of trimmed.split(/[\s,;]+/).filter((part) => part !== "")) {
    const unit = lookupToken(raw);
    if (unit) {
      place(unit, raw);
      continue;
    }
    const slash = raw.indexOf("/");
    if (slash > 0) {
      const top = lookupToken(raw.slice(0, slash));
      const bottom = lookupToken(raw.slice(slash + 1));
      if (top?.dimension === "energy" && (bottom?.dimension === "mass" || bottom?.dimension === "amount")) {
        place(top, raw);
        place(bottom, raw);
        continue;
      }
    }
    throw new BadInputError([
      `unknown unit "${raw}" in units "${trimmed}". Accepted (any order, separated by spaces ` +
        `or commas): ${acceptedTokensText()}`,
    ]);
  }
  const system: UnitSystem = {
    temperature: chosen.temperature ?? SI_UNITS.temperature,
    pressure: chosen.pressure ?? SI_UNITS.pressure,
    energy: chosen.energy ?? SI_UNITS.energy,
    mass: chosen.mass ?? SI_UNITS.mass,
    density: chosen.density ?? SI_UNITS.density,
    text: trimmed,
  };
  return chosen.amount ? { ...system, amount: chosen.amount } : system;
}

/**
 * Converts a value in the user's units to SI. `molarMass` (kg/mol) is needed only for specific
 * quantities when the system is molar.
 */
export function toSI(system: UnitSystem, dimension: Dimension, value: number, molarMass?: number): number {
  switch (dimension) {
    case "temperature":
      return system.temperature.scale * value + system.temperature.offset;
    case "temperatureDifference":
      return system.temperature.scale * value;
    case "pressure":
      return system.pressure.scale * value + system.pressure.offset;
    case "energy":
      return system.energy.scale * value;
    case "mass":
      return system.amount ? system.amount.scale * value * requireMolarMass(molarMass) : system.mass.scale * value;
    case "specificEnergy":
      return system.amount
        ? (system.energy.scale * value) / (system.amount.scale * requireMolarMass(molarMass))
        : (system.energy.scale * value) / system.mass.scale;
    case "density":
      return system.density.scale * value;
    case "molarMass":
      return (system.mass.scale * value) / (system.amount?.scale ?? 1);
    case "dimensionless":
      return value;
  }
}

/** Converts an SI value to the user's units (the inverse of {@link toSI}). */
export function fromSI(system: UnitSystem, dimension: Dimension, value: number, molarMass?: number): number {
  switch (dimension) {
    case "temperature":
      return (value - system.temperature.offset) / system.temperature.scale;
    case "temperatureDifference":
      return value / system.temperature.scale;
    case "pressure":
      return (value - system.pressure.offset) / system.pressure.scale;
    case "energy":
      return value / system.energy.scale;
    case "mass":
      return system.amount ? value / (system.amount.scale * requireMolarMass(molarMass)) : value / system.mass.scale;
    case "specificEnergy":
      return system.amount
        ? (value * system.amount.scale * requireMolarMass(molarMass)) / system.energy.scale
        : (value * system.mass.scale) / system.energy.scale;
    case "density":
      return value / system.density.scale;
    case "molarMass":
      return (value * (system.amount?.scale ?? 1)) / system.mass.scale;
    case "dimensionless":
      return value;
  }
}

/** The unit symbol a dimension is shown in. */
export function unitSymbol(system: UnitSystem, dimension: Dimension): string {
  switch (dimension) {
    case "temperature":
    case "temperatureDifference":
      return system.temperature.symbol === "C" || system.temperature.symbol === "F" || system.temperature.symbol === "R"
        ? `°${system.temperature.symbol}`
        : system.temperature.symbol;
    case "pressure":
      return system.pressure.symbol;
    case "energy":
      return system.energy.symbol;
    case "mass":
      return system.amount ? system.amount.symbol : system.mass.symbol;
    case "specificEnergy":
      return `${system.energy.symbol}/${system.amount ? system.amount.symbol : system.mass.symbol}`;
    case "density":
      return system.density.symbol;
    case "molarMass":
      return `${system.mass.symbol}/${system.amount?.symbol ?? "mol"}`;
    case "dimensionless":
      return "";
  }
}

function requireMolarMass(molarMass: number | undefined): number {
  if (molarMass === undefined) {
    throw new BadInputError(["a molar unit needs a substance with a known molar mass"]);
  }
  return molarMass;
}
