/**
 * Nitrous oxide (N2O), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014)
 * latent heats, Poling et al. (2001) ideal-gas heat capacity. No published melting equation is
 * used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Nitrous oxide at engineering grade. */
export const nitrousOxide = engineeringSubstance({
  id: "nitrous-oxide",
  name: "nitrous oxide",
  formula: "N2O",
  cas: "10024-97-2",
  refrigerant: "R-744A",
  aliases: ["R744A", "dinitrogen monoxide", "laughing gas"],
  atoms: { N: 2, O: 1 },
  tripleTemperature: {
    value: 182.342,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.01 K (CRC Handbook melting point 182.35 K)",
  },
  criticalTemperature: {
    value: 309.52,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.05 K (Mathews 1972: 309.56 K)",
  },
  criticalPressure: {
    value: 7.245e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±5 kPa",
  },
  criticalDensity: {
    value: 454,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 184.67,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.03 K",
  },
  normalMeltingPoint: {
    value: 182.35,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds",
  },
  enthalpyOfVaporization: {
    value: 16530,
    temperatureK: 184.67,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 16.53 kJ/mol; ±0.5 %",
  },
  enthalpyOfFusion: {
    value: 6540,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 6.54 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(309.52, 7.245e6, -6.79599, 1.59751, -1.85163, -2.29494),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 182.25,
    uncertainty:
      "no uncertainty printed; within 0.1 % of the measured triple-point pressure of Staveley et al. (1981); the Perry's Handbook (2008) Table 2-8 equation differs by up to 4.1 % (at 250 K), a spread these sources do not resolve (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 309.52, A: 6.47229, B: 3.13505, C: 0.829428, D: -2.961623, E: 12.969986 },
    uncertainty:
      "the PPDS equation reproduces the Heat Atlas tables to about 0.2 % below 0.95 T_c for the fluids checked; scaled to the CRC value (+0.3 %); ±0.5 %",
  },
  idealGas: {
    model: { kind: "poling", a: [3.165, 0.003401, 0.00000989, -1.88e-8, 8.9e-12], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "against NIST-JANAF (1998): +1.6 % at 100 K, −0.3 % at 298.15 K, −0.7 % at 1000 K",
  },
  hazards: ["oxidizer: supports combustion", "anaesthetic and asphyxiant", "can decompose explosively when heated under pressure"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (ethane, propane, carbon monoxide) the saturated-liquid heat capacity is within 7 % and the saturated-vapour heat capacity down to 17 % low below 0.9 T_c",
});
