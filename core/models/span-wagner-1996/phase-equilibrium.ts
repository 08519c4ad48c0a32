/**
 * Liquid–vapour phase equilibrium of carbon dioxide from the Span–Wagner equation of state itself
 * (the Maxwell criterion): saturation pressure and the properties of both coexisting phases at a
 * given temperature.
 *
 * Source: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509-1596 (1996),
 *   doi:10.1063/1.555991: the equation of state (helmholtz.ts) and the phase-equilibrium
 *   conditions p' = p'' = p_s and g' = g'' at equal temperature, from which the paper computes its
 *   saturation table.
 * Valid: 216.592 K ≤ T ≤ 304 K (see SATURATION_EOS_T_MAX). Phasecell's phase map uses the
 *   ancillary Eq. (3.13) instead; this module checks that equation and the latent heats.
 * Deviations from the text: none in the conditions. They are solved as one equation in p,
 *   g'(p) − g''(p) = 0, with both densities from density.ts, by the bracketed solver.
 */
import { solveBracketed } from "../../numerics/roots";
import { propertiesOnSide } from "./density";
import type { FluidProperties } from "./helmholtz";
import { vaporPressure } from "./vapor-pressure";

/**
 * Highest temperature of the solve, K. The pressure bracket is Eq. (3.13) ± 0.005 %: the equation's
 * own saturation pressure lies between −0.0025 % and +0.0042 % of Eq. (3.13) (measured every 0.02 K
 * from 216.592 K to 304 K), and up to 304 K both ends of that bracket lie inside both spinodals
 * (the nearest, the vapour spinodal at 304 K, is 0.0088 % above the saturation pressure), so both
 * phases exist at both ends.
 */
export const SATURATION_EOS_T_MAX = 304;

/** Saturation pressure of the equation of state and the two coexisting phases. */
export interface SaturationState {
  /** Saturation pressure p_s, Pa. */
  readonly pressure: number;
  /** Saturated liquid (') at T and p_s. */
  readonly liquid: FluidProperties;
  /** Saturated vapour ('') at T and p_s. */
  readonly vapor: FluidProperties;
}

/** Phase equilibrium of the equation of state at T in K; no range check (see the module header). */
export function saturationStateEOS(temperatureK: number): SaturationState {
  const gibbsGap = (pressurePa: number): number =>
    propertiesOnSide(temperatureK, pressurePa, "liquid").gibbs - propertiesOnSide(temperatureK, pressurePa, "vapor").gibbs;
  const ancillary = vaporPressure(temperatureK);
  const pressure = solveBracketed(gibbsGap, ancillary * (1 - 5e-5), ancillary * (1 + 5e-5), { relTolerance: 1e-13 });
  return {
    pressure,
    liquid: propertiesOnSide(temperatureK, pressure, "liquid"),
    vapor: propertiesOnSide(temperatureK, pressure, "vapor"),
  };
}
