/**
 * Peng–Robinson cubic equation of state for a pure fluid: compressibility roots and the
 * enthalpy departure from the ideal gas at the same temperature.
 *
 * Source: D.-Y. Peng, D. B. Robinson, A new two-constant equation of state, Ind. Eng. Chem.
 *   Fundam. 15, 59-64 (1976). Equations used (numbers as in the paper):
 *   p = R T / (v − b) − a(T) / [v (v + b) + b (v − b)]                         (Eq. 4)
 *   a(T_c) = 0.45724 R² T_c² / p_c, b = 0.07780 R T_c / p_c                     (Eqs. 9, 10)
 *   a(T) = a(T_c) α, α^(1/2) = 1 + κ (1 − T_r^(1/2))                            (Eqs. 12, 17)
 *   κ = 0.37464 + 1.54226 ω − 0.26992 ω²                                         (Eq. 18)
 *   Z³ − (1 − B) Z² + (A − 3B² − 2B) Z − (AB − B² − B³) = 0, A = a p / (RT)², B = b p / (RT)  (Eq. 5)
 *   (H − H°) = R T (Z − 1) + [T da/dT − a] / (2√2 b) · ln[(Z + (1 + √2) B) / (Z + (1 − √2) B)]
 *                                                                                  (Eq. 13)
 * Valid: the paper fits vapour pressures of non-polar fluids (T_r from about 0.5 to 1); it states
 *   no range for enthalpy. Phasecell's substances state the pressure and temperature range in
 *   which they use it. Uncertainty: none stated for enthalpy; see each substance.
 * Notation: T_c, p_c, ω (acentric factor) of the substance; Z = p v / (R T).
 * Deviations from the text: none. The cubic is solved in closed form (trigonometric form for
 *   three real roots, Cardano's form for one).
 */
import { MOLAR_GAS_CONSTANT } from "./gas-constant";

/** The substance constants the equation needs. */
export interface PengRobinsonFluid {
  /** Critical temperature, K. */
  readonly Tc: number;
  /** Critical pressure, Pa. */
  readonly pc: number;
  /** Acentric factor. */
  readonly omega: number;
}

/** Which compressibility root: largest (vapour-like) or smallest (liquid-like). */
export type CubicRoot = "vapor" | "liquid";

const SQRT2 = Math.SQRT2;

/** Real roots of x³ + c2 x² + c1 x + c0 = 0, ascending. */
function realCubicRoots(c2: number, c1: number, c0: number): number[] {
  // Depressed cubic y³ + p y + q = 0 with x = y − c2/3.
  const shift = c2 / 3;
  const p = c1 - (c2 * c2) / 3;
  const q = (2 * c2 * c2 * c2) / 27 - (c2 * c1) / 3 + c0;
  const discriminant = (q * q) / 4 + (p * p * p) / 27;
  if (discriminant > 0) {
    const s = Math.sqrt(discriminant);
    return [Math.cbrt(-q / 2 + s) + Math.cbrt(-q / 2 - s) - shift];
  }
  if (p === 0) return [-shift];
  const m = 2 * Math.sqrt(-p / 3);
  const argument = Math.max(-1, Math.min(1, (3 * q) / (p * m)));
  const theta = Math.acos(argument) / 3;
  const roots = [0, 1, 2].map((k) => m * Math.cos(theta - (2 * Math.PI * k) / 3) - shift);
  return roots.sort((x, y) => x - y);
}

/** a(T), da/dT and b at T for a fluid, in SI molar units. */
function attraction(fluid: PengRobinsonFluid, T: number): { a: number; dadT: number; b: number } {
  const R = MOLAR_GAS_CONSTANT;
  const ac = (0.45724 * R * R * fluid.Tc * fluid.Tc) / fluid.pc;
  const b = (0.0778 * R * fluid.Tc) / fluid.pc;
  const kappa = 0.37464 + 1.54226 * fluid.omega - 0.26992 * fluid.omega * fluid.omega;
  const sqrtAlpha = 1 + kappa * (1 - Math.sqrt(T / fluid.Tc));
  return { a: ac * sqrtAlpha * sqrtAlpha, dadT: (-ac * kappa * sqrtAlpha) / Math.sqrt(T * fluid.Tc), b };
}

/** Compressibility factors Z at (T, p) with Z above B (physical roots), ascending. */
export function pengRobinsonRoots(fluid: PengRobinsonFluid, T: number, p: number): number[] {
  const R = MOLAR_GAS_CONSTANT;
  const { a, b } = attraction(fluid, T);
  const A = (a * p) / (R * T * R * T);
  const B = (b * p) / (R * T);
  return realCubicRoots(-(1 - B), A - 3 * B * B - 2 * B, -(A * B - B * B - B * B * B)).filter((z) => z > B);
}

/**
 * Below this B = b p / (R T) the liquid root is taken from its expansion in B (see
 * {@link pengRobinsonZ}): at small B the closed-form roots lose the two small roots to rounding,
 * because the vapour root is about 1/B times larger (at B = 1e-7 the closed form is already off
 * by 2e-4 relative). At B = 1e-4 the expansion and the closed form agree to a few parts in 1e9
 * from 0.23 to 0.7 T_c (measured in test/core/models/engineering/peng-robinson.test.ts).
 */
const SMALL_B = 1e-4;

/**
 * Liquid root at small B. With u = v / b and α' = a / (b R T), the cubic divided by B² reads
 * F(u, B) = B u³ − (1 − B) u² + (α' − 3B − 2) u − (α' − 1 − B) = 0. At B = 0 the liquid root is
 * the smaller root of u² − (α' − 2) u + (α' − 1) = 0; one implicit-function step in B corrects
 * it: du/dB = −(u³ + u² − 3u + 1) / (α' − 2 − 2u). Returns undefined where no liquid root exists.
 */
function liquidZAtSmallB(alphaPrime: number, B: number): number | undefined {
  const discriminant = alphaPrime * alphaPrime - 8 * alphaPrime + 8;
  if (discriminant <= 0) return undefined;
  const u0 = (alphaPrime - 2 - Math.sqrt(discriminant)) / 2;
  const du = -(u0 * u0 * u0 + u0 * u0 - 3 * u0 + 1) / (alphaPrime - 2 - 2 * u0);
  return B * (u0 + B * du);
}

/**
 * Compressibility factor Z of the chosen root at (T, p). Where the cubic has a single real
 * root, that root serves both sides.
 */
export function pengRobinsonZ(fluid: PengRobinsonFluid, T: number, p: number, root: CubicRoot): number {
  if (root === "liquid") {
    const R = MOLAR_GAS_CONSTANT;
    const { a, b } = attraction(fluid, T);
    const B = (b * p) / (R * T);
    if (B < SMALL_B) {
      const z = liquidZAtSmallB(a / (b * R * T), B);
      if (z !== undefined) return z;
    }
  }
  const roots = pengRobinsonRoots(fluid, T, p);
  return root === "vapor" ? roots[roots.length - 1]! : roots[0]!;
}

/** Enthalpy departure H − H°(T), J/mol, of the chosen root at (T, p) (Eq. 13). */
export function pengRobinsonEnthalpyDeparture(fluid: PengRobinsonFluid, T: number, p: number, root: CubicRoot): number {
  const R = MOLAR_GAS_CONSTANT;
  const { a, dadT, b } = attraction(fluid, T);
  const B = (b * p) / (R * T);
  const Z = pengRobinsonZ(fluid, T, p, root);
  const logTerm = Math.log((Z + (1 + SQRT2) * B) / (Z + (1 - SQRT2) * B));
  return R * T * (Z - 1) + ((T * dadT - a) / (2 * SQRT2 * b)) * logTerm;
}
