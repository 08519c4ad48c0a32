/**
 * Sublimation pressure of carbon dioxide (solid–vapour coexistence, dry ice) as a function of
 * temperature.
 *
 * Source: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509-1596 (1996),
 *   doi:10.1063/1.555991, ancillary sublimation-pressure equation, Eq. (3.12).
 * Valid: up to T_t = 216.592 K; the paper's lower temperature limit is not transcribed here.
 *   Phasecell uses the equation from 154 K (SUBLIMATION_T_MIN), the lowest temperature of the
 *   vapour pressures of solid CO2 measured by W. F. Giauque, C. J. Egan, J. Chem. Phys. 5, 45
 *   (1937), which it matches within 0.2 % from 160 K to 196 K and within 0.9 % at 154 K (see the tests).
 * Uncertainty: stated in the paper for the ancillary equation (not transcribed here).
 * Notation: ln(p_sub/p_t) = (T_t/T) · [a_1 (1 − T/T_t) + a_2 (1 − T/T_t)^1.9 + a_3 (1 − T/T_t)^2.9],
 *   with T_t and p_t of the paper.
 * Deviations from the text: none.
 */
import { SW96_TRIPLE_PRESSURE as pt, SW96_TRIPLE_TEMPERATURE as Tt } from "./fixed-points";

/** Eq. (3.12) coefficients a_i, i = 1…3 (index 0 unused). */
const a: readonly number[] = [Number.NaN, -14.740846, 2.4327015, -5.3061778];
/** Eq. (3.12) exponents, i = 1…3 (index 0 unused). */
const t: readonly number[] = [Number.NaN, 1, 1.9, 2.9];

/** Lowest temperature at which Phasecell uses Eq. (3.12), K (see the module header). */
export const SUBLIMATION_T_MIN = 154;
/** Highest temperature of Eq. (3.12), the triple point, K. */
export const SUBLIMATION_T_MAX = Tt;

/** Sublimation pressure of CO2 in Pa at T in K, Eq. (3.12); no range check. */
export function sublimationPressure(temperatureK: number): number {
  const x = 1 - temperatureK / Tt;
  let sum = 0;
  for (let i = 1; i <= 3; i++) sum += a[i]! * x ** t[i]!;
  return pt * Math.exp((Tt / temperatureK) * sum);
}
