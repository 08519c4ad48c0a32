/**
 * IAPWS-IF97 region 5 (high-temperature steam, basic equation Eqs. (32)–(34)), tested through the
 * module's public exports: the release's check values and thermodynamic identities.
 */
import { describe, expect, it } from "vitest";
import type { FluidProperties } from "../../../../core/models/iapws-if97/properties";
import { region5 } from "../../../../core/models/iapws-if97/region5";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

const MPA = 1e6;

/** Each quantity of the check tables in the release's units (m³/kg, kJ/kg, kJ/(kg·K), m/s). */
const QUANTITIES = {
  v: (state: FluidProperties) => state.specificVolume,
  h: (state: FluidProperties) => state.enthalpy / 1e3,
  u: (state: FluidProperties) => state.internalEnergy / 1e3,
  s: (state: FluidProperties) => state.entropy / 1e3,
  cp: (state: FluidProperties) => state.isobaricHeatCapacity / 1e3,
  w: (state: FluidProperties) => state.speedOfSound,
} as const;
type Quantity = keyof typeof QUANTITIES;
const ORDER: readonly Quantity[] = ["v", "h", "u", "s", "cp", "w"];

function flatten(
  rows: readonly (readonly [number, number, readonly string[]])[],
): (readonly [number, number, Quantity, string])[] {
  return rows.flatMap(([a, b, texts]) => ORDER.map((quantity, k) => [a, b, quantity, texts[k]!] as const));
}

// Check values: IAPWS R7-97(2012) (IF97), Table 42 — all three rows (T/K, p/MPa; the two 30 MPa
// rows belong to the 2007 extension of region 5 to 50 MPa) and all six quantities v, h, u, s,
// c_p, w, nine significant digits as printed (0.ddddddddd × 10^n; the trailing zeros of
// 0.138455090e1, 0.452749310e4 and 0.917068690e3 as printed, from memory). Tolerance: half a
// unit in the last printed digit. Worst measured: 0.95 of that half unit (v at 1500 K, 30 MPa).
const TABLE_42 = flatten([
  [1500, 0.5, ["0.138455090e1", "0.521976855e4", "0.452749310e4", "0.965408875e1", "0.261609445e1", "0.917068690e3"]],
  [1500, 30, ["0.230761299e-1", "0.516723514e4", "0.447495124e4", "0.772970133e1", "0.272724317e1", "0.928548002e3"]],
  [2000, 30, ["0.311385219e-1", "0.657122604e4", "0.563707038e4", "0.853640523e1", "0.288569882e1", "0.106736948e4"]],
]);

describe("IF97 region 5 check values", () => {
  it.each(TABLE_42)("at %s K, %s MPa: %s matches Table 42 to every printed digit", (temperatureK, pressureMPa, quantity, text) => {
    const check = printed(text);
    expectClose(QUANTITIES[quantity](region5(temperatureK, pressureMPa * MPA)), check.value, { abs: check.halfUnit });
  });
});

describe("IF97 region 5 thermodynamic identities", () => {
  const states: [number, number][] = [];
  for (const temperatureK of [1073.16, 1200, 1500, 1800, 2000, 2273.15]) {
    for (const pressureMPa of [0.001, 0.1, 1, 10, 30, 50]) states.push([temperatureK, pressureMPa * MPA]);
  }

  it("h = u + p·v and rho = 1/v at every state", () => {
    for (const [temperatureK, pressurePa] of states) {
      const state = region5(temperatureK, pressurePa);
      expectClose(state.enthalpy, state.internalEnergy + pressurePa * state.specificVolume, { rel: 1e-12 });
      expect(state.density * state.specificVolume).toBeCloseTo(1, 14);
    }
  });

  // Central differences with a 0.01 K step: truncation and rounding stay below 2e-10 relative on
  // these states (measured), far inside the 1e-7 bound.
  it("c_p equals dh/dT and T·ds/dT along the isobar", () => {
    for (const [temperatureK, pressurePa] of states) {
      const dT = 0.01;
      const above = region5(temperatureK + dT, pressurePa);
      const below = region5(temperatureK - dT, pressurePa);
      const cp = region5(temperatureK, pressurePa).isobaricHeatCapacity;
      expectClose(cp, (above.enthalpy - below.enthalpy) / (2 * dT), { rel: 1e-7 });
      expectClose(cp, (temperatureK * (above.entropy - below.entropy)) / (2 * dT), { rel: 1e-7 });
    }
  });
});
