/**
 * Liquid–vapour equilibrium of the Span–Wagner (1996) equation of state (Maxwell criterion),
 * tested through the module's public exports.
 */
import { describe, expect, it } from "vitest";
import { SATURATION_EOS_T_MAX, saturationStateEOS } from "../../../../core/models/span-wagner-1996/phase-equilibrium";
import { vaporPressure } from "../../../../core/models/span-wagner-1996/vapor-pressure";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

// Check values: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509 (1996), the saturation table
// of the paper's appendix (table number not transcribed), pressures in MPa printed with four
// decimals. The paper computes the table from its equation of state, so the equilibrium of the
// equation reproduces it to half a unit in the last printed digit (50 Pa; measured at most 48 Pa).
const SATURATION_TABLE_MPA: readonly (readonly [number, string])[] = [
  [250, "1.7850"],
  [260, "2.4188"],
  [270, "3.2033"],
  [280, "4.1607"],
  [290, "5.3177"],
  [295, "5.9822"],
  [300, "6.7131"],
];

describe("SW96 phase equilibrium", () => {
  it.each(SATURATION_TABLE_MPA)("at %s K reproduces the paper's saturation pressure %s MPa", (temperatureK, text) => {
    const check = printed(text);
    expectClose(saturationStateEOS(temperatureK).pressure / 1e6, check.value, { abs: check.halfUnit });
  });

  it("satisfies the Maxwell criterion: equal pressure and Gibbs energy in both phases", () => {
    for (let temperatureK = 216.592; temperatureK <= SATURATION_EOS_T_MAX; temperatureK += 4.37) {
      const state = saturationStateEOS(temperatureK);
      expectClose(state.liquid.pressure, state.pressure, { rel: 1e-12 });
      expectClose(state.vapor.pressure, state.pressure, { rel: 1e-12 });
      expectClose(state.liquid.gibbs, state.vapor.gibbs, { abs: 1e-6 * Math.abs(state.vapor.gibbs) + 1e-3 });
      expect(state.liquid.density).toBeGreaterThan(state.vapor.density);
      expect(state.vapor.enthalpy).toBeGreaterThan(state.liquid.enthalpy);
    }
  });

  // Eq. (3.13) and the equation of state's equilibrium: −0.0042 % to +0.0025 % (measured every
  // 0.02 K); tolerance 0.005 %, the bracket of the solve.
  it("lies within 0.005 % of the ancillary Eq. (3.13) up to 304 K", () => {
    for (let temperatureK = 216.592; temperatureK <= SATURATION_EOS_T_MAX; temperatureK += 0.73) {
      expectClose(saturationStateEOS(temperatureK).pressure, vaporPressure(temperatureK), { rel: 5e-5 });
    }
    expectClose(saturationStateEOS(SATURATION_EOS_T_MAX).pressure, vaporPressure(SATURATION_EOS_T_MAX), { rel: 5e-5 });
  });
});
