/**
 * Sublimation pressure derived by integrating the Clausius–Clapeyron equation downward from the
 * triple point with a constant enthalpy of sublimation.
 *
 * Source of the method: the Clausius–Clapeyron equation d ln p / d(1/T) = −Δh_sub / R, valid for
 *   an ideal-gas vapour and a solid whose volume is negligible beside the vapour's; integrated
 *   with constant Δh_sub it gives the equation below (e.g. Poling, Prausnitz and O'Connell, The
 *   Properties of Gases and Liquids, 5th ed. (2001), Sec. 7-2). The enthalpy of sublimation at
 *   the triple point is the sum of the enthalpies of fusion and of vaporization there (both
 *   cited by the substance).
 * Equation: ln(p_sub / p_t) = −(Δh_sub / R) (1 / T − 1 / T_t).
 * Valid: from the triple point down to a lower limit the substance states; the caller enforces
 *   it. Uncertainty: the neglected heat-capacity difference between vapour and solid and the
 *   vapour's non-ideality at the triple point; measured against the published argon equation of
 *   Tegeler et al. (1999) (see test/core/models/engineering): +3.6 % at 0.9 T_t and +8.8 % at
 *   0.8 T_t for argon, whose triple-point pressure (69 kPa) makes the vapour's non-ideality
 *   largest among the substances here.
 * Notation: T_t, p_t the triple point; Δh_sub molar enthalpy of sublimation, J/mol.
 * Deviations: none; this is a derived curve, not a published sublimation equation.
 */
import { MOLAR_GAS_CONSTANT } from "./gas-constant";

/** Inputs of the integrated Clausius–Clapeyron curve. */
export interface ClausiusClapeyronSublimation {
  /** Triple-point temperature, K. */
  readonly Tt: number;
  /** Triple-point pressure, Pa. */
  readonly pt: number;
  /** Molar enthalpy of sublimation at the triple point, J/mol. */
  readonly enthalpyOfSublimation: number;
}

/** Sublimation pressure, Pa, at T in K. */
export function clausiusClapeyronPressure(k: ClausiusClapeyronSublimation, T: number): number {
  return k.pt * Math.exp((-k.enthalpyOfSublimation / MOLAR_GAS_CONSTANT) * (1 / T - 1 / k.Tt));
}

/** Sublimation temperature, K, at p in Pa: the exact inverse of {@link clausiusClapeyronPressure}. */
export function clausiusClapeyronTemperature(k: ClausiusClapeyronSublimation, p: number): number {
  return 1 / (1 / k.Tt - (MOLAR_GAS_CONSTANT * Math.log(p / k.pt)) / k.enthalpyOfSublimation);
}
