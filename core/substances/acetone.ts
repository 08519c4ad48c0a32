/**
 * Acetone (propanone, C3H6O), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, CRC Handbook (2014) melting point and latent heats, Poling
 * et al. (2001) ideal-gas heat capacity (from 200 K only). No published melting equation is
 * used: see the phase map. Flammable: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Acetone at engineering grade. */
export const acetone = engineeringSubstance({
  id: "acetone",
  name: "acetone",
  formula: "C3H6O",
  cas: "67-64-1",
  aliases: ["propanone", "2-propanone", "dimethyl ketone"],
  atoms: { C: 3, H: 6, O: 1 },
  tripleTemperature: {
    value: 178.25,
    source: "crc-handbook-95",
    note: "the normal melting point (physical constants of organic compounds), used as the triple-point temperature; ±0.25 K (sources give 178.25 to 178.5 K)",
  },
  criticalTemperature: {
    value: 508.1,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.1 K",
  },
  criticalPressure: {
    value: 4.692e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.2 % (the table's critical row and the IUPAC series: 4.700 MPa)",
  },
  criticalDensity: {
    value: 274,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 329.23,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds; ±0.03 K",
  },
  normalMeltingPoint: {
    value: 178.25,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 29100,
    temperatureK: 329.23,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 29.10 kJ/mol at 329.2 K; ±0.5 % (VDI Heat Atlas 2010 table: 29.123 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 5770,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 5.77 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(508.1, 4.692e6, -7.67033, 1.96469, -2.4438, -2.90162),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 178.35,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 329 K to 480 K (checked in the tests); extended 0.1 K below its stated limit to the triple point",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 508.1, A: 5.74063, B: 9.13074, C: -4.880084, D: 0.019915, E: 3.765513 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.21 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.21 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [5.126, 0.001511, 0.00005731, -7.177e-8, 2.728e-11], tMin: 200, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 74.52 J/(mol K) to 0.3 %; about ±1 % over the range; not used below its 200 K limit",
  },
  hazards: ["highly flammable liquid and vapour"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +6 %; saturated-vapour heat capacity down to -25 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
