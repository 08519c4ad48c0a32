/**
 * Runs the BUILT custom-functions bundle (dist/functions.js) outside Excel, the way Excel's
 * shared runtime does: the script is evaluated once as a classic script in a fresh global
 * (node:vm context) where `window`, `self` and `globalThis` are the same object and
 * `CustomFunctions` offers `associate`, `Error` and `ErrorCode`. The bundle's top-level
 * `CustomFunctions.associate(id, fn)` calls (appended at build time by the metadata plugin) are
 * recorded, and functions are then called with arguments shaped from dist/functions.json:
 * a single value given to a range parameter arrives as a 1 × 1 array, an omitted optional
 * argument as null, arrays are created inside the bundle's own realm.
 *
 * Used by `npm run demo`, `npm start` and test/bundle. Nothing here imports the TypeScript sources.
 */
import { readFileSync, existsSync } from "node:fs";
import { join } from "node:path";
import vm from "node:vm";
import { setTimeout, clearTimeout, setInterval, clearInterval } from "node:timers";

/** Excel's error codes as the CustomFunctions.ErrorCode enumeration names them. */
export const ERROR_CODES = Object.freeze({
  invalidValue: "#VALUE!",
  notAvailable: "#N/A",
  divisionByZero: "#DIV/0!",
  invalidNumber: "#NUM!",
  nullReference: "#NULL!",
  invalidName: "#NAME?",
  invalidReference: "#REF!",
});

/** Stand-in for CustomFunctions.Error (CustomFunctionsRuntime 1.2): a code and a message. */
export class CustomFunctionsError extends Error {
  /**
   * @param {string} code one of ERROR_CODES' values
   * @param {string} [message]
   */
  constructor(code, message) {
    super(message ?? "");
    this.name = "CustomFunctions.Error";
    this.code = code;
  }
}

/** Raised when dist/ lacks a file the runner needs. */
export class MissingBuildError extends Error {}

/**
 * Loads dist/functions.js and dist/functions.json.
 * @param {string} distDir folder holding the build
 */
export function loadFunctionsBundle(distDir) {
  const scriptPath = join(distDir, "functions.js");
  const metadataPath = join(distDir, "functions.json");
  for (const file of [scriptPath, metadataPath]) {
    if (!existsSync(file)) {
      throw new MissingBuildError(`${file} is missing: run \`npm run build\` first`);
    }
  }
  const metadata = JSON.parse(readFileSync(metadataPath, "utf8"));
  const associations = new Map();
  const associationOrder = [];
  const consoleLines = [];

  const customFunctions = {
    associate(id, fn) {
      // Excel accepts either (id, function) or an object of id → function.
      if (typeof id === "object" && id !== null) {
        for (const [key, value] of Object.entries(id)) customFunctions.associate(key, value);
        return;
      }
      if (typeof id !== "string" || typeof fn !== "function") {
        throw new TypeError(`CustomFunctions.associate(${String(id)}, …): expected an id and a function`);
      }
      const key = id.toUpperCase();
      if (associations.has(key)) throw new Error(`CustomFunctions.associate: ${key} associated twice`);
      associations.set(key, fn);
      associationOrder.push(key);
    },
    Error: CustomFunctionsError,
    ErrorCode: ERROR_CODES,
  };

  const recordingConsole = {};
  for (const level of ["log", "info", "warn", "error", "debug"]) {
    recordingConsole[level] = (...parts) => consoleLines.push({ level, text: parts.map(String).join(" ") });
  }

  const sandbox = {
    CustomFunctions: customFunctions,
    console: recordingConsole,
    setTimeout,
    clearTimeout,
    setInterval,
    clearInterval,
    queueMicrotask: globalThis.queueMicrotask,
  };
  const context = vm.createContext(sandbox, { name: "functions.js (shared runtime stand-in)" });
  vm.runInContext("var window = globalThis; var self = globalThis;", context);
  vm.runInContext(readFileSync(scriptPath, "utf8"), context, { filename: "functions.js" });

  /** Copies plain data into the bundle's realm, as Excel's own values would be. */
  const intoRealm = vm.runInContext("(json) => JSON.parse(json)", context);
  const byId = new Map(metadata.functions.map((entry) => [String(entry.id).toUpperCase(), entry]));

  function shapeArgument(value, parameter) {
    if (value === undefined || value === null) return null;
    const matrix = parameter?.dimensionality === "matrix";
    const wrapped = matrix && !Array.isArray(value) ? [[value]] : value;
    return typeof wrapped === "object" ? intoRealm(JSON.stringify(wrapped)) : wrapped;
  }

  /**
   * Calls a function as a cell formula would: `invoke("SATTEMP", "water", 10, "C bar")`.
   * Resolves to the returned value (arrays copied out of the bundle's realm); rejects with
   * whatever the function threw (a CustomFunctionsError for a user-facing error).
   * @param {string} id
   * @param {...unknown} cellArguments
   */
  async function invoke(id, ...cellArguments) {
    const key = id.toUpperCase();
    const fn = associations.get(key);
    if (!fn) throw new Error(`no function associated under ${key}`);
    const entry = byId.get(key);
    const parameters = entry?.parameters ?? [];
    if (cellArguments.length > parameters.length) {
      throw new Error(`${key} takes ${parameters.length} arguments, ${cellArguments.length} given`);
    }
    const shaped = parameters.map((parameter, index) => shapeArgument(cellArguments[index], parameter));
    const invocation = { functionName: key, address: "Sheet1!A1", parameterAddresses: [] };
    const result = await fn(...shaped, invocation);
    return fromRealm(result);
  }

  return {
    metadata,
    associations,
    associationOrder,
    consoleLines,
    invoke,
    context,
  };
}

/** Arrays built inside the vm realm, rebuilt as ordinary arrays (other values unchanged). */
function fromRealm(value) {
  return Array.isArray(value) ? value.map(fromRealm) : value;
}

/** True for a user-facing error value: the stand-in class, or anything with an Excel error code. */
export function isErrorValue(value) {
  return value instanceof CustomFunctionsError;
}
