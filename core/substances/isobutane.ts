/**
 * Isobutane (2-methylpropane, C4H10), engineering grade: VDI Heat Atlas (2010) PPDS vapour-
 * pressure and enthalpy-of-vaporization equations, Staveley et al. (1981) triple point, CRC
 * Handbook (2014) latent heats, Poling et al. (2001) ideal-gas heat capacity. No published
 * melting equation is used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Isobutane at engineering grade. */
export const isobutane = engineeringSubstance({
  id: "isobutane",
  name: "isobutane",
  formula: "i-C4H10",
  cas: "75-28-5",
  refrigerant: "R-600a",
  aliases: ["R600a", "2-methylpropane", "i-butane", "methylpropane"],
  atoms: { C: 4, H: 10 },
  tripleTemperature: {
    value: 113.752,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.03 K (VDI Heat Atlas 2010 table: 113.73 K)",
  },
  criticalTemperature: {
    value: 407.81,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.02 K",
  },
  criticalPressure: {
    value: 3.629e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.4 % (IUPAC series: 3.640 MPa)",
  },
  criticalDensity: {
    value: 226,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 261.42,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table (the physical-constants table prints 261.45 K); ±0.03 K",
  },
  enthalpyOfVaporization: {
    value: 21300,
    temperatureK: 261.42,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 21.30 kJ/mol; ±0.5 % (VDI Heat Atlas 2010 table: 21.220 kJ/mol at 261.4 K)",
  },
  enthalpyOfFusion: {
    value: 4540,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 4.54 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(407.81, 3.629e6, -6.90675, 1.5774, -1.8016, -2.42893),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 113.55,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 225 K to 375 K (checked in the tests); at the triple point (about 0.02 Pa) ±15 %",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 407.81, A: 5.98835, B: 6.85491, C: -3.93859, D: -0.367091, E: 2.965412 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.40 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.41 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [3.351, 0.017883, 0.00005477, -0.000000081, 3.243e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 96.65 J/(mol K) to 0.3 %; about ±1 % over the range",
  },
  hazards: ["flammable gas, heavier than air: collects in low spots"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +0 % to +2 %; saturated-vapour heat capacity down to -8 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
