/**
 * The "Heating and cooling path" section: a PHASE.PATH result selected in the workbook, drawn from
 * its own numbers, then a path the user enters here (substance and units from the pane's
 * selectors), computed by core. Knows nothing of Office: the entry point passes selection views in.
 */
import { formatNumber } from "../core/errors";
import type { SubstanceDefinition } from "../core/substances/types";
import { unitSymbol } from "../core/units/units";
import type { DisplayUnits } from "./data/display-units";
import { curveWordOf, type PathChartData } from "./data/path-chart";
import {
  computePath,
  convertTexts,
  DEFAULT_PATH_SI,
  parseTypedNumber,
  textsFromSI,
  type PathTexts,
} from "./data/path-input";
import type { SelectionView } from "./data/path-table";
import { el } from "./render/dom";
import { renderPathChart } from "./render/path-chart";
import { markInvalid, renderPathForm } from "./render/path-form";
import { renderPathSteps } from "./render/path-steps";

/** Handle on the mounted section. */
export interface PathSection {
  readonly element: HTMLElement;
  /** The pane's substance or display units changed: convert the inputs and draw again. */
  setContext(substance: SubstanceDefinition, units: DisplayUnits): void;
  /** What the workbook's selection holds. */
  showSelection(view: SelectionView): void;
}

const ERROR_ID = "path-error";

function capitalised(text: string): string {
  return `${text.charAt(0).toUpperCase()}${text.slice(1)}`;
}

function summary(data: PathChartData): string {
  const steps = data.segments.length;
  const unit = data.energyUnit ? ` ${data.energyUnit}` : "";
  const total = data.segments.at(-1)?.endTotal ?? 0;
  return `${steps} ${steps === 1 ? "step" : "steps"}, ${formatNumber(total)}${unit} in all.`;
}

function chartAndTable(doc: Document, data: PathChartData, idPrefix: string, title: string, caption: string): Node[] {
  if (data.segments.length === 0) return [renderPathChart(doc, data, { idPrefix, title })];
  return [renderPathChart(doc, data, { idPrefix, title }), renderPathSteps(doc, data, caption)];
}

function renderSelection(doc: Document, view: SelectionView): Node[] {
  const hint = (text: string) => [el(doc, "p", { class: "hint" }, [text])];
  switch (view.kind) {
    case "unavailable":
      return hint(
        "In Excel, select any cell of a PHASE.PATH result (or the whole table from its header row) to draw " +
          "it here from the workbook's own numbers.",
      );
    case "none":
      return hint(
        `The selection (${view.address}) is not a PHASE.PATH result. Select any cell of one, or the whole ` +
          "table from its header row.",
      );
    case "invalid":
      return hint(`${view.address} starts like a PHASE.PATH result, but ${view.reason}.`);
    case "error":
      return [el(doc, "p", { class: "path-error" }, [view.message])];
    case "path": {
      const units =
        view.units === null
          ? "Units: those of the formula (not readable here), so the axes carry no unit symbols."
          : view.units.trim() === ""
            ? "Units: SI (the formula gives no units argument)."
            : `Units: "${view.units}", as in the formula.`;
      const word = curveWordOf(view.data);
      return [
        el(doc, "p", { class: "selection-address" }, [
          "Selected ",
          el(doc, "strong", {}, [view.address]),
          `: ${summary(view.data)} ${units}`,
        ]),
        ...chartAndTable(
          doc,
          view.data,
          "selection-chart",
          `${capitalised(word)} curve from ${view.address}`,
          `Steps in ${view.address}, as the workbook holds them`,
        ),
      ];
    }
  }
}

/** Builds the section for a substance and display units. */
export function createPathSection(doc: Document, substance: SubstanceDefinition, units: DisplayUnits): PathSection {
  let current = { substance, units };
  let texts: PathTexts = textsFromSI(DEFAULT_PATH_SI, units.pathSystem);
  const intro = el(doc, "p", { class: "hint" });
  const formSlot = el(doc, "div", { class: "path-form-slot" });
  const status = el(doc, "p", { class: "path-status", role: "status" });
  const errorSlot = el(doc, "div", { class: "path-error-slot" });
  const resultSlot = el(doc, "div", { class: "path-result", id: "path-result" });
  const selectionSlot = el(doc, "div", { class: "path-selection", id: "path-selection" }, renderSelection(doc, { kind: "unavailable" }));

  const draw = (): void => {
    const { substance: s, units: u } = current;
    const outcome = computePath(s, u.pathSystem, u.pathUnitsText, texts);
    const form = formSlot.querySelector("form");
    if (!outcome.ok) {
      errorSlot.replaceChildren(el(doc, "p", { class: "path-error", id: ERROR_ID, role: "alert" }, [outcome.message]));
      resultSlot.replaceChildren();
      status.textContent = "";
      if (form) markInvalid(form, outcome.field, ERROR_ID);
      return;
    }
    errorSlot.replaceChildren();
    if (form) markInvalid(form, undefined, ERROR_ID);
    const number = (text: string) => formatNumber(parseTypedNumber(text) ?? Number.NaN);
    const t = outcome.data.temperatureUnit;
    const pressureUnit = unitSymbol(u.pathSystem, "pressure");
    const massUnit = unitSymbol(u.pathSystem, "mass");
    const word = curveWordOf(outcome.data);
    const what = `${number(texts.mass)} ${massUnit} of ${s.name} from ${number(texts.start)} to ${number(texts.end)} ${t} at ${number(texts.pressure)} ${pressureUnit}`;
    status.textContent = `${capitalised(word)} path drawn: ${summary(outcome.data)}`;
    resultSlot.replaceChildren(
      ...chartAndTable(
        doc,
        outcome.data,
        "path-chart",
        `${capitalised(word)} curve of ${what}`,
        `Steps for ${what}`,
      ),
      el(doc, "p", { class: "hint formula" }, ["The same table in a cell: ", el(doc, "code", {}, [outcome.formula])]),
    );
  };

  const renderInputs = (): void => {
    const { substance: s, units: u } = current;
    const symbols = (["temperature", "pressure", "energy"] as const).map((d) => unitSymbol(u.pathSystem, d));
    intro.replaceChildren(
      `Heat or cool ${s.name} at constant pressure, in ${symbols.join(", ")} and ` +
        `${unitSymbol(u.pathSystem, "mass")}; pressure is absolute. Substance and units follow the choices above.`,
    );
    formSlot.replaceChildren(
      renderPathForm(doc, {
        system: u.pathSystem,
        texts,
        onDraw: (typed) => {
          texts = typed;
          draw();
        },
      }),
    );
  };

  const element = el(doc, "section", { class: "path-section", "aria-labelledby": "path-title" }, [
    el(doc, "h2", { id: "path-title" }, ["Heating and cooling path"]),
    el(doc, "h3", {}, ["From the workbook"]),
    selectionSlot,
    el(doc, "h3", {}, ["From these inputs"]),
    intro,
    formSlot,
    status,
    errorSlot,
    resultSlot,
  ]);
  renderInputs();
  draw();

  return {
    element,
    setContext(nextSubstance, nextUnits) {
      texts = convertTexts(texts, current.units.pathSystem, nextUnits.pathSystem);
      current = { substance: nextSubstance, units: nextUnits };
      renderInputs();
      draw();
    },
    showSelection(view) {
      selectionSlot.replaceChildren(...renderSelection(doc, view));
    },
  };
}
