/**
 * Melting pressure of ices Ih, III, V, VI and VII (solid – liquid coexistence) as functions of
 * temperature.
 *
 * Source: IAPWS R14-08(2011), Revised Release on the Pressure along the Melting and Sublimation
 *   Curves of Ordinary Water Substance; W. Wagner, T. Riethmann, R. Feistel, A. H. Harvey,
 *   J. Phys. Chem. Ref. Data 40, 043103 (2011). Melting equations of Sec. 2 for each ice.
 * Valid (each ice on its own branch, bounded by the liquid triple points):
 *   ice Ih  251.165 K ≤ T ≤ 273.16 K  (611.657 Pa … 208.566 MPa, dp/dT negative)
 *   ice III 251.165 K ≤ T ≤ 256.164 K (208.566 … 350.1 MPa)
 *   ice V   256.164 K ≤ T ≤ 273.31 K  (350.1 … 632.4 MPa)
 *   ice VI  273.31 K  ≤ T ≤ 355 K     (632.4 … 2216 MPa)
 *   ice VII 355 K     ≤ T ≤ 715 K     (2216 MPa … 20.6 GPa)
 * Uncertainty: stated per branch in the release (not transcribed here). The ice Ih equation of
 *   2011 is derived from R10-06 and IAPWS-95 equilibrium; III was adjusted to meet it at
 *   251.165 K; V, VI and VII are the 1993 equations. Every branch reproduces the release's check
 *   values (260 K, 254 K, 265 K, 320 K, 550 K) to every printed digit.
 * Notation: theta = T/T*, pi = p/p* with (T*, p*) the liquid triple point at the low-temperature
 *   end of each branch (for ice Ih: T_t = 273.16 K, p_t = 611.657 Pa).
 * Deviations from the text: none.
 */

/** Branch bounds (T* and p* of each equation, in K and Pa), from R14-08(2011). */
export const ICE_IH = { tStar: 273.16, pStar: 611.657, tMin: 251.165, tMax: 273.16 } as const;
/** Ice III branch. */
export const ICE_III = { tStar: 251.165, pStar: 208.566e6, tMin: 251.165, tMax: 256.164 } as const;
/** Ice V branch. */
export const ICE_V = { tStar: 256.164, pStar: 350.1e6, tMin: 256.164, tMax: 273.31 } as const;
/** Ice VI branch. */
export const ICE_VI = { tStar: 273.31, pStar: 632.4e6, tMin: 273.31, tMax: 355 } as const;
/** Ice VII branch. */
export const ICE_VII = { tStar: 355, pStar: 2216e6, tMin: 355, tMax: 715 } as const;

/** Ice Ih coefficients a_i and exponents b_i, i = 1…3 (index 0 unused). */
const aIh: readonly number[] = [Number.NaN, 0.119539337e7, 0.808183159e5, 0.33382686e4];
const bIh: readonly number[] = [Number.NaN, 0.3e1, 0.2575e2, 0.10375e3];

/** Ice VII coefficients a_i and exponents b_i, i = 1…3 (index 0 unused). */
const aVII: readonly number[] = [Number.NaN, 0.173683e1, -0.544606e-1, 0.806106e-7];
const bVII: readonly number[] = [Number.NaN, -1, 5, 22];

/** Melting pressure of ice Ih, Pa: pi = 1 + Σ a_i (1 − theta^b_i). No range check. */
export function meltingPressureIceIh(temperatureK: number): number {
  const theta = temperatureK / ICE_IH.tStar;
  let sum = 1;
  for (let i = 1; i <= 3; i++) sum += aIh[i]! * (1 - theta ** bIh[i]!);
  return ICE_IH.pStar * sum;
}

/** Melting pressure of ice III, Pa: pi = 1 − 0.299948 (1 − theta^60). No range check. */
export function meltingPressureIceIII(temperatureK: number): number {
  const theta = temperatureK / ICE_III.tStar;
  return ICE_III.pStar * (1 - 0.299948 * (1 - theta ** 60));
}

/** Melting pressure of ice V, Pa: pi = 1 − 1.18721 (1 − theta^8). No range check. */
export function meltingPressureIceV(temperatureK: number): number {
  const theta = temperatureK / ICE_V.tStar;
  return ICE_V.pStar * (1 - 1.18721 * (1 - theta ** 8));
}

/** Melting pressure of ice VI, Pa: pi = 1 − 1.07476 (1 − theta^4.6). No range check. */
export function meltingPressureIceVI(temperatureK: number): number {
  const theta = temperatureK / ICE_VI.tStar;
  return ICE_VI.pStar * (1 - 1.07476 * (1 - theta ** 4.6));
}

/** Melting pressure of ice VII, Pa: ln(pi) = Σ a_i (1 − theta^b_i). No range check. */
export function meltingPressureIceVII(temperatureK: number): number {
  const theta = temperatureK / ICE_VII.tStar;
  let sum = 0;
  for (let i = 1; i <= 3; i++) sum += aVII[i]! * (1 - theta ** bVII[i]!);
  return ICE_VII.pStar * Math.exp(sum);
}
