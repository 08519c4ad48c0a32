/**
 * Thermodynamic properties of water vapour, IAPWS-IF97 region 2 (basic equation, Gibbs free
 * energy g(p, T) as an ideal-gas part plus a residual part).
 *
 * Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 *   Properties of Water and Steam (IAPWS R7-97(2012)), Sec. 6.1: basic equation Eqs. (15)–(17),
 *   ideal-gas coefficients Table 10, residual coefficients Table 11, property relations and
 *   derivatives of gamma as given there; check values Table 15. This is the basic equation for
 *   stable vapour, not the metastable-vapour Eq. (18) (whose n°1, n°2 and residual part differ).
 * Valid (p above 0 throughout): 273.15 K ≤ T ≤ 623.15 K for p ≤ p_s(T); T above 623.15 K up to
 *   863.15 K for p ≤ p_B23(T); T above 863.15 K up to 1073.15 K for p ≤ 100 MPa. No range check here;
 *   regions.ts selects the region and rejects states outside IF97. (Below 273.15 K, vapour over
 *   ice, the equation is an extrapolation; whoever uses it there must say so.)
 * Uncertainty: given in the release only as figures for v, c_p and w (not transcribed); none is
 *   stated for h.
 * Notation: gamma = g/(RT) = gamma0 + gammaR, pi = p/p*, tau = T* / T with p* = 1 MPa,
 *   T* = 540 K; gamma0 = ln(pi) + Σ(i=1..9) n0_i tau^J0_i (n°_i, J°_i in the release);
 *   gammaR = Σ(i=1..43) n_i pi^I_i (tau − 0.5)^J_i.
 * Deviations from the text: none. SI in and out. The residual sums are accumulated as
 *   pi·gammaR_pi, pi²·gammaR_pipi, … (I·term, I(I−1)·term, …), the combinations the property
 *   relations use, so nothing is divided by pi and a call creates no arrays.
 */
import { gammaSplitProperties, IF97_GAS_CONSTANT as R, integerPower, type FluidProperties } from "./properties";

/** IF97 Table 10, exponents J°_i, i = 1…9 (index 0 unused). */
const J0: readonly number[] = [
  Number.NaN,
  0, 1, -5, -4, -3, -2, -1, 2, 3,
];

/** IF97 Table 10, coefficients n°_i of the ideal-gas part, Eq. (16). */
const n0: readonly number[] = [
  Number.NaN,
  -0.96927686500217e1, // 1
  0.10086655968018e2, // 2
  -0.56087911283020e-2, // 3
  0.71452738081455e-1, // 4
  -0.40710498223928, // 5
  0.14240819171444e1, // 6
  -0.43839511319450e1, // 7
  -0.28408632460772, // 8
  0.21268463753307e-1, // 9
];

/** IF97 Table 11, exponents I_i, i = 1…43 (index 0 unused). */
const I: readonly number[] = [
  Number.NaN,
  1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4, 4, 5, 6, 6, 6, 7, 7, 7, 8, 8, 9, 10, 10, 10,
  16, 16, 18, 20, 20, 20, 21, 22, 23, 24, 24, 24,
];

/** IF97 Table 11, exponents J_i. */
const J: readonly number[] = [
  Number.NaN,
  0, 1, 2, 3, 6, 1, 2, 4, 7, 36, 0, 1, 3, 6, 35, 1, 2, 3, 7, 3, 16, 35, 0, 11, 25, 8, 36, 13, 4,
  10, 14, 29, 50, 57, 20, 35, 48, 21, 53, 39, 26, 40, 58,
];

/** IF97 Table 11, coefficients n_i of the residual part, Eq. (17). */
const n: readonly number[] = [
  Number.NaN,
  -0.17731742473213e-2, // 1
  -0.17834862292358e-1, // 2
  -0.45996013696365e-1, // 3
  -0.57581259083432e-1, // 4
  -0.50325278727930e-1, // 5
  -0.33032641670203e-4, // 6
  -0.18948987516315e-3, // 7
  -0.39392777243355e-2, // 8
  -0.43797295650573e-1, // 9
  -0.26674547914087e-4, // 10
  0.20481737692309e-7, // 11
  0.43870667284435e-6, // 12
  -0.32277677238570e-4, // 13
  -0.15033924542148e-2, // 14
  -0.40668253562649e-1, // 15
  -0.78847309559367e-9, // 16
  0.12790717852285e-7, // 17
  0.48225372718507e-6, // 18
  0.22922076337661e-5, // 19
  -0.16714766451061e-10, // 20
  -0.21171472321355e-2, // 21
  -0.23895741934104e2, // 22
  -0.59059564324270e-17, // 23
  -0.12621808899101e-5, // 24
  -0.38946842435739e-1, // 25
  0.11256211360459e-10, // 26
  -0.82311340897998e1, // 27
  0.19809712802088e-7, // 28
  0.10406965210174e-18, // 29
  -0.10234747095929e-12, // 30
  -0.10018179379511e-8, // 31
  -0.80882908646985e-10, // 32
  0.10693031879409, // 33
  -0.33662250574171, // 34
  0.89185845355421e-24, // 35
  0.30629316876232e-12, // 36
  -0.42002467698208e-5, // 37
  -0.59056029685639e-25, // 38
  0.37826947613457e-5, // 39
  -0.12768608934681e-14, // 40
  0.73087610595061e-28, // 41
  0.55414715350778e-16, // 42
  -0.94369707241210e-6, // 43
];

/** Reducing pressure p*, Pa (IF97 Eq. (15): 1 MPa). */
const pStar = 1e6;
/** Reducing temperature T*, K (IF97 Eq. (15)). */
const tStar = 540;

/**
 * Properties of water vapour in IF97 region 2 at temperature T (K) and pressure p (Pa).
 * No range check: see the module header for where the equation is valid.
 */
export function region2(temperatureK: number, pressurePa: number): FluidProperties {
  const pi = pressurePa / pStar;
  const tau = tStar / temperatureK;

  let gamma0 = Math.log(pi);
  let tauGamma0Tau = 0;
  let tau2Gamma0TauTau = 0;
  for (let i = 1; i <= 9; i++) {
    const Ji = J0[i]!;
    const term = n0[i]! * integerPower(tau, Ji);
    gamma0 += term;
    tauGamma0Tau += Ji * term;
    tau2Gamma0TauTau += Ji * (Ji - 1) * term;
  }

  const b = tau - 0.5;
  let gammaR = 0;
  let sI = 0;
  let sII = 0;
  let sJ = 0;
  let sJJ = 0;
  let sIJ = 0;
  for (let i = 1; i <= 43; i++) {
    const Ii = I[i]!;
    const Ji = J[i]!;
    const term = n[i]! * integerPower(pi, Ii) * integerPower(b, Ji);
    gammaR += term;
    sI += Ii * term;
    sII += Ii * (Ii - 1) * term;
    sJ += Ji * term;
    sJJ += Ji * (Ji - 1) * term;
    sIJ += Ii * Ji * term;
  }
  const piGammaRPi = sI;
  const pi2GammaRPiPi = sII;
  const tauGammaRTau = (tau * sJ) / b;
  const tau2GammaRTauTau = (tau * tau * sJJ) / (b * b);
  const tauPiGammaRPiTau = (tau * sIJ) / b;

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

/**
 * Specific enthalpy alone, J/kg, in IF97 region 2: h = R·T·tau·(gamma0_tau + gammaR_tau)
 * (release Table 12), the same sums as {@link region2} without the other derivatives, for the
 * path-energy hot path. The powers of pi are carried forward, as I_i never decreases along
 * Table 11.
 */
export function region2Enthalpy(temperatureK: number, pressurePa: number): number {
  const pi = pressurePa / pStar;
  const tau = tStar / temperatureK;
  let tauGamma0Tau = 0;
  for (let i = 1; i <= 9; i++) {
    const Ji = J0[i]!;
    tauGamma0Tau += Ji * n0[i]! * integerPower(tau, Ji);
  }
  const b = tau - 0.5;
  let piPower = 1;
  let piExponent = 0;
  let sJ = 0;
  for (let i = 1; i <= 43; i++) {
    const Ii = I[i]!;
    if (Ii !== piExponent) {
      piPower *= integerPower(pi, Ii - piExponent);
      piExponent = Ii;
    }
    const Ji = J[i]!;
    sJ += Ji * n[i]! * piPower * integerPower(b, Ji);
  }
  return R * temperatureK * (tauGamma0Tau + (tau * sJ) / b);
}
