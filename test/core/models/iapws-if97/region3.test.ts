/**
 * IAPWS-IF97 region 3 (basic equation Eq. (28), explicit in density) and its evaluation at given
 * (T, p) by a bracketed density solve, tested through the module's public exports.
 */
import { describe, expect, it } from "vitest";
import { b23Pressure } from "../../../../core/models/iapws-if97/b23";
import type { Region3Properties } from "../../../../core/models/iapws-if97/properties";
import { NoSuchStateError } from "../../../../core/errors";
import { region3, region3ByDensity, region3Density, region3OnSide } from "../../../../core/models/iapws-if97/region3";
import { saturationPressureIF97 } from "../../../../core/models/iapws-if97/region4";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

const MPA = 1e6;
/** Critical temperature and pressure, IF97 Eqs. (2), (3); critical density, Eq. (4). */
const TC = 647.096;
const PC = 22.064 * MPA;
const RHOC = 322;

/** Each quantity of Table 33 in the release's units (MPa, kJ/kg, kJ/(kg·K), m/s). */
const QUANTITIES = {
  p: (state: Region3Properties) => state.pressure / MPA,
  h: (state: Region3Properties) => state.enthalpy / 1e3,
  u: (state: Region3Properties) => state.internalEnergy / 1e3,
  s: (state: Region3Properties) => state.entropy / 1e3,
  cp: (state: Region3Properties) => state.isobaricHeatCapacity / 1e3,
  w: (state: Region3Properties) => state.speedOfSound,
} as const;
type Quantity = keyof typeof QUANTITIES;
const ORDER: readonly Quantity[] = ["p", "h", "u", "s", "cp", "w"];

/** Table 33 rows: T / K, rho / (kg/m³), then p, h, u, s, c_p, w as printed. */
const TABLE_33_ROWS: readonly (readonly [number, number, readonly string[]])[] = [
  [650, 500, ["0.255837018e2", "0.186343019e4", "0.181226279e4", "0.405427273e1", "0.138935717e2", "0.502005554e3"]],
  [650, 200, ["0.222930643e2", "0.237512401e4", "0.226365868e4", "0.485438792e1", "0.446579342e2", "0.383444594e3"]],
  [750, 500, ["0.783095639e2", "0.225868845e4", "0.210206932e4", "0.446971906e1", "0.634165359e1", "0.760696041e3"]],
];

// Check values: IAPWS R7-97(2012) (IF97), Table 33 — all three rows, input T and rho, all six
// quantities p, h, u, s, c_p, w, nine significant digits as printed (0.ddddddddd × 10^n).
// Tolerance: half a unit in the last printed digit. Worst measured: 0.96 of that half unit (c_p
// at 750 K, 500 kg/m³).
const TABLE_33 = TABLE_33_ROWS.flatMap(([temperatureK, density, texts]) =>
  ORDER.map((quantity, k) => [temperatureK, density, quantity, texts[k]!] as const),
);

describe("IF97 region 3 check values", () => {
  it.each(TABLE_33)("at %s K, %s kg/m³: %s matches Table 33 to every printed digit", (temperatureK, density, quantity, text) => {
    const check = printed(text);
    expectClose(QUANTITIES[quantity](region3ByDensity(density, temperatureK)), check.value, { abs: check.halfUnit });
  });
});

describe("IF97 region 3 at given temperature and pressure", () => {
  // Round trip through the check states of IF97 Table 33: p from Eq. (28) at the printed (T, rho),
  // then the density solve must give back that rho and h. Bound 1e-9 relative; the solver stops
  // at a few ulps in rho (measured: 1e-14).
  it.each(TABLE_33_ROWS)("recovers rho and h at %s K, %s kg/m³ from the pressure", (temperatureK, density) => {
    const direct = region3ByDensity(density, temperatureK);
    const solved = region3(temperatureK, direct.pressure);
    expectClose(solved.density, density, { rel: 1e-9 });
    expectClose(solved.enthalpy, direct.enthalpy, { rel: 1e-9 });
    expectClose(region3Density(temperatureK, direct.pressure), density, { rel: 1e-9 });
  });

  // The density solve must land on the mechanically stable branch: (dp/drho) at constant T is
  // positive there and negative on the unphysical middle root of a subcritical isotherm. Below
  // T_c, states above p_s(T) (IF97 Eq. (30)) are liquid-like (rho above rho_c), those below are
  // vapour-like. Measured: the smallest slope met on the grids below is 140 Pa·m³/kg.
  function expectStableRoot(temperatureK: number, pressurePa: number): Region3Properties {
    const state = region3(temperatureK, pressurePa);
    expectClose(state.pressure, pressurePa, { rel: 1e-12 });
    const step = 1e-6 * state.density;
    const slope =
      (region3ByDensity(state.density + step, temperatureK).pressure -
        region3ByDensity(state.density - step, temperatureK).pressure) /
      (2 * step);
    expect(slope, `dp/drho at ${temperatureK} K, ${pressurePa} Pa`).toBeGreaterThan(0);
    if (temperatureK < TC) {
      const liquidLike = pressurePa >= saturationPressureIF97(temperatureK);
      expect(state.density > RHOC, `side of rho_c at ${temperatureK} K, ${pressurePa} Pa`).toBe(liquidLike);
    }
    return state;
  }

  // Near T_c the brackets from SR1-86 densities miss the branches of Eq. (28) (measured: above
  // about 643 K, within kilopascals of p_s), so these states exercise the widened brackets:
  // rho_c for the liquid side, the vapour spinodal for the vapour side. Offsets from p_s(T) down
  // to 1e-9 relative (0.02 Pa), all outside the 3.5e-5 K band at T_c where Eq. (28) has no vapour
  // root just below p_s.
  it("finds the stable root just above and just below the saturation pressure near T_c", () => {
    for (const temperatureK of [630, 643, 645, 646, 646.5, 647, 647.09, 647.095]) {
      const saturation = saturationPressureIF97(temperatureK);
      for (const offset of [1e-3, 1e-5, 1e-7, 1e-9, 0, -1e-9, -1e-7, -1e-5, -1e-3]) {
        expectStableRoot(temperatureK, saturation * (1 + offset));
      }
    }
  });

  // Within 3.5e-5 K of T_c and 1e-3 Pa below p_s, Eq. (28) has no vapour root (its vapour spinodal
  // lies below p_s of Eq. (30) there); the only root, inside a loop narrower than 0.6 kg/m³, is
  // returned. Measured at this state: p_spinodal − p_s = −8.2e-4 Pa.
  it("returns the only root where Eq. (28) has no vapour root just below p_s", () => {
    const temperatureK = TC - 1e-5;
    const pressurePa = saturationPressureIF97(temperatureK) - 1e-4;
    const state = region3(temperatureK, pressurePa);
    expectClose(state.pressure, pressurePa, { rel: 1e-12 });
    expectClose(state.density, RHOC, { abs: 0.6 });
  });

  // Eq. (28) reproduces the critical point (p(rho_c, T_c) = 22.064 MPa to 2e-12 relative,
  // measured), but the critical isotherm is flat to third order, so the 5e-5 Pa left by rounding
  // moves the solved density by about 0.09 kg/m³ (measured). Bound: 0.2 kg/m³.
  it("gives rho close to rho_c at the critical point (IF97 Eqs. (2)–(4))", () => {
    expectClose(region3Density(TC, PC), RHOC, { abs: 0.2 });
  });

  // Adaptive Simpson rule on c_p from region3 itself, run to 1e-8·|Δh|.
  function integrateHeatCapacity(pressurePa: number, low: number, high: number): number {
    const cp = (temperatureK: number): number => region3(temperatureK, pressurePa).isobaricHeatCapacity;
    const step = (a: number, b: number, fa: number, fm: number, fb: number, whole: number, tolerance: number, depth: number): number => {
      const m = (a + b) / 2;
      const flm = cp((a + m) / 2);
      const frm = cp((m + b) / 2);
      const left = ((m - a) / 6) * (fa + 4 * flm + fm);
      const right = ((b - m) / 6) * (fm + 4 * frm + fb);
      if (depth === 0 || Math.abs(left + right - whole) <= 15 * tolerance) return left + right + (left + right - whole) / 15;
      return step(a, m, fa, flm, fm, left, tolerance / 2, depth - 1) + step(m, b, fm, frm, fb, right, tolerance / 2, depth - 1);
    };
    const fa = cp(low);
    const fm = cp((low + high) / 2);
    const fb = cp(high);
    const whole = ((high - low) / 6) * (fa + 4 * fm + fb);
    const scale = Math.abs(whole);
    return step(low, high, fa, fm, fb, whole, 1e-8 * scale, 30);
  }

  // Continuity along every isobar of a grid: between neighbouring temperatures h must rise by
  // the integral of c_p (dh = c_p dT at constant p). A jump to another root of p(rho, T) = p
  // would break that by the liquid–vapour enthalpy difference, at least 167 kJ/kg on these grids
  // below T_c (measured at 646.75 K). Pairs that straddle the saturation line (a real jump) are
  // skipped. Bound: 1e-6·|Δh| (below 0.1 J/kg per step); measured worst 4e-9.
  function checkGrid(temperatures: readonly number[], pressures: readonly number[]): number {
    let checkedPairs = 0;
    for (const pressurePa of pressures) {
      let previous: { temperatureK: number; enthalpy: number } | undefined;
      for (const temperatureK of temperatures) {
        if (!(pressurePa > b23Pressure(temperatureK))) {
          previous = undefined;
          continue;
        }
        const state = expectStableRoot(temperatureK, pressurePa);
        if (previous) {
          const crossesSaturation =
            previous.temperatureK < TC &&
            pressurePa < PC &&
            (saturationPressureIF97(previous.temperatureK) - pressurePa) *
              (saturationPressureIF97(Math.min(temperatureK, TC)) - pressurePa) <=
              0;
          if (crossesSaturation) {
            expect(state.enthalpy).toBeGreaterThan(previous.enthalpy);
          } else {
            const rise = state.enthalpy - previous.enthalpy;
            expect(rise).toBeGreaterThan(0);
            expectClose(rise, integrateHeatCapacity(pressurePa, previous.temperatureK, temperatureK), { rel: 1e-6 });
            checkedPairs++;
          }
        }
        previous = { temperatureK, enthalpy: state.enthalpy };
      }
    }
    return checkedPairs;
  }

  it("converges on the stable root and is continuous over 623.15–863.15 K, p_B23 to 100 MPa", () => {
    const temperatures = Array.from({ length: 61 }, (_, i) => 623.15 + 4 * i);
    const pressures = Array.from({ length: 29 }, (_, i) => 16.6 * MPA + ((100 - 16.6) * MPA * i) / 28);
    expect(checkGrid(temperatures, pressures)).toBeGreaterThan(1000);
  });

  it("converges on the stable root and is continuous near the critical point, 640–660 K, 21–23 MPa", () => {
    // 0.25 K and 0.05 MPa steps: the grid passes 0.15 K and 0.014 MPa from the critical point.
    const temperatures = Array.from({ length: 81 }, (_, i) => 640 + 0.25 * i);
    const pressures = Array.from({ length: 41 }, (_, i) => 21 * MPA + 0.05 * MPA * i);
    expect(checkGrid(temperatures, pressures)).toBeGreaterThan(3000);
  });
});

describe("IF97 region 3 on a chosen branch", () => {
  it("gives both coexisting phases at p_s(T) and agrees with the automatic choice on each side", () => {
    for (const temperatureK of [623.5, 630, 640, 645, 646.5, 647, 647.09]) {
      const saturation = saturationPressureIF97(temperatureK);
      const liquid = region3OnSide(temperatureK, saturation, "liquid");
      const vapour = region3OnSide(temperatureK, saturation, "vapor");
      expect(liquid.density).toBeGreaterThan(RHOC);
      expect(vapour.density).toBeLessThan(RHOC);
      expect(liquid.density).toBe(region3(temperatureK, saturation).density);
      const below = saturation * (1 - 1e-9);
      expectClose(region3OnSide(temperatureK, below, "vapor").density, region3(temperatureK, below).density, { rel: 1e-12 });
    }
  });

  // The latent heat of vaporisation falls steadily to zero at the critical point (common
  // practice); on Eq. (28) with p_s from Eq. (30) it falls from 893 kJ/kg at 623.15 K to 66 kJ/kg
  // at 647.05 K (measured).
  it("has a latent heat h'' − h' that is positive and falls toward T_c", () => {
    let previous = Infinity;
    for (let temperatureK = 623.15; temperatureK < TC - 0.005; temperatureK += 0.05) {
      const saturation = saturationPressureIF97(temperatureK);
      const latent = region3OnSide(temperatureK, saturation, "vapor").enthalpy - region3OnSide(temperatureK, saturation, "liquid").enthalpy;
      expect(latent).toBeGreaterThan(0);
      expect(latent).toBeLessThan(previous);
      previous = latent;
    }
  });

  // At 640 K the liquid branch of Eq. (28) ends at 19.80 MPa and the vapour branch at 20.47 MPa
  // (its spinodals, measured); p_s = 20.27 MPa. Slightly metastable states exist, states beyond
  // the spinodals do not.
  it("returns slightly metastable states and refuses states beyond the branch's end", () => {
    const metastableLiquid = region3OnSide(640, 20e6, "liquid");
    expect(metastableLiquid.density).toBeGreaterThan(RHOC);
    expectClose(metastableLiquid.pressure, 20e6, { rel: 1e-12 });
    const metastableVapour = region3OnSide(640, 20.4e6, "vapor");
    expect(metastableVapour.density).toBeLessThan(RHOC);
    expectClose(metastableVapour.pressure, 20.4e6, { rel: 1e-12 });
    expect(() => region3OnSide(640, 19.7e6, "liquid")).toThrow(NoSuchStateError);
    expect(() => region3OnSide(640, 20.6e6, "vapor")).toThrow(/highest pressure of its vapour branch/);
  });

  it("ignores the side above T_c, where each isotherm has one root", () => {
    expect(region3OnSide(700, 30e6, "liquid").density).toBe(region3OnSide(700, 30e6, "vapor").density);
  });
});
