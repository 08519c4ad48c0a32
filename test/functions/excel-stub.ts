/**
 * A stand-in for the CustomFunctions global that Excel provides, installed before the functions
 * module is imported (outside Excel the global does not exist).
 */
export class StubExcelError extends Error {
  constructor(
    readonly code: string,
    message = "",
  ) {
    super(message);
  }
}

export function installCustomFunctionsStub(): void {
  (globalThis as Record<string, unknown>)["CustomFunctions"] = {
    associate() {},
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" },
    Error: StubExcelError,
  };
}

/** Calls fn and returns what it returned or the Excel error it threw (anything else fails). */
export function outcome(fn: () => unknown): unknown {
  try {
    return fn();
  } catch (error) {
    if (error instanceof StubExcelError) return error;
    throw error;
  }
}
