/**
 * `npm start`: build, demonstrate, serve, and say how to load the add-in into Excel.
 *
 * 1. builds the release bundle into dist/ (webpack, production mode);
 * 2. evaluates the demo rows (addin/demo-scenario.mjs) through the built dist/functions.js, loaded
 *    the way Excel's shared runtime loads it, and prints them as a table;
 * 3. starts the HTTPS server at https://localhost:3000 in the background (addin/serve.mjs; pid file
 *    under node_modules/.cache/phasecell; `npm run stop` stops it) — skipped when the environment
 *    sets PHASECELL_NO_SERVE=1, e.g. in CI;
 * 4. detects a desktop Excel and prints how to sideload dist/manifest.xml there, or in Excel on the
 *    web (no sideloading tool is installed, so nothing is registered automatically).
 *
 * Never prompts and never needs sudo. Exit code 0 on success, 1 when the build, the demo or the
 * server fails.
 */
import { closeSync, existsSync, openSync, readFileSync, statSync } from "node:fs";
import { createRequire } from "node:module";
import { join } from "node:path";
import { spawn } from "node:child_process";
import { gzipSync } from "node:zlib";
import { homedir } from "node:os";
import { setTimeout as sleep } from "node:timers/promises";
import { performance } from "node:perf_hooks";
import { runDemo } from "./demo.mjs";
import { loadDevCertificates } from "./dev-certs.mjs";
import {
  REPOSITORY_ROOT,
  LOG_FILE,
  SERVER_SCRIPT,
  ensureStateFolder,
  isOurServer,
  portInUse,
  probe,
  readPid,
  removePidFile,
  writePid,
} from "./server-state.mjs";

const require = createRequire(import.meta.url);
const { DEV_PORT } = require("./manifest-flavour.cjs");
const DIST = join(REPOSITORY_ROOT, "dist");
const READY_TIMEOUT_MS = 120_000;

function heading(text) {
  console.log(`\n== ${text}`);
}

function kib(bytes) {
  return `${(bytes / 1024).toFixed(1)} KiB`;
}

/** Runs the production build through webpack's Node API; resolves the seconds it took. */
async function buildRelease() {
  const webpack = require("webpack");
  const configure = require("./webpack.config.js");
  const config = await configure({}, { mode: "production" });
  const started = performance.now();
  const stats = await new Promise((resolve, reject) => {
    const compiler = webpack(config);
    compiler.run((error, result) => {
      compiler.close(() => (error ? reject(error) : resolve(result)));
    });
  });
  const seconds = (performance.now() - started) / 1000;
  if (stats.hasErrors()) {
    console.error(stats.toString({ all: false, errors: true, errorDetails: true, colors: false }));
    throw new Error("the build failed (errors above)");
  }
  if (stats.hasWarnings()) console.warn(stats.toString({ all: false, warnings: true, colors: false }));
  return seconds;
}

function printBuildSummary(seconds) {
  console.log(`built dist/ in ${seconds.toFixed(1)} s`);
  for (const name of ["functions.js", "functions.json", "taskpane.js", "taskpane.html", "taskpane.css", "manifest.xml"]) {
    const file = join(DIST, name);
    if (!existsSync(file)) continue;
    const size = statSync(file).size;
    const gzip = gzipSync(readFileSync(file)).length;
    console.log(`  ${name.padEnd(15)} ${kib(size).padStart(10)}  (${kib(gzip)} gzipped)`);
  }
}

async function startServer() {
  const existing = readPid();
  if (existing !== null && isOurServer(existing)) {
    console.log(`the server is already running (pid ${existing}) at https://localhost:${DEV_PORT}/ and rebuilds on change.`);
    console.log("`npm run stop` stops it.");
    return true;
  }
  removePidFile();
  if (await portInUse(DEV_PORT)) {
    console.error(
      `port ${DEV_PORT} is in use by another program, and the manifest's URLs point there. ` +
        "Stop that program (a `npm run dev-server` in another terminal?) and run `npm start` again.",
    );
    return false;
  }

  const certificates = await loadDevCertificates({ log: (line) => console.log(line) });
  console.log(`certificate: ${certificates.source}`);
  for (const note of certificates.notes) console.log(`note: ${note}`);

  ensureStateFolder();
  const log = openSync(LOG_FILE, "a");
  const child = spawn(process.execPath, [SERVER_SCRIPT, "--mode", "production"], {
    cwd: REPOSITORY_ROOT,
    detached: true,
    stdio: ["ignore", log, log],
    env: process.env,
  });
  closeSync(log);
  let exited = null;
  child.once("exit", (code, signal) => {
    exited = signal ?? code;
  });
  writePid(child.pid);
  child.unref();

  const deadline = Date.now() + READY_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (exited !== null) break;
    if ((await probe(DEV_PORT)) === 200) {
      console.log(`serving dist/ at https://localhost:${DEV_PORT}/ (pid ${child.pid}; log: node_modules/.cache/phasecell/server.log)`);
      console.log("it rebuilds when a source changes; `npm run stop` stops it.");
      return true;
    }
    await sleep(500);
  }
  console.error(exited !== null ? `the server exited (${exited}) before it was ready.` : "the server did not answer in time.");
  const tail = readFileSync(LOG_FILE, "utf8").trimEnd().split("\n").slice(-15).join("\n");
  console.error(`last lines of node_modules/.cache/phasecell/server.log:\n${tail}`);
  if (exited === null) {
    try {
      process.kill(child.pid, "SIGTERM");
    } catch {
      // already gone
    }
  }
  removePidFile(child.pid);
  return false;
}

/** Where a desktop Excel is installed, if this machine has one. */
function findDesktopExcel() {
  if (process.platform === "darwin") {
    const app = "/Applications/Microsoft Excel.app";
    return existsSync(app) ? app : null;
  }
  if (process.platform === "win32") {
    const roots = [process.env.ProgramFiles, process.env["ProgramFiles(x86)"]].filter(Boolean);
    for (const root of roots) {
      for (const version of ["Office16", "Office15"]) {
        const exe = join(root, "Microsoft Office", "root", version, "EXCEL.EXE");
        if (existsSync(exe)) return exe;
      }
    }
  }
  return null;
}

function printLoadInstructions(serverRunning) {
  const manifest = join(DIST, "manifest.xml");
  const excel = findDesktopExcel();
  if (!serverRunning) {
    console.log(`first serve dist/ at https://localhost:${DEV_PORT}/: run \`npm start\` without PHASECELL_NO_SERVE.`);
  }
  if (excel !== null && process.platform === "win32") {
    console.log(`desktop Excel found: ${excel}`);
    console.log("sideload (once; no tool needed): register the manifest for your user, then restart Excel:");
    console.log(`  reg add "HKCU\\Software\\Microsoft\\Office\\16.0\\WEF\\Developer" /v Phasecell /t REG_SZ /d "${manifest}" /f`);
    console.log("  then Home → Add-ins (or Insert → My Add-ins) → Developer Add-ins → Phasecell.");
    console.log("  remove it again with: reg delete \"HKCU\\Software\\Microsoft\\Office\\16.0\\WEF\\Developer\" /v Phasecell /f");
  } else if (excel !== null && process.platform === "darwin") {
    const wef = join(homedir(), "Library", "Containers", "com.microsoft.Excel", "Data", "Documents", "wef");
    console.log(`desktop Excel found: ${excel}`);
    console.log("sideload (once; no tool needed): copy the manifest into Excel's add-in folder, then restart Excel:");
    console.log(`  mkdir -p "${wef}" && cp "${manifest}" "${wef}/phasecell.xml"`);
    console.log("  then Home → Add-ins (or Insert → My Add-ins) and pick Phasecell under the developer add-ins.");
  } else {
    console.log("no desktop Excel on this machine. To use Excel on the web:");
    console.log("  1. open https://localhost:3000/taskpane.html once in the same browser and accept the certificate");
    console.log("     (or trust the development CA: `npx office-addin-dev-certs install`, which asks for administrator rights);");
    console.log("  2. open a workbook in Excel on the web, then Insert → Add-ins (in newer menus Home → Add-ins → More Add-ins)");
    console.log("     → My Add-ins → Upload My Add-in, and choose:");
    console.log(`     ${manifest}`);
  }
  console.log(`Cells then take =PHASE.STATE("water", 25, 1, "C bar") and the ribbon shows Phasecell → Phase pane.`);
  console.log("This serves the release flavour (namespace PHASE). Beside an installed Phasecell, use `npm run dev-server`");
  console.log("with a development build's manifest (`npm run build:dev` → dist/manifest.xml, namespace PHASEDEV) instead.");
}

async function main() {
  heading("1/4 build (production) into dist/");
  printBuildSummary(await buildRelease());

  heading("2/4 demo through the built dist/functions.js");
  const demo = await runDemo({ distDir: DIST });
  console.log(demo.text);

  heading("3/4 HTTPS server");
  let serverRunning = false;
  if (process.env.PHASECELL_NO_SERVE === "1") {
    console.log("skipped: PHASECELL_NO_SERVE=1");
  } else {
    serverRunning = await startServer();
    if (!serverRunning) return 1;
  }

  heading("4/4 load into Excel");
  printLoadInstructions(serverRunning);
  return 0;
}

try {
  process.exitCode = await main();
} catch (error) {
  console.error(`npm start failed: ${error instanceof Error ? error.message : error}`);
  process.exitCode = 1;
}
