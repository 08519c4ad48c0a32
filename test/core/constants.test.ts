/**
 * Named constants of water, looked up by symbol or name, against the publications that define
 * them.
 */
import { describe, expect, it } from "vitest";
import { CONSTANT_CATALOG, constantOf, constantsOf } from "../../core/constants";
import { PhaseError } from "../../core/errors";
import { citation } from "../../core/sources/bibliography";
import { water } from "../../core/substances/water";
import { fromSI, parseUnits } from "../../core/units/units";
import { expectClose } from "../helpers/expect-close";

describe("water constants against their sources", () => {
  // Exact by definition in the cited equations: IAPWS R7-97(2012) (IF97) Eqs. (2), (3), (4), (9);
  // the molar mass is the IAPWS-95 release's 18.015268 g/mol (IAPWS R6-95(2018)).
  it.each([
    ["Tt", 273.16, "iapws-if97"],
    ["Pt", 611.657, "iapws-if97"],
    ["Tc", 647.096, "iapws-if97"],
    ["Pc", 22.064e6, "iapws-if97"],
    ["rhoc", 322, "iapws-if97"],
    ["M", 0.018015268, "iapws-95"],
  ] as const)("%s = %s (SI), cited to %s", (symbol, value, source) => {
    const constant = constantOf(water, symbol);
    expect(constant.value).toBe(value);
    expect(constant.source).toBe(source);
    expect(constant.entry.symbol).toBe(symbol);
  });

  // Normal boiling point at 101 325 Pa from IF97 Eq. (31). Second source, from memory: 373.1243 K
  // (99.9743 °C), the normal boiling temperature of water on ITS-90; four decimals printed.
  it("Tb is the IF97 boiling temperature at 101 325 Pa, 373.1243 K", () => {
    const constant = constantOf(water, "Tb");
    expectClose(constant.value, 373.1243, { abs: 5e-5 });
    expect(constant.source).toBe("iapws-if97");
  });

  // Normal melting point: IAPWS R10-06(2009), Table 6, the state at 101 325 Pa, T = 273.152519 K
  // (six decimals printed).
  it("Tm is the R10-06(2009) Table 6 melting state, 273.152519 K", () => {
    const constant = constantOf(water, "Tm");
    expectClose(constant.value, 273.152519, { abs: 5e-7 });
    expect(constant.source).toBe("iapws-r10-06");
  });

  it("every constant carries a dimension, a note and a citation that exists", () => {
    const all = constantsOf(water);
    // Every catalogue constant except the normal sublimation point: water's triple-point pressure
    // (611.657 Pa) is far below one atmosphere, so at 101.325 kPa ice melts and the liquid boils
    // (common practice).
    expect(all.map((c) => c.entry.symbol)).toEqual(CONSTANT_CATALOG.map((c) => c.symbol).filter((s) => s !== "Tsub"));
    for (const constant of all) {
      expect(constant.dimension).toBe(constant.entry.dimension);
      expect(constant.note.length).toBeGreaterThan(0);
      expect(citation(constant.source).reference.length).toBeGreaterThan(0);
      expect(Number.isFinite(constant.value)).toBe(true);
    }
  });

  it("the triple point reads as 0.01 °C and 0.611657 kPa in engineering units (common practice)", () => {
    const units = parseUnits("C kPa");
    expectClose(fromSI(units, "temperature", constantOf(water, "Tt").value), 0.01, { abs: 1e-12 });
    expectClose(fromSI(units, "pressure", constantOf(water, "Pt").value), 0.611657, { rel: 1e-15 });
  });
});

describe("constant look-up by name", () => {
  it.each([
    ["tc", "Tc"],
    ["critical temperature", "Tc"],
    ["Critical-Temperature", "Tc"],
    ["criticalTemperature", "Tc"],
    ["triple point temperature", "Tt"],
    ["triple-point pressure", "Pt"],
    ["ρc", "rhoc"],
    ["Dc", "rhoc"],
    ["normal boiling point", "Tb"],
    ["NBP", "Tb"],
    ["freezing point", "Tm"],
    ["molecular weight", "M"],
    ["MW", "M"],
  ] as const)("%s finds %s", (typed, symbol) => {
    expect(constantOf(water, typed).entry.symbol).toBe(symbol);
  });

  it("an unknown name is bad input with suggestions and the list of known constants", () => {
    let error: unknown;
    try {
      constantOf(water, "critical temprature");
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(PhaseError);
    const phaseError = error as PhaseError;
    expect(phaseError.kind).toBe("bad-input");
    expect(phaseError.message).toContain('unknown constant "critical temprature"');
    expect(phaseError.message).toContain('Did you mean "critical temperature"');
    for (const entry of CONSTANT_CATALOG) expect(phaseError.message).toContain(`${entry.symbol} (${entry.label})`);
  });
});
