/**
 * Reading cell values: what Excel passes for one element of an argument, turned into a number,
 * a text or a flag, or a BadInputError that says what to change.
 */
import { BadInputError } from "../core/errors";
import { findSubstance } from "../core/substances/registry";
import type { SubstanceDefinition } from "../core/substances/types";
import { parseUnits, type UnitSystem, SI } from "../core/units/units";

/** One cell as Excel hands it to a custom function. */
export type Cell = unknown;
/** A range (or a single value wrapped as 1×1). */
export type Grid = readonly (readonly Cell[])[];

/** True for an empty cell: null (current clients), undefined or "". */
export function isEmptyCell(cell: Cell): boolean {
  return cell === null || cell === undefined || (typeof cell === "string" && cell.trim() === "");
}

function describe(cell: Cell): string {
  if (typeof cell === "string") return `text "${cell.length > 40 ? `${cell.slice(0, 40)}…` : cell}"`;
  if (typeof cell === "boolean") return cell ? "TRUE" : "FALSE";
  if (typeof cell === "object" && cell !== null) return "a linked data value";
  return String(cell);
}

/** A finite number, or an error naming the argument. */
export function readNumber(cell: Cell, argument: string): number {
  if (typeof cell === "number") {
    if (Number.isFinite(cell)) return cell;
    throw new BadInputError([`${argument} is not a finite number: enter a number`]);
  }
  if (isEmptyCell(cell)) {
    throw new BadInputError([`${argument} is empty: enter a number`]);
  }
  if (typeof cell === "string" && /^\s*[-+]?\d/.test(cell)) {
    throw new BadInputError([
      `${argument} is ${describe(cell)}, not a number: put the number alone in the cell and the ` +
        'unit in the units argument (e.g. "C bar")',
    ]);
  }
  throw new BadInputError([`${argument} is ${describe(cell)}: enter a number`]);
}

/** A non-empty text, or an error naming the argument. */
export function readText(cell: Cell, argument: string): string {
  if (typeof cell === "string" && cell.trim() !== "") return cell.trim();
  if (isEmptyCell(cell)) throw new BadInputError([`${argument} is empty: enter a name`]);
  if (typeof cell === "number") return String(cell);
  throw new BadInputError([`${argument} is ${describe(cell)}: enter a name as text`]);
}

/** An optional text: empty gives "". */
export function readOptionalText(cell: Cell, argument: string): string {
  return isEmptyCell(cell) ? "" : readText(cell, argument);
}

/** An optional flag: empty is FALSE; TRUE/FALSE, 1/0 and the texts "TRUE"/"FALSE" are accepted. */
export function readFlag(cell: Cell, argument: string): boolean {
  if (isEmptyCell(cell)) return false;
  if (typeof cell === "boolean") return cell;
  if (cell === 1 || cell === 0) return cell === 1;
  if (typeof cell === "string") {
    const word = cell.trim().toLowerCase();
    if (word === "true") return true;
    if (word === "false") return false;
  }
  throw new BadInputError([`${argument} is ${describe(cell)}: enter TRUE or FALSE (or leave it empty)`]);
}

/** The single value of an argument declared as one cell (Excel may still pass a range). */
export function singleCell(value: unknown, argument: string): Cell {
  if (!Array.isArray(value)) return value;
  const flat = (value as unknown[]).flat();
  if (flat.length === 1) return flat[0];
  throw new BadInputError([`${argument} must be one cell, not a range of ${flat.length} cells`]);
}

/** Parses the optional units argument once per call. */
export function readUnits(value: unknown): UnitSystem {
  const cell = singleCell(value, "units");
  if (isEmptyCell(cell)) return SI;
  if (typeof cell !== "string") {
    throw new BadInputError([`units is ${describe(cell)}: enter unit symbols as text, e.g. "C bar" or "F psig"`]);
  }
  return parseUnits(cell);
}

/**
 * A substance reader for one call: remembers the last name it resolved, so a column of states of
 * one substance looks the name up once instead of once per cell.
 */
export function substanceReader(): (cell: Cell) => SubstanceDefinition {
  let lastText: string | undefined;
  let last: SubstanceDefinition | undefined;
  return (cell) => {
    const text = readText(cell, "substance");
    if (text !== lastText || !last) {
      last = findSubstance(text);
      lastText = text;
    }
    return last;
  };
}
