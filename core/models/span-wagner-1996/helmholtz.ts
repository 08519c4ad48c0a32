/**
 * Thermodynamic properties of fluid carbon dioxide from the reference equation of state of Span
 * and Wagner, explicit in the Helmholtz free energy, at given density and temperature.
 *
 * Source: R. Span, W. Wagner, A New Equation of State for Carbon Dioxide Covering the Fluid Region
 *   from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa, J. Phys. Chem. Ref.
 *   Data 25, 1509-1596 (1996), doi:10.1063/1.555991: ideal-gas part phi° with the
 *   coefficients of Table 27, residual part phi^r with the 42 terms of Table 31 (7 polynomial, 27
 *   exponential, 5 Gaussian bell-shaped and 3 non-analytic terms), and the property relations of
 *   the Helmholtz form. Check values: the paper's single-phase property table (see the tests).
 * Valid: 216.592 K (triple point) ≤ T ≤ 1100 K, p ≤ 800 MPa, in the fluid region. No range check
 *   here; the substance module rejects states outside the range. The paper's abstract states that
 *   at least pressure, fugacity and enthalpy can be extrapolated up to the limits of the chemical
 *   stability of CO2; Phasecell does not go beyond 1100 K or 800 MPa, and extrapolates only to
 *   dilute vapour below the triple-point temperature (see core/substances/co2-enthalpy.ts).
 * Uncertainty: the paper's abstract gives, up to 30 MPa and 523 K, ±0.03 % to ±0.05 % in density,
 *   ±0.03 % to ±1 % in speed of sound and ±0.15 % to ±1.5 % in isobaric heat capacity; the figures
 *   for enthalpy and for the rest of the range are in the paper (not transcribed here).
 * Reference state: h = 0 and s = 0 for the ideal gas at T0 = 298.15 K and p0 = 0.101325 MPa (fixed
 *   by a°_1 and a°_2 of Table 27).
 * Notation: phi = a/(RT) = phi°(delta, tau) + phi^r(delta, tau), delta = rho/rho_c,
 *   tau = T_c/T, with rho_c = 467.6 kg/m³, T_c = 304.1282 K, R = 0.1889241 kJ/(kg·K);
 *   phi° = ln delta + a°_1 + a°_2 tau + a°_3 ln tau + Σ(i=4..8) a°_i ln(1 − exp(−theta°_i tau));
 *   phi^r = Σ(1..7) n_i delta^d_i tau^t_i + Σ(8..34) n_i delta^d_i tau^t_i exp(−delta^c_i)
 *   + Σ(35..39) n_i delta^d_i tau^t_i exp(−alpha_i (delta − eps_i)² − beta_i (tau − gamma_i)²)
 *   + Σ(40..42) n_i Delta^b_i delta psi, with Delta = theta² + B_i ((delta − 1)²)^a_i,
 *   theta = (1 − tau) + A_i ((delta − 1)²)^(1/(2 beta_i)),
 *   psi = exp(−C_i (delta − 1)² − D_i (tau − 1)²). Subscripts delta and tau on phi are partial
 *   derivatives.
 * Deviations from the text: none in the equation. The derivatives of the non-analytic terms
 *   vanish in the limit at the critical point itself (delta = tau = 1, where Delta = 0 and the
 *   formulas read 0·∞); they are set to that limit there. For the density solve (density.ts) the
 *   temperature-dependent factors of every term are computed once per isotherm, and the three
 *   non-analytic terms are left out of those sums where their factor exp(−D_i (tau − 1)²) makes
 *   them smaller than 2e-17 (see NON_ANALYTIC_CUTOFF).
 */
import {
  SW96_CRITICAL_DENSITY as rhoc,
  SW96_CRITICAL_TEMPERATURE as Tc,
  SW96_GAS_CONSTANT as R,
} from "./fixed-points";

/** Table 27, coefficients a°_i, i = 1…8 (index 0 unused). */
const a0: readonly number[] = [
  Number.NaN,
  8.37304456, // 1
  -3.70454304, // 2
  2.5, // 3
  1.99427042, // 4
  0.62105248, // 5
  0.41195293, // 6
  1.04028922, // 7
  0.08327678, // 8
];

/** Table 27, theta°_i, i = 4…8 (indices 0 to 3 unused). */
const theta0: readonly number[] = [
  Number.NaN,
  Number.NaN,
  Number.NaN,
  Number.NaN,
  3.15163, // 4
  6.1119, // 5
  6.77708, // 6
  11.32384, // 7
  27.08792, // 8
];

/** Table 31, coefficients n_i, i = 1…42 (index 0 unused). */
const n: readonly number[] = [
  Number.NaN,
  0.38856823203161, // 1
  0.2938547594274e1, // 2
  -0.55867188534934e1, // 3
  -0.76753199592477, // 4
  0.31729005580416, // 5
  0.54803315897767, // 6
  0.12279411220335, // 7
  0.2165896154322e1, // 8
  0.15841735109724e1, // 9
  -0.23132705405503, // 10
  0.58116916431436e-1, // 11
  -0.55369137205382, // 12
  0.48946615909422, // 13
  -0.24275739843501e-1, // 14
  0.62494790501678e-1, // 15
  -0.12175860225246, // 16
  -0.37055685270086, // 17
  -0.16775879700426e-1, // 18
  -0.11960736637987, // 19
  -0.45619362508778e-1, // 20
  0.35612789270346e-1, // 21
  -0.74427727132052e-2, // 22
  -0.17395704902432e-2, // 23
  -0.21810121289527e-1, // 24
  0.24332166559236e-1, // 25
  -0.37440133423463e-1, // 26
  0.14338715756878, // 27
  -0.13491969083286, // 28
  -0.2315122505348e-1, // 29
  0.12363125492901e-1, // 30
  0.2105832197294e-2, // 31
  -0.33958519026368e-3, // 32
  0.55993651771592e-2, // 33
  -0.30335118055646e-3, // 34
  -0.2136548868832e3, // 35
  0.26641569149272e5, // 36
  -0.24027212204557e5, // 37
  -0.28341603423999e3, // 38
  0.21247284400179e3, // 39
  -0.66642276540751, // 40
  0.72608632349897, // 41
  0.55068668612842e-1, // 42
];

/** Table 31, density exponents d_i, i = 1…39 (index 0 unused; terms 40 to 42 have none). */
const d: readonly number[] = [
  Number.NaN,
  1, 1, 1, 1, 2, 2, 3, // 1-7
  1, 2, 4, 5, 5, 5, 6, 6, 6, 1, 1, 4, 4, 4, 7, 8, 2, 3, 3, 5, 5, 6, 7, 8, 10, 4, 8, // 8-34
  2, 2, 2, 3, 3, // 35-39
];

/** Table 31, temperature exponents t_i, i = 1…39 (index 0 unused; terms 40 to 42 have none). */
const t: readonly number[] = [
  Number.NaN,
  0.0, 0.75, 1.0, 2.0, 0.75, 2.0, 0.75, // 1-7
  1.5, 1.5, 2.5, 0.0, 1.5, 2.0, 0.0, 1.0, 2.0, 3.0, 6.0, 3.0, 6.0, 8.0, 6.0, 0.0, 7.0, 12.0, 16.0,
  22.0, 24.0, 16.0, 24.0, 8.0, 2.0, 28.0, 14.0, // 8-34
  1.0, 0.0, 1.0, 3.0, 3.0, // 35-39
];

/** Table 31, exponents c_i of the exponential terms, i = 8…34 (indices 0 to 7 unused). */
const c: readonly number[] = [
  Number.NaN, Number.NaN, Number.NaN, Number.NaN, Number.NaN, Number.NaN, Number.NaN, Number.NaN,
  1, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 4, 4, 4, 5, 6, // 8-34
];

/** Index of the first term of each group of Table 31. */
const FIRST_EXPONENTIAL = 8;
const FIRST_GAUSSIAN = 35;
const FIRST_NON_ANALYTIC = 40;
const LAST_TERM = 42;

/** Table 31, alpha_i of the Gaussian terms, i = 35…39 (indexed by i; other entries unused). */
const alpha: readonly number[] = termColumn({ 35: 25, 36: 25, 37: 25, 38: 15, 39: 20 });
/**
 * Table 31, beta_i, i = 35…42: the temperature width of the Gaussian terms (35 to 39) and the
 * exponent parameter of the non-analytic terms (40 to 42), one column in the table.
 */
const beta: readonly number[] = termColumn({ 35: 325, 36: 300, 37: 300, 38: 275, 39: 275, 40: 0.3, 41: 0.3, 42: 0.3 });
/** Table 31, gamma_i of the Gaussian terms, i = 35…39. */
const gamma: readonly number[] = termColumn({ 35: 1.16, 36: 1.19, 37: 1.19, 38: 1.25, 39: 1.22 });
/** Table 31, epsilon_i of the Gaussian terms, i = 35…39. */
const epsilon: readonly number[] = termColumn({ 35: 1.0, 36: 1.0, 37: 1.0, 38: 1.0, 39: 1.0 });
/** Table 31, a_i of the non-analytic terms, i = 40…42. */
const a: readonly number[] = termColumn({ 40: 3.5, 41: 3.5, 42: 3.0 });
/** Table 31, b_i of the non-analytic terms, i = 40…42. */
const b: readonly number[] = termColumn({ 40: 0.875, 41: 0.925, 42: 0.875 });
/** Table 31, A_i of the non-analytic terms, i = 40…42. */
const A: readonly number[] = termColumn({ 40: 0.7, 41: 0.7, 42: 0.7 });
/** Table 31, B_i of the non-analytic terms, i = 40…42. */
const B: readonly number[] = termColumn({ 40: 0.3, 41: 0.3, 42: 1.0 });
/** Table 31, C_i of the non-analytic terms, i = 40…42. */
const C: readonly number[] = termColumn({ 40: 10.0, 41: 10.0, 42: 12.5 });
/** Table 31, D_i of the non-analytic terms, i = 40…42. */
const D: readonly number[] = termColumn({ 40: 275.0, 41: 275.0, 42: 275.0 });

/** A column of Table 31 indexed by term number i (1…42), NaN where the table has no entry. */
function termColumn(entries: Readonly<Record<number, number>>): readonly number[] {
  const column = new Array<number>(LAST_TERM + 1).fill(Number.NaN);
  for (const [i, value] of Object.entries(entries)) column[Number(i)] = value;
  return column;
}

/** The ideal-gas part phi° and its tau derivatives (its delta derivatives are 1/delta, −1/delta²). */
export interface IdealPart {
  readonly phi: number;
  readonly phiTau: number;
  readonly phiTauTau: number;
}

/** The residual part phi^r and its first and second partial derivatives. */
export interface ResidualPart {
  readonly phi: number;
  readonly phiDelta: number;
  readonly phiDeltaDelta: number;
  readonly phiTau: number;
  readonly phiTauTau: number;
  readonly phiDeltaTau: number;
}

/** phi° and its tau derivatives at (delta, tau), Table 27. */
export function idealPart(delta: number, tau: number): IdealPart {
  let phi = Math.log(delta) + a0[1]! + a0[2]! * tau + a0[3]! * Math.log(tau);
  let phiTau = a0[2]! + a0[3]! / tau;
  let phiTauTau = -a0[3]! / (tau * tau);
  for (let i = 4; i <= 8; i++) {
    const e = Math.exp(-theta0[i]! * tau);
    phi += a0[i]! * Math.log(1 - e);
    phiTau += a0[i]! * theta0[i]! * (1 / (1 - e) - 1);
    phiTauTau -= (a0[i]! * theta0[i]! * theta0[i]! * e) / ((1 - e) * (1 - e));
  }
  return { phi, phiTau, phiTauTau };
}

/** phi^r and its derivatives at (delta, tau), Table 31, all 42 terms. */
export function residualPart(delta: number, tau: number): ResidualPart {
  let phi = 0;
  let phiDelta = 0;
  let phiDeltaDelta = 0;
  let phiTau = 0;
  let phiTauTau = 0;
  let phiDeltaTau = 0;
  for (let i = 1; i < FIRST_EXPONENTIAL; i++) {
    const term = n[i]! * delta ** d[i]! * tau ** t[i]!;
    phi += term;
    phiDelta += (d[i]! * term) / delta;
    phiDeltaDelta += (d[i]! * (d[i]! - 1) * term) / (delta * delta);
    phiTau += (t[i]! * term) / tau;
    phiTauTau += (t[i]! * (t[i]! - 1) * term) / (tau * tau);
    phiDeltaTau += (d[i]! * t[i]! * term) / (delta * tau);
  }
  for (let i = FIRST_EXPONENTIAL; i < FIRST_GAUSSIAN; i++) {
    const deltaC = delta ** c[i]!;
    const term = n[i]! * delta ** d[i]! * tau ** t[i]! * Math.exp(-deltaC);
    const k = d[i]! - c[i]! * deltaC;
    phi += term;
    phiDelta += (k * term) / delta;
    phiDeltaDelta += ((k * (k - 1) - c[i]! * c[i]! * deltaC) * term) / (delta * delta);
    phiTau += (t[i]! * term) / tau;
    phiTauTau += (t[i]! * (t[i]! - 1) * term) / (tau * tau);
    phiDeltaTau += (k * t[i]! * term) / (delta * tau);
  }
  for (let i = FIRST_GAUSSIAN; i < FIRST_NON_ANALYTIC; i++) {
    const dd = delta - epsilon[i]!;
    const dt = tau - gamma[i]!;
    const term = n[i]! * delta ** d[i]! * tau ** t[i]! * Math.exp(-alpha[i]! * dd * dd - beta[i]! * dt * dt);
    const kDelta = d[i]! / delta - 2 * alpha[i]! * dd;
    const kTau = t[i]! / tau - 2 * beta[i]! * dt;
    phi += term;
    phiDelta += kDelta * term;
    phiDeltaDelta += (kDelta * kDelta - d[i]! / (delta * delta) - 2 * alpha[i]!) * term;
    phiTau += kTau * term;
    phiTauTau += (kTau * kTau - t[i]! / (tau * tau) - 2 * beta[i]!) * term;
    phiDeltaTau += kDelta * kTau * term;
  }
  for (let i = FIRST_NON_ANALYTIC; i <= LAST_TERM; i++) {
    const term = nonAnalyticTerm(i, delta, tau);
    phi += term.phi;
    phiDelta += term.phiDelta;
    phiDeltaDelta += term.phiDeltaDelta;
    phiTau += term.phiTau;
    phiTauTau += term.phiTauTau;
    phiDeltaTau += term.phiDeltaTau;
  }
  return { phi, phiDelta, phiDeltaDelta, phiTau, phiTauTau, phiDeltaTau };
}

/**
 * One non-analytic term n_i Delta^b_i delta psi of Table 31 and its derivatives. With
 * s = (delta − 1)²: Delta_delta = (delta − 1)·(A theta (2/beta) s^(1/(2 beta) − 1) + 2 B a s^(a − 1)),
 * Delta_deltadelta = Delta_delta/(delta − 1) + (delta − 1)²·(4 B a (a − 1) s^(a − 2)
 * + 2 A² beta^−2 (s^(1/(2 beta) − 1))² + A theta (4/beta)(1/(2 beta) − 1) s^(1/(2 beta) − 2)), and
 * the tau derivatives of Delta^b follow from Delta_tau = −2 theta.
 */
function nonAnalyticTerm(i: number, delta: number, tau: number): ResidualPart {
  const dm1 = delta - 1;
  const s = dm1 * dm1;
  const ni = n[i]!;
  const ai = a[i]!;
  const bi = b[i]!;
  const Ai = A[i]!;
  const Bi = B[i]!;
  const Ci = C[i]!;
  const Di = D[i]!;
  const halfInverseBeta = 1 / (2 * beta[i]!);
  const theta = 1 - tau + Ai * s ** halfInverseBeta;
  const Delta = theta * theta + Bi * s ** ai;
  const psi = Math.exp(-Ci * s - Di * (tau - 1) * (tau - 1));
  const psiDelta = -2 * Ci * dm1 * psi;
  const psiDeltaDelta = (2 * Ci * s - 1) * 2 * Ci * psi;
  const psiTau = -2 * Di * (tau - 1) * psi;
  const psiTauTau = (2 * Di * (tau - 1) * (tau - 1) - 1) * 2 * Di * psi;
  const psiDeltaTau = 4 * Ci * Di * dm1 * (tau - 1) * psi;
  const DeltaB = Delta ** bi;
  if (Delta === 0) {
    // Only at delta = tau = 1, the critical point: every derivative of Delta^b·delta·psi tends
    // to zero there (Delta^(b−1) diverges more slowly than its factors vanish).
    return { phi: 0, phiDelta: 0, phiDeltaDelta: 0, phiTau: 0, phiTauTau: 0, phiDeltaTau: 0 };
  }
  const sPowA1 = s === 0 ? 0 : s ** (ai - 1);
  const sPowH1 = s === 0 ? 0 : s ** (halfInverseBeta - 1);
  const DeltaDelta = dm1 * (((Ai * theta * 2) / beta[i]!) * sPowH1 + 2 * Bi * ai * sPowA1);
  const DeltaDeltaDelta =
    s === 0
      ? 0
      : DeltaDelta / dm1 +
        s *
          (4 * Bi * ai * (ai - 1) * s ** (ai - 2) +
            2 * Ai * Ai * (1 / (beta[i]! * beta[i]!)) * sPowH1 * sPowH1 +
            ((Ai * theta * 4) / beta[i]!) * (halfInverseBeta - 1) * s ** (halfInverseBeta - 2));
  const DeltaBm1 = DeltaB / Delta;
  const DeltaBDelta = bi * DeltaBm1 * DeltaDelta;
  const DeltaBDeltaDelta = bi * (DeltaBm1 * DeltaDeltaDelta + ((bi - 1) * DeltaBm1 * DeltaDelta * DeltaDelta) / Delta);
  const DeltaBTau = -2 * theta * bi * DeltaBm1;
  const DeltaBTauTau = 2 * bi * DeltaBm1 + (4 * theta * theta * bi * (bi - 1) * DeltaBm1) / Delta;
  const DeltaBDeltaTau =
    ((-Ai * bi * 2) / beta[i]!) * DeltaBm1 * dm1 * sPowH1 - (2 * theta * bi * (bi - 1) * DeltaBm1 * DeltaDelta) / Delta;
  return {
    phi: ni * DeltaB * delta * psi,
    phiDelta: ni * (DeltaB * (psi + delta * psiDelta) + DeltaBDelta * delta * psi),
    phiDeltaDelta:
      ni *
      (DeltaB * (2 * psiDelta + delta * psiDeltaDelta) +
        2 * DeltaBDelta * (psi + delta * psiDelta) +
        DeltaBDeltaDelta * delta * psi),
    phiTau: ni * delta * (DeltaBTau * psi + DeltaB * psiTau),
    phiTauTau: ni * delta * (DeltaBTauTau * psi + 2 * DeltaBTau * psiTau + DeltaB * psiTauTau),
    phiDeltaTau:
      ni *
      (DeltaB * (psiTau + delta * psiDeltaTau) +
        delta * DeltaBDelta * psiTau +
        DeltaBTau * (psi + delta * psiDelta) +
        DeltaBDeltaTau * delta * psi),
  };
}

/** Properties of fluid CO2 at one state, SI units, on the reference state of the module header. */
export interface FluidProperties {
  /** Pressure p, Pa. */
  readonly pressure: number;
  /** Density rho, kg/m³. */
  readonly density: number;
  /** Specific enthalpy h, J/kg. */
  readonly enthalpy: number;
  /** Specific internal energy u, J/kg. */
  readonly internalEnergy: number;
  /** Specific entropy s, J/(kg·K). */
  readonly entropy: number;
  /** Specific Gibbs energy g = h − T s, J/kg. */
  readonly gibbs: number;
  /** Specific isochoric heat capacity c_v, J/(kg·K). */
  readonly isochoricHeatCapacity: number;
  /** Specific isobaric heat capacity c_p, J/(kg·K). */
  readonly isobaricHeatCapacity: number;
  /** Speed of sound w, m/s. */
  readonly speedOfSound: number;
}

/** All properties at density rho (kg/m³) and temperature T (K); no range check. */
export function propertiesByDensity(densityKgM3: number, temperatureK: number): FluidProperties {
  const delta = densityKgM3 / rhoc;
  const tau = Tc / temperatureK;
  const o = idealPart(delta, tau);
  const r = residualPart(delta, tau);
  const RT = R * temperatureK;
  const tauPhiTau = tau * (o.phiTau + r.phiTau);
  const deltaPhiDelta = delta * r.phiDelta;
  const tau2PhiTauTau = tau * tau * (o.phiTauTau + r.phiTauTau);
  const x = 1 + deltaPhiDelta - delta * tau * r.phiDeltaTau;
  const y = 1 + 2 * deltaPhiDelta + delta * delta * r.phiDeltaDelta;
  const entropy = R * (tauPhiTau - o.phi - r.phi);
  const enthalpy = RT * (1 + tauPhiTau + deltaPhiDelta);
  return {
    pressure: densityKgM3 * RT * (1 + deltaPhiDelta),
    density: densityKgM3,
    enthalpy,
    internalEnergy: RT * tauPhiTau,
    entropy,
    gibbs: enthalpy - temperatureK * entropy,
    isochoricHeatCapacity: -R * tau2PhiTauTau,
    isobaricHeatCapacity: R * (-tau2PhiTauTau + (x * x) / y),
    speedOfSound: Math.sqrt(RT * (y - (x * x) / tau2PhiTauTau)),
  };
}

/** Specific enthalpy h in J/kg at density rho (kg/m³) and temperature T (K); no range check. */
export function enthalpyByDensity(densityKgM3: number, temperatureK: number): number {
  const delta = densityKgM3 / rhoc;
  const tau = Tc / temperatureK;
  const r = residualPart(delta, tau);
  return R * temperatureK * (1 + tau * (idealPart(delta, tau).phiTau + r.phiTau) + delta * r.phiDelta);
}

/**
 * Isobaric heat capacity of the ideal gas, c_p° = R (1 − tau² phi°_tautau), J/(kg·K), at T in K;
 * no range check.
 */
export function idealGasIsobaricHeatCapacity(temperatureK: number): number {
  const tau = Tc / temperatureK;
  return R * (1 - tau * tau * idealPart(1, tau).phiTauTau);
}

/**
 * x raised to a non-negative integer power by repeated squaring (several times faster than the
 * general power, which the engine evaluates through logarithms).
 */
function integerPower(x: number, exponent: number): number {
  let result = 1;
  let base = x;
  for (let k = exponent; k > 0; k >>= 1) {
    if (k & 1) result *= base;
    base *= base;
  }
  return result;
}

/**
 * Below this value of n_i exp(−D_i (tau − 1)²) the three non-analytic terms are left out of the
 * fast isotherm sums: with D_i = 275 that happens for |tau − 1| above 0.408 (T below 216.0 K or
 * above 513.5 K), where their contribution to delta·phi^r_delta and tau·phi^r_tau is below 2e-17
 * in absolute value (the rest of each term stays below 1200 at every density up to 1700 kg/m³,
 * measured), far under the rounding of the sums themselves.
 */
const NON_ANALYTIC_CUTOFF = 1e-20;

/**
 * The temperature-dependent factors of every term of phi^r and phi° on one isotherm, computed once
 * so that each evaluation of the pressure (many per density solve) and of the enthalpy costs one
 * pass over the density-dependent factors.
 */
export interface Isotherm {
  readonly temperatureK: number;
  readonly tau: number;
  /** tau·phi°_tau. */
  readonly tauPhi0Tau: number;
  /** n_i tau^t_i (terms 1 to 34) and n_i tau^t_i exp(−beta_i (tau − gamma_i)²) (35 to 39), by i. */
  readonly factor: readonly number[];
  /** t_i − 2 beta_i tau (tau − gamma_i), the tau·d/dtau factor of the Gaussian terms 35 to 39, by i. */
  readonly gaussianTau: readonly number[];
  /** n_i exp(−D_i (tau − 1)²) of the non-analytic terms 40 to 42, by i; all zero when negligible. */
  readonly nonAnalytic: readonly number[];
}

/**
 * Prepares the temperature factors at T in K. Every exponent t_i of Table 31 is a multiple of 1/4,
 * so tau^t_i is computed as (tau^(1/4))^(4 t_i) by repeated squaring (relative difference from the
 * general power below 2e-14 from T_t to 1100 K, measured).
 */
export function isotherm(temperatureK: number): Isotherm {
  const tau = Tc / temperatureK;
  const quarter = Math.sqrt(Math.sqrt(tau));
  const factor: number[] = [0];
  const gaussianTau: number[] = [0];
  const nonAnalytic: number[] = [0];
  for (let i = 1; i < FIRST_GAUSSIAN; i++) {
    factor.push(n[i]! * integerPower(quarter, 4 * t[i]!));
    gaussianTau.push(0);
  }
  for (let i = FIRST_GAUSSIAN; i < FIRST_NON_ANALYTIC; i++) {
    const dt = tau - gamma[i]!;
    factor.push(n[i]! * integerPower(quarter, 4 * t[i]!) * Math.exp(-beta[i]! * dt * dt));
    gaussianTau.push(t[i]! - 2 * beta[i]! * tau * dt);
  }
  let significant = false;
  for (let i = 1; i <= LAST_TERM; i++) {
    const value = i < FIRST_NON_ANALYTIC ? 0 : n[i]! * Math.exp(-D[i]! * (tau - 1) * (tau - 1));
    if (Math.abs(value) >= NON_ANALYTIC_CUTOFF) significant = true;
    nonAnalytic.push(value);
  }
  if (!significant) nonAnalytic.fill(0);
  return { temperatureK, tau, tauPhi0Tau: tau * idealPart(1, tau).phiTau, factor, gaussianTau, nonAnalytic };
}

/**
 * delta·phi^r_delta and tau·phi^r_tau on an isotherm at reduced density delta: the same 42 terms as
 * residualPart, with the temperature factors taken from the isotherm. With `withTau` false only
 * the first sum is formed (all the pressure needs). In the non-analytic terms every power of
 * s = (delta − 1)² and of Delta is formed as exp(x ln s) and exp(b_i ln Delta), one logarithm
 * shared by all powers of s (the general power costs about two exponentials).
 */
function isothermSums(iso: Isotherm, delta: number, withTau: boolean): readonly [number, number] {
  const f = iso.factor;
  const d2 = delta * delta;
  const d3 = d2 * delta;
  const d4 = d2 * d2;
  const d5 = d4 * delta;
  const d6 = d3 * d3;
  const d8 = d4 * d4;
  const powers = [1, delta, d2, d3, d4, d5, d6, d6 * delta, d8, d8 * delta, d8 * d2];
  const expDeltaC = [1, Math.exp(-delta), Math.exp(-d2), Math.exp(-d3), Math.exp(-d4), Math.exp(-d5), Math.exp(-d6)];
  let first = 0;
  let tauSum = 0;
  for (let i = 1; i < FIRST_EXPONENTIAL; i++) {
    const term = f[i]! * powers[d[i]!]!;
    first += d[i]! * term;
    tauSum += t[i]! * term;
  }
  for (let i = FIRST_EXPONENTIAL; i < FIRST_GAUSSIAN; i++) {
    const term = f[i]! * powers[d[i]!]! * expDeltaC[c[i]!]!;
    first += (d[i]! - c[i]! * powers[c[i]!]!) * term;
    tauSum += t[i]! * term;
  }
  for (let i = FIRST_GAUSSIAN; i < FIRST_NON_ANALYTIC; i++) {
    const dd = delta - epsilon[i]!;
    const term = f[i]! * powers[d[i]!]! * Math.exp(-alpha[i]! * dd * dd);
    first += (d[i]! - 2 * alpha[i]! * delta * dd) * term;
    tauSum += iso.gaussianTau[i]! * term;
  }
  const na = iso.nonAnalytic;
  const dm1 = delta - 1;
  if (na[FIRST_NON_ANALYTIC] !== 0 && dm1 !== 0) {
    const tau = iso.tau;
    const s = dm1 * dm1;
    const lnS = Math.log(s);
    for (let i = FIRST_NON_ANALYTIC; i <= LAST_TERM; i++) {
      const sPowH = Math.exp(lnS / (2 * beta[i]!));
      const sPowA = Math.exp(lnS * a[i]!);
      const theta = 1 - tau + A[i]! * sPowH;
      const Delta = theta * theta + B[i]! * sPowA;
      const psi = na[i]! * Math.exp(-C[i]! * s);
      const DeltaB = Math.exp(b[i]! * Math.log(Delta));
      const DeltaDelta = dm1 * (((A[i]! * theta * 2) / beta[i]!) * (sPowH / s) + 2 * B[i]! * a[i]! * (sPowA / s));
      first += delta * (DeltaB * psi * (1 - 2 * C[i]! * delta * dm1) + ((b[i]! * DeltaB) / Delta) * DeltaDelta * delta * psi);
      if (withTau) {
        tauSum += delta * tau * psi * ((-2 * theta * b[i]! * DeltaB) / Delta - 2 * D[i]! * (tau - 1) * DeltaB);
      }
    }
  } else if (na[FIRST_NON_ANALYTIC] !== 0) {
    // delta = 1 exactly: s = 0, so theta = 1 − tau, Delta = theta² and every delta derivative of
    // Delta vanishes; Delta = 0 as well at tau = 1, where the terms and their derivatives vanish.
    const tau = iso.tau;
    for (let i = FIRST_NON_ANALYTIC; i <= LAST_TERM; i++) {
      const theta = 1 - tau;
      const Delta = theta * theta;
      if (Delta === 0) continue;
      const psi = na[i]!;
      const DeltaB = Math.exp(b[i]! * Math.log(Delta));
      first += DeltaB * psi;
      if (withTau) tauSum += tau * psi * ((-2 * theta * b[i]! * DeltaB) / Delta - 2 * D[i]! * (tau - 1) * DeltaB);
    }
  }
  return [first, tauSum];
}

/** Pressure p(rho, T) in Pa on an isotherm, rho in kg/m³. */
export function pressureOnIsotherm(iso: Isotherm, densityKgM3: number): number {
  const [first] = isothermSums(iso, densityKgM3 / rhoc, false);
  return densityKgM3 * R * iso.temperatureK * (1 + first);
}

/** Specific enthalpy h in J/kg on an isotherm, rho in kg/m³. */
export function enthalpyOnIsotherm(iso: Isotherm, densityKgM3: number): number {
  const [first, tauSum] = isothermSums(iso, densityKgM3 / rhoc, true);
  return R * iso.temperatureK * (1 + iso.tauPhi0Tau + tauSum + first);
}

/**
 * Isothermal slope (dp/drho)_T in Pa·m³/kg, rho in kg/m³, from the full residual part (it is
 * needed only to locate spinodals, a few times per solve at most).
 */
export function pressureSlopeOnIsotherm(iso: Isotherm, densityKgM3: number): number {
  const delta = densityKgM3 / rhoc;
  const r = residualPart(delta, iso.tau);
  return R * iso.temperatureK * (1 + 2 * delta * r.phiDelta + delta * delta * r.phiDeltaDelta);
}
