/**
 * Enthalpy of an engineering-grade substance's phases, built from its cited data.
 *
 * - Vapour, gas and supercritical fluid: ideal-gas enthalpy (integral of the cited c_p°) plus
 *   the Peng–Robinson (1976) departure of the vapour-like root, with the substance's T_c, p_c, ω.
 * - Liquid: the saturated vapour at the same temperature minus the enthalpy of vaporization
 *   there, plus the Peng–Robinson liquid-root departure difference between p and the saturation
 *   pressure (the compressed-liquid correction). Latent heats of vaporization are therefore the
 *   cited correlation exactly, at every temperature, whatever the cubic's own saturation
 *   behaviour; the cubic only supplies pressure effects.
 * - Solid: the liquid at the triple point minus the cited enthalpy of fusion, warmed or cooled
 *   with a constant heat capacity (see {@link SolidData}); above the triple-point pressure it
 *   shares the liquid's pressure dependence at the triple-point temperature.
 *
 * Why "vapour minus latent heat" for the liquid, rather than the cubic's liquid root: checked
 * against the VDI Heat Atlas (2010) saturation tables, the cubic's liquid heat capacities are
 * off by up to 15 % near the triple point and 20–40 % near T_c, while the vaporization route with
 * the PPDS equation keeps them within a few percent below 0.9 T_c (measured per substance in the
 * tests), and it reproduces the cited enthalpy of vaporization at the normal boiling point by
 * construction.
 *
 * Zero of enthalpy: the saturated liquid at the temperature of the cited enthalpy of
 * vaporization (the normal boiling point).
 */
import { atLeast, atMost } from "../curves";
import { NoSuchStateError, OutOfRangeError, q } from "../errors";
import {
  idealGasEnthalpy,
  idealGasRange,
  type IdealGasHeatCapacity,
} from "../models/engineering/ideal-gas-heat-capacity";
import { pengRobinsonEnthalpyDeparture, type PengRobinsonFluid } from "../models/engineering/peng-robinson";
import { citation } from "../sources/bibliography";
import type { EnthalpyModel, ModelInfo, PhaseSide } from "./types";

/** The ideal-gas heat capacity of a substance with its provenance. */
export interface IdealGasData {
  readonly model: IdealGasHeatCapacity;
  readonly info: ModelInfo;
}

/** The enthalpy of vaporization as a function of temperature, anchored to a cited value. */
export interface VaporizationData {
  /** Molar enthalpy of vaporization, J/mol, at T in K (triple point to T_c, zero at T_c). */
  readonly molarEnthalpy: (temperatureK: number) => number;
  /** Temperature of the cited value, K: the zero of enthalpy is the saturated liquid there. */
  readonly anchorK: number;
  readonly info: ModelInfo;
}

/** What the solid's enthalpy rests on. */
export interface SolidData {
  /** Molar enthalpy of fusion at the triple point, J/mol. */
  readonly molarEnthalpyOfFusion: number;
  /** Lowest solid temperature with an enthalpy, K. */
  readonly tMin: number;
  /** Highest solid temperature (the triple point, or the top of a published melting curve), K. */
  readonly tMax: number;
  readonly info: ModelInfo;
}

/** Everything the builder needs. */
export interface EngineeringEnthalpyInputs {
  readonly substanceName: string;
  /** Molar mass, kg/mol. */
  readonly molarMass: number;
  /** T_c, p_c and ω for the cubic (those of the phase map). */
  readonly fluid: PengRobinsonFluid;
  readonly tripleK: number;
  readonly triplePa: number;
  /** Saturation pressure of the liquid, Pa, from the triple point to T_c (the boiling curve). */
  readonly boilingPressure: (temperatureK: number) => number;
  readonly vaporization: VaporizationData;
  readonly idealGas: IdealGasData;
  /** The Peng–Robinson model entry (validity and uncertainty as this substance uses it). */
  readonly cubic: ModelInfo;
  /** Absent where no enthalpy of fusion is cited: the solid then has no enthalpy. */
  readonly solid?: SolidData | undefined;
  /** Lowest vapour temperature covered, K (the bottom of the sublimation curve, or above). */
  readonly vaporTMin: number;
  /** Highest temperature covered, K (the substance's limit; the ideal-gas range may end lower). */
  readonly vaporTMax: number;
  /** Highest pressure any phase is computed at, Pa. */
  readonly pressureMax: number;
}

/** Derivative step for the solid's heat capacity, K: small against T_t, large against rounding. */
const HEAT_CAPACITY_STEP = 1e-3;

/** Builds the enthalpy model of one substance. */
export function engineeringEnthalpy(inputs: EngineeringEnthalpyInputs): EnthalpyModel {
  const { fluid, molarMass, vaporization, substanceName } = inputs;
  const ig = inputs.idealGas.model;
  const [igMin, igMax] = idealGasRange(ig);
  const vaporTMin = Math.max(igMin, inputs.vaporTMin);
  const vaporTMax = Math.min(igMax, inputs.vaporTMax);
  const tc = fluid.Tc;
  const anchorK = vaporization.anchorK;
  const anchorPa = inputs.boilingPressure(anchorK);
  const hVaporAtAnchor =
    vaporization.molarEnthalpy(anchorK) -
    idealGasEnthalpy(ig, anchorK) -
    pengRobinsonEnthalpyDeparture(fluid, anchorK, anchorPa, "vapor");

  const sourceOf = (info: ModelInfo): string => citation(info.source).short;

  const checkPressure = (pressurePa: number): void => {
    if (pressurePa > inputs.pressureMax) {
      throw new OutOfRangeError([
        "pressure ",
        q.p(pressurePa),
        ` is above the highest pressure at which Phasecell computes enthalpies of ${substanceName} (`,
        q.p(inputs.pressureMax),
        `, ${sourceOf(inputs.cubic)} departure functions)`,
      ]);
    }
  };

  const outside = (what: string, temperatureK: number, low: number, high: number, why: string): OutOfRangeError =>
    new OutOfRangeError([
      "temperature ",
      q.T(temperatureK),
      ` is outside the range of the ${substanceName} ${what} enthalpy (`,
      q.T(low),
      " to ",
      q.T(high),
      `${why})`,
    ]);

  /** Molar vapour enthalpy, J/mol. */
  const vaporMolar = (temperatureK: number, pressurePa: number): number =>
    hVaporAtAnchor + idealGasEnthalpy(ig, temperatureK) + pengRobinsonEnthalpyDeparture(fluid, temperatureK, pressurePa, "vapor");

  /** Molar liquid enthalpy, J/mol (T_t ≤ T ≤ T_c). */
  const liquidMolar = (temperatureK: number, pressurePa: number): number => {
    const saturationPa = inputs.boilingPressure(temperatureK);
    const saturated = vaporMolar(temperatureK, saturationPa) - vaporization.molarEnthalpy(temperatureK);
    if (pressurePa === saturationPa) return saturated;
    return (
      saturated +
      pengRobinsonEnthalpyDeparture(fluid, temperatureK, pressurePa, "liquid") -
      pengRobinsonEnthalpyDeparture(fluid, temperatureK, saturationPa, "liquid")
    );
  };

  const solid = inputs.solid;
  const liquidAtTriple = liquidMolar(inputs.tripleK, inputs.triplePa);
  // The solid's heat capacity: the saturated liquid's at the triple point (SolidData.info says
  // why), by a one-sided difference because the liquid has no enthalpy below T_t.
  const solidHeatCapacity =
    (liquidMolar(inputs.tripleK + HEAT_CAPACITY_STEP, inputs.boilingPressure(inputs.tripleK + HEAT_CAPACITY_STEP)) -
      liquidAtTriple) /
    HEAT_CAPACITY_STEP;

  /** Molar solid enthalpy, J/mol. */
  const solidMolar = (data: SolidData, temperatureK: number, pressurePa: number): number => {
    // Below the triple-point pressure the solid's pressure term, of order v_s (p − p_t), is
    // under 1e-3 J/mol for every substance here and is left out.
    const pressureTerm =
      pressurePa > inputs.triplePa ? liquidMolar(inputs.tripleK, pressurePa) - liquidAtTriple : 0;
    return liquidAtTriple - data.molarEnthalpyOfFusion + solidHeatCapacity * (temperatureK - inputs.tripleK) + pressureTerm;
  };

  const enthalpy = (side: PhaseSide, temperatureK: number, pressurePa: number): number => {
    checkPressure(pressurePa);
    // Range ends admit the rounding slack of core/curves and are evaluated at the end itself.
    if (side === "vapor") {
      if (!atLeast(temperatureK, vaporTMin) || !atMost(temperatureK, vaporTMax)) {
        throw outside("vapor", temperatureK, vaporTMin, vaporTMax, `, ${sourceOf(inputs.idealGas.info)} ideal-gas heat capacity`);
      }
      return vaporMolar(Math.min(Math.max(temperatureK, vaporTMin), vaporTMax), pressurePa) / molarMass;
    }
    if (side === "liquid") {
      if (!atLeast(temperatureK, inputs.tripleK) || !atMost(temperatureK, tc)) {
        throw outside(
          "liquid",
          temperatureK,
          inputs.tripleK,
          tc,
          ": the triple point to the critical point; the liquid is not stable below the triple point",
        );
      }
      return liquidMolar(Math.min(Math.max(temperatureK, inputs.tripleK), tc), pressurePa) / molarMass;
    }
    if (!solid) {
      throw new NoSuchStateError([
        `no enthalpy model for solid ${substanceName}: Phasecell's sources give no enthalpy of fusion ` +
          "for it, so heat to freeze, melt or sublime it cannot be computed",
      ]);
    }
    if (!atLeast(temperatureK, solid.tMin) || !atMost(temperatureK, solid.tMax)) {
      throw outside(
        "solid",
        temperatureK,
        solid.tMin,
        solid.tMax,
        solid.tMax === inputs.tripleK
          ? "; without a published melting curve the solid's enthalpy stops at the triple point, so " +
              "heat to melt or freeze above the triple-point pressure cannot be computed"
          : "",
      );
    }
    return solidMolar(solid, Math.min(Math.max(temperatureK, solid.tMin), solid.tMax), pressurePa) / molarMass;
  };

  const models: ModelInfo[] = [inputs.idealGas.info, inputs.cubic, vaporization.info];
  if (solid) models.push(solid.info);

  return {
    models,
    enthalpy: (side, temperatureK, pressurePa) => enthalpy(side, temperatureK, pressurePa),
    temperatureLimits: (pressurePa) => {
      const low = solid ? solid.tMin : pressurePa >= inputs.triplePa ? inputs.tripleK : vaporTMin;
      return [low, vaporTMax];
    },
  };
}
