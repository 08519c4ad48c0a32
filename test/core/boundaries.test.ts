import { describe, expect, it } from "vitest";
import { boundarySlope, crossingsAlongPath, marginToBoundary, parseBoundary } from "../../core/boundaries";
import { PhaseError } from "../../core/errors";
import { findSubstance } from "../../core/substances/registry";
import { expectClose } from "../helpers/expect-close";

const water = findSubstance("water");

describe("slopes of water's boundaries agree with Clapeyron, dp/dT = L / (T Δv)", () => {
  it("ice Ih melting curve at the triple point: negative (ice is less dense than the liquid)", () => {
    // Inputs: melting enthalpy at the triple point 333.4449 kJ/kg (IAPWS-95 liquid minus IAPWS
    // R10-06(2009) ice, both at 273.16 K); liquid density 999.789 kg/m3 (IAPWS SR1-86(1992) check
    // value at 273.16 K); ice density 916.7094922 kg/m3 (IAPWS R10-06(2009) Table 6).
    const deltaV = 1 / 999.789 - 1 / 916.7094922;
    const clapeyron = 333444.9 / (273.16 * deltaV);
    const slope = boundarySlope(water, "melting", 273.16);
    expect(slope).toBeLessThan(0);
    // SR1-86's density is printed to 6 digits and Δv is a 9 % difference: about 1e-5 relative.
    expectClose(slope, clapeyron, { rel: 2e-4 });
  });

  it("boiling curve at the normal boiling point matches the SR1-86 check value", () => {
    // IAPWS SR1-86(1992) check values: dp_σ/dT = 0.003616 MPa/K at 373.1243 K (4 digits printed).
    expectClose(boundarySlope(water, "boiling", 373.1243), 3616, { abs: 0.5 });
  });

  it("sublimation curve at the triple point", () => {
    // Inputs: sublimation enthalpy at the triple point 2834.359 kJ/kg (IAPWS-95 vapour minus IAPWS
    // R10-06(2009) ice); vapour density 0.00485426 kg/m3 (IAPWS SR1-86(1992) check value);
    // ice density 916.7094922 kg/m3 (R10-06(2009) Table 6).
    const deltaV = 1 / 0.00485426 - 1 / 916.7094922;
    expectClose(boundarySlope(water, "sublimation", 273.16 - 1e-9), 2834359 / (273.16 * deltaV), { rel: 1e-4 });
  });

  it("high-pressure ices melt at higher temperature under higher pressure (common practice)", () => {
    for (const temperatureK of [253, 265, 300, 500]) {
      // Up to 273.16 K ice Ih is the lowest-pressure branch; 300 K and 500 K are ices VI and VII.
      const slope = boundarySlope(water, "melting", temperatureK);
      if (temperatureK < 273.16) expect(slope).toBeLessThan(0);
      else expect(slope).toBeGreaterThan(0);
    }
  });

  it("reads boundary names and refuses others", () => {
    expect(parseBoundary("Boiling")).toBe("boiling");
    expect(parseBoundary("fusion")).toBe("melting");
    expect(parseBoundary("deposition")).toBe("sublimation");
    expect(() => parseBoundary("condensing point")).toThrow(PhaseError);
  });

  it("has no boiling slope above the critical point", () => {
    expect(() => boundarySlope(water, "boiling", 700)).toThrow(/critical point/);
  });
});

describe("margin to the nearest boundary on the isobar", () => {
  it("measures from the melting or the boiling temperature, whichever is nearer", () => {
    // R10-06(2009) Table 6: the normal melting point is 273.152519 K at 101 325 Pa.
    expectClose(marginToBoundary(water, 293.15, 101325).marginK, 293.15 - 273.152519, { abs: 1e-6 });
    // IF97 Table 36: T_s(0.1 MPa) = 372.755919 K.
    const nearBoiling = marginToBoundary(water, 370, 1e5);
    expect(nearBoiling.boundary).toBe("boiling");
    expectClose(nearBoiling.marginK, 370 - 372.755919, { abs: 1e-6 });
  });

  it("uses the sublimation curve below the triple-point pressure", () => {
    // R14-08(2011) check value: p_sub(230 K) = 8.94735e-6 MPa.
    const result = marginToBoundary(water, 235, 8.94735);
    expect(result.boundary).toBe("sublimation");
    expectClose(result.marginK, 5, { abs: 1e-5 });
  });
});

describe("crossings along a straight path", () => {
  it("meets melting then boiling on the 0.1 MPa isobar", () => {
    const found = crossingsAlongPath(water, 250, 1e5, 450, 1e5);
    expect(found.map((c) => c.change)).toEqual(["melt", "boil"]);
    // IF97 Table 36: T_s(0.1 MPa) = 372.755919 K (9 digits).
    expectClose(found[1]!.temperatureK, 372.755919, { abs: 5e-7 });
    expect(found[0]!.temperatureK).toBeGreaterThan(273.15);
    expect(found[0]!.temperatureK).toBeLessThan(273.16);
  });

  it("names the reverse changes when cooling", () => {
    expect(crossingsAlongPath(water, 450, 1e5, 250, 1e5).map((c) => c.change)).toEqual(["condense", "freeze"]);
    expect(crossingsAlongPath(water, 280, 100, 220, 100).map((c) => c.change)).toEqual(["deposit"]);
    expect(crossingsAlongPath(water, 220, 100, 280, 100).map((c) => c.change)).toEqual(["sublime"]);
  });

  it("marks the critical lines without calling them phase changes", () => {
    const found = crossingsAlongPath(water, 600, 10e6, 700, 30e6);
    const words = found.map((c) => c.change);
    expect(words.some((w) => w.includes("no phase change"))).toBe(true);
    for (const crossing of found) {
      if (crossing.change.includes("critical pressure")) expectClose(crossing.pressurePa, 22.064e6, { rel: 1e-9 });
      if (crossing.change.includes("critical temperature")) expectClose(crossing.temperatureK, 647.096, { rel: 1e-9 });
    }
  });

  it("returns nothing when the path stays in one phase", () => {
    expect(crossingsAlongPath(water, 300, 1e5, 350, 5e5)).toEqual([]);
  });
});
