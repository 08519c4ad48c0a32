/**
 * A citation's short label as a toggle button, and the detail block it opens: full reference and
 * DOI or standard number. The full reference is also the button's tooltip.
 */
import type { Citation } from "../../core/sources/bibliography";
import { el, type Child } from "./dom";

/** Tooltip text: full reference and locator. */
export function citationTitle(source: Citation): string {
  return source.locator ? `${source.reference}. ${source.locator}` : source.reference;
}

/** The button that shows and hides the element with id `detailId`. */
export function citationButton(doc: Document, source: Citation, detailId: string): HTMLButtonElement {
  const button = el(doc, "button", {
    type: "button",
    class: "cite",
    "aria-expanded": "false",
    "aria-controls": detailId,
    title: citationTitle(source),
  }, [source.short]);
  button.addEventListener("click", () => {
    const detail = doc.getElementById(detailId);
    if (!detail) return;
    const open = button.getAttribute("aria-expanded") !== "true";
    button.setAttribute("aria-expanded", String(open));
    detail.hidden = !open;
  });
  return button;
}

/** The full reference as inline content: "<lead> Reference. Locator". */
export function citationDetail(doc: Document, source: Citation, lead: readonly Child[] = []): HTMLElement {
  return el(doc, "div", { class: "cite-detail" }, [
    ...lead,
    el(doc, "p", { class: "reference" }, [source.reference]),
    source.locator ? el(doc, "p", { class: "locator" }, [source.locator]) : null,
  ]);
}
