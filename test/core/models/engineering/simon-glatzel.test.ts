/**
 * Melting-pressure forms: the Simon–Glatzel equation and the reduced Simon-type sum.
 */
import { describe, expect, it } from "vitest";
import {
  reducedMeltingPressure,
  simonGlatzelPressure,
  simonGlatzelTemperature,
} from "../../../../core/models/engineering/simon-glatzel";
import { solveBracketed } from "../../../../core/numerics/roots";
import { expectClose } from "../../../helpers/expect-close";

// Tegeler, Span, Wagner, J. Phys. Chem. Ref. Data 28, 779 (1999): argon melting equation with
// its printed triple point.
const TEGELER_AR = { Tt: 83.8058, pt: 68891, a: [-7476.2665, 9959.0613], t: [1.05, 1.275] };

describe("reduced Simon-type melting sum", () => {
  it("gives exactly p_t at T_t", () => {
    expect(reducedMeltingPressure(TEGELER_AR, 83.8058)).toBe(68891);
  });

  // CRC Handbook of Chemistry and Physics, 95th ed. (2014), physical constants of inorganic
  // compounds: argon melts at 83.81 K at 101.325 kPa (two decimals printed, ±0.005 K).
  it("argon melts at 83.81 K at 101.325 kPa (CRC Handbook 2014)", () => {
    const meltingK = solveBracketed((t) => reducedMeltingPressure(TEGELER_AR, t) - 101325, 83.8058, 84);
    expectClose(meltingK, 83.81, { abs: 0.006 });
  });

  it("rises monotonically with temperature", () => {
    let previous = 0;
    for (let temperatureK = 83.8058; temperatureK <= 254; temperatureK += 2) {
      const pressurePa = reducedMeltingPressure(TEGELER_AR, temperatureK);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
  });
});

describe("Simon–Glatzel equation", () => {
  // Coefficients invented for a round trip only (no physical substance).
  const k = { T0: 100, p0: 1000, a: 2e8, c: 1.7 };
  it("temperature is the exact inverse of pressure", () => {
    for (const temperatureK of [100, 120, 180, 300]) {
      expectClose(simonGlatzelTemperature(k, simonGlatzelPressure(k, temperatureK)), temperatureK, { rel: 1e-14 });
    }
    expect(simonGlatzelPressure(k, 100)).toBe(1000);
  });
});
