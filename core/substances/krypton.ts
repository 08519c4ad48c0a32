/**
 * Krypton (Kr), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-of-
 * vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014) latent heats,
 * the exact monatomic ideal-gas heat capacity. No published melting equation is used: see the
 * phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Krypton at engineering grade. */
export const krypton = engineeringSubstance({
  id: "krypton",
  name: "krypton",
  formula: "Kr",
  cas: "7439-90-9",
  aliases: [],
  atoms: { Kr: 1 },
  tripleTemperature: {
    value: 115.772,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.01 K (CRC Handbook melting point 115.78 K)",
  },
  criticalTemperature: {
    value: 209.48,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.1 K (Mathews 1972: 209.4 K)",
  },
  criticalPressure: {
    value: 5.525e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.5 % (Mathews 1972: 5.502 MPa)",
  },
  criticalDensity: {
    value: 910,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 % (Mathews 1972: 919 kg/m³)",
  },
  normalBoilingPoint: {
    value: 119.735,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.01 K",
  },
  normalMeltingPoint: {
    value: 115.78,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds",
  },
  enthalpyOfVaporization: {
    value: 9080,
    temperatureK: 119.735,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 9.08 kJ/mol; ±1.3 % (the VDI PPDS equation gives 8.972 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 1640,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 1.64 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(209.48, 5.525e6, -5.98396, 1.34334, -0.66521, -1.30012),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 115.75,
    uncertainty:
      "no uncertainty printed; 0.7 % above the measured triple-point pressure of Staveley et al. (1981) and 0.01 K from the CRC normal boiling point (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 209.48, A: 4.53207, B: 6.22827, C: -3.542952, D: -1.700226, E: 4.022385 },
    uncertainty:
      "the PPDS equation is 1.2 % below the CRC value at T_b and is scaled to it; ±1.3 %",
  },
  idealGas: {
    model: { kind: "monatomic" },
    source: "poling-2001",
    name: "monatomic ideal gas, c_p° = 5/2 R (Poling et al. 2001, Appendix A, lists a0 = 2.5)",
    uncertainty: "exact for the ideal gas (electronic excitation negligible below 1000 K)",
  },
  hazards: ["asphyxiant, heavier than air"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (argon, methane, carbon monoxide) the saturated-liquid heat capacity is within 5 % and the saturated-vapour heat capacity down to 20 % low below 0.9 T_c",
});
