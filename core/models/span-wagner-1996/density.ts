/**
 * Density of fluid carbon dioxide at given temperature and pressure on a chosen side of the
 * saturation line, by solving the Span–Wagner equation of state p(rho, T) = p; and the properties
 * there.
 *
 * Source: R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509-1596 (1996),
 *   doi:10.1063/1.555991: the equation of state of helmholtz.ts; the ancillary saturated densities
 *   Eqs. (3.14) and (3.15) serve only to place the brackets.
 * Valid: as helmholtz.ts. No range check here (the substance module checks T and p).
 * Deviations from the text: none; the paper gives the density-explicit form, and the density is
 *   found with the bracketed solver of core/numerics on a bracket that holds exactly one root (see
 *   densityOnSide for how each bracket was chosen and measured).
 */
import { NoSuchStateError, q } from "../../errors";
import { solveBracketed } from "../../numerics/roots";
import {
  SW96_CRITICAL_TEMPERATURE as Tc,
  SW96_GAS_CONSTANT as R,
  SW96_TRIPLE_TEMPERATURE as Tt,
} from "./fixed-points";
import {
  enthalpyOnIsotherm,
  isotherm,
  pressureOnIsotherm,
  pressureSlopeOnIsotherm,
  propertiesByDensity,
  type FluidProperties,
  type Isotherm,
} from "./helmholtz";
import { saturatedLiquidDensity } from "./saturated-liquid-density";
import { saturatedVaporDensity } from "./saturated-vapor-density";

/** Which branch of a subcritical isotherm is wanted; above T_c both give the one root. */
export type FluidSide = "liquid" | "vapor";

/**
 * Upper density of every liquid and supercritical bracket, kg/m³: p(1700 kg/m³, T) is at least
 * 1252 MPa from T_t to 1100 K (measured), above the 800 MPa limit of the equation.
 */
const RHO_MAX = 1700;
/**
 * Bounds of the compression factor Z = p/(rho R T) from T_c to 1100 K at pressures up to 800 MPa:
 * measured 0.2046 to 9.16 on a grid of 4001 isotherms by 3001 densities. The supercritical
 * bracket uses 0.18 and 12.
 */
const Z_MIN_SUPERCRITICAL = 0.18;
const Z_MAX_SUPERCRITICAL = 12;
/**
 * How far, in Pa, the pressure may lie beyond the end (spinodal) of the requested branch before
 * that branch is declared absent. Within 0.2 mK of T_c the liquid spinodal of the equation of
 * state lies above Eq. (3.13) by up to 0.024 Pa (measured), so the liquid at the ancillary
 * saturation pressure does not exist there; the allowance is twice that, and the state returned
 * is then the end of the requested branch, the spinodal itself, whose pressure differs from the
 * one asked for by at most that much. (Returning the root on the other side of the loop instead
 * would make the latent heat drop to zero 0.2 mK below T_c.)
 */
const SPINODAL_ALLOWANCE = 0.05;

/**
 * Below this temperature, K, the isotherms have up to four turning points between the saturated
 * densities; from it to T_c two (the spinodals), with one exception measured in a narrow window
 * near 303.898 K, where a wiggle of 0.4 kg/m³ sits just above the liquid spinodal.
 */
const TWO_TURNS_T = 303;

/**
 * Density in kg/m³ at temperature T (K) and pressure p (Pa) on the requested side, by Brent's
 * method on a bracket holding exactly one root.
 *
 * Below T_c the isotherms of the equation have loops between the saturated densities (up to four
 * turning points; p at 216.592 K swings from −1.6 GPa to +4.6 GPa between 427 and 635 kg/m³), so
 * only brackets that stay outside them pick the physical root. Every claim below was measured on
 * the equation itself (isotherms every 0.01 K from T_t to 303 K and 3001 isotherms from 303 K to
 * 1 nK below T_c):
 *
 * - T ≥ T_c: [p/(12 R T), min(p/(0.18 R T), 1700 kg/m³)], from the bounds of Z; p rises strictly
 *   with rho there (least slope 0.010 Pa·m³/kg, 50 nK above T_c).
 * - Vapour below T_t (over the solid): [0.99 p/(R T), 2 p/(R T)]: Z lies between 0.912 and 1 on
 *   the vapour side of the sublimation curve from 150 K to T_t and p rises with rho.
 * - Vapour from T_t to T_c: [0.99 p/(R T), 1.001 rho''] with rho'' from Eq. (3.15). Z is below 1
 *   on the vapour branch, p rises with rho up to 1.001 rho'', and p(1.001 rho'') exceeds
 *   Eq. (3.13) at every temperature below T_c, so every pressure up to the ancillary vapour
 *   pressure is bracketed.
 * - Liquid from T_t to T_c: [0.999 rho', 1700 kg/m³] with rho' from Eq. (3.14). p rises with rho
 *   there and p(0.999 rho') is below Eq. (3.13) up to 0.46 mK below T_c, by 528 kPa at T_t and
 *   5.4 kPa at 300 K, while the equation's own saturation pressure and Eq. (3.13) differ by at
 *   most 141 Pa. So the slightly metastable liquid that the ancillary phase boundary may ask for
 *   is always found.
 * - Further into the metastable region (or for the liquid within 0.46 mK of T_c) the bracket ends
 *   at the spinodal of the requested branch, found as the zero of dp/drho between the bracket end
 *   above and a density inside the adjoining falling stretch of the loop: below 303 K
 *   sqrt(rho' rho'') for the vapour and rho' − (rho' − rho'')/4 for the liquid (at least 8 % and
 *   17 % of the stretch's width from its ends), from 303 K the mean (rho' + rho'')/2.
 * - From 303 K up, a pressure beyond the requested branch's spinodal by no more than 0.05 Pa
 *   returns the spinodal density (see SPINODAL_ALLOWANCE). Should the interior density ever fall
 *   outside the loop (not seen down to 1 nK below T_c) the isotherm is treated as supercritical.
 *   In the window near 303.898 K (see TWO_TURNS_T) a liquid asked for more than 0.8 kPa below the
 *   vapour pressure may be placed on the wiggle instead of the spinodal.
 *
 * @throws NoSuchStateError when p lies beyond the end of the requested branch.
 * @throws ConvergenceError when no bracket holds a sign change (p above about 1.2 GPa, outside the
 *   equation's range).
 */
export function densityOnSide(temperatureK: number, pressurePa: number, side: FluidSide): number {
  return densityOnIsotherm(isotherm(temperatureK), pressurePa, side);
}

function densityOnIsotherm(iso: Isotherm, pressurePa: number, side: FluidSide): number {
  const temperatureK = iso.temperatureK;
  const residual = (densityKgM3: number): number => pressureOnIsotherm(iso, densityKgM3) - pressurePa;
  const idealGasDensity = pressurePa / (R * temperatureK);
  if (temperatureK >= Tc) return supercriticalRoot(residual, idealGasDensity);
  if (side === "vapor" && temperatureK < Tt) {
    return solveBracketed(residual, 0.99 * idealGasDensity, 2 * idealGasDensity);
  }
  const slope = (densityKgM3: number): number => pressureSlopeOnIsotherm(iso, densityKgM3);
  if (side === "liquid") {
    const liquid = saturatedLiquidDensity(temperatureK);
    const low = 0.999 * liquid;
    if (residual(low) < 0) return solveBracketed(residual, low, RHO_MAX);
    const vapor = saturatedVaporDensity(temperatureK);
    const inside = temperatureK < TWO_TURNS_T ? liquid - 0.25 * (liquid - vapor) : 0.5 * (liquid + vapor);
    if (slope(inside) >= 0 || slope(low) <= 0) return supercriticalRoot(residual, idealGasDensity);
    const spinodal = solveBracketed(slope, inside, low);
    const shortfall = residual(spinodal);
    if (shortfall < 0) return solveBracketed(residual, spinodal, low);
    if (shortfall > SPINODAL_ALLOWANCE || temperatureK < TWO_TURNS_T) {
      throw noBranch(iso, pressurePa, side, pressurePa + shortfall);
    }
    return spinodal;
  }
  const vapor = saturatedVaporDensity(temperatureK);
  const high = 1.001 * vapor;
  if (residual(high) > 0) return solveBracketed(residual, 0.99 * idealGasDensity, high);
  const liquid = saturatedLiquidDensity(temperatureK);
  const inside = temperatureK < TWO_TURNS_T ? Math.sqrt(liquid * vapor) : 0.5 * (liquid + vapor);
  if (slope(inside) >= 0 || slope(high) <= 0) return supercriticalRoot(residual, idealGasDensity);
  const spinodal = solveBracketed(slope, high, inside);
  const excess = residual(spinodal);
  if (excess > 0) return solveBracketed(residual, high, spinodal);
  if (-excess > SPINODAL_ALLOWANCE || temperatureK < TWO_TURNS_T) {
    throw noBranch(iso, pressurePa, side, pressurePa + excess);
  }
  return spinodal;
}

function supercriticalRoot(residual: (densityKgM3: number) => number, idealGasDensity: number): number {
  return solveBracketed(
    residual,
    idealGasDensity / Z_MAX_SUPERCRITICAL,
    Math.min(idealGasDensity / Z_MIN_SUPERCRITICAL, RHO_MAX),
  );
}

function noBranch(iso: Isotherm, pressurePa: number, side: FluidSide, spinodalPa: number): NoSuchStateError {
  const limit = side === "liquid" ? "lowest pressure of its liquid branch" : "highest pressure of its vapour branch";
  return new NoSuchStateError([
    `no ${side === "liquid" ? "liquid" : "vapour"} state of carbon dioxide at `,
    q.T(iso.temperatureK),
    " and ",
    q.p(pressurePa),
    ` in the Span–Wagner equation of state: at this temperature the ${limit} is `,
    q.p(spinodalPa),
  ]);
}

/** All properties at (T, p) on the requested side (see densityOnSide). */
export function propertiesOnSide(temperatureK: number, pressurePa: number, side: FluidSide): FluidProperties {
  return propertiesByDensity(densityOnSide(temperatureK, pressurePa, side), temperatureK);
}

/** Specific enthalpy in J/kg at (T, p) on the requested side (see densityOnSide). */
export function enthalpyOnSide(temperatureK: number, pressurePa: number, side: FluidSide): number {
  const iso = isotherm(temperatureK);
  return enthalpyOnIsotherm(iso, densityOnIsotherm(iso, pressurePa, side));
}
