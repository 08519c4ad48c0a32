/**
 * Reading a selected PHASE.PATH result through the Excel API, with office-addin-mock's
 * OfficeMockObject standing in for Excel: load and sync are honoured (a property read without
 * them is the mock's "not loaded" text), the spill of a single selected cell is followed, the
 * units come from the formula (or the cell it points at), and a selection change reaches the pane.
 * The table values are the cell function's own output.
 */
import { OfficeMockObject } from "office-addin-mock";
import { beforeAll, describe, expect, it } from "vitest";
import { chartFromTable } from "../../taskpane/data/path-table";
import { readSelectedPath, readSelectedStatePoints, watchSelection, type ExcelRunner } from "../../taskpane/office-selection";
import { installCustomFunctionsStub } from "../functions/excel-stub";

installCustomFunctionsStub();
let f: typeof import("../../functions/index");
beforeAll(async () => {
  f = await import("../../functions/index");
});

/** What office-addin-mock leaves in a property that was read without load and sync. */
const NOT_LOADED = "Error, property was not loaded";

type Values = unknown[][];

/** A range as the mock's seed: scalars to load, methods that hand out other ranges. */
interface RangeSeed {
  address: string;
  rowCount: number;
  columnCount: number;
  values: Values;
  formulas: Values;
  [method: string]: unknown;
}

function rangeSeed(address: string, values: Values, formulas?: Values): RangeSeed {
  return {
    address,
    rowCount: values.length,
    columnCount: values[0]?.length ?? 0,
    values,
    formulas: formulas ?? values,
  };
}

/** Builds the mock Excel namespace around a workbook seed; `run` returns what the batch returns. */
function mockExcel(workbook: Record<string, unknown>): OfficeMockObject & ExcelRunner {
  const excel = new OfficeMockObject({
    context: { workbook },
    run: async function (this: { context: unknown }, batch: (context: unknown) => Promise<unknown>) {
      return await batch(this.context);
    },
  });
  return excel as unknown as OfficeMockObject & ExcelRunner;
}

/** Marks a mock range as a real or a null object (readable after sync without a load, as in Office.js). */
function setNull(range: unknown, isNull: boolean): void {
  (range as { isNullObject: boolean }).isNullObject = isNull;
}

function pathTable(): Values {
  return f.path([["water"]], [[1]], [[-20]], [[120]], [[1.01325]], [["C bar kJ kg"]]) as Values;
}

const FORMULA = '=PHASE.PATH("water",1,-20,120,1.01325,"C bar kJ kg")';

describe("reading the selection with office-addin-mock", () => {
  it("leaves a property unread until it is loaded and synced (the mock's caveat)", async () => {
    const excel = mockExcel({ range: rangeSeed("Sheet1!B2", [[1]]), getSelectedRange() { return (this as any).range; } });
    const seen = await excel.run(async (context) => {
      const range = context.workbook.getSelectedRange();
      const before = range.address as unknown;
      range.load("address");
      await context.sync();
      return { before, after: range.address, values: range.values as unknown };
    });
    expect(seen).toEqual({ before: NOT_LOADED, after: "Sheet1!B2", values: NOT_LOADED });
  });

  it("draws a whole selected table from its own values, with units from the formula", async () => {
    const table = pathTable();
    const formulas = table.map((row, i) => row.map((cell, j) => (i === 0 && j === 0 ? FORMULA : cell)));
    const selected = rangeSeed("Sheet1!B2:G7", table, formulas);
    selected["corner"] = rangeSeed("Sheet1!B2", [[table[0]![0]]], [[FORMULA]]);
    selected["getCell"] = function () {
      return (this as any).corner;
    };
    const excel = mockExcel({ selected, getSelectedRange() { return (this as any).selected; } });

    const view = await readSelectedPath(excel, { followSpill: false });
    expect(view.kind).toBe("path");
    if (view.kind !== "path") return;
    expect(view.address).toBe("Sheet1!B2:G7");
    expect(view.units).toBe("C bar kJ kg");
    const reading = chartFromTable(table, "C bar kJ kg");
    expect(reading.ok && view.data).toEqual(reading.ok && reading.data);
    expect(view.data.segments).toHaveLength(5);
    expect(view.data.segments.at(-1)!.endTotal).toBe(table[5]![5]);
    expect([view.data.temperatureUnit, view.data.energyUnit]).toEqual(["°C", "kJ"]);
  });

  it("follows one selected cell to the spill it belongs to (ExcelApi 1.12)", async () => {
    const table = pathTable();
    // The user clicked D5, inside the spill anchored at B2 (the formula's cell).
    const spill = rangeSeed("Sheet1!B2:G7", table);
    const anchorCell = rangeSeed("Sheet1!B2", [[table[0]![0]]], [[FORMULA]]);
    const clicked = rangeSeed("Sheet1!D5", [[table[3]![2]]]);
    const anchor = rangeSeed("Sheet1!B2", [[table[0]![0]]], [[FORMULA]]);
    const nothing = rangeSeed("", [[""]]);
    Object.assign(clicked, {
      parent: anchor,
      nothing,
      getCell() {
        return this;
      },
      getSpillParentOrNullObject() {
        return (this as any).parent;
      },
      // D5 anchors no spill of its own.
      getSpillingToRangeOrNullObject() {
        return (this as any).nothing;
      },
    });
    Object.assign(anchor, {
      spill,
      getSpillingToRangeOrNullObject() {
        return (this as any).spill;
      },
    });
    Object.assign(spill, {
      anchorCell,
      getCell() {
        return (this as any).anchorCell;
      },
    });
    const excel = mockExcel({ clicked, getSelectedRange() { return (this as any).clicked; } });
    const workbook = (excel as any).context.workbook;
    setNull(workbook.clicked.nothing, true);
    setNull(workbook.clicked.parent, false);
    setNull(workbook.clicked.parent.spill, false);

    const view = await readSelectedPath(excel, { followSpill: true });
    expect(view.kind).toBe("path");
    expect(view.kind === "path" && [view.address, view.units, view.data.segments.length]).toEqual(["Sheet1!B2:G7", "C bar kJ kg", 5]);
    // Without spill support the single cell is all there is: not a table.
    expect(await readSelectedPath(excel, { followSpill: false })).toEqual({ kind: "none", address: "Sheet1!D5" });
  });

  it("takes the spill of a selected anchor cell directly", async () => {
    const table = pathTable();
    const spill = rangeSeed("Sheet1!B2:G7", table);
    const anchorCell = rangeSeed("Sheet1!B2", [["step"]], [[FORMULA]]);
    const anchor = rangeSeed("Sheet1!B2", [["step"]], [[FORMULA]]);
    const nothing = rangeSeed("", [[""]]);
    Object.assign(spill, { anchorCell, getCell() { return (this as any).anchorCell; } });
    Object.assign(anchor, {
      spill,
      nothing,
      getCell() {
        return this;
      },
      getSpillingToRangeOrNullObject() {
        return (this as any).spill;
      },
      // An anchor is not inside another spill.
      getSpillParentOrNullObject() {
        return (this as any).nothing;
      },
    });
    const excel = mockExcel({ anchor, getSelectedRange() { return (this as any).anchor; } });
    const workbook = (excel as any).context.workbook;
    setNull(workbook.anchor.spill, false);
    setNull(workbook.anchor.nothing, true);
    const view = await readSelectedPath(excel, { followSpill: true });
    expect(view.kind === "path" && [view.address, view.data.segments.length]).toEqual(["Sheet1!B2:G7", 5]);
  });

  it("reads units the formula takes from a cell on another sheet", async () => {
    const table = pathTable();
    const formula = "=PHASE.PATH(Inputs!B1,Inputs!B2,Inputs!B3,Inputs!B4,Inputs!B5,Inputs!B6)";
    const selected = rangeSeed("Sheet1!B2:G7", table);
    selected["corner"] = rangeSeed("Sheet1!B2", [["step"]], [[formula]]);
    selected["getCell"] = function () {
      return (this as any).corner;
    };
    const requested: string[] = [];
    const inputs = {
      unitsCell: rangeSeed("Inputs!B6", [["C bar kJ kg"]]),
      getRange(address: string) {
        requested.push(address);
        return (this as any).unitsCell;
      },
    };
    const excel = mockExcel({
      selected,
      inputs,
      getSelectedRange() {
        return (this as any).selected;
      },
      worksheets: {
        getItem(name: string) {
          requested.push(name);
          return (excel as any).context.workbook.inputs;
        },
      },
    });
    const view = await readSelectedPath(excel, { followSpill: false });
    expect(requested).toEqual(["Inputs", "B6"]);
    expect(view.kind === "path" && [view.units, view.data.temperatureUnit]).toEqual(["C bar kJ kg", "°C"]);
  });

  it("says a selection is not a PATH result, and does not read a huge one", async () => {
    const small = rangeSeed("Sheet1!A1:F2", [
      ["a", "b", "c", "d", "e", "f"],
      [1, 2, 3, 4, 5, 6],
    ]);
    small["corner"] = rangeSeed("Sheet1!A1", [["a"]]);
    small["getCell"] = function () {
      return (this as any).corner;
    };
    const excel = mockExcel({ small, getSelectedRange() { return (this as any).small; } });
    expect(await readSelectedPath(excel, { followSpill: false })).toEqual({ kind: "none", address: "Sheet1!A1:F2" });

    const huge = { ...rangeSeed("Sheet1!A:F", [[0]]), rowCount: 1048576, columnCount: 6 };
    const big = mockExcel({ huge, getSelectedRange() { return (this as any).huge; } });
    expect(await readSelectedPath(big, { followSpill: false })).toEqual({ kind: "none", address: "Sheet1!A:F" });
    // Its values were never loaded.
    expect((big as any).context.workbook.huge.values).toBe(NOT_LOADED);
  });

  it("calls back when the selection changes", async () => {
    const handlers: (() => Promise<void>)[] = [];
    const excel = mockExcel({
      onSelectionChanged: {
        add(handler: () => Promise<void>) {
          handlers.push(handler);
        },
      },
    });
    let changes = 0;
    await watchSelection(excel, () => changes++);
    expect(handlers).toHaveLength(1);
    await handlers[0]!();
    await handlers[0]!();
    expect(changes).toBe(2);
  });
});

describe("state points from the selection, with office-addin-mock", () => {
  it("reads PHASE.STATE formulas of the selected cells into points in SI", async () => {
    const formulas = [['=PHASE.STATE("water",-38,0.3,"C mbar",TRUE)'], ['=PHASE.STATE("water",25,1.01325,"C bar")']];
    const values = f.state([["water"]], [[-38], [25]], [[0.0003], [1.01325]], "C bar", true) as Values;
    const excel = mockExcel({ range: rangeSeed("Sheet1!C2:C3", values, formulas), getSelectedRange() { return (this as any).range; } });
    const reading = await readSelectedStatePoints(excel, "K Pa");
    expect(reading.address).toBe("Sheet1!C2:C3");
    // 0 °C = 273.15 K (ITS-90); 1 mbar = 100 Pa, 1 bar = 1e5 Pa (exact).
    const expected = [
      [235.15, 30],
      [298.15, 101325],
    ];
    expect(reading.points).toHaveLength(2);
    reading.points.forEach((point, i) => {
      expect(point.temperatureK).toBeCloseTo(expected[i]![0]!, 10);
      expect(point.pressurePa).toBeCloseTo(expected[i]![1]!, 6);
    });
    expect(reading.notes).toEqual([]);
  });

  it("reads a two-column range in the pane's display units", async () => {
    const values = [["T", "p"], [120, 2], [-10, 1]];
    const excel = mockExcel({ range: rangeSeed("Sheet1!A1:B3", values), getSelectedRange() { return (this as any).range; } });
    const reading = await readSelectedStatePoints(excel, "C bar");
    expect(reading.points.map((p) => p.label)).toEqual(["row 2", "row 3"]);
    expect(reading.points[0]!.temperatureK).toBeCloseTo(393.15, 12);
    expect(reading.points[0]!.pressurePa).toBe(2e5);
  });

  it("does not load the values of a huge selection", async () => {
    const seed = rangeSeed("Sheet1!A1:Z1000", [[1]]);
    seed.rowCount = 1000;
    seed.columnCount = 26;
    const excel = mockExcel({ range: seed, getSelectedRange() { return (this as any).range; } });
    const reading = await readSelectedStatePoints(excel, "K Pa");
    expect(reading.points).toEqual([]);
    expect(reading.notes[0]).toMatch(/26000 cells/);
  });
});
