import { beforeAll, describe, expect, it } from "vitest";
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

function single(value: unknown): unknown {
  expect(Array.isArray(value)).toBe(true);
  return (value as unknown[][])[0]![0];
}

describe("check values through the cell functions", () => {
  // IAPWS-IF97 (IAPWS R7-97(2012)) Table 35, p_s from Eq. (30), printed to 9 significant digits.
  it.each([
    [300, 0.00353658941],
    [500, 2.63889776],
    [600, 12.3443146],
  ])("SATPRESSURE of water at %s K is %s MPa (IF97 Table 35)", (temperatureK, pressureMPa) => {
    expectClose(single(f.satPressure([["water"]], [[temperatureK]], "K MPa")) as number, pressureMPa, { rel: 5e-9 });
  });

  // IAPWS-IF97 Table 36, T_s from Eq. (31), printed to 9 significant digits.
  it.each([
    [0.1, 372.755919],
    [1, 453.035632],
    [10, 584.149488],
  ])("SATTEMP of water at %s MPa is %s K (IF97 Table 36)", (pressureMPa, temperatureK) => {
    expectClose(single(f.satTemp([["H2O"]], [[pressureMPa]], "MPa")) as number, temperatureK, { rel: 5e-9 });
  });

  // IAPWS R14-08(2011) verification values, printed to 6 significant digits: tolerance is half a
  // unit in the last printed digit.
  it("MELTPRESSURE and SATPRESSURE match the R14-08(2011) check values in MPa", () => {
    expectClose(single(f.satPressure([["water"]], [[230]], "MPa")) as number, 8.94735e-6, { abs: 5e-12 });
    expectClose(single(f.meltPressure([["water"]], [[260]], "MPa")) as number, 138.268, { abs: 5e-4 });
    expectClose(single(f.meltPressure([["water"]], [[254]], "MPa", [["ice III"]])) as number, 268.685, { abs: 5e-4 });
    expectClose(single(f.meltPressure([["water"]], [[265]], "MPa", [["ice V"]])) as number, 479.64, { abs: 5e-3 });
    expectClose(single(f.meltPressure([["water"]], [[320]], "MPa")) as number, 1356.76, { abs: 5e-3 });
    expectClose(single(f.meltPressure([["water"]], [[550]], "MPa")) as number, 6308.71, { abs: 5e-3 });
  });

  it("converts units both ways: °F and psia, psig relative to 101.325 kPa", () => {
    // IF97 Table 36: T_s(1 MPa) = 453.035632 K; 1 psi = 6894.757293168 Pa (NIST SP 811 App. B).
    const psia = 1e6 / 6894.757293168361;
    const fahrenheit = (453.035632 * 9) / 5 - 459.67;
    expectClose(single(f.satTemp([["water"]], [[psia]], "F psia")) as number, fahrenheit, { abs: 2e-6 });
    expectClose(single(f.satTemp([["water"]], [[psia - 14.695948775513449]], "F psig")) as number, fahrenheit, {
      abs: 2e-6,
    });
  });

  it("CONSTANT answers in the caller's units (IF97 Eqs. (2)–(4), (9); IAPWS-95 molar mass)", () => {
    const values = f.constant([["water"]], [["Tc"], ["Pc"], ["rhoc"], ["Tt"], ["Pt"], ["M"]], "C bar g/cm3 g mol") as number[][];
    expectClose(values[0]![0]!, 647.096 - 273.15, { abs: 1e-12 });
    expectClose(values[1]![0]!, 220.64, { rel: 1e-15 });
    expectClose(values[2]![0]!, 0.322, { rel: 1e-15 });
    expectClose(values[3]![0]!, 0.01, { abs: 1e-12 });
    expectClose(values[4]![0]!, 0.00611657, { rel: 1e-15 });
    expectClose(values[5]![0]!, 18.015268, { rel: 1e-15 });
  });
});

describe("phase words", () => {
  it("names the phases of the design", () => {
    // Common practice: water at 25 °C and 1 atm is liquid, at 150 °C and 1 atm vapor, ice at
    // -10 °C and 1 atm; above 374 °C it is gas below 220.64 bar and supercritical fluid above.
    const words = f.state([["water"]], [[25], [150], [-10], [500], [500]], [[1.01325], [1.01325], [1.01325], [100], [300]], "C bar");
    expect(words).toEqual([["liquid"], ["vapor"], ["solid"], ["gas"], ["supercritical fluid"]]);
  });

  it("gives finer labels with detail TRUE", () => {
    const words = f.state([["water"]], [[25, 150, -10, -13]], [[1.01325, 1.01325, 1.01325, 4000]], "C bar", true);
    // ice V at 260 K and 400 MPa: between the ice Ih (138.268 MPa) and ice V (402.58 MPa at 260 K)
    // melting pressures lies the liquid; at -13 °C = 260.15 K and 400 MPa the state is liquid.
    expect(words).toEqual([["compressed liquid", "superheated vapor", "ice Ih", "compressed liquid"]]);
    expect(f.state([["water"]], [[-20]], [[5000]], "C bar", true)).toEqual([["ice V"]]);
  });
});

describe("broadcasting", () => {
  it("pairs a column with a row into a table", () => {
    const result = f.satPressure([["water"]], [[20], [60], [100]], "C kPa") as number[][];
    expect(result.length).toBe(3);
    const table = f.state([["water"]], [[20], [120]], [[10, 300]], "C kPa") as string[][];
    // IF97 Eq. (30): p_s(20 °C) = 2.34 kPa, p_s(120 °C) = 198.7 kPa.
    expect(table).toEqual([
      ["liquid", "liquid"],
      ["vapor", "liquid"],
    ]);
  });

  it("keeps good elements and marks failing ones with their own error", () => {
    const result = f.satPressure([["water"]], [[100], [400], ["hot"]], "C bar") as unknown[][];
    expect(typeof result[0]![0]).toBe("number");
    expect(errorOf(result[1]![0]).code).toBe("#N/A");
    expect(errorOf(result[2]![0]).code).toBe("#VALUE!");
    expect(errorOf(result[2]![0]).message).toMatch(/temperature is text "hot"/);
  });

  it("rejects ranges whose shapes do not fit", () => {
    const error = errorOf(outcome(() => f.state([["water"]], [[1, 2, 3]], [[1, 2]], "C bar")));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(/does not fit/);
  });
});

describe("errors a user can cause", () => {
  const cases: [string, () => unknown, string, RegExp][] = [
    ["unknown substance", () => f.satPressure([["watter"]], [[300]]), "#VALUE!", /unknown substance "watter".*"water"/],
    ["unknown unit", () => f.satPressure([["water"]], [[300]], "K bars"), "#VALUE!", /unknown unit "bars".*pressure: Pa/],
    ["two temperature units", () => f.satPressure([["water"]], [[300]], "C F"), "#VALUE!", /two temperature units/],
    ["text for a number", () => f.satPressure([["water"]], [["warm"]]), "#VALUE!", /text "warm"/],
    ["empty temperature", () => f.satPressure([["water"]], [[null]]), "#VALUE!", /empty/],
    ["boolean for a number", () => f.satPressure([["water"]], [[true]]), "#VALUE!", /TRUE/],
    ["NaN", () => f.satPressure([["water"]], [[Number.NaN]]), "#VALUE!", /not a finite number/],
    ["negative kelvin", () => f.satPressure([["water"]], [[-5]]), "#VALUE!", /-5 K is at or below absolute zero/],
    ["below absolute zero in °C", () => f.state([["water"]], [[-280]], [[1]], "C bar"), "#VALUE!", /-280 °C/],
    ["zero pressure", () => f.satTemp([["water"]], [[0]]), "#VALUE!", /not above zero/],
    ["vacuum below absolute zero in barg", () => f.satTemp([["water"]], [[-1.2]], "C barg"), "#VALUE!", /-1.2 barg is not above zero/],
    ["above the critical temperature", () => f.satPressure([["water"]], [[380]], "C bar"), "#N/A", /380 °C is above the critical temperature of water \(373.946 °C\)/],
    ["above the critical pressure", () => f.satTemp([["water"]], [[250]], "C bar"), "#N/A", /above the critical pressure/],
    ["melting below the triple-point pressure", () => f.meltTemp([["water"]], [[0.2]], "C kPa"), "#N/A", /0.2 kPa is below the triple-point pressure of water \(0.611657 kPa\)/],
    ["below the sublimation range", () => f.satPressure([["water"]], [[40]]), "#VALUE!", /outside the water ice Ih sublimation curve \(50 K to 273.16 K, IAPWS R14-08\(2011\)\)/],
    ["above the melting curves", () => f.meltPressure([["water"]], [[800]]), "#VALUE!", /above the highest temperature.*715 K/],
    ["a form that does not melt there", () => f.meltPressure([["water"]], [[300]], "K", [["ice III"]]), "#N/A", /ice III melting curve/],
    ["an unknown form", () => f.meltPressure([["water"]], [[300]], "K", [["ice IX"]]), "#VALUE!", /ice Ih, ice III, ice V, ice VI, ice VII/],
    ["unknown constant", () => f.constant([["water"]], [["Tcrit"]]), "#VALUE!", /unknown constant "Tcrit"/],
    ["a range for units", () => f.satTemp([["water"]], [[1]], [["C", "bar"]]), "#VALUE!", /units must be one cell/],
    ["above the covered temperature", () => f.state([["water"]], [[3000]], [[1e5]]), "#VALUE!", /2273.15 K, IAPWS-IF97/],
    ["unknown source quantity", () => f.source("water", "viscosity"), "#VALUE!", /no source entry for "viscosity"/],
    ["bad detail flag", () => f.state([["water"]], [[300]], [[1e5]], "", "maybe"), "#VALUE!", /TRUE or FALSE/],
  ];
  it.each(cases)("%s", (_name, call, code, message) => {
    const error = errorOf(outcome(call));
    expect(error.code).toBe(code);
    expect(error.message).toMatch(message);
  });

  it("never lets anything else escape, whatever is typed", () => {
    const junk: unknown[] = [
      null,
      undefined,
      "",
      " ",
      "water",
      "1e400",
      0,
      -0,
      1e308,
      -1e308,
      Number.NaN,
      Number.POSITIVE_INFINITY,
      true,
      false,
      { type: "Entity", text: "x" },
      [[]],
      [[1, 2], [3]],
      [["water", "ice"]],
      [[273.16]],
      [[611.657]],
    ];
    const functions: ((...args: any[]) => unknown)[] = [
      f.state,
      f.satPressure,
      f.satTemp,
      f.meltTemp,
      f.meltPressure,
      f.constant,
      f.source,
    ];
    let calls = 0;
    for (const fn of functions) {
      for (const a of junk) {
        for (const b of junk) {
          for (const c of [null, "C bar", "K Pa", 7, "nonsense"]) {
            calls++;
            const result = outcome(() => fn(a, b, b, c, a));
            if (result instanceof StubExcelError) {
              expect(result.message.length).toBeGreaterThan(10);
              continue;
            }
            expect(Array.isArray(result)).toBe(true);
            for (const row of result as unknown[][]) {
              for (const cell of row) {
                if (cell instanceof StubExcelError) expect(cell.message.length).toBeGreaterThan(10);
                else expect(["number", "string"]).toContain(typeof cell);
                if (typeof cell === "number") expect(Number.isFinite(cell)).toBe(true);
              }
            }
          }
        }
      }
    }
    expect(calls).toBe(7 * 20 * 20 * 5);
  });
});

describe("tables", () => {
  it("SUBSTANCES lists water with its identity and grade", () => {
    const rows = f.substances() as string[][];
    expect(rows[0]).toEqual(["substance", "formula", "CAS", "refrigerant", "accepted names", "grade", "constants", "hazards"]);
    expect(rows[1]!.slice(0, 4)).toEqual(["water", "H2O", "7732-18-5", "R-718"]);
    expect(rows[1]![5]).toBe("reference");
  });

  it("SOURCE names the publication behind a quantity", () => {
    const rows = f.source("R-718", "boiling") as string[][];
    expect(rows[0]).toEqual(["quantity", "model", "grade", "source", "validity", "uncertainty"]);
    expect(rows[1]![0]).toBe("boiling curve");
    expect(rows[1]![3]).toMatch(/IAPWS R7-97\(2012\)/);
    expect(rows[1]![5]).toMatch(/0.0069 %/);
    const melting = f.source("water", "melting") as string[][];
    expect(melting.length).toBe(1 + 5);
    const all = f.source("water") as string[][];
    expect(all.length).toBeGreaterThan(10);
  });
});
