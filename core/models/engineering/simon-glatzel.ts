/**
 * Melting pressure of a solid as a function of temperature: the Simon–Glatzel equation and the
 * reduced "Simon-type" sum used by reference equations of state.
 *
 * Sources: F. Simon, G. Glatzel, Bemerkungen zur Schmelzdruckkurve, Z. anorg. allg. Chem. 178,
 *   309-316 (1929) (reference from memory), for p_m = p_0 + a [(T / T_0)^c − 1]; the reduced sum
 *   p_m / p_t = 1 + Σ a_i [(T / T_t)^t_i − 1] is the form of, e.g., Tegeler, Span and Wagner,
 *   J. Phys. Chem. Ref. Data 28, 779 (1999), for argon.
 * Valid: each coefficient set states its own range, from its reference point (usually the triple
 *   point) upwards; the caller enforces it. Uncertainty: stated per coefficient set.
 * Notation: T_0, p_0 (or T_t, p_t) the reference point; a, c or a_i, t_i as printed.
 * Deviations from the text: none.
 */

/** Simon–Glatzel coefficients: p_m = p_0 + a [(T / T_0)^c − 1]. */
export interface SimonGlatzelCoefficients {
  /** Reference temperature, K. */
  readonly T0: number;
  /** Reference pressure, Pa. */
  readonly p0: number;
  /** Pressure coefficient a, Pa. */
  readonly a: number;
  /** Exponent c. */
  readonly c: number;
}

/** Melting pressure, Pa, at T in K from the Simon–Glatzel equation. */
export function simonGlatzelPressure(k: SimonGlatzelCoefficients, T: number): number {
  return k.p0 + k.a * (Math.pow(T / k.T0, k.c) - 1);
}

/** Melting temperature, K, at p in Pa: the exact inverse of {@link simonGlatzelPressure}. */
export function simonGlatzelTemperature(k: SimonGlatzelCoefficients, p: number): number {
  return k.T0 * Math.pow(1 + (p - k.p0) / k.a, 1 / k.c);
}

/** Reduced Simon-type sum: p_m / p_t = 1 + Σ a_i [(T / T_t)^t_i − 1]. */
export interface ReducedMeltingCoefficients {
  /** Triple-point temperature of the equation, K. */
  readonly Tt: number;
  /** Triple-point pressure of the equation, Pa. */
  readonly pt: number;
  readonly a: readonly number[];
  readonly t: readonly number[];
}

/** Melting pressure, Pa, at T in K from the reduced Simon-type sum. */
export function reducedMeltingPressure(k: ReducedMeltingCoefficients, T: number): number {
  const theta = T / k.Tt;
  let sum = 1;
  for (let i = 0; i < k.a.length; i++) sum += k.a[i]! * (Math.pow(theta, k.t[i]!) - 1);
  return k.pt * sum;
}
