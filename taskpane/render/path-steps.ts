/**
 * The steps of a path as a table. Each step is a row group: a header line with the step number
 * and what happens (core's words can be long), then its temperature (from → to, or the one
 * temperature of a phase change), heat and running total, numbers printed by core's formatNumber.
 * Three number columns fit six-digit negative numbers at 320 px. The step numbers are the ones
 * beside the chart's segments.
 */
import { formatNumber } from "../../core/errors";
import type { PathChartData, PathSegment } from "../data/path-chart";
import { el } from "./dom";

function header(doc: Document, text: string, unit: string): HTMLTableCellElement {
  return el(doc, "th", { scope: "col", class: "num" }, [text, unit ? el(doc, "span", { class: "unit" }, [unit]) : null]);
}

function temperatureCell(doc: Document, s: PathSegment): HTMLTableCellElement {
  if (s.kind === "latent" || s.fromT === s.toT) {
    return el(doc, "td", { class: "num temperature" }, [el(doc, "span", { class: "at" }, [`at ${formatNumber(s.fromT)}`])]);
  }
  return el(doc, "td", { class: "num temperature" }, [
    el(doc, "span", { class: "from" }, [formatNumber(s.fromT)]),
    " ",
    el(doc, "span", { class: "to" }, [`→ ${formatNumber(s.toT)}`]),
  ]);
}

/** Renders the table; `caption` says what path it is. */
export function renderPathSteps(doc: Document, data: PathChartData, caption: string): HTMLTableElement {
  const t = data.temperatureUnit;
  const e = data.energyUnit;
  return el(doc, "table", { class: "path-steps" }, [
    el(doc, "caption", {}, [caption]),
    el(doc, "thead", {}, [
      el(doc, "tr", {}, [header(doc, "Temperature", t), header(doc, "Heat", e), header(doc, "Running total", e)]),
    ]),
    ...data.segments.map((s) =>
      el(doc, "tbody", { class: "step", "data-step": String(s.step), "data-kind": s.kind }, [
        el(doc, "tr", { class: "what" }, [
          el(doc, "th", { scope: "rowgroup", colspan: "3" }, [
            el(doc, "span", { class: "step-number" }, [`Step ${s.step}`]),
            ": ",
            s.action,
          ]),
        ]),
        el(doc, "tr", { class: "numbers" }, [
          temperatureCell(doc, s),
          el(doc, "td", { class: "num energy" }, [formatNumber(s.energy)]),
          el(doc, "td", { class: "num total" }, [formatNumber(s.endTotal)]),
        ]),
      ]),
    ),
  ]);
}
