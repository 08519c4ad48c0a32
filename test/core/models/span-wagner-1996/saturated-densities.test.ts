/**
 * Span–Wagner (1996) ancillary saturated-liquid and saturated-vapour densities, Eqs. (3.14) and
 * (3.15), tested through the modules' public exports.
 */
import { describe, expect, it } from "vitest";
import { SW96_CRITICAL_DENSITY, SW96_CRITICAL_TEMPERATURE } from "../../../../core/models/span-wagner-1996/fixed-points";
import { saturationStateEOS } from "../../../../core/models/span-wagner-1996/phase-equilibrium";
import { saturatedLiquidDensity } from "../../../../core/models/span-wagner-1996/saturated-liquid-density";
import { saturatedVaporDensity } from "../../../../core/models/span-wagner-1996/saturated-vapor-density";
import { expectClose } from "../../../helpers/expect-close";

describe("SW96 saturated densities, Eqs. (3.14) and (3.15)", () => {
  // Both equations are reduced by the critical density, and every term vanishes at T_c.
  it("meet at the critical density, 467.6 kg/m³ at 304.1282 K", () => {
    expect(saturatedLiquidDensity(SW96_CRITICAL_TEMPERATURE)).toBe(SW96_CRITICAL_DENSITY);
    expect(saturatedVaporDensity(SW96_CRITICAL_TEMPERATURE)).toBe(SW96_CRITICAL_DENSITY);
  });

  // Experimental check: W. Duschek, R. Kleinrahm, W. Wagner, J. Chem. Thermodyn. 22, 841 (1990)
  // (page from memory), saturated densities at 217.0 K, 245.0 K and 303.8 K as quoted second-hand.
  // Measured: liquid +0.003 % and +0.002 %, vapour −0.042 % and −0.017 %; at 303.8 K, 0.33 K below
  // T_c where the densities change by several per cent per 0.1 K, liquid −0.17 % and vapour
  // +0.21 %. Tolerances 0.05 % (liquid) and 0.1 % (vapour), 0.5 % at 303.8 K.
  it.each([
    [217.0, 1177.03, 14.0017, 5e-4, 1e-3],
    [245.0, 1067.89, 39.5048, 5e-4, 1e-3],
    [303.8, 554.14, 382.3, 5e-3, 5e-3],
  ])("at %s K agree with Duschek et al. (1990): rho' %s, rho'' %s kg/m³", (temperatureK, liquid, vapor, relLiquid, relVapor) => {
    expectClose(saturatedLiquidDensity(temperatureK), liquid, { rel: relLiquid });
    expectClose(saturatedVaporDensity(temperatureK), vapor, { rel: relVapor });
  });

  // Consistency with the phase equilibrium of the paper's own equation of state (Maxwell
  // criterion, see phase-equilibrium.ts) from the triple point to 302 K: measured at most 0.0079 %
  // (liquid) and 0.0107 % (vapour); the tolerances are 0.01 % and 0.02 %.
  it("agree with the equation of state's saturated densities within 0.01 % and 0.02 % up to 302 K", () => {
    for (let temperatureK = 216.592; temperatureK <= 302; temperatureK += 2.5) {
      const state = saturationStateEOS(temperatureK);
      expectClose(saturatedLiquidDensity(temperatureK), state.liquid.density, { rel: 1e-4 });
      expectClose(saturatedVaporDensity(temperatureK), state.vapor.density, { rel: 2e-4 });
    }
  });

  it("liquid denser than vapour everywhere below T_c; liquid falls and vapour rises with T", () => {
    let liquid = Infinity;
    let vapor = 0;
    for (let i = 0; i < 1000; i++) {
      const temperatureK = 216.592 + ((SW96_CRITICAL_TEMPERATURE - 216.592) * i) / 1000;
      const nextLiquid = saturatedLiquidDensity(temperatureK);
      const nextVapor = saturatedVaporDensity(temperatureK);
      expect(nextLiquid).toBeGreaterThan(nextVapor);
      expect(nextLiquid).toBeLessThan(liquid);
      expect(nextVapor).toBeGreaterThan(vapor);
      liquid = nextLiquid;
      vapor = nextVapor;
    }
  });
});
