/**
 * Ethanol (C2H5OH), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-
 * of-vaporization equations and saturation table, CRC Handbook (2014) melting point and enthalpy
 * of fusion, Poling et al. (2001) ideal-gas heat capacity. No published melting equation is
 * used: see the phase map. Flammable: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Ethanol at engineering grade. */
export const ethanol = engineeringSubstance({
  id: "ethanol",
  name: "ethanol",
  formula: "C2H5OH",
  cas: "64-17-5",
  aliases: ["C2H6O", "ethyl alcohol", "EtOH"],
  atoms: { C: 2, H: 6, O: 1 },
  tripleTemperature: {
    value: 159.01,
    source: "crc-handbook-95",
    note: "the normal melting point (physical constants of organic compounds), used as the triple-point temperature; ±0.05 K",
  },
  criticalTemperature: {
    value: 513.9,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation (the table's critical row); ±0.15 K (IUPAC series: 514.0 K)",
  },
  criticalPressure: {
    value: 6.148e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.3 % (IUPAC series: 6.137 MPa)",
  },
  criticalDensity: {
    value: 276,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 351.44,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table (the physical-constants table prints 351.39 K); ±0.05 K",
  },
  normalMeltingPoint: {
    value: 159.01,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 39153.57,
    temperatureK: 351.39,
    source: "vdi-heat-atlas-2010",
    note: "saturation table row at 351.39 K (39.154 kJ/mol); ±1.6 %: the CRC Handbook (2014) prints 38.56 kJ/mol, 1.5 % lower",
  },
  enthalpyOfFusion: {
    value: 4931,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 4.931 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(513.9, 6.148e6, -8.33803, 0.0872, -3.30575, -0.26001),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 159.05,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 300 K to 475 K (checked in the tests); extended 0.04 K below its stated limit to the triple point, where the pressure (below 1e-6 Pa) is an order of magnitude only",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 513.9, A: 14.68765, B: -15.2712, C: 26.062308, D: -20.049654, E: 15.816504 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.18 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.18 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [4.396, 0.000628, 0.00005546, -7.024e-8, 2.685e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 65.21 J/(mol K) to 0.3 %; about ±1 % over the range",
  },
  hazards: ["flammable liquid and vapour"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity -7 % to +3 %; saturated-vapour heat capacity down to -21 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
