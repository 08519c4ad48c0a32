/**
 * The per-call frame every cell function shares: parse units once, broadcast the range
 * arguments, compute each element through core, and turn every failure into an Excel error
 * value. Nothing thrown below escapes as an exception Excel would show without a message.
 */
import type { UnitSystem } from "../core/units/units";
import { SI } from "../core/units/units";
import { asGrid, broadcastShape, cellAt } from "./broadcast";
import { readUnits, type Cell } from "./coerce";
import { isExcelError, toExcelError } from "./excel-error";

/** What one element computes to: a number, a text or an Excel error value. */
export type ElementResult = number | string | boolean | CustomFunctions.Error;

/**
 * Runs `element` for every broadcast position of `args` (named `names` in messages).
 * A single result that is an error is thrown, so Excel always shows its message; in a spilled
 * result each failing element carries its own error value.
 */
export function evaluate(
  args: readonly unknown[],
  names: readonly string[],
  unitsArgument: unknown,
  element: (cells: readonly Cell[], units: UnitSystem) => ElementResult,
): ElementResult[][] {
  let units: UnitSystem = SI;
  let result: ElementResult[][];
  try {
    units = readUnits(unitsArgument);
    const grids = args.map(asGrid);
    const [rows, columns] = broadcastShape(grids, names);
    const cells: Cell[] = new Array<Cell>(grids.length);
    result = [];
    for (let row = 0; row < rows; row++) {
      const line: ElementResult[] = new Array<ElementResult>(columns);
      for (let column = 0; column < columns; column++) {
        for (let k = 0; k < grids.length; k++) cells[k] = cellAt(grids[k]!, row, column);
        try {
          line[column] = element(cells, units);
        } catch (error) {
          line[column] = toExcelError(error, units);
        }
      }
      result.push(line);
    }
  } catch (error) {
    throw toExcelError(error, units);
  }
  if (result.length === 1 && result[0]!.length === 1 && isExcelError(result[0]![0])) throw result[0]![0];
  return result;
}

/**
 * Runs a table-producing computation with the call's units, converting any failure into an
 * Excel error value whose message speaks those units.
 */
export function table(
  unitsArgument: unknown,
  compute: (units: UnitSystem) => (string | number)[][],
): (string | number)[][] {
  let units: UnitSystem = SI;
  try {
    units = readUnits(unitsArgument);
    return compute(units);
  } catch (error) {
    throw toExcelError(error, units);
  }
}
