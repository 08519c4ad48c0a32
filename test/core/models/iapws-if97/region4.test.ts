/**
 * IAPWS-IF97 region 4: saturation pressure p_s(T), Eq. (30), and saturation temperature T_s(p),
 * Eq. (31), tested through the module's public exports.
 */
import { describe, expect, it } from "vitest";
import {
  REGION4_P_MAX,
  REGION4_T_MAX,
  REGION4_T_MIN,
  saturationPressureIF97,
  saturationTemperatureIF97,
} from "../../../../core/models/iapws-if97/region4";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

const MPA = 1e6;

// Check values: IAPWS R7-97(2012) (IF97), Table 35 — p_s from Eq. (30), all three rows as printed,
// nine significant digits in MPa. Tolerance: half a unit in the last printed digit.
const TABLE_35: readonly (readonly [number, string])[] = [
  [300, "0.353658941e-2"],
  [500, "0.263889776e1"],
  [600, "0.123443146e2"],
];

// Check values: IAPWS R7-97(2012) (IF97), Table 36 — T_s from Eq. (31), all three rows as printed,
// nine significant digits in K. Tolerance: half a unit in the last printed digit.
const TABLE_36: readonly (readonly [number, string])[] = [
  [0.1, "0.372755919e3"],
  [1, "0.453035632e3"],
  [10, "0.584149488e3"],
];

describe("IF97 Eq. (30) saturation pressure", () => {
  it.each(TABLE_35)("p_s(%s K) matches IF97 Table 35 to every printed digit", (temperatureK, text) => {
    const check = printed(text);
    expectClose(saturationPressureIF97(temperatureK) / MPA, check.value, { abs: check.halfUnit });
  });

  it("passes through the critical point (IF97 Eqs. (2), (3): 647.096 K, 22.064 MPa, five digits printed)", () => {
    expectClose(saturationPressureIF97(647.096) / MPA, 22.064, { abs: 0.0005 });
  });

  it("passes through the triple point (IF97 Eq. (9): 273.16 K, 611.657 Pa, six digits printed)", () => {
    expectClose(saturationPressureIF97(273.16), 611.657, { abs: 0.0005 });
  });

  it("gives 611.213 Pa at 273.15 K, the low end of region 4 (IF97 Sec. 8 validity statement, from memory)", () => {
    expectClose(saturationPressureIF97(273.15), 611.213, { abs: 0.0005 });
  });

  it("rises strictly with temperature over the whole range", () => {
    let previous = -Infinity;
    for (let i = 0; i <= 5000; i++) {
      const temperatureK = REGION4_T_MIN + ((REGION4_T_MAX - REGION4_T_MIN) * i) / 5000;
      const pressurePa = saturationPressureIF97(temperatureK);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
  });
});

describe("IF97 Eq. (31) saturation temperature", () => {
  it.each(TABLE_36)("T_s(%s MPa) matches IF97 Table 36 to every printed digit", (pressureMPa, text) => {
    const check = printed(text);
    expectClose(saturationTemperatureIF97(pressureMPa * MPA), check.value, { abs: check.halfUnit });
  });

  it("returns the critical temperature at the critical pressure (IF97 Eqs. (2), (3))", () => {
    expectClose(saturationTemperatureIF97(22.064e6), 647.096, { abs: 0.0005 });
  });

  it("returns the triple-point temperature at the triple-point pressure (IF97 Eq. (9))", () => {
    expectClose(saturationTemperatureIF97(611.657), 273.16, { abs: 0.005 });
  });

  // IF97 Sec. 8 states that Eq. (31) is the exact inverse of Eq. (30) (they solve one quadratic).
  // Measured here: worst relative round-trip error 3.9e-14 (about 2.5e-11 K, near Tc).
  it("inverts Eq. (30) to 1e-12 relative from 273.15 K to the critical temperature", () => {
    for (let i = 0; i <= 5000; i++) {
      const temperatureK = REGION4_T_MIN + ((REGION4_T_MAX - REGION4_T_MIN) * i) / 5000;
      expectClose(saturationTemperatureIF97(saturationPressureIF97(temperatureK)), temperatureK, { rel: 1e-12 });
    }
  });

  it("rises strictly with pressure over the whole range (611.213 Pa to 22.064 MPa)", () => {
    let previous = -Infinity;
    const low = Math.log(611.213);
    const high = Math.log(REGION4_P_MAX);
    for (let i = 0; i <= 5000; i++) {
      const temperatureK = saturationTemperatureIF97(Math.exp(low + ((high - low) * i) / 5000));
      expect(temperatureK).toBeGreaterThan(previous);
      previous = temperatureK;
    }
  });
});

describe("region 4 limits", () => {
  it("are the published ones (IF97 Sec. 8: 273.15 K; Eqs. (2), (3): 647.096 K, 22.064 MPa)", () => {
    expect(REGION4_T_MIN).toBe(273.15);
    expect(REGION4_T_MAX).toBe(647.096);
    expect(REGION4_P_MAX).toBe(22.064e6);
  });
});
