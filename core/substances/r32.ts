/**
 * R-32 (difluoromethane, CH2F2), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure
 * and enthalpy-of-vaporization equations, CRC Handbook (2014) melting and boiling points, Poling
 * et al. (2001) ideal-gas heat capacity. No enthalpy of fusion or melting equation from an
 * allowed source: no solid enthalpy and no sublimation curve.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** R-32 at engineering grade. */
export const r32 = engineeringSubstance({
  id: "r32",
  name: "R-32",
  formula: "CH2F2",
  cas: "75-10-5",
  refrigerant: "R-32",
  aliases: ["R32", "HFC-32", "HFC32", "difluoromethane"],
  atoms: { C: 1, H: 2, F: 2 },
  tripleTemperature: {
    value: 136.35,
    source: "crc-handbook-95",
    note: "the normal melting point (physical constants of organic compounds), used as the triple-point temperature; ±0.02 K",
  },
  criticalTemperature: {
    value: 351.26,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.02 K",
  },
  criticalPressure: {
    value: 5.783e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±3 kPa",
  },
  criticalDensity: {
    value: 424,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 221.5,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds; ±0.05 K",
  },
  normalMeltingPoint: {
    value: 136.35,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 19874,
    temperatureK: 221.5,
    source: "vdi-heat-atlas-2010",
    note: "computed: the PPDS enthalpy-of-vaporization equation at T_b (no CRC Handbook value); single source, ±1 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(351.26, 5.783e6, -7.47027, 1.75595, -2.01429, -2.62147),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 137.05,
    uncertainty:
      "no uncertainty printed; against the Perry's Handbook (2008) Table 2-8 equation within 0.1 % from 250 K to 340 K, 1.8 % at 160 K and 3.4 % at 140 K (checked in the tests); extended 0.7 K below its stated limit to the triple point (about 47 Pa, not checked against a measurement)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 351.26, A: 6.31467, B: 6.57339, C: -2.449336, D: -1.596805, E: 4.969907 },
    uncertainty:
      "the PPDS equation reproduces the Heat Atlas tables to about 0.2 % below 0.95 T_c for the fluids checked; ±1 %",
  },
  idealGas: {
    model: { kind: "poling", a: [4.15, -0.005584, 0.00004384, -5.16e-8, 1.92e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "against NIST-JANAF (1998): −1.2 % at 100 K, +0.2 % at 298.15 K, −0.5 % at 1000 K",
  },
  hazards: ["mildly flammable refrigerant (ASHRAE 34 class A2L)", "asphyxiant in confined spaces"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (ammonia, R-134a, propane) the saturated-liquid heat capacity is within 11 % and the saturated-vapour heat capacity down to 39 % low below 0.9 T_c",
});
