/** Types for demo.mjs (the demo table evaluated through the built bundle), used by the tests. */
import type { DemoRow } from "./demo-scenario.mjs";

export declare const DEFAULT_DIST: string;
export declare function builtNamespace(distDir: string): string;
export declare function displayValue(value: unknown): string;

export interface DemoResultRow {
  readonly where: string;
  readonly formula: string;
  readonly result: string;
  readonly error?: { readonly code: string; readonly message: string };
}

export declare function runDemo(options?: { distDir?: string; rows?: readonly DemoRow[] }): Promise<{
  text: string;
  rows: DemoResultRow[];
}>;
