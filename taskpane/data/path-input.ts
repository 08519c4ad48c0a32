/**
 * The pane's own path: the four numbers a user types (mass, start and end temperature, absolute
 * pressure, in the display units), read and converted by core's units, handed to core's
 * isobaricPath, and the result turned into chart data. Errors come back as text in the same
 * units, worded as a cell would word them. No DOM, so it runs in Node tests.
 */
import { formatNumber, PhaseError, type Dimension } from "../../core/errors";
import { isobaricPath } from "../../core/path";
import type { SubstanceDefinition } from "../../core/substances/types";
import { fromSI, toSI, unitSymbol, type UnitSystem } from "../../core/units/units";
// The cell functions' formatter renders an error's quantities in the caller's units; the pane
// reuses it so that a message reads the same in the pane as under a cell's error flag. It imports
// core only (CustomFunctions is touched solely inside the error builders, which the pane never calls).
import { formatterFor } from "../../functions/excel-error";
import { chartFromSteps, type PathChartData } from "./path-chart";

/** The input fields, in the order of PHASE.PATH's arguments. */
export type PathField = "mass" | "start" | "end" | "pressure";

/** What a field holds and how it is labelled. */
export interface PathFieldSpec {
  readonly field: PathField;
  readonly label: string;
  readonly dimension: Dimension;
}

export const PATH_FIELDS: readonly PathFieldSpec[] = [
  { field: "mass", label: "Mass", dimension: "mass" },
  { field: "start", label: "Start T1", dimension: "temperature" },
  { field: "end", label: "End T2", dimension: "temperature" },
  { field: "pressure", label: "Pressure", dimension: "pressure" },
];

/** The typed texts of the four fields. */
export type PathTexts = Readonly<Record<PathField, string>>;

/**
 * Shown when the pane opens, in SI: 2.5 kg of water from a −25 °C cold store heated to 150 °C at
 * 3 bar, the feed of a clean-steam line on a freeze-drying site (a demo scenario, not a check value).
 */
export const DEFAULT_PATH_SI: Readonly<Record<PathField, number>> = {
  mass: 2.5,
  start: 248.15,
  end: 423.15,
  pressure: 3e5,
};

/** Reads a typed number: optional sign (also the typographic minus), decimals with a point, exponent. */
export function parseTypedNumber(text: string): number | null {
  const cleaned = text.trim().replace(/\u2212/g, "-").replace(/[\s\u00a0\u202f]/g, "");
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}

/** The label of a field with its unit, as the form shows it: "Mass, kg". */
export function fieldLabel(spec: PathFieldSpec, system: UnitSystem): string {
  return `${spec.label}, ${unitSymbol(system, spec.dimension)}`;
}

/** Texts of SI values in the given units. */
export function textsFromSI(values: Readonly<Record<PathField, number>>, system: UnitSystem): PathTexts {
  const text = (spec: PathFieldSpec) => formatNumber(fromSI(system, spec.dimension, values[spec.field]));
  return { mass: text(PATH_FIELDS[0]!), start: text(PATH_FIELDS[1]!), end: text(PATH_FIELDS[2]!), pressure: text(PATH_FIELDS[3]!) };
}

/**
 * The texts re-expressed in other units: each field that holds a number is converted through SI;
 * a field that does not is left as typed.
 */
export function convertTexts(texts: PathTexts, from: UnitSystem, to: UnitSystem): PathTexts {
  const convert = (spec: PathFieldSpec): string => {
    const value = parseTypedNumber(texts[spec.field]);
    if (value === null) return texts[spec.field];
    return formatNumber(fromSI(to, spec.dimension, toSI(from, spec.dimension, value)));
  };
  return {
    mass: convert(PATH_FIELDS[0]!),
    start: convert(PATH_FIELDS[1]!),
    end: convert(PATH_FIELDS[2]!),
    pressure: convert(PATH_FIELDS[3]!),
  };
}

/** Outcome of computing the pane's path. */
export type PathOutcome =
  | {
      readonly ok: true;
      readonly data: PathChartData;
      /** The cell formula that gives the same table. */
      readonly formula: string;
    }
  | {
      readonly ok: false;
      readonly message: string;
      /** The field to fix, when the message is about one. */
      readonly field?: PathField;
    };

/**
 * The field a core message is about, when it opens by naming it (core's checks name the argument
 * first: "mass …", "start temperature …", "end temperature …", "pressure …").
 */
function fieldOfMessage(message: string): PathField | undefined {
  const opening = message.toLowerCase();
  if (opening.startsWith("mass ")) return "mass";
  if (opening.startsWith("start temperature ")) return "start";
  if (opening.startsWith("end temperature ")) return "end";
  if (opening.startsWith("pressure ")) return "pressure";
  return undefined;
}

/** A message as a sentence: capital first letter, full stop at the end. */
function sentence(message: string): string {
  const text = message.trim();
  const capital = `${text.charAt(0).toUpperCase()}${text.slice(1)}`;
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

function formulaNumber(value: number): string {
  return String(value);
}

/** Runs core's path for the typed inputs in `system`, `unitsText` being that system's text. */
export function computePath(
  substance: SubstanceDefinition,
  system: UnitSystem,
  unitsText: string,
  texts: PathTexts,
): PathOutcome {
  const numbers = {} as Record<PathField, number>;
  for (const spec of PATH_FIELDS) {
    const value = parseTypedNumber(texts[spec.field]);
    if (value === null) {
      const typed = texts[spec.field].trim();
      const what = typed === "" ? "is empty" : `"${typed}" is not a number`;
      return {
        ok: false,
        field: spec.field,
        message: `${spec.label} ${what}: enter a number in ${unitSymbol(system, spec.dimension)} (decimal point, e.g. 1.5).`,
      };
    }
    numbers[spec.field] = value;
  }
  try {
    const molarMass = substance.constants.molarMass?.value;
    const steps = isobaricPath(
      substance,
      toSI(system, "mass", numbers.mass, molarMass),
      toSI(system, "temperature", numbers.start),
      toSI(system, "temperature", numbers.end),
      toSI(system, "pressure", numbers.pressure),
    );
    const args = [
      `"${substance.name}"`,
      ...PATH_FIELDS.map((spec) => formulaNumber(numbers[spec.field])),
      `"${unitsText}"`,
    ];
    return { ok: true, data: chartFromSteps(steps, system), formula: `=PHASE.PATH(${args.join(", ")})` };
  } catch (error) {
    if (error instanceof PhaseError) {
      const message = sentence(error.format(formatterFor(system, substance.constants.molarMass?.value)));
      const field = fieldOfMessage(message);
      return field === undefined ? { ok: false, message } : { ok: false, message, field };
    }
    const detail = error instanceof Error ? error.message : String(error);
    return { ok: false, message: `Phasecell could not compute this path (internal: ${detail}). Please report the inputs.` };
  }
}
