/**
 * The pane's substance search: any name a cell function accepts (common name, formula, CAS
 * number, refrigerant number, other aliases) picks the substance; otherwise the core's own message
 * with its nearest names. No DOM, so it runs in Node tests.
 */
import { PhaseError } from "../../core/errors";
import { findSubstance, SUBSTANCES } from "../../core/substances/registry";
import type { ConstantRow } from "./rows";

/** Every name the search offers as a suggestion, each once. */
export function searchNames(): string[] {
  return [...new Set(SUBSTANCES.flatMap((s) => [s.name, s.formula, s.cas, ...(s.refrigerant ? [s.refrigerant] : []), ...s.aliases]))];
}

/** The substance a typed name means, or the message saying what to type instead. */
export function resolveSubstance(text: string): { readonly id: string } | { readonly message: string } {
  try {
    return { id: findSubstance(text).id };
  } catch (error) {
    return { message: error instanceof PhaseError ? error.message : String(error) };
  }
}

/**
 * A constant as a reviewer wants it pasted into a report: quantity, symbol, value with unit, and
 * the full citation with its DOI or standard number and where in the source it stands.
 */
export function constantWithCitation(substanceName: string, row: ConstantRow): string {
  const value = row.quantity.unit ? `${row.quantity.text} ${row.quantity.unit}` : row.quantity.text;
  const locator = row.source.locator ? ` [${row.source.locator}]` : "";
  return `${substanceName}, ${row.label} (${row.symbol}) = ${value}. Source: ${row.source.reference}${locator}; ${row.note}.`;
}
