/**
 * Excel-like broadcasting of range arguments: ranges of the same shape pair element by element,
 * a single value pairs with every element, and a column against a row gives a table.
 */
import { BadInputError } from "../core/errors";
import type { Cell, Grid } from "./coerce";

const SINGLE: Grid = [[null]];

/** Wraps what Excel passed into a 2-D grid (an omitted argument is one empty cell). */
export function asGrid(value: unknown): Grid {
  if (value === null || value === undefined) return SINGLE;
  if (!Array.isArray(value)) return [[value]];
  if (value.length === 0) return SINGLE;
  if (!Array.isArray(value[0])) return [value as Cell[]];
  return value as Grid;
}

/**
 * The result shape of broadcasting the grids: per dimension, sizes must be equal or 1.
 * @throws BadInputError naming the arguments whose shapes do not fit together.
 */
export function broadcastShape(grids: readonly Grid[], names: readonly string[]): [number, number] {
  let rows = 1;
  let columns = 1;
  let rowsFrom = "";
  let columnsFrom = "";
  grids.forEach((grid, index) => {
    const gridRows = grid.length;
    const gridColumns = grid[0]?.length ?? 1;
    if (gridRows !== 1) {
      if (rows !== 1 && rows !== gridRows) throw shapeError(names[index]!, gridRows, gridColumns, rowsFrom, rows, "rows");
      rows = gridRows;
      rowsFrom = names[index]!;
    }
    if (gridColumns !== 1) {
      if (columns !== 1 && columns !== gridColumns) {
        throw shapeError(names[index]!, gridRows, gridColumns, columnsFrom, columns, "columns");
      }
      columns = gridColumns;
      columnsFrom = names[index]!;
    }
  });
  return [rows, columns];
}

function shapeError(name: string, rows: number, columns: number, other: string, size: number, what: string): BadInputError {
  return new BadInputError([
    `${name} (${rows}×${columns}) does not fit ${other} (${size} ${what}): ranges must have the same ` +
      "number of rows and columns, or be a single cell, a single row or a single column",
  ]);
}

/** The element of a grid at (row, column) under broadcasting. */
export function cellAt(grid: Grid, row: number, column: number): Cell {
  const line = grid.length === 1 ? grid[0]! : grid[row]!;
  return line.length === 1 ? line[0] : line[column];
}
