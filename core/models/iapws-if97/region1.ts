/**
 * Thermodynamic properties of liquid water, IAPWS-IF97 region 1 (basic equation, Gibbs free
 * energy g(p, T)).
 *
 * Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 *   Properties of Water and Steam (IAPWS R7-97(2012)), Sec. 5.1: basic equation Eq. (7),
 *   coefficients Table 2, property relations and derivatives of gamma as given there; check values
 *   Table 5.
 * Valid: 273.15 K ≤ T ≤ 623.15 K, p_s(T) ≤ p ≤ 100 MPa (p_s from region 4, Eq. (30)). No range
 *   check here; regions.ts selects the region and rejects states outside IF97.
 * Uncertainty: the release gives the uncertainties of v, c_p and w only as figures (not
 *   transcribed) and none for h; it states that isobaric enthalpy differences are known better
 *   than c_p. The energy zero is the IAPWS one: n3 and n4 were set so that u and s of the
 *   saturated liquid at the triple point vanish (Eq. (10): h' = 0.611783 J/kg there).
 * Notation: gamma = g/(RT), pi = p/p*, tau = T* / T with p* = 16.53 MPa, T* = 1386 K;
 *   gamma = Σ(i=1..34) n_i (7.1 − pi)^I_i (tau − 1.222)^J_i. Subscripts pi and tau (gammaPi …)
 *   are partial derivatives.
 * Deviations from the text: none. SI in and out (K, Pa, J/kg, J/(kg·K), m³/kg, m/s); the release's
 *   MPa and kJ are converted through p* and R. Each term's derivatives are accumulated as
 *   I·term, J·term … and divided once by (7.1 − pi) and (tau − 1.222), which is the same sum
 *   regrouped, so a call creates no arrays and evaluates two powers per term.
 */
import { IF97_GAS_CONSTANT as R, integerPower, type FluidProperties } from "./properties";

/** IF97 Table 2, exponents I_i, i = 1…34 (index 0 unused so that I[i] reads as in the release). */
const I: readonly number[] = [
  Number.NaN,
  0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29,
  30, 31, 32,
];

/** IF97 Table 2, exponents J_i. */
const J: readonly number[] = [
  Number.NaN,
  -2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11,
  -6, -29, -31, -38, -39, -40, -41,
];

/** IF97 Table 2, coefficients n_i. */
const n: readonly number[] = [
  Number.NaN,
  0.14632971213167, // 1
  -0.84548187169114, // 2
  -0.37563603672040e1, // 3
  0.33855169168385e1, // 4
  -0.95791963387872, // 5
  0.15772038513228, // 6
  -0.16616417199501e-1, // 7
  0.81214629983568e-3, // 8
  0.28319080123804e-3, // 9
  -0.60706301565874e-3, // 10
  -0.18990068218419e-1, // 11
  -0.32529748770505e-1, // 12
  -0.21841717175414e-1, // 13
  -0.52838357969930e-4, // 14
  -0.47184321073267e-3, // 15
  -0.30001780793026e-3, // 16
  0.47661393906987e-4, // 17
  -0.44141845330846e-5, // 18
  -0.72694996297594e-15, // 19
  -0.31679644845054e-4, // 20
  -0.28270797985312e-5, // 21
  -0.85205128120103e-9, // 22
  -0.22425281908000e-5, // 23
  -0.65171222895601e-6, // 24
  -0.14341729937924e-12, // 25
  -0.40516996860117e-6, // 26
  -0.12734301741641e-8, // 27
  -0.17424871230634e-9, // 28
  -0.68762131295531e-18, // 29
  0.14478307828521e-19, // 30
  0.26335781662795e-22, // 31
  -0.11947622640071e-22, // 32
  0.18228094581404e-23, // 33
  -0.93537087292458e-25, // 34
];

/** Reducing pressure p*, Pa (IF97 Eq. (7): 16.53 MPa). */
const pStar = 16.53e6;
/** Reducing temperature T*, K (IF97 Eq. (7)). */
const tStar = 1386;

/**
 * Properties of liquid water in IF97 region 1 at temperature T (K) and pressure p (Pa).
 * No range check: see the module header for where the equation is valid.
 */
export function region1(temperatureK: number, pressurePa: number): FluidProperties {
  const pi = pressurePa / pStar;
  const tau = tStar / temperatureK;
  const a = 7.1 - pi;
  const b = tau - 1.222;
  let gamma = 0;
  let sI = 0;
  let sII = 0;
  let sJ = 0;
  let sJJ = 0;
  let sIJ = 0;
  for (let i = 1; i <= 34; i++) {
    const Ii = I[i]!;
    const Ji = J[i]!;
    const term = n[i]! * integerPower(a, Ii) * integerPower(b, Ji);
    gamma += term;
    sI += Ii * term;
    sII += Ii * (Ii - 1) * term;
    sJ += Ji * term;
    sJJ += Ji * (Ji - 1) * term;
    sIJ += Ii * Ji * term;
  }
  const gammaPi = -sI / a;
  const gammaPiPi = sII / (a * a);
  const gammaTau = sJ / b;
  const gammaTauTau = sJJ / (b * b);
  const gammaPiTau = -sIJ / (a * b);

  const RT = R * temperatureK;
  // v = (RT/p)·pi·gammaPi, and pi/p = 1/p*.
  const specificVolume = (RT * gammaPi) / pStar;
  const enthalpy = RT * tau * gammaTau;
  const internalEnergy = RT * (tau * gammaTau - pi * gammaPi);
  const entropy = R * (tau * gammaTau - gamma);
  const isobaricHeatCapacity = -R * tau * tau * gammaTauTau;
  const x = gammaPi - tau * gammaPiTau;
  const speedOfSound = Math.sqrt(
    (RT * gammaPi * gammaPi) / ((x * x) / (tau * tau * gammaTauTau) - gammaPiPi),
  );
  return {
    specificVolume,
    density: 1 / specificVolume,
    enthalpy,
    internalEnergy,
    entropy,
    isobaricHeatCapacity,
    speedOfSound,
  };
}

/**
 * Specific enthalpy alone, J/kg, in IF97 region 1: h = R·T·tau·gamma_tau (release Table 3), the
 * same sum as {@link region1} but without the other derivatives, for the path-energy hot path.
 * The powers of (7.1 − pi) are carried forward, as I_i never decreases along Table 2.
 */
export function region1Enthalpy(temperatureK: number, pressurePa: number): number {
  const pi = pressurePa / pStar;
  const tau = tStar / temperatureK;
  const a = 7.1 - pi;
  const b = tau - 1.222;
  let aPower = 1;
  let aExponent = 0;
  let sJ = 0;
  for (let i = 1; i <= 34; i++) {
    const Ii = I[i]!;
    if (Ii !== aExponent) {
      aPower *= integerPower(a, Ii - aExponent);
      aExponent = Ii;
    }
    const Ji = J[i]!;
    sJ += Ji * n[i]! * aPower * integerPower(b, Ji);
  }
  return R * temperatureK * tau * (sJ / b);
}
