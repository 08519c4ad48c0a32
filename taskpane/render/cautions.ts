/** The cautions box. It is part of every view of the pane and has no control that hides it. */
import { CAUTIONS, CAUTIONS_LIMITS, CAUTIONS_TITLE } from "../data/cautions";
import { el } from "./dom";

/** Renders the cautions as a labelled note. */
export function renderCautions(doc: Document): HTMLElement {
  return el(doc, "aside", { class: "cautions", "aria-labelledby": "cautions-title" }, [
    el(doc, "h2", { id: "cautions-title" }, [CAUTIONS_TITLE]),
    el(
      doc,
      "ul",
      {},
      CAUTIONS.map((caution) => el(doc, "li", {}, [el(doc, "strong", {}, [caution.hazard]), " ", caution.text])),
    ),
    el(doc, "p", { class: "limits" }, [el(doc, "strong", {}, [CAUTIONS_LIMITS.lead]), " ", CAUTIONS_LIMITS.text]),
  ]);
}
