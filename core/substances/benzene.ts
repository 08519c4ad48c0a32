/**
 * Benzene (C6H6), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-of-
 * vaporization equations and saturation table, CRC Handbook (2014) latent heats, Poling et al.
 * (2001) ideal-gas heat capacity. No published melting equation is used: see the phase map.
 * Flammable and carcinogenic: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Benzene at engineering grade. */
export const benzene = engineeringSubstance({
  id: "benzene",
  name: "benzene",
  formula: "C6H6",
  cas: "71-43-2",
  aliases: ["benzol"],
  atoms: { C: 6, H: 6 },
  tripleTemperature: {
    value: 278.7,
    source: "vdi-heat-atlas-2010",
    note: "first row of the saturation table (the triple point); ±0.02 K (CRC Handbook melting point 278.688 K)",
  },
  criticalTemperature: {
    value: 562.01,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.05 K (IUPAC series: 562.05 K)",
  },
  criticalPressure: {
    value: 4.901e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.15 % (IUPAC series: 4.895 MPa)",
  },
  criticalDensity: {
    value: 306,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 353.24,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table (the physical-constants table prints 353.23 K); ±0.03 K",
  },
  normalMeltingPoint: {
    value: 278.688,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 30720,
    temperatureK: 353.24,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 30.72 kJ/mol; ±0.5 % (VDI Heat Atlas 2010 table: 30.768 kJ/mol at 353.3 K)",
  },
  enthalpyOfFusion: {
    value: 9870,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 9.87 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(562.01, 4.901e6, -7.11451, 1.83981, -2.25158, -3.15179),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 278.65,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from the triple point to 525 K (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 562.01, A: 5.01506, B: 10.64512, C: -7.248132, D: 1.081122, E: 7.042247 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.70 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 1.64 % to 0.95 T_c (measured in the tests); ±0.7 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [3.551, -0.006184, 0.00014365, -1.9807e-7, 8.234e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 82.43 J/(mol K) to 0.4 %; about ±1 % over the range",
  },
  hazards: ["highly flammable liquid and vapour", "carcinogen: keep exposure as low as possible"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +0 % to +4 %; saturated-vapour heat capacity down to -10 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
