/**
 * Argon (Ar), engineering grade: the vapour-pressure, melting-pressure and sublimation-pressure
 * equations published with the Tegeler, Span and Wagner (1999) reference equation of state,
 * handbook latent heats, and the exact ideal-gas heat capacity of a monatomic gas.
 */
import { reducedMeltingPressure } from "../models/engineering/simon-glatzel";
import { reducedSublimationPressure } from "../models/engineering/reduced-sublimation-pressure";
import { engineeringSubstance } from "./engineering-substance";

const TRIPLE_K = 83.8058;

/** Argon at engineering grade. */
export const argon = engineeringSubstance({
  id: "argon",
  name: "argon",
  formula: "Ar",
  cas: "7440-37-1",
  refrigerant: "R-740",
  aliases: ["R740", "LAR"],
  atoms: { Ar: 1 },
  tripleTemperature: {
    value: TRIPLE_K,
    source: "its-90",
    note: "defining fixed point of ITS-90 (exact on the scale); also the triple point of the Tegeler et al. (1999) equation",
  },
  criticalTemperature: {
    value: 150.687,
    source: "tegeler-1999-argon",
    note: "critical point of the reference equation of state, printed with its vapour-pressure equation; ±0.015 K",
  },
  criticalPressure: {
    value: 4.863e6,
    source: "tegeler-1999-argon",
    note: "critical point of the reference equation of state, printed with its vapour-pressure equation; ±1 kPa",
  },
  criticalDensity: {
    value: 535.6,
    source: "tegeler-1999-argon",
    note: "13.40743 mol/dm³ × 39.948 g/mol, critical density of the reference equation of state; ±0.5 %",
  },
  normalBoilingPoint: {
    value: 87.302,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.005 K",
  },
  normalMeltingPoint: {
    value: 83.81,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; two decimals printed",
  },
  enthalpyOfVaporization: {
    value: 6430,
    temperatureK: 87.302,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, printed as 6.43 kJ/mol at 87.3 K; ±1 %",
  },
  enthalpyOfFusion: {
    value: 1180,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 1.18 kJ/mol at the normal melting point, used at the triple point 0.004 K away; ±3 %",
  },
  vaporPressure: {
    coefficients: {
      Tc: 150.687,
      pc: 4.863e6,
      n: [-5.9409785, 1.3553888, -0.46497607, -1.5399043],
      t: [1, 1.5, 2, 4.5],
    },
    source: "tegeler-1999-argon",
    name: "Tegeler et al. (1999) vapour-pressure ancillary equation (Wagner form, exponents 1, 1.5, 2, 4.5)",
    tMin: TRIPLE_K,
    uncertainty:
      "an ancillary fit to the reference equation of state; it agrees with the VDI Heat Atlas " +
      "(2010) saturation table to 0.01 % (checked in the tests); within 0.05 % for engineering use",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 150.69, A: 4.84261, B: 5.03919, C: -2.218775, D: -2.402365, E: 7.051085 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.14 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.14 % to 0.95 T_c (measured in the tests); ±1 % overall below 0.9 T_c (the CRC value's uncertainty), more near T_c" +
      "140 K and 1.3 % at 145 K (measured in the tests); ±1 % below 0.95 T_c",
  },
  idealGas: {
    model: { kind: "monatomic" },
    source: "poling-2001",
    name: "monatomic ideal gas, c_p° = 5/2 R (Poling et al. 2001, Appendix A, lists a0 = 2.5)",
    uncertainty: "exact for the ideal gas (electronic excitation negligible below 1000 K)",
  },
  melting: {
    pressure: (temperatureK, triplePa) =>
      reducedMeltingPressure({ Tt: TRIPLE_K, pt: triplePa, a: [-7476.2665, 9959.0613], t: [1.05, 1.275] }, temperatureK),
    // The temperature at which the equation reaches 1000 MPa, the pressure limit of the
    // Tegeler et al. equation of state (254.03 K, computed); the melting equation's own stated
    // range was not available to check.
    tMax: 254.03,
    model: {
      id: "argon-melting-tegeler-1999",
      name:
        "Tegeler et al. (1999) melting-pressure equation, p_m/p_t = 1 − 7476.2665[(T/T_t)^1.05 − 1] + " +
        "9959.0613[(T/T_t)^1.275 − 1], with p_t = the boiling curve at T_t (68 892.9 Pa) in place of " +
        "the printed 68 891 Pa (0.003 % apart) so that the curves meet exactly",
      source: "tegeler-1999-argon",
      grade: "engineering",
      validity:
        "83.8058 K (triple point) to 254.03 K, where it reaches 1000 MPa (the equation of state's " +
        "pressure limit)",
      uncertainty:
        "gives 83.814 K at 101.325 kPa against 83.81 K in the CRC Handbook (2014); the paper's " +
        "stated uncertainty was not available to transcribe: treat as ±1 % in pressure (engineering estimate)",
    },
  },
  sublimation: {
    pressure: (temperatureK, triplePa) =>
      reducedSublimationPressure({ Tt: TRIPLE_K, pt: triplePa, a: [-11.391604, -0.39513431], t: [1, 2.7] }, temperatureK),
    tMin: 50,
    model: {
      id: "argon-sublimation-tegeler-1999",
      name:
        "Tegeler et al. (1999) sublimation-pressure equation, ln(p_sub/p_t) = (T_t/T)[−11.391604(1 − T/T_t) − " +
        "0.39513431(1 − T/T_t)^2.7], with the phase map's p_t (see the melting curve)",
      source: "tegeler-1999-argon",
      grade: "engineering",
      validity: "50 K to 83.8058 K (triple point); the equation's own lower limit was not available to check, so Phasecell stops at 50 K",
      uncertainty: "not transcribed from the paper; treat as ±2 % in pressure (engineering estimate)",
    },
  },
  hazards: ["asphyxiant, heavier than air: collects in pits and low rooms", "cryogenic liquid at 87 K: cold burns"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +2 % to +5 %; saturated-vapour heat capacity down to -19 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
