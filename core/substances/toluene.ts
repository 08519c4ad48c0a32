/**
 * Toluene (methylbenzene, C7H8), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure
 * and enthalpy-of-vaporization equations, CRC Handbook (2014) melting point and latent heats,
 * Poling et al. (2001) ideal-gas heat capacity. No published melting equation is used: see the
 * phase map. Flammable: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Toluene at engineering grade. */
export const toluene = engineeringSubstance({
  id: "toluene",
  name: "toluene",
  formula: "C7H8",
  cas: "108-88-3",
  aliases: ["methylbenzene", "toluol"],
  atoms: { C: 7, H: 8 },
  tripleTemperature: {
    value: 178.15,
    source: "crc-handbook-95",
    note: "the normal melting point (physical constants of organic compounds), used as the triple-point temperature; ±0.03 K",
  },
  criticalTemperature: {
    value: 591.75,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.05 K",
  },
  criticalPressure: {
    value: 4.126e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.5 % (IUPAC series: 4.108 MPa)",
  },
  criticalDensity: {
    value: 292,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 383.78,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table (the physical-constants table prints 383.75 K); ±0.03 K",
  },
  normalMeltingPoint: {
    value: 178.15,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 33180,
    temperatureK: 383.78,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 33.18 kJ/mol; ±0.5 % (VDI Heat Atlas 2010 table: 33.234 kJ/mol at 383.75 K)",
  },
  enthalpyOfFusion: {
    value: 6640,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 6.64 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(591.75, 4.126e6, -7.50051, 2.08939, -2.56368, -2.85042),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 178.15,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 320 K to 560 K (checked in the tests); at the triple point (about 0.04 Pa) an extrapolation of the fit",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 591.75, A: 4.60584, B: 13.97224, C: -10.592315, D: 2.120205, E: 4.277128 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.21 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.21 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [3.866, 0.003558, 0.00013356, -1.8659e-7, 7.69e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 103.75 J/(mol K) to 0.2 %; about ±1 % over the range",
  },
  hazards: ["highly flammable liquid and vapour", "harmful vapour"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +0 % to +4 %; saturated-vapour heat capacity down to -10 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
