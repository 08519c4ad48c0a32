/**
 * Carbon monoxide (CO), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014)
 * latent heats, Poling et al. (2001) ideal-gas heat capacity. No published melting equation is
 * used: see the phase map. Toxic gas: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Carbon monoxide at engineering grade. */
export const carbonMonoxide = engineeringSubstance({
  id: "carbon-monoxide",
  name: "carbon monoxide",
  formula: "CO",
  cas: "630-08-0",
  aliases: ["carbonmonoxide"],
  atoms: { C: 1, O: 1 },
  tripleTemperature: {
    value: 68.157,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.01 K",
  },
  criticalTemperature: {
    value: 132.86,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.05 K (Mathews 1972: 132.91 K)",
  },
  criticalPressure: {
    value: 3.498e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.15 % (the Heat Atlas table's critical row: 3.494 MPa)",
  },
  criticalDensity: {
    value: 304,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 81.64,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds; ±0.02 K",
  },
  enthalpyOfVaporization: {
    value: 6040,
    temperatureK: 81.64,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 6.04 kJ/mol at 81.65 K; ±0.6 % (VDI Heat Atlas 2010 table: 6.012 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 833,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 0.833 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(132.86, 3.498e6, -6.19574, 1.32502, -0.95226, -1.98513),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 68.15,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 81.66 K to 125 K (checked in the tests); +1 % against the measured triple-point pressure",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 132.86, A: 5.36544, B: 4.61398, C: -1.500151, D: -2.362494, E: 7.223824 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.47 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.49 % to 0.95 T_c (measured in the tests); ±0.6 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [3.912, -0.003913, 0.00001182, -0.000000013, 5.15e-12], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "against NIST-JANAF (1998): +3.6 % at 100 K, −0.3 % at 298.15 K, −0.5 % at 1000 K",
  },
  hazards: ["toxic: binds to haemoglobin; colourless and odourless", "flammable"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +3 % to +4 %; saturated-vapour heat capacity down to -17 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
