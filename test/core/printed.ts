/**
 * Tolerances derived from how a publication prints a check value: a value printed as
 * "0.353658941e-2" is known to half a unit in its last printed digit, 0.5e-11.
 */

/** A check value as printed, and the half unit of its last printed digit. */
export interface PrintedValue {
  /** The text exactly as the publication prints it (mantissa and power of ten). */
  readonly text: string;
  readonly value: number;
  /** Half a unit in the last printed digit, in the same unit as the value. */
  readonly halfUnit: number;
}

/** Reads "0.353658941e-2", "138.268" or "8.94735e-6" into its value and half-unit tolerance. */
export function printed(text: string): PrintedValue {
  const match = /^(-?)(\d+)(?:\.(\d*))?(?:e([+-]?\d+))?$/i.exec(text.trim());
  if (!match) throw new Error(`not a printed decimal: ${text}`);
  const decimals = (match[3] ?? "").length;
  const exponent = Number(match[4] ?? "0");
  return { text, value: Number(text), halfUnit: 0.5 * 10 ** (exponent - decimals) };
}
