import { describe, it } from "vitest";
import { iceIh, iceIhEnthalpy } from "../../../../core/models/iapws-r10/ice-ih";
import { expectClose } from "../../../helpers/expect-close";

describe("enthalpy-only evaluation of the ice Ih Gibbs function", () => {
  // IAPWS R10-06(2009) Table 6, h in J/kg printed to 12 significant digits.
  it.each([
    [273.16, 611.657, -333444.253966],
    [273.152519, 101325, -333354.873637],
    [100, 100e6, -483491.635676],
  ])("at %s K and %s Pa, h = %s J/kg (R10-06(2009) Table 6)", (temperatureK, pressurePa, h) => {
    expectClose(iceIhEnthalpy(temperatureK, pressurePa), h, { abs: 5e-7 });
  });

  // Same formulation regrouped (s0 terms cancel): agreement to rounding, a few parts in 1e13.
  it("equals g − T·g_T of the full evaluation over the ice Ih range", () => {
    for (let temperatureK = 5; temperatureK <= 273.16; temperatureK += 8.9) {
      for (const pressurePa of [1e-3, 611.657, 1e5, 50e6, 208e6]) {
        expectClose(iceIhEnthalpy(temperatureK, pressurePa), iceIh(temperatureK, pressurePa).enthalpy, { rel: 1e-12, abs: 1e-6 });
      }
    }
  });
});
