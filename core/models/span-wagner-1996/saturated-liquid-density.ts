/**
 * Density of saturated liquid carbon dioxide as a function of temperature.
 *
 * Source: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509-1596 (1996),
 *   doi:10.1063/1.555991, ancillary equation for the saturated-liquid density, Eq. (3.14).
 * Valid: T_t = 216.592 K ≤ T ≤ T_c = 304.1282 K.
 * Uncertainty: stated in the paper for the ancillary equation (not transcribed here); it agrees
 *   with the saturated-liquid density of the paper's equation of state within 0.01 % from
 *   216.592 K to 302 K (measured in the tests).
 * Notation: ln(rho'/rho_c) = Σ(i=1..4) a_i (1 − T/T_c)^t_i (no T_c/T factor).
 * Deviations from the text: none.
 */
import { SW96_CRITICAL_DENSITY as rhoc, SW96_CRITICAL_TEMPERATURE as Tc } from "./fixed-points";

/** Eq. (3.14) coefficients a_i, i = 1…4 (index 0 unused). */
const a: readonly number[] = [Number.NaN, 1.9245108, -0.62385555, -0.32731127, 0.39245142];
/** Eq. (3.14) exponents t_i, i = 1…4 (index 0 unused): 0.34, 1/2, 10/6, 11/6. */
const t: readonly number[] = [Number.NaN, 0.34, 1 / 2, 10 / 6, 11 / 6];

/** Saturated-liquid density of CO2 in kg/m³ at T in K, Eq. (3.14); no range check. */
export function saturatedLiquidDensity(temperatureK: number): number {
  const x = 1 - temperatureK / Tc;
  let sum = 0;
  for (let i = 1; i <= 4; i++) sum += a[i]! * x ** t[i]!;
  return rhoc * Math.exp(sum);
}
