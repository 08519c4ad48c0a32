/**
 * Specific enthalpy of water's phases on the IAPWS reference state (internal energy and entropy
 * of the saturated liquid at the triple point are zero): IAPWS-IF97 for liquid, vapour, gas and
 * supercritical fluid, IAPWS R10-06(2009) for ice Ih. The two share the zero, so enthalpies of
 * ice and fluid subtract directly and latent heats follow as differences.
 */
import { atLeast, atMost } from "../curves";
import { NoSuchStateError, OutOfRangeError, q } from "../errors";
import { b23Pressure } from "../models/iapws-if97/b23";
import { region1Enthalpy } from "../models/iapws-if97/region1";
import { region2Enthalpy } from "../models/iapws-if97/region2";
import { region3OnSide } from "../models/iapws-if97/region3";
import { region5 } from "../models/iapws-if97/region5";
import {
  IF97_P_MAX,
  IF97_P_MAX_REGION_5,
  IF97_T_MAX,
  IF97_T_MIN,
  IF97_T_REGION_1_3,
  IF97_T_REGION_3_MAX,
  IF97_T_REGION_5_MIN,
} from "../models/iapws-if97/regions";
import { iceIhEnthalpy } from "../models/iapws-r10/ice-ih";
import { ICE_IH } from "../models/iapws-r14/melting-pressure";
import type { EnthalpyModel, ModelInfo, PhaseSide } from "./types";

const CRITICAL_T = 647.096;
/** Highest pressure of ice Ih: the ice Ih – ice III – liquid triple point, R14-08(2011). */
const ICE_IH_P_MAX = 208.566e6;
/**
 * Lowest temperature at which Phasecell uses IF97 region 2 for vapour over ice. Below 273.15 K
 * region 2 is outside IF97; against IAPWS-95 on the sublimation curve it differs by less than
 * 0.03 kJ/kg down to 250 K and 0.7 kJ/kg at 200 K (measured; see test/reference), growing fast
 * below, so 200 K is where Phasecell stops.
 */
const VAPOR_T_MIN = 200;

/**
 * Lowest temperature Phasecell evaluates the ice Ih Gibbs function at, K. R10-06 covers ice Ih
 * down to 0 K; its terms (t_k ± tau) ln(t_k ± tau) nearly cancel as tau goes to 0, and double
 * precision still agrees with TEOS-10 to 1e-13 at 0.5 K, so 1 K leaves a margin.
 */
const ICE_T_MIN = 1;

const fluidModel: ModelInfo = {
  id: "iapws-if97-fluid",
  name: "IAPWS-IF97 basic equations of regions 1 (liquid), 2 (vapour), 3 (near-critical) and 5 (high temperature)",
  source: "iapws-if97",
  grade: "reference",
  validity: "273.15 K to 1073.15 K up to 100 MPa; 1073.15 K to 2273.15 K up to 50 MPa",
  uncertainty:
    "IF97 states no uncertainty for h itself; isobaric enthalpy differences are more accurate " +
    "than c_p (IF97 Sec. 12). Neighbouring regions agree on their boundaries within IF97 " +
    "Table 43 (|Δh| ≤ 0.031 kJ/kg regions 1/3, 0.134 kJ/kg 2/3, 0.096 kJ/kg 2/5)",
};

const extrapolationModel: ModelInfo = {
  id: "iapws-if97-below-273",
  name:
    "IAPWS-IF97 region 1 for liquid below 273.15 K (down to the ice Ih melting curve) and region 2 " +
    "for vapour below 273.15 K (down to 200 K), both beyond IF97's stated range",
  source: "iapws-if97",
  grade: "reference",
  validity: "liquid: 251.165 K to 273.15 K, p ≤ 100 MPa; vapour: 200 K to 273.15 K",
  uncertainty:
    "approximation, checked against IAPWS-95: liquid on the ice Ih melting curve within 0.03 kJ/kg " +
    "up to 100 MPa; vapour on the sublimation curve within 0.04 kJ/kg down to 250 K and 0.7 kJ/kg " +
    "at 200 K",
};

const iceModel: ModelInfo = {
  id: "iapws-r10-06-ice-ih",
  name: "IAPWS R10-06(2009) Gibbs function of ice Ih (2009 g00, IAPWS-95 entropy constant)",
  source: "iapws-r10-06",
  grade: "reference",
  validity: "ice Ih up to 273.16 K and 208.566 MPa (the ice Ih – ice III – liquid point)",
  uncertainty:
    "as stated in IAPWS R10-06(2009) (consult the release); reproduces its Table 6 to every " +
    "printed digit. No IAPWS Gibbs function exists for ices III, V, VI, VII: their enthalpy is " +
    "not available",
};

function iceEnthalpy(temperatureK: number, pressurePa: number, solid: string): number {
  if (solid !== "ice Ih") {
    throw new NoSuchStateError([
      `no enthalpy model for ${solid}: IAPWS publishes a Gibbs function only for ice Ih (R10-06), ` +
        "so heat along a path through high-pressure ices cannot be computed",
    ]);
  }
  if (!atMost(pressurePa, ICE_IH_P_MAX) || !atMost(temperatureK, ICE_IH.tStar)) {
    throw new OutOfRangeError([
      "ice Ih at ",
      q.T(temperatureK),
      " and ",
      q.p(pressurePa),
      " is outside the IAPWS R10-06(2009) range (up to ",
      q.T(ICE_IH.tStar),
      " and ",
      q.p(ICE_IH_P_MAX),
      ")",
    ]);
  }
  return iceIhEnthalpy(temperatureK, pressurePa);
}

function outOfIF97(temperatureK: number, pressurePa: number, why: string): OutOfRangeError {
  return new OutOfRangeError([
    "water at ",
    q.T(temperatureK),
    " and ",
    q.p(pressurePa),
    ` is outside the IAPWS-IF97 range: ${why}`,
  ]);
}

function liquidEnthalpy(temperatureK: number, pressurePa: number): number {
  if (!atMost(pressurePa, IF97_P_MAX)) throw outOfIF97(temperatureK, pressurePa, "liquid is covered up to 100 MPa");
  if (temperatureK < IF97_T_MIN) {
    if (!atLeast(temperatureK, ICE_IH.tMin)) {
      throw outOfIF97(temperatureK, pressurePa, "liquid below 251.165 K is not stable at any pressure");
    }
    return region1Enthalpy(temperatureK, pressurePa);
  }
  if (temperatureK <= IF97_T_REGION_1_3) return region1Enthalpy(temperatureK, pressurePa);
  if (temperatureK < CRITICAL_T) return region3OnSide(temperatureK, pressurePa, "liquid").enthalpy;
  return supercriticalEnthalpy(temperatureK, pressurePa);
}

function vaporEnthalpy(temperatureK: number, pressurePa: number): number {
  if (temperatureK < IF97_T_MIN) {
    if (!atLeast(temperatureK, VAPOR_T_MIN)) {
      throw outOfIF97(
        temperatureK,
        pressurePa,
        "vapour is covered down to 200 K, where IF97 region 2 still agrees with IAPWS-95 within 0.7 kJ/kg",
      );
    }
    return region2Enthalpy(temperatureK, pressurePa);
  }
  if (temperatureK <= IF97_T_REGION_1_3) {
    if (!atMost(pressurePa, IF97_P_MAX)) throw outOfIF97(temperatureK, pressurePa, "up to 100 MPa");
    return region2Enthalpy(temperatureK, pressurePa);
  }
  if (temperatureK < CRITICAL_T && pressurePa > b23Pressure(temperatureK)) {
    return region3OnSide(temperatureK, pressurePa, "vapor").enthalpy;
  }
  return supercriticalEnthalpy(temperatureK, pressurePa);
}

/** Fluid above 623.15 K away from saturation: regions 2, 3 and 5 by IF97's own selection. */
function supercriticalEnthalpy(temperatureK: number, pressurePa: number): number {
  if (!atMost(temperatureK, IF97_T_MAX)) throw outOfIF97(temperatureK, pressurePa, "up to 2273.15 K");
  if (temperatureK > IF97_T_REGION_5_MIN) {
    if (!atMost(pressurePa, IF97_P_MAX_REGION_5)) throw outOfIF97(temperatureK, pressurePa, "above 1073.15 K up to 50 MPa");
    return region5(temperatureK, pressurePa).enthalpy;
  }
  if (!atMost(pressurePa, IF97_P_MAX)) throw outOfIF97(temperatureK, pressurePa, "up to 100 MPa");
  if (temperatureK > IF97_T_REGION_3_MAX || pressurePa <= b23Pressure(temperatureK)) {
    return region2Enthalpy(temperatureK, pressurePa);
  }
  return region3OnSide(temperatureK, pressurePa, "vapor").enthalpy;
}

/** Water's enthalpy model. */
export const waterEnthalpy: EnthalpyModel = {
  models: [fluidModel, extrapolationModel, iceModel],
  temperatureLimits(pressurePa: number, side?: PhaseSide): readonly [number, number] {
    const top = atMost(pressurePa, IF97_P_MAX_REGION_5) ? IF97_T_MAX : IF97_T_REGION_5_MIN;
    if (side === "solid") return [ICE_T_MIN, ICE_IH.tStar];
    if (side === "liquid") return [ICE_IH.tMin, top];
    if (side === "vapor") return [VAPOR_T_MIN, top];
    return [ICE_T_MIN, top];
  },
  enthalpy(side: PhaseSide, temperatureK: number, pressurePa: number, solid: string): number {
    if (side === "solid") return iceEnthalpy(temperatureK, pressurePa, solid);
    if (side === "liquid") return liquidEnthalpy(temperatureK, pressurePa);
    return vaporEnthalpy(temperatureK, pressurePa);
  },
};
