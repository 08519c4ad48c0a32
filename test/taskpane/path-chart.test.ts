/**
 * Chart data of a path from core's steps: one segment per step, x = heat added so far, whose
 * running totals are exactly the ones PHASE.PATH prints; flat phase changes, sloped sensible
 * steps; energies checked against IAPWS through Debian's python3-iapws.
 */
import { describe, expect, it } from "vitest";
import { isobaricPath, pathEnergy } from "../../core/path";
import { findSubstance } from "../../core/substances/registry";
import { fromSI, parseUnits } from "../../core/units/units";
import {
  chartFromSteps,
  curveWordOf,
  legendEntries,
  NO_CHANGE_NOTE,
  styleOfPhase,
  totalEnergy,
} from "../../taskpane/data/path-chart";
import { expectClose } from "../helpers/expect-close";

const water = findSubstance("water");
const C_BAR_KJ = parseUnits("C bar kJ kg");
const ATMOSPHERE_PA = 101325; // standard atmosphere, exact by definition

// The path of the browser test: 1 kg of water from -20 °C to 120 °C at 1.01325 bar.
const heating = isobaricPath(water, 1, 253.15, 393.15, ATMOSPHERE_PA);

describe("chart data from core's steps", () => {
  it("has one segment per step, numbered from 1, in the data's units", () => {
    const data = chartFromSteps(heating, C_BAR_KJ);
    expect(data.segments).toHaveLength(heating.length);
    expect(data.segments.map((s) => s.step)).toEqual(heating.map((_, i) => i + 1));
    expect(data.segments.map((s) => s.action)).toEqual(heating.map((s) => s.action));
    expect(data.temperatureUnit).toBe("°C");
    expect(data.energyUnit).toBe("kJ");
    data.segments.forEach((segment, i) => {
      expect(segment.fromT).toBe(fromSI(C_BAR_KJ, "temperature", heating[i]!.fromK));
      expect(segment.toT).toBe(fromSI(C_BAR_KJ, "temperature", heating[i]!.toK));
      expect(segment.energy).toBe(fromSI(C_BAR_KJ, "energy", heating[i]!.energyJ));
    });
  });

  it("puts each step's end at core's running total and its start at the previous one", () => {
    for (const system of [parseUnits(""), C_BAR_KJ, parseUnits("F psi BTU lb")]) {
      const data = chartFromSteps(heating, system);
      let runningJ = 0;
      data.segments.forEach((segment, i) => {
        runningJ += heating[i]!.energyJ;
        expect(segment.endTotal).toBe(fromSI(system, "energy", runningJ));
        expect(segment.startTotal).toBe(i === 0 ? 0 : data.segments[i - 1]!.endTotal);
      });
      // The last point is PATHENERGY: core sums the same steps in the same order.
      expect(totalEnergy(data)).toBe(fromSI(system, "energy", pathEnergy(water, 1, 253.15, 393.15, ATMOSPHERE_PA)));
    }
  });

  it("draws phase changes flat and sensible steps sloped", () => {
    const data = chartFromSteps(heating, C_BAR_KJ);
    expect(data.segments.map((s) => s.kind)).toEqual(["sensible", "latent", "sensible", "latent", "sensible"]);
    for (const segment of data.segments) {
      if (segment.kind === "latent") expect(segment.toT).toBe(segment.fromT);
      else expect(segment.toT).toBeGreaterThan(segment.fromT);
    }
    expect(data.segments.map((s) => s.style)).toEqual(["solid", "change", "liquid", "change", "vapor"]);
    expect(data.segments.map((s) => s.phase)).toEqual(["ice Ih", "phase change", "liquid", "phase change", "vapor"]);
    expect(curveWordOf(data)).toBe("heating");
  });

  it("gives the heat of each step as IAPWS does (python3-iapws)", () => {
    // Debian python3-iapws 1.5.2 at 0.101325 MPa, kJ: iapws._iapws._Ice (IAPWS R10-06) for ice Ih,
    // IAPWS97 (IAPWS R7-97(2012)) for liquid and vapour, at the melting temperature core finds,
    // 273.152519 K, and the IF97 saturation temperature 373.1243 K:
    //   h_ice(273.152519) - h_ice(253.15)              =   40.4683439
    //   h_liquid(273.152519) - h_ice(273.152519)        =  333.426514
    //   h'(373.1243) - h_liquid(273.152519)             =  418.919077
    //   h''(373.1243) - h'(373.1243)                    = 2256.54075
    //   h_vapour(393.15) - h''(373.1243)                =   40.9392676
    // Printed to 9 digits here; the two implementations share the equations, so 1e-7 relative
    // covers the rounding of the melting temperature passed between them.
    const expected = [40.4683439, 333.426514, 418.919077, 2256.54075, 40.9392676];
    const data = chartFromSteps(heating, C_BAR_KJ);
    data.segments.forEach((segment, i) => expectClose(segment.energy, expected[i]!, { rel: 1e-7 }));
    expectClose(totalEnergy(data), expected.reduce((a, b) => a + b, 0), { rel: 1e-7 });
  });

  it("runs a cooling path from 0 down to a negative total", () => {
    const cooling = isobaricPath(water, 1, 393.15, 253.15, ATMOSPHERE_PA);
    const data = chartFromSteps(cooling, C_BAR_KJ);
    expect(curveWordOf(data)).toBe("cooling");
    expect(data.segments.map((s) => s.action)).toEqual(["cool vapor", "condense", "cool liquid", "freeze", "cool ice Ih"]);
    for (const segment of data.segments) expect(segment.endTotal).toBeLessThan(segment.startTotal);
    // Heating then cooling along one path sums to zero (a law of the path, house style).
    expectClose(totalEnergy(data), -totalEnergy(chartFromSteps(heating, C_BAR_KJ)), { rel: 1e-12 });
  });

  it("says there is nothing to draw when T1 equals T2", () => {
    const data = chartFromSteps(isobaricPath(water, 1, 300, 300, ATMOSPHERE_PA), C_BAR_KJ);
    expect(data.segments).toEqual([]);
    expect(data.note).toBe(NO_CHANGE_NOTE);
    expect(totalEnergy(data)).toBe(0);
  });

  it("names the styles it uses in legend order", () => {
    const data = chartFromSteps(heating, C_BAR_KJ);
    expect(legendEntries(data).map((e) => [e.style, e.phases])).toEqual([
      ["solid", ["ice Ih"]],
      ["liquid", ["liquid"]],
      ["vapor", ["vapor"]],
      ["change", ["phase change"]],
    ]);
  });

  it("maps core's phase words to styles", () => {
    expect(styleOfPhase("liquid")).toBe("liquid");
    expect(styleOfPhase("vapor")).toBe("vapor");
    expect(styleOfPhase("gas")).toBe("vapor");
    expect(styleOfPhase("supercritical fluid")).toBe("supercritical");
    expect(styleOfPhase("ice Ih")).toBe("solid");
    expect(styleOfPhase("ice III")).toBe("solid");
  });
});
