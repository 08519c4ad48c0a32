/**
 * A PHASE.PATH table read back from the workbook: the cell function's own output, parsed, must
 * give exactly the chart data the pane builds from core's steps (no recomputation, no drift);
 * anything that is not such a table is named, not drawn; units come from the formula.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { isobaricPath } from "../../core/path";
import { findSubstance } from "../../core/substances/registry";
import { parseUnits, toSI } from "../../core/units/units";
import { chartFromSteps, NO_CHANGE_NOTE } from "../../taskpane/data/path-chart";
import {
  chartFromTable,
  looksLikePathTable,
  PATH_HEADER,
  selectionView,
  unitsFromFormula,
  unitsText,
} from "../../taskpane/data/path-table";
import { installCustomFunctionsStub } from "../functions/excel-stub";

installCustomFunctionsStub();
let f: typeof import("../../functions/index");
beforeAll(async () => {
  f = await import("../../functions/index");
});

const water = findSubstance("water");

/** The spilled values of PHASE.PATH, as Excel would hand them back. */
function pathTable(t1: number, t2: number, pressure: number, units: string): unknown[][] {
  return f.path([["water"]], [[1]], [[t1]], [[t2]], [[pressure]], [[units]]) as unknown[][];
}

describe("a PHASE.PATH table becomes chart data", () => {
  it.each([
    ["heating, °C bar kJ", -20, 120, 1.01325, "C bar kJ kg"],
    ["cooling, °C bar kJ", 120, -20, 1.01325, "C bar kJ kg"],
    ["heating, °F psi BTU", -4, 248, 14.6959, "F psi BTU lb"],
    ["through the critical temperature above the critical pressure, SI", 700, 250, 30e6, "K Pa"],
  ])("%s: same as from core's steps", (_, t1, t2, pressure, units) => {
    const system = parseUnits(units);
    const table = pathTable(t1, t2, pressure, units);
    const reading = chartFromTable(table, units);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    const steps = isobaricPath(
      water,
      toSI(system, "mass", 1),
      toSI(system, "temperature", t1),
      toSI(system, "temperature", t2),
      toSI(system, "pressure", pressure),
    );
    expect(reading.data).toEqual(chartFromSteps(steps, system));
    // x of each step's end is the table's own running-total cell.
    expect(reading.data.segments.map((s) => s.endTotal)).toEqual(table.slice(1).map((row) => row[5]));
  });

  it("reads the no-change row as nothing to draw", () => {
    const reading = chartFromTable(pathTable(20, 20, 1, "C bar kJ"), "C bar kJ");
    expect(reading).toEqual({ ok: true, data: { segments: [], temperatureUnit: "°C", energyUnit: "kJ", note: NO_CHANGE_NOTE } });
  });

  it("leaves unit symbols out when the units are unknown", () => {
    const reading = chartFromTable(pathTable(-20, 120, 1.01325, "C bar kJ"), null);
    expect(reading.ok && [reading.data.temperatureUnit, reading.data.energyUnit]).toEqual(["", ""]);
  });

  it("accepts blank rows below the table and extra columns beside it", () => {
    const table = pathTable(-20, 120, 1.01325, "C bar kJ").map((row) => [...row, ""]);
    const padded = [...table, ["", "", "", "", "", "", ""], [null, null, null, null, null, null, null]];
    const reading = chartFromTable(padded, "C bar kJ");
    expect(reading.ok && reading.data.segments.length).toBe(5);
  });

  it("knows the header whatever its case", () => {
    expect(looksLikePathTable([PATH_HEADER.map((w) => w.toUpperCase())])).toBe(true);
    expect(looksLikePathTable([["step", "what happens", "from", "to", "energy"]])).toBe(false);
    expect(looksLikePathTable([])).toBe(false);
  });

  it("names what is wrong instead of drawing a damaged table", () => {
    const good = pathTable(-20, 120, 1.01325, "C bar kJ");
    const withCell = (row: number, column: number, value: unknown) =>
      good.map((r, i) => (i === row ? r.map((c, j) => (j === column ? value : c)) : r));
    const reason = (values: unknown[][]) => {
      const reading = chartFromTable(values, "C bar kJ");
      return reading.ok ? "ok" : reading.reason;
    };
    expect(reason(good.slice(1))).toMatch(/not the PHASE.PATH header/);
    expect(reason(good.slice(0, 1))).toBe("the table has a header but no steps");
    expect(reason(withCell(2, 2, "#VALUE!"))).toBe('row 3 has no number under "from"');
    expect(reason(withCell(3, 5, ""))).toBe('row 4 has no number under "running total"');
    expect(reason(withCell(1, 1, ""))).toBe('row 2 has no text under "what happens"');
    expect(reason([good[0]!, ...good.slice(2)])).toMatch(/^row 2 is step 2, not 1/);
    expect(reason([...good.slice(0, 3), ["", "", "", "", "", ""], ...good.slice(3)])).toMatch(/^row 5 follows a blank row/);
  });
});

describe("units from the formula that spilled the table", () => {
  it.each([
    ['=PHASE.PATH("water",1,-20,120,1.01325,"C bar kJ kg")', { kind: "text", text: "C bar kJ kg" }],
    ['=PHASEDEV.PATH("water", 1, -20, 120, 1.01325, "F psi BTU lb")', { kind: "text", text: "F psi BTU lb" }],
    ['=_xldudf_PHASE_PATH("water",1,253.15,393.15,101325)', { kind: "default" }],
    ['=PHASE.PATH("water",1,253.15,393.15,101325,)', { kind: "default" }],
    ["=PHASE.PATH(A2,B2,C2,D2,E2,F2)", { kind: "reference", reference: "F2" }],
    ["=PHASE.PATH(A2,B2,C2,D2,E2,$F$2)", { kind: "reference", reference: "$F$2" }],
    ["=PHASE.PATH(A2,B2,C2,D2,E2,Inputs!F2)", { kind: "reference", reference: "Inputs!F2" }],
    ["=PHASE.PATH(A2,B2,C2,D2,E2,'Site data'!F2)", { kind: "reference", reference: "'Site data'!F2" }],
    ['=PHASE.PATH("water",MAX(1,2),-20,IF(A1>0,120,100),1,"C bar")', { kind: "text", text: "C bar" }],
    ['=PHASE.PATH("wa""ter",1,-20,120,1,"C, bar")', { kind: "text", text: "C, bar" }],
    ['=PHASE.PATH("water",1,-20,120,1,A1&" bar")', { kind: "unknown" }],
    ['=PHASE.PATHENERGY("water",1,-20,120,1,"C bar")', { kind: "unknown" }],
    ['=PHASE.PATH("water",1,-20,120)', { kind: "unknown" }],
    ["=A1:F6", { kind: "unknown" }],
    ["step", { kind: "unknown" }],
    [undefined, { kind: "unknown" }],
  ])("%s", (formula, expected) => {
    expect(unitsFromFormula(formula)).toEqual(expected);
  });

  it("turns a source and the referenced cell into a units text", () => {
    expect(unitsText({ kind: "text", text: "C bar" })).toBe("C bar");
    expect(unitsText({ kind: "default" })).toBe("");
    expect(unitsText({ kind: "reference", reference: "F2" }, "F psi")).toBe("F psi");
    // An empty units cell means SI, as in the cell function.
    expect(unitsText({ kind: "reference", reference: "F2" }, null)).toBe("");
    expect(unitsText({ kind: "reference", reference: "F2" }, 3)).toBeNull();
    expect(unitsText({ kind: "unknown" })).toBeNull();
  });
});

describe("what the pane says about a selection", () => {
  it("draws a PATH table, names anything else", () => {
    const table = pathTable(-20, 120, 1.01325, "C bar kJ");
    const view = selectionView("Sheet1!B2:G7", table, "C bar kJ");
    expect(view.kind).toBe("path");
    expect(view.kind === "path" && view.data.segments.length).toBe(5);
    expect(selectionView("Sheet1!A1", [[42]], null)).toEqual({ kind: "none", address: "Sheet1!A1" });
    expect(selectionView("Sheet1!B2:G2", table.slice(0, 1), null)).toEqual({
      kind: "invalid",
      address: "Sheet1!B2:G2",
      reason: "the table has a header but no steps",
    });
  });
});

describe("a selected PATH on the phase diagram", () => {
  it("reads the isobar's pressure from the formula and the phase changes from the table", async () => {
    const { isobarFromFormula, isobarOverlay, selectionView } = await import("../../taskpane/data/path-table");
    // 1.01325 bar = 101325 Pa exactly (1 bar = 1e5 Pa); 0 °C = 273.15 K (ITS-90).
    expect(isobarFromFormula('=PHASE.PATH("water",1,-20,120,1.01325,"C bar kJ kg")')).toBeCloseTo(101325, 9);
    expect(isobarFromFormula('=PHASE.PATH("water",1,-20,120,B4,"C bar kJ kg")')).toBeUndefined();
    expect(isobarFromFormula('=PHASE.PATH("water",1,250,300,611.657)')).toBe(611.657);
    const table = [
      ["step", "what happens", "from", "to", "energy", "running total"],
      [1, "heat ice Ih", -20, 0.0025, 40.5, 40.5],
      [2, "melt", 0.0025, 0.0025, 333.4, 373.9],
      [3, "heat liquid", 0.0025, 20, 83.7, 457.6],
    ];
    const view = { ...selectionView("Sheet1!A1:F4", table, "C bar kJ kg"), pressurePa: 101325 };
    const overlay = isobarOverlay(view)!;
    expect(overlay.pressurePa).toBe(101325);
    expect(overlay.fromK).toBeCloseTo(253.15, 10);
    expect(overlay.toK).toBeCloseTo(293.15, 10);
    expect(overlay.crossingsK).toHaveLength(1);
    expect(overlay.crossingsK[0]).toBeCloseTo(273.1525, 10);
    expect(isobarOverlay(selectionView("Sheet1!A1:F4", table, null))).toBeUndefined();
  });
});
