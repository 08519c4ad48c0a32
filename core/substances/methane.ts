/**
 * Methane (CH4), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014)
 * latent heats, Poling et al. (2001) ideal-gas heat capacity. No published melting equation is
 * used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Methane at engineering grade. */
export const methane = engineeringSubstance({
  id: "methane",
  name: "methane",
  formula: "CH4",
  cas: "74-82-8",
  refrigerant: "R-50",
  aliases: ["R50"],
  atoms: { C: 1, H: 4 },
  tripleTemperature: {
    value: 90.698,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.005 K (CRC Handbook normal melting point 90.6934 K)",
  },
  criticalTemperature: {
    value: 190.56,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.01 K",
  },
  criticalPressure: {
    value: 4.599e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±2 kPa",
  },
  criticalDensity: {
    value: 163,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 kg/m³",
  },
  normalBoilingPoint: {
    value: 111.67,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table (the physical-constants table prints 111.65 K); ±0.02 K",
  },
  normalMeltingPoint: {
    value: 90.6934,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 8190,
    temperatureK: 111.67,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 8.19 kJ/mol; ±0.6 % (VDI Heat Atlas 2010 table: 8.230 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 940,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 0.94 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(190.56, 4.599e6, -6.02388, 1.26813, -0.56948, -1.37648),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 90.65,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 111.67 K " +
      "to 190 K (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 190.56, A: 4.99314, B: 5.01992, C: -2.261379, D: -2.477646, E: 4.425783 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.48 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.48 % to 0.95 T_c (measured in the tests); ±0.6 % overall below 0.9 T_c (the spread between the CRC and VDI values at T_b), more near T_c" +
      "by −0.04 % to the CRC value; ±0.6 % (the spread between the CRC and VDI values at T_b)",
  },
  idealGas: {
    model: { kind: "poling", a: [4.568, -0.008975, 0.00003631, -3.407e-8, 1.091e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "against NIST-JANAF (1998): 0.0 % at 100 K, +0.4 % at 298.15 K, +1.2 % at 1000 K",
  },
  hazards: ["flammable gas", "asphyxiant", "as LNG, a cryogenic liquid at 112 K"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +1 % to +5 %; saturated-vapour heat capacity down to -20 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
