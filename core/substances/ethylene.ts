/**
 * Ethylene (ethene, C2H4), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014)
 * latent heats, Poling et al. (2001) ideal-gas heat capacity. No published melting equation is
 * used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Ethylene at engineering grade. */
export const ethylene = engineeringSubstance({
  id: "ethylene",
  name: "ethylene",
  formula: "C2H4",
  cas: "74-85-1",
  refrigerant: "R-1150",
  aliases: ["ethene", "R1150"],
  atoms: { C: 2, H: 4 },
  tripleTemperature: {
    value: 103.9994,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.01 K",
  },
  criticalTemperature: {
    value: 282.35,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.02 K",
  },
  criticalPressure: {
    value: 5.042e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±2 kPa",
  },
  criticalDensity: {
    value: 214,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 kg/m³",
  },
  normalBoilingPoint: {
    value: 169.38,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table (the physical-constants table prints 169.35 K); ±0.03 K",
  },
  enthalpyOfVaporization: {
    value: 13530,
    temperatureK: 169.38,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 13.53 kJ/mol; ±0.5 % (VDI Heat Atlas 2010 table: 13.533 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 3350,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 3.35 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(282.35, 5.042e6, -6.41327, 1.45469, -1.24183, -1.99446),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 104.05,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 150 K to 275 K and 0.7 % at the triple point (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 282.35, A: 5.15017, B: 6.90546, C: -4.236236, D: -0.597914, E: 3.21431 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.10 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.10 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [4.221, -0.008782, 0.00005795, -6.729e-8, 2.511e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "against NIST-JANAF (1998): −3.6 % at 100 K, +0.2 % at 298.15 K, −0.7 % at 1000 K",
  },
  hazards: ["flammable gas, wide flammability range", "asphyxiant"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity -1 % to +5 %; saturated-vapour heat capacity down to -17 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
