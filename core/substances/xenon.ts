/**
 * Xenon (Xe), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-of-
 * vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014) latent heats,
 * the exact monatomic ideal-gas heat capacity. No published melting equation is used: see the
 * phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Xenon at engineering grade. */
export const xenon = engineeringSubstance({
  id: "xenon",
  name: "xenon",
  formula: "Xe",
  cas: "7440-63-3",
  aliases: [],
  atoms: { Xe: 1 },
  tripleTemperature: {
    value: 161.404,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.01 K (CRC Handbook melting point 161.4 K)",
  },
  criticalTemperature: {
    value: 289.73,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.02 K (Mathews 1972: 289.733 K)",
  },
  criticalPressure: {
    value: 5.842e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.1 % (Mathews 1972: 5.840 MPa)",
  },
  criticalDensity: {
    value: 1103,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 % (Mathews 1972: 1113 kg/m³)",
  },
  normalBoilingPoint: {
    value: 165.051,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.01 K",
  },
  normalMeltingPoint: {
    value: 161.4,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds",
  },
  enthalpyOfVaporization: {
    value: 12570,
    temperatureK: 165.051,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 12.57 kJ/mol at 165.06 K; ±0.5 % (the VDI PPDS equation gives 12.547 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 2270,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 2.27 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(289.73, 5.842e6, -6.00659, 1.37325, -0.77703, -1.22529),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 161.25,
    uncertainty:
      "no uncertainty printed; 0.15 % above the measured triple-point pressure of Staveley et al. (1981) and 0.005 K from the CRC normal boiling point (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 289.73, A: 4.69619, B: 6.10287, C: -3.768319, D: -1.078236, E: 0.917114 },
    uncertainty:
      "the PPDS equation is 0.2 % below the CRC value at T_b and is scaled to it; ±0.5 %",
  },
  idealGas: {
    model: { kind: "monatomic" },
    source: "poling-2001",
    name: "monatomic ideal gas, c_p° = 5/2 R (Poling et al. 2001, Appendix A, lists a0 = 2.5)",
    uncertainty: "exact for the ideal gas (electronic excitation negligible below 1000 K)",
  },
  hazards: ["asphyxiant, heavier than air; anaesthetic at high concentration"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (argon, methane, carbon monoxide) the saturated-liquid heat capacity is within 5 % and the saturated-vapour heat capacity down to 20 % low below 0.9 T_c",
});
