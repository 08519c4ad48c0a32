/**
 * Every substance answers every function through the built bundle, the way Excel calls it, or
 * returns #VALUE! / #N/A with a message that says why. The values themselves are checked against
 * their published sources in test/core; here the point is that nothing a substance lacks (a
 * melting curve, a triple point, an enthalpy model) escapes as an uncaught exception or a bare
 * error.
 */
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { CustomFunctionsError, loadFunctionsBundle, type LoadedBundle } from "../../addin/bundle-runner.mjs";

const DIST = join(__dirname, "..", "..", "dist");
let bundle: LoadedBundle;
let names: string[] = [];

beforeAll(async () => {
  bundle = loadFunctionsBundle(DIST);
  const table = (await bundle.invoke("SUBSTANCES")) as unknown[][];
  names = table.slice(1).map((row) => String(row[0]));
});

/** What a call gave: a value, a table, or an Excel error with its message. */
async function answer(id: string, ...args: unknown[]): Promise<unknown> {
  try {
    return await bundle.invoke(id, ...args);
  } catch (error) {
    return error;
  }
}

function expectAnswered(result: unknown, call: string): void {
  if (result instanceof CustomFunctionsError) {
    expect(["#VALUE!", "#N/A"], `${call}: error code`).toContain(result.code);
    expect(result.message.length, `${call}: error message`).toBeGreaterThan(20);
    return;
  }
  expect(Array.isArray(result), `${call}: returns a range`).toBe(true);
  for (const row of result as unknown[][]) {
    for (const cell of row) {
      if (cell instanceof CustomFunctionsError) {
        expect(cell.message.length, `${call}: element error message`).toBeGreaterThan(20);
        continue;
      }
      expect(["number", "string"], `${call}: cell type`).toContain(typeof cell);
      if (typeof cell === "number") expect(Number.isFinite(cell), `${call}: finite`).toBe(true);
    }
  }
}

function firstNumber(result: unknown): number | undefined {
  if (!Array.isArray(result)) return undefined;
  const cell = (result as unknown[][])[0]?.[0];
  return typeof cell === "number" ? cell : undefined;
}

describe("every substance through the built bundle", () => {
  it("lists the substances of the library (water, carbon dioxide and 27 more)", () => {
    expect(names.length).toBeGreaterThanOrEqual(29);
    expect(names).toContain("water");
    expect(names).toContain("carbon dioxide");
  });

  it("answers every function for every substance, or says why not", async () => {
    let calls = 0;
    for (const name of names) {
      const tc = firstNumber(await answer("CONSTANT", name, "Tc"));
      const pc = firstNumber(await answer("CONSTANT", name, "Pc"));
      expect(tc, `${name}: Tc`).toBeGreaterThan(0);
      expect(pc, `${name}: Pc`).toBeGreaterThan(0);
      const tb = firstNumber(await answer("CONSTANT", name, "Tb")) ?? 0.8 * tc!;
      const calls_: [string, unknown[]][] = [
        ["STATE", [name, 1.2 * tc!, 1.5 * pc!]],
        ["STATE", [name, 1.2 * tc!, 0.01 * pc!, "", true]],
        ["STATE", [name, 0.5 * tb, 0.5 * pc!]],
        ["SATPRESSURE", [name, 0.9 * tc!]],
        ["SATTEMP", [name, 0.3 * pc!]],
        ["MELTTEMP", [name, 0.5 * pc!]],
        ["MELTPRESSURE", [name, 1.1 * tb]],
        ["CONSTANT", [name, "Tt"]],
        ["CONSTANT", [name, "Hvap", "kJ kg"]],
        ["SOURCE", [name]],
        ["PATHENERGY", [name, 1, 0.9 * tb, 1.3 * tc!, 101325]],
        ["PATH", [name, 1, 0.9 * tb, 1.3 * tc!, 101325]],
        ["ENDSTATE", [name, 1, 0.9 * tb, 1e5, 101325]],
        ["ENTHALPY", [name, 1.3 * tc!, 101325]],
        ["LATENTHEAT", [name, "vaporization", 0.9 * tc!]],
        ["LATENTHEAT", [name, "fusion", tb]],
        ["MARGIN", [name, 1.05 * tb, 101325]],
        ["SLOPE", [name, "boiling", 0.9 * tc!]],
        ["CROSSINGS", [name, 0.9 * tb, 101325, 1.3 * tc!, 101325]],
      ];
      for (const [id, args] of calls_) {
        expectAnswered(await answer(id, ...args), `${id}(${args.map((a) => JSON.stringify(a)).join(", ")})`);
        calls++;
      }
      // The saturation round trip holds wherever the curve exists.
      const ps = firstNumber(await answer("SATPRESSURE", name, 0.9 * tc!));
      if (ps !== undefined) {
        const back = firstNumber(await answer("SATTEMP", name, ps));
        expect(Math.abs(back! - 0.9 * tc!) / tc!, `${name}: SATTEMP(SATPRESSURE(0.9 Tc))`).toBeLessThan(1e-9);
      }
    }
    expect(calls).toBe(names.length * 19);
  });
});
