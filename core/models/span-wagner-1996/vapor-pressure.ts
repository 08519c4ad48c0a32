/**
 * Vapour pressure of carbon dioxide (liquid–vapour coexistence) as a function of temperature, and
 * its inverse.
 *
 * Source: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509-1596 (1996),
 *   doi:10.1063/1.555991, ancillary vapour-pressure equation, Eq. (3.13), with its four
 *   coefficients and exponents.
 * Valid: T_t = 216.592 K ≤ T ≤ T_c = 304.1282 K.
 * Uncertainty: stated in the paper for the ancillary equation (not transcribed here). The
 *   equation is an ancillary fit, not the phase equilibrium of the paper's equation of state; it
 *   differs from that equilibrium (Maxwell criterion, see phase-equilibrium.ts) by −0.0042 % to
 *   +0.0025 % (at most 141 Pa, near 293.7 K) from 216.592 K to 304 K, and from the pressures of
 *   the paper's saturation table by at most 146 Pa (0.0039 %), measured in the tests.
 * Notation: ln(p_s/p_c) = (T_c/T) · Σ(i=1..4) a_i (1 − T/T_c)^t_i. The exponents are 1, 1.5, 2
 *   and 4 (this is not the 1.5-3-6 or 2.5-5 form of other vapour-pressure equations).
 * Deviations from the text: none. The inverse T_s(p) is not a published equation: it solves
 *   Eq. (3.13) with the bracketed solver of core/numerics.
 */
import { solveBracketed } from "../../numerics/roots";
import {
  SW96_CRITICAL_PRESSURE as pc,
  SW96_CRITICAL_TEMPERATURE as Tc,
  SW96_TRIPLE_TEMPERATURE as Tt,
} from "./fixed-points";

/** Eq. (3.13) coefficients a_i, i = 1…4 (index 0 unused). */
const a: readonly number[] = [Number.NaN, -7.0602087, 1.9391218, -1.6463597, -3.2995634];
/** Eq. (3.13) exponents t_i, i = 1…4 (index 0 unused). */
const t: readonly number[] = [Number.NaN, 1.0, 1.5, 2.0, 4.0];

/** Lowest temperature of Eq. (3.13), the triple point, K. */
export const VAPOR_PRESSURE_T_MIN = Tt;
/** Highest temperature of Eq. (3.13), the critical point, K. */
export const VAPOR_PRESSURE_T_MAX = Tc;

/** Vapour pressure of CO2 in Pa at T in K, Eq. (3.13); no range check. */
export function vaporPressure(temperatureK: number): number {
  const x = 1 - temperatureK / Tc;
  let sum = 0;
  for (let i = 1; i <= 4; i++) sum += a[i]! * x ** t[i]!;
  return pc * Math.exp((Tc / temperatureK) * sum);
}

/**
 * Eq. (3.13) at the triple-point temperature, Pa: 0.5179618 MPa, 11.8 Pa above the paper's
 * triple-point pressure of 0.51795 MPa (the ancillary equation and the fixed point agree to
 * 0.0023 %).
 */
export const VAPOR_PRESSURE_AT_T_MIN = vaporPressure(Tt);

/**
 * Temperature in K at which Eq. (3.13) gives p in Pa, for p from Eq. (3.13) at T_t to p_c; no range
 * check (outside that range the solver reports no sign change). Solved in ln p, which is close to
 * linear in 1/T, to the last bit of T.
 */
export function vaporPressureTemperature(pressurePa: number): number {
  if (pressurePa === pc) return Tc;
  const target = Math.log(pressurePa);
  return solveBracketed((temperatureK) => Math.log(vaporPressure(temperatureK)) - target, Tt, Tc, {
    relTolerance: Number.EPSILON / 2,
  });
}
