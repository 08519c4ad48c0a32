/**
 * IAPWS R14-08(2011) sublimation-pressure equation of ice Ih, tested through the module's public
 * exports.
 */
import { describe, expect, it } from "vitest";
import {
  SUBLIMATION_T_MAX,
  SUBLIMATION_T_MIN,
  sublimationPressureIceIh,
} from "../../../../core/models/iapws-r14/sublimation-pressure";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

describe("R14-08(2011) sublimation pressure", () => {
  // Check value: IAPWS R14-08(2011), Table 3 (verification values for computer programs; the table
  // number is the one python3-iapws' test suite cites), sublimation row: 230 K, 8.94735e-6 MPa,
  // six significant digits. Tolerance: half a unit in the last printed digit.
  it("matches the Table 3 check value at 230 K to every printed digit", () => {
    const check = printed("8.94735e-6");
    expectClose(sublimationPressureIceIh(230) / 1e6, check.value, { abs: check.halfUnit });
  });

  // The equation is reduced by the triple point (IF97 Eq. (9) values, repeated in R14-08(2011)) and
  // its coefficients a_i sum to zero, so it passes through 611.657 Pa at 273.16 K exactly.
  it("passes through the triple point, 611.657 Pa at 273.16 K", () => {
    expectClose(sublimationPressureIceIh(273.16), 611.657, { rel: 1e-15 });
  });

  it("covers 50 K to the triple point (R14-08(2011) validity range)", () => {
    expect(SUBLIMATION_T_MIN).toBe(50);
    expect(SUBLIMATION_T_MAX).toBe(273.16);
  });

  it("is finite and positive down to 50 K, where it is of order 1e-40 Pa", () => {
    const lowest = sublimationPressureIceIh(SUBLIMATION_T_MIN);
    expect(lowest).toBeGreaterThan(1e-41);
    expect(lowest).toBeLessThan(1e-39);
  });

  it("rises strictly with temperature over the whole range", () => {
    let previous = 0;
    for (let i = 0; i <= 5000; i++) {
      const pressurePa = sublimationPressureIceIh(
        SUBLIMATION_T_MIN + ((SUBLIMATION_T_MAX - SUBLIMATION_T_MIN) * i) / 5000,
      );
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
  });

  // Common practice: frost vapour pressure is a few hundred pascals in a household freezer and falls
  // roughly tenfold every 20 K or so below it (from memory: about 103 Pa at -20 °C, 1 Pa near -60 °C).
  it("is about 103 Pa at -20 °C and about 1 Pa at -60 °C (from memory)", () => {
    expectClose(sublimationPressureIceIh(253.15), 103, { rel: 0.01 });
    expectClose(sublimationPressureIceIh(213.15), 1.08, { rel: 0.05 });
  });
});
