/**
 * Methanol (CH3OH), engineering grade: the Poling et al. (2001) Wagner vapour-pressure equation
 * with its critical point, the VDI Heat Atlas (2010) PPDS enthalpy of vaporization, Staveley et
 * al. (1981) triple point, CRC Handbook (2014) latent heats, Poling ideal-gas heat capacity. No
 * published melting equation is used: see the phase map. Flammable and toxic: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Methanol at engineering grade. */
export const methanol = engineeringSubstance({
  id: "methanol",
  name: "methanol",
  formula: "CH3OH",
  cas: "67-56-1",
  aliases: ["CH4O", "methyl alcohol", "MeOH", "wood alcohol"],
  atoms: { C: 1, H: 4, O: 1 },
  tripleTemperature: {
    value: 175.602,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.05 K (CRC Handbook melting point 175.65 K)",
  },
  criticalTemperature: {
    value: 512.64,
    source: "poling-2001",
    note: "printed with the Wagner vapour-pressure equation; ±0.15 K (IUPAC series: 512.5 K). The VDI PPDS equation's 513.38 K is a fit parameter and is not used",
  },
  criticalPressure: {
    value: 8.092e6,
    source: "poling-2001",
    note: "printed with the Wagner vapour-pressure equation; ±0.2 % (IUPAC series: 8.084 MPa)",
  },
  normalBoilingPoint: {
    value: 337.65,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds (the enthalpy of vaporization table prints 337.75 K); ±0.06 K",
  },
  normalMeltingPoint: {
    value: 175.65,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 35210,
    temperatureK: 337.65,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 35.21 kJ/mol at 337.75 K; ±0.5 % (VDI Heat Atlas 2010 table: 35.281 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 3215,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 3.215 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(512.64, 8.092e6, -8.63571, 1.17982, -2.479, -1.024),
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A Wagner vapour-pressure equation (2.5-5 form)",
    tMin: 175.47,
    uncertainty:
      "no uncertainty printed; against the VDI Heat Atlas (2010) saturation table within 0.4 % from 280 K to 460 K (checked in the tests); at the triple point it gives 0.176 Pa against the table's 0.2 Pa (±15 %)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 513.38, A: 5.87513, B: 13.91543, C: -5.81788, D: -5.692542, E: 6.867206 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.85 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.85 % to 0.95 T_c (measured in the tests); ±1 % overall below 0.9 T_c, more near T_c; τ uses the phase map's T_c, 0.74 K below the printed one",
  },
  idealGas: {
    model: { kind: "poling", a: [4.714, -0.006986, 0.00004211, -4.443e-8, 1.535e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 44.06 J/(mol K) to 0.4 %; about ±1 % over the range",
  },
  hazards: ["toxic by ingestion, inhalation and skin contact", "flammable; burns with a nearly invisible flame"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +4 % to +19 %; saturated-vapour heat capacity down to -73 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
