/**
 * Thermodynamic properties of solid carbon dioxide (dry ice) from its Gibbs-energy equation of
 * state g(T, p): Gibbs energy, enthalpy, entropy, volume, isobaric heat capacity, thermal
 * expansion and isothermal compressibility, per mole.
 *
 * Source: A. Jäger, R. Span, Equation of State for Solid Carbon Dioxide Based on the Gibbs Free
 *   Energy, J. Chem. Eng. Data 57, 590-597 (2012), doi:10.1021/je2011677: the Gibbs-energy
 *   equation with its coefficients g_0 … g_10, g_alpha0 … g_alpha8, g_k0 … g_k2; check values
 *   Table 5 (see the tests).
 * Valid: the paper's stated range is not transcribed here. Phasecell uses the equation from 100 K
 *   (its lowest check value) up to the melting and sublimation curves of Span and Wagner (1996)
 *   and up to 800 MPa. No range check here: the phase is decided from those curves, never from
 *   this function.
 * Uncertainty: stated in the paper (not transcribed here). With the enthalpy of fusion at the
 *   triple point tying it to Span and Wagner (1996), it reproduces the sublimation enthalpy
 *   measured by W. F. Giauque, C. J. Egan, J. Chem. Phys. 5, 45 (1937) at 194.67 K within 0.1 %
 *   (see test/core/co2-paths.test.ts).
 * Reference state: the paper's own (g and s as in its Table 5). core/substances/co2-enthalpy.ts
 *   shifts the enthalpy onto the reference state of Span and Wagner (1996).
 * Notation: theta = T/T0, pi = p/p0, with T0 = 150 K, p0 = 101325 Pa, n = 7 and
 *   R = 8.314472 J/(mol·K); g/(R T0) = g_0 + g_1 dtheta + g_2 dtheta² + g_3 L(theta; g_4)
 *   + g_5 L(theta; g_6) + g_7 dpi (exp(f_alpha(theta)) + K(theta) g_8)
 *   + g_9 K(theta) ((pi + g_10)^((n−1)/n) − (1 + g_10)^((n−1)/n)), with dtheta = theta − 1,
 *   dpi = pi − 1, L(theta; x) = ln((theta² + x²)/(1 + x²)) − (2 theta/x)(arctan(theta/x) − arctan(1/x)),
 *   K(theta) = g_k0 theta² + g_k1 theta + g_k2, and f_alpha(theta) = g_alpha0 (theta² − 1)
 *   + g_alpha1 ln((theta² − g_alpha2 theta + g_alpha3)/(1 − g_alpha2 + g_alpha3))
 *   + g_alpha4 ln((theta² + g_alpha2 theta + g_alpha3)/(1 + g_alpha2 + g_alpha3))
 *   + g_alpha5 (arctan((theta − g_alpha6)/g_alpha7) − arctan((1 − g_alpha6)/g_alpha7))
 *   + g_alpha8 (arctan((theta + g_alpha6)/g_alpha7) − arctan((1 + g_alpha6)/g_alpha7)).
 *   v = dg/dp, s = −dg/dT, h = g + T s, c_p = −T d²g/dT², alpha_p = (d²g/dT dp)/v,
 *   kappa_T = −(d²g/dp²)/v.
 * Deviations from the text: none. The derivatives are analytic; dL/dtheta simplifies to
 *   −(2/x)(arctan(theta/x) − arctan(1/x)) and d²L/dtheta² to −2/(theta² + x²).
 */

/** Reducing temperature T0, K. */
const T0 = 150;
/** Reducing pressure p0, Pa. */
const p0 = 101325;
/** Exponent parameter n. */
const nExp = 7;
/** Molar gas constant used by the paper, J/(mol·K). */
const R = 8.314472;

/** Coefficients g_0 … g_10, index as printed. */
const g: readonly number[] = [
  -2.6385478, // g0
  4.5088732, // g1
  -2.0109135, // g2
  -2.7976237, // g3
  2.6427834e-1, // g4
  3.8259935, // g5
  3.1711996e-1, // g6
  2.2087195e-3, // g7
  -1.1289668, // g8
  9.2923982e-3, // g9
  3.3914617e3, // g10
];

/** Coefficients g_alpha0 … g_alpha8, index as printed. */
const gAlpha: readonly number[] = [
  3.9993365e-2, // g_alpha0
  2.3945101e-3, // g_alpha1
  3.2839467e-1, // g_alpha2
  5.7918471e-2, // g_alpha3
  2.3945101e-3, // g_alpha4
  -2.6531689e-3, // g_alpha5
  1.6419734e-1, // g_alpha6
  1.7594802e-1, // g_alpha7
  2.6531689e-3, // g_alpha8
];

/** Coefficients g_k0 … g_k2, index as printed. */
const gK: readonly number[] = [
  2.2690751e-1, // g_k0
  -7.5019750e-2, // g_k1
  2.6442913e-1, // g_k2
];

/** (n − 1)/n. */
const m = (nExp - 1) / nExp;

/** Properties of solid CO2 at one state, per mole, SI units. */
export interface SolidProperties {
  /** Molar Gibbs energy g, J/mol, on the paper's reference state. */
  readonly gibbs: number;
  /** Molar enthalpy h = g + T s, J/mol, on the paper's reference state. */
  readonly enthalpy: number;
  /** Molar entropy s = −dg/dT, J/(mol·K), on the paper's reference state. */
  readonly entropy: number;
  /** Molar volume v = dg/dp, m³/mol. */
  readonly volume: number;
  /** Molar isobaric heat capacity c_p = −T d²g/dT², J/(mol·K). */
  readonly isobaricHeatCapacity: number;
  /** Isobaric thermal expansion coefficient alpha_p, 1/K. */
  readonly thermalExpansion: number;
  /** Isothermal compressibility kappa_T, 1/Pa. */
  readonly isothermalCompressibility: number;
}

/** L(theta; x), its first and second theta derivatives. */
function debyeLike(theta: number, x: number): readonly [number, number, number] {
  const arc = Math.atan(theta / x) - Math.atan(1 / x);
  return [
    Math.log((theta * theta + x * x) / (1 + x * x)) - ((2 * theta) / x) * arc,
    (-2 / x) * arc,
    -2 / (theta * theta + x * x),
  ];
}

/** f_alpha(theta), its first and second theta derivatives. */
function expansionExponent(theta: number): readonly [number, number, number] {
  const [a0, a1, a2, a3, a4, a5, a6, a7, a8] = gAlpha as [number, number, number, number, number, number, number, number, number];
  const q1 = theta * theta - a2 * theta + a3;
  const q2 = theta * theta + a2 * theta + a3;
  const u1 = (theta - a6) / a7;
  const u2 = (theta + a6) / a7;
  const f =
    a0 * (theta * theta - 1) +
    a1 * Math.log(q1 / (1 - a2 + a3)) +
    a4 * Math.log(q2 / (1 + a2 + a3)) +
    a5 * (Math.atan(u1) - Math.atan((1 - a6) / a7)) +
    a8 * (Math.atan(u2) - Math.atan((1 + a6) / a7));
  const f1 =
    2 * a0 * theta +
    (a1 * (2 * theta - a2)) / q1 +
    (a4 * (2 * theta + a2)) / q2 +
    a5 / (a7 * (1 + u1 * u1)) +
    a8 / (a7 * (1 + u2 * u2));
  const f2 =
    2 * a0 +
    a1 * (2 / q1 - ((2 * theta - a2) * (2 * theta - a2)) / (q1 * q1)) +
    a4 * (2 / q2 - ((2 * theta + a2) * (2 * theta + a2)) / (q2 * q2)) -
    (a5 * 2 * u1) / (a7 * a7 * (1 + u1 * u1) * (1 + u1 * u1)) -
    (a8 * 2 * u2) / (a7 * a7 * (1 + u2 * u2) * (1 + u2 * u2));
  return [f, f1, f2];
}

/** Properties of solid CO2 at T in K and p in Pa; no range check (see the module header). */
export function solidCO2(temperatureK: number, pressurePa: number): SolidProperties {
  const theta = temperatureK / T0;
  const pi = pressurePa / p0;
  const dTheta = theta - 1;
  const dPi = pi - 1;
  const [L4, L4t, L4tt] = debyeLike(theta, g[4]!);
  const [L6, L6t, L6tt] = debyeLike(theta, g[6]!);
  const [fa, fa1, fa2] = expansionExponent(theta);
  const ef = Math.exp(fa);
  const K = gK[0]! * theta * theta + gK[1]! * theta + gK[2]!;
  const Kt = 2 * gK[0]! * theta + gK[1]!;
  const Ktt = 2 * gK[0]!;
  const base = pi + g[10]!;
  const P = base ** m - (1 + g[10]!) ** m;
  const Pp = m * base ** (m - 1);
  const Ppp = m * (m - 1) * base ** (m - 2);

  // Reduced Gibbs energy G = g/(R T0) and its derivatives in theta and pi.
  const G =
    g[0]! +
    g[1]! * dTheta +
    g[2]! * dTheta * dTheta +
    g[3]! * L4 +
    g[5]! * L6 +
    g[7]! * dPi * (ef + K * g[8]!) +
    g[9]! * K * P;
  const Gt = g[1]! + 2 * g[2]! * dTheta + g[3]! * L4t + g[5]! * L6t + g[7]! * dPi * (fa1 * ef + Kt * g[8]!) + g[9]! * Kt * P;
  const Gtt = 2 * g[2]! + g[3]! * L4tt + g[5]! * L6tt + g[7]! * dPi * ((fa2 + fa1 * fa1) * ef + Ktt * g[8]!) + g[9]! * Ktt * P;
  const Gp = g[7]! * (ef + K * g[8]!) + g[9]! * K * Pp;
  const Gtp = g[7]! * (fa1 * ef + Kt * g[8]!) + g[9]! * Kt * Pp;
  const Gpp = g[9]! * K * Ppp;

  const gibbs = R * T0 * G;
  const entropy = -R * Gt;
  const volume = (R * T0 * Gp) / p0;
  return {
    gibbs,
    enthalpy: gibbs + temperatureK * entropy,
    entropy,
    volume,
    isobaricHeatCapacity: (-temperatureK * R * Gtt) / T0,
    thermalExpansion: (R * Gtp) / p0 / volume,
    isothermalCompressibility: -((R * T0 * Gpp) / (p0 * p0)) / volume,
  };
}
