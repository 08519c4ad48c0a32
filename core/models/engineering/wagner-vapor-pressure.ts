/**
 * Vapour pressure of a pure fluid from a Wagner-type equation, reduced by the critical point
 * printed with the coefficients.
 *
 * Source of the form: W. Wagner, New vapour pressure measurements for argon and nitrogen and a
 *   new method for establishing rational vapour pressure equations, Cryogenics 13, 470-482
 *   (1973) (reference from memory). The "2.5-5" variant with exponents 1, 1.5, 2.5 and 5 is the PPDS vapour-pressure
 *   equation of the VDI Heat Atlas, 2nd ed. (2010), part D3.1, and the Wagner equation of Poling,
 *   Prausnitz and O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), Eq. (7-3.3)
 *   and Appendix A. Reference equations of state carry ancillary equations of the same form with
 *   their own exponents (e.g. Span et al. 2000 for nitrogen: 1, 1.5, 2.5, 5; Tegeler et al. 1999
 *   for argon: 1, 1.5, 2, 4.5).
 * Equation: ln(p_s / p_c) = (T_c / T) · Σ n_i τ^t_i, τ = 1 − T / T_c.
 * Valid: each coefficient set states its own range, from a lower limit near the triple point up
 *   to T_c; the caller enforces it (core/curves). Uncertainty: stated per coefficient set.
 * Notation: T_c, p_c as printed with the coefficients (they are part of the fit and may differ
 *   from the best critical constants); n, t as printed.
 * Deviations from the text: none.
 */

/** One Wagner-type coefficient set with the critical point printed beside it. */
export interface WagnerCoefficients {
  /** Critical temperature of the fit, K. */
  readonly Tc: number;
  /** Critical pressure of the fit, Pa. */
  readonly pc: number;
  /** Coefficients n_i, in the order printed. */
  readonly n: readonly number[];
  /** Exponents t_i of τ, in the same order. */
  readonly t: readonly number[];
}

/** Exponents of the PPDS / Wagner 2.5-5 form (VDI Heat Atlas 2010 D3.1; Poling et al. Eq. 7-3.3). */
export const WAGNER_25_5_EXPONENTS: readonly number[] = [1, 1.5, 2.5, 5];

/**
 * Builds a Wagner 2.5-5 (PPDS) coefficient set from the printed A, B, C, D and T_c, p_c.
 * @param pcPa - critical pressure printed with the coefficients, in Pa
 */
export function wagner25_5(Tc: number, pcPa: number, A: number, B: number, C: number, D: number): WagnerCoefficients {
  return { Tc, pc: pcPa, n: [A, B, C, D], t: WAGNER_25_5_EXPONENTS };
}

/** ln(p_s / p_c) at T, K; T must not exceed T_c (τ ≥ 0). */
export function wagnerLogReducedPressure(c: WagnerCoefficients, T: number): number {
  const tau = 1 - T / c.Tc;
  let sum = 0;
  for (let i = 0; i < c.n.length; i++) sum += c.n[i]! * Math.pow(tau, c.t[i]!);
  return (c.Tc / T) * sum;
}

/** Vapour pressure p_s, Pa, at T in K (T ≤ T_c; range checked by the caller). */
export function wagnerPressure(c: WagnerCoefficients, T: number): number {
  return c.pc * Math.exp(wagnerLogReducedPressure(c, T));
}
