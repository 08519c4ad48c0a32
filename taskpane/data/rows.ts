/**
 * The pane's reference data as plain rows, built from the substance definition and converted to
 * the chosen display units by core. Nothing here is typed twice: labels, symbols, values, models,
 * ranges and citations all come from core. No DOM, so it runs in Node tests.
 */
import { constantsOf } from "../../core/constants";
import { branchLabel, branchPressureRange } from "../../core/curves";
import { formatNumber, type Dimension } from "../../core/errors";
import { citation, type Citation } from "../../core/sources/bibliography";
import type { ConstantKey, CurveBranch, Grade, ModelInfo, SubstanceDefinition } from "../../core/substances/types";
import { SI, fromSI, unitSymbol, type UnitSystem } from "../../core/units/units";

/** A number shown in display units, with the SI value it came from. */
export interface ShownQuantity {
  /** Value in display units. */
  readonly value: number;
  /** The value as printed, by core's formatNumber. */
  readonly text: string;
  /** Unit symbol of the display units. */
  readonly unit: string;
  /** The stored SI value and its unit, for the detail line. */
  readonly si: number;
  readonly siUnit: string;
}

/** One row of the constants table. */
export interface ConstantRow {
  readonly key: ConstantKey;
  readonly label: string;
  /** The symbol a user types in PHASE.CONSTANT. */
  readonly symbol: string;
  readonly quantity: ShownQuantity;
  /** Where in the source, or how it was derived. */
  readonly note: string;
  readonly source: Citation;
}

/** One coexistence-curve branch with its model. */
export interface CurveRow {
  /** Stable key: the model id. */
  readonly key: string;
  /** "boiling curve", "ice Ih melting curve", … */
  readonly title: string;
  readonly modelName: string;
  readonly grade: Grade;
  /** Temperature range of the equation, low to high. */
  readonly temperatureRange: readonly [ShownQuantity, ShownQuantity];
  /** Pressure range along the branch, low to high. */
  readonly pressureRange: readonly [ShownQuantity, ShownQuantity];
  /** The model's own statement of validity and uncertainty (text from core, in SI). */
  readonly validity: string;
  readonly uncertainty: string;
  readonly source: Citation;
}

/** A model shown as text only (the phase map). */
export interface ModelRow {
  readonly key: string;
  readonly modelName: string;
  readonly grade: Grade;
  readonly validity: string;
  readonly uncertainty: string;
  readonly source: Citation;
}

/** Identity of a substance as the pane's heading shows it. */
export interface SubstanceSummary {
  readonly id: string;
  readonly name: string;
  readonly formula: string;
  readonly cas: string;
  readonly refrigerant?: string;
  readonly grade: Grade;
  readonly referenceState: string;
}

/** Everything the reference section of the pane shows for one substance in one set of units. */
export interface ReferenceData {
  readonly summary: SubstanceSummary;
  readonly constants: readonly ConstantRow[];
  readonly curves: readonly CurveRow[];
  readonly phaseMap: ModelRow;
  /** Every publication cited above, once, in order of first use. */
  readonly sources: readonly Citation[];
}

/**
 * Converts an SI value to display units and prints it the way core prints numbers. `molarMass`
 * (kg/mol) converts specific quantities when the display units are molar (g/mol, lb/lbmol).
 */
export function showQuantity(system: UnitSystem, dimension: Dimension, valueSI: number, molarMass?: number): ShownQuantity {
  const value = fromSI(system, dimension, valueSI, molarMass);
  return {
    value,
    text: formatNumber(value),
    unit: unitSymbol(system, dimension),
    si: valueSI,
    siUnit: unitSymbol(SI, dimension),
  };
}

/** The constants of a substance, in catalogue order. */
export function constantRows(substance: SubstanceDefinition, system: UnitSystem): ConstantRow[] {
  const molarMass = substance.constants.molarMass?.value;
  return constantsOf(substance).map((constant) => ({
    key: constant.entry.key,
    label: constant.entry.label,
    symbol: constant.entry.symbol,
    quantity: showQuantity(system, constant.dimension, constant.value, molarMass),
    note: constant.note,
    source: citation(constant.source),
  }));
}

function curveRow(branch: CurveBranch, system: UnitSystem): CurveRow {
  const [pLow, pHigh] = branchPressureRange(branch);
  return {
    key: branch.model.id,
    title: branchLabel(branch),
    modelName: branch.model.name,
    grade: branch.model.grade,
    temperatureRange: [
      showQuantity(system, "temperature", branch.tMin),
      showQuantity(system, "temperature", branch.tMax),
    ],
    pressureRange: [showQuantity(system, "pressure", pLow), showQuantity(system, "pressure", pHigh)],
    validity: branch.model.validity,
    uncertainty: branch.model.uncertainty,
    source: citation(branch.model.source),
  };
}

/** The coexistence curves: boiling, then sublimation, then each melting branch by rising pressure. */
export function curveRows(substance: SubstanceDefinition, system: UnitSystem): CurveRow[] {
  const { boiling, sublimation, melting } = substance.curves;
  const branches = [boiling, ...(sublimation ? [sublimation] : []), ...melting];
  return branches.map((branch) => curveRow(branch, system));
}

function modelRow(model: ModelInfo): ModelRow {
  return {
    key: model.id,
    modelName: model.name,
    grade: model.grade,
    validity: model.validity,
    uncertainty: model.uncertainty,
    source: citation(model.source),
  };
}

/** Identity of the substance. */
export function substanceSummary(substance: SubstanceDefinition): SubstanceSummary {
  const base = {
    id: substance.id,
    name: substance.name,
    formula: substance.formula,
    cas: substance.cas,
    grade: substance.grade,
    referenceState: substance.referenceState,
  };
  return substance.refrigerant === undefined ? base : { ...base, refrigerant: substance.refrigerant };
}

/** All reference rows of a substance in the given display units. */
export function referenceData(substance: SubstanceDefinition, system: UnitSystem): ReferenceData {
  const constants = constantRows(substance, system);
  const curves = curveRows(substance, system);
  const phaseMap = modelRow(substance.stateModel);
  const sources = new Map<string, Citation>();
  for (const row of [...constants, ...curves, phaseMap]) {
    if (!sources.has(row.source.id)) sources.set(row.source.id, row.source);
  }
  if (substance.refrigerant !== undefined) {
    const ashrae = citation("ashrae-34");
    sources.set(ashrae.id, ashrae);
  }
  return { summary: substanceSummary(substance), constants, curves, phaseMap, sources: [...sources.values()] };
}
