/**
 * The pane's two selectors: substance (built from the registry, so new substances appear without
 * touching the pane) and display units. Native selects: labelled and keyboard operable as they are.
 */
import type { SubstanceDefinition } from "../../core/substances/types";
import type { DisplayUnits } from "../data/display-units";
import { el } from "./dom";

/** What the selectors start at and whom they tell about a change. */
export interface ControlsOptions {
  readonly substances: readonly SubstanceDefinition[];
  readonly substanceId: string;
  readonly units: readonly DisplayUnits[];
  readonly unitsId: string;
  readonly onSubstance: (id: string) => void;
  readonly onUnits: (id: string) => void;
}

function field(doc: Document, id: string, label: string, select: HTMLSelectElement): HTMLElement {
  select.id = id;
  return el(doc, "div", { class: "field" }, [el(doc, "label", { for: id }, [label]), select]);
}

/** Renders both selectors side by side (stacked when narrow). */
export function renderControls(doc: Document, options: ControlsOptions): HTMLElement {
  const substance = el(
    doc,
    "select",
    {},
    options.substances.map((s) =>
      el(doc, "option", { value: s.id, selected: s.id === options.substanceId }, [`${s.name} (${s.formula})`]),
    ),
  );
  substance.addEventListener("change", () => options.onSubstance(substance.value));
  const units = el(
    doc,
    "select",
    {},
    options.units.map((u) => el(doc, "option", { value: u.id, selected: u.id === options.unitsId }, [u.label])),
  );
  units.addEventListener("change", () => options.onUnits(units.value));
  return el(doc, "div", { class: "controls" }, [
    field(doc, "substance-select", "Substance", substance),
    field(doc, "units-select", "Display units", units),
  ]);
}
