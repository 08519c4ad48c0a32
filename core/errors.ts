/**
 * Typed errors of the Phasecell core.
 *
 * Every failure the core can report is a {@link PhaseError} with a `kind` that says how a caller
 * should present it, and a message built from parts so that quantities inside it can be shown in
 * whatever units the caller works in (the core itself only knows SI).
 */

/** Physical dimension of a quantity named inside an error message. */
export type Dimension =
  | "temperature"
  | "temperatureDifference"
  | "pressure"
  | "energy"
  | "specificEnergy"
  | "mass"
  | "density"
  | "molarMass"
  | "dimensionless";

/** A quantity inside a message, in SI units, to be rendered in the reader's units. */
export interface QuantityPart {
  readonly value: number;
  readonly dimension: Dimension;
}

/** A message is text interleaved with quantities. */
export type MessagePart = string | QuantityPart;

/**
 * How an error should reach the user:
 * - `bad-input`: the value cannot be used as given (text where a number belongs, negative kelvin…);
 * - `out-of-range`: a correlation does not cover the value (no silent extrapolation);
 * - `no-such-state`: the quantity does not exist there (no boiling above the critical point…).
 */
export type PhaseErrorKind = "bad-input" | "out-of-range" | "no-such-state";

/** Formats an SI quantity for a message; the default prints SI units. */
export type QuantityFormatter = (part: QuantityPart) => string;

const SI_SYMBOL: Record<Dimension, string> = {
  temperature: "K",
  temperatureDifference: "K",
  pressure: "Pa",
  energy: "J",
  specificEnergy: "J/kg",
  mass: "kg",
  density: "kg/m3",
  molarMass: "kg/mol",
  dimensionless: "",
};

/** Up to six significant digits, without trailing zeros or exponent noise for ordinary values. */
export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return "0";
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-4 && magnitude < 1e9) {
    return String(Number(value.toPrecision(6)));
  }
  return value.toExponential(5).replace(/\.?0+e/, "e");
}

/** Renders a quantity in SI units. */
export const formatSI: QuantityFormatter = (part) => {
  const symbol = SI_SYMBOL[part.dimension];
  return symbol ? `${formatNumber(part.value)} ${symbol}` : formatNumber(part.value);
};

/** Base class of every error the core throws. */
export class PhaseError extends Error {
  readonly kind: PhaseErrorKind;
  readonly parts: readonly MessagePart[];

  constructor(kind: PhaseErrorKind, parts: readonly MessagePart[]) {
    super(renderParts(parts, formatSI));
    this.name = "PhaseError";
    this.kind = kind;
    this.parts = parts;
  }

  /** The message with every quantity rendered by `format` (for example in the caller's units). */
  format(format: QuantityFormatter): string {
    return renderParts(this.parts, format);
  }
}

/** The input cannot be used as given. */
export class BadInputError extends PhaseError {
  constructor(parts: readonly MessagePart[]) {
    super("bad-input", parts);
    this.name = "BadInputError";
  }
}

/** The input lies outside the range a correlation covers. */
export class OutOfRangeError extends PhaseError {
  constructor(parts: readonly MessagePart[]) {
    super("out-of-range", parts);
    this.name = "OutOfRangeError";
  }
}

/** The quantity asked for does not exist at that state. */
export class NoSuchStateError extends PhaseError {
  constructor(parts: readonly MessagePart[]) {
    super("no-such-state", parts);
    this.name = "NoSuchStateError";
  }
}

/** A numerical method failed to converge; an internal fault, never the user's doing. */
export class ConvergenceError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "ConvergenceError";
  }
}

function renderParts(parts: readonly MessagePart[], format: QuantityFormatter): string {
  return parts.map((part) => (typeof part === "string" ? part : format(part))).join("");
}

/** Shorthands to write messages: `["temperature ", T(x), " is below …"]`. */
export const q = {
  T: (value: number): QuantityPart => ({ value, dimension: "temperature" }),
  dT: (value: number): QuantityPart => ({ value, dimension: "temperatureDifference" }),
  p: (value: number): QuantityPart => ({ value, dimension: "pressure" }),
  E: (value: number): QuantityPart => ({ value, dimension: "energy" }),
  e: (value: number): QuantityPart => ({ value, dimension: "specificEnergy" }),
  m: (value: number): QuantityPart => ({ value, dimension: "mass" }),
  rho: (value: number): QuantityPart => ({ value, dimension: "density" }),
} as const;
