/**
 * The boundary between IAPWS-IF97 regions 2 and 3 (the B23 equation): pressure as a function of
 * temperature and its inverse.
 *
 * Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 *   Properties of Water and Steam (IAPWS R7-97(2012)), Sec. 4: Eq. (5) pi(theta), Eq. (6)
 *   theta(pi), coefficients Table 1; check point T = 623.15 K, p = 16.5291643 MPa.
 * Valid: 623.15 K ≤ T ≤ 863.15 K, i.e. 16.5292 MPa ≤ p ≤ 100 MPa. No range check here.
 * Uncertainty: none applies; the line is a definition of the region boundary, roughly an
 *   isentrope, not a property.
 * Notation: pi = p/p*, theta = T/T* with p* = 1 MPa, T* = 1 K; pi = n1 + n2·theta + n3·theta²,
 *   theta = n4 + ((pi − n5)/n3)^(1/2).
 * Deviations from the text: none. SI in and out (K, Pa).
 */

/** IF97 Table 1, n1 … n5 (index 0 unused so that n[i] reads as in the release). */
const n: readonly number[] = [
  Number.NaN,
  0.34805185628969e3,
  -0.11671859879975e1,
  0.10192970039326e-2,
  0.57254459862746e3,
  0.13918839778870e2,
];

const pStar = 1e6;
const tStar = 1;

/** Pressure on the region 2–3 boundary, Pa, at temperature T in K (IF97 Eq. (5)); no range check. */
export function b23Pressure(temperatureK: number): number {
  const theta = temperatureK / tStar;
  return pStar * (n[1]! + n[2]! * theta + n[3]! * theta * theta);
}

/** Temperature on the region 2–3 boundary, K, at pressure p in Pa (IF97 Eq. (6)); no range check. */
export function b23Temperature(pressurePa: number): number {
  const pi = pressurePa / pStar;
  return tStar * (n[4]! + Math.sqrt((pi - n[5]!) / n[3]!));
}
