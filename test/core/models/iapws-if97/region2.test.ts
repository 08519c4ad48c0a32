/**
 * IAPWS-IF97 region 2 (vapour, basic equation Eqs. (15)–(17)), tested through the module's public
 * exports: the release's check values and thermodynamic identities.
 */
import { describe, expect, it } from "vitest";
import { b23Pressure } from "../../../../core/models/iapws-if97/b23";
import type { FluidProperties } from "../../../../core/models/iapws-if97/properties";
import { region2 } from "../../../../core/models/iapws-if97/region2";
import { saturationPressureIF97 } from "../../../../core/models/iapws-if97/region4";
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

// Check values: IAPWS R7-97(2012) (IF97), Table 15 — all three rows (T/K, p/MPa) and all six
// quantities v, h, u, s, c_p, w, nine significant digits as printed (0.ddddddddd × 10^n; the
// trailing zero of 0.241169160e4 as printed, from memory). Tolerance: half a unit in the last
// printed digit. Worst measured: 0.97 of that half unit (h at 700 K, 30 MPa).
const TABLE_15 = flatten([
  [300, 0.0035, ["0.394913866e2", "0.254991145e4", "0.241169160e4", "0.852238967e1", "0.191300162e1", "0.427920172e3"]],
  [700, 0.0035, ["0.923015898e2", "0.333568375e4", "0.301262819e4", "0.101749996e2", "0.208141274e1", "0.644289068e3"]],
  [700, 30, ["0.542946619e-2", "0.263149474e4", "0.246861076e4", "0.517540298e1", "0.103505092e2", "0.480386523e3"]],
]);

describe("IF97 region 2 check values", () => {
  it.each(TABLE_15)("at %s K, %s MPa: %s matches Table 15 to every printed digit", (temperatureK, pressureMPa, quantity, text) => {
    const check = printed(text);
    expectClose(QUANTITIES[quantity](region2(temperatureK, pressureMPa * MPA)), check.value, { abs: check.halfUnit });
  });
});

describe("IF97 region 2 thermodynamic identities", () => {
  // States across the region: below p_s up to 623.15 K, below B23 up to 863.15 K, up to 100 MPa
  // beyond (IF97 Sec. 4), from 1 Pa upwards.
  const states: [number, number][] = [];
  for (const temperatureK of [275, 300, 373.15, 450, 550, 620, 650, 700, 800, 863.15, 900, 1000, 1073.15]) {
    const top =
      temperatureK <= 623.15 ? saturationPressureIF97(temperatureK) : temperatureK <= 863.15 ? b23Pressure(temperatureK) : 100 * MPA;
    for (const fraction of [1e-6, 1e-3, 0.1, 0.5, 0.99]) states.push([temperatureK, fraction * top]);
  }

  it("h = u + p·v and rho = 1/v at every state", () => {
    for (const [temperatureK, pressurePa] of states) {
      const state = region2(temperatureK, pressurePa);
      expectClose(state.enthalpy, state.internalEnergy + pressurePa * state.specificVolume, { rel: 1e-12 });
      expect(state.density * state.specificVolume).toBeCloseTo(1, 14);
    }
  });

  // Central differences with a 0.01 K step: truncation and rounding stay below 3e-7 relative on
  // these states (measured; largest close to saturation at high pressure), inside the 1e-6 bound.
  it("c_p equals dh/dT and T·ds/dT along the isobar", () => {
    for (const [temperatureK, pressurePa] of states) {
      const dT = 0.01;
      const above = region2(temperatureK + dT, pressurePa);
      const below = region2(temperatureK - dT, pressurePa);
      const cp = region2(temperatureK, pressurePa).isobaricHeatCapacity;
      expectClose(cp, (above.enthalpy - below.enthalpy) / (2 * dT), { rel: 1e-6 });
      expectClose(cp, (temperatureK * (above.entropy - below.entropy)) / (2 * dT), { rel: 1e-6 });
    }
  });

  // At vanishing pressure the residual part vanishes: p·v → R·T with R = 461.526 J/(kg·K),
  // IF97 Eq. (1). The residual share of p·v is about B·p/(R·T) (B the second virial coefficient,
  // B·p = −0.065 J/kg at 300 K and 1 Pa, measured), so at 1 mPa it is below 1e-9 relative.
  it("approaches the ideal gas p·v = R·T at low pressure (IF97 Eq. (1))", () => {
    for (const temperatureK of [300, 500, 800, 1073.15]) {
      const pressurePa = 1e-3;
      expectClose(pressurePa * region2(temperatureK, pressurePa).specificVolume, 461.526 * temperatureK, { rel: 1e-9 });
    }
  });
});
