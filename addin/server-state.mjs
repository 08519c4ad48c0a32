/**
 * Where the background HTTPS server started by `npm start` keeps its process id and log
 * (node_modules/.cache/phasecell/, outside git and outside dist/, which every build empties),
 * and small functions shared by start.mjs, serve.mjs and stop.mjs.
 */
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { request } from "node:https";
import { connect } from "node:net";

export const REPOSITORY_ROOT = join(dirname(fileURLToPath(import.meta.url)), "..");
export const STATE_FOLDER = join(REPOSITORY_ROOT, "node_modules", ".cache", "phasecell");
export const PID_FILE = join(STATE_FOLDER, "server.pid");
export const LOG_FILE = join(STATE_FOLDER, "server.log");
export const SERVER_SCRIPT = join(REPOSITORY_ROOT, "addin", "serve.mjs");

export function ensureStateFolder() {
  mkdirSync(STATE_FOLDER, { recursive: true });
}

/** The recorded server pid, or null. */
export function readPid() {
  if (!existsSync(PID_FILE)) return null;
  const pid = Number.parseInt(readFileSync(PID_FILE, "utf8").trim(), 10);
  return Number.isInteger(pid) && pid > 0 ? pid : null;
}

export function writePid(pid) {
  ensureStateFolder();
  writeFileSync(PID_FILE, `${pid}\n`);
}

export function removePidFile(onlyIf) {
  if (onlyIf !== undefined && readPid() !== onlyIf) return;
  rmSync(PID_FILE, { force: true });
}

/** True if a process with this pid exists (and, where /proc exists, runs addin/serve.mjs). */
export function isOurServer(pid) {
  try {
    process.kill(pid, 0);
  } catch {
    // ESRCH: gone. EPERM: it exists but belongs to another user, so it is not ours either.
    return false;
  }
  const cmdline = `/proc/${pid}/cmdline`;
  if (existsSync(cmdline)) {
    return readFileSync(cmdline, "utf8").split("\0").some((part) => part.endsWith(join("addin", "serve.mjs")));
  }
  return true;
}

/** Resolves true if something accepts TCP connections on localhost:port. */
export function portInUse(port, host = "localhost") {
  return new Promise((resolve) => {
    const socket = connect({ port, host });
    socket.setTimeout(1000);
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("timeout", () => {
      socket.destroy();
      resolve(false);
    });
    socket.once("error", () => resolve(false));
  });
}

/**
 * Resolves the HTTP status of GET https://localhost:port/path, or null when nothing answers.
 * The development certificate need not be trusted for this probe.
 */
export function probe(port, path = "/functions.json") {
  return new Promise((resolve) => {
    const req = request(
      { host: "localhost", port, path, method: "GET", rejectUnauthorized: false, timeout: 2000 },
      (res) => {
        res.resume();
        resolve(res.statusCode ?? null);
      },
    );
    req.once("timeout", () => {
      req.destroy();
      resolve(null);
    });
    req.once("error", () => resolve(null));
    req.end();
  });
}
