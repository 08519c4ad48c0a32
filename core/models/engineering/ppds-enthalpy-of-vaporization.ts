/**
 * Enthalpy of vaporization of a pure fluid from the PPDS equation of the VDI Heat Atlas.
 *
 * Source: VDI e.V. (ed.), VDI Heat Atlas, 2nd ed., Springer (2010), part D3.1 (M. Kleiber,
 *   R. Joh), PPDS equation for the enthalpy of vaporization with its coefficient table.
 * Equation: Δh_v = R T_c [A τ^(1/3) + B τ^(2/3) + C τ + D τ² + E τ⁶], τ = 1 − T / T_c.
 * Valid: triple point to T_c. Uncertainty: the Heat Atlas gives none per substance; Phasecell
 *   measures the equation against the Heat Atlas saturation tables per substance (within 0.2 %
 *   below 0.95 T_c for the substances checked).
 * Notation: T_c as printed with the coefficients; A … E as printed; R the molar gas constant.
 * Deviations from the text: none here. A substance may evaluate τ with its own critical
 *   temperature where that differs from the printed one, and may scale the result to a cited
 *   value at the normal boiling point; it says so where it does.
 */
import { MOLAR_GAS_CONSTANT } from "./gas-constant";

/** One PPDS coefficient set with the critical temperature printed beside it. */
export interface PpdsVaporizationCoefficients {
  /** Critical temperature printed with the coefficients, K. */
  readonly Tc: number;
  readonly A: number;
  readonly B: number;
  readonly C: number;
  readonly D: number;
  readonly E: number;
}

/**
 * Molar enthalpy of vaporization, J/mol, at T in K, with τ = 1 − T / tauTc (by default the
 * printed T_c). T must not exceed tauTc.
 */
export function ppdsEnthalpyOfVaporization(k: PpdsVaporizationCoefficients, T: number, tauTc: number = k.Tc): number {
  const tau = 1 - T / tauTc;
  const cube = Math.cbrt(tau);
  return (
    MOLAR_GAS_CONSTANT *
    k.Tc *
    (k.A * cube + k.B * cube * cube + k.C * tau + k.D * tau * tau + k.E * Math.pow(tau, 6))
  );
}
