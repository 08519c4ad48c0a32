/**
 * Puts the pane together: heading, outside-Excel notice, selectors, cautions, the heating and
 * cooling path, the reference section, which is rebuilt whenever the substance or the display
 * units change, and the phase diagram with the user's state points. Knows nothing of Office: the
 * entry point tells it the host once office.js has answered, and hands it what the workbook's
 * selection holds.
 */
import { SUBSTANCES } from "../core/substances/registry";
import type { SubstanceDefinition } from "../core/substances/types";
import { DISPLAY_UNITS, displayUnitsById, type DisplayUnits } from "./data/display-units";
import { isobarOverlay, type SelectionView } from "./data/path-table";
import { referenceData } from "./data/rows";
import { createPathSection } from "./path-section";
import type { SelectedStatePoints } from "./office-selection";
import { createPhaseDiagramSection } from "./phase-diagram-section";
import { renderCautions } from "./render/cautions";
import { renderConstantsTable } from "./render/constants-table";
import { renderControls } from "./render/controls";
import { renderCurves, renderPhaseMap } from "./render/curves";
import { el } from "./render/dom";
import { renderOutsideExcelNotice } from "./render/notice";
import { renderSources } from "./render/sources";

/** Handle on a mounted pane. */
export interface Pane {
  /** Tells the pane where it runs: "Excel", another host name, or null outside Office. */
  setHost(host: string | null): void;
  /** Shows what the workbook's selection holds (a PHASE.PATH result is drawn). */
  showSelection(view: SelectionView): void;
  /** Plots the states the workbook's selection holds on the phase diagram. */
  showStatePoints(points: SelectedStatePoints): void;
  /** The display units the pane shows now, as a units text. */
  displayUnitsText(): string;
}

function substanceById(id: string): SubstanceDefinition {
  return SUBSTANCES.find((s) => s.id === id) ?? SUBSTANCES[0]!;
}

function renderReference(doc: Document, substance: SubstanceDefinition, units: DisplayUnits): HTMLElement {
  const data = referenceData(substance, units.system);
  const { summary } = data;
  const identity = [
    summary.formula,
    `CAS ${summary.cas}`,
    summary.refrigerant,
    `${summary.grade} grade`,
  ].filter((part): part is string => part !== undefined);
  return el(doc, "div", { class: "reference-data", "data-substance": summary.id, "data-units": units.id }, [
    el(doc, "section", { "aria-labelledby": "substance-title" }, [
      el(doc, "h2", { id: "substance-title" }, [summary.name]),
      el(doc, "p", { class: "identity" }, [identity.join(" · ")]),
      el(doc, "p", { class: "hint" }, [
        "Pressures are absolute. In a cell, the units text ",
        el(doc, "code", {}, [`"${units.unitsText}"`]),
        " gives these values.",
      ]),
      renderConstantsTable(doc, data.constants, `Constants of ${summary.name}, ${units.label}`, summary.name),
    ]),
    el(doc, "section", { "aria-labelledby": "curves-title" }, [
      el(doc, "h2", { id: "curves-title" }, ["Coexistence curves"]),
      renderCurves(doc, data.curves),
      renderPhaseMap(doc, data.phaseMap),
      el(doc, "p", { class: "hint" }, [`Energy zero: ${summary.referenceState}.`]),
    ]),
    el(doc, "section", { "aria-labelledby": "sources-title" }, [
      el(doc, "h2", { id: "sources-title" }, ["Sources"]),
      renderSources(doc, data.sources),
    ]),
  ]);
}

/** Builds the pane inside `root` (its previous content is replaced). */
export function mountPane(root: HTMLElement, doc: Document = root.ownerDocument): Pane {
  let substance = SUBSTANCES[0]!;
  let units = DISPLAY_UNITS[0]!;
  const noticeSlot = el(doc, "div", { class: "notice-slot" });
  const referenceSlot = el(doc, "div", { class: "reference-slot" });
  const path = createPathSection(doc, substance, units);
  const diagram = createPhaseDiagramSection(doc, substance, units);
  const renderReferenceSlot = (): void => {
    referenceSlot.replaceChildren(renderReference(doc, substance, units));
  };
  const rerender = (): void => {
    renderReferenceSlot();
    path.setContext(substance, units);
    diagram.setContext(substance, units);
  };
  root.replaceChildren(
    el(doc, "header", { class: "pane-header" }, [
      el(doc, "h1", {}, ["Phasecell"]),
      el(doc, "p", {}, ["Phase data with sources"]),
    ]),
    noticeSlot,
    renderControls(doc, {
      substances: SUBSTANCES,
      substanceId: substance.id,
      units: DISPLAY_UNITS,
      unitsId: units.id,
      onSubstance: (id) => {
        substance = substanceById(id);
        rerender();
      },
      onUnits: (id) => {
        units = displayUnitsById(id);
        rerender();
      },
    }),
    renderCautions(doc),
    path.element,
    referenceSlot,
    diagram.element,
  );
  renderReferenceSlot();
  return {
    setHost(host) {
      noticeSlot.replaceChildren(...(host === "Excel" ? [] : [renderOutsideExcelNotice(doc)]));
    },
    showSelection(view) {
      path.showSelection(view);
      diagram.setWorkbookPath(isobarOverlay(view));
    },
    showStatePoints(points) {
      diagram.setWorkbookPoints(points);
    },
    displayUnitsText() {
      return units.system.text;
    },
  };
}
