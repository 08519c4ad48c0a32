/**
 * Saturation pressure and saturation temperature of water (liquid–vapour), IAPWS-IF97 region 4.
 *
 * Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 *   Properties of Water and Steam (IAPWS R7-97(2012)), Sec. 8: saturation equation Eq. (29),
 *   basic equation p_s(T) Eq. (30), backward equation T_s(p) Eq. (31), coefficients Table 34.
 * Valid: 273.15 K ≤ T ≤ 647.096 K, i.e. 611.213 Pa ≤ p ≤ 22.064 MPa. The release allows the line
 *   from the triple point (273.16 K) down to 273.15 K; Phasecell serves liquid–vapour saturation
 *   from the triple point up, sublimation below it.
 * Uncertainty: Table 44 gives the inconsistency of Eq. (30) with the phase equilibrium of the IF97
 *   basic equations: |Δp_s/p_s| ≤ 0.0069 % below 623.15 K, ≤ 0.0026 % from 623.15 K to T_c;
 *   |ΔT_s/T_s| ≤ 0.0006 %. Eq. (31) is the exact inverse of Eq. (30). Against IAPWS-95 the
 *   release's Fig. 6 shows the uncertainty of p_s graphically (not transcribed).
 * Notation: beta = (p_s/p*)^(1/4), theta (ϑ) = T_s/T* + n9/(T_s/T* − n10), p* = 1 MPa, T* = 1 K.
 * Deviations from the text: none. Functions take and return SI (K, Pa); the release's MPa is
 *   converted at the edges.
 */

/** IF97 Table 34, n1 … n10 (index 0 unused so that n[i] reads as in the release). */
const n: readonly number[] = [
  Number.NaN,
  0.11670521452767e4,
  -0.72421316703206e6,
  -0.17073846940092e2,
  0.12020824702470e5,
  -0.32325550322333e7,
  0.14915108613530e2,
  -0.48232657361591e4,
  0.40511340542057e6,
  -0.23855557567849,
  0.65017534844798e3,
];

const pStarPa = 1e6;
const tStarK = 1;

/** Lowest temperature of region 4, K (IF97 Sec. 8). */
export const REGION4_T_MIN = 273.15;
/** Critical temperature, K: upper end of region 4 (IF97 Eq. (2)). */
export const REGION4_T_MAX = 647.096;
/** Critical pressure, Pa: upper end of region 4 (IF97 Eq. (3)). */
export const REGION4_P_MAX = 22.064e6;

/** Saturation pressure p_s(T) in Pa from IF97 Eq. (30); T in K, no range check. */
export function saturationPressureIF97(temperatureK: number): number {
  const ts = temperatureK / tStarK;
  const theta = ts + n[9]! / (ts - n[10]!);
  const A = theta * theta + n[1]! * theta + n[2]!;
  const B = n[3]! * theta * theta + n[4]! * theta + n[5]!;
  const C = n[6]! * theta * theta + n[7]! * theta + n[8]!;
  const ratio = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  return pStarPa * ratio ** 4;
}

/** Saturation temperature T_s(p) in K from IF97 Eq. (31); p in Pa, no range check. */
export function saturationTemperatureIF97(pressurePa: number): number {
  const beta = (pressurePa / pStarPa) ** 0.25;
  const E = beta * beta + n[3]! * beta + n[6]!;
  const F = n[1]! * beta * beta + n[4]! * beta + n[7]!;
  const G = n[2]! * beta * beta + n[5]! * beta + n[8]!;
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  const sum = n[10]! + D;
  return (tStarK * (sum - Math.sqrt(sum * sum - 4 * (n[9]! + n[10]! * D)))) / 2;
}
