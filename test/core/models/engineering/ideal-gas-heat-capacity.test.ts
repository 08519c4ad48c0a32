/**
 * Ideal-gas heat-capacity forms against NIST-JANAF and Poling's tabulated values, and their
 * enthalpy integrals against numerical integration.
 */
import { describe, expect, it } from "vitest";
import { MOLAR_GAS_CONSTANT } from "../../../../core/models/engineering/gas-constant";
import {
  idealGasEnthalpy,
  idealGasHeatCapacity,
  idealGasRange,
  type IdealGasHeatCapacity,
} from "../../../../core/models/engineering/ideal-gas-heat-capacity";
import { expectClose } from "../../../helpers/expect-close";

// Poling, Prausnitz, O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), App. A.
const METHANE: IdealGasHeatCapacity = { kind: "poling", a: [4.568, -0.008975, 0.00003631, -3.407e-8, 1.091e-11], tMin: 50, tMax: 1000 };
// NIST Chemistry WebBook Shomate fit to NIST-JANAF (1998), sulfur dioxide, 298–1200 K.
const SO2_SHOMATE: IdealGasHeatCapacity = { kind: "shomate", A: 21.43049, B: 74.35094, C: -57.75217, D: 16.35534, E: 0.086731, tMin: 298, tMax: 1200 };
// NIST-JANAF Thermochemical Tables, 4th ed. (1998), sulfur dioxide, c_p° at 100, 200, 298.15 K.
const SO2_TABLE: IdealGasHeatCapacity = { kind: "table", T: [100, 200, 298.15], cp: [33.526, 36.372, 39.878] };

describe("ideal-gas heat capacity", () => {
  it("the gas constant is N_A k of the 2019 SI", () => {
    expect(MOLAR_GAS_CONSTANT).toBeCloseTo(8.314462618, 9);
  });

  // NIST-JANAF (1998) methane: c_p° = 33.258 (100 K), 35.639 (298.15 K), 71.795 (1000 K)
  // J/(mol K); the polynomial is a fit over 50–1000 K: within 1.3 %.
  it.each([
    [100, 33.258],
    [298.15, 35.639],
    [1000, 71.795],
  ])("methane polynomial at %s K against JANAF %s J/(mol K)", (temperatureK, expected) => {
    expectClose(idealGasHeatCapacity(METHANE, temperatureK), expected, { rel: 0.013 });
  });

  // NIST-JANAF (1998) sulfur dioxide at 298.15 K: 39.878 J/(mol K); the Shomate fit: 0.02 %.
  it("sulfur dioxide Shomate fit at 298.15 K against JANAF", () => {
    expectClose(idealGasHeatCapacity(SO2_SHOMATE, 298.15), 39.878, { rel: 2e-4 });
  });

  it("a table reproduces its rows and interpolates linearly", () => {
    expect(idealGasHeatCapacity(SO2_TABLE, 200)).toBe(36.372);
    expectClose(idealGasHeatCapacity(SO2_TABLE, 150), (33.526 + 36.372) / 2, { rel: 1e-15 });
    expect(idealGasRange(SO2_TABLE)).toEqual([100, 298.15]);
  });

  it("a monatomic gas has c_p° = 5/2 R at every temperature", () => {
    expect(idealGasHeatCapacity({ kind: "monatomic" }, 10)).toBe(2.5 * MOLAR_GAS_CONSTANT);
    expect(idealGasRange({ kind: "monatomic" })).toEqual([0, Infinity]);
  });

  // The enthalpy is the antiderivative: compare with Simpson's rule on the heat capacity.
  it.each([
    ["Poling", METHANE, 60, 900],
    ["Shomate", SO2_SHOMATE, 300, 1100],
    ["table", SO2_TABLE, 120, 290],
    ["monatomic", { kind: "monatomic" } as IdealGasHeatCapacity, 20, 700],
  ] as const)("%s enthalpy differences equal the integral of c_p°", (_name, model, low, high) => {
    const steps = 2000;
    const h = (high - low) / steps;
    let sum = idealGasHeatCapacity(model, low) + idealGasHeatCapacity(model, high);
    for (let i = 1; i < steps; i++) sum += (i % 2 === 1 ? 4 : 2) * idealGasHeatCapacity(model, low + i * h);
    expectClose(idealGasEnthalpy(model, high) - idealGasEnthalpy(model, low), (sum * h) / 3, { rel: 1e-9 });
  });
});
