/**
 * n-Hexane (C6H14), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-
 * of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014) latent
 * heats, Poling et al. (2001) ideal-gas heat capacity (from 200 K only). No published melting
 * equation is used: see the phase map. Flammable: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** N-hexane at engineering grade. */
export const hexane = engineeringSubstance({
  id: "hexane",
  name: "n-hexane",
  formula: "C6H14",
  cas: "110-54-3",
  aliases: ["hexane", "normal hexane"],
  atoms: { C: 6, H: 14 },
  tripleTemperature: {
    value: 177.852,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.03 K (CRC Handbook melting point 177.88 K)",
  },
  criticalTemperature: {
    value: 507.79,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.2 K (IUPAC series: 507.6 K)",
  },
  criticalPressure: {
    value: 3.042e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.6 % (IUPAC series: 3.025 MPa)",
  },
  normalBoilingPoint: {
    value: 341.88,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table (the physical-constants table prints 341.87 K); ±0.03 K",
  },
  normalMeltingPoint: {
    value: 177.88,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 28850,
    temperatureK: 341.88,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 28.85 kJ/mol; ±0.5 % (VDI Heat Atlas 2010 table: 28.863 kJ/mol at 341.86 K)",
  },
  enthalpyOfFusion: {
    value: 13080,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 13.08 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(507.79, 3.042e6, -7.61075, 2.00527, -2.74158, -2.82824),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 177.75,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 300 K to 475 K (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 507.79, A: 5.82255, B: 11.20578, C: -8.077144, D: 1.351285, E: 3.455363 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.05 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.05 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [8.831, -0.000166, 0.00014302, -1.8314e-7, 7.124e-11], tMin: 200, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 142.59 J/(mol K) to 0.3 %; about ±1 % over the range; not used below its 200 K limit",
  },
  hazards: ["highly flammable liquid and vapour", "nerve damage on long exposure"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +1 % to +3 %; saturated-vapour heat capacity down to -8 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
