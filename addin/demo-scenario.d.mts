/** Types for demo-scenario.mjs (invented demo rows), used by the tests. */
export interface DemoRow {
  readonly where: string;
  readonly id: string;
  readonly args: readonly (string | number | boolean)[];
}
export declare const DEMO_SITE: string;
export declare const DEMO_ROWS: readonly DemoRow[];
export declare const DEMO_CAUTIONS: readonly string[];
