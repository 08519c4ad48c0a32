/**
 * Saturation properties of ordinary water along the liquid–vapour line from simple auxiliary
 * equations: vapour pressure, its slope, saturated liquid and vapour densities, enthalpies and
 * entropies.
 *
 * Source: IAPWS SR1-86(1992), Revised Supplementary Release on Saturation Properties of Ordinary
 *   Water Substance; W. Wagner, A. Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993). Equations
 *   for p_sigma, rho', rho'', the auxiliary quantities alpha and phi, and h', h'', s', s'' built
 *   from them, with their coefficients a_i, b_i, c_i and d_i as printed; check values in the
 *   release's table of values for computer programs (at 273.16 K, 373.1243 K and 647.096 K).
 * Valid: from the triple point, 273.16 K, to the critical point, 647.096 K. No range check here
 *   (above T_c the powers of (1 − T/T_c) are not real).
 * Uncertainty: stated in the release (not transcribed here). The equations share the IAPWS
 *   energy and entropy zero (the release's check values give h' = 0.000611786 kJ/kg and s' = 0 at
 *   273.16 K). Phasecell uses IF97 Eq. (30) as its saturation line; these equations serve
 *   brackets (rho', rho'') and quick saturated-state values.
 * Notation: tau = 1 − T/T_c, theta = T/T_c; T_c = 647.096 K, p_c = 22.064 MPa,
 *   rho_c = 322 kg/m³; alpha0 = 1000 J/kg, phi0 = alpha0/T_c. ln(p_sigma/p_c) =
 *   (T_c/T)·Σ a_i tau^t_i; rho'/rho_c = 1 + Σ b_i tau^(e_i); ln(rho''/rho_c) = Σ c_i tau^(f_i);
 *   alpha/alpha0 = d_alpha + d1 theta^-19 + d2 theta + d3 theta^4.5 + d4 theta^5 + d5 theta^54.5;
 *   phi/phi0 = d_phi + (19/20) d1 theta^-20 + d2 ln(theta) + (9/7) d3 theta^3.5
 *   + (5/4) d4 theta^4 + (109/107) d5 theta^53.5; h = alpha + (T/rho)·dp_sigma/dT,
 *   s = phi + (1/rho)·dp_sigma/dT for either phase.
 * Deviations from the text: none. dp_sigma/dT is the analytic derivative of the vapour-pressure
 *   equation. SI in and out (K, Pa, kg/m³, J/kg, J/(kg·K)).
 */

/** Critical temperature, K. */
const Tc = 647.096;
/** Critical pressure, Pa (22.064 MPa). */
const pc = 22.064e6;
/** Critical density, kg/m³. */
const rhoc = 322;
/** alpha0, J/kg. */
const alpha0 = 1000;
/** phi0 = alpha0/T_c, J/(kg·K). */
const phi0 = alpha0 / Tc;

/** Vapour-pressure coefficients a_i, i = 1…6 (index 0 unused). */
const a: readonly number[] = [
  Number.NaN,
  -7.85951783,
  1.84408259,
  -11.7866497,
  22.6807411,
  -15.9618719,
  1.80122502,
];
/** Exponents of tau in the vapour-pressure equation. */
const t: readonly number[] = [Number.NaN, 1, 1.5, 3, 3.5, 4, 7.5];

/** Saturated-liquid density coefficients b_i, i = 1…6. */
const b: readonly number[] = [
  Number.NaN,
  1.99274064,
  1.09965342,
  -0.510839303,
  -1.75493479,
  -45.5170352,
  -6.74694450e5,
];
/** Exponents of tau in the saturated-liquid density equation. */
const e: readonly number[] = [Number.NaN, 1 / 3, 2 / 3, 5 / 3, 16 / 3, 43 / 3, 110 / 3];

/** Saturated-vapour density coefficients c_i, i = 1…6. */
const c: readonly number[] = [
  Number.NaN,
  -2.03150240,
  -2.68302940,
  -5.38626492,
  -17.2991605,
  -44.7586581,
  -63.9201063,
];
/** Exponents of tau in the saturated-vapour density equation. */
const f: readonly number[] = [Number.NaN, 2 / 6, 4 / 6, 8 / 6, 18 / 6, 37 / 6, 71 / 6];

/** Constant of the alpha equation, d_alpha. */
const dAlpha = -1135.905627715;
/** Constant of the phi equation, d_phi. */
const dPhi = 2319.5246;
/** Coefficients d_1 … d_5 of the alpha and phi equations. */
const d: readonly number[] = [
  Number.NaN,
  -5.65134998e-8,
  2690.66631,
  127.287297,
  -135.003439,
  0.981825814,
];

/** Vapour pressure p_sigma in Pa at T in K. No range check (273.16 K to 647.096 K). */
export function saturationPressureSR1(temperatureK: number): number {
  const tau = 1 - temperatureK / Tc;
  let sum = 0;
  for (let i = 1; i <= 6; i++) sum += a[i]! * tau ** t[i]!;
  return pc * Math.exp((Tc / temperatureK) * sum);
}

/**
 * Slope of the vapour-pressure curve dp_sigma/dT in Pa/K at T in K, the analytic derivative of
 * the vapour-pressure equation: dp/dT = −(p/T)·(ln(p/p_c) + Σ a_i t_i tau^(t_i − 1)).
 * No range check (273.16 K to 647.096 K).
 */
export function saturationSlopeSR1(temperatureK: number): number {
  const tau = 1 - temperatureK / Tc;
  let sum = 0;
  let derivative = 0;
  for (let i = 1; i <= 6; i++) {
    sum += a[i]! * tau ** t[i]!;
    derivative += a[i]! * t[i]! * tau ** (t[i]! - 1);
  }
  const lnRatio = (Tc / temperatureK) * sum;
  return (-pc * Math.exp(lnRatio) * (lnRatio + derivative)) / temperatureK;
}

/** Density of the saturated liquid rho' in kg/m³ at T in K. No range check. */
export function saturatedLiquidDensity(temperatureK: number): number {
  const tau = 1 - temperatureK / Tc;
  let sum = 1;
  for (let i = 1; i <= 6; i++) sum += b[i]! * tau ** e[i]!;
  return rhoc * sum;
}

/** Density of the saturated vapour rho'' in kg/m³ at T in K. No range check. */
export function saturatedVaporDensity(temperatureK: number): number {
  const tau = 1 - temperatureK / Tc;
  let sum = 0;
  for (let i = 1; i <= 6; i++) sum += c[i]! * tau ** f[i]!;
  return rhoc * Math.exp(sum);
}

/** Auxiliary quantity alpha of the release, J/kg, at T in K. No range check. */
export function auxiliaryAlpha(temperatureK: number): number {
  const theta = temperatureK / Tc;
  return (
    alpha0 *
    (dAlpha +
      d[1]! * theta ** -19 +
      d[2]! * theta +
      d[3]! * theta ** 4.5 +
      d[4]! * theta ** 5 +
      d[5]! * theta ** 54.5)
  );
}

/** Auxiliary quantity phi of the release, J/(kg·K), at T in K. No range check. */
export function auxiliaryPhi(temperatureK: number): number {
  const theta = temperatureK / Tc;
  return (
    phi0 *
    (dPhi +
      (19 / 20) * d[1]! * theta ** -20 +
      d[2]! * Math.log(theta) +
      (9 / 7) * d[3]! * theta ** 3.5 +
      (5 / 4) * d[4]! * theta ** 4 +
      (109 / 107) * d[5]! * theta ** 53.5)
  );
}

/** Specific enthalpy of the saturated liquid h' in J/kg at T in K. No range check. */
export function saturatedLiquidEnthalpy(temperatureK: number): number {
  return (
    auxiliaryAlpha(temperatureK) +
    (temperatureK / saturatedLiquidDensity(temperatureK)) * saturationSlopeSR1(temperatureK)
  );
}

/** Specific enthalpy of the saturated vapour h'' in J/kg at T in K. No range check. */
export function saturatedVaporEnthalpy(temperatureK: number): number {
  return (
    auxiliaryAlpha(temperatureK) +
    (temperatureK / saturatedVaporDensity(temperatureK)) * saturationSlopeSR1(temperatureK)
  );
}

/** Specific entropy of the saturated liquid s' in J/(kg·K) at T in K. No range check. */
export function saturatedLiquidEntropy(temperatureK: number): number {
  return auxiliaryPhi(temperatureK) + saturationSlopeSR1(temperatureK) / saturatedLiquidDensity(temperatureK);
}

/** Specific entropy of the saturated vapour s'' in J/(kg·K) at T in K. No range check. */
export function saturatedVaporEntropy(temperatureK: number): number {
  return auxiliaryPhi(temperatureK) + saturationSlopeSR1(temperatureK) / saturatedVaporDensity(temperatureK);
}
