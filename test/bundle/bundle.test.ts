/**
 * The BUILT add-in in dist/, checked the way Excel uses it: dist/functions.js is evaluated in a
 * fresh node:vm global with a CustomFunctions stand-in (addin/bundle-runner.mjs), its
 * associations are compared with dist/functions.json, and functions are called with cell-shaped
 * arguments and checked against published check values. Also the shared page, the built manifest
 * and the demo that `npm start` prints.
 *
 * Needs a build: `npm test` builds first (pretest); alone, run `npm run build` and then
 * `npx vitest run test/bundle`.
 */
import { existsSync, readFileSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { CustomFunctionsError, loadFunctionsBundle, type LoadedBundle } from "../../addin/bundle-runner.mjs";
import { runDemo } from "../../addin/demo.mjs";
import { DEMO_ROWS } from "../../addin/demo-scenario.mjs";
import { DEV, RELEASE } from "../../addin/manifest-flavour.cjs";
import { expectClose } from "../helpers/expect-close";
import { checkManifest } from "../addin/manifest-rules";

const ROOT = join(__dirname, "..", "..");
const DIST = join(ROOT, "dist");

/** Ids shipped in functions.json. An id is permanent once shipped (saved workbooks store it). */
const SHIPPED_IDS = [
  "STATE", "SATPRESSURE", "SATTEMP", "MELTTEMP", "MELTPRESSURE", "CONSTANT", "SOURCE", "SUBSTANCES",
  "PATHENERGY", "PATH", "ENDSTATE", "ENTHALPY", "LATENTHEAT", "MARGIN", "SLOPE", "CROSSINGS",
];

/**
 * Half a unit in the last printed digit of a published value: the tolerance for "agrees with
 * every digit printed". "0.353658941e-2" → 0.5e-11.
 */
function halfUnit(printed: string): number {
  const [mantissa, exponent = "0"] = printed.toLowerCase().split("e");
  const decimals = (mantissa!.split(".")[1] ?? "").length;
  return 0.5 * 10 ** (Number(exponent) - decimals);
}

/** The single value of a 1 × 1 result. */
function single(result: unknown): unknown {
  expect(Array.isArray(result), "results come back as a 2-D array").toBe(true);
  const rows = result as unknown[][];
  expect(rows).toHaveLength(1);
  expect(rows[0]).toHaveLength(1);
  return rows[0]![0];
}

async function valueOf(bundle: LoadedBundle, id: string, ...args: unknown[]): Promise<number> {
  const value = single(await bundle.invoke(id, ...args));
  expect(typeof value, `${id}(${args.map((a) => JSON.stringify(a)).join(", ")}) returns a number`).toBe("number");
  return value as number;
}

/** Calls a function that must fail, and returns the Excel error it threw. */
async function errorOf(bundle: LoadedBundle, id: string, ...args: unknown[]): Promise<CustomFunctionsError> {
  let thrown: unknown;
  try {
    await bundle.invoke(id, ...args);
  } catch (error) {
    thrown = error;
  }
  expect(thrown, `${id}(${args.map((a) => JSON.stringify(a)).join(", ")}) throws`).toBeDefined();
  expect(thrown, "it throws a CustomFunctions.Error, not an uncaught exception").toBeInstanceOf(CustomFunctionsError);
  const error = thrown as CustomFunctionsError;
  expect(["#VALUE!", "#N/A"], "only #VALUE! and #N/A carry a message").toContain(error.code);
  expect(error.message.trim().length, "the error carries a message").toBeGreaterThan(10);
  return error;
}

/**
 * Custom-function id and name rules (Microsoft, "Custom functions naming and localization"):
 * a letter first, at least three characters, only A–Z, 0–9, "_" and "."; not a cell reference
 * (A1 … XFD1048576, R1C1 … R1048576C16384) and not an Excel 4.0 macro function name.
 */
const CELL_REFERENCE_A1 = /^([A-Z]{1,3})([1-9]\d{0,6})$/;
const CELL_REFERENCE_R1C1 = /^R\d*C\d*$|^R\d+$|^C\d+$/;
/** A few Excel 4.0 macro function names (from memory; the full list is in Microsoft's macro reference). */
const MACRO_NAMES = ["RUN", "ECHO", "HALT", "RETURN", "RESULT", "ARGUMENT", "FORMULA", "SELECTION", "CALLER", "EVALUATE", "REGISTER", "CALL", "EXEC", "ALERT", "INPUT", "BEEP", "WAIT", "VOLATILE", "FILES", "DOCUMENTS", "MESSAGE", "STEP", "ERROR"];

function columnNumber(letters: string): number {
  return [...letters].reduce((n, letter) => n * 26 + (letter.charCodeAt(0) - 64), 0);
}

function namingProblems(id: string): string[] {
  const problems: string[] = [];
  if (!/^[A-Z][A-Z0-9_.]*$/.test(id)) problems.push("must start with a letter and use only A-Z, 0-9, _ and .");
  if (id.length < 3) problems.push("must have at least three characters");
  const a1 = CELL_REFERENCE_A1.exec(id);
  if (a1 && columnNumber(a1[1]!) <= 16384 && Number(a1[2]) <= 1048576) problems.push("looks like an A1 cell reference");
  if (CELL_REFERENCE_R1C1.test(id)) problems.push("looks like an R1C1 reference");
  if (MACRO_NAMES.includes(id)) problems.push("is an Excel 4.0 macro function name");
  return problems;
}

let bundle: LoadedBundle;

beforeAll(() => {
  if (!existsSync(join(DIST, "functions.js")) || !existsSync(join(DIST, "functions.json"))) {
    throw new Error("dist/ has no build (functions.js / functions.json missing): run `npm run build` first");
  }
  const built = statSync(join(DIST, "functions.js")).mtimeMs;
  const newer = ["core", "functions"].flatMap((folder) =>
    readdirSync(join(ROOT, folder), { recursive: true, encoding: "utf8" })
      .filter((file) => file.endsWith(".ts") && statSync(join(ROOT, folder, file)).mtimeMs > built)
      .map((file) => `${folder}/${file}`),
  );
  if (newer.length > 0) {
    console.warn(`dist/ is older than ${newer.slice(0, 3).join(", ")}${newer.length > 3 ? " …" : ""}: run \`npm run build\` to test the current sources`);
  }
  bundle = loadFunctionsBundle(DIST);
});

describe("dist/functions.js against dist/functions.json", () => {
  it("loads without console output", () => {
    expect(bundle.consoleLines).toEqual([]);
  });

  it("associates exactly the ids the metadata declares", () => {
    const declared = bundle.metadata.functions.map((entry) => entry.id.toUpperCase()).sort();
    expect([...bundle.associationOrder].sort()).toEqual(declared);
    expect(new Set(declared).size, "ids are unique").toBe(declared.length);
  });

  it("still ships every id shipped so far", () => {
    const declared = bundle.metadata.functions.map((entry) => entry.id);
    for (const id of SHIPPED_IDS) expect(declared, `${id} is still declared`).toContain(id);
  });

  it("keeps the id and name rules", () => {
    for (const entry of bundle.metadata.functions) {
      expect(namingProblems(entry.id), `id ${entry.id}`).toEqual([]);
      expect(entry.name, "name equals id (no localised names)").toBe(entry.id);
    }
  });

  it("declares units as a plain optional argument and lets Excel propagate error cells", () => {
    for (const entry of bundle.metadata.functions) {
      for (const parameter of entry.parameters.filter((p) => p.name === "units")) {
        expect(parameter.optional, `${entry.id}: units is optional`).toBe(true);
        expect(parameter.dimensionality ?? "scalar", `${entry.id}: units is one text, not a range`).toBe("scalar");
      }
    }
    // Decision (addin/webpack.config.js): functions.json is used as generated, without
    // allowErrorForDataTypeAny, so an error cell given as input stays Excel's own error.
    expect(bundle.metadata).not.toHaveProperty("allowErrorForDataTypeAny");
  });
});

describe("values through the built bundle (water)", () => {
  // IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997 (IF97),
  // Table 35: saturation pressure from Eq. (30), printed to 9 significant digits (T / K, p_s / MPa).
  const IF97_TABLE_35: ReadonlyArray<readonly [number, string]> = [
    [300, "0.353658941e-2"],
    [500, "0.263889776e1"],
    [600, "0.123443146e2"],
  ];
  // Same release, Table 36: saturation temperature from Eq. (31) (p / MPa, T_s / K).
  const IF97_TABLE_36: ReadonlyArray<readonly [number, string]> = [
    [0.1, "0.372755919e3"],
    [1, "0.453035632e3"],
    [10, "0.584149488e3"],
  ];

  it.each(IF97_TABLE_35)("SATPRESSURE at %s K, in MPa (IF97 Table 35)", async (temperatureK, printed) => {
    expectClose(await valueOf(bundle, "SATPRESSURE", "water", temperatureK, "K MPa"), Number(printed), { abs: halfUnit(printed) });
  });

  it.each(IF97_TABLE_36)("SATTEMP at %s MPa (IF97 Table 36)", async (pressureMPa, printed) => {
    expectClose(await valueOf(bundle, "SATTEMP", "water", pressureMPa, "MPa"), Number(printed), { abs: halfUnit(printed) });
  });

  it("SATPRESSURE in SI by default: IF97 Table 35, p_s(300 K) = 0.00353658941 MPa", async () => {
    expectClose(await valueOf(bundle, "SATPRESSURE", "water", 300), 3536.58941, { abs: halfUnit("0.353658941e-2") * 1e6 });
  });

  it("spills a column of temperatures: IF97 Table 35, all rows", async () => {
    const result = (await bundle.invoke("SATPRESSURE", "water", IF97_TABLE_35.map(([t]) => [t]), "K MPa")) as unknown[][];
    expect(result).toHaveLength(3);
    result.forEach((row, i) => expectClose(row[0] as number, Number(IF97_TABLE_35[i]![1]), { abs: halfUnit(IF97_TABLE_35[i]![1]) }));
  });

  it("converts units the way engineers type them", async () => {
    // 0 °C = 273.15 K exactly (SI brochure, 9th ed., 2019): 26.85 °C is IF97 Table 35's 300 K.
    expectClose(await valueOf(bundle, "SATPRESSURE", "water", 26.85, "C MPa"), 0.00353658941, { abs: halfUnit("0.353658941e-2") });
    // 1 MPa = 10 bar exactly; IF97 Table 36: T_s(1 MPa) = 453.035632 K → 179.885632 °C.
    expectClose(await valueOf(bundle, "SATTEMP", "water", 10, "C bar"), 453.035632 - 273.15, { abs: halfUnit("0.453035632e3") });
    // Same, in psia and °F: psi = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)², exact by
    // definition (NIST SP 811 (2008), App. B); T/°F = 1.8·T/K − 459.67.
    const psiPa = (0.45359237 * 9.80665) / 0.0254 ** 2;
    expectClose(await valueOf(bundle, "SATTEMP", "water", 1e6 / psiPa, "F psia"), 1.8 * 453.035632 - 459.67, {
      abs: 1.8 * halfUnit("0.453035632e3"),
    });
    // Gauge pressure relative to the standard atmosphere, 101.325 kPa (design: barg): 1 bar
    // absolute is −0.01325 barg; IF97 Table 36: T_s(0.1 MPa) = 372.755919 K.
    expectClose(await valueOf(bundle, "SATTEMP", "water", -0.01325, "C barg"), 372.755919 - 273.15, { abs: halfUnit("0.372755919e3") + 1e-9 });
  });

  // IAPWS R14-08(2011), Revised Release on the Pressure along the Melting and Sublimation Curves
  // of Ordinary Water Substance: check values for computer-program verification, printed to
  // 6 significant digits (T / K, p / MPa).
  it("sublimation pressure: R14-08 check value p_sub(230 K) = 8.94735e-6 MPa", async () => {
    expectClose(await valueOf(bundle, "SATPRESSURE", "water", 230, "K MPa"), 8.94735e-6, { abs: halfUnit("8.94735e-6") });
  });

  it("melting pressure of ice Ih: R14-08 check value p_m(260 K) = 138.268 MPa, also given in °C", async () => {
    expectClose(await valueOf(bundle, "MELTPRESSURE", "water", 260, "K MPa"), 138.268, { abs: halfUnit("138.268") });
    expectClose(await valueOf(bundle, "MELTPRESSURE", "water", -13.15, "C MPa"), 138.268, { abs: halfUnit("138.268") });
  });

  it("melting pressure of a named solid: R14-08 check values for ice III (254 K) and ice V (265 K)", async () => {
    expectClose(await valueOf(bundle, "MELTPRESSURE", "water", 254, "K MPa", "ice III"), 268.685, { abs: halfUnit("268.685") });
    expectClose(await valueOf(bundle, "MELTPRESSURE", "water", 265, "K MPa", "ice V"), 479.64, { abs: halfUnit("479.64") });
  });

  it("melting temperature inverts the R14-08 check value: T_m(138.268 MPa) = 260 K", async () => {
    // The printed pressure's rounding (0.0005 MPa) moves T by well under 1e-4 K on this curve,
    // whose slope there is about −8 to −14 MPa/K (from R14-08's own end points, 251.165 K at
    // 208.566 MPa and 273.16 K at 611.657 Pa); 1 mK is a generous bound.
    expectClose(await valueOf(bundle, "MELTTEMP", "water", 138.268, "K MPa"), 260, { abs: 1e-3 });
  });

  it("constants: IF97 Eqs. (2), (3) and (9)", async () => {
    expectClose(await valueOf(bundle, "CONSTANT", "water", "Tc"), 647.096, { rel: 1e-12 });
    expectClose(await valueOf(bundle, "CONSTANT", "water", "Pc", "MPa"), 22.064, { rel: 1e-12 });
    expectClose(await valueOf(bundle, "CONSTANT", "water", "Tt", "C"), 273.16 - 273.15, { abs: 1e-12 });
    expectClose(await valueOf(bundle, "CONSTANT", "water", "Pt", "Pa"), 611.657, { rel: 1e-12 });
  });

  it("phase words at states on either side of published curves", async () => {
    // Liquid at 25 °C and 1 atm, vapour at 150 °C and 1 bar: the boiling point at 0.1 MPa is
    // 372.755919 K (IF97 Table 36); ice at −10 °C and 1 atm (common practice).
    expect(single(await bundle.invoke("STATE", "water", 25, 1, "C atm"))).toBe("liquid");
    expect(single(await bundle.invoke("STATE", "H2O", 150, 1, "C bar"))).toBe("vapor");
    expect(single(await bundle.invoke("STATE", "water", -10, 1, "C atm"))).toBe("solid");
    // Around the R14-08 check value p_sub(230 K) = 8.94735 Pa: vapour below it, ice above it.
    expect(single(await bundle.invoke("STATE", "water", 230, 5, "K Pa"))).toBe("vapor");
    expect(single(await bundle.invoke("STATE", "water", 230, 20, "K Pa"))).toBe("solid");
    // Above Tc = 647.096 K: gas below Pc = 22.064 MPa, supercritical fluid above (IF97 Eqs. 2, 3; design words).
    expect(single(await bundle.invoke("STATE", "water", 700, 1, "K MPa"))).toBe("gas");
    expect(single(await bundle.invoke("STATE", "water", 700, 25, "K MPa"))).toBe("supercritical fluid");
  });

  it("tables: SUBSTANCES and SOURCE spill with a header row", async () => {
    const substances = (await bundle.invoke("SUBSTANCES")) as unknown[][];
    expect(substances.length).toBeGreaterThan(1);
    expect(substances.flat()).toContain("water");
    const source = (await bundle.invoke("SOURCE", "water", "boiling")) as unknown[][];
    expect(source.length).toBeGreaterThan(1);
    expect(source.flat().join(" ")).toMatch(/IAPWS/);
  });
});

describe("errors through the built bundle", () => {
  it("no saturation above the critical point → #N/A with a message", async () => {
    expect((await errorOf(bundle, "SATPRESSURE", "water", 700)).code).toBe("#N/A");
    expect((await errorOf(bundle, "SATTEMP", "water", 30, "MPa")).code).toBe("#N/A");
  });

  it("inputs that cannot be used → #VALUE! saying what to change", async () => {
    expect((await errorOf(bundle, "STATE", "unobtainium", 300, 1e5)).message).toMatch(/unobtainium/);
    expect((await errorOf(bundle, "SATPRESSURE", "water", 20, "C furlongs")).message).toMatch(/furlongs/);
    expect((await errorOf(bundle, "SATPRESSURE", "water", "hot")).code).toBe("#VALUE!");
    expect((await errorOf(bundle, "SATPRESSURE", "water", null)).code).toBe("#VALUE!");
    expect((await errorOf(bundle, "SATPRESSURE", "water", -300, "C")).code).toBe("#VALUE!");
    expect((await errorOf(bundle, "SATTEMP", "water", -5, "bar")).code).toBe("#VALUE!");
  });

  it("a bad element inside a range becomes an error value in its own cell of the spill", async () => {
    const result = (await bundle.invoke("SATPRESSURE", "water", [[300], [700]], "K MPa")) as unknown[][];
    expectClose(result[0]![0] as number, 0.00353658941, { abs: halfUnit("0.353658941e-2") });
    expect(result[1]![0]).toBeInstanceOf(CustomFunctionsError);
    expect((result[1]![0] as CustomFunctionsError).code).toBe("#N/A");
  });

  it("nothing a user can put in a cell escapes as an uncaught exception", async () => {
    // What Excel can hand to an `any` argument: numbers, texts, booleans, empty cells (null),
    // ranges (also ragged or empty through odd references) and linked data values (objects).
    const odd: unknown[] = [null, "", "  ", true, false, 0, -1, 1e308, -1e308, "abc", "1e3 bar", [[1, 2], [3]], [[]], { type: "Entity", text: "x" }];
    const sensible: Record<string, unknown> = { substance: "water", temperature: 300, pressure: 1e5, units: "K Pa", name: "Tc", quantity: "boiling", detail: false, form: "" };
    for (const entry of bundle.metadata.functions) {
      for (let position = 0; position < entry.parameters.length; position++) {
        for (const value of odd) {
          const args = entry.parameters.map((p, i) => (i === position ? value : (sensible[p.name] ?? null)));
          let result: unknown;
          try {
            result = await bundle.invoke(entry.id, ...args);
          } catch (error) {
            expect(error, `${entry.id}(${JSON.stringify(args)}) threw a non-Excel error`).toBeInstanceOf(CustomFunctionsError);
            expect(["#VALUE!", "#N/A"]).toContain((error as CustomFunctionsError).code);
            expect((error as CustomFunctionsError).message.length).toBeGreaterThan(0);
            continue;
          }
          expect(Array.isArray(result), `${entry.id}(${JSON.stringify(args)}) returns a 2-D array`).toBe(true);
          for (const cell of (result as unknown[][]).flat()) {
            const ok =
              typeof cell === "number" ? Number.isFinite(cell) : typeof cell === "string" || typeof cell === "boolean" || cell instanceof CustomFunctionsError;
            expect(ok, `${entry.id}(${JSON.stringify(args)}) returned cell ${String(cell)}`).toBe(true);
          }
        }
      }
    }
  });
});

describe("the built shared page and manifest", () => {
  it("taskpane.html loads office.js, then functions.js and taskpane.js as plain deferred scripts", () => {
    const html = readFileSync(join(DIST, "taskpane.html"), "utf8");
    const scripts = [...html.matchAll(/<script\b([^>]*)>/g)].map((match) => match[1]!);
    const src = (attributes: string): string => /\bsrc=["']?([^"'\s>]+)/.exec(attributes)?.[1] ?? "";
    expect(scripts.map(src)).toEqual(["https://appsforoffice.microsoft.com/lib/1/hosted/office.js", "functions.js", "taskpane.js"]);
    for (const attributes of scripts.slice(1)) {
      expect(attributes, "deferred").toMatch(/\bdefer\b/);
      expect(attributes, "a classic script, not a module").not.toMatch(/type=["']?module/);
      expect(attributes, "not async (order matters)").not.toMatch(/\basync\b/);
    }
    for (const match of html.matchAll(/\b(?:src|href)=["']?([^"'\s>]+)/g)) {
      const target = match[1]!;
      if (/^https?:/.test(target)) continue;
      expect(existsSync(join(DIST, target)), `${target} linked from taskpane.html exists in dist/`).toBe(true);
    }
  });

  it("bundles generate no code at run time (Content-Security-Policy without unsafe-eval)", () => {
    for (const file of readdirSync(DIST).filter((name) => name.endsWith(".js"))) {
      const code = readFileSync(join(DIST, file), "utf8");
      expect(code, `${file} calls eval`).not.toMatch(/\beval\s*\(/);
      expect(code, `${file} builds a Function from text`).not.toMatch(/new\s+Function\s*\(/);
    }
  });

  it("dist/manifest.xml keeps the rules and matches its flavour", async () => {
    const facts = await checkManifest(readFileSync(join(DIST, "manifest.xml"), "utf8"));
    const flavour = facts.namespace === DEV.namespace ? DEV : RELEASE;
    expect([RELEASE.namespace, DEV.namespace]).toContain(facts.namespace);
    expect(facts.id).toBe(flavour.id);
    expect(facts.displayName).toBe(flavour.displayName);
    const base = facts.sharedUrl.replace(/taskpane\.html$/, "");
    for (const url of [facts.functionsScriptUrl, facts.functionsMetadataUrl, ...facts.iconUrls]) {
      expect(url.startsWith(base), `${url} is served next to the page`).toBe(true);
      expect(existsSync(join(DIST, url.slice(base.length))), `${url} exists in dist/`).toBe(true);
    }
  });
});

describe("the demo printed by npm start", () => {
  it("evaluates every row through the built bundle and shows the deliberate mistake as an error", async () => {
    const { text, rows } = await runDemo({ distDir: DIST });
    expect(rows).toHaveLength(DEMO_ROWS.length);
    for (const row of rows) expect(text).toContain(row.formula);
    const mistakes = rows.filter((row) => row.error?.code === "#VALUE!");
    expect(mistakes.length).toBeGreaterThan(0);
    for (const row of mistakes) expect(row.error!.message.length).toBeGreaterThan(10);
    const answered = rows.filter((row) => row.error === undefined);
    expect(answered.length).toBeGreaterThan(rows.length / 2);
  });
});
