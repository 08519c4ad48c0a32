import { describe, expect, it } from "vitest";
import { findSubstance } from "../../core/substances/registry";
import { parseUnits } from "../../core/units/units";
import { constantRows } from "../../taskpane/data/rows";
import { constantWithCitation, resolveSubstance, searchNames } from "../../taskpane/data/substance-search";

describe("substance search in the pane", () => {
  it("finds a substance by name, formula, CAS number or refrigerant number (ANSI/ASHRAE 34)", () => {
    for (const typed of ["Water", "h2o", "7732-18-5", "R-718", "R718"]) expect(resolveSubstance(typed)).toEqual({ id: "water" });
    for (const typed of ["carbon dioxide", "CO2", "124-38-9", "R-744", "dry ice"]) {
      expect(resolveSubstance(typed)).toEqual({ id: findSubstance("CO2").id });
    }
  });

  it("answers an unknown name with the nearest names, as the cell functions do", () => {
    const result = resolveSubstance("nitrogn");
    expect(result).toHaveProperty("message");
    expect((result as { message: string }).message).toMatch(/unknown substance "nitrogn".*"nitrogen"/);
  });

  it("offers every name once", () => {
    const names = searchNames();
    expect(new Set(names).size).toBe(names.length);
    expect(names).toContain("R-744");
    expect(names).toContain("7732-18-5");
  });
});

describe("copying a constant with its citation", () => {
  it("writes quantity, symbol, value with unit, reference with DOI, and where in the source", () => {
    const water = findSubstance("water");
    const tc = constantRows(water, parseUnits("C bar")).find((row) => row.symbol === "Tc")!;
    const text = constantWithCitation(water.name, tc);
    // IAPWS-IF97 Eq. (2): Tc = 647.096 K = 373.946 °C.
    expect(text).toMatch(/^water, critical temperature \(Tc\) = 373\.946 °C\. Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997/);
    expect(text).toContain("[IAPWS R7-97(2012); doi:10.1115/1.483186]");
    expect(text).toMatch(/IF97 Eq\. \(2\)\.$/);
  });
});
