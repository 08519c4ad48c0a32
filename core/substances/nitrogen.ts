/**
 * Nitrogen (N2), engineering grade: the Span et al. (2000) vapour-pressure ancillary equation
 * with the reference equation's triple and critical points, handbook latent heats, Poling
 * ideal-gas heat capacity. No melting equation from an allowed source: see the phase map.
 */
import { engineeringSubstance } from "./engineering-substance";

/** Nitrogen at engineering grade. */
export const nitrogen = engineeringSubstance({
  id: "nitrogen",
  name: "nitrogen",
  formula: "N2",
  cas: "7727-37-9",
  refrigerant: "R-728",
  aliases: ["R728", "LN2", "LIN", "dinitrogen"],
  atoms: { N: 2 },
  tripleTemperature: {
    value: 63.151,
    source: "span-2000-nitrogen",
    note: "triple point of the reference equation of state; ±0.005 K (Staveley et al. 1981 give 63.154 K)",
  },
  criticalTemperature: {
    value: 126.192,
    source: "span-2000-nitrogen",
    note: "critical point of the reference equation of state, printed with its vapour-pressure equation; ±0.01 K",
  },
  criticalPressure: {
    value: 3.3958e6,
    source: "span-2000-nitrogen",
    note: "critical point of the reference equation of state, printed with its vapour-pressure equation; ±0.2 kPa",
  },
  criticalDensity: {
    value: 313.3,
    source: "span-2000-nitrogen",
    note: "11.1839 mol/dm³ × 28.01348 g/mol, critical density of the reference equation of state; ±0.5 %",
  },
  normalBoilingPoint: {
    value: 77.355,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.005 K",
  },
  normalMeltingPoint: {
    value: 63.15,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; two decimals printed",
  },
  enthalpyOfVaporization: {
    value: 5570,
    temperatureK: 77.355,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, printed as 5.57 kJ/mol at 77.36 K; ±1 %",
  },
  enthalpyOfFusion: {
    value: 710,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 0.71 kJ/mol at the normal melting point, used at the triple point 0.001 K away; ±3 %",
  },
  vaporPressure: {
    coefficients: {
      Tc: 126.192,
      pc: 3.3958e6,
      n: [-6.12445284, 1.2632722, -0.765910082, -1.77570564],
      t: [1, 1.5, 2.5, 5],
    },
    source: "span-2000-nitrogen",
    name: "Span et al. (2000) vapour-pressure ancillary equation (Wagner form, exponents 1, 1.5, 2.5, 5)",
    tMin: 63.151,
    uncertainty:
      "an ancillary fit to the reference equation of state; it reproduces the equation of state's " +
      "saturation pressures at 80, 100 and 120 K to 0.004 % and the VDI Heat Atlas (2010) PPDS " +
      "equation to 0.03 % (checked in the tests); within 0.1 % for engineering use",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 126.19, A: 5.07184, B: 5.47148, C: -2.581923, D: -2.026983, E: 5.480425 },
    uncertainty:
      "the PPDS equation reproduces the VDI Heat Atlas saturation tables to about 0.2 % below " +
      "0.95 T_c for the fluids checked; the scaling to the CRC value changes it by 0.16 %; " +
      "overall about ±1 %, more within 2 % of T_c",
  },
  idealGas: {
    model: { kind: "poling", a: [3.539, -0.000261, 0.00000007, 1.57e-9, -9.9e-13], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 29.12 J/(mol K) to 0.04 %; about ±1 % over the range",
  },
  hazards: ["asphyxiant: displaces oxygen without warning", "cryogenic liquid at 77 K: cold burns; about 700 times its liquid volume as gas"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (argon, methane, carbon monoxide) the saturated-liquid heat capacity is within 5 % and the saturated-vapour heat capacity down to 20 % low below 0.9 T_c",
});
