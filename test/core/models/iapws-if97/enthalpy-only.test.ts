import { describe, it } from "vitest";
import { region1, region1Enthalpy } from "../../../../core/models/iapws-if97/region1";
import { region2, region2Enthalpy } from "../../../../core/models/iapws-if97/region2";
import { expectClose } from "../../../helpers/expect-close";

describe("enthalpy-only evaluations equal the full region equations", () => {
  // IAPWS-IF97 (IAPWS R7-97(2012)) Table 5, h in kJ/kg printed to 9 significant digits.
  it.each([
    [300, 3e6, 115.331273],
    [300, 80e6, 184.142828],
    [500, 3e6, 975.542239],
  ])("region 1 at %s K, %s Pa: h = %s kJ/kg (IF97 Table 5)", (temperatureK, pressurePa, hKJ) => {
    expectClose(region1Enthalpy(temperatureK, pressurePa), hKJ * 1e3, { rel: 5e-9 });
  });

  // IAPWS-IF97 Table 15, h in kJ/kg printed to 9 significant digits.
  it.each([
    [300, 3.5e3, 2549.91145],
    [700, 3.5e3, 3335.68375],
    [700, 30e6, 2631.49474],
  ])("region 2 at %s K, %s Pa: h = %s kJ/kg (IF97 Table 15)", (temperatureK, pressurePa, hKJ) => {
    expectClose(region2Enthalpy(temperatureK, pressurePa), hKJ * 1e3, { rel: 5e-9 });
  });

  // The powers are formed in another order, so the sums agree to a few parts in 1e13.
  it("agree with the full evaluations to rounding over the regions", () => {
    for (let temperatureK = 273.15; temperatureK <= 623.15; temperatureK += 17.5) {
      for (const pressurePa of [1e6, 2e7, 1e8]) {
        expectClose(region1Enthalpy(temperatureK, pressurePa), region1(temperatureK, pressurePa).enthalpy, { rel: 1e-12, abs: 1e-9 });
      }
      for (const pressurePa of [10, 1e3, 1e5]) {
        expectClose(region2Enthalpy(temperatureK + 400, pressurePa), region2(temperatureK + 400, pressurePa).enthalpy, { rel: 1e-12 });
      }
    }
  });
});
