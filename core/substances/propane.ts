/**
 * Propane (C3H8), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations and saturation table, Staveley et al. (1981) triple point,
 * CRC Handbook (2014) enthalpy of fusion, Poling et al. (2001) ideal-gas heat capacity. No
 * published melting equation is used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Propane at engineering grade. */
export const propane = engineeringSubstance({
  id: "propane",
  name: "propane",
  formula: "C3H8",
  cas: "74-98-6",
  refrigerant: "R-290",
  aliases: ["R290", "LPG propane"],
  atoms: { C: 3, H: 8 },
  tripleTemperature: {
    value: 85.468,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.06 K (VDI Heat Atlas 2010 table: 85.53 K)",
  },
  criticalTemperature: {
    value: 369.82,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.07 K (the Heat Atlas table's critical row: 369.89 K)",
  },
  criticalPressure: {
    value: 4.248e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±4 kPa",
  },
  criticalDensity: {
    value: 221,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 kg/m³",
  },
  normalBoilingPoint: {
    value: 231.04,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds; ±0.02 K",
  },
  enthalpyOfVaporization: {
    value: 18766.65,
    temperatureK: 231.04,
    source: "vdi-heat-atlas-2010",
    note:
      "saturation table row at 231.04 K (18.767 kJ/mol); ±1.5 %: the CRC Handbook (2014) prints " +
      "19.04 kJ/mol, 1.4 % higher",
  },
  enthalpyOfFusion: {
    value: 3500,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 3.50 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(369.82, 4.248e6, -6.7148, 1.38388, -1.30695, -2.56827),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 85.45,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 200 K to " +
      "350 K (checked in the tests); below 1 kPa the pressure is an extrapolation of the fit " +
      "(order of magnitude at the triple point, where it gives 1.7e-4 Pa)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 369.82, A: 5.52801, B: 7.88661, C: -5.323736, D: 0.088186, E: 2.147194 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.18 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.18 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c" +
      "scaled by −0.13 % to the table's value at 231.04 K; ±0.5 %",
  },
  idealGas: {
    model: { kind: "poling", a: [3.847, 0.005131, 0.00006011, -7.893e-8, 3.079e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 73.6 J/(mol K) to 0.2 %; about ±1 % over the range",
  },
  hazards: ["flammable gas, heavier than air: collects in low spots", "asphyxiant"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +1 % to +7 %; saturated-vapour heat capacity down to -12 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
