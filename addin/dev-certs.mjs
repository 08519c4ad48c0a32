/**
 * HTTPS key and certificates for the local server at https://localhost:3000.
 *
 * Order of preference:
 * 1. the files office-addin-dev-certs keeps in the home folder (.office-addin-dev-certs/ca.crt,
 *    localhost.crt, localhost.key), read directly: its getHttpsServerOptions() also tries to
 *    trust the CA, which needs administrator rights and rejects where there are none;
 * 2. if they are missing or expired, new ones made by office-addin-dev-certs' generator, written
 *    to the same folder, without installing (trusting) the CA;
 * 3. if that fails (e.g. the home folder is read-only), a self-signed localhost certificate made
 *    with `openssl` into .certs/ in the repository (ignored by git).
 *
 * Nothing here asks a question or needs sudo. Trusting the CA, so that Excel and browsers accept
 * the server without a warning, is a separate, deliberate step: `npx office-addin-dev-certs install`.
 */
import { existsSync, readFileSync, renameSync, mkdirSync } from "node:fs";
import { homedir } from "node:os";
import { join, dirname } from "node:path";
import { fileURLToPath } from "node:url";
import { X509Certificate } from "node:crypto";
import { spawnSync } from "node:child_process";

const repositoryRoot = join(dirname(fileURLToPath(import.meta.url)), "..");
const DAYS_VALID = 30;
/** Renew a certificate that expires within this margin rather than let it lapse while the server runs. */
const RENEW_MARGIN_MS = 24 * 3600 * 1000;

export const HOME_CERT_FOLDER = join(homedir(), ".office-addin-dev-certs");
export const FALLBACK_CERT_FOLDER = join(repositoryRoot, ".certs");

function homePaths() {
  return {
    ca: join(HOME_CERT_FOLDER, "ca.crt"),
    cert: join(HOME_CERT_FOLDER, "localhost.crt"),
    key: join(HOME_CERT_FOLDER, "localhost.key"),
  };
}

/** Expiry of a PEM certificate file, or null if it cannot be read. */
function expiryOf(file) {
  try {
    return new Date(new X509Certificate(readFileSync(file)).validTo);
  } catch {
    return null;
  }
}

function usable(paths) {
  const present = [paths.ca, paths.cert, paths.key].filter((file) => existsSync(file)).length;
  if (present === 0) return "missing";
  if (present < 3) return "incomplete";
  const expiry = expiryOf(paths.cert);
  if (expiry === null) return "unreadable";
  return expiry.getTime() - Date.now() > RENEW_MARGIN_MS ? "ok" : "expired";
}

function readPaths(paths) {
  return { key: readFileSync(paths.key), cert: readFileSync(paths.cert), ca: readFileSync(paths.ca) };
}

async function generateInHome(paths) {
  const module = await import("office-addin-dev-certs");
  const generateCertificates = module.generateCertificates ?? module.default?.generateCertificates;
  if (typeof generateCertificates !== "function") throw new Error("office-addin-dev-certs has no generateCertificates()");
  await generateCertificates(paths.ca, paths.cert, paths.key, DAYS_VALID, ["127.0.0.1", "localhost"]);
  if (usable(paths) !== "ok") throw new Error("the generator finished but the files are not usable");
}

function generateWithOpenssl() {
  mkdirSync(FALLBACK_CERT_FOLDER, { recursive: true });
  const key = join(FALLBACK_CERT_FOLDER, "localhost.key");
  const cert = join(FALLBACK_CERT_FOLDER, "localhost.crt");
  const result = spawnSync(
    "openssl",
    [
      "req", "-x509", "-newkey", "rsa:2048", "-nodes", "-sha256",
      "-keyout", key, "-out", cert, "-days", String(DAYS_VALID),
      "-subj", "/CN=localhost",
      "-addext", "subjectAltName=DNS:localhost,IP:127.0.0.1",
    ],
    { encoding: "utf8" },
  );
  if (result.error) throw new Error(`openssl is not available (${result.error.message})`);
  if (result.status !== 0) throw new Error(`openssl failed: ${result.stderr.trim()}`);
  return { ca: cert, cert, key };
}

/**
 * Key and certificates for webpack-dev-server's `server.options`, and notes saying where they came
 * from. Never prompts; throws only when no way of making a certificate worked.
 * @param {{ log?: (line: string) => void }} [options]
 * @returns {Promise<{ key: Buffer, cert: Buffer, ca: Buffer, source: string, notes: string[] }>}
 */
export async function loadDevCertificates({ log = () => {} } = {}) {
  const notes = [];
  const home = homePaths();
  const state = usable(home);
  if (state === "ok") {
    return { ...readPaths(home), source: "office-addin-dev-certs (home folder)", notes };
  }

  if (Object.values(home).some((file) => existsSync(file))) {
    // The generator never overwrites an existing CA, so set old or partial files aside (not deleted).
    const stamp = new Date().toISOString().slice(0, 10);
    for (const file of Object.values(home)) {
      if (existsSync(file)) renameSync(file, `${file}.${state}-${stamp}`);
    }
    notes.push(`the certificates in ${HOME_CERT_FOLDER} were ${state}; they were renamed with the suffix .${state}-${stamp}`);
  }

  try {
    log(`creating localhost certificates in ${HOME_CERT_FOLDER} (office-addin-dev-certs, valid ${DAYS_VALID} days) …`);
    await generateInHome(home);
    notes.push(
      "new development certificates were created; their CA is not trusted yet. " +
        "Run `npx office-addin-dev-certs install` once (it asks for administrator rights) so that Excel accepts https://localhost:3000",
    );
    return { ...readPaths(home), source: "office-addin-dev-certs (generated now)", notes };
  } catch (error) {
    notes.push(`office-addin-dev-certs could not create certificates: ${error instanceof Error ? error.message.split("\n")[0] : error}`);
  }

  const existingFallback = {
    ca: join(FALLBACK_CERT_FOLDER, "localhost.crt"),
    cert: join(FALLBACK_CERT_FOLDER, "localhost.crt"),
    key: join(FALLBACK_CERT_FOLDER, "localhost.key"),
  };
  if (usable(existingFallback) === "ok") {
    notes.push("using the self-signed certificate in .certs/ (made earlier with openssl); browsers and Excel will not trust it until you accept or install it");
    return { ...readPaths(existingFallback), source: "openssl self-signed (.certs/)", notes };
  }
  log("falling back to a self-signed certificate made with openssl in .certs/ …");
  const made = generateWithOpenssl();
  notes.push("made a self-signed certificate with openssl in .certs/; browsers and Excel will not trust it until you accept or install it");
  return { ...readPaths(made), source: "openssl self-signed (.certs/, generated now)", notes };
}
