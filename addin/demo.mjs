/**
 * `npm run demo`: evaluates the demo rows of addin/demo-scenario.mjs through the BUILT
 * dist/functions.js (loaded as Excel's shared runtime would load it, see bundle-runner.mjs) and
 * prints them as a table. Needs an existing build (`npm run build`); `npm start` builds first.
 */
import { existsSync, readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { loadFunctionsBundle, isErrorValue, MissingBuildError } from "./bundle-runner.mjs";
import { DEMO_ROWS, DEMO_SITE, DEMO_CAUTIONS } from "./demo-scenario.mjs";

const repositoryRoot = join(dirname(fileURLToPath(import.meta.url)), "..");
export const DEFAULT_DIST = join(repositoryRoot, "dist");

/** The function namespace the built manifest declares (PHASE, or PHASEDEV for a dev build). */
export function builtNamespace(distDir) {
  const manifest = join(distDir, "manifest.xml");
  if (!existsSync(manifest)) return "PHASE";
  const match = /<bt:String id="Functions\.Namespace" DefaultValue="([^"]+)"/.exec(readFileSync(manifest, "utf8"));
  return match ? match[1] : "PHASE";
}

function formulaArgument(value) {
  if (typeof value === "string") return `"${value.replace(/"/g, '""')}"`;
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  return String(value);
}

/** Formats one cell value about as Excel's General format would show it. */
export function displayValue(value) {
  if (isErrorValue(value)) return value.code;
  if (typeof value === "number") return Number.isFinite(value) ? String(Number(value.toPrecision(6))) : String(value);
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  if (value === null || value === undefined) return "0";
  return String(value);
}

function displayResult(result) {
  if (!Array.isArray(result)) return displayValue(result);
  const cells = result.flat();
  if (cells.length === 1) return displayValue(cells[0]);
  return `${result.length}×${result[0]?.length ?? 0} spill: ${cells.slice(0, 3).map(displayValue).join(", ")}${cells.length > 3 ? ", …" : ""}`;
}

function wrap(text, width) {
  const lines = [];
  let line = "";
  for (const word of text.split(/\s+/)) {
    if (line !== "" && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else {
      line = line === "" ? word : `${line} ${word}`;
    }
  }
  if (line !== "") lines.push(line);
  return lines;
}

/**
 * Evaluates every demo row and renders the table.
 * @param {{ distDir?: string, rows?: typeof DEMO_ROWS }} [options]
 * @returns {Promise<{ text: string, rows: Array<{ where: string, formula: string, result: string, error?: { code: string, message: string } }> }>}
 */
export async function runDemo({ distDir = DEFAULT_DIST, rows = DEMO_ROWS } = {}) {
  const bundle = loadFunctionsBundle(distDir);
  const namespace = builtNamespace(distDir);
  const evaluated = [];
  for (const row of rows) {
    const formula = `=${namespace}.${row.id}(${row.args.map(formulaArgument).join(", ")})`;
    try {
      const value = await bundle.invoke(row.id, ...row.args);
      const cells = Array.isArray(value) ? value.flat() : [value];
      const firstError = cells.find(isErrorValue);
      evaluated.push({
        where: row.where,
        formula,
        result: displayResult(value),
        ...(firstError ? { error: { code: firstError.code, message: firstError.message } } : {}),
      });
    } catch (thrown) {
      if (!isErrorValue(thrown)) {
        // Not a user-facing error value: Excel would show a bare #VALUE! without a message.
        throw new Error(`${formula} threw something other than CustomFunctions.Error: ${thrown instanceof Error ? thrown.stack : thrown}`);
      }
      evaluated.push({ where: row.where, formula, result: thrown.code, error: { code: thrown.code, message: thrown.message } });
    }
  }

  const header = ["#", "Formula", "Result", "Where"];
  const table = evaluated.map((row, index) => [String(index + 1), row.formula, row.result, row.where]);
  const widths = [0, 1, 2].map((column) => Math.max(header[column].length, ...table.map((cells) => cells[column].length)));
  const render = (cells) =>
    cells.map((cell, column) => (column === 3 ? cell : column === 0 ? cell.padStart(widths[0]) : cell.padEnd(widths[column]))).join("  ");
  const lines = [
    `Phasecell demo: ${DEMO_SITE}`,
    `Evaluated through the built bundle dist/functions.js (${bundle.associationOrder.length} functions associated, namespace ${namespace}).`,
    "",
    render(header),
    render(widths.map((width) => "-".repeat(width)).concat(["-----"])),
  ];
  evaluated.forEach((row, index) => {
    lines.push(render(table[index]));
    if (row.error) {
      const indent = " ".repeat(widths[0] + 2);
      for (const part of wrap(`${row.error.code} message: ${row.error.message}`, 96)) lines.push(`${indent}${part}`);
    }
  });
  lines.push("", ...DEMO_CAUTIONS);
  return { text: lines.join("\n"), rows: evaluated };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  try {
    const { text } = await runDemo();
    console.log(text);
  } catch (error) {
    if (error instanceof MissingBuildError) {
      console.error(`${error.message}`);
      process.exit(1);
    }
    throw error;
  }
}
