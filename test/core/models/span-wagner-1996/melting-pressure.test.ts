/**
 * Span–Wagner (1996) ancillary melting-pressure equation, Eq. (3.10), tested through the module's
 * public exports.
 */
import { describe, expect, it } from "vitest";
import { SW96_TRIPLE_PRESSURE, SW96_TRIPLE_TEMPERATURE } from "../../../../core/models/span-wagner-1996/fixed-points";
import {
  MELTING_T_AT_800_MPA,
  MELTING_T_MIN,
  meltingPressure,
  meltingTemperature,
} from "../../../../core/models/span-wagner-1996/melting-pressure";
import { expectClose } from "../../../helpers/expect-close";

describe("SW96 melting pressure, Eq. (3.10)", () => {
  // Experimental check: A. Michels et al., Physica 9 (1942), melting pressures measured at 217.03 K, 235.29 K and 266.04 K.
  // Tolerance 0.2 %: measured 0.02 %, 0.03 % and 0.17 %.
  it.each([
    [217.03, 2.57],
    [235.29, 95.86],
    [266.04, 286.77],
  ])("at %s K agrees with the measurement of Michels et al. (1942), %s MPa, within 0.2 %", (temperatureK, megapascals) => {
    expectClose(meltingPressure(temperatureK), megapascals * 1e6, { rel: 2e-3 });
  });

  it("starts at the triple point: p_t = 0.51795 MPa at T_t = 216.592 K exactly", () => {
    expect(MELTING_T_MIN).toBe(SW96_TRIPLE_TEMPERATURE);
    expect(meltingPressure(SW96_TRIPLE_TEMPERATURE)).toBe(SW96_TRIPLE_PRESSURE);
    expect(meltingTemperature(SW96_TRIPLE_PRESSURE)).toBe(SW96_TRIPLE_TEMPERATURE);
  });

  it("reaches 800 MPa, the limit of the equation of state, at 327.673 K", () => {
    expectClose(MELTING_T_AT_800_MPA, 327.673, { abs: 5e-4 });
    expectClose(meltingPressure(MELTING_T_AT_800_MPA), 800e6, { rel: 1e-14 });
  });

  // Slope at the triple point: dp/dT = p_t · a_1 / T_t = 4.6765 MPa/K. Positive: the solid is
  // denser than the liquid, so pressure raises the melting temperature (common practice for CO2).
  it("rises at 4.68 MPa/K at the triple point", () => {
    const step = 1e-6;
    const slope = (meltingPressure(SW96_TRIPLE_TEMPERATURE + step) - SW96_TRIPLE_PRESSURE) / step;
    expectClose(slope, (SW96_TRIPLE_PRESSURE * 1955.539) / SW96_TRIPLE_TEMPERATURE, { rel: 1e-4 });
    expectClose(slope, 4.6765e6, { rel: 1e-4 });
  });

  it("round trip T → p_m → T with the algebraic inverse, to a few ulps", () => {
    for (let i = 0; i <= 500; i++) {
      const temperatureK = SW96_TRIPLE_TEMPERATURE + ((MELTING_T_AT_800_MPA - SW96_TRIPLE_TEMPERATURE) * i) / 500;
      expectClose(meltingTemperature(meltingPressure(temperatureK)), temperatureK, { rel: 1e-14 });
    }
  });

  it("rises strictly with temperature", () => {
    let previous = 0;
    for (let i = 0; i <= 2000; i++) {
      const pressurePa = meltingPressure(SW96_TRIPLE_TEMPERATURE + ((MELTING_T_AT_800_MPA - SW96_TRIPLE_TEMPERATURE) * i) / 2000);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
  });
});
