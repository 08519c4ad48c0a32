/**
 * The units argument: every token converts by its documented factor, gauge tokens, combined
 * energy-per-mass tokens, errors for unknown or doubled tokens, and case folding.
 *
 * Factors are checked against their definitions, not against the code's own arithmetic:
 * - SI prefixes and the Celsius offset, 0 °C = 273.15 K (SI Brochure; NIST SP 811 (2008) Sec. 4).
 * - International yard and pound (1959): lb = 0.453 592 37 kg, in = 0.0254 m, ft = 0.3048 m.
 * - Standard acceleration of gravity g_n = 9.806 65 m/s² (3rd CGPM, 1901).
 * - Standard atmosphere 101 325 Pa (10th CGPM, 1954); torr = atm/760; bar = 1e5 Pa.
 * - Conventional mercury column: 13 595.1 kg/m³ under g_n (NIST SP 811 App. B, from memory).
 * - International Table calorie 4.1868 J (Fifth International Conference on the Properties of
 *   Steam, 1956); Btu_IT = 1055.055 852 62 J, which makes 1 Btu_IT/lb = 2.326 kJ/kg exactly.
 * - kWh = 3.6 MJ; lbmol = 453.592 37 mol.
 * The rounded factors NIST SP 811 (2008) Appendix B prints (seven significant digits) are checked
 * as a second source to half a unit in their last digit; those values are quoted from memory.
 */
import { describe, expect, it } from "vitest";
import { PhaseError } from "../../../core/errors";
import {
  SI,
  UNIT_TOKENS,
  acceptedTokensText,
  fromSI,
  parseUnits,
  toSI,
  unitSymbol,
  type UnitSystem,
} from "../../../core/units/units";
import { expectClose } from "../../helpers/expect-close";
import { printed } from "../printed";

const LB = 0.45359237;
const INCH = 0.0254;
const FOOT = 0.3048;
const GN = 9.80665;
const ATM = 101325;

function badInput(call: () => unknown): PhaseError {
  try {
    call();
  } catch (error) {
    expect(error).toBeInstanceOf(PhaseError);
    expect((error as PhaseError).kind).toBe("bad-input");
    return error as PhaseError;
  }
  return expect.fail("expected a bad-input error");
}

const ABSOLUTE_PRESSURES: readonly (readonly [string, number])[] = [
  ["Pa", 1],
  ["kPa", 1e3],
  ["MPa", 1e6],
  ["GPa", 1e9],
  ["bar", 1e5],
  ["bara", 1e5],
  ["mbar", 1e2],
  ["atm", ATM],
  ["psi", (LB * GN) / (INCH * INCH)],
  ["psia", (LB * GN) / (INCH * INCH)],
  ["torr", ATM / 760],
  ["mmHg", 13595.1 * GN * 1e-3],
  ["inHg", 13595.1 * GN * INCH],
];

const ENERGIES: readonly (readonly [string, number])[] = [
  ["J", 1],
  ["kJ", 1e3],
  ["MJ", 1e6],
  ["kWh", 3.6e6],
  ["BTU", 1055.05585262],
  ["kcal", 4186.8],
];

const MASSES: readonly (readonly [string, number])[] = [
  ["kg", 1],
  ["g", 1e-3],
  ["t", 1e3],
  ["tonne", 1e3],
  ["lb", LB],
  ["lbm", LB],
];

const DENSITIES: readonly (readonly [string, number])[] = [
  ["kg/m3", 1],
  ["kg/m³", 1],
  ["g/cm3", 1e3],
  ["g/cm³", 1e3],
  ["g/mL", 1e3],
  ["lb/ft3", LB / FOOT ** 3],
  ["lb/ft³", LB / FOOT ** 3],
  ["lbm/ft3", LB / FOOT ** 3],
];

describe("temperature tokens", () => {
  it.each([
    ["K", 300, 300],
    ["kelvin", 300, 300],
    ["C", 0, 273.15],
    ["°C", 100, 373.15],
    ["degC", -40, 233.15],
    ["celsius", 25, 298.15],
    ["F", 32, 273.15],
    ["°F", 212, 373.15],
    ["degF", -40, 233.15],
    ["fahrenheit", -459.67, 0],
    ["R", 491.67, 273.15],
    ["°R", 0, 0],
    ["degR", 180, 100],
    ["rankine", 671.67, 373.15],
  ] as const)("%s: %s reads as %s K", (token, value, kelvin) => {
    const units = parseUnits(token);
    expectClose(toSI(units, "temperature", value), kelvin, { abs: 1e-12 * Math.max(1, kelvin) });
    expectClose(fromSI(units, "temperature", kelvin), value, { abs: 1e-12 * Math.max(1, Math.abs(value)) });
  });

  it("temperature differences scale without the offset (1 °F difference = 5/9 K)", () => {
    expectClose(toSI(parseUnits("F"), "temperatureDifference", 9), 5, { rel: 1e-15 });
    expect(toSI(parseUnits("C"), "temperatureDifference", 10)).toBe(10);
    expectClose(fromSI(parseUnits("R"), "temperatureDifference", 5), 9, { rel: 1e-15 });
  });
});

describe("pressure tokens", () => {
  it.each(ABSOLUTE_PRESSURES)("1 %s = %s Pa, by definition", (token, pascals) => {
    const units = parseUnits(token);
    expectClose(toSI(units, "pressure", 1), pascals, { rel: 1e-15 });
    expectClose(fromSI(units, "pressure", pascals), 1, { rel: 1e-15 });
  });

  // NIST SP 811 (2008), Appendix B.8 (from memory), seven significant digits.
  it.each([
    ["psi", "6.894757e3"],
    ["torr", "1.333224e2"],
    ["mmHg", "1.333224e2"],
    ["inHg", "3.386389e3"],
  ] as const)("1 %s agrees with NIST SP 811 App. B (%s Pa)", (token, text) => {
    const check = printed(text);
    expectClose(toSI(parseUnits(token), "pressure", 1), check.value, { abs: check.halfUnit });
  });

  it.each([
    ["barg", 1e5],
    ["psig", (LB * GN) / (INCH * INCH)],
    ["kPag", 1e3],
  ] as const)("%s is gauge: 0 reads as one standard atmosphere, 101 325 Pa", (token, scale) => {
    const units = parseUnits(token);
    expect(toSI(units, "pressure", 0)).toBe(ATM);
    expectClose(toSI(units, "pressure", 2), ATM + 2 * scale, { rel: 1e-15 });
    expectClose(fromSI(units, "pressure", ATM + 2 * scale), 2, { rel: 1e-14 });
    expect(units.pressure.note).toContain("gauge");
    expect(units.pressure.note).toContain("101.325 kPa");
  });

  it("a gauge reading below -1 atm gives a non-positive absolute pressure (the core rejects it)", () => {
    expect(toSI(parseUnits("barg"), "pressure", -1.01325)).toBeCloseTo(0, 9);
    expect(toSI(parseUnits("psig"), "pressure", -20)).toBeLessThan(0);
  });
});

describe("energy, mass, amount and density tokens", () => {
  it.each(ENERGIES)("1 %s = %s J", (token, joules) => {
    const units = parseUnits(token);
    expectClose(toSI(units, "energy", 1), joules, { rel: 1e-15 });
    expectClose(fromSI(units, "energy", joules), 1, { rel: 1e-15 });
  });

  it("1 BTU agrees with NIST SP 811 App. B (1.055056e3 J, from memory)", () => {
    const check = printed("1.055056e3");
    expectClose(toSI(parseUnits("BTU"), "energy", 1), check.value, { abs: check.halfUnit });
  });

  it.each(MASSES)("1 %s = %s kg", (token, kilograms) => {
    const units = parseUnits(token);
    expectClose(toSI(units, "mass", 1), kilograms, { rel: 1e-15 });
    expectClose(fromSI(units, "mass", kilograms), 1, { rel: 1e-15 });
  });

  it.each(DENSITIES)("1 %s = %s kg/m3", (token, density) => {
    const units = parseUnits(token);
    expectClose(toSI(units, "density", 1), density, { rel: 1e-15 });
    expectClose(fromSI(units, "density", density), 1, { rel: 1e-15 });
  });

  it("1 lb/ft3 agrees with NIST SP 811 App. B (1.601846e1 kg/m3, from memory)", () => {
    const check = printed("1.601846e1");
    expectClose(toSI(parseUnits("lb/ft3"), "density", 1), check.value, { abs: check.halfUnit });
  });

  // Molar mass of water, 18.015268 g/mol (IAPWS-95 release).
  const M = 0.018015268;

  it.each([
    ["mol", 1],
    ["kmol", 1e3],
    ["lbmol", LB * 1e3],
  ] as const)("an amount token %s makes masses and specific quantities molar", (token, moles) => {
    const units = parseUnits(`kJ ${token}`);
    expect(units.amount?.symbol).toBe(token);
    expectClose(toSI(units, "mass", 1, M), moles * M, { rel: 1e-15 });
    expectClose(toSI(units, "specificEnergy", 1, M), 1e3 / (moles * M), { rel: 1e-15 });
    expectClose(fromSI(units, "specificEnergy", 1e3 / (moles * M), M), 1, { rel: 1e-15 });
    expect(unitSymbol(units, "specificEnergy")).toBe(`kJ/${token}`);
  });

  it("a molar unit without a molar mass is bad input", () => {
    const error = badInput(() => toSI(parseUnits("mol"), "mass", 1));
    expect(error.message).toContain("molar mass");
  });

  it("molar mass converts between kg/mol and the chosen mass per amount", () => {
    expectClose(toSI(parseUnits("g"), "molarMass", 18.015268), M, { rel: 1e-15 });
    expectClose(fromSI(parseUnits("g kmol"), "molarMass", M), 18015.268 * 1e-3 * 1e3, { rel: 1e-15 });
  });
});

describe("combined specific-energy tokens", () => {
  it.each([
    ["kJ/kg", 1e3],
    ["J/kg", 1],
    ["J/g", 1e3],
    ["kcal/kg", 4186.8],
    ["BTU/lb", 2326],
  ] as const)("1 %s = %s J/kg", (token, joulesPerKilogram) => {
    const units = parseUnits(token);
    expectClose(toSI(units, "specificEnergy", 1), joulesPerKilogram, { rel: 1e-15 });
    expectClose(fromSI(units, "specificEnergy", joulesPerKilogram), 1, { rel: 1e-15 });
    expect(unitSymbol(units, "specificEnergy")).toBe(token);
  });

  it("kJ/kg sets both the energy and the mass token", () => {
    const units = parseUnits("C bar kJ/kg");
    expect(units.energy.symbol).toBe("kJ");
    expect(units.mass.symbol).toBe("kg");
    expect(units.temperature.symbol).toBe("C");
    expect(units.pressure.symbol).toBe("bar");
  });

  it("a combined token whose halves are not energy per mass or amount is unknown", () => {
    badInput(() => parseUnits("kg/kJ"));
    badInput(() => parseUnits("kJ/bar"));
  });
});

describe("parsing", () => {
  it("an empty or blank text means SI", () => {
    for (const text of ["", "   "]) {
      const units = parseUnits(text);
      expect([units.temperature.symbol, units.pressure.symbol, units.energy.symbol, units.mass.symbol, units.density.symbol]).toEqual([
        "K",
        "Pa",
        "J",
        "kg",
        "kg/m3",
      ]);
    }
    expect(parseUnits("")).toBe(SI);
  });

  it("tokens are recognised by dimension in any order, separated by spaces, commas or semicolons", () => {
    const a = parseUnits("F psig BTU lb");
    const b = parseUnits(" lb;BTU , psig  F ");
    for (const units of [a, b]) {
      expect([units.temperature.symbol, units.pressure.symbol, units.energy.symbol, units.mass.symbol]).toEqual(["F", "psig", "BTU", "lb"]);
    }
  });

  it("case is folded where no other token differs only by case", () => {
    const cases: readonly (readonly [string, string])[] = [
      ["mpa", "MPa"],
      ["KPA", "kPa"],
      ["gpa", "GPa"],
      ["c", "C"],
      ["k", "K"],
      ["Bar", "bar"],
      ["ATM", "atm"],
      ["PSIG", "psig"],
      ["mmhg", "mmHg"],
    ];
    for (const [typed, symbol] of cases) {
      const units = parseUnits(typed);
      expect([units.temperature.symbol, units.pressure.symbol]).toContain(symbol);
    }
    expect(parseUnits("kj/KG").energy.symbol).toBe("kJ");
    expect(parseUnits("btu").energy.symbol).toBe("BTU");
    expect(parseUnits("KWH").energy.symbol).toBe("kWh");
  });

  // Regression units-milli-mega (found and fixed 2026-12-02): case folding read "mPa"
  // (millipascal) as MPa and "Mbar" as mbar, a factor of 10^9 from a typing slip.
  it("refuses a mixed-case token that would swap milli and mega", () => {
    expect(badInput(() => parseUnits("mPa")).message).toMatch(/"mPa" reads as milli-Pa.*write "MPa"/);
    expect(badInput(() => parseUnits("C Mbar")).message).toMatch(/"Mbar" reads as mega-bar.*write "mbar"/);
  });

  it("an unknown token is bad input that names it and lists every accepted token by dimension", () => {
    const error = badInput(() => parseUnits("C furlong"));
    expect(error.message).toContain('unknown unit "furlong"');
    for (const unit of UNIT_TOKENS) expect(error.message).toContain(unit.symbol);
    expect(error.message).toContain(acceptedTokensText());
    expect(acceptedTokensText()).toMatch(/^temperature: K, C, F, R; pressure: Pa, kPa, MPa/);
  });

  it.each([
    ["C F", "temperature", "C", "F"],
    ["bar psi", "pressure", "bar", "psi"],
    ["kJ BTU", "energy", "kJ", "BTU"],
    ["kJ/kg lb", "mass", "kg", "lb"],
    ["barg bar", "pressure", "barg", "bar"],
  ] as const)("two tokens of one dimension (%s) are bad input naming both", (text, dimension, first, second) => {
    const error = badInput(() => parseUnits(text));
    expect(error.message).toContain(`two ${dimension} units`);
    expect(error.message).toContain(first);
    expect(error.message).toContain(second);
  });

  it("the same unit twice, in any spelling, is accepted", () => {
    expect(parseUnits("C degC").temperature.symbol).toBe("C");
    expect(parseUnits("kJ/kg kg").mass.symbol).toBe("kg");
  });
});

describe("round trips and symbols", () => {
  it("fromSI inverts toSI for every token of every dimension", () => {
    const dimensionOf: Record<string, "temperature" | "pressure" | "energy" | "mass" | "density"> = {
      temperature: "temperature",
      pressure: "pressure",
      energy: "energy",
      mass: "mass",
      density: "density",
    };
    for (const unit of UNIT_TOKENS) {
      if (unit.dimension === "amount") continue;
      const units: UnitSystem = parseUnits(unit.symbol);
      const dimension = dimensionOf[unit.dimension]!;
      for (const value of [-40, 0.5, 1, 273.15, 1e5]) {
        expectClose(fromSI(units, dimension, toSI(units, dimension, value)), value, { rel: 1e-13, abs: 1e-10 });
      }
    }
  });

  it("symbols shown back to the user follow the chosen tokens", () => {
    const units = parseUnits("C MPa kJ kg");
    expect(unitSymbol(units, "temperature")).toBe("°C");
    expect(unitSymbol(units, "temperatureDifference")).toBe("°C");
    expect(unitSymbol(units, "pressure")).toBe("MPa");
    expect(unitSymbol(units, "specificEnergy")).toBe("kJ/kg");
    expect(unitSymbol(parseUnits("K"), "temperature")).toBe("K");
    expect(unitSymbol(parseUnits("F"), "temperature")).toBe("°F");
    expect(unitSymbol(SI, "molarMass")).toBe("kg/mol");
    expect(unitSymbol(SI, "dimensionless")).toBe("");
  });
});
