/**
 * The typed errors of the core: kinds, messages built from parts, rendering in other units.
 */
import { describe, expect, it } from "vitest";
import {
  BadInputError,
  ConvergenceError,
  NoSuchStateError,
  OutOfRangeError,
  PhaseError,
  formatNumber,
  formatSI,
  q,
} from "../../core/errors";
import { saturationPressure } from "../../core/phase";
import { water } from "../../core/substances/water";
import { fromSI, parseUnits, unitSymbol } from "../../core/units/units";

describe("error kinds", () => {
  it.each([
    [new BadInputError(["x"]), "bad-input", "BadInputError"],
    [new OutOfRangeError(["x"]), "out-of-range", "OutOfRangeError"],
    [new NoSuchStateError(["x"]), "no-such-state", "NoSuchStateError"],
  ] as const)("%s has its kind and is a PhaseError and an Error", (error, kind, name) => {
    expect(error).toBeInstanceOf(PhaseError);
    expect(error).toBeInstanceOf(Error);
    expect(error.kind).toBe(kind);
    expect(error.name).toBe(name);
  });

  it("a convergence failure is an internal Error, not a PhaseError", () => {
    const error = new ConvergenceError("no sign change");
    expect(error).toBeInstanceOf(Error);
    expect(error).not.toBeInstanceOf(PhaseError);
  });
});

describe("messages", () => {
  it("are text and SI quantities joined in order", () => {
    const error = new OutOfRangeError(["temperature ", q.T(40), " is below ", q.T(50), " (source)"]);
    expect(error.message).toBe("temperature 40 K is below 50 K (source)");
    expect(error.parts).toHaveLength(5);
  });

  it("render in the caller's units through format()", () => {
    const units = parseUnits("C kPa");
    const error = new NoSuchStateError(["pressure ", q.p(200), " is below ", q.p(611.657), " at ", q.T(273.16)]);
    const text = error.format((part) => {
      const dimension = part.dimension;
      return `${formatNumber(fromSI(units, dimension, part.value))} ${unitSymbol(units, dimension)}`;
    });
    expect(text).toBe("pressure 0.2 kPa is below 0.611657 kPa at 0.01 °C");
  });

  it("a core error re-renders in other units with the same wording", () => {
    let error: PhaseError | undefined;
    try {
      saturationPressure(water, 700);
    } catch (caught) {
      error = caught as PhaseError;
    }
    expect(error?.kind).toBe("no-such-state");
    const units = parseUnits("C");
    const text = error!.format((part) => `${formatNumber(fromSI(units, part.dimension, part.value))} ${unitSymbol(units, part.dimension)}`);
    expect(text).toContain("temperature 426.85 °C");
    expect(text).toContain("373.946 °C");
  });

  it.each([
    [q.T(273.16), "273.16 K"],
    [q.dT(5), "5 K"],
    [q.p(22.064e6), "22064000 Pa"],
    [q.E(1), "1 J"],
    [q.e(333.4e3), "333400 J/kg"],
    [q.m(2), "2 kg"],
    [q.rho(322), "322 kg/m3"],
  ] as const)("formatSI(%o) prints %s", (part, text) => {
    expect(formatSI(part)).toBe(text);
  });
});

describe("formatNumber", () => {
  it.each([
    [0, "0"],
    [1, "1"],
    [611.657, "611.657"],
    [0.1 + 0.2, "0.3"],
    [273.152519, "273.153"],
    [-40, "-40"],
    [1e-4, "0.0001"],
    [1.9349584868088946e-40, "1.93496e-40"],
    [2.5e10, "2.5e+10"],
    [1e9, "1e+9"],
    [Number.NaN, "NaN"],
    [Infinity, "Infinity"],
  ] as const)("%s prints as %s (six significant digits, no exponent noise)", (value, text) => {
    expect(formatNumber(value)).toBe(text);
  });
});
