/**
 * The path-energy cell functions (PATHENERGY, PATH, ENDSTATE, ENTHALPY, LATENTHEAT) through the
 * CustomFunctions stub: handbook latent heats, the laws that tie the functions together in the
 * caller's units, and every user error as #VALUE! or #N/A with a message.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { pathEnergy } from "../../core/path";
import { water } from "../../core/substances/water";
import { expectClose } from "../helpers/expect-close";
import { installCustomFunctionsStub, outcome, StubExcelError } from "./excel-stub";

installCustomFunctionsStub();
let f: typeof import("../../functions/index");
beforeAll(async () => {
  f = await import("../../functions/index");
});

function errorOf(value: unknown): StubExcelError {
  expect(value).toBeInstanceOf(StubExcelError);
  return value as StubExcelError;
}

function single(value: unknown): number {
  expect(Array.isArray(value)).toBe(true);
  const cell = (value as unknown[][])[0]![0];
  expect(typeof cell).toBe("number");
  return cell as number;
}

type Row = (string | number)[];

function table(value: unknown): Row[] {
  expect(Array.isArray(value)).toBe(true);
  return value as Row[];
}

const HEADER = ["step", "what happens", "from", "to", "energy", "running total"];

describe("handbook latent heats at one atmosphere", () => {
  // CRC Handbook of Chemistry and Physics (97th edition, 2016), Sec. 6, "Enthalpy of
  // Vaporization" and "Enthalpy of Fusion": water, ΔvapH = 40.65 kJ/mol at the normal boiling
  // point, ΔfusH = 6.01 kJ/mol at the normal melting point. Values from memory. Tolerance: half a
  // unit in the last printed digit, 0.005 kJ/mol. (The handbook's 100 °C and our 99.9743 °C, IF97
  // Eq. (31) at 101.325 kPa, differ in L by 0.0014 kJ/mol, inside that.)
  const VAPORIZATION = 40.65;
  const FUSION = 6.01;
  const HALF_UNIT = 0.005;

  it("LATENTHEAT of vaporization at the normal boiling point is 40.65 kJ/mol", () => {
    const tb = single(f.constant([["water"]], [["Tb"]], "C"));
    expectClose(tb, 99.9743, { abs: 5e-5 });
    expectClose(single(f.latentHeatFn([["water"]], [["vaporization"]], [[tb]], "C kJ mol")), VAPORIZATION, { abs: HALF_UNIT });
  });

  it("LATENTHEAT of fusion at 0 °C is 6.01 kJ/mol", () => {
    expectClose(single(f.latentHeatFn([["H2O"]], [["fusion"]], [[0]], "C kJ mol")), FUSION, { abs: HALF_UNIT });
  });

  it("a PATH of one mole from -10 °C to 110 °C at 1 atm melts with 6.01 kJ and boils with 40.65 kJ", () => {
    const rows = table(f.path("water", 1, -10, 110, 1, "C atm kJ mol"));
    expect(rows[0]).toEqual(HEADER);
    expect(rows.slice(1).map((row) => row[1])).toEqual(["heat ice Ih", "melt", "heat liquid", "boil", "heat vapor"]);
    expectClose(rows[2]![4] as number, FUSION, { abs: HALF_UNIT });
    expectClose(rows[4]![4] as number, VAPORIZATION, { abs: HALF_UNIT });
  });

  it("LATENTHEAT per kilogram equals the PATH's latent rows per kilogram", () => {
    const rows = table(f.path("water", 2, -10, 110, 1.01325, "C bar kJ kg"));
    const melt = rows[2]!;
    const boil = rows[4]!;
    const fusion = single(f.latentHeatFn([["water"]], [["fusion"]], [[melt[2]]], "C kJ kg"));
    const vaporization = single(f.latentHeatFn([["water"]], [["vaporization"]], [[boil[2]]], "C kJ kg"));
    expectClose(melt[4] as number, 2 * fusion, { rel: 1e-9 });
    expectClose(boil[4] as number, 2 * vaporization, { rel: 1e-9 });
  });
});

describe("the functions agree with each other in the caller's units", () => {
  it("PATH's running total ends at PATHENERGY and its energies add up to it", () => {
    for (const [t1, t2, p, units] of [
      [-20, 150, 1.01325, "C bar kJ kg"],
      [150, -20, 1.01325, "C bar kJ kg"],
      [0, 800, 300, "F psia BTU lb"],
      [-60, 30, 0.5, "C mbar kJ kg"],
      [-10, 500, 300, "C bar MJ kg"],
    ] as const) {
      const rows = table(f.path("water", 3, t1, t2, p, units));
      const energy = single(f.pathEnergyFn([["water"]], [[3]], [[t1]], [[t2]], [[p]], units));
      const steps = rows.slice(1);
      expect(steps.map((row) => row[0])).toEqual(steps.map((_, index) => index + 1));
      expect(steps[0]![2]).toBeCloseTo(t1, 9);
      expect(steps[steps.length - 1]![3]).toBeCloseTo(t2, 9);
      expectClose(steps[steps.length - 1]![5] as number, energy, { rel: 1e-12 });
      expectClose(
        steps.reduce((total, row) => total + (row[4] as number), 0),
        energy,
        { rel: 1e-12 },
      );
    }
  });

  it("PATHENERGY converts units and broadcasts a column of masses against a row of start temperatures", () => {
    const result = f.pathEnergyFn([["water"]], [[1], [2.5]], [[-10, 20, 150]], [[120]], [[1.01325]], "C bar kJ kg") as number[][];
    expect(result).toHaveLength(2);
    [1, 2.5].forEach((m, i) => {
      [-10, 20, 150].forEach((t1, j) => {
        const core = pathEnergy(water, m, t1 + 273.15, 120 + 273.15, 1.01325e5) / 1e3;
        expectClose(result[i]![j]!, core, { rel: 1e-12 });
      });
    });
    // 150 °C → 120 °C at 1.01325 bar is cooling vapour: heat is removed.
    expect(result[0]![2]).toBeLessThan(0);
  });

  it("ENDSTATE returns the end of a PATHENERGY, and blank for the fraction outside a phase change", () => {
    for (const [t1, t2] of [
      [-20, 60],
      [-20, 200],
      [200, -20],
      [50, 10],
    ] as const) {
      const heat = single(f.pathEnergyFn([["water"]], [[2]], [[t1]], [[t2]], [[1.01325]], "C bar kJ kg"));
      const rows = table(f.endStateFn("water", 2, t1, heat, 1.01325, "C bar kJ kg"));
      expect(rows).toHaveLength(1);
      expectClose(rows[0]![0] as number, t2, { abs: 1e-9 });
      expect(rows[0]![1]).toBe(t2 < 0 ? "ice Ih" : t2 < 99.97 ? "liquid" : "vapor");
      expect(rows[0]![2]).toBe("");
    }
  });

  it("ENDSTATE inside a phase change gives the phases and the converted fraction", () => {
    const fusion = single(f.latentHeatFn([["water"]], [["fusion"]], [[0]], "C kJ kg"));
    const toMelt = single(f.pathEnergyFn([["water"]], [[1]], [[-10]], [[-0.001]], [[1.01325]], "C bar kJ kg"));
    const rows = table(f.endStateFn("water", 1, -10, toMelt + 0.4 * fusion, 1.01325, "C bar kJ kg"));
    expect(rows[0]![1]).toBe("ice Ih + liquid");
    // The melting point at 101.325 kPa: 273.152519 K, IAPWS R10-06(2009) Table 6 (from the R14-08
    // ice Ih melting curve), i.e. 0.002519 °C; the core inverts R14-08 to 0.0025190798 °C.
    expectClose(rows[0]![0] as number, 0.002519, { abs: 5e-7 });
    // Fusion at 0 °C versus at the 1 atm melting point (+0.0025 °C): L differs by ~1e-5 relative.
    expectClose(rows[0]![2] as number, 0.4, { abs: 1e-4 });
  });

  // IF97 Table 5 (h = 0.115331273e3 kJ/kg at 300 K, 3 MPa) and R10-06(2009) Table 6
  // (h = -0.483491635676e6 J/kg at 100 K, 100 MPa), both to half a unit of the last printed digit;
  // molar values with M = 18.015268 g/mol (IAPWS-95).
  it("ENTHALPY gives the release check values in the caller's units", () => {
    expectClose(single(f.enthalpy([["water"]], [[300]], [[3]], "K MPa kJ kg")), 115.331273, { abs: 5e-7 });
    expectClose(single(f.enthalpy([["water"]], [[100]], [[100]], "K MPa kJ kg")), -483.491635676, { abs: 5e-10 });
    expectClose(single(f.enthalpy([["water"]], [[300]], [[30]], "K bar kJ mol")), 0.115331273 * 18.015268, { abs: 1e-8 });
    const spread = f.enthalpy([["water"]], [[-10], [25], [150]], [[1.01325]], "C bar kJ kg") as number[][];
    expect(spread.map((row) => Math.sign(row[0]!))).toEqual([-1, 1, 1]);
  });

  it("ENTHALPY differences are PATHENERGY per kilogram when no end sits on a phase change", () => {
    const h = f.enthalpy([["water"]], [[-10, 150]], [[1.01325]], "C bar kJ kg") as number[][];
    const energy = single(f.pathEnergyFn([["water"]], [[1]], [[-10]], [[150]], [[1.01325]], "C bar kJ kg"));
    expectClose(h[0]![1]! - h[0]![0]!, energy, { rel: 1e-12 });
  });

  it("PATH from T to T says there is nothing to do", () => {
    const rows = table(f.path("water", 1, 20, 20, 1, "C bar"));
    expect(rows).toEqual([HEADER, [0, "no change (T1 equals T2)", 20, 20, 0, 0]]);
  });
});

describe("errors a user can cause", () => {
  const cases: [string, () => unknown, string, RegExp][] = [
    ["negative mass", () => f.pathEnergyFn([["water"]], [[-1]], [[250]], [[300]], [[101325]]), "#VALUE!", /mass -1 kg is not above zero/],
    ["zero mass", () => f.path("water", 0, 250, 300, 101325), "#VALUE!", /mass 0 kg is not above zero/],
    ["zero mass in ENDSTATE", () => f.endStateFn("water", 0, 250, 1000, 101325), "#VALUE!", /not above zero/],
    ["text mass", () => f.pathEnergyFn([["water"]], [["one"]], [[250]], [[300]], [[101325]]), "#VALUE!", /mass is text "one"/],
    ["mass with its unit typed in", () => f.path("water", "5 kg", 250, 300, 101325), "#VALUE!", /put the number alone/],
    ["empty mass", () => f.endStateFn("water", null, 250, 1000, 101325), "#VALUE!", /mass is empty/],
    ["text T1", () => f.pathEnergyFn([["water"]], [[1]], [["cold"]], [[300]], [[101325]]), "#VALUE!", /T1 is text "cold"/],
    ["empty T2", () => f.path("water", 1, 250, null, 101325), "#VALUE!", /T2 is empty/],
    ["T2 below absolute zero", () => f.pathEnergyFn([["water"]], [[1]], [[20]], [[-300]], [[1]], "C bar"), "#VALUE!", /end temperature -300 °C is at or below absolute zero/],
    ["T1 below absolute zero", () => f.endStateFn("water", 1, -5, 1000, 101325), "#VALUE!", /start temperature -5 K/],
    ["T2 beyond IF97", () => f.pathEnergyFn([["water"]], [[1]], [[300]], [[3000]], [[101325]]), "#VALUE!", /2273.15 K/],
    ["NaN heat", () => f.endStateFn("water", 1, 250, Number.NaN, 101325), "#VALUE!", /heat is not a finite number/],
    ["zero pressure", () => f.path("water", 1, 250, 300, 0), "#VALUE!", /not above zero \(absolute\)/],
    ["a range where one cell belongs", () => f.path("water", [[1], [2]], 250, 300, 101325), "#VALUE!", /mass must be one cell/],
    ["unknown substance", () => f.path("steam table", 1, 250, 300, 101325), "#VALUE!", /unknown substance/],
    ["unknown unit", () => f.pathEnergyFn([["water"]], [[1]], [[250]], [[300]], [[1]], "C bar kcals"), "#VALUE!", /unknown unit "kcals"/],
    [
      "a path through ice III",
      () => f.pathEnergyFn([["water"]], [[1]], [[240]], [[250]], [[300]], "K MPa"),
      "#N/A",
      /no enthalpy model for ice III: IAPWS publishes a Gibbs function only for ice Ih \(R10-06\)/,
    ],
    ["PATH through ice V", () => f.path("water", 1, 250, 260, 500, "K MPa"), "#N/A", /no enthalpy model for ice V.*Gibbs function/],
    ["ENTHALPY of ice VI", () => f.enthalpy([["water"]], [[300]], [[1500]], "K MPa"), "#N/A", /ice VI.*Gibbs function/],
    ["ENDSTATE in ice III", () => f.endStateFn("water", 1, 240, 1000, 300, "K MPa kJ kg"), "#N/A", /Gibbs function/],
    [
      "liquid beyond 100 MPa",
      () => f.pathEnergyFn([["water"]], [[1]], [[300]], [[350]], [[150]], "K MPa"),
      "#VALUE!",
      /outside the IAPWS-IF97 range: liquid is covered up to 100 MPa/,
    ],
    ["ENTHALPY of liquid at 1500 bar", () => f.enthalpy([["water"]], [[25]], [[1500]], "C bar"), "#VALUE!", /IAPWS-IF97 range/],
    ["vapour below 200 K", () => f.path("water", 1, 150, 300, 0.01), "#VALUE!", /runs through vapor water from .* beyond the range its enthalpy model covers on this isobar \(200 K to 2273.15 K/],
    [
      "more heat than the models reach",
      () => f.endStateFn("water", 1, 300, 1e8, 101325),
      "#VALUE!",
      /that much heat added takes water above 2273.15 K, where its enthalpy models stop/,
    ],
    ["more heat, in °C and kJ", () => f.endStateFn("water", 1, 20, 1e5, 1.01325, "C bar kJ kg"), "#VALUE!", /above 2000 °C/],
    ["more heat removed than the models reach", () => f.endStateFn("water", 1, 300, -1e8, 101325), "#VALUE!", /below 1 K/],
    ["unknown transition", () => f.latentHeatFn([["water"]], [["condensation"]], [[300]]), "#VALUE!", /unknown transition "condensation": use fusion, vaporization or sublimation/],
    ["empty transition", () => f.latentHeatFn([["water"]], [[null]], [[300]]), "#VALUE!", /transition is empty/],
    [
      "vaporization above Tc",
      () => f.latentHeatFn([["water"]], [["vaporization"]], [[400]], "C"),
      "#N/A",
      /400 °C is above the critical temperature of water \(373.946 °C\)/,
    ],
    ["vaporization below the triple point", () => f.latentHeatFn([["water"]], [["vaporization"]], [[250]]), "#N/A", /ask for sublimation/],
    ["sublimation above the triple point", () => f.latentHeatFn([["water"]], [["sublimation"]], [[280]]), "#N/A", /ask for fusion or vaporization/],
    [
      "fusion below 251.165 K",
      () => f.latentHeatFn([["water"]], [["fusion"]], [[251]]),
      "#N/A",
      /below the lowest melting temperature of water \(251.165 K, IAPWS R14-08\(2011\)\)/,
    ],
    ["fusion where the liquid is beyond 100 MPa", () => f.latentHeatFn([["water"]], [["fusion"]], [[255]]), "#VALUE!", /IAPWS-IF97 range/],
    // p_s(300 K) as the core evaluates IF97 Eq. (30) (Table 35 prints 0.353658941e-2 MPa), so the
    // state lies exactly on the boiling curve.
    ["ENTHALPY exactly on the boiling curve", () => f.enthalpy([["water"]], [[300]], [[3536.5894130130105]]), "#N/A", /coexistence curve/],
  ];
  it.each(cases)("%s", (_name, call, code, message) => {
    const error = errorOf(outcome(call));
    expect(error.code).toBe(code);
    expect(error.message).toMatch(message);
  });

  it("a spilled ENTHALPY keeps good elements and marks failing ones with their own error", () => {
    const result = f.enthalpy([["water"]], [[250], [240], ["x"]], [[101325], [300e6], [101325]]) as unknown[][];
    expect(typeof result[0]![0]).toBe("number");
    expect(errorOf(result[1]![0]).code).toBe("#N/A");
    expect(errorOf(result[2]![0]).code).toBe("#VALUE!");
  });

  it("never lets anything else escape, whatever is typed", () => {
    const junk: unknown[] = [null, "", "water", 0, -1, 1e308, Number.NaN, true, { type: "Entity" }, [[1, 2], [3]], [[273.16]], [[611.657]]];
    const calls: ((a: unknown, b: unknown, units: unknown) => unknown)[] = [
      (a, b, units) => f.pathEnergyFn([["water"]], a as any, b as any, [[300]], a as any, units),
      (a, b, units) => f.path("water", b, a, 300, b, units),
      (a, b, units) => f.endStateFn("water", 1, a, b, 101325, units),
      (a, b, units) => f.enthalpy([["water"]], a as any, b as any, units),
      (a, b, units) => f.latentHeatFn([["water"]], a as any, b as any, units),
    ];
    let count = 0;
    for (const call of calls) {
      for (const a of junk) {
        for (const b of junk) {
          for (const units of [null, "C bar kJ kg", "nonsense"]) {
            count++;
            const result = outcome(() => call(a, b, units));
            // An "internal" message means something other than a typed core error got through.
            if (result instanceof StubExcelError) {
              expect(result.message.length).toBeGreaterThan(10);
              expect(result.message).not.toMatch(/internal/);
              continue;
            }
            for (const row of result as unknown[][]) {
              for (const cell of row) {
                if (cell instanceof StubExcelError) expect(cell.message).toMatch(/^(?!.*internal).{11,}/);
                else expect(["number", "string"]).toContain(typeof cell);
                if (typeof cell === "number") expect(Number.isFinite(cell)).toBe(true);
              }
            }
          }
        }
      }
    }
    expect(count).toBe(5 * 12 * 12 * 3);
  });
});
