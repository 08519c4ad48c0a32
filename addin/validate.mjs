/**
 * `npm run validate [-- path/to/manifest.xml] [-- --production]`: checks a manifest with
 * `office-addin-manifest validate`, which uploads it to Microsoft's validation service (there is
 * no offline schema check; the offline gate is test/addin/manifest.test.ts).
 *
 * Exit codes: 0 when the service accepts the manifest, and also when the service cannot be
 * reached (no network, DNS or firewall; said clearly, nothing is claimed about the manifest);
 * 1 when the service rejects the manifest or answers with an error; 2 for a bad command line.
 * `--production` adds the store rules (`-p`).
 */
import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { lookup } from "node:dns/promises";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { setTimeout, clearTimeout } from "node:timers";
import { setTimeout as sleep } from "node:timers/promises";
import { REPOSITORY_ROOT } from "./server-state.mjs";

const SERVICE_HOST = "validationgateway.omex.office.net";
const LOOKUP_TIMEOUT_MS = 5_000;
const VALIDATE_TIMEOUT_MS = 60_000;
const CLI = join(REPOSITORY_ROOT, "node_modules", "office-addin-manifest", "cli.js");

/** Resolves true when the validation service's host name resolves within a few seconds. */
export async function serviceReachable() {
  const answer = await Promise.race([
    lookup(SERVICE_HOST).then(
      () => true,
      () => false,
    ),
    sleep(LOOKUP_TIMEOUT_MS).then(() => false),
  ]);
  return answer;
}

/**
 * Runs the validator on one manifest.
 * @returns {Promise<{ outcome: "valid" | "invalid" | "unreachable" | "service-error", output: string }>}
 */
export async function validateOnline(manifestPath, { production = false } = {}) {
  if (!(await serviceReachable())) {
    return { outcome: "unreachable", output: `${SERVICE_HOST} does not resolve` };
  }
  const args = [CLI, "validate", manifestPath, ...(production ? ["-p"] : [])];
  const child = spawn(process.execPath, args, { cwd: REPOSITORY_ROOT, env: { ...process.env, FORCE_COLOR: "0" } });
  let output = "";
  child.stdout.on("data", (chunk) => (output += chunk));
  child.stderr.on("data", (chunk) => (output += chunk));
  const timer = setTimeout(() => child.kill("SIGTERM"), VALIDATE_TIMEOUT_MS);
  const code = await new Promise((resolve) => child.once("close", (exitCode, signal) => resolve(signal ?? exitCode)));
  clearTimeout(timer);

  if (code === "SIGTERM" || /Unable to contact the manifest validation service/i.test(output)) {
    return { outcome: "unreachable", output };
  }
  if (/The manifest is valid/i.test(output) && code === 0) return { outcome: "valid", output };
  if (/The manifest is not valid/i.test(output)) return { outcome: "invalid", output };
  if (/Unable to validate the manifest/i.test(output)) return { outcome: "service-error", output };
  return { outcome: code === 0 ? "valid" : "invalid", output };
}

async function main() {
  const argv = process.argv.slice(2);
  const production = argv.includes("--production") || argv.includes("-p");
  const paths = argv.filter((arg) => !arg.startsWith("-"));
  if (paths.length > 1) {
    console.error("usage: npm run validate [-- path/to/manifest.xml] [-- --production]");
    return 2;
  }
  const manifest = paths[0] ?? join(REPOSITORY_ROOT, "manifest.xml");
  if (!existsSync(manifest)) {
    console.error(`${manifest} does not exist`);
    return 2;
  }
  const shown = relative(process.cwd(), manifest) || manifest;
  console.log(`validating ${shown} with Microsoft's manifest validation service${production ? " (store rules)" : ""} …`);
  const { outcome, output } = await validateOnline(manifest, { production });
  if (outcome !== "unreachable" && output.trim() !== "") console.log(output.trimEnd());
  switch (outcome) {
    case "valid":
      console.log(`${shown}: accepted by the validation service.`);
      return 0;
    case "unreachable":
      console.log(
        `NOT VALIDATED: Microsoft's manifest validation service could not be reached (${output.split("\n")[0].trim() || "no answer"}). ` +
          "This says nothing about the manifest. Offline checks: `npx vitest run test/addin`. " +
          "Run `npm run validate` again where the internet is reachable.",
      );
      return 0;
    case "service-error":
      console.error(`${shown}: the validation service answered with an error (above); the manifest was not checked.`);
      return 1;
    default:
      console.error(`${shown}: rejected by the validation service (reasons above).`);
      return 1;
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  process.exitCode = await main();
}
