/**
 * The shape of a substance definition: identity, cited constants, and which correlation serves
 * which coexistence curve over which range. One module per substance fills it in.
 */
import type { Dimension } from "../errors";
import type { CitationId } from "../sources/bibliography";

/** reference: international standards and reference equations; engineering: cited handbook data. */
export type Grade = "reference" | "engineering";

/** A published correlation as a reviewer needs to see it. */
export interface ModelInfo {
  /** Stable id, e.g. "iapws-if97-region4". */
  readonly id: string;
  /** What it is, e.g. "IAPWS-IF97 region 4, Eq. (30) p_s(T) and Eq. (31) T_s(p)". */
  readonly name: string;
  readonly source: CitationId;
  readonly grade: Grade;
  /** Validity range as text with units. */
  readonly validity: string;
  /** Stated uncertainty (or why none is stated). */
  readonly uncertainty: string;
}

/** Which coexistence curve a branch belongs to. */
export type Boundary = "boiling" | "sublimation" | "melting";

/** One branch of a coexistence curve: a published equation p(T) over a temperature range. */
export interface CurveBranch {
  readonly boundary: Boundary;
  /** The solid on this branch (melting and sublimation), e.g. "ice Ih"; "solid" when unnamed. */
  readonly solid?: string;
  readonly model: ModelInfo;
  /** Temperature range of the equation, K. */
  readonly tMin: number;
  readonly tMax: number;
  /** Pressure, Pa, at T in K (no range check: callers check through core/curves). */
  readonly pressure: (temperatureK: number) => number;
  /** Published inverse T(p), K, at p in Pa, when there is one; otherwise it is solved for. */
  readonly temperature?: (pressurePa: number) => number;
  /**
   * Pressure range of the branch, Pa, low first: p(T) at the range ends, or the published range
   * of the inverse where that differs (IF97 Eq. (31) is stated from the triple-point pressure,
   * while Eq. (30) at 273.16 K gives 611.657 000 01 Pa). Computed from p(T) when absent.
   */
  readonly pressureRange?: readonly [number, number];
}

/** Keys of the constants a substance may carry. */
export type ConstantKey =
  | "tripleTemperature"
  | "triplePressure"
  | "criticalTemperature"
  | "criticalPressure"
  | "criticalDensity"
  | "normalBoilingPoint"
  | "normalMeltingPoint"
  | "normalSublimationPoint"
  | "molarMass"
  | "specificGasConstant"
  | "acentricFactor"
  | "enthalpyOfFusion"
  | "enthalpyOfVaporization";

/** A constant with its citation. */
export interface ConstantValue {
  readonly value: number;
  readonly dimension: Dimension;
  readonly source: CitationId;
  /** Where in the source, or how it was derived from cited inputs. */
  readonly note: string;
}

/** Limits beyond which no model of the substance answers. */
export interface CoverageLimits {
  /** Highest temperature any fluid model of the substance covers, K. */
  readonly tMax: number;
  readonly tMaxSource: CitationId;
}

/** Which side of a coexistence curve an enthalpy is wanted on; "vapor" covers gas and supercritical fluid. */
export type PhaseSide = "solid" | "liquid" | "vapor";

/** Specific enthalpy of each phase of a substance, on its stated reference state. */
export interface EnthalpyModel {
  /** The correlations used, for PHASE.SOURCE and the pane. */
  readonly models: readonly ModelInfo[];
  /**
   * Specific enthalpy, J/kg, of the phase on `side` at (T, p); `solid` names the solid form (e.g.
   * "ice Ih") when side is "solid". Throws typed errors outside the models' ranges and where no
   * model exists (NoSuchStateError).
   */
  readonly enthalpy: (side: PhaseSide, temperatureK: number, pressurePa: number, solid: string) => number;
  /**
   * Lowest and highest temperature, K, at which the phase on `side` (or, without a side, some
   * phase) has an enthalpy on the isobar p.
   */
  readonly temperatureLimits: (pressurePa: number, side?: PhaseSide) => readonly [number, number];
}

/**
 * What the phase map may assume where no melting curve is published: the solid–liquid line
 * starts at an anchor point (the triple point) and its temperature rises with pressure no faster
 * than `maxSlope`. A state colder than the anchor at a higher pressure is then certainly solid,
 * a state warmer than anchor + maxSlope · (p − anchor pressure) certainly fluid; between the two
 * the phase map does not decide.
 */
export interface MeltingBound {
  /** Anchor temperature, K (the triple point). */
  readonly anchorK: number;
  /** Anchor pressure, Pa (the triple point). */
  readonly anchorPa: number;
  /** Upper bound of dT/dp along the melting line, K/Pa. */
  readonly maxSlope: number;
  /** Why the bound holds, in words a reviewer can check. */
  readonly basis: string;
  /**
   * Whether a state colder than the anchor (at a higher pressure) is certainly solid: true for a
   * triple-point anchor (the default). Helium-4, anchored at a point of its melting line, is
   * left undecided there instead.
   */
  readonly solidBelowAnchor?: boolean;
  /** Below this pressure, Pa, no solid exists at any temperature covered (helium-4). */
  readonly fluidBelowPa?: number;
}

/** A substance: identity, constants, curves, and the model of its phase map. */
export interface SubstanceDefinition {
  /** Stable id, lower case. */
  readonly id: string;
  /** Display name. */
  readonly name: string;
  readonly formula: string;
  readonly cas: string;
  /** ASHRAE 34 refrigerant number, when one exists. */
  readonly refrigerant?: string;
  /** Every name a user may type (case-insensitive); includes name, formula, CAS and refrigerant. */
  readonly aliases: readonly string[];
  readonly grade: Grade;
  readonly constants: Readonly<Partial<Record<ConstantKey, ConstantValue>>>;
  readonly curves: {
    readonly boiling: CurveBranch;
    readonly sublimation?: CurveBranch;
    /**
     * Ordered by rising pressure; contiguous where they meet at solid–solid–liquid points. Empty
     * where no melting equation is published: see `meltingBound`.
     */
    readonly melting: readonly CurveBranch[];
  };
  /** Required when `curves.melting` is empty: how far the unpublished melting line may lie. */
  readonly meltingBound?: MeltingBound;
  /**
   * Set, with the reason in words, for a substance without a solid–liquid–vapour triple point
   * (helium-4): it has then no triple-point constants and no sublimation curve, and its phase
   * map ends at the bottom of its boiling curve.
   */
  readonly noTriplePoint?: string;
  /** How the phase at (T, p) is decided, and what is approximate about it. */
  readonly stateModel: ModelInfo;
  readonly limits: CoverageLimits;
  /** The energy zero of the substance's enthalpies. */
  readonly referenceState: string;
  /** Enthalpy of its phases, where modelled. */
  readonly enthalpy?: EnthalpyModel;
  /**
   * The substance's own hazards in a few words each (common practice), for the cautions a user
   * sees beside its numbers; the general cautions (pressure, cryogens, local codes) still apply.
   */
  readonly hazards?: readonly string[];
}
