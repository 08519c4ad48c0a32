/**
 * Region selection of IAPWS-IF97 for a state given by temperature and pressure, and the fluid
 * properties there from the basic equation of that region.
 *
 * Source: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 *   Properties of Water and Steam (IAPWS R7-97(2012)), Sec. 4 and Fig. 1 (the regions and their
 *   boundaries): region 1 for 273.15 K ≤ T ≤ 623.15 K and p ≥ p_s(T); region 2 below p_s(T) up to
 *   623.15 K, below p_B23(T) from 623.15 K to 863.15 K and up to 100 MPa from 863.15 K to
 *   1073.15 K; region 3 for 623.15 K ≤ T ≤ T_B23(p), p ≥ p_B23(T); region 5 for
 *   T above 1073.15 K up to 2273.15 K, p ≤ 50 MPa. Region 4 (the saturation line, Eq. (30)) separates
 *   regions 1 and 2; B23 (Eq. (5)) separates regions 2 and 3.
 * Valid: 273.15 K ≤ T ≤ 1073.15 K with p above 0 up to 100 MPa, and T above 1073.15 K up to
 *   2273.15 K with p above 0 up to 50 MPa. Outside that the functions here throw an
 *   out-of-range error: they never extrapolate (callers that knowingly extrapolate, e.g. region 2
 *   for vapour below 273.15 K, call the region function themselves and say so).
 * Uncertainty: see the region modules. On the region boundaries the neighbouring equations differ
 *   by less than the tolerances of the release's Table 43 (e.g. |Δh| ≤ 0.031 kJ/kg between regions
 *   1 and 3), so which side a boundary state is given to matters no more than that.
 * Deviations from the text: none. Boundary states go to region 1 on the saturation line
 *   (p = p_s) and to region 2 on B23 (p = p_B23), as the release's inequalities read.
 */
import { BadInputError, OutOfRangeError, q } from "../../errors";
import { citation } from "../../sources/bibliography";
import { b23Pressure } from "./b23";
import type { FluidProperties } from "./properties";
import { region1 } from "./region1";
import { region2 } from "./region2";
import { region3 } from "./region3";
import { saturationPressureIF97 } from "./region4";
import { region5 } from "./region5";

/** Lowest temperature of IF97 (regions 1, 2 and 4), K. */
export const IF97_T_MIN = 273.15;
/** Boundary between regions 1 and 3 (and lowest temperature of region 3), K. */
export const IF97_T_REGION_1_3 = 623.15;
/** Highest temperature of region 3, where B23 reaches 100 MPa, K. */
export const IF97_T_REGION_3_MAX = 863.15;
/** Highest temperature of regions 1–3 (the region 2/5 boundary), K; region 5 lies above it. */
export const IF97_T_REGION_5_MIN = 1073.15;
/** Highest temperature of IF97 (region 5), K. */
export const IF97_T_MAX = 2273.15;
/** Highest pressure of IF97 up to 1073.15 K, Pa (100 MPa). */
export const IF97_P_MAX = 100e6;
/** Highest pressure of region 5, above 1073.15 K, Pa (50 MPa). */
export const IF97_P_MAX_REGION_5 = 50e6;

/** An IF97 region with a basic equation for the fluid (region 4 is the saturation line). */
export type If97Region = 1 | 2 | 3 | 5;

/** Fluid properties and the IF97 region whose basic equation produced them. */
export type If97Properties = FluidProperties & { readonly region: If97Region };

const source = citation("iapws-if97").short;

/**
 * The IF97 region of the fluid state at temperature T (K) and pressure p (Pa).
 * @throws BadInputError for a non-finite temperature or pressure, or one not above zero.
 * @throws OutOfRangeError outside the range of IF97 (see the module header).
 */
export function if97Region(temperatureK: number, pressurePa: number): If97Region {
  checkState(temperatureK, pressurePa);
  if (temperatureK > IF97_T_REGION_5_MIN) return 5;
  if (temperatureK <= IF97_T_REGION_1_3) {
    return pressurePa >= saturationPressureIF97(temperatureK) ? 1 : 2;
  }
  if (temperatureK > IF97_T_REGION_3_MAX) return 2;
  return pressurePa > b23Pressure(temperatureK) ? 3 : 2;
}

/**
 * Fluid properties at temperature T (K) and pressure p (Pa) from the IF97 basic equation of the
 * region the state lies in, with that region.
 * @throws BadInputError for a non-finite temperature or pressure, or one not above zero.
 * @throws OutOfRangeError outside the range of IF97 (see the module header).
 */
export function if97Properties(temperatureK: number, pressurePa: number): If97Properties {
  const region = if97Region(temperatureK, pressurePa);
  let properties: FluidProperties;
  switch (region) {
    case 1:
      properties = region1(temperatureK, pressurePa);
      break;
    case 2:
      properties = region2(temperatureK, pressurePa);
      break;
    case 3:
      properties = region3(temperatureK, pressurePa);
      break;
    case 5:
      properties = region5(temperatureK, pressurePa);
      break;
  }
  return {
    region,
    specificVolume: properties.specificVolume,
    density: properties.density,
    enthalpy: properties.enthalpy,
    internalEnergy: properties.internalEnergy,
    entropy: properties.entropy,
    isobaricHeatCapacity: properties.isobaricHeatCapacity,
    speedOfSound: properties.speedOfSound,
  };
}

function checkState(temperatureK: number, pressurePa: number): void {
  if (!Number.isFinite(temperatureK)) throw new BadInputError(["temperature is not a finite number"]);
  if (!Number.isFinite(pressurePa)) throw new BadInputError(["pressure is not a finite number"]);
  if (temperatureK <= 0) {
    throw new BadInputError([
      "temperature ",
      q.T(temperatureK),
      " is at or below absolute zero: enter a temperature above 0 K",
    ]);
  }
  if (pressurePa <= 0) {
    throw new BadInputError([
      "pressure ",
      q.p(pressurePa),
      " is not above zero (absolute): enter an absolute pressure above 0",
    ]);
  }
  if (temperatureK < IF97_T_MIN || temperatureK > IF97_T_MAX) {
    throw new OutOfRangeError([
      "temperature ",
      q.T(temperatureK),
      " is outside the fluid range of ",
      source,
      " (",
      q.T(IF97_T_MIN),
      " to ",
      q.T(IF97_T_MAX),
      ")",
    ]);
  }
  const pressureLimit = temperatureK > IF97_T_REGION_5_MIN ? IF97_P_MAX_REGION_5 : IF97_P_MAX;
  if (pressurePa > pressureLimit) {
    throw new OutOfRangeError([
      "pressure ",
      q.p(pressurePa),
      ` is above the highest pressure of ${source} at `,
      q.T(temperatureK),
      " (",
      q.p(IF97_P_MAX),
      " up to ",
      q.T(IF97_T_REGION_5_MIN),
      ", ",
      q.p(IF97_P_MAX_REGION_5),
      " above it)",
    ]);
  }
}
