/**
 * The pane's own path: typed numbers in the display units, read strictly, converted by core,
 * computed by core; every user error comes back as a sentence in the same units, never thrown.
 */
import { describe, expect, it } from "vitest";
import { isobaricPath } from "../../core/path";
import { findSubstance } from "../../core/substances/registry";
import { toSI } from "../../core/units/units";
import { displayUnitsById, DISPLAY_UNITS } from "../../taskpane/data/display-units";
import { chartFromSteps } from "../../taskpane/data/path-chart";
import {
  computePath,
  convertTexts,
  DEFAULT_PATH_SI,
  fieldLabel,
  PATH_FIELDS,
  parseTypedNumber,
  textsFromSI,
  type PathTexts,
} from "../../taskpane/data/path-input";

const water = findSubstance("water");
const cBar = displayUnitsById("c-bar");
const E2E: PathTexts = { mass: "1", start: "-20", end: "120", pressure: "1.01325" };

function failure(texts: PathTexts, units = cBar) {
  const outcome = computePath(water, units.pathSystem, units.pathUnitsText, texts);
  if (outcome.ok) throw new Error("expected an error");
  return outcome;
}

describe("typed numbers", () => {
  it.each([
    ["1.5", 1.5],
    [" -20 ", -20],
    ["\u221220", -20],
    ["+3", 3],
    [".5", 0.5],
    ["1e5", 1e5],
    ["1.01325E0", 1.01325],
    ["101 325", 101325],
  ])("reads %j as %s", (text, value) => {
    expect(parseTypedNumber(text)).toBe(value);
  });

  it.each(["", "  ", "abc", "1,5", "1.2.3", "12 kg", "--1", "Infinity", "1e999", "0x10"])("rejects %j", (text) => {
    expect(parseTypedNumber(text)).toBeNull();
  });
});

describe("path units", () => {
  it("keep the display temperature and pressure, with a mass and an energy unit", () => {
    expect(DISPLAY_UNITS.map((u) => u.pathUnitsText)).toEqual(["K Pa J kg", "C bar kJ kg", "F psi BTU lb"]);
    for (const units of DISPLAY_UNITS) {
      expect(units.pathSystem.temperature).toBe(units.system.temperature);
      expect(units.pathSystem.pressure).toBe(units.system.pressure);
      expect(units.pathSystem.amount).toBeUndefined();
    }
  });

  it("label each field with its unit", () => {
    expect(PATH_FIELDS.map((spec) => fieldLabel(spec, cBar.pathSystem))).toEqual([
      "Mass, kg",
      "Start T1, °C",
      "End T2, °C",
      "Pressure, bar",
    ]);
  });

  it("show the demo path in each unit system and convert typed numbers between them", () => {
    // 0 °C = 273.15 K; °F = 1.8 K − 459.67; 1 bar = 1e5 Pa; 1 lb = 0.45359237 kg (NIST SP 811 App. B, exact).
    expect(textsFromSI(DEFAULT_PATH_SI, displayUnitsById("si").pathSystem)).toEqual({
      mass: "2.5",
      start: "248.15",
      end: "423.15",
      pressure: "300000",
    });
    expect(textsFromSI(DEFAULT_PATH_SI, cBar.pathSystem)).toEqual({ mass: "2.5", start: "-25", end: "150", pressure: "3" });
    const fPsi = displayUnitsById("f-psi").pathSystem;
    expect(convertTexts(E2E, cBar.pathSystem, fPsi)).toEqual({ mass: "2.20462", start: "-4", end: "248", pressure: "14.6959" });
    expect(convertTexts({ ...E2E, mass: "lots" }, cBar.pathSystem, fPsi).mass).toBe("lots");
  });
});

describe("computing the pane's path", () => {
  it("gives core's steps in the display units and the formula that gives the same table", () => {
    const outcome = computePath(water, cBar.pathSystem, cBar.pathUnitsText, E2E);
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    const system = cBar.pathSystem;
    const steps = isobaricPath(water, 1, toSI(system, "temperature", -20), toSI(system, "temperature", 120), 101325);
    expect(outcome.data).toEqual(chartFromSteps(steps, system));
    expect(outcome.formula).toBe('=PHASE.PATH("water", 1, -20, 120, 1.01325, "C bar kJ kg")');
  });

  it("names an empty or unreadable field, with its unit", () => {
    expect(failure({ ...E2E, mass: "" })).toEqual({
      ok: false,
      field: "mass",
      message: "Mass is empty: enter a number in kg (decimal point, e.g. 1.5).",
    });
    expect(failure({ ...E2E, pressure: "1,01325" })).toEqual({
      ok: false,
      field: "pressure",
      message: 'Pressure "1,01325" is not a number: enter a number in bar (decimal point, e.g. 1.5).',
    });
  });

  it("shows core's errors with their quantities in the display units", () => {
    const mass = failure({ ...E2E, mass: "-1" });
    expect(mass.message).toBe("Mass -1 kg is not above zero: enter the mass being heated or cooled.");
    expect(mass.field).toBe("mass");
    const cold = failure({ ...E2E, start: "-300" });
    expect(cold.message).toMatch(/^Start temperature -300 °C is at or below absolute zero/);
    expect(cold.field).toBe("start");
    expect(failure({ ...E2E, end: "-300" }).field).toBe("end");
    const pressure = failure({ ...E2E, pressure: "0" });
    expect(pressure.message).toMatch(/^Pressure 0 bar /);
    expect(pressure.field).toBe("pressure");
    const fahrenheit = failure({ ...E2E, start: "-500" }, displayUnitsById("f-psi"));
    expect(fahrenheit.message).toMatch(/^Start temperature -500 °F /);
  });
});
