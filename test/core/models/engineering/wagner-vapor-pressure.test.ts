/**
 * Wagner-type vapour-pressure equations against published tables.
 */
import { describe, expect, it } from "vitest";
import {
  WAGNER_25_5_EXPONENTS,
  wagner25_5,
  wagnerLogReducedPressure,
  wagnerPressure,
  type WagnerCoefficients,
} from "../../../../core/models/engineering/wagner-vapor-pressure";
import { expectClose } from "../../../helpers/expect-close";

// Span, Lemmon, Jacobsen, Wagner, Yokozeki, J. Phys. Chem. Ref. Data 29, 1361 (2000): the
// nitrogen vapour-pressure ancillary equation (T_c = 126.192 K, p_c = 3.3958 MPa).
const SPAN_N2: WagnerCoefficients = {
  Tc: 126.192,
  pc: 3.3958e6,
  n: [-6.12445284, 1.2632722, -0.765910082, -1.77570564],
  t: [1, 1.5, 2.5, 5],
};

// VDI Heat Atlas, 2nd ed. (2010), D3.1, PPDS vapour-pressure equation for methane.
const VDI_METHANE = wagner25_5(190.56, 4.599e6, -6.02388, 1.26813, -0.56948, -1.37648);

describe("Wagner-type vapour-pressure equation", () => {
  // Saturation pressures of the Span et al. (2000) reference equation of state at 80, 100 and
  // 120 K, as tabulated for the paper's equation (MPa, five significant digits printed). The
  // ancillary is a fit to the equation of state: 0.01 % tolerance covers the fit.
  it.each([
    [80, 0.13687e6],
    [100, 0.77827e6],
    [120, 2.51058e6],
  ])("nitrogen ancillary at %s K reproduces %s Pa of the reference equation", (temperatureK, expectedPa) => {
    expectClose(wagnerPressure(SPAN_N2, temperatureK), expectedPa, { rel: 1e-4 });
  });

  // VDI Heat Atlas (2010) D3.1 saturation table for methane (pressures printed to 4–5
  // significant digits); the Heat Atlas fits its PPDS equation to the same data: 0.15 %.
  it.each([
    [120, 191400],
    [150, 1040000],
    [180, 3285200],
  ])("methane PPDS equation at %s K against the VDI table, %s Pa", (temperatureK, expectedPa) => {
    expectClose(wagnerPressure(VDI_METHANE, temperatureK), expectedPa, { rel: 1.5e-3 });
  });

  it("gives exactly p_c at T_c and rises monotonically below it", () => {
    expect(wagnerPressure(SPAN_N2, SPAN_N2.Tc)).toBe(SPAN_N2.pc);
    expect(wagnerLogReducedPressure(VDI_METHANE, VDI_METHANE.Tc)).toBe(0);
    let previous = 0;
    for (let temperatureK = 63.151; temperatureK <= 126.192; temperatureK += 0.5) {
      const pressurePa = wagnerPressure(SPAN_N2, temperatureK);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
  });

  it("the 2.5-5 builder keeps the printed order and exponents", () => {
    expect(VDI_METHANE.n).toEqual([-6.02388, 1.26813, -0.56948, -1.37648]);
    expect(VDI_METHANE.t).toEqual(WAGNER_25_5_EXPONENTS);
    expect(WAGNER_25_5_EXPONENTS).toEqual([1, 1.5, 2.5, 5]);
  });
});
