/**
 * Ethane (C2H6), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-of-
 * vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014) latent heats,
 * Poling et al. (2001) ideal-gas heat capacity. No published melting equation is used: see the
 * phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Ethane at engineering grade. */
export const ethane = engineeringSubstance({
  id: "ethane",
  name: "ethane",
  formula: "C2H6",
  cas: "74-84-0",
  refrigerant: "R-170",
  aliases: ["R170"],
  atoms: { C: 2, H: 6 },
  tripleTemperature: {
    value: 90.358,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.015 K (VDI Heat Atlas 2010 table: 90.37 K)",
  },
  criticalTemperature: {
    value: 305.32,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.02 K",
  },
  criticalPressure: {
    value: 4.872e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±2 kPa",
  },
  criticalDensity: {
    value: 206,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 kg/m³",
  },
  normalBoilingPoint: {
    value: 184.55,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds; ±0.03 K",
  },
  normalMeltingPoint: {
    value: 90.356,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 14690,
    temperatureK: 184.55,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 14.69 kJ/mol; ±0.5 % (VDI Heat Atlas 2010 table: 14.716 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 2720,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 2.72 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(305.32, 4.872e6, -6.46252, 1.3576, -1.04922, -2.03789),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 90.25,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 150 K to 300 K (checked in the tests); at the triple point it gives 1.07 Pa, 6.2 % below the table's 1.142 Pa (±7 %)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 305.32, A: 5.22295, B: 7.28006, C: -4.737913, D: -0.58983, E: 2.231339 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.25 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.25 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [4.178, -0.004427, 0.0000566, -6.651e-8, 2.487e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 52.47 J/(mol K) to 0.2 %; about ±1 % over the range",
  },
  hazards: ["flammable gas, slightly heavier than air", "asphyxiant"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity -1 % to +2 %; saturated-vapour heat capacity down to -12 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
