/**
 * Provenance rows: for each quantity a substance serves, the model, grade, citation, validity
 * range and stated uncertainty, as a reviewer reads them. Used by PHASE.SOURCE and the pane.
 */
import { CONSTANT_CATALOG, constantsOf } from "../constants";
import { branchLabel } from "../curves";
import { BadInputError } from "../errors";
import { foldName } from "../names";
import type { CurveBranch, ModelInfo, SubstanceDefinition } from "../substances/types";
import { citation } from "./bibliography";

/** One provenance row. */
export interface ProvenanceRow {
  /** What the row is about, e.g. "boiling curve", "ice V melting curve", "Tc". */
  readonly quantity: string;
  /** Model or derivation. */
  readonly model: string;
  readonly grade: string;
  /** Full citation with DOI or standard number. */
  readonly source: string;
  readonly validity: string;
  readonly uncertainty: string;
  /** Words a user may type to ask for this row (folded when compared). */
  readonly keys: readonly string[];
}

/** Column titles of {@link ProvenanceRow}, in table order. */
export const PROVENANCE_HEADER = ["quantity", "model", "grade", "source", "validity", "uncertainty"] as const;

function sourceText(model: ModelInfo): string {
  const cited = citation(model.source);
  return cited.locator ? `${cited.reference} [${cited.locator}]` : cited.reference;
}

function modelRow(quantity: string, model: ModelInfo, keys: readonly string[]): ProvenanceRow {
  return {
    quantity,
    model: model.name,
    grade: model.grade,
    source: sourceText(model),
    validity: model.validity,
    uncertainty: model.uncertainty,
    keys,
  };
}

function branchRow(branch: CurveBranch): ProvenanceRow {
  const label = branchLabel(branch);
  const keys =
    branch.boundary === "boiling"
      ? ["boiling", "boiling curve", "saturation", "vapor pressure", "vapour pressure", "satpressure", "sattemp"]
      : branch.boundary === "sublimation"
        ? ["sublimation", "sublimation curve", "satpressure", "sattemp"]
        : ["melting", "melting curve", "melttemp", "meltpressure", label, branch.solid ?? "solid"];
  return modelRow(label, branch.model, keys);
}

/** Every provenance row of a substance: phase map, curves, then constants. */
export function provenanceRows(substance: SubstanceDefinition): ProvenanceRow[] {
  const rows: ProvenanceRow[] = [
    modelRow("phase map", substance.stateModel, ["state", "phase", "phase map"]),
    branchRow(substance.curves.boiling),
  ];
  if (substance.curves.sublimation) rows.push(branchRow(substance.curves.sublimation));
  for (const branch of substance.curves.melting) rows.push(branchRow(branch));
  if (substance.curves.melting.length === 0) {
    rows.push({
      quantity: "melting curve",
      model: "none published in Phasecell's sources",
      grade: substance.grade,
      source: "",
      validity: substance.meltingBound
        ? `states are decided only outside the band the bound leaves open (${substance.meltingBound.basis})`
        : "",
      uncertainty: "MELTTEMP and MELTPRESSURE return #N/A",
      keys: ["melting", "melting curve", "melttemp", "meltpressure"],
    });
  }
  for (const model of substance.enthalpy?.models ?? []) {
    rows.push(
      modelRow("enthalpy", model, ["enthalpy", "path", "pathenergy", "endstate", "latentheat", "latent heat", "energy", model.id]),
    );
  }
  if (substance.enthalpy) {
    rows.push({
      quantity: "reference state",
      model: substance.referenceState,
      grade: substance.grade,
      source: "",
      validity: "",
      uncertainty: "path energies and latent heats do not depend on it",
      keys: ["reference state", "reference", "enthalpy", "path", "pathenergy"],
    });
  }
  for (const constant of constantsOf(substance)) {
    const cited = citation(constant.source);
    rows.push({
      quantity: `${constant.entry.symbol} (${constant.entry.label})`,
      model: constant.note,
      grade: substance.grade,
      source: cited.locator ? `${cited.reference} [${cited.locator}]` : cited.reference,
      validity: "",
      uncertainty: "",
      keys: ["constant", "constants", constant.entry.symbol, constant.entry.label, constant.entry.key, ...constant.entry.names],
    });
  }
  return rows;
}

/**
 * The rows answering a quantity word ("boiling", "melting", "ice V", "Tc", "state", "constants");
 * all rows when the word is empty.
 * @throws BadInputError when nothing matches, listing the accepted words.
 */
export function provenanceFor(substance: SubstanceDefinition, quantity: string): ProvenanceRow[] {
  const rows = provenanceRows(substance);
  if (quantity.trim() === "") return rows;
  const folded = foldName(quantity);
  const matching = rows.filter((row) => row.keys.some((key) => foldName(key) === folded));
  if (matching.length > 0) return matching;
  const words = ["state", "boiling", "sublimation", "melting", "enthalpy", ...substance.curves.melting.map((b) => b.solid ?? "solid"), "constants", ...CONSTANT_CATALOG.map((c) => c.symbol)];
  throw new BadInputError([
    `no source entry for "${quantity.trim()}" on ${substance.name}; use one of: ${[...new Set(words)].join(", ")} ` +
      "(or leave it empty for all)",
  ]);
}
