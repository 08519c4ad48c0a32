/**
 * Reads a PHASE.PATH result as the workbook holds it (a header row, then one row per step) into
 * chart data, using the table's own numbers: nothing is recomputed. The table carries no units,
 * so they come from the units argument of the formula that spilled it, when that can be read.
 * No DOM and no Office, so it runs in Node tests.
 */
import { parseUnits, toSI, unitSymbol } from "../../core/units/units";
import { NO_CHANGE_NOTE, styleOfPhase, type PathChartData, type PathSegment } from "./path-chart";

/** The header row PHASE.PATH writes (functions/index.ts). */
export const PATH_HEADER = ["step", "what happens", "from", "to", "energy", "running total"] as const;

/** Most rows a table may have to be read (a path has a handful of steps; this bounds the work). */
export const MAX_TABLE_ROWS = 200;

/** Where a table's units come from. */
export type UnitsSource =
  /** The formula gave a units text (literal, or read from the cell it points at). */
  | { readonly kind: "text"; readonly text: string }
  /** The formula has no units argument: SI. */
  | { readonly kind: "default" }
  /** Units argument in a cell: the caller reads it and passes it back as text. */
  | { readonly kind: "reference"; readonly reference: string }
  /** Not a formula we can read (a pasted copy, a name, an expression). */
  | { readonly kind: "unknown" };

/** Outcome of reading a range as a PATH table. */
export type TableReading =
  | { readonly ok: true; readonly data: PathChartData }
  | { readonly ok: false; readonly reason: string };

function isHeader(row: readonly unknown[] | undefined): boolean {
  if (!row || row.length < PATH_HEADER.length) return false;
  return PATH_HEADER.every((word, i) => typeof row[i] === "string" && (row[i] as string).trim().toLowerCase() === word);
}

/** True when the first row of `values` is PHASE.PATH's header. */
export function looksLikePathTable(values: readonly (readonly unknown[])[]): boolean {
  return isHeader(values[0]);
}

function isBlank(cell: unknown): boolean {
  return cell === null || cell === undefined || (typeof cell === "string" && cell.trim() === "");
}

/** The phase a sensible step heats or cools: its action without the verb and any remark. */
function phaseOfAction(action: string): string {
  return action
    .replace(/^(heat|cool)\s+/i, "")
    .replace(/\s*\(.*$/, "")
    .trim();
}

/**
 * Chart data from the values of a PATH table (`values[0]` is the header). Rows after the table
 * (a selection larger than the spill) must be blank. `units` names the table's units, or is
 * null when they are unknown (axes then go without unit symbols).
 */
export function chartFromTable(values: readonly (readonly unknown[])[], units: string | null): TableReading {
  if (!isHeader(values[0])) {
    return { ok: false, reason: `the first row is not the PHASE.PATH header (${PATH_HEADER.join(", ")})` };
  }
  let system;
  try {
    system = units === null ? null : parseUnits(units);
  } catch {
    system = null;
  }
  const temperatureUnit = system ? unitSymbol(system, "temperature") : "";
  const energyUnit = system ? unitSymbol(system, "energy") : "";
  const body = values.slice(1, MAX_TABLE_ROWS + 1);
  const segments: PathSegment[] = [];
  let startTotal = 0;
  let ended = false;
  for (const [offset, row] of body.entries()) {
    const cells = row.slice(0, PATH_HEADER.length);
    const rowNumber = offset + 2;
    if (cells.every(isBlank)) {
      ended = true;
      continue;
    }
    if (ended) return { ok: false, reason: `row ${rowNumber} follows a blank row: select one PATH result at a time` };
    const [step, action, fromT, toT, energy, total] = cells;
    if (step === 0 && segments.length === 0 && body.slice(offset + 1).every((r) => r.every(isBlank))) {
      return { ok: true, data: { segments: [], temperatureUnit, energyUnit, note: NO_CHANGE_NOTE } };
    }
    const numbers = { step, from: fromT, to: toT, energy, "running total": total };
    for (const [column, value] of Object.entries(numbers)) {
      if (typeof value !== "number" || !Number.isFinite(value)) {
        return { ok: false, reason: `row ${rowNumber} has no number under "${column}"` };
      }
    }
    if (typeof action !== "string" || action.trim() === "") {
      return { ok: false, reason: `row ${rowNumber} has no text under "what happens"` };
    }
    if (step !== segments.length + 1) {
      return { ok: false, reason: `row ${rowNumber} is step ${String(step)}, not ${segments.length + 1}: select the whole table` };
    }
    const latent = fromT === toT;
    const phase = latent ? "phase change" : phaseOfAction(action);
    segments.push({
      step: step as number,
      action: action.trim(),
      kind: latent ? "latent" : "sensible",
      phase,
      style: latent ? "change" : styleOfPhase(phase),
      fromT: fromT as number,
      toT: toT as number,
      energy: energy as number,
      startTotal,
      endTotal: total as number,
    });
    startTotal = total as number;
  }
  if (segments.length === 0) return { ok: false, reason: "the table has a header but no steps" };
  return { ok: true, data: { segments, temperatureUnit, energyUnit } };
}

/** Splits the argument list of a call at top-level commas, keeping quoted text and nested calls whole. */
export function splitArguments(text: string): string[] | null {
  const parts: string[] = [];
  let depth = 0;
  let quoted = false;
  let current = "";
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      current += c;
      if (c === '"') {
        if (text[i + 1] === '"') {
          current += '"';
          i++;
        } else {
          quoted = false;
        }
      }
      continue;
    }
    if (c === '"') quoted = true;
    else if (c === "(" || c === "{") depth++;
    else if (c === ")" || c === "}") {
      if (depth === 0) {
        // The call's closing parenthesis: only whitespace may follow.
        if (text.slice(i + 1).trim() !== "") return null;
        parts.push(current.trim());
        return parts;
      }
      depth--;
    } else if (c === "," && depth === 0) {
      parts.push(current.trim());
      current = "";
      continue;
    }
    current += c;
  }
  return null;
}

/** A cell or sheet-qualified cell reference: A1, $B$2, Sheet1!C3, 'Site data'!D4. */
const CELL_REFERENCE = /^(?:(?:'(?:[^']|'')+'|[A-Za-z_][\w.]*)!)?\$?[A-Za-z]{1,3}\$?\d{1,7}$/;

/**
 * Where the units of a PATH table come from, read from the formula of its top-left cell
 * (Office's `formulas`, which are in English with comma separators whatever the user's locale).
 * The function may carry any namespace (PHASE, a development one) or the stored `_xldudf_` form.
 */
export function unitsFromFormula(formula: unknown): UnitsSource {
  if (typeof formula !== "string") return { kind: "unknown" };
  const call = /^=\s*(?:_xldudf_)?[A-Za-z][\w]*[._]PATH\s*\(/i.exec(formula.trim());
  if (!call) return { kind: "unknown" };
  const args = splitArguments(formula.trim().slice(call[0].length));
  if (!args || args.length < 5 || args.length > 6) return { kind: "unknown" };
  const units = args[5];
  if (units === undefined || units === "") return { kind: "default" };
  const literal = /^"((?:[^"]|"")*)"$/.exec(units);
  if (literal) return { kind: "text", text: literal[1]!.replace(/""/g, '"') };
  if (CELL_REFERENCE.test(units)) return { kind: "reference", reference: units };
  return { kind: "unknown" };
}

/** Units text for a source whose reference (if any) has been read: null when unknown. */
export function unitsText(source: UnitsSource, referencedValue?: unknown): string | null {
  switch (source.kind) {
    case "text":
      return source.text;
    case "default":
      return "";
    case "reference":
      if (isBlank(referencedValue)) return "";
      return typeof referencedValue === "string" ? referencedValue : null;
    case "unknown":
      return null;
  }
}

/** What the pane shows about the workbook's selection. */
export type SelectionView =
  /** Not running in Excel (or its API is too old): a hint only. */
  | { readonly kind: "unavailable" }
  /** The selection is not a PATH result. */
  | { readonly kind: "none"; readonly address: string }
  /** It starts like a PATH result but cannot be drawn. */
  | { readonly kind: "invalid"; readonly address: string; readonly reason: string }
  /** A PATH result, ready to draw; `units` is its units text, null when unknown. */
  | {
      readonly kind: "path";
      readonly address: string;
      readonly units: string | null;
      readonly data: PathChartData;
      /** The isobar's pressure, Pa, when the formula writes it as a number. */
      readonly pressurePa?: number;
    }
  /** Reading the selection failed. */
  | { readonly kind: "error"; readonly message: string };

/** The view of a range read from the workbook: its address, values and the units text of its formula. */
export function selectionView(address: string, values: readonly (readonly unknown[])[], units: string | null): SelectionView {
  if (!looksLikePathTable(values)) return { kind: "none", address };
  const reading = chartFromTable(values, units);
  return reading.ok
    ? { kind: "path", address, units, data: reading.data }
    : { kind: "invalid", address, reason: reading.reason };
}

/**
 * The pressure of a PHASE.PATH formula's isobar, Pa, when the formula writes it (and its units)
 * literally; undefined otherwise (a cell reference, an expression, an unknown unit).
 */
export function isobarFromFormula(formula: unknown): number | undefined {
  if (typeof formula !== "string") return undefined;
  const call = /^=\s*(?:_xldudf_)?[A-Za-z][\w]*[._]PATH\s*\(/i.exec(formula.trim());
  if (!call) return undefined;
  const args = splitArguments(formula.trim().slice(call[0].length));
  const pressure = args?.[4];
  if (!args || pressure === undefined || !/^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/.test(pressure)) return undefined;
  const source = unitsFromFormula(formula);
  const text = source.kind === "text" ? source.text : source.kind === "default" ? "" : undefined;
  if (text === undefined) return undefined;
  try {
    return toSI(parseUnits(text), "pressure", Number(pressure));
  } catch {
    return undefined;
  }
}

/** A selected PATH drawn on the phase diagram: its isobar from T1 to T2 and its phase changes, in SI. */
export interface IsobarOverlay {
  readonly pressurePa: number;
  readonly fromK: number;
  readonly toK: number;
  /** Temperatures of the path's phase changes (its latent steps). */
  readonly crossingsK: readonly number[];
}

/** The overlay of a selected PATH result, when its pressure and units are known. */
export function isobarOverlay(view: SelectionView): IsobarOverlay | undefined {
  if (view.kind !== "path" || view.pressurePa === undefined || view.units === null) return undefined;
  let units;
  try {
    units = parseUnits(view.units);
  } catch {
    return undefined;
  }
  const segments = view.data.segments;
  const first = segments[0];
  const last = segments[segments.length - 1];
  if (!first || !last) return undefined;
  return {
    pressurePa: view.pressurePa,
    fromK: toSI(units, "temperature", first.fromT),
    toK: toSI(units, "temperature", last.toT),
    crossingsK: segments.filter((segment) => segment.kind === "latent").map((segment) => toSI(units, "temperature", segment.fromT)),
  };
}
