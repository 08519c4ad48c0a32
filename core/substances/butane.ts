/**
 * n-Butane (C4H10), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-
 * of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014) latent
 * heats, Poling et al. (2001) ideal-gas heat capacity (from 200 K only: no vapour enthalpy
 * below). No published melting equation is used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** N-butane at engineering grade. */
export const butane = engineeringSubstance({
  id: "butane",
  name: "n-butane",
  formula: "n-C4H10",
  cas: "106-97-8",
  refrigerant: "R-600",
  aliases: ["butane", "normal butane", "R600"],
  atoms: { C: 4, H: 10 },
  tripleTemperature: {
    value: 134.854,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.05 K (VDI Heat Atlas 2010 table: 134.9 K)",
  },
  criticalTemperature: {
    value: 425.13,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.02 K",
  },
  criticalPressure: {
    value: 3.796e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±2 kPa",
  },
  criticalDensity: {
    value: 228,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 kg/m³",
  },
  normalBoilingPoint: {
    value: 272.65,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds; ±0.02 K",
  },
  normalMeltingPoint: {
    value: 134.85,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 22440,
    temperatureK: 272.65,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 22.44 kJ/mol; ±0.5 % (VDI Heat Atlas 2010 table: 22.418 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 4660,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 4.66 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(425.13, 3.796e6, -7.08562, 1.79335, -2.00003, -2.31975),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 134.75,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 225 K to 400 K (checked in the tests); at the triple point it gives 0.65 Pa, 2 % below the table's 0.666 Pa",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 425.13, A: 5.90836, B: 7.81092, C: -4.959362, D: -0.194761, E: 3.830824 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.12 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.15 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [5.547, 0.005536, 0.00008057, -1.0571e-7, 4.134e-11], tMin: 200, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 98.49 J/(mol K) to 0.3 %; about ±1 % over the range; not used below its 200 K limit",
  },
  hazards: ["flammable gas, heavier than air: collects in low spots"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +0 % to +3 %; saturated-vapour heat capacity down to -9 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
