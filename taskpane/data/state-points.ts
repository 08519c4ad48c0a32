/**
 * Reads state points (temperature, pressure) from what the user selected in the workbook: either
 * cells holding PHASE.STATE, PHASE.MARGIN or PHASE.ENTHALPY formulas whose temperature and
 * pressure are written in the formula, or a range whose first two columns are temperature and
 * pressure in the pane's display units. No DOM and no Office, so it runs in Node tests; the
 * Office wiring hands it the range's `values` and `formulas`.
 */
import { PhaseError } from "../../core/errors";
import { parseUnits, toSI, type UnitSystem } from "../../core/units/units";
import { splitArguments } from "./path-table";

/** One state to plot, in SI. */
export interface StatePoint {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Where it came from: the cell's formula, or "row n" of a range. */
  readonly label: string;
  /** The substance named in the formula, when there is one. */
  readonly substance?: string;
}

/** What a selection yielded. */
export interface StatePointsReading {
  readonly points: readonly StatePoint[];
  /** Cells or rows that looked like states but could not be read, with why (a few at most). */
  readonly notes: readonly string[];
}

/** Most cells read from one selection: bounds the work on a huge selection. */
export const MAX_SELECTION_CELLS = 5000;

/** Functions whose arguments are (substance, temperature, pressure, [units]). */
const STATE_CALL = /^=\s*(?:_xldudf_)?[A-Za-z][\w]*[._](STATE|MARGIN|ENTHALPY)\s*\(/i;
const NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;
const TEXT = /^"((?:[^"]|"")*)"$/;

function literalText(argument: string | undefined): string | undefined {
  const match = argument === undefined ? null : TEXT.exec(argument);
  return match ? match[1]!.replace(/""/g, '"') : undefined;
}

/** A state from one formula, or a note saying why not. */
function fromFormula(formula: string): StatePoint | string | undefined {
  const call = STATE_CALL.exec(formula.trim());
  if (!call) return undefined;
  const args = splitArguments(formula.trim().slice(call[0].length));
  if (!args || args.length < 3) return `${formula}: not a complete call`;
  const [substanceArg, temperatureArg, pressureArg, unitsArg] = args;
  if (!NUMBER.test(temperatureArg!) || !NUMBER.test(pressureArg!)) {
    return `${formula}: temperature and pressure are not numbers written in the formula; select the input cells as a two-column range instead`;
  }
  const unitsText = unitsArg === undefined || unitsArg === "" ? "" : literalText(unitsArg);
  if (unitsText === undefined) return `${formula}: its units argument is not written in the formula`;
  const units = parseUnits(unitsText);
  const substance = literalText(substanceArg);
  const point = {
    temperatureK: toSI(units, "temperature", Number(temperatureArg)),
    pressurePa: toSI(units, "pressure", Number(pressureArg)),
    label: formula.trim(),
  };
  return substance === undefined ? point : { ...point, substance };
}

/**
 * State points from a selection. Formulas win: if any selected cell holds a state formula, only
 * formulas are read; otherwise each row whose first two cells are numbers is a (T, p) pair in the
 * display units. Header rows and blank rows are passed over silently.
 */
export function statePointsFromSelection(
  values: readonly (readonly unknown[])[],
  formulas: readonly (readonly unknown[])[],
  displayUnits: string,
): StatePointsReading {
  const cells = values.reduce((sum, row) => sum + row.length, 0);
  if (cells > MAX_SELECTION_CELLS) {
    return { points: [], notes: [`the selection has ${cells} cells; select at most ${MAX_SELECTION_CELLS}`] };
  }
  const points: StatePoint[] = [];
  const notes: string[] = [];
  let sawFormula = false;
  for (const row of formulas) {
    for (const cell of row) {
      if (typeof cell !== "string") continue;
      try {
        const found = fromFormula(cell);
        if (found === undefined) continue;
        sawFormula = true;
        if (typeof found === "string") notes.push(found);
        else points.push(found);
      } catch (error) {
        sawFormula = true;
        notes.push(`${cell}: ${error instanceof PhaseError ? error.message : String(error)}`);
      }
    }
  }
  if (sawFormula) return { points, notes: notes.slice(0, 5) };

  let units: UnitSystem;
  try {
    units = parseUnits(displayUnits);
  } catch (error) {
    return { points: [], notes: [error instanceof Error ? error.message : String(error)] };
  }
  values.forEach((row, index) => {
    const [t, p] = row;
    if (typeof t === "number" && typeof p === "number" && Number.isFinite(t) && Number.isFinite(p)) {
      points.push({
        temperatureK: toSI(units, "temperature", t),
        pressurePa: toSI(units, "pressure", p),
        label: `row ${index + 1}`,
      });
    }
  });
  if (points.length === 0 && values.length > 0) {
    notes.push("no row holds a temperature and a pressure as numbers in its first two cells");
  }
  return { points, notes };
}
