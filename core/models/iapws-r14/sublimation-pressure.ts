/**
 * Sublimation pressure of ice Ih (ice Ih – vapour coexistence) as a function of temperature.
 *
 * Source: IAPWS R14-08(2011), Revised Release on the Pressure along the Melting and Sublimation
 *   Curves of Ordinary Water Substance; W. Wagner, T. Riethmann, R. Feistel, A. H. Harvey,
 *   J. Phys. Chem. Ref. Data 40, 043103 (2011). Sublimation equation (Sec. 3) and its coefficients.
 * Valid: 50 K ≤ T ≤ 273.16 K. Derived from the phase equilibrium of IAPWS R10-06 (ice Ih) with
 *   IAPWS-95, so it is consistent with both.
 * Uncertainty: stated in the release's Sec. 3 (not transcribed here); the equation reproduces the
 *   release's check value 8.94735e-6 MPa at 230 K to every printed digit.
 * Notation: theta = T/T_t, pi = p/p_t with T_t = 273.16 K, p_t = 611.657 Pa;
 *   ln(pi) = theta^-1 · Σ(i=1..3) a_i · theta^(b_i).
 * Deviations from the text: none.
 */

const Tt = 273.16;
const pt = 611.657;

/** R14-08(2011) sublimation coefficients a_i, i = 1…3 (index 0 unused). */
const a: readonly number[] = [Number.NaN, -0.212144006e2, 0.273203819e2, -0.61059813e1];
/** R14-08(2011) sublimation exponents b_i, i = 1…3 (index 0 unused). */
const b: readonly number[] = [Number.NaN, 0.333333333e-2, 0.120666667e1, 0.170333333e1];

/** Lowest temperature of the sublimation equation, K. */
export const SUBLIMATION_T_MIN = 50;
/** Highest temperature of the sublimation equation (the triple point), K. */
export const SUBLIMATION_T_MAX = Tt;

/** Sublimation pressure of ice Ih in Pa at T in K; no range check. */
export function sublimationPressureIceIh(temperatureK: number): number {
  const theta = temperatureK / Tt;
  let sum = 0;
  for (let i = 1; i <= 3; i++) sum += a[i]! * theta ** b[i]!;
  return pt * Math.exp(sum / theta);
}
