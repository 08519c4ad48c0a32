/**
 * The constants table: one row per constant (label and the symbol typed in PHASE.CONSTANT; value
 * and unit in the display units with the source's short label beneath), each with a hidden detail
 * row opened by the source button: the stored SI value, where in the source it stands, and the
 * full reference. Two columns so that labels and numbers stay readable at 320 px.
 */
import type { ConstantRow } from "../data/rows";
import { citationButton, citationDetail } from "./citation";
import { el, idPart } from "./dom";

/** Renders the constants of one substance; `caption` names the substance and units. */
export function renderConstantsTable(doc: Document, rows: readonly ConstantRow[], caption: string): HTMLTableElement {
  const body = el(doc, "tbody");
  for (const row of rows) {
    const detailId = `constant-detail-${idPart(row.key)}`;
    body.append(
      el(doc, "tr", { class: "constant", "data-key": row.key, "data-symbol": row.symbol }, [
        el(doc, "th", { scope: "row" }, [
          el(doc, "span", { class: "label" }, [row.label]),
          " ",
          el(doc, "code", { class: "symbol", title: "symbol for PHASE.CONSTANT" }, [row.symbol]),
        ]),
        el(doc, "td", { class: "quantity" }, [
          el(doc, "span", { class: "reading" }, [
            el(doc, "span", { class: "value" }, [row.quantity.text]),
            row.quantity.unit ? " " : null,
            el(doc, "span", { class: "unit" }, [row.quantity.unit]),
          ]),
          el(doc, "span", { class: "source" }, [citationButton(doc, row.source, detailId)]),
        ]),
      ]),
      el(doc, "tr", { class: "detail", id: detailId, hidden: true }, [
        el(doc, "td", { colspan: "2" }, [
          citationDetail(doc, row.source, [
            el(doc, "p", { class: "stored" }, [
              `Stored value ${String(row.quantity.si)} ${row.quantity.siUnit}: ${row.note}.`,
            ]),
          ]),
        ]),
      ]),
    );
  }
  return el(doc, "table", { class: "constants" }, [
    el(doc, "caption", {}, [caption]),
    el(doc, "thead", {}, [
      el(doc, "tr", {}, [
        el(doc, "th", { scope: "col" }, ["Quantity"]),
        el(doc, "th", { scope: "col", class: "quantity" }, ["Value and source"]),
      ]),
    ]),
    body,
  ]);
}
