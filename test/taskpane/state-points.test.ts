import { describe, expect, it } from "vitest";
import { statePointsFromSelection } from "../../taskpane/data/state-points";
import { expectClose } from "../helpers/expect-close";

// Conversion factors: 0 °C = 273.15 K (ITS-90), 1 bar = 1e5 Pa, 1 psi = 6894.757293168 Pa,
// gauge pressures relative to 101325 Pa (all exact by definition).
describe("state points from a selected range", () => {
  it("reads a two-column temperature and pressure range in the display units, skipping a header", () => {
    const values = [
      ["T", "p"],
      [-40, 0.0012],
      [20, 1.01325],
      ["", ""],
    ];
    const reading = statePointsFromSelection(values, values, "C bar");
    expect(reading.points).toHaveLength(2);
    expectClose(reading.points[0]!.temperatureK, 233.15, { abs: 1e-12 });
    expectClose(reading.points[0]!.pressurePa, 120, { rel: 1e-12 });
    expect(reading.points[1]!.label).toBe("row 3");
    expect(reading.notes).toEqual([]);
  });

  it("says so when no row has two numbers", () => {
    const values = [["water", "ice"]];
    expect(statePointsFromSelection(values, values, "K Pa").notes[0]).toMatch(/no row holds/);
  });
});

describe("state points from PHASE formulas", () => {
  it("reads temperature, pressure and units written in STATE, MARGIN and ENTHALPY calls", () => {
    const formulas = [
      ['=PHASE.STATE("water", -38, 0.3, "C mbar", TRUE)', '=PHASE.MARGIN("R-744", 20, 60, "C bar")'],
      ['=_xldudf_PHASE_ENTHALPY("water", 200, 6, "C barg kJ kg")', "=1+1"],
    ];
    const values = [
      ["ice Ih", 1.2],
      [2845.2, 2],
    ];
    const reading = statePointsFromSelection(values, formulas, "K Pa");
    expect(reading.points.map((p) => p.substance)).toEqual(["water", "R-744", "water"]);
    expectClose(reading.points[0]!.temperatureK, 235.15, { abs: 1e-12 });
    expectClose(reading.points[0]!.pressurePa, 30, { rel: 1e-12 });
    expectClose(reading.points[1]!.pressurePa, 60e5, { rel: 1e-12 });
    expectClose(reading.points[2]!.pressurePa, 6e5 + 101325, { rel: 1e-12 });
  });

  it("uses SI when the units are left out", () => {
    const reading = statePointsFromSelection([[0]], [['=PHASE.STATE("water", 300, 101325)']], "C bar");
    expect(reading.points[0]).toMatchObject({ temperatureK: 300, pressurePa: 101325 });
  });

  it("explains formulas it cannot read instead of guessing", () => {
    const reading = statePointsFromSelection(
      [[0, 0, 0]],
      [['=PHASE.STATE("water", A2, B2, "C bar")', '=PHASE.STATE("water", 20, 1, $D$1)', '=PHASE.STATE("water", 20, 1, "C bars")']],
      "K Pa",
    );
    expect(reading.points).toEqual([]);
    expect(reading.notes[0]).toMatch(/not numbers written in the formula/);
    expect(reading.notes[1]).toMatch(/units argument is not written in the formula/);
    expect(reading.notes[2]).toMatch(/unknown unit "bars"/);
  });

  it("refuses a huge selection without reading it", () => {
    const row = new Array<number>(100).fill(1);
    const values = new Array(60).fill(row);
    expect(statePointsFromSelection(values, values, "K Pa").notes[0]).toMatch(/6000 cells/);
  });
});
