/**
 * Maps anything thrown below into the two Excel error values that can carry a message:
 * #VALUE! (the input cannot be used) and #N/A (the quantity does not exist there).
 */
import { formatNumber, PhaseError, type QuantityFormatter } from "../core/errors";
import { fromSI, unitSymbol, type UnitSystem, SI } from "../core/units/units";

/** Excel's codes for the two errors Phasecell uses. */
export const VALUE_ERROR = "#VALUE!";
export const NOT_AVAILABLE = "#N/A";

type ErrorCode = typeof VALUE_ERROR | typeof NOT_AVAILABLE;

/** Outside Excel (plain browser, tests) `CustomFunctions.Error` may be missing: same shape. */
class DetachedError extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

function errorCodeFor(code: ErrorCode): CustomFunctions.ErrorCode {
  const codes = typeof CustomFunctions === "undefined" ? undefined : CustomFunctions.ErrorCode;
  if (codes) return code === VALUE_ERROR ? codes.invalidValue : codes.notAvailable;
  return code as unknown as CustomFunctions.ErrorCode;
}

/** Builds the error value Excel shows, with its message. */
export function excelError(code: ErrorCode, message: string): CustomFunctions.Error {
  const ErrorClass = typeof CustomFunctions === "undefined" ? undefined : CustomFunctions.Error;
  if (typeof ErrorClass === "function") return new ErrorClass(errorCodeFor(code), message);
  return new DetachedError(code, message) as unknown as CustomFunctions.Error;
}

/** Renders quantities inside messages in the caller's units. */
export function formatterFor(units: UnitSystem, molarMass?: number): QuantityFormatter {
  return (part) => {
    if (part.dimension === "dimensionless") return formatNumber(part.value);
    let value: number;
    try {
      value = fromSI(units, part.dimension, part.value, molarMass);
    } catch {
      return `${formatNumber(part.value)} ${unitSymbol(SI, part.dimension)}`;
    }
    return `${formatNumber(value)} ${unitSymbol(units, part.dimension)}`;
  };
}

/**
 * Converts whatever was thrown into an Excel error value. PhaseError kinds map to #VALUE!
 * (bad input, out of range) and #N/A (no such state); anything else is an internal fault shown
 * as #VALUE! with a message that says so.
 */
export function toExcelError(error: unknown, units: UnitSystem = SI, molarMass?: number): CustomFunctions.Error {
  if (error instanceof PhaseError) {
    const code = error.kind === "no-such-state" ? NOT_AVAILABLE : VALUE_ERROR;
    return excelError(code, error.format(formatterFor(units, molarMass)));
  }
  if (isExcelError(error)) return error;
  const detail = error instanceof Error ? error.message : String(error);
  return excelError(
    VALUE_ERROR,
    `Phasecell could not compute this value (internal: ${detail}). Please report the inputs.`,
  );
}

/** True for an Excel error value made by {@link excelError} or by Excel itself. */
export function isExcelError(value: unknown): value is CustomFunctions.Error {
  if (typeof value !== "object" || value === null) return false;
  const ErrorClass = typeof CustomFunctions === "undefined" ? undefined : CustomFunctions.Error;
  if (typeof ErrorClass === "function" && value instanceof ErrorClass) return true;
  return value instanceof DetachedError;
}
