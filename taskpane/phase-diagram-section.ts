/**
 * The "Phase diagram" section: the substance's diagram in the display units, a choice of window
 * (full range, near the triple point, near the critical point), and state points the user types
 * (temperature and absolute pressure), each drawn and listed with the phase core gives it.
 * Knows nothing of Office.
 */
import type { SubstanceDefinition } from "../core/substances/types";
import { fromSI, unitSymbol } from "../core/units/units";
import type { DisplayUnits } from "./data/display-units";
import {
  phaseDiagramData,
  readStatePoint,
  statePoints,
  ZOOMS,
  type PhaseDiagramData,
  type StatePointSI,
  type ZoomId,
} from "./data/phase-diagram";
import { el } from "./render/dom";
import { inWindow, renderDiagramLegend, renderDiagramSvg, type PhaseDiagramOptions } from "./render/phase-diagram";
import type { IsobarOverlay } from "./data/path-table";
import type { SelectedStatePoints } from "./office-selection";
import { resolveSubstance } from "./data/substance-search";

/** True when a name typed in a formula means the pane's substance. */
function sameSubstance(name: string, substance: SubstanceDefinition): boolean {
  const found = resolveSubstance(name);
  return "id" in found && found.id === substance.id;
}

/** Handle on the mounted section. */
export interface PhaseDiagramSection {
  readonly element: HTMLElement;
  /** The pane's substance or display units changed: draw again (points are kept only for the same substance). */
  setContext(substance: SubstanceDefinition, units: DisplayUnits): void;
  /** The workbook's selection holds these states (they replace the previous selection's). */
  setWorkbookPoints(points: SelectedStatePoints): void;
  /** The workbook's selection is a PHASE.PATH result: draw its isobar and phase changes (undefined clears). */
  setWorkbookPath(path: IsobarOverlay | undefined): void;
}

const ERROR_ID = "pd-point-error";

/** Builds the section. */
export function createPhaseDiagramSection(doc: Document, substance: SubstanceDefinition, units: DisplayUnits): PhaseDiagramSection {
  let current = { substance, units };
  let zoom: ZoomId = "full";
  let points: StatePointSI[] = [];
  let workbook: SelectedStatePoints = { address: "", points: [], notes: [] };
  let workbookPath: IsobarOverlay | undefined;
  const workbookNote = el(doc, "p", { class: "hint pd-workbook", role: "status" });
  let data: PhaseDiagramData = phaseDiagramData(substance, units.system);

  const zoomSlot = el(doc, "div", { class: "pd-zoom-slot" });
  const figureSlot = el(doc, "div", { class: "pd-figure-slot", id: "phase-diagram" });
  const notesSlot = el(doc, "div", { class: "pd-notes" });
  const tInput = el(doc, "input", { id: "pd-point-t", name: "t", type: "text", inputmode: "decimal", autocomplete: "off", spellcheck: "false" });
  const pInput = el(doc, "input", { id: "pd-point-p", name: "p", type: "text", inputmode: "decimal", autocomplete: "off", spellcheck: "false" });
  const tLabel = el(doc, "label", { for: "pd-point-t" });
  const pLabel = el(doc, "label", { for: "pd-point-p" });
  const errorSlot = el(doc, "div", { class: "pd-error-slot" });
  const list = el(doc, "ol", { class: "pd-points", "aria-label": "State points" });
  const status = el(doc, "p", { class: "pd-status", role: "status" });
  const clear = el(doc, "button", { type: "button", class: "secondary" }, ["Clear points"]);
  const form = el(doc, "form", { class: "pd-form", novalidate: true, "aria-label": "Add a state point" }, [
    el(doc, "div", { class: "pd-fields" }, [
      el(doc, "div", { class: "field" }, [tLabel, tInput]),
      el(doc, "div", { class: "field" }, [pLabel, pInput]),
    ]),
    el(doc, "div", { class: "pd-buttons" }, [el(doc, "button", { type: "submit", class: "primary" }, ["Add point"]), clear]),
  ]);

  const markInvalid = (field: "t" | "p" | undefined): void => {
    for (const [name, input] of [
      ["t", tInput],
      ["p", pInput],
    ] as const) {
      if (name === field) {
        input.setAttribute("aria-invalid", "true");
        input.setAttribute("aria-describedby", ERROR_ID);
      } else {
        input.removeAttribute("aria-invalid");
        input.removeAttribute("aria-describedby");
      }
    }
  };

  const renderZoom = (): void => {
    const options = ZOOMS.filter((z) => data.windows[z.id] !== undefined);
    zoomSlot.replaceChildren(
      el(doc, "fieldset", { class: "pd-zoom" }, [
        el(doc, "legend", {}, ["Window"]),
        ...options.map((z) => {
          const id = `pd-zoom-${z.id}`;
          const input = el(doc, "input", { type: "radio", name: "pd-zoom", id, value: z.id, checked: z.id === zoom });
          input.addEventListener("change", () => {
            if (!input.checked) return;
            zoom = z.id;
            renderFigure();
          });
          return el(doc, "div", { class: "pd-zoom-choice" }, [input, el(doc, "label", { for: id }, [z.label])]);
        }),
      ]),
    );
  };

  const overlayOptions = (): { path?: NonNullable<PhaseDiagramOptions["path"]> } => {
    if (!workbookPath) return {};
    const { system } = current.units;
    const show = (temperatureK: number) => ({
      t: fromSI(system, "temperature", temperatureK),
      p: fromSI(system, "pressure", workbookPath!.pressurePa),
    });
    return {
      path: {
        from: show(workbookPath.fromK),
        to: show(workbookPath.toK),
        crossings: workbookPath.crossingsK.map(show),
      },
    };
  };

  const renderFigure = (): void => {
    const fromWorkbook = workbook.points.filter((p) => p.substance === undefined || sameSubstance(p.substance, current.substance));
    const drawn = statePoints(current.substance, current.units.system, [...points, ...fromWorkbook]);
    const otherSubstance = workbook.points.length - fromWorkbook.length;
    workbookNote.textContent =
      workbook.address === "" || (workbook.points.length === 0 && workbook.notes.length === 0)
        ? ""
        : [
            `From the selection ${workbook.address}: ${fromWorkbook.length} state point${fromWorkbook.length === 1 ? "" : "s"}` +
              (otherSubstance > 0 ? ` (${otherSubstance} of another substance not shown)` : "") +
              ".",
            ...workbook.notes,
          ].join(" ");
    figureSlot.replaceChildren(
      el(doc, "figure", { class: "pd-figure" }, [
        renderDiagramSvg(doc, data, drawn, { idPrefix: "phase-diagram", zoom, ...overlayOptions() }),
        renderDiagramLegend(doc, data),
      ]),
    );
    list.replaceChildren(
      ...drawn.map((p) =>
        el(doc, "li", { "data-point": String(p.number) }, [
          `${p.values}: `,
          el(doc, "strong", {}, [p.phase]),
          inWindow(data, zoom, p) ? "" : " (outside this window)",
        ]),
      ),
    );
    clear.hidden = drawn.length === 0;
  };

  const renderAll = (): void => {
    const { system } = current.units;
    tLabel.textContent = `Temperature, ${unitSymbol(system, "temperature")}`;
    pLabel.textContent = `Absolute pressure, ${unitSymbol(system, "pressure")}`;
    notesSlot.replaceChildren(...data.notes.map((note) => el(doc, "p", { class: "hint" }, [note])));
    renderZoom();
    renderFigure();
  };

  form.addEventListener("submit", (event) => {
    event.preventDefault();
    const outcome = readStatePoint(current.substance, current.units.system, tInput.value, pInput.value);
    if (!outcome.ok) {
      errorSlot.replaceChildren(el(doc, "p", { class: "path-error", id: ERROR_ID, role: "alert" }, [outcome.message]));
      markInvalid(outcome.field);
      return;
    }
    errorSlot.replaceChildren();
    markInvalid(undefined);
    points = [...points, outcome.point];
    renderFigure();
    const added = statePoints(current.substance, current.units.system, points).at(-1);
    status.textContent = added ? `Point ${added.number} added: ${added.values}, ${added.phase}.` : "";
  });
  clear.addEventListener("click", () => {
    points = [];
    status.textContent = "State points cleared.";
    renderFigure();
  });

  const element = el(doc, "section", { class: "pd-section", "aria-labelledby": "pd-title" }, [
    el(doc, "h2", { id: "pd-title" }, ["Phase diagram"]),
    el(doc, "p", { class: "hint" }, ["Curves and points from Phasecell's core; pressures are absolute. Hover a curve for its source."]),
    zoomSlot,
    figureSlot,
    notesSlot,
    el(doc, "h3", {}, ["State points"]),
    el(doc, "p", { class: "hint" }, [
      "Type a state below, or select cells in the workbook: PHASE.STATE formulas, or two columns of temperature and pressure in the display units.",
    ]),
    workbookNote,
    form,
    errorSlot,
    status,
    list,
  ]);
  renderAll();

  return {
    element,
    setWorkbookPath(path: IsobarOverlay | undefined) {
      workbookPath = path;
      renderFigure();
    },
    setWorkbookPoints(selection: SelectedStatePoints) {
      workbook = selection;
      renderFigure();
    },
    setContext(substance: SubstanceDefinition, units: DisplayUnits) {
      if (substance.id !== current.substance.id) {
        points = [];
        status.textContent = "";
        if (zoom === "triple" && substance.noTriplePoint !== undefined) zoom = "full";
      }
      current = { substance, units };
      data = phaseDiagramData(substance, units.system);
      if (data.windows[zoom] === undefined) zoom = "full";
      errorSlot.replaceChildren();
      markInvalid(undefined);
      renderAll();
    },
  };
}
