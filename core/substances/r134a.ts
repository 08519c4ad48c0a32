/**
 * R-134a (1,1,1,2-tetrafluoroethane, CH2FCF3), engineering grade: the vapour-pressure ancillary
 * equation of the Tillner-Roth and Baehr (1994) international standard formulation with its
 * critical point, VDI Heat Atlas (2010) saturation-table latent heat with Watson's scaling,
 * Poling et al. (2001) ideal-gas heat capacity. No enthalpy of fusion or melting equation from an
 * allowed source: no solid enthalpy and no sublimation curve.
 */
import { engineeringSubstance } from "./engineering-substance";

/** R-134a at engineering grade. */
export const r134a = engineeringSubstance({
  id: "r134a",
  name: "R-134a",
  formula: "C2H2F4",
  cas: "811-97-2",
  refrigerant: "R-134a",
  aliases: ["R134a", "HFC-134a", "HFC134a", "1,1,1,2-tetrafluoroethane", "tetrafluoroethane", "CH2FCF3", "norflurane"],
  atoms: { C: 2, H: 2, F: 4 },
  tripleTemperature: {
    value: 169.85,
    source: "vdi-heat-atlas-2010",
    note: "first row of the saturation table (the triple point); ±0.01 K (CRC Handbook melting point 169.854 K)",
  },
  criticalTemperature: {
    value: 374.18,
    source: "tillner-roth-1994-r134a",
    note: "critical point of the formulation, printed with its vapour-pressure equation; ±0.01 K",
  },
  criticalPressure: {
    value: 4.05629e6,
    source: "tillner-roth-1994-r134a",
    note: "critical point of the formulation, printed with its vapour-pressure equation; ±1 kPa",
  },
  normalBoilingPoint: {
    value: 247.05,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds; ±0.03 K",
  },
  normalMeltingPoint: {
    value: 169.854,
    source: "crc-handbook-95",
    note: "physical constants of organic compounds",
  },
  enthalpyOfVaporization: {
    value: 22157.03,
    temperatureK: 246.78,
    source: "vdi-heat-atlas-2010",
    note:
      "saturation table row at 246.78 K and 100.00 kPa (22.157 kJ/mol), 0.27 K below T_b; no CRC " +
      "Handbook value; ±1 %",
  },
  vaporPressure: {
    coefficients: {
      Tc: 374.18,
      pc: 4.05629e6,
      n: [-7.686556, 2.311791, -2.039554, -3.583758],
      t: [1, 1.5, 2, 4],
    },
    source: "tillner-roth-1994-r134a",
    name: "Tillner-Roth and Baehr (1994) vapour-pressure equation (Wagner form, exponents 1, 1.5, 2, 4)",
    tMin: 169.85,
    uncertainty:
      "an ancillary fit to the formulation; against the VDI Heat Atlas (2010) saturation table " +
      "within 0.1 % from 195 K to 365 K (checked in the tests)",
  },
  vaporization: {
    kind: "watson",
    uncertainty:
      "against the VDI Heat Atlas (2010) saturation table within 2 % from the triple point to " +
      "345 K and 4 % at 365 K (measured in the tests)",
  },
  idealGas: {
    model: { kind: "poling", a: [3.064, 0.02542, 0.00000586, -3.339e-8, 1.716e-11], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 86.64 J/(mol K) to 0.06 %; about ±1 % over the range",
  },
  hazards: ["asphyxiant in confined spaces, heavier than air", "decomposes to toxic and corrosive products in flames"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity -8 % to +4 %; saturated-vapour heat capacity down to -16 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
