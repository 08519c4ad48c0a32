/**
 * The constants table: one row per constant (label and the symbol typed in PHASE.CONSTANT; value
 * and unit in the display units with the source's short label beneath), each with a hidden detail
 * row opened by the source button: the stored SI value, where in the source it stands, and the
 * full reference. Two columns so that labels and numbers stay readable at 320 px.
 */
import type { ConstantRow } from "../data/rows";
import { constantWithCitation } from "../data/substance-search";
import { citationButton, citationDetail } from "./citation";
import { el, idPart } from "./dom";

/** Renders the constants of one substance; `caption` names the substance and units. */
export function renderConstantsTable(
  doc: Document,
  rows: readonly ConstantRow[],
  caption: string,
  substanceName = "",
): HTMLTableElement {
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
            copyButton(doc, constantWithCitation(substanceName || caption, row)),
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

/**
 * A button that copies a constant with its citation, for a report or a reviewer's note. The
 * clipboard API may be missing or refused inside Office; the text is then selected in a field
 * beside the button so that Ctrl+C copies it.
 */
function copyButton(doc: Document, text: string): HTMLElement {
  const button = el(doc, "button", { type: "button", class: "copy" }, ["Copy with citation"]);
  const status = el(doc, "span", { class: "copy-status", role: "status" });
  const fallback = el(doc, "textarea", { class: "copy-text", readonly: true, rows: "3", "aria-label": "constant with citation", hidden: true });
  fallback.value = text;
  button.addEventListener("click", () => {
    const showFallback = (): void => {
      fallback.hidden = false;
      fallback.focus();
      fallback.select();
      status.textContent = "Selected: press Ctrl+C (Cmd+C) to copy.";
    };
    const clipboard = doc.defaultView?.navigator.clipboard;
    if (!clipboard) {
      showFallback();
      return;
    }
    clipboard.writeText(text).then(
      () => {
        status.textContent = "Copied.";
      },
      showFallback,
    );
  });
  return el(doc, "p", { class: "copy-row" }, [button, " ", status, fallback]);
}
