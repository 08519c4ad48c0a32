/**
 * The pane's second touch point with Office: reads the workbook's selection and, when it is a
 * PHASE.PATH result, hands its values (not a recomputation) to the pane; follows selection
 * changes in the shared runtime. Turning the values into chart data is data/path-table.ts's job.
 *
 * Any cell of a spilled PATH result will do where Excel can name the spill (ExcelApi 1.12);
 * elsewhere the user selects the table from its header row. Reading needs the ReadDocument
 * permission (manifest.xml).
 */
import {
  isobarFromFormula,
  MAX_TABLE_ROWS,
  PATH_HEADER,
  selectionView,
  unitsFromFormula,
  unitsText,
  type SelectionView,
} from "./data/path-table";
import { MAX_SELECTION_CELLS, statePointsFromSelection, type StatePointsReading } from "./data/state-points";

/** The part of the Excel namespace used here: the global inside Excel, a mock in tests. */
export interface ExcelRunner {
  run<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T>;
}

/** What the host supports. */
export interface SelectionOptions {
  /** Excel can find the spill of a cell (ExcelApi 1.12): a single cell of a result is enough. */
  readonly followSpill: boolean;
}

/** Widest selection read: a PATH table has six columns; anything much wider is not one. */
const MAX_COLUMNS = 16;

/** `Sheet1!B2`, `'Site data'!B2` or `B2` → the sheet name (or null) and the cell address. */
function splitReference(reference: string): { sheet: string | null; cell: string } {
  const bang = reference.lastIndexOf("!");
  if (bang < 0) return { sheet: null, cell: reference };
  const sheet = reference.slice(0, bang);
  const unquoted = sheet.startsWith("'") && sheet.endsWith("'") ? sheet.slice(1, -1).replace(/''/g, "'") : sheet;
  return { sheet: unquoted, cell: reference.slice(bang + 1) };
}

/** Reads the selection (or the spill it belongs to) and says what it holds. */
export async function readSelectedPath(excel: ExcelRunner, options: SelectionOptions): Promise<SelectionView> {
  return excel.run(async (context) => {
    const selected = context.workbook.getSelectedRange();
    selected.load("address, rowCount, columnCount");
    // Where spills can be named, ask in the same round trip whether the selection's top-left cell
    // anchors a spill, or lies in one (then its anchor, the formula's cell, is the spill parent).
    const corner = options.followSpill ? selected.getCell(0, 0) : null;
    const ownSpill = corner?.getSpillingToRangeOrNullObject() ?? null;
    const parent = corner?.getSpillParentOrNullObject() ?? null;
    ownSpill?.load("address, rowCount, columnCount");
    parent?.load("address");
    await context.sync();
    let target = selected;
    if (ownSpill && !ownSpill.isNullObject) {
      target = ownSpill;
    } else if (parent && !parent.isNullObject) {
      const spill = parent.getSpillingToRangeOrNullObject();
      spill.load("address, rowCount, columnCount");
      await context.sync();
      if (!spill.isNullObject) target = spill;
    }
    const { address, rowCount: rows, columnCount: columns } = target;
    if (columns < PATH_HEADER.length || columns > MAX_COLUMNS || rows < 2 || rows > MAX_TABLE_ROWS + 1) {
      return { kind: "none", address };
    }
    target.load("values");
    const top = target.getCell(0, 0);
    top.load("formulas");
    await context.sync();
    const values = target.values as unknown[][];
    const formula = (top.formulas as unknown[][])[0]?.[0];
    const source = unitsFromFormula(formula);
    let referenced: unknown;
    if (source.kind === "reference") {
      const { sheet, cell } = splitReference(source.reference);
      const sheetObject = sheet === null ? target.worksheet : context.workbook.worksheets.getItem(sheet);
      const unitsCell = sheetObject.getRange(cell);
      unitsCell.load("values");
      try {
        await context.sync();
      } catch {
        // A sheet renamed or deleted since: draw the table without units.
        return selectionView(address, values, null);
      }
      referenced = (unitsCell.values as unknown[][])[0]?.[0];
    }
    const view = selectionView(address, values, unitsText(source, referenced));
    const pressurePa = isobarFromFormula(formula);
    return view.kind === "path" && pressurePa !== undefined ? { ...view, pressurePa } : view;
  });
}

/** Calls `onChange` whenever the selection in the workbook changes (ExcelApi 1.2). */
export async function watchSelection(excel: ExcelRunner, onChange: () => void): Promise<void> {
  await excel.run(async (context) => {
    context.workbook.onSelectionChanged.add(async () => {
      onChange();
    });
    await context.sync();
  });
}

function supports(set: string, version: string): boolean {
  try {
    return typeof Office !== "undefined" && Office.context?.requirements?.isSetSupported(set, version) === true;
  } catch {
    return false;
  }
}

function describeFailure(error: unknown): string {
  const detail = error instanceof Error ? error.message : String(error);
  return `Phasecell could not read the selection (${detail}). Select the table again.`;
}

/**
 * Shows the selection now and after every change. Outside Excel, or where the Excel API lacks
 * selection events, shows the "unavailable" view once. Reads that finish out of order are
 * dropped, so the pane always shows the latest selection.
 */
export function followSelection(show: (view: SelectionView) => void): void {
  if (typeof Excel === "undefined" || !supports("ExcelApi", "1.2")) {
    show({ kind: "unavailable" });
    return;
  }
  const options: SelectionOptions = { followSpill: supports("ExcelApi", "1.12") };
  let latest = 0;
  const refresh = async (): Promise<void> => {
    const ticket = ++latest;
    let view: SelectionView;
    try {
      view = await readSelectedPath(Excel, options);
    } catch (error) {
      view = { kind: "error", message: describeFailure(error) };
    }
    if (ticket === latest) show(view);
  };
  watchSelection(Excel, () => void refresh()).then(
    () => refresh(),
    (error: unknown) => show({ kind: "error", message: describeFailure(error) }),
  );
}

/** State points read from the selection, with its address. */
export interface SelectedStatePoints extends StatePointsReading {
  readonly address: string;
}

/**
 * Reads the selection as state points for the phase diagram: PHASE.STATE / MARGIN / ENTHALPY
 * formulas, or a range of temperature and pressure in the pane's display units
 * (data/state-points.ts). A selection larger than the cap is not read at all.
 */
export async function readSelectedStatePoints(excel: ExcelRunner, displayUnits: string): Promise<SelectedStatePoints> {
  return excel.run(async (context) => {
    const selected = context.workbook.getSelectedRange();
    selected.load("address, rowCount, columnCount");
    await context.sync();
    const { address, rowCount, columnCount } = selected;
    if (rowCount * columnCount > MAX_SELECTION_CELLS) {
      return { address, ...statePointsFromSelection([[]], [[]], displayUnits), notes: [`the selection has ${rowCount * columnCount} cells; select at most ${MAX_SELECTION_CELLS}`] };
    }
    selected.load("values, formulas");
    await context.sync();
    return { address, ...statePointsFromSelection(selected.values as unknown[][], selected.formulas as unknown[][], displayUnits) };
  });
}

/**
 * Shows the state points of the selection now and after every change, in the display units the
 * pane has at that moment. Does nothing outside Excel or without selection events.
 */
export function followStatePoints(displayUnits: () => string, show: (points: SelectedStatePoints) => void): void {
  if (typeof Excel === "undefined" || !supports("ExcelApi", "1.2")) return;
  let latest = 0;
  const refresh = async (): Promise<void> => {
    const ticket = ++latest;
    try {
      const points = await readSelectedStatePoints(Excel, displayUnits());
      if (ticket === latest) show(points);
    } catch (error) {
      if (ticket === latest) show({ address: "", points: [], notes: [describeFailure(error)] });
    }
  };
  watchSelection(Excel, () => void refresh()).then(
    () => refresh(),
    () => undefined,
  );
}
