/**
 * Water's enthalpy model (core/substances/water-enthalpy.ts): the release check values reached
 * through the model's own choice of equation, continuity where IF97's regions meet, the ranges it
 * covers and the errors it gives outside them. Comparisons with python3-iapws, python3-gsw and
 * IAPWS-95 are in test/reference/enthalpy-fixtures.test.ts.
 */
import { describe, expect, it } from "vitest";
import { NoSuchStateError, OutOfRangeError } from "../../../core/errors";
import { b23Pressure } from "../../../core/models/iapws-if97/b23";
import { specificEnthalpy } from "../../../core/path";
import { phaseAt } from "../../../core/phase";
import { waterEnthalpy } from "../../../core/substances/water-enthalpy";
import { water } from "../../../core/substances/water";
import { expectClose } from "../../helpers/expect-close";
import { printed } from "../printed";

/** A printed kJ/kg value as J/kg, with its half-unit tolerance. */
function kJ(text: string): { value: number; halfUnit: number } {
  const value = printed(text);
  return { value: value.value * 1e3, halfUnit: value.halfUnit * 1e3 };
}

describe("release check values through the enthalpy model's choice of equation", () => {
  // IAPWS R7-97(2012) (IF97) Table 5, region 1, h printed to 9 significant digits.
  it.each([
    [300, 3e6, "0.115331273e3"],
    [300, 80e6, "0.184142828e3"],
    [500, 3e6, "0.975542239e3"],
  ] as const)("IF97 Table 5: liquid at %s K and %s Pa", (t, p, text) => {
    const h = kJ(text);
    expect(phaseAt(water, t, p).phase).toBe("liquid");
    expectClose(specificEnthalpy(water, t, p), h.value, { abs: h.halfUnit });
  });

  // IF97 Table 15, region 2, h printed to 9 significant digits. (700 K, 30 MPa) is supercritical
  // fluid below the B23 pressure (30.5 MPa at 700 K), so region 2 serves it.
  it.each([
    [300, 3.5e3, "0.254991145e4"],
    [700, 3.5e3, "0.333568375e4"],
    [700, 30e6, "0.263149474e4"],
  ] as const)("IF97 Table 15: vapour or fluid at %s K and %s Pa", (t, p, text) => {
    const h = kJ(text);
    expect(p).toBeLessThan(t > 623.15 ? b23Pressure(t) : Infinity);
    expectClose(specificEnthalpy(water, t, p), h.value, { abs: h.halfUnit });
  });

  // IF97 Table 33, region 3, is printed at (T, rho) with p(rho, T) to 9 digits; the model reaches
  // the state from (T, p), so the allowance adds |(dh/dp)_T| times half a unit of the printed p
  // (measured here by a central difference: up to 0.3 m3/kg next to the critical point).
  it.each([
    [650, "0.255837018e2", "0.186343019e4"],
    [650, "0.222930643e2", "0.237512401e4"],
    [750, "0.783095639e2", "0.225868845e4"],
  ] as const)("IF97 Table 33: near-critical fluid at %s K and %s MPa", (t, pText, hText) => {
    const pPrinted = printed(pText);
    const p = pPrinted.value * 1e6;
    const dp = pPrinted.halfUnit * 1e6;
    const h = kJ(hText);
    const dhdp = (specificEnthalpy(water, t, p + 1) - specificEnthalpy(water, t, p - 1)) / 2;
    expectClose(specificEnthalpy(water, t, p), h.value, { abs: h.halfUnit + Math.abs(dhdp) * dp });
  });

  // IF97 Table 42, region 5, h printed to 9 significant digits.
  it.each([
    [1500, 0.5e6, "0.521976855e4"],
    [1500, 30e6, "0.516723514e4"],
    [2000, 30e6, "0.657122604e4"],
  ] as const)("IF97 Table 42: gas or supercritical fluid at %s K and %s Pa", (t, p, text) => {
    const h = kJ(text);
    expectClose(specificEnthalpy(water, t, p), h.value, { abs: h.halfUnit });
  });

  // IAPWS R10-06(2009) Table 6, h printed to 12 significant digits. The first two states lie on
  // the melting curve (the first is the triple point), so the ice side is asked for directly.
  it.each([
    [273.16, 611.657, "-0.333444253966e6"],
    [273.152519, 101325, "-0.333354873637e6"],
    [100, 100e6, "-0.483491635676e6"],
  ] as const)("R10-06 Table 6: ice Ih at %s K and %s Pa", (t, p, text) => {
    const h = printed(text);
    expectClose(waterEnthalpy.enthalpy("solid", t, p, "ice Ih"), h.value, { abs: h.halfUnit });
  });

  // IF97 Eq. (10): h' = 0.611783 J/kg at the triple point, the IAPWS zero (u' = s' = 0) seen
  // through region 1; R10-06 shares that zero, so ice sits 333.4 kJ/kg below.
  it("liquid at the triple point is on the IAPWS zero", () => {
    expectClose(waterEnthalpy.enthalpy("liquid", 273.16, 611.657, ""), 0.611783, { abs: 5e-7 });
  });
});

/** Reads the Table 43 figures the fluid ModelInfo states: "… ≤ A kJ/kg regions 1/3, B kJ/kg 2/3, C kJ/kg 2/5". */
function statedBoundaryTolerances(): { r13: number; r23: number; r25: number } {
  const info = waterEnthalpy.models.find((m) => m.id === "iapws-if97-fluid")!;
  const match = /\|Δh\| ≤ ([\d.]+) kJ\/kg regions 1\/3, ([\d.]+) kJ\/kg 2\/3, ([\d.]+) kJ\/kg 2\/5/.exec(info.uncertainty);
  expect(match, `cannot read the Table 43 figures from: ${info.uncertainty}`).not.toBeNull();
  return { r13: Number(match![1]) * 1e3, r23: Number(match![2]) * 1e3, r25: Number(match![3]) * 1e3 };
}

describe("enthalpy across IF97's region boundaries", () => {
  // IF97 Table 43 gives the largest enthalpy mismatch of neighbouring basic equations on their
  // common boundary: 0.031 kJ/kg (1/3), 0.134 kJ/kg (2/3), 0.096 kJ/kg (2/5). The model's ModelInfo
  // repeats them; the test reads them from there and checks specificEnthalpy a relative 1e-12
  // either side of each boundary (the sensible heat over that gap is below 1e-5 J/kg).
  // Measured: 30.36 J/kg (1/3, at 42.6 MPa), 133.83 J/kg (2/3, at 786 K), 94.13 J/kg (2/5, 11.4 MPa).
  const stated = statedBoundaryTolerances();
  const across = (below: [number, number], above: [number, number]): number =>
    specificEnthalpy(water, ...above) - specificEnthalpy(water, ...below);

  it("the stated figures are IF97 Table 43's", () => {
    expect(stated).toEqual({ r13: 31, r23: 134, r25: 96 });
  });

  it("regions 1 and 3 on the 623.15 K isotherm, p_s(623.15 K) to 100 MPa", () => {
    let worst = 0;
    for (let i = 0; i <= 84; i++) {
      const p = Math.min(16.6e6 + i * 1e6, 100e6);
      worst = Math.max(worst, Math.abs(across([623.15, p], [623.15 * (1 + 1e-12), p])));
    }
    expect(worst).toBeLessThanOrEqual(stated.r13);
    expect(worst).toBeGreaterThan(30);
  });

  it("regions 2 and 3 along the B23 line, 624 K to 862 K", () => {
    let worst = 0;
    for (let t = 624; t <= 862; t += 1) {
      const p = b23Pressure(t);
      worst = Math.max(worst, Math.abs(across([t, p * (1 - 1e-12)], [t, p * (1 + 1e-12)])));
    }
    expect(worst).toBeLessThanOrEqual(stated.r23);
    expect(worst).toBeGreaterThan(133);
  });

  it("regions 2 and 5 on the 1073.15 K isotherm, 1 Pa to 50 MPa", () => {
    let worst = 0;
    for (let i = 0; i <= 60; i++) {
      const p = 10 ** ((i * Math.log10(50e6)) / 60);
      worst = Math.max(worst, Math.abs(across([1073.15, p], [1073.15 * (1 + 1e-12), p])));
    }
    expect(worst).toBeLessThanOrEqual(stated.r25);
    expect(worst).toBeGreaterThan(94);
  });
});

describe("what the model covers and what it refuses", () => {
  it("names its three models with their sources", () => {
    expect(waterEnthalpy.models.map((m) => [m.id, m.source, m.grade])).toEqual([
      ["iapws-if97-fluid", "iapws-if97", "reference"],
      ["iapws-if97-below-273", "iapws-if97", "reference"],
      ["iapws-r10-06-ice-ih", "iapws-r10-06", "reference"],
    ]);
    expect(water.enthalpy).toBe(waterEnthalpy);
  });

  it("spans 1 K to 2273.15 K up to 50 MPa and to 1073.15 K above (IF97 Sec. 4)", () => {
    expect(waterEnthalpy.temperatureLimits(101325)).toEqual([1, 2273.15]);
    expect(waterEnthalpy.temperatureLimits(50e6)).toEqual([1, 2273.15]);
    expect(waterEnthalpy.temperatureLimits(60e6)).toEqual([1, 1073.15]);
  });

  it("has no enthalpy for ices III, V, VI and VII (no IAPWS Gibbs function): NoSuchStateError", () => {
    for (const solid of ["ice III", "ice V", "ice VI", "ice VII"]) {
      expect(() => waterEnthalpy.enthalpy("solid", 250, 300e6, solid)).toThrow(NoSuchStateError);
      expect(() => waterEnthalpy.enthalpy("solid", 250, 300e6, solid)).toThrow(
        new RegExp(`no enthalpy model for ${solid}: IAPWS publishes a Gibbs function only for ice Ih`),
      );
    }
  });

  it("keeps ice Ih to R10-06's range: up to 273.16 K and 208.566 MPa", () => {
    expect(() => waterEnthalpy.enthalpy("solid", 273.17, 1e5, "ice Ih")).toThrow(OutOfRangeError);
    expect(() => waterEnthalpy.enthalpy("solid", 240, 209e6, "ice Ih")).toThrow(/R10-06/);
    expect(Number.isFinite(waterEnthalpy.enthalpy("solid", 240, 208e6, "ice Ih"))).toBe(true);
    expect(Number.isFinite(waterEnthalpy.enthalpy("solid", 5, 1, "ice Ih"))).toBe(true);
  });

  it("keeps liquid to 100 MPa and above 251.165 K; vapour below 273.15 K to 200 K", () => {
    expect(() => waterEnthalpy.enthalpy("liquid", 300, 100.5e6, "")).toThrow(/IAPWS-IF97 range: liquid is covered up to 100 MPa/);
    expect(() => waterEnthalpy.enthalpy("liquid", 251, 100e6, "")).toThrow(OutOfRangeError);
    expect(Number.isFinite(waterEnthalpy.enthalpy("liquid", 265, 100e6, ""))).toBe(true);
    expect(Number.isFinite(waterEnthalpy.enthalpy("vapor", 200, 0.1, ""))).toBe(true);
    expect(() => waterEnthalpy.enthalpy("vapor", 199.99, 0.1, "")).toThrow(/vapour is covered down to 200 K/);
  });

  it("keeps fluid to IF97's range: 2273.15 K, and 50 MPa above 1073.15 K", () => {
    expect(Number.isFinite(waterEnthalpy.enthalpy("vapor", 2273.15, 50e6, ""))).toBe(true);
    expect(() => waterEnthalpy.enthalpy("vapor", 2273.2, 1e5, "")).toThrow(OutOfRangeError);
    expect(() => waterEnthalpy.enthalpy("vapor", 1500, 60e6, "")).toThrow(/above 1073\.15 K up to 50 MPa/);
    expect(() => waterEnthalpy.enthalpy("vapor", 900, 101e6, "")).toThrow(/up to 100 MPa/);
  });

  it("says in its model text that the extrapolations below 273.15 K are approximations checked against IAPWS-95", () => {
    const info = waterEnthalpy.models.find((m) => m.id === "iapws-if97-below-273")!;
    expect(info.name).toMatch(/beyond IF97's stated range/);
    expect(info.uncertainty).toMatch(/^approximation, checked against IAPWS-95/);
  });
});
