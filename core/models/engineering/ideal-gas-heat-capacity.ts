/**
 * Ideal-gas isobaric heat capacity and its integral (the ideal-gas enthalpy up to a constant).
 *
 * Sources of the forms:
 * - Poling polynomial: B. E. Poling, J. M. Prausnitz, J. P. O'Connell, The Properties of Gases
 *   and Liquids, 5th ed. (2001), Appendix A, Section C: c_p° / R = a0 + a1 T + a2 T² + a3 T³ +
 *   a4 T⁴ with T in K, each set with its own temperature range.
 * - Shomate equation: the form used by the NIST Chemistry WebBook for fits to the NIST-JANAF
 *   tables (M. W. Chase Jr., NIST-JANAF Thermochemical Tables, 4th ed., 1998): c_p° = A + B t +
 *   C t² + D t³ + E / t², t = T / 1000 K, c_p° in J/(mol K).
 * - Tabulated values: c_p° printed at a list of temperatures (e.g. NIST-JANAF), joined by
 *   straight lines; the enthalpy is the exact integral of that broken line.
 * - Monatomic gas: c_p° = 5/2 R exactly (translational degrees of freedom only; electronic
 *   excitation of the noble gases is negligible below several thousand kelvin).
 * Valid: each set states its range; {@link idealGasRange} reports it and callers enforce it.
 * Uncertainty: stated per substance.
 * Deviations from the texts: none. The enthalpy integrals are exact antiderivatives; their zero
 *   is arbitrary (only differences are used).
 */
import { MOLAR_GAS_CONSTANT } from "./gas-constant";

/** Poling Appendix A polynomial for c_p° / R. */
export interface PolingPolynomial {
  readonly kind: "poling";
  /** a0 … a4 as printed (a_i in K^-i). */
  readonly a: readonly [number, number, number, number, number];
  readonly tMin: number;
  readonly tMax: number;
}

/** Shomate coefficients (c_p° in J/(mol K), t = T / 1000 K). */
export interface ShomateCoefficients {
  readonly kind: "shomate";
  readonly A: number;
  readonly B: number;
  readonly C: number;
  readonly D: number;
  readonly E: number;
  readonly tMin: number;
  readonly tMax: number;
}

/** c_p° printed at rising temperatures, joined by straight lines. */
export interface TabulatedHeatCapacity {
  readonly kind: "table";
  /** Temperatures, K, strictly rising. */
  readonly T: readonly number[];
  /** c_p° at those temperatures, J/(mol K). */
  readonly cp: readonly number[];
}

/** A monatomic ideal gas: c_p° = 5/2 R at every temperature. */
export interface MonatomicGas {
  readonly kind: "monatomic";
}

/** Any of the supported ideal-gas heat-capacity forms. */
export type IdealGasHeatCapacity = PolingPolynomial | ShomateCoefficients | TabulatedHeatCapacity | MonatomicGas;

/** Temperature range of a form, K. A monatomic gas has no limit of its own. */
export function idealGasRange(model: IdealGasHeatCapacity): readonly [number, number] {
  switch (model.kind) {
    case "poling":
    case "shomate":
      return [model.tMin, model.tMax];
    case "table":
      return [model.T[0]!, model.T[model.T.length - 1]!];
    case "monatomic":
      return [0, Infinity];
  }
}

/** Index i of the table interval T[i] ≤ T ≤ T[i + 1] holding T (the last interval at its top). */
function tableInterval(model: TabulatedHeatCapacity, T: number): number {
  let i = 0;
  while (i < model.T.length - 2 && T > model.T[i + 1]!) i++;
  return i;
}

/** Ideal-gas isobaric heat capacity, J/(mol K), at T in K (range checked by the caller). */
export function idealGasHeatCapacity(model: IdealGasHeatCapacity, T: number): number {
  switch (model.kind) {
    case "poling": {
      const [a0, a1, a2, a3, a4] = model.a;
      return MOLAR_GAS_CONSTANT * (a0 + T * (a1 + T * (a2 + T * (a3 + T * a4))));
    }
    case "shomate": {
      const t = T / 1000;
      return model.A + t * (model.B + t * (model.C + t * model.D)) + model.E / (t * t);
    }
    case "table": {
      const i = tableInterval(model, T);
      const t0 = model.T[i]!;
      const t1 = model.T[i + 1]!;
      const c0 = model.cp[i]!;
      const c1 = model.cp[i + 1]!;
      return c0 + ((c1 - c0) * (T - t0)) / (t1 - t0);
    }
    case "monatomic":
      return 2.5 * MOLAR_GAS_CONSTANT;
  }
}

/** Integral of a straight-line c_p from T[i] to T inside interval i, J/mol. */
function lineIntegral(model: TabulatedHeatCapacity, i: number, T: number): number {
  const t0 = model.T[i]!;
  const slope = (model.cp[i + 1]! - model.cp[i]!) / (model.T[i + 1]! - t0);
  const dt = T - t0;
  return model.cp[i]! * dt + 0.5 * slope * dt * dt;
}

/**
 * Ideal-gas enthalpy, J/mol, at T in K, up to an additive constant that is the same for every T
 * of one model: the exact antiderivative of {@link idealGasHeatCapacity}.
 */
export function idealGasEnthalpy(model: IdealGasHeatCapacity, T: number): number {
  switch (model.kind) {
    case "poling": {
      const [a0, a1, a2, a3, a4] = model.a;
      return MOLAR_GAS_CONSTANT * T * (a0 + T * (a1 / 2 + T * (a2 / 3 + T * (a3 / 4 + T * (a4 / 5)))));
    }
    case "shomate": {
      // NIST's H° − H°(298.15 K) = A t + B t²/2 + C t³/3 + D t⁴/4 − E/t + F − H, in kJ/mol; the
      // constant F − H drops out of differences.
      const t = T / 1000;
      return 1000 * (t * (model.A + t * (model.B / 2 + t * (model.C / 3 + t * (model.D / 4)))) - model.E / t);
    }
    case "table": {
      const i = tableInterval(model, T);
      let sum = 0;
      for (let j = 0; j < i; j++) sum += lineIntegral(model, j, model.T[j + 1]!);
      return sum + lineIntegral(model, i, T);
    }
    case "monatomic":
      return 2.5 * MOLAR_GAS_CONSTANT * T;
  }
}
