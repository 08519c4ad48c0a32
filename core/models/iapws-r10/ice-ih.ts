/**
 * Thermodynamic properties of ice Ih from its Gibbs function g(T, p): Gibbs and Helmholtz
 * energy, enthalpy, entropy, internal energy, isobaric heat capacity, density, expansion and
 * compressibilities, and the derivatives of g they come from.
 *
 * Source: IAPWS R10-06(2009), Revised Release on the Equation of State 2006 for H2O Ice Ih;
 *   R. Feistel, W. Wagner, J. Phys. Chem. Ref. Data 35, 1021 (2006). Gibbs function g(T, p) with
 *   g0(p) and r2(p) as polynomials in (pi − pi0), coefficients of Table 2 (the 2009 revision's
 *   g00 and the IAPWS-95 value of s0), property relations as given there; check values Table 6.
 * Valid: the stable region of ice Ih, T ≤ 273.16 K, p up to the ice Ih / ice III boundary (about
 *   210 MPa); the release calls modest extrapolation physically reasonable. No range check here:
 *   which phase is present is decided from the IAPWS R14-08 curves, never from this function.
 * Uncertainty: stated in the release (not transcribed here).
 * Reference state: s0 = −0.332733756492168e4 J/(kg·K) is the release's IAPWS-95 choice, with
 *   which ice and IAPWS-95 (and IF97) liquid and vapour share one zero of energy and entropy, so
 *   their enthalpies subtract directly (h of ice at the triple point is −333444.253966 J/kg). The
 *   release's alternative absolute entropy s0 = 189.13 J/(kg·K) must not be mixed with IF97.
 * Notation: tau = T/T_t, pi = p/p_t, pi0 = p0/p_t with T_t = 273.16 K, p_t = 611.657 Pa,
 *   p0 = 101325 Pa; g = g0(p) − s0·T_t·tau + T_t·Re Σ(k=1,2) r_k·B(t_k, tau) with
 *   B(t, tau) = (t − tau) ln(t − tau) + (t + tau) ln(t + tau) − 2 t ln t − tau²/t, complex t_k,
 *   r1, r2(p) and principal-branch complex logarithms; gT, gp, gTT, gTp, gpp are partial
 *   derivatives of g in SI (J, kg, K, Pa).
 * Deviations from the text: none. The 2006 value of g00 (−632020.233449497 J/kg) is superseded by
 *   the 2009 one used here, which reproduces Table 6.
 */
import { add, complex, div, log, mul, scale, sub, type Complex } from "../../numerics/complex";

/** Triple-point temperature T_t, K. */
const Tt = 273.16;
/** Triple-point pressure p_t, Pa. */
const pt = 611.657;
/** Normal pressure p0, Pa. */
const p0 = 101325;
/** pi0 = p0/p_t. */
const pi0 = p0 / pt;

/** R10-06(2009) Table 2, g0k for k = 0…4, J/kg (index k as printed). */
const g0: readonly number[] = [
  -0.632020233335886e6,
  0.655022213658955,
  -0.189369929326131e-7,
  0.339746123271053e-14,
  -0.556464869058991e-21,
];
/** R10-06(2009) Table 2, s0 (IAPWS-95 reference state), J/(kg·K). */
const s0 = -0.332733756492168e4;
/** R10-06(2009) Table 2, t1 (dimensionless). */
const t1 = complex(0.368017112855051e-1, 0.510878114959572e-1);
/** R10-06(2009) Table 2, r1, J/(kg·K). */
const r1 = complex(0.447050716285388e2, 0.656876847463481e2);
/** R10-06(2009) Table 2, t2 (dimensionless). */
const t2 = complex(0.337315741065416, 0.335449415919309);
/** R10-06(2009) Table 2, r2k for k = 0…2, J/(kg·K) (index k as printed). */
const r2: readonly Complex[] = [
  complex(-0.725974574329220e2, -0.781008427112870e2),
  complex(-0.557107698030123e-4, 0.464578634580806e-4),
  complex(0.234801409215913e-10, -0.285651142904972e-10),
];

/** 2·t_k·ln(t_k) and 1/t_k, fixed parts of B(t_k, tau) and its derivatives. */
const twoTLogT1 = scale(mul(t1, log(t1)), 2);
const twoTLogT2 = scale(mul(t2, log(t2)), 2);
const one = complex(1);
const inverseT1 = div(one, t1);
const inverseT2 = div(one, t2);

/** Properties of ice Ih at one state, SI units. */
export interface IceProperties {
  /** Specific Gibbs energy g, J/kg. */
  readonly gibbs: number;
  /** Specific enthalpy h = g − T·gT, J/kg (IAPWS zero, shared with IF97 and IAPWS-95). */
  readonly enthalpy: number;
  /** Specific entropy s = −gT, J/(kg·K). */
  readonly entropy: number;
  /** Specific isobaric heat capacity c_p = −T·gTT, J/(kg·K). */
  readonly isobaricHeatCapacity: number;
  /** Density rho = 1/gp, kg/m³. */
  readonly density: number;
  /** Specific volume v = gp, m³/kg. */
  readonly specificVolume: number;
  /** Specific internal energy u = g − T·gT − p·gp, J/kg. */
  readonly internalEnergy: number;
  /** Specific Helmholtz energy f = g − p·gp, J/kg. */
  readonly helmholtz: number;
  /** Cubic expansion coefficient alpha = gTp/gp, 1/K. */
  readonly expansion: number;
  /** Pressure coefficient beta = −gTp/gpp, Pa/K. */
  readonly pressureCoefficient: number;
  /** Isothermal compressibility kappa_T = −gpp/gp, 1/Pa. */
  readonly isothermalCompressibility: number;
  /** Isentropic compressibility kappa_s = (gTp² − gTT·gpp)/(gp·gTT), 1/Pa. */
  readonly isentropicCompressibility: number;
  /** First derivative of g with respect to p at constant T, m³/kg. */
  readonly gp: number;
  /** First derivative of g with respect to T at constant p, J/(kg·K). */
  readonly gt: number;
  /** Second derivative of g with respect to p, m³/(kg·Pa). */
  readonly gpp: number;
  /** Mixed second derivative of g with respect to T and p, m³/(kg·K). */
  readonly gtp: number;
  /** Second derivative of g with respect to T, J/(kg·K²). */
  readonly gtt: number;
}

/**
 * Properties of ice Ih at temperature T (K) and pressure p (Pa) from the R10-06(2009) Gibbs
 * function. No range check: see the module header for where the equation is valid.
 */
export function iceIh(temperatureK: number, pressurePa: number): IceProperties {
  const tau = temperatureK / Tt;
  const dPi = pressurePa / pt - pi0;

  const g0Value = g0[0]! + dPi * (g0[1]! + dPi * (g0[2]! + dPi * (g0[3]! + dPi * g0[4]!)));
  const g0P = (g0[1]! + dPi * (2 * g0[2]! + dPi * (3 * g0[3]! + dPi * 4 * g0[4]!))) / pt;
  const g0PP = (2 * g0[2]! + dPi * (6 * g0[3]! + dPi * 12 * g0[4]!)) / (pt * pt);
  const r2Value = add(r2[0]!, scale(add(r2[1]!, scale(r2[2]!, dPi)), dPi));
  const r2P = scale(add(r2[1]!, scale(r2[2]!, 2 * dPi)), 1 / pt);
  const r2PP = scale(r2[2]!, 2 / (pt * pt));

  const tauC = complex(tau);
  const a1 = sub(t1, tauC);
  const b1 = add(t1, tauC);
  const logA1 = log(a1);
  const logB1 = log(b1);
  const bracket1 = sub(
    add(mul(a1, logA1), mul(b1, logB1)),
    add(twoTLogT1, scale(inverseT1, tau * tau)),
  );
  const bracket1Tau = sub(sub(logB1, logA1), scale(inverseT1, 2 * tau));
  const bracket1TauTau = sub(add(div(one, a1), div(one, b1)), scale(inverseT1, 2));
  const a2 = sub(t2, tauC);
  const b2 = add(t2, tauC);
  const logA2 = log(a2);
  const logB2 = log(b2);
  const bracket2 = sub(
    add(mul(a2, logA2), mul(b2, logB2)),
    add(twoTLogT2, scale(inverseT2, tau * tau)),
  );
  const bracket2Tau = sub(sub(logB2, logA2), scale(inverseT2, 2 * tau));
  const bracket2TauTau = sub(add(div(one, a2), div(one, b2)), scale(inverseT2, 2));

  const gibbs = g0Value - s0 * Tt * tau + Tt * (mul(r1, bracket1).re + mul(r2Value, bracket2).re);
  const gt = -s0 + mul(r1, bracket1Tau).re + mul(r2Value, bracket2Tau).re;
  const gtt = (mul(r1, bracket1TauTau).re + mul(r2Value, bracket2TauTau).re) / Tt;
  const gp = g0P + Tt * mul(r2P, bracket2).re;
  const gpp = g0PP + Tt * mul(r2PP, bracket2).re;
  const gtp = mul(r2P, bracket2Tau).re;

  return {
    gibbs,
    enthalpy: gibbs - temperatureK * gt,
    entropy: -gt,
    isobaricHeatCapacity: -temperatureK * gtt,
    density: 1 / gp,
    specificVolume: gp,
    internalEnergy: gibbs - temperatureK * gt - pressurePa * gp,
    helmholtz: gibbs - pressurePa * gp,
    expansion: gtp / gp,
    pressureCoefficient: -gtp / gpp,
    isothermalCompressibility: -gpp / gp,
    isentropicCompressibility: (gtp * gtp - gtt * gpp) / (gp * gtt),
    gp,
    gt,
    gpp,
    gtp,
    gtt,
  };
}

/**
 * Specific enthalpy alone, J/kg, of ice Ih at T (K) and p (Pa), for the path-energy hot path.
 *
 * h = g − T·g_T with the Gibbs function above. The s0 terms cancel, and for each k
 * B − tau·B_tau = t_k·(ln(t_k − tau) + ln(t_k + tau)) − 2·t_k·ln(t_k) + tau²/t_k (principal
 * logarithms, as in the release), so h = g0(p) + T_t·Re(r1·H1 + r2(p)·H2) with H_k that bracket.
 * The same arithmetic as {@link iceIh} on real and imaginary parts, without building the other
 * properties.
 */
export function iceIhEnthalpy(temperatureK: number, pressurePa: number): number {
  const tau = temperatureK / Tt;
  const dPi = pressurePa / pt - pi0;
  const g0Value = g0[0]! + dPi * (g0[1]! + dPi * (g0[2]! + dPi * (g0[3]! + dPi * g0[4]!)));
  const r2Re = r2[0]!.re + dPi * (r2[1]!.re + dPi * r2[2]!.re);
  const r2Im = r2[0]!.im + dPi * (r2[1]!.im + dPi * r2[2]!.im);
  const h1 = enthalpyBracket(t1, twoTLogT1, inverseT1, tau);
  const h2 = enthalpyBracket(t2, twoTLogT2, inverseT2, tau);
  const real = r1.re * h1.re - r1.im * h1.im + (r2Re * h2.re - r2Im * h2.im);
  return g0Value + Tt * real;
}

/** t·(ln(t − tau) + ln(t + tau)) − 2·t·ln(t) + tau²/t for one complex t. */
function enthalpyBracket(t: Complex, twoTLogT: Complex, inverseT: Complex, tau: number): Complex {
  const aRe = t.re - tau;
  const bRe = t.re + tau;
  const sumLogRe = 0.5 * Math.log((aRe * aRe + t.im * t.im) * (bRe * bRe + t.im * t.im));
  const sumLogIm = Math.atan2(t.im, aRe) + Math.atan2(t.im, bRe);
  return {
    re: t.re * sumLogRe - t.im * sumLogIm - twoTLogT.re + tau * tau * inverseT.re,
    im: t.re * sumLogIm + t.im * sumLogRe - twoTLogT.im + tau * tau * inverseT.im,
  };
}
