/**
 * Melting pressure of carbon dioxide (solid–liquid coexistence) as a function of temperature,
 * and its algebraic inverse.
 *
 * Source: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509-1596 (1996),
 *   doi:10.1063/1.555991, ancillary melting-pressure equation, Eq. (3.10).
 * Valid: from T_t = 216.592 K upwards; the paper's upper temperature limit for Eq. (3.10) is not
 *   transcribed here. The equation reaches 800 MPa, the upper pressure limit of the paper's
 *   equation of state, at 327.67 K (see MELTING_T_AT_800_MPA); Phasecell uses it up to there.
 * Uncertainty: stated in the paper for the ancillary equation (not transcribed here). It agrees
 *   with the melting pressures measured by A. Michels et al., Physica 9 (1942), within 0.2 %
 *   at 217 K to 266 K (see the tests).
 * Notation: p_m/p_t = 1 + a_1 (T/T_t − 1) + a_2 (T/T_t − 1)², with T_t and p_t of the paper.
 * Deviations from the text: none. The inverse T_m(p) is not a separate published equation: it is
 *   the positive root of the same quadratic, written as −2c / (a_1 + √(a_1² − 4 a_2 c)) with
 *   c = 1 − p/p_t so that no digits cancel near the triple point.
 */
import { SW96_P_MAX, SW96_TRIPLE_PRESSURE as pt, SW96_TRIPLE_TEMPERATURE as Tt } from "./fixed-points";

/** Eq. (3.10) coefficient a_1. */
const a1 = 1955.539;
/** Eq. (3.10) coefficient a_2. */
const a2 = 2055.4593;

/** Melting pressure of CO2 in Pa at T in K, Eq. (3.10); no range check. */
export function meltingPressure(temperatureK: number): number {
  const x = temperatureK / Tt - 1;
  return pt * (1 + a1 * x + a2 * x * x);
}

/**
 * Temperature in K at which Eq. (3.10) gives p in Pa, for p at or above p_t; no range check (below
 * p_t it returns temperatures below T_t, where Eq. (3.10) does not apply).
 */
export function meltingTemperature(pressurePa: number): number {
  const c = 1 - pressurePa / pt;
  const x = (-2 * c) / (a1 + Math.sqrt(a1 * a1 - 4 * a2 * c));
  return Tt * (1 + x);
}

/** Lowest temperature of Eq. (3.10), the triple point, K. */
export const MELTING_T_MIN = Tt;
/**
 * Temperature at which Eq. (3.10) reaches 800 MPa, the upper pressure limit of the paper's equation
 * of state, K (327.673 K): the upper end of the melting curve in Phasecell.
 */
export const MELTING_T_AT_800_MPA = meltingTemperature(SW96_P_MAX);
