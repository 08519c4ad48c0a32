/**
 * Span–Wagner (1996) ancillary sublimation-pressure equation, Eq. (3.12), tested through the
 * module's public exports.
 */
import { describe, expect, it } from "vitest";
import { SW96_TRIPLE_PRESSURE, SW96_TRIPLE_TEMPERATURE } from "../../../../core/models/span-wagner-1996/fixed-points";
import {
  SUBLIMATION_T_MAX,
  SUBLIMATION_T_MIN,
  sublimationPressure,
} from "../../../../core/models/span-wagner-1996/sublimation-pressure";
import { solveBracketed } from "../../../../core/numerics/roots";
import { expectClose } from "../../../helpers/expect-close";

/**
 * Vapour pressure of solid CO2 from the equation of W. F. Giauque, C. J. Egan, J. Chem. Phys. 5,
 * 45 (1937): log10(p / int. cmHg) = −1354.210/T + 8.69903 + 0.0015880 T − 4.5107e-6 T², fitted to
 * their measurements from 154 K to 196 K; 1 cmHg = 1333.224 Pa.
 */
function giauqueEgan(temperatureK: number): number {
  return 1333.224 * 10 ** (-1354.21 / temperatureK + 8.69903 + 0.001588 * temperatureK - 4.5107e-6 * temperatureK ** 2);
}

describe("SW96 sublimation pressure, Eq. (3.12)", () => {
  it("ends at the triple point: 0.51795 MPa at 216.592 K exactly", () => {
    expect(SUBLIMATION_T_MAX).toBe(SW96_TRIPLE_TEMPERATURE);
    expect(sublimationPressure(SW96_TRIPLE_TEMPERATURE)).toBe(SW96_TRIPLE_PRESSURE);
  });

  // Independent check: the equation of Giauque and Egan (1937) above. Tolerance 0.2 % from 160 K to
  // 196 K (measured at most 0.16 %), 1 % at 154 K, the lowest temperature of their measurements
  // (measured 0.85 %).
  it.each([160, 165, 170, 175, 180, 185, 190, 194.686, 196])("at %s K agrees with Giauque and Egan (1937) within 0.2 %", (temperatureK) => {
    expectClose(sublimationPressure(temperatureK), giauqueEgan(temperatureK), { rel: 2e-3 });
  });

  it("at 154 K, the lowest temperature Phasecell uses, agrees with Giauque and Egan (1937) within 1 %", () => {
    expect(SUBLIMATION_T_MIN).toBe(154);
    expectClose(sublimationPressure(154), giauqueEgan(154), { rel: 1e-2 });
  });

  // Check value: the normal sublimation point of CO2, 194.6857 K, a secondary reference point of
  // temperature: R. E. Bedford et al., Metrologia 20 (1984). Measured 0.24 mK apart; tolerance 1 mK.
  it("gives the normal sublimation point of Bedford et al. (1984), 194.6857 K, within 1 mK", () => {
    const temperatureK = solveBracketed((t) => sublimationPressure(t) - 101325, 190, 200);
    expectClose(temperatureK, 194.6857, { abs: 1e-3 });
  });

  it("rises strictly with temperature from 154 K to the triple point", () => {
    let previous = 0;
    for (let i = 0; i <= 2000; i++) {
      const pressurePa = sublimationPressure(SUBLIMATION_T_MIN + ((SUBLIMATION_T_MAX - SUBLIMATION_T_MIN) * i) / 2000);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
  });
});
