/**
 * Density of CO2 at given (T, p) and side from the Span–Wagner (1996) equation of state, tested
 * through the module's public exports.
 */
import { describe, expect, it } from "vitest";
import { PhaseError } from "../../../../core/errors";
import { densityOnSide, enthalpyOnSide, propertiesOnSide } from "../../../../core/models/span-wagner-1996/density";
import { SW96_CRITICAL_TEMPERATURE } from "../../../../core/models/span-wagner-1996/fixed-points";
import { propertiesByDensity } from "../../../../core/models/span-wagner-1996/helmholtz";
import { saturatedLiquidDensity } from "../../../../core/models/span-wagner-1996/saturated-liquid-density";
import { saturatedVaporDensity } from "../../../../core/models/span-wagner-1996/saturated-vapor-density";
import { vaporPressure } from "../../../../core/models/span-wagner-1996/vapor-pressure";
import { expectClose } from "../../../helpers/expect-close";

describe("SW96 density solve", () => {
  it("round trip p → rho → p over the whole range, on the side the pressure lies", () => {
    for (const temperatureK of [216.592, 220, 250, 280, 300, 303.5, 304.1, 304.1282, 304.2, 310, 350, 500, 800, 1100]) {
      for (const pressurePa of [1, 1e3, 1e5, 0.6e6, 2e6, 5e6, 7e6, 7.4e6, 1e7, 3e7, 1e8, 3e8, 8e8]) {
        const side = temperatureK < SW96_CRITICAL_TEMPERATURE && pressurePa > vaporPressure(temperatureK) ? "liquid" : "vapor";
        const density = densityOnSide(temperatureK, pressurePa, side);
        expectClose(propertiesByDensity(density, temperatureK).pressure, pressurePa, { rel: 1e-11 });
      }
    }
  });

  it("finds vapour over dry ice below the triple point", () => {
    for (const [temperatureK, pressurePa] of [
      [154, 1400],
      [180, 27_000],
      [194.686, 101_325],
      [210, 300_000],
    ] as const) {
      const density = densityOnSide(temperatureK, pressurePa, "vapor");
      expectClose(propertiesByDensity(density, temperatureK).pressure, pressurePa, { rel: 1e-11 });
      expect(density).toBeLessThan((2 * pressurePa) / (188.9241 * temperatureK));
    }
  });

  // At the ancillary saturation pressure both phases exist (one of them slightly metastable) and
  // their densities agree with Eqs. (3.14) and (3.15) within 0.01 % and 0.02 % up to 302 K.
  it("gives both phases at the ancillary saturation pressure, near the ancillary densities", () => {
    for (let temperatureK = 216.592; temperatureK <= 302; temperatureK += 3.3) {
      const pressurePa = vaporPressure(temperatureK);
      expectClose(densityOnSide(temperatureK, pressurePa, "liquid"), saturatedLiquidDensity(temperatureK), { rel: 1e-4 });
      expectClose(densityOnSide(temperatureK, pressurePa, "vapor"), saturatedVaporDensity(temperatureK), { rel: 2e-4 });
    }
  });

  // Within 0.2 mK of T_c the liquid spinodal of the equation lies up to 0.024 Pa above Eq. (3.13):
  // the liquid side then answers with the spinodal itself, the end of the liquid branch, whose
  // pressure is within 0.05 Pa of the one asked for (see densityOnSide).
  it("answers on both sides right up to the critical point, liquid denser than vapour", () => {
    for (const below of [1e-2, 1e-3, 3e-4, 1e-4, 1e-5, 1e-6, 1e-7, 1e-8]) {
      const temperatureK = SW96_CRITICAL_TEMPERATURE - below;
      const pressurePa = vaporPressure(temperatureK);
      const liquid = densityOnSide(temperatureK, pressurePa, "liquid");
      const vapor = densityOnSide(temperatureK, pressurePa, "vapor");
      expect(liquid).toBeGreaterThan(vapor);
      expectClose(propertiesByDensity(liquid, temperatureK).pressure, pressurePa, { abs: 0.05 });
      expectClose(propertiesByDensity(vapor, temperatureK).pressure, pressurePa, { abs: 0.05 });
    }
  });

  it("finds metastable states as far as their spinodal and says when a branch ends", () => {
    // Liquid at 250 K and 1.5 MPa, below p_s = 1.785 MPa: superheated liquid, still liquid-dense.
    expect(densityOnSide(250, 1.5e6, "liquid")).toBeGreaterThan(1000);
    // Vapour at 250 K and 2 MPa, above p_s: supersaturated vapour, below the vapour spinodal.
    expect(densityOnSide(250, 2e6, "vapor")).toBeLessThan(100);
    let error: unknown;
    try {
      densityOnSide(250, 20e6, "vapor");
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(PhaseError);
    expect((error as PhaseError).kind).toBe("no-such-state");
    expect((error as PhaseError).message).toContain("highest pressure of its vapour branch");
    // Liquid at 250 K stays metastable down to negative pressure (its spinodal is near −13 MPa), so
    // 0.1 MPa still has a liquid root; 0.3 K below T_c the liquid branch ends 0.7 kPa below p_s.
    expect(densityOnSide(250, 0.1e6, "liquid")).toBeGreaterThan(900);
    expect(() => densityOnSide(304, vaporPressure(304) - 2000, "liquid")).toThrow(PhaseError);
  });

  it("enthalpy on a side equals the full property evaluation", () => {
    for (const [temperatureK, pressurePa, side] of [
      [220, 10e6, "liquid"],
      [300, 1e6, "vapor"],
      [304.1, 7.5e6, "liquid"],
      [600, 50e6, "vapor"],
    ] as const) {
      expectClose(enthalpyOnSide(temperatureK, pressurePa, side), propertiesOnSide(temperatureK, pressurePa, side).enthalpy, {
        abs: 1e-6,
      });
    }
  });
});
