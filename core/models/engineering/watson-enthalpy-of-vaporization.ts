/**
 * Enthalpy of vaporization at any temperature from one known value: Watson's scaling.
 *
 * Source: K. M. Watson, Thermodynamics of the liquid state, Ind. Eng. Chem. 35, 398-406 (1943),
 *   in the form given by B. E. Poling, J. M. Prausnitz, J. P. O'Connell, The Properties of Gases
 *   and Liquids, 5th ed. (2001), Eq. (7-12.1), with the exponent 0.38.
 * Equation: Δh_v(T) = Δh_v(T_1) · [(1 − T / T_c) / (1 − T_1 / T_c)]^0.38.
 * Valid: from the triple point to T_c (Δh_v falls to zero at T_c). Uncertainty: Poling et al.
 *   describe the relation as a satisfactory approximation; Phasecell measures it per substance
 *   against the VDI Heat Atlas (2010) saturation tables (see the substance tests).
 * Notation: T_1 the temperature of the known value (here the normal boiling point), T_c the
 *   critical temperature.
 * Deviations from the text: none.
 */

/** Watson's exponent, Poling et al. (2001) Eq. (7-12.1). */
export const WATSON_EXPONENT = 0.38;

/** The known value and the critical temperature that anchor the scaling. */
export interface WatsonAnchor {
  /** Temperature of the known value, K. */
  readonly T1: number;
  /** Molar enthalpy of vaporization at T1, J/mol. */
  readonly enthalpy1: number;
  /** Critical temperature, K. */
  readonly Tc: number;
}

/** Molar enthalpy of vaporization, J/mol, at T in K (T ≤ T_c; zero at T_c). */
export function watsonEnthalpyOfVaporization(k: WatsonAnchor, T: number): number {
  const ratio = (1 - T / k.Tc) / (1 - k.T1 / k.Tc);
  return k.enthalpy1 * Math.pow(ratio, WATSON_EXPONENT);
}
