/**
 * The pane's two selectors: substance (built from the registry, so new substances appear without
 * touching the pane) and display units. Native selects: labelled and keyboard operable as they are.
 */
import type { SubstanceDefinition } from "../../core/substances/types";
import type { DisplayUnits } from "../data/display-units";
import { resolveSubstance, searchNames } from "../data/substance-search";
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
  return el(doc, "div", { class: "controls-block" }, [
    renderSearch(doc, substance, options.onSubstance),
    el(doc, "div", { class: "controls" }, [
      field(doc, "substance-select", "Substance", substance),
      field(doc, "units-select", "Display units", units),
    ]),
  ]);
}

/**
 * A search field that takes any name a cell function accepts (name, formula, CAS number,
 * refrigerant number) and picks that substance in the selector; an unknown name gets the core's
 * message with the nearest names.
 */
function renderSearch(doc: Document, select: HTMLSelectElement, onSubstance: (id: string) => void): HTMLElement {
  const input = el(doc, "input", {
    type: "search",
    id: "substance-search",
    list: "substance-names",
    autocomplete: "off",
    spellcheck: "false",
    "aria-describedby": "substance-search-message",
  });
  const names = el(doc, "datalist", { id: "substance-names" }, searchNames().map((name) => el(doc, "option", { value: name })));
  const message = el(doc, "p", { id: "substance-search-message", class: "search-message", role: "status" });
  input.addEventListener("change", () => {
    if (input.value.trim() === "") return;
    const found = resolveSubstance(input.value);
    if ("id" in found) {
      message.textContent = "";
      select.value = found.id;
      onSubstance(found.id);
    } else {
      message.textContent = found.message;
    }
  });
  return el(doc, "div", { class: "field search" }, [
    el(doc, "label", { for: "substance-search" }, ["Find a substance (name, formula, CAS or R-number)"]),
    input,
    names,
    message,
  ]);
}
