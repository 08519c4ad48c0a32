/** Types for bundle-runner.mjs (runs the built functions bundle in node:vm), used by the tests. */
import type { Context } from "node:vm";

export declare const ERROR_CODES: Readonly<{
  invalidValue: "#VALUE!";
  notAvailable: "#N/A";
  divisionByZero: "#DIV/0!";
  invalidNumber: "#NUM!";
  nullReference: "#NULL!";
  invalidName: "#NAME?";
  invalidReference: "#REF!";
}>;

export declare class CustomFunctionsError extends Error {
  constructor(code: string, message?: string);
  readonly code: string;
}

export declare class MissingBuildError extends Error {}

/** One entry of functions.json, as far as the tests read it. */
export interface FunctionMetadata {
  readonly id: string;
  readonly name: string;
  readonly description?: string;
  readonly parameters: ReadonlyArray<{
    readonly name: string;
    readonly description?: string;
    readonly type: string;
    readonly dimensionality?: "scalar" | "matrix";
    readonly optional?: boolean;
    readonly repeating?: boolean;
  }>;
  readonly result: { readonly type?: string; readonly dimensionality?: "scalar" | "matrix" };
  readonly options?: Readonly<Record<string, unknown>>;
}

export interface LoadedBundle {
  readonly metadata: { readonly functions: readonly FunctionMetadata[]; readonly allowCustomDataForDataTypeAny?: boolean };
  readonly associations: ReadonlyMap<string, (...args: unknown[]) => unknown>;
  readonly associationOrder: readonly string[];
  readonly consoleLines: ReadonlyArray<{ level: string; text: string }>;
  invoke(id: string, ...cellArguments: unknown[]): Promise<unknown>;
  readonly context: Context;
}

export declare function loadFunctionsBundle(distDir: string): LoadedBundle;
export declare function isErrorValue(value: unknown): value is CustomFunctionsError;
