/**
 * IAPWS-IF97 region 1 (liquid, basic equation Eq. (7)), tested through the module's public
 * exports: the release's check values, the IAPWS energy zero, and thermodynamic identities.
 */
import { describe, expect, it } from "vitest";
import { region1 } from "../../../../core/models/iapws-if97/region1";
import type { FluidProperties } from "../../../../core/models/iapws-if97/properties";
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

// Check values: IAPWS R7-97(2012) (IF97), Table 5 — all three rows (T/K, p/MPa) and all six
// quantities v, h, u, s, c_p, w, nine significant digits as printed (0.ddddddddd × 10^n; the
// trailing zeros of 0.120241800e-2 as printed, from memory). Tolerance: half a unit in the last
// printed digit. Worst measured: 0.81 of that half unit (s and c_p at 300 K, 3 MPa).
const TABLE_5 = flatten([
  [300, 3, ["0.100215168e-2", "0.115331273e3", "0.112324818e3", "0.392294792", "0.417301218e1", "0.150773921e4"]],
  [300, 80, ["0.971180894e-3", "0.184142828e3", "0.106448356e3", "0.368563852", "0.401008987e1", "0.163469054e4"]],
  [500, 3, ["0.120241800e-2", "0.975542239e3", "0.971934985e3", "0.258041912e1", "0.465580682e1", "0.124071337e4"]],
]);

describe("IF97 region 1 check values", () => {
  it.each(TABLE_5)("at %s K, %s MPa: %s matches Table 5 to every printed digit", (temperatureK, pressureMPa, quantity, text) => {
    const check = printed(text);
    expectClose(QUANTITIES[quantity](region1(temperatureK, pressureMPa * MPA)), check.value, { abs: check.halfUnit });
  });
});

describe("IF97 region 1 energy zero (IAPWS convention: u' = 0 and s' = 0 at the triple point)", () => {
  // IF97 Eq. (9): T_t = 273.16 K, p_t = 611.657 Pa; Eq. (10): h' = 0.611783 J/kg there, printed
  // to six digits. Tolerance: half a unit in the last printed digit (5e-7 J/kg); measured 5e-8.
  const triple = region1(273.16, 611.657);

  it("gives h = 0.611783 J/kg at the triple point (IF97 Eq. (10))", () => {
    const check = printed("0.611783");
    expectClose(triple.enthalpy, check.value, { abs: check.halfUnit });
  });

  // IF97 sets n3 and n4 of Table 2 so that u and s of the saturated liquid vanish at the triple
  // point, without stating to what precision. Measured here (and alike in python3-iapws):
  // u = −1.3e-7 J/kg, s = −6.2e-5 J/(kg·K). The bounds below hold those with margin and are far
  // below anything a heat balance can see (the entropy of melting is about 1221 J/(kg·K)).
  it("gives u = 0 to within 1e-6 J/kg at the triple point", () => {
    expectClose(triple.internalEnergy, 0, { abs: 1e-6 });
  });

  it("gives s = 0 to within 1e-4 J/(kg·K) at the triple point", () => {
    expectClose(triple.entropy, 0, { abs: 1e-4 });
  });
});

describe("IF97 region 1 thermodynamic identities", () => {
  const states: [number, number][] = [];
  for (const temperatureK of [275, 300, 350, 400, 450, 500, 550, 600, 620]) {
    for (const pressureMPa of [20, 40, 60, 80, 100]) states.push([temperatureK, pressureMPa * MPA]);
  }

  it("h = u + p·v and rho = 1/v at every state", () => {
    for (const [temperatureK, pressurePa] of states) {
      const state = region1(temperatureK, pressurePa);
      expectClose(state.enthalpy, state.internalEnergy + pressurePa * state.specificVolume, { rel: 1e-12, abs: 1e-9 });
      expect(state.density * state.specificVolume).toBeCloseTo(1, 14);
    }
  });

  // c_p = (dh/dT) at constant p: a central difference with a 0.01 K step differs from it by at
  // most 3e-8 relative on these states (measured), well inside the 1e-6 bound.
  it("c_p equals the temperature derivative of h along the isobar", () => {
    for (const [temperatureK, pressurePa] of states) {
      const dT = 0.01;
      const slope = (region1(temperatureK + dT, pressurePa).enthalpy - region1(temperatureK - dT, pressurePa).enthalpy) / (2 * dT);
      expectClose(region1(temperatureK, pressurePa).isobaricHeatCapacity, slope, { rel: 1e-6 });
    }
  });

  // T·(ds/dT) at constant p is c_p as well: checks the entropy against the enthalpy derivatives.
  it("T·ds/dT equals c_p along the isobar", () => {
    for (const [temperatureK, pressurePa] of states) {
      const dT = 0.01;
      const slope = (region1(temperatureK + dT, pressurePa).entropy - region1(temperatureK - dT, pressurePa).entropy) / (2 * dT);
      expectClose(temperatureK * slope, region1(temperatureK, pressurePa).isobaricHeatCapacity, { rel: 1e-6 });
    }
  });
});
