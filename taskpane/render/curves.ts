/**
 * The coexistence curves and the phase map: for each, the model, its range in the display units,
 * its source, and (on expand) the model's own statement of validity and uncertainty.
 */
import type { Citation } from "../../core/sources/bibliography";
import type { CurveRow, ModelRow, ShownQuantity } from "../data/rows";
import { citationButton, citationDetail } from "./citation";
import { el, idPart } from "./dom";

function range(low: ShownQuantity, high: ShownQuantity): string {
  return low.unit === high.unit
    ? `${low.text} to ${high.text} ${low.unit}`
    : `${low.text} ${low.unit} to ${high.text} ${high.unit}`;
}

/** The Source row of a card's list and, to follow the list at full width, its hidden detail. */
function sourceParts(doc: Document, key: string, source: Citation): { items: HTMLElement[]; detail: HTMLElement } {
  const detailId = `curve-source-${idPart(key)}`;
  const detail = citationDetail(doc, source);
  detail.id = detailId;
  detail.hidden = true;
  return {
    items: [el(doc, "dt", {}, ["Source"]), el(doc, "dd", {}, [citationButton(doc, source, detailId)])],
    detail,
  };
}

function validityDetails(doc: Document, validity: string, uncertainty: string): HTMLDetailsElement {
  return el(doc, "details", { class: "validity" }, [
    el(doc, "summary", {}, ["Validity and uncertainty"]),
    el(doc, "dl", {}, [
      el(doc, "dt", {}, ["Validity"]),
      el(doc, "dd", {}, [validity]),
      el(doc, "dt", {}, ["Uncertainty"]),
      el(doc, "dd", {}, [uncertainty]),
    ]),
  ]);
}

/** One card per curve branch, in the order given. */
export function renderCurves(doc: Document, rows: readonly CurveRow[]): HTMLElement {
  return el(
    doc,
    "div",
    { class: "curves" },
    rows.map((row) => {
      const source = sourceParts(doc, row.key, row.source);
      return el(doc, "article", { class: "model curve", "data-key": row.key }, [
        el(doc, "h3", {}, [row.title]),
        el(doc, "dl", {}, [
          el(doc, "dt", {}, ["Model"]),
          el(doc, "dd", {}, [row.modelName]),
          el(doc, "dt", {}, ["Grade"]),
          el(doc, "dd", {}, [row.grade]),
          el(doc, "dt", {}, ["Temperature"]),
          el(doc, "dd", { class: "t-range" }, [range(row.temperatureRange[0], row.temperatureRange[1])]),
          el(doc, "dt", {}, ["Pressure"]),
          el(doc, "dd", { class: "p-range" }, [range(row.pressureRange[0], row.pressureRange[1])]),
          ...source.items,
        ]),
        source.detail,
        validityDetails(doc, row.validity, row.uncertainty),
      ]);
    }),
  );
}

/** The card of the model that decides the phase at a state. */
export function renderPhaseMap(doc: Document, row: ModelRow): HTMLElement {
  const source = sourceParts(doc, row.key, row.source);
  return el(doc, "article", { class: "model phase-map", "data-key": row.key }, [
    el(doc, "h3", {}, ["Phase at a state"]),
    el(doc, "dl", {}, [
      el(doc, "dt", {}, ["Model"]),
      el(doc, "dd", {}, [row.modelName]),
      el(doc, "dt", {}, ["Grade"]),
      el(doc, "dd", {}, [row.grade]),
      ...source.items,
    ]),
    source.detail,
    validityDetails(doc, row.validity, row.uncertainty),
  ]);
}
