/**
 * The pane's data rows: every number is core's constant converted by core to the display units
 * and printed by core's formatNumber; spot checks against the published values converted by
 * definitions written out here.
 */
import { describe, expect, it } from "vitest";
import { CONSTANT_CATALOG, constantsOf } from "../../core/constants";
import { formatNumber } from "../../core/errors";
import { citation } from "../../core/sources/bibliography";
import { SUBSTANCES, findSubstance } from "../../core/substances/registry";
import { fromSI, unitSymbol } from "../../core/units/units";
import { DISPLAY_UNITS, displayUnitsById } from "../../taskpane/data/display-units";
import { constantRows, curveRows, referenceData } from "../../taskpane/data/rows";
import { expectClose } from "../helpers/expect-close";

const water = findSubstance("water");

function rowFor(unitsId: string, symbol: string) {
  const row = constantRows(water, displayUnitsById(unitsId).system).find((r) => r.symbol === symbol);
  if (!row) throw new Error(`no row ${symbol}`);
  return row;
}

describe("constant rows come from core", () => {
  for (const substance of SUBSTANCES) {
    for (const units of DISPLAY_UNITS) {
      it(`${substance.name} in ${units.label}: value = core constant in display units`, () => {
        const rows = constantRows(substance, units.system);
        const constants = constantsOf(substance);
        expect(rows.map((r) => r.key)).toEqual(constants.map((c) => c.entry.key));
        rows.forEach((row, i) => {
          const constant = constants[i]!;
          // Specific energies (enthalpies of fusion and vaporization) are molar in the molar display units.
          const expected = fromSI(units.system, constant.dimension, constant.value, substance.constants.molarMass?.value);
          expect(row.quantity.value).toBe(expected);
          expect(row.quantity.text).toBe(formatNumber(expected));
          expect(row.quantity.unit).toBe(unitSymbol(units.system, constant.dimension));
          expect(row.quantity.si).toBe(constant.value);
          expect(row.label).toBe(constant.entry.label);
          expect(row.symbol).toBe(constant.entry.symbol);
          expect(row.note).toBe(constant.note);
          expect(row.source).toEqual(citation(constant.source));
        });
      });
    }
  }

  it("follows the catalogue order", () => {
    const order = CONSTANT_CATALOG.map((entry) => entry.key);
    const keys = constantRows(water, displayUnitsById("si").system).map((r) => r.key);
    expect(keys).toEqual(order.filter((key) => keys.includes(key)));
  });
});

describe("water constants against the published values", () => {
  // IAPWS R7-97(2012) (IF97): Tc = 647.096 K, Eq. (2); pc = 22.064 MPa, Eq. (3);
  // Tt = 273.16 K and pt = 611.657 Pa, Eq. (9); rhoc = 322 kg/m3, Eq. (4).
  // IAPWS R6-95(2018): M = 18.015268 g/mol.
  // Conversions by definition: 0 °C = 273.15 K; T/°F = 1.8 T/K − 459.67; 1 bar = 1e5 Pa;
  // 1 psi = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)²; 1 lb/ft3 = 0.45359237 kg / 0.3048³ m³
  // (NIST SP 811 (2008) App. B, exact).
  const PSI_PA = (0.45359237 * 9.80665) / 0.0254 ** 2;
  const LB_FT3 = 0.45359237 / 0.3048 ** 3;

  it("SI shows the published numbers as printed", () => {
    expect(rowFor("si", "Tc").quantity.text).toBe("647.096");
    expect(rowFor("si", "Pc").quantity.text).toBe("22064000");
    expect(rowFor("si", "Tt").quantity.text).toBe("273.16");
    expect(rowFor("si", "Pt").quantity.text).toBe("611.657");
    expect(rowFor("si", "rhoc").quantity.text).toBe("322");
    expect(rowFor("si", "Tc").quantity.unit).toBe("K");
    expect(rowFor("si", "Pc").quantity.unit).toBe("Pa");
    expect(rowFor("si", "M").quantity.unit).toBe("kg/mol");
    expectClose(rowFor("si", "M").quantity.value, 0.018015268, { rel: 1e-15 });
  });

  // Regression pane-molar-specific (found and fixed 2026-12-02): once the constants gained
  // enthalpies of fusion and vaporization (J/kg), the molar display units ("C bar g mol",
  // "F psi lb lbmol …") threw "a molar unit needs a substance with a known molar mass" and the
  // pane showed no reference data in °C or °F. Rows now convert with the substance's molar mass.
  it("shows the enthalpies of fusion and vaporization per mole in the molar display units", () => {
    const hfus = rowFor("c-bar", "Hfus");
    const molarMass = water.constants.molarMass!.value;
    expect(hfus.quantity.unit).toBe("J/mol");
    expect(hfus.quantity.value).toBe(fromSI(displayUnitsById("c-bar").system, "specificEnergy", hfus.quantity.si, molarMass));
    expectClose(hfus.quantity.value, hfus.quantity.si * molarMass, { rel: 1e-14 });
    expect(rowFor("f-psi", "Hvap").quantity.unit).toBe("J/lbmol");
  });

  it("°C and bar", () => {
    expect(rowFor("c-bar", "Tc").quantity.text).toBe("373.946");
    expect(rowFor("c-bar", "Pc").quantity.text).toBe("220.64");
    expect(rowFor("c-bar", "Tt").quantity.text).toBe("0.01");
    expect(rowFor("c-bar", "Pt").quantity.text).toBe("0.00611657");
    expect(rowFor("c-bar", "Tc").quantity.unit).toBe("°C");
    expect(rowFor("c-bar", "Pc").quantity.unit).toBe("bar");
    expect(rowFor("c-bar", "M").quantity.unit).toBe("g/mol");
    expectClose(rowFor("c-bar", "M").quantity.value, 18.015268, { rel: 1e-15 });
  });

  it("°F and psi", () => {
    expectClose(rowFor("f-psi", "Tc").quantity.value, 647.096 * 1.8 - 459.67, { rel: 1e-14 });
    expectClose(rowFor("f-psi", "Tt").quantity.value, 273.16 * 1.8 - 459.67, { rel: 1e-12 });
    expectClose(rowFor("f-psi", "Pc").quantity.value, 22.064e6 / PSI_PA, { rel: 1e-14 });
    expectClose(rowFor("f-psi", "Pt").quantity.value, 611.657 / PSI_PA, { rel: 1e-14 });
    expectClose(rowFor("f-psi", "rhoc").quantity.value, 322 / LB_FT3, { rel: 1e-14 });
    expectClose(rowFor("f-psi", "M").quantity.value, 18.015268, { rel: 1e-14 });
    // NIST SP 811 App. B prints 1 psi = 6.894 757 E+03 Pa (from memory): Pc ≈ 3200.11 psi as shown.
    expect(rowFor("f-psi", "Pc").quantity.text).toBe("3200.11");
    expect(rowFor("f-psi", "Tc").quantity.text).toBe("705.103");
    expect(rowFor("f-psi", "Tc").quantity.unit).toBe("°F");
    expect(rowFor("f-psi", "Pc").quantity.unit).toBe("psi");
    expect(rowFor("f-psi", "rhoc").quantity.unit).toBe("lb/ft3");
    expect(rowFor("f-psi", "M").quantity.unit).toBe("lb/lbmol");
  });
});

describe("curve rows", () => {
  it("lists boiling, sublimation and every melting branch from the substance definition", () => {
    const rows = curveRows(water, displayUnitsById("si").system);
    const { boiling, sublimation, melting } = water.curves;
    const branches = [boiling, ...(sublimation ? [sublimation] : []), ...melting];
    expect(rows.map((r) => r.key)).toEqual(branches.map((b) => b.model.id));
    expect(rows.map((r) => r.title)).toEqual([
      "boiling curve",
      "ice Ih sublimation curve",
      "ice Ih melting curve",
      "ice III melting curve",
      "ice V melting curve",
      "ice VI melting curve",
      "ice VII melting curve",
    ]);
    rows.forEach((row, i) => {
      const model = branches[i]!.model;
      expect(row.modelName).toBe(model.name);
      expect(row.validity).toBe(model.validity);
      expect(row.uncertainty).toBe(model.uncertainty);
      expect(row.source).toEqual(citation(model.source));
      expect(row.validity.length).toBeGreaterThan(0);
      expect(row.uncertainty.length).toBeGreaterThan(0);
    });
  });

  it("gives each melting branch the temperature range between its triple points", () => {
    // IAPWS R14-08(2011): the melting equations run between the triple points
    // Ih–III–liquid 251.165 K, III–V–liquid 256.164 K, V–VI–liquid 273.31 K,
    // VI–VII–liquid 355 K, and the ice VII limit 715 K; ice Ih up to 273.16 K (IF97 Eq. (9)).
    const rows = curveRows(water, displayUnitsById("si").system).filter((r) => r.title.endsWith("melting curve"));
    expect(rows.map((r) => [r.temperatureRange[0].text, r.temperatureRange[1].text])).toEqual([
      ["251.165", "273.16"],
      ["251.165", "256.164"],
      ["256.164", "273.31"],
      ["273.31", "355"],
      ["355", "715"],
    ]);
  });

  it("converts the ranges to the display units", () => {
    const rows = curveRows(water, displayUnitsById("c-bar").system);
    const boiling = rows[0]!;
    // IF97 Eqs. (2), (3), (9), in °C and bar by definition.
    expect(boiling.temperatureRange.map((q) => q.text)).toEqual(["0.01", "373.946"]);
    expect(boiling.pressureRange.map((q) => q.text)).toEqual(["0.00611657", "220.64"]);
    expect(boiling.temperatureRange[0].unit).toBe("°C");
    expect(boiling.pressureRange[0].unit).toBe("bar");
    for (const row of rows) {
      expect(row.pressureRange[0].value).toBeLessThan(row.pressureRange[1].value);
      expect(row.temperatureRange[0].value).toBeLessThan(row.temperatureRange[1].value);
    }
  });
});

describe("reference data", () => {
  it("lists each cited publication once, with the refrigerant-number standard for R-718", () => {
    const data = referenceData(water, displayUnitsById("si").system);
    const ids = data.sources.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const row of [...data.constants, ...data.curves, data.phaseMap]) {
      expect(ids).toContain(row.source.id);
    }
    expect(ids).toContain("ashrae-34");
    expect(data.summary).toMatchObject({ name: "water", formula: "H2O", cas: "7732-18-5", refrigerant: "R-718" });
  });
});
