/**
 * Sublimation pressure from the reduced form used with reference equations of state.
 *
 * Source: Ch. Tegeler, R. Span, W. Wagner, A new equation of state for argon covering the fluid
 *   region for temperatures from the melting line to 700 K at pressures up to 1000 MPa,
 *   J. Phys. Chem. Ref. Data 28, 779-850 (1999), sublimation-pressure equation of argon (the
 *   same form serves other reference equations).
 * Equation: ln(p_sub / p_t) = (T_t / T) · Σ a_i (1 − T / T_t)^t_i.
 * Valid: each coefficient set states its range, up to its triple point; the caller enforces it.
 * Uncertainty: stated per coefficient set.
 * Notation: T_t, p_t the triple point of the equation; a_i, t_i as printed.
 * Deviations from the text: none.
 */

/** Coefficients of the reduced sublimation-pressure form. */
export interface ReducedSublimationCoefficients {
  /** Triple-point temperature, K. */
  readonly Tt: number;
  /** Triple-point pressure, Pa. */
  readonly pt: number;
  readonly a: readonly number[];
  readonly t: readonly number[];
}

/** Sublimation pressure, Pa, at T in K (T ≤ T_t; range checked by the caller). */
export function reducedSublimationPressure(k: ReducedSublimationCoefficients, T: number): number {
  const vartheta = 1 - T / k.Tt;
  let sum = 0;
  for (let i = 0; i < k.a.length; i++) sum += k.a[i]! * Math.pow(vartheta, k.t[i]!);
  return k.pt * Math.exp((k.Tt / T) * sum);
}
