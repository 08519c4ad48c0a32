/**
 * Saturation temperature of helium-4 as a function of its vapour pressure: the ITS-90 defining
 * equations, and their inverse p(T).
 *
 * Source: H. Preston-Thomas, The International Temperature Scale of 1990 (ITS-90), Metrologia
 *   27, 3-10 (1990), Eq. (3) with the helium-4 coefficients of its Table 3 (two ranges).
 * Equation: T90 / K = A0 + Σ (i = 1 … 9) A_i [(ln(p / Pa) − B) / C]^i.
 * Valid: 1.25 K to 2.1768 K (helium II, below the lambda point on the saturation line) and
 *   2.1768 K to 5.0 K (helium I); the scale defines T90 by these equations, so they carry no
 *   uncertainty of their own on ITS-90 beyond its realisation.
 * Notation: A_i, B, C as printed in Table 3.
 * Deviations from the text: none. p(T) has no published form; it is solved from T(p) in ln p with
 *   the bracketed solver of core/numerics, inside each range's pressure interval. At the lambda
 *   point the two printed ranges give pressures 7e-7 apart (5041.815 Pa and 5041.8115 Pa,
 *   computed; 0.1 µK in temperature): each range is used on its own side of 2.1768 K, and T(p)
 *   switches at the upper range's lambda pressure.
 */
import { solveBracketed } from "../../numerics/roots";

/** One ITS-90 helium-4 range: coefficients A0 … A9, B, C of Table 3. */
interface Its90HeliumRange {
  readonly tMin: number;
  readonly tMax: number;
  readonly A: readonly number[];
  readonly B: number;
  readonly C: number;
}

/** ITS-90 Table 3, helium-4, 1.25 K to 2.1768 K. */
const HE4_LOW: Its90HeliumRange = {
  tMin: 1.25,
  tMax: 2.1768,
  A: [1.392408, 0.527153, 0.166756, 0.050988, 0.026514, 0.001975, -0.017976, 0.005409, 0.013259, 0],
  B: 5.6,
  C: 2.9,
};

/** ITS-90 Table 3, helium-4, 2.1768 K to 5.0 K. */
const HE4_HIGH: Its90HeliumRange = {
  tMin: 2.1768,
  tMax: 5.0,
  A: [3.146631, 1.357655, 0.413923, 0.091159, 0.016349, 0.001826, -0.004325, -0.004973, 0, 0],
  B: 10.3,
  C: 1.9,
};

/** Lowest and highest temperature of the ITS-90 helium-4 vapour-pressure equations, K. */
export const ITS90_HE4_T_MIN = HE4_LOW.tMin;
export const ITS90_HE4_T_MAX = HE4_HIGH.tMax;
/** The lambda point on the saturation line, where the two ranges meet, K. */
export const ITS90_HE4_LAMBDA = HE4_LOW.tMax;

function temperatureInRange(range: Its90HeliumRange, lnP: number): number {
  const x = (lnP - range.B) / range.C;
  let sum = 0;
  for (let i = range.A.length - 1; i >= 1; i--) sum = (sum + range.A[i]!) * x;
  return range.A[0]! + sum;
}

/**
 * ln p at which a range gives temperature T, solved in a bracket of ln p that holds the whole
 * range (ln 10 to ln 1e4 Pa below the lambda point, ln 1e3 to ln 5e5 Pa above: the equations
 * give about 115 Pa at 1.25 K, 5.04 kPa at 2.1768 K and 196 kPa at 5.0 K).
 */
function lnPressureInRange(range: Its90HeliumRange, temperatureK: number): number {
  const [low, high] = range === HE4_LOW ? [Math.log(10), Math.log(1e4)] : [Math.log(1e3), Math.log(5e5)];
  return solveBracketed((lnP) => temperatureInRange(range, lnP) - temperatureK, low, high, {
    relTolerance: Number.EPSILON,
  });
}

/** Pressure at the lambda point of each range's equation, Pa: the ranges' shared end. */
const LAMBDA_LN_P = lnPressureInRange(HE4_HIGH, ITS90_HE4_LAMBDA);

/** Saturation temperature T90, K, at vapour pressure p in Pa (range checked by the caller). */
export function its90HeliumTemperature(pressurePa: number): number {
  const lnP = Math.log(pressurePa);
  return temperatureInRange(lnP < LAMBDA_LN_P ? HE4_LOW : HE4_HIGH, lnP);
}

/** Vapour pressure, Pa, at T90 in K (1.25 K to 5.0 K; range checked by the caller). */
export function its90HeliumPressure(temperatureK: number): number {
  return Math.exp(lnPressureInRange(temperatureK < ITS90_HE4_LAMBDA ? HE4_LOW : HE4_HIGH, temperatureK));
}
