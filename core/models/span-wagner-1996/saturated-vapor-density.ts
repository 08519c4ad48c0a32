/**
 * Density of saturated carbon dioxide vapour as a function of temperature.
 *
 * Source: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509-1596 (1996),
 *   doi:10.1063/1.555991, ancillary equation for the saturated-vapour density, Eq. (3.15).
 * Valid: T_t = 216.592 K ≤ T ≤ T_c = 304.1282 K.
 * Uncertainty: stated in the paper for the ancillary equation (not transcribed here); it agrees
 *   with the saturated-vapour density of the paper's equation of state within 0.02 % from
 *   216.592 K to 302 K (measured in the tests).
 * Notation: ln(rho''/rho_c) = Σ(i=1..5) a_i (1 − T/T_c)^t_i (no T_c/T factor).
 * Deviations from the text: none.
 */
import { SW96_CRITICAL_DENSITY as rhoc, SW96_CRITICAL_TEMPERATURE as Tc } from "./fixed-points";

/** Eq. (3.15) coefficients a_i, i = 1…5 (index 0 unused). */
const a: readonly number[] = [Number.NaN, -1.7074879, -0.82274670, -4.6008549, -10.111178, -29.742252];
/** Eq. (3.15) exponents t_i, i = 1…5 (index 0 unused): 0.340, 1/2, 1, 7/3, 14/3. */
const t: readonly number[] = [Number.NaN, 0.34, 1 / 2, 1, 7 / 3, 14 / 3];

/** Saturated-vapour density of CO2 in kg/m³ at T in K, Eq. (3.15); no range check. */
export function saturatedVaporDensity(temperatureK: number): number {
  const x = 1 - temperatureK / Tc;
  let sum = 0;
  for (let i = 1; i <= 5; i++) sum += a[i]! * x ** t[i]!;
  return rhoc * Math.exp(sum);
}
