/**
 * Thermodynamic properties of water near and above the critical point, IAPWS-IF97 region 3
 * (basic equation, Helmholtz free energy f(rho, T)), and their evaluation at given (T, p) by
 * solving the basic equation for density.
 *
 * Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 *   Properties of Water and Steam (IAPWS R7-97(2012)), Sec. 7: basic equation Eq. (28),
 *   coefficients Table 30, property relations and derivatives of phi as given there; check values
 *   Table 33 (at given T and rho).
 * Valid: 623.15 K ≤ T ≤ T_B23(p) and p_B23(T) ≤ p ≤ 100 MPa (B23 from b23.ts). No range check
 *   here; regions.ts selects the region and rejects states outside IF97.
 * Uncertainty: given in the release only as figures (not transcribed); none is stated for h. Near
 *   the critical point (within about 1 K and 0.5 MPa of it) c_p and the density solve are very
 *   sensitive to T and p.
 * Notation: phi = f/(RT), delta = rho/rho_c, tau = T_c/T with rho_c = 322 kg/m³,
 *   T_c = 647.096 K; phi = n1 ln(delta) + Σ(i=2..40) n_i delta^I_i tau^J_i.
 * Deviations from the text: none in the basic equation. The release gives only the
 *   density-explicit form; h(T, p) here solves p(rho, T) = p with the bracketed solver of
 *   core/numerics (how the bracket is chosen is explained at region3Density); inside the solve
 *   delta·phi_delta is the same sum regrouped by powers of delta for the fixed T (one array of
 *   12 numbers per solve). The IAPWS supplementary backward equations v(p, T) for region 3 are not
 *   used. SI in and out.
 */
import { NoSuchStateError, q } from "../../errors";
import { solveBracketed } from "../../numerics/roots";
import { saturatedLiquidDensity, saturatedVaporDensity } from "../iapws-sr1/saturation-properties";
import { IF97_GAS_CONSTANT as R, integerPower, type Region3Properties } from "./properties";
import { saturationPressureIF97 } from "./region4";

/**
 * IF97 Table 30, exponents I_i, i = 2…40. Index 0 is unused and index 1 has no exponent (n1
 * multiplies ln(delta)), so that I[i] reads as in the release.
 */
const I: readonly number[] = [
  Number.NaN,
  Number.NaN,
  0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4, 4, 4, 5, 5, 5, 6, 6, 6,
  7, 8, 9, 9, 10, 10, 11,
];

/** IF97 Table 30, exponents J_i, i = 2…40 (indices 0 and 1 unused). */
const J: readonly number[] = [
  Number.NaN,
  Number.NaN,
  0, 1, 2, 7, 10, 12, 23, 2, 6, 15, 17, 0, 2, 6, 7, 22, 26, 0, 2, 4, 16, 26, 0, 2, 4, 26, 1, 3, 26,
  0, 2, 26, 2, 26, 2, 26, 0, 1, 26,
];

/** IF97 Table 30, coefficients n_i, i = 1…40 (index 0 unused; n1 is the coefficient of ln(delta)). */
const n: readonly number[] = [
  Number.NaN,
  0.10658070028513e1, // 1
  -0.15732845290239e2, // 2
  0.20944396974307e2, // 3
  -0.76867707878716e1, // 4
  0.26185947787954e1, // 5
  -0.28080781148620e1, // 6
  0.12053369696517e1, // 7
  -0.84566812812502e-2, // 8
  -0.12654315477714e1, // 9
  -0.11524407806681e1, // 10
  0.88521043984318, // 11
  -0.64207765181607, // 12
  0.38493460186671, // 13
  -0.85214708824206, // 14
  0.48972281541877e1, // 15
  -0.30502617256965e1, // 16
  0.39420536879154e-1, // 17
  0.12558408424308, // 18
  -0.27999329698710, // 19
  0.13899799569460e1, // 20
  -0.20189915023570e1, // 21
  -0.82147637173963e-2, // 22
  -0.47596035734923, // 23
  0.43984074473500e-1, // 24
  -0.44476435428739, // 25
  0.90572070719733, // 26
  0.70522450087967, // 27
  0.10770512626332, // 28
  -0.32913623258954, // 29
  -0.50871062041158, // 30
  -0.22175400873096e-1, // 31
  0.94260751665092e-1, // 32
  0.16436278447961, // 33
  -0.13503372241348e-1, // 34
  -0.14834345352472e-1, // 35
  0.57922953628084e-3, // 36
  0.32308904703711e-2, // 37
  0.80964802996215e-4, // 38
  -0.16557679795037e-3, // 39
  -0.44923899061815e-4, // 40
];

/** Critical density rho_c, kg/m³ (IF97 Eq. (4)), the reducing density of Eq. (28). */
const rhoc = 322;
/** Critical temperature T_c, K (IF97 Eq. (2)), the reducing temperature of Eq. (28). */
const Tc = 647.096;

/**
 * Properties in IF97 region 3 at density rho (kg/m³) and temperature T (K), including the
 * pressure. No range check: see the module header for where the equation is valid.
 */
export function region3ByDensity(densityKgM3: number, temperatureK: number): Region3Properties {
  const delta = densityKgM3 / rhoc;
  const tau = Tc / temperatureK;
  let phi = n[1]! * Math.log(delta);
  let deltaPhiDelta = n[1]!;
  let delta2PhiDeltaDelta = -n[1]!;
  let tauPhiTau = 0;
  let tau2PhiTauTau = 0;
  let deltaTauPhiDeltaTau = 0;
  for (let i = 2; i <= 40; i++) {
    const Ii = I[i]!;
    const Ji = J[i]!;
    const term = n[i]! * integerPower(delta, Ii) * integerPower(tau, Ji);
    phi += term;
    deltaPhiDelta += Ii * term;
    delta2PhiDeltaDelta += Ii * (Ii - 1) * term;
    tauPhiTau += Ji * term;
    tau2PhiTauTau += Ji * (Ji - 1) * term;
    deltaTauPhiDeltaTau += Ii * Ji * term;
  }
  const RT = R * temperatureK;
  const x = deltaPhiDelta - deltaTauPhiDeltaTau;
  return {
    pressure: densityKgM3 * RT * deltaPhiDelta,
    specificVolume: 1 / densityKgM3,
    density: densityKgM3,
    enthalpy: RT * (tauPhiTau + deltaPhiDelta),
    internalEnergy: RT * tauPhiTau,
    entropy: R * (tauPhiTau - phi),
    isobaricHeatCapacity:
      R * (-tau2PhiTauTau + (x * x) / (2 * deltaPhiDelta + delta2PhiDeltaDelta)),
    speedOfSound: Math.sqrt(
      RT * (2 * deltaPhiDelta + delta2PhiDeltaDelta - (x * x) / tau2PhiTauTau),
    ),
  };
}

/** Largest exponent I_i of Table 30. */
const maxI = 11;

/**
 * The delta-dependent part of Eq. (28) on one isotherm, regrouped by powers of delta:
 * c[k] = Σ n_i tau^J_i over the terms with I_i = k (k = 1…11; the I_i = 0 terms do not depend on
 * delta and drop out of p). The density solve evaluates p many times at one temperature; with
 * these sums each evaluation is one polynomial in delta instead of 32 pairs of powers.
 */
function isothermCoefficients(temperatureK: number): Float64Array {
  const tau = Tc / temperatureK;
  const c = new Float64Array(maxI + 1);
  for (let i = 9; i <= 40; i++) c[I[i]!]! += n[i]! * integerPower(tau, J[i]!);
  return c;
}

/**
 * Pressure p(rho, T) = rho·R·T·delta·phi_delta in Pa from the isotherm sums c (see
 * isothermCoefficients): delta·phi_delta = n1 + Σ k·c[k]·delta^k, by Horner's rule.
 */
function pressure(densityKgM3: number, temperatureK: number, c: Float64Array): number {
  const delta = densityKgM3 / rhoc;
  let sum = 0;
  for (let k = maxI; k >= 1; k--) sum = (sum + k * c[k]!) * delta;
  return densityKgM3 * R * temperatureK * (n[1]! + sum);
}

/**
 * Isothermal slope (dp/drho) in Pa·m³/kg: R·T·(2·delta·phi_delta + delta²·phi_deltadelta)
 * = R·T·(n1 + Σ k·(k + 1)·c[k]·delta^k).
 */
function pressureSlope(densityKgM3: number, temperatureK: number, c: Float64Array): number {
  const delta = densityKgM3 / rhoc;
  let sum = 0;
  for (let k = maxI; k >= 1; k--) sum = (sum + k * (k + 1) * c[k]!) * delta;
  return R * temperatureK * (n[1]! + sum);
}

/** Upper density of every bracket, kg/m³ (see region3Density). */
const rhoMax = 800;
/** Lower density of the vapour-like and supercritical brackets, kg/m³. */
const rhoMin = 1;
/**
 * How far, in Pa, a pressure may lie beyond the end (spinodal) of the requested branch before the
 * branch is declared absent: twice the largest gap measured between p_s of Eq. (30) and the
 * vapour spinodal of Eq. (28) just below T_c (8.3e-4 Pa, at T_c − 1.3e-5 K).
 */
const spinodalAllowance = 2e-3;

/** Which branch of a subcritical isotherm of Eq. (28) is wanted. */
export type Region3Side = "liquid" | "vapor";

/**
 * Density in kg/m³ of the region-3 state at temperature T (K) and pressure p (Pa), from
 * p(rho, T) = p with Eq. (28), by Brent's method on a bracket that holds exactly one root. Below
 * T_c the branch follows the saturation line: liquid-like for p ≥ p_s(T) (IF97 Eq. (30)),
 * vapour-like below it.
 *
 * Below T_c the isotherms of Eq. (28) have a van der Waals loop: p rises with rho up to the vapour
 * spinodal, falls to the liquid spinodal, then rises again, so a level near p_s(T) is met three
 * times and the middle root (where p falls with rho) is unphysical. The bracket is chosen as
 * follows; every claim in it was measured on Eq. (28) itself (623.15 K to T_c):
 *
 * - T ≥ T_c: [1, 800] kg/m³. The isotherms rise monotonically there: Eq. (28) reproduces the
 *   critical point, its slope dp/drho at (T_c, rho_c) is zero to rounding (−6e-7 Pa·m³/kg) and
 *   positive above T_c; p(1 kg/m³) stays below 0.43 MPa and p(800 kg/m³) above 140 MPa throughout
 *   region 3.
 * - Liquid branch below T_c: [0.999 rho', 800] with rho' from SR1-86. Above about 643 K the
 *   saturated-liquid density of Eq. (28) lies below 0.999 rho' (Eq. (28) is analytic at the
 *   critical point, SR1-86 is not), so p(0.999 rho') can exceed p and the bracket holds no sign
 *   change. The lower end is then widened to rho_c = 322 kg/m³: rho_c lies between the two
 *   spinodals, and p(rho_c, T) stays below p_s(T) for every T below T_c (by 2.8 kPa at 646 K,
 *   about 110 Pa/K times (T_c − T) closer in, never less than 3e-4 Pa), so from rho_c the
 *   isotherm falls to the liquid spinodal and then crosses p once, at the liquid root. (Only a
 *   metastable liquid well below p_s needs the liquid spinodal itself as the lower end.)
 * - Vapour branch below T_c: [1, 1.001 rho''] with rho'' from SR1-86. Near T_c that upper end
 *   can lie below the vapour root for the same reason; it is then widened to the vapour spinodal
 *   (the root of dp/drho on [1, rho_c], itself found by the bracketed solver), the highest
 *   pressure of the vapour branch, and [1, spinodal] holds the vapour root alone.
 * - Within 3.5e-5 K of T_c the vapour spinodal of Eq. (28) lies up to 8.3e-4 Pa below p_s of
 *   Eq. (30), so for p in that sliver Eq. (28) has no vapour root at all. There, and generally
 *   when p lies beyond the requested branch's spinodal by no more than 2e-3 Pa, the only root is
 *   returned; it lies inside a loop then narrower than 0.6 kg/m³.
 * - Should rounding ever make the slope at rho_c non-negative below T_c (not seen down to
 *   T_c − 1e-9 K) the isotherm is treated like a supercritical one.
 *
 * No range check: the state should lie in region 3 (regions.ts decides that).
 * @throws ConvergenceError if no bracket holds a sign change (a state far outside region 3, such
 *   as p above p(800 kg/m³, T)).
 */
export function region3Density(temperatureK: number, pressurePa: number): number {
  const side: Region3Side =
    temperatureK < Tc && pressurePa < saturationPressureIF97(temperatureK) ? "vapor" : "liquid";
  return densityOnSide(temperatureK, pressurePa, side);
}

/**
 * Properties in IF97 region 3 at temperature T (K) and pressure p (Pa): the density from
 * region3Density, then Eq. (28) at that density. The returned pressure is p(rho, T), equal to the
 * given p to the solver's tolerance (a few ulps in rho).
 */
export function region3(temperatureK: number, pressurePa: number): Region3Properties {
  return region3ByDensity(region3Density(temperatureK, pressurePa), temperatureK);
}

/**
 * Properties in IF97 region 3 at temperature T (K) and pressure p (Pa) on the requested branch
 * of the isotherm, whatever side of p_s(T) the pressure lies on: for the two coexisting phases
 * at saturation (latent heats) and for slightly metastable states. Brackets as in
 * region3Density; above T_c the side does not matter (one root).
 * @throws NoSuchStateError when p lies beyond the end (spinodal) of the requested branch by more
 *   than 2e-3 Pa, so that Eq. (28) has no such state.
 * @throws ConvergenceError as region3Density.
 */
export function region3OnSide(temperatureK: number, pressurePa: number, side: Region3Side): Region3Properties {
  return region3ByDensity(densityOnSide(temperatureK, pressurePa, side), temperatureK);
}

function densityOnSide(temperatureK: number, pressurePa: number, side: Region3Side): number {
  const c = isothermCoefficients(temperatureK);
  const residual = (densityKgM3: number): number => pressure(densityKgM3, temperatureK, c) - pressurePa;
  if (temperatureK >= Tc || pressureSlope(rhoc, temperatureK, c) >= 0) {
    return solveBracketed(residual, rhoMin, rhoMax);
  }
  const slope = (densityKgM3: number): number => pressureSlope(densityKgM3, temperatureK, c);
  if (side === "liquid") {
    const low = 0.999 * saturatedLiquidDensity(temperatureK);
    if (low > rhoc && residual(low) < 0) return solveBracketed(residual, low, rhoMax);
    if (residual(rhoc) < 0) return solveBracketed(residual, rhoc, rhoMax);
    const spinodal = solveBracketed(slope, rhoc, rhoMax);
    const shortfall = residual(spinodal);
    if (shortfall < 0) return solveBracketed(residual, spinodal, rhoMax);
    if (shortfall > spinodalAllowance) throw noBranch(temperatureK, pressurePa, side, pressurePa + shortfall);
    return solveBracketed(residual, rhoMin, rhoc);
  }
  const high = 1.001 * saturatedVaporDensity(temperatureK);
  if (high < rhoc && residual(high) > 0) return solveBracketed(residual, rhoMin, high);
  const spinodal = solveBracketed(slope, rhoMin, rhoc);
  const excess = residual(spinodal);
  if (excess > 0) return solveBracketed(residual, rhoMin, spinodal);
  if (-excess > spinodalAllowance) throw noBranch(temperatureK, pressurePa, side, pressurePa + excess);
  return solveBracketed(residual, rhoc, rhoMax);
}

function noBranch(temperatureK: number, pressurePa: number, side: Region3Side, spinodalPa: number): NoSuchStateError {
  const limit = side === "liquid" ? "lowest pressure of its liquid branch" : "highest pressure of its vapour branch";
  return new NoSuchStateError([
    `no ${side === "liquid" ? "liquid" : "vapour"} state of water at `,
    q.T(temperatureK),
    " and ",
    q.p(pressurePa),
    ` in IAPWS-IF97 region 3: at this temperature the ${limit} is `,
    q.p(spinodalPa),
  ]);
}
