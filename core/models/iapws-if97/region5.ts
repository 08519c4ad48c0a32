/**
 * Thermodynamic properties of steam at high temperature, IAPWS-IF97 region 5 (basic equation,
 * Gibbs free energy g(p, T) as an ideal-gas part plus a residual part).
 *
 * Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 *   Properties of Water and Steam (IAPWS R7-97(2012)), Sec. 9: basic equation Eqs. (32)–(34),
 *   ideal-gas coefficients Table 37, residual coefficients Table 38; check values Table 42. The
 *   2007 revision extended the pressure range of this region from 10 MPa to 50 MPa; the
 *   coefficients are unchanged.
 * Valid: T above 1073.15 K up to 2273.15 K, p above 0 up to 50 MPa, for pure undissociated
 *   water. No range check here; regions.ts selects the region and rejects states outside IF97.
 * Uncertainty: given in the release only as figures (not transcribed); none is stated for h.
 * Notation: gamma = g/(RT) = gamma0 + gammaR, pi = p/p*, tau = T* / T with p* = 1 MPa,
 *   T* = 1000 K; gamma0 = ln(pi) + Σ(i=1..6) n0_i tau^J0_i (n°_i, J°_i in the release);
 *   gammaR = Σ(i=1..6) n_i pi^I_i tau^J_i (tau itself, not tau − 0.5 as in region 2). The
 *   property relations are those of region 2.
 * Deviations from the text: none. SI in and out; sums accumulated as in region2.ts.
 */
import { gammaSplitProperties, integerPower, type FluidProperties } from "./properties";

/** IF97 Table 37, exponents J°_i, i = 1…6 (index 0 unused). */
const J0: readonly number[] = [
  Number.NaN,
  0, 1, -3, -2, -1, 2,
];

/** IF97 Table 37, coefficients n°_i of the ideal-gas part, Eq. (33). */
const n0: readonly number[] = [
  Number.NaN,
  -0.13179983674201e2, // 1
  0.68540841634434e1, // 2
  -0.24805148933466e-1, // 3
  0.36901534980333, // 4
  -0.31161318213925e1, // 5
  -0.32961626538917, // 6
];

/** IF97 Table 38, exponents I_i, i = 1…6 (index 0 unused). */
const I: readonly number[] = [
  Number.NaN,
  1, 1, 1, 2, 2, 3,
];

/** IF97 Table 38, exponents J_i. */
const J: readonly number[] = [
  Number.NaN,
  1, 2, 3, 3, 9, 7,
];

/** IF97 Table 38, coefficients n_i of the residual part, Eq. (34). */
const n: readonly number[] = [
  Number.NaN,
  0.15736404855259e-2, // 1
  0.90153761673944e-3, // 2
  -0.50270077677648e-2, // 3
  0.22440037409485e-5, // 4
  -0.41163275453471e-5, // 5
  0.37919454822955e-7, // 6
];

/** Reducing pressure p*, Pa (IF97 Eq. (32): 1 MPa). */
const pStar = 1e6;
/** Reducing temperature T*, K (IF97 Eq. (32)). */
const tStar = 1000;

/**
 * Properties of steam in IF97 region 5 at temperature T (K) and pressure p (Pa).
 * No range check: see the module header for where the equation is valid.
 */
export function region5(temperatureK: number, pressurePa: number): FluidProperties {
  const pi = pressurePa / pStar;
  const tau = tStar / temperatureK;

  let gamma0 = Math.log(pi);
  let tauGamma0Tau = 0;
  let tau2Gamma0TauTau = 0;
  for (let i = 1; i <= 6; i++) {
    const Ji = J0[i]!;
    const term = n0[i]! * integerPower(tau, Ji);
    gamma0 += term;
    tauGamma0Tau += Ji * term;
    tau2Gamma0TauTau += Ji * (Ji - 1) * term;
  }

  let gammaR = 0;
  let piGammaRPi = 0;
  let pi2GammaRPiPi = 0;
  let tauGammaRTau = 0;
  let tau2GammaRTauTau = 0;
  let tauPiGammaRPiTau = 0;
  for (let i = 1; i <= 6; i++) {
    const Ii = I[i]!;
    const Ji = J[i]!;
    const term = n[i]! * integerPower(pi, Ii) * integerPower(tau, Ji);
    gammaR += term;
    piGammaRPi += Ii * term;
    pi2GammaRPiPi += Ii * (Ii - 1) * term;
    tauGammaRTau += Ji * term;
    tau2GammaRTauTau += Ji * (Ji - 1) * term;
    tauPiGammaRPiTau += Ii * Ji * term;
  }

  return gammaSplitProperties(
    temperatureK,
    pressurePa,
    gamma0 + gammaR,
    tauGamma0Tau + tauGammaRTau,
    tau2Gamma0TauTau + tau2GammaRTauTau,
    piGammaRPi,
    pi2GammaRPiPi,
    tauPiGammaRPiTau,
  );
}
