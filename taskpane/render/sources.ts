/** The list of every publication cited in the pane, each once, with DOI or standard number. */
import type { Citation } from "../../core/sources/bibliography";
import { el } from "./dom";

/** An ordered list of full references. */
export function renderSources(doc: Document, sources: readonly Citation[]): HTMLOListElement {
  return el(
    doc,
    "ol",
    { class: "sources" },
    sources.map((source) =>
      el(doc, "li", { "data-source": source.id }, [
        el(doc, "strong", {}, [source.short]),
        ". ",
        source.reference,
        ". ",
        source.locator ? el(doc, "span", { class: "locator" }, [source.locator]) : null,
      ]),
    ),
  );
}
