/**
 * Builds an engineering-grade substance definition from its cited data: identity, constants,
 * the boiling curve from a published Wagner-type equation, a published or derived sublimation
 * curve, published melting curves where they exist, and the enthalpy model of
 * core/substances/engineering-enthalpy. Each substance module holds data only and calls
 * {@link engineeringSubstance}.
 *
 * Conventions every substance shares:
 * - The critical point of the phase map is the one printed with the vapour-pressure equation,
 *   so the boiling curve ends exactly there (the builder refuses a mismatch).
 * - The triple-point pressure is the vapour-pressure equation evaluated at the cited triple-point
 *   temperature, so the boiling and sublimation curves meet exactly; its agreement with measured
 *   triple-point pressures is checked in the tests.
 * - The acentric factor is computed by its definition from the same equation.
 * - Without a published melting curve the phase map uses a stated bound on the melting line's
 *   slope (see MeltingBound and core/phase).
 */
import { clausiusClapeyronPressure, clausiusClapeyronTemperature } from "../models/engineering/clausius-clapeyron-sublimation";
import { idealGasRange, type IdealGasHeatCapacity } from "../models/engineering/ideal-gas-heat-capacity";
import {
  ppdsEnthalpyOfVaporization,
  type PpdsVaporizationCoefficients,
} from "../models/engineering/ppds-enthalpy-of-vaporization";
import { wagnerPressure, type WagnerCoefficients } from "../models/engineering/wagner-vapor-pressure";
import { watsonEnthalpyOfVaporization } from "../models/engineering/watson-enthalpy-of-vaporization";
import { citation, type CitationId } from "../sources/bibliography";
import { molarMassOf, type Element } from "./atomic-weights";
import { engineeringEnthalpy, type VaporizationData } from "./engineering-enthalpy";
import type { ConstantValue, CurveBranch, ModelInfo, SubstanceDefinition } from "./types";

/** A cited number: its value in the unit the field names, its source and where in it. */
export interface Cited {
  readonly value: number;
  readonly source: CitationId;
  /** Where in the source, the stated uncertainty, and anything a reviewer should know. */
  readonly note: string;
}

/** The published vapour-pressure equation of a substance. */
export interface VaporPressureData {
  readonly coefficients: WagnerCoefficients;
  readonly source: CitationId;
  /** What it is, e.g. "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation". */
  readonly name: string;
  /** Lowest temperature the source states for the equation, K. */
  readonly tMin: number;
  readonly uncertainty: string;
}

/** How the enthalpy of vaporization varies with temperature. */
export type VaporizationShape =
  | {
      /** The VDI Heat Atlas PPDS equation, scaled to the cited value at its temperature. */
      readonly kind: "ppds";
      readonly coefficients: PpdsVaporizationCoefficients;
      readonly uncertainty: string;
    }
  | {
      /** Watson's scaling of the cited value (where no PPDS set is available). */
      readonly kind: "watson";
      readonly uncertainty: string;
    };

/**
 * A published melting curve p(T). It receives the triple-point pressure of the phase map (the
 * boiling curve at T_t) so that its reduced form starts exactly there; a module that substitutes
 * it for the printed value says so in the model name.
 */
export interface MeltingData {
  readonly pressure: (temperatureK: number, triplePa: number) => number;
  /** Highest temperature of the equation's range as Phasecell uses it, K. */
  readonly tMax: number;
  readonly model: ModelInfo;
}

/** A published sublimation curve p(T), receiving the phase map's triple-point pressure likewise. */
export interface SublimationData {
  readonly pressure: (temperatureK: number, triplePa: number) => number;
  readonly tMin: number;
  readonly model: ModelInfo;
}

/** Everything a substance module states. Molar quantities are per mole, SI otherwise. */
export interface EngineeringSubstanceData {
  readonly id: string;
  readonly name: string;
  readonly formula: string;
  readonly cas: string;
  readonly refrigerant?: string;
  /** Further names a user may type; name, formula, CAS and refrigerant number are added. */
  readonly aliases: readonly string[];
  /** Atom counts of the formula, for the molar mass. */
  readonly atoms: Readonly<Partial<Record<Element, number>>>;
  /** K. */
  readonly tripleTemperature: Cited;
  /** K; must equal the vapour-pressure equation's T_c. */
  readonly criticalTemperature: Cited;
  /** Pa; must equal the vapour-pressure equation's p_c. */
  readonly criticalPressure: Cited;
  /** kg/m³. */
  readonly criticalDensity?: Cited;
  /** K. */
  readonly normalBoilingPoint: Cited;
  /** K. */
  readonly normalMeltingPoint?: Cited;
  /** Molar enthalpy of vaporization, J/mol, at `temperatureK` (the normal boiling point). */
  readonly enthalpyOfVaporization: Cited & { readonly temperatureK: number };
  /** Molar enthalpy of fusion, J/mol, used at the triple point. */
  readonly enthalpyOfFusion?: Cited;
  readonly vaporPressure: VaporPressureData;
  readonly vaporization: VaporizationShape;
  /**
   * Ideal-gas heat capacity; absent where no cited form covers the vapour down to the triple
   * point (the substance then has no enthalpy model, and says why in `noEnthalpyReason`).
   */
  readonly idealGas?: {
    readonly model: IdealGasHeatCapacity;
    readonly source: CitationId;
    readonly name: string;
    readonly uncertainty: string;
  };
  readonly noEnthalpyReason?: string;
  /** Published melting curve, where there is one. */
  readonly melting?: MeltingData;
  /** Published sublimation curve; absent: derived by Clausius–Clapeyron if Δh_fus is cited. */
  readonly sublimation?: SublimationData;
  /** Measured comparisons of the enthalpy model, for its uncertainty statement. */
  readonly enthalpyChecks: string;
  /** The substance's own hazards (common practice), see SubstanceDefinition. */
  readonly hazards: readonly string[];
}

/** Lowest temperature of a derived sublimation curve and of the solid's enthalpy, as a fraction of T_t. */
export const DERIVED_SUBLIMATION_T_MIN_FRACTION = 0.8;

/**
 * Upper bound of the melting line's dT/dp where no melting curve is published: 1 K/MPa.
 * Published melting equations rise near their triple points by 0.25 K/MPa (argon, Tegeler et al.
 * 1999) and 0.21 K/MPa (carbon dioxide, Span and Wagner 1996), both computed from the equations;
 * Clapeyron's dT/dp = T Δv / Δh_fus with the cited enthalpies of fusion and liquid and solid
 * densities recalled from memory gives 0.1 to 0.45 K/MPa for the other substances here. Melting
 * lines flatten as pressure rises, so the slope at the triple point bounds the whole line.
 */
export const MELTING_SLOPE_BOUND = 1e-6;

/** Highest temperature of any engineering substance's phase map, K (the ideal-gas forms' limit). */
const PHASE_MAP_T_MAX = 1000;

/** Enthalpies are computed up to this multiple of p_c. */
const ENTHALPY_PRESSURE_MAX_OVER_PC = 5;

function constant(cited: Cited, dimension: ConstantValue["dimension"]): ConstantValue {
  return { value: cited.value, dimension, source: cited.source, note: cited.note };
}

function shortOf(id: CitationId): string {
  return citation(id).short;
}

/** Formats a number for notes: up to six significant digits. */
function fmt(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/**
 * Builds a substance from its data.
 * @throws Error when the data contradict themselves (a fault in the module, caught by tests).
 */
export function engineeringSubstance(data: EngineeringSubstanceData): SubstanceDefinition {
  const wagner = data.vaporPressure.coefficients;
  const tc = data.criticalTemperature.value;
  const pc = data.criticalPressure.value;
  if (wagner.Tc !== tc || wagner.pc !== pc) {
    throw new Error(`${data.id}: the critical point must be the one printed with the vapour-pressure equation`);
  }
  const tt = data.tripleTemperature.value;
  const molarMass = molarMassOf(data.atoms);
  // core/curves admits temperatures within its rounding slack (EDGE_TOLERANCE) past a range end
  // and takes them as that end; above T_c the Wagner form has no real value, so evaluate there.
  const boilingPressure = (temperatureK: number): number => wagnerPressure(wagner, Math.min(temperatureK, tc));
  const pt = boilingPressure(tt);
  const vpSource = data.vaporPressure.source;
  const omega = -Math.log10(boilingPressure(0.7 * tc) / pc) - 1;

  const extended = tt < data.vaporPressure.tMin;
  const boiling: CurveBranch = {
    boundary: "boiling",
    model: {
      id: `${data.id}-vapor-pressure`,
      name: data.vaporPressure.name,
      source: vpSource,
      grade: "engineering",
      validity:
        `${fmt(tt)} K (triple point) to ${fmt(tc)} K (critical point), ${fmt(pt)} Pa to ${fmt(pc)} Pa` +
        (extended
          ? `; the source states ${fmt(data.vaporPressure.tMin)} K as its lower limit, and Phasecell ` +
            `applies the equation the remaining ${fmt(data.vaporPressure.tMin - tt)} K down to the ` +
            "triple point (checked against the measured triple-point pressure where one is published)"
          : "") +
        `; T_c = ${fmt(wagner.Tc)} K and p_c = ${fmt(wagner.pc)} Pa as printed with the coefficients`,
      uncertainty: data.vaporPressure.uncertainty,
    },
    tMin: tt,
    tMax: tc,
    pressure: boilingPressure,
    pressureRange: [pt, pc],
  };

  // Enthalpy of vaporization as a function of T, anchored to the cited value.
  const dhv = data.enthalpyOfVaporization;
  let vaporization: VaporizationData;
  if (data.vaporization.kind === "ppds") {
    const ppds = data.vaporization.coefficients;
    const scale = dhv.value / ppdsEnthalpyOfVaporization(ppds, dhv.temperatureK, tc);
    vaporization = {
      molarEnthalpy: (temperatureK) => scale * ppdsEnthalpyOfVaporization(ppds, temperatureK, tc),
      anchorK: dhv.temperatureK,
      info: {
        id: `${data.id}-enthalpy-of-vaporization`,
        name:
          `VDI Heat Atlas (2010) D3.1 PPDS equation for the enthalpy of vaporization, multiplied by ` +
          `${scale.toFixed(5)} so that it equals the cited ${fmt(dhv.value)} J/mol at ${fmt(dhv.temperatureK)} K ` +
          `(${shortOf(dhv.source)})` +
          (ppds.Tc !== tc ? `; τ = 1 − T/T_c with the phase map's T_c = ${fmt(tc)} K in place of the printed ${fmt(ppds.Tc)} K, so that it vanishes at the critical point` : ""),
        source: "vdi-heat-atlas-2010",
        grade: "engineering",
        validity: `${fmt(tt)} K (triple point) to ${fmt(tc)} K (critical point)`,
        uncertainty: data.vaporization.uncertainty,
      },
    };
  } else {
    const anchor = { T1: dhv.temperatureK, enthalpy1: dhv.value, Tc: tc };
    vaporization = {
      molarEnthalpy: (temperatureK) => watsonEnthalpyOfVaporization(anchor, temperatureK),
      anchorK: dhv.temperatureK,
      info: {
        id: `${data.id}-enthalpy-of-vaporization`,
        name:
          `Watson (1943) scaling, exponent 0.38, of the cited ${fmt(dhv.value)} J/mol at ` +
          `${fmt(dhv.temperatureK)} K (${shortOf(dhv.source)})`,
        source: "watson-1943",
        grade: "engineering",
        validity: `${fmt(tt)} K (triple point) to ${fmt(tc)} K (critical point)`,
        uncertainty: data.vaporization.uncertainty,
      },
    };
  }

  // Sublimation: published, or derived from the triple point with Δh_sub = Δh_fus + Δh_v(T_t).
  const derivedTMin = DERIVED_SUBLIMATION_T_MIN_FRACTION * tt;
  let sublimation: CurveBranch | undefined;
  if (data.sublimation) {
    const published = data.sublimation;
    sublimation = {
      boundary: "sublimation",
      solid: "solid",
      model: published.model,
      tMin: published.tMin,
      tMax: tt,
      pressure: (temperatureK) => published.pressure(temperatureK, pt),
    };
  } else if (data.enthalpyOfFusion) {
    const dhSub = data.enthalpyOfFusion.value + vaporization.molarEnthalpy(tt);
    const k = { Tt: tt, pt, enthalpyOfSublimation: dhSub };
    sublimation = {
      boundary: "sublimation",
      solid: "solid",
      model: {
        id: `${data.id}-sublimation-derived`,
        name:
          `Derived, not published: Clausius–Clapeyron integrated from the triple point with a constant ` +
          `Δh_sub = ${fmt(dhSub)} J/mol, the cited enthalpy of fusion (${fmt(data.enthalpyOfFusion.value)} J/mol, ` +
          `${shortOf(data.enthalpyOfFusion.source)}) plus the enthalpy of vaporization at the triple point ` +
          `(${fmt(vaporization.molarEnthalpy(tt))} J/mol, ${vaporization.info.name.split(",")[0]})`,
        source: data.enthalpyOfFusion.source,
        grade: "engineering",
        validity: `${fmt(derivedTMin)} K (0.8 T_t) to ${fmt(tt)} K (triple point)`,
        uncertainty:
          "exact at the triple point; below it the neglected heat-capacity difference between " +
          "vapour and solid and the uncertainty of Δh_fus (about 3 %) grow to an estimated 20 % " +
          "in pressure at 0.8 T_t (Phasecell's estimate; against the published argon equation " +
          "of Tegeler et al. 1999 the same construction is +3.6 % off at 0.9 T_t and +8.8 % at " +
          "0.8 T_t)",
      },
      tMin: derivedTMin,
      tMax: tt,
      pressure: (temperatureK) => clausiusClapeyronPressure(k, temperatureK),
      temperature: (pressurePa) => clausiusClapeyronTemperature(k, pressurePa),
      pressureRange: [clausiusClapeyronPressure(k, derivedTMin), pt],
    };
  }

  const melting: CurveBranch[] = [];
  if (data.melting) {
    const curve = data.melting;
    const meltingPressure = (temperatureK: number): number => curve.pressure(temperatureK, pt);
    melting.push({
      boundary: "melting",
      solid: "solid",
      model: curve.model,
      tMin: tt,
      tMax: curve.tMax,
      pressure: meltingPressure,
      pressureRange: [meltingPressure(tt), meltingPressure(curve.tMax)],
    });
  }

  const idealGas = data.idealGas;
  const igRange = idealGas ? idealGasRange(idealGas.model) : ([0, PHASE_MAP_T_MAX] as const);
  const igTMax = Math.min(igRange[1], PHASE_MAP_T_MAX);
  const pressureMax = ENTHALPY_PRESSURE_MAX_OVER_PC * pc;
  const cubic: ModelInfo = {
    id: `${data.id}-peng-robinson`,
    name:
      `Peng–Robinson (1976) enthalpy departure with T_c = ${fmt(tc)} K, p_c = ${fmt(pc)} Pa and ` +
      `ω = ${omega.toFixed(4)}: the vapour-like root for vapour, gas and supercritical fluid, the ` +
      "liquid-like root for the compressed-liquid correction",
    source: "peng-robinson-1976",
    grade: "engineering",
    validity: `pressures up to 5 p_c (${fmt(pressureMax)} Pa)`,
    uncertainty:
      "the paper states none for enthalpy; cubic departure functions are a common engineering " +
      "approximation, weakest near the critical point and for polar fluids. " + data.enthalpyChecks,
  };
  const solidTMax = data.melting ? data.melting.tMax : tt;
  const solidTMin = sublimation ? Math.min(sublimation.tMin, tt) : derivedTMin;
  const idealGasInfo: ModelInfo | undefined = idealGas && {
    id: `${data.id}-ideal-gas-heat-capacity`,
    name: idealGas.name,
    source: idealGas.source,
    grade: "engineering",
    validity:
      igRange[0] === 0
        ? `all temperatures (monatomic gas); Phasecell stops at ${fmt(igTMax)} K`
        : `${fmt(igRange[0])} K to ${fmt(igRange[1])} K`,
    uncertainty: idealGas.uncertainty,
  };
  const enthalpy = idealGas && idealGasInfo && engineeringEnthalpy({
    substanceName: data.name,
    molarMass,
    fluid: { Tc: tc, pc, omega },
    tripleK: tt,
    triplePa: pt,
    boilingPressure,
    vaporization,
    idealGas: { model: idealGas.model, info: idealGasInfo },
    cubic,
    solid: data.enthalpyOfFusion
      ? {
          molarEnthalpyOfFusion: data.enthalpyOfFusion.value,
          tMin: solidTMin,
          tMax: solidTMax,
          info: {
            id: `${data.id}-solid-enthalpy`,
            name:
              `Solid: the liquid at the triple point minus the enthalpy of fusion ` +
              `(${fmt(data.enthalpyOfFusion.value)} J/mol, ${shortOf(data.enthalpyOfFusion.source)}), with a ` +
              "constant heat capacity equal to the saturated liquid's at the triple point",
            source: data.enthalpyOfFusion.source,
            grade: "engineering",
            validity: `${fmt(solidTMin)} K to ${fmt(solidTMax)} K`,
            uncertainty:
              "enthalpy of fusion about ±3 % (single handbook value, no second open source); no open, " +
              "citable solid heat capacity exists for this substance, and a solid's heat capacity is " +
              "lower than its liquid's near melting, so heat to warm or cool the solid is overstated, " +
              "typically by tens of percent (an approximation: use it for estimates only)",
          },
        }
      : undefined,
    vaporTMin: sublimation ? sublimation.tMin : tt,
    vaporTMax: igTMax,
    pressureMax,
  });

  const meltingText = data.melting
    ? `the melting curve (${citation(data.melting.model.source).short})`
    : "no published melting curve: Phasecell knows the melting line only at the triple point, and " +
      "uses the bound that it rises by at most 1 K/MPa (four times the slope of the published argon " +
      "and carbon dioxide melting equations near their triple points, 0.25 and 0.21 K/MPa; an " +
      "engineering judgement); colder than the triple point above the triple-point pressure is " +
      "solid, warmer than the bound fluid, and in between STATE answers that it cannot decide";
  const stateModel: ModelInfo = {
    id: `${data.id}-phase-map`,
    name:
      `Phase map from the boiling curve (${shortOf(vpSource)}), ` +
      (sublimation
        ? `the sublimation curve (${data.sublimation ? shortOf(sublimation.model.source) : "derived by Clausius–Clapeyron"}) `
        : "no sublimation curve ") +
      `and ${meltingText}`,
    source: vpSource,
    grade: "engineering",
    validity:
      `temperatures up to ${fmt(igTMax)} K; ` +
      (sublimation
        ? `below the triple-point pressure down to the sublimation curve's ${fmt(sublimation.tMin)} K`
        : "not below the triple-point pressure (no sublimation curve)") +
      (data.melting ? `; melting pressures up to ${fmt(data.melting.pressure(data.melting.tMax, pt))} Pa` : ""),
    uncertainty:
      "as stated for each curve; the critical point is the one printed with the vapour-pressure " +
      "equation, and gas versus supercritical fluid is decided by T_c and p_c alone",
  };

  const constants: SubstanceDefinition["constants"] = {
    tripleTemperature: constant(data.tripleTemperature, "temperature"),
    triplePressure: {
      value: pt,
      dimension: "pressure",
      source: vpSource,
      note:
        `computed: the vapour-pressure equation (${data.vaporPressure.name}) at T_t = ${fmt(tt)} K gives ` +
        `${fmt(pt)} Pa; used so that the boiling and sublimation curves meet exactly`,
    },
    criticalTemperature: constant(data.criticalTemperature, "temperature"),
    criticalPressure: constant(data.criticalPressure, "pressure"),
    ...(data.criticalDensity ? { criticalDensity: constant(data.criticalDensity, "density") } : {}),
    normalBoilingPoint: constant(data.normalBoilingPoint, "temperature"),
    ...(data.normalMeltingPoint ? { normalMeltingPoint: constant(data.normalMeltingPoint, "temperature") } : {}),
    molarMass: {
      value: molarMass,
      dimension: "molarMass",
      source: "iupac-atomic-weights-2007",
      note: `computed from the formula ${data.formula} with the IUPAC 2007 standard atomic weights (${fmt(molarMass * 1000)} g/mol)`,
    },
    acentricFactor: {
      value: omega,
      dimension: "dimensionless",
      source: vpSource,
      note:
        `computed: ω = −log10(p_s(0.7 T_c) / p_c) − 1 (Pitzer et al. 1955) with the vapour-pressure ` +
        `equation (${omega.toFixed(4)})`,
    },
    enthalpyOfVaporization: {
      value: dhv.value / molarMass,
      dimension: "specificEnergy",
      source: dhv.source,
      note: `${fmt(dhv.value)} J/mol at ${fmt(dhv.temperatureK)} K; ${dhv.note}`,
    },
    ...(data.enthalpyOfFusion
      ? {
          enthalpyOfFusion: {
            value: data.enthalpyOfFusion.value / molarMass,
            dimension: "specificEnergy",
            source: data.enthalpyOfFusion.source,
            note: `${fmt(data.enthalpyOfFusion.value)} J/mol; ${data.enthalpyOfFusion.note}`,
          } satisfies ConstantValue,
        }
      : {}),
  };

  return {
    id: data.id,
    name: data.name,
    formula: data.formula,
    cas: data.cas,
    ...(data.refrigerant ? { refrigerant: data.refrigerant } : {}),
    aliases: [data.name, data.formula, data.cas, ...(data.refrigerant ? [data.refrigerant] : []), ...data.aliases],
    grade: "engineering",
    constants,
    curves: { boiling, ...(sublimation ? { sublimation } : {}), melting },
    ...(data.melting
      ? {}
      : {
          meltingBound: {
            anchorK: tt,
            anchorPa: pt,
            maxSlope: MELTING_SLOPE_BOUND,
            basis: "an engineering bound: the melting temperature rises by at most 1 K/MPa above the triple point",
          },
        }),
    stateModel,
    limits: { tMax: igTMax, tMaxSource: idealGas ? idealGas.source : vpSource },
    referenceState: enthalpy
      ? `zero enthalpy for the saturated liquid at ${fmt(dhv.temperatureK)} K, the temperature of the ` +
        `cited enthalpy of vaporization (${fmt(boilingPressure(dhv.temperatureK) / 1000)} kPa on the boiling curve)`
      : `no enthalpy model: ${data.noEnthalpyReason ?? "no cited ideal-gas heat capacity"}`,
    ...(enthalpy ? { enthalpy } : {}),
    hazards: data.hazards,
  };
}
