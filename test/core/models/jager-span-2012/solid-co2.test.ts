/**
 * Jäger–Span (2012) Gibbs-energy equation of state for solid CO2, tested through the module's
 * public exports.
 */
import { describe, expect, it } from "vitest";
import { solidCO2 } from "../../../../core/models/jager-span-2012/solid-co2";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

// Check values: A. Jäger, R. Span, J. Chem. Eng. Data 57, 590 (2012), Table 5, ten significant
// digits as printed: g in J/mol, v in m³/mol, s and c_p in J/(mol·K), alpha_p in 1/K, kappa_T in
// 1/Pa. Tolerance: half a unit in the last printed digit.
const TABLE_5 = [
  {
    temperatureK: 216.592,
    pressurePa: 0.51795e6,
    g: "-1447.007522",
    v: "2.848595255e-5",
    s: "-18.03247012",
    cp: "59.13420271",
    alpha: "8.127788321e-4",
    kappa: "2.813585169e-10",
  },
  { temperatureK: 100, pressurePa: 100e6, g: "-2961.795962", v: "2.614596591e-5", s: "-56.23154438", cp: "39.11045710" },
] as const;

function expectPrinted(actual: number, text: string): void {
  const check = printed(text);
  expectClose(actual, check.value, { abs: check.halfUnit });
}

describe("JS12 solid CO2: Table 5 check values", () => {
  it.each(TABLE_5)("at $temperatureK K and $pressurePa Pa, every printed digit", (row) => {
    const solid = solidCO2(row.temperatureK, row.pressurePa);
    expectPrinted(solid.gibbs, row.g);
    expectPrinted(solid.volume, row.v);
    expectPrinted(solid.entropy, row.s);
    expectPrinted(solid.isobaricHeatCapacity, row.cp);
    if ("alpha" in row) {
      expectPrinted(solid.thermalExpansion, row.alpha);
      expectPrinted(solid.isothermalCompressibility, row.kappa);
    }
  });
});

describe("JS12 solid CO2: laws", () => {
  it("h = g + T s, and the enthalpy derivative at constant pressure is c_p", () => {
    for (const [temperatureK, pressurePa] of [
      [120, 1e5],
      [194.686, 101325],
      [216.592, 0.51795e6],
      [300, 500e6],
    ] as const) {
      const solid = solidCO2(temperatureK, pressurePa);
      expectClose(solid.enthalpy, solid.gibbs + temperatureK * solid.entropy, { rel: 1e-14, abs: 1e-9 });
      const step = 1e-3;
      const derivative = (solidCO2(temperatureK + step, pressurePa).enthalpy - solidCO2(temperatureK - step, pressurePa).enthalpy) / (2 * step);
      expectClose(solid.isobaricHeatCapacity, derivative, { rel: 1e-6 });
    }
  });

  // Dry ice is about 1.56 g/cm³ near its sublimation point at 1 atm (common practice); here
  // 0.0440098 kg/mol over the molar volume.
  it("is about 1.56 g/cm³ at 194.7 K and 1 atm (common practice)", () => {
    expectClose(0.0440098 / solidCO2(194.686, 101325).volume, 1560, { rel: 0.02 });
  });

  it("heat capacity rises with temperature along 1 atm from 100 K to 194.7 K", () => {
    let previous = 0;
    for (let temperatureK = 100; temperatureK <= 194.7; temperatureK += 1) {
      const cp = solidCO2(temperatureK, 101325).isobaricHeatCapacity;
      expect(cp).toBeGreaterThan(previous);
      previous = cp;
    }
  });
});
