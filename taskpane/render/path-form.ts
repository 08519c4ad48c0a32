/**
 * The inputs of the pane's own path: mass, start and end temperature and absolute pressure, each
 * labelled with its unit, and a button that draws the path (Enter in any field does the same).
 * Plain text inputs with a decimal keyboard hint: the number is read by path-input.ts, which
 * says what is wrong instead of letting the browser silently drop a value.
 */
import type { UnitSystem } from "../../core/units/units";
import { fieldLabel, PATH_FIELDS, type PathField, type PathTexts } from "../data/path-input";
import { el } from "./dom";

/** Element id of a field's input. */
export function pathInputId(field: PathField): string {
  return `path-${field}`;
}

/** What the form starts with and whom it tells. */
export interface PathFormOptions {
  readonly system: UnitSystem;
  readonly texts: PathTexts;
  /** Called with the typed texts when the user asks for the path. */
  readonly onDraw: (texts: PathTexts) => void;
}

/** Reads the four texts back from a rendered form. */
export function formTexts(form: HTMLFormElement): PathTexts {
  const value = (field: PathField) => (form.querySelector<HTMLInputElement>(`#${pathInputId(field)}`)?.value ?? "");
  return { mass: value("mass"), start: value("start"), end: value("end"), pressure: value("pressure") };
}

/** Marks the field a message is about (or none) so that assistive technology announces it. */
export function markInvalid(form: HTMLFormElement, field: PathField | undefined, messageId: string): void {
  for (const spec of PATH_FIELDS) {
    const input = form.querySelector<HTMLInputElement>(`#${pathInputId(spec.field)}`);
    if (!input) continue;
    if (spec.field === field) {
      input.setAttribute("aria-invalid", "true");
      input.setAttribute("aria-describedby", messageId);
    } else {
      input.removeAttribute("aria-invalid");
      input.removeAttribute("aria-describedby");
    }
  }
}

/** Renders the form. */
export function renderPathForm(doc: Document, options: PathFormOptions): HTMLFormElement {
  const form = el(doc, "form", { class: "path-form", novalidate: true, "aria-label": "Path inputs" }, [
    el(
      doc,
      "div",
      { class: "path-fields" },
      PATH_FIELDS.map((spec) => {
        const id = pathInputId(spec.field);
        return el(doc, "div", { class: "field" }, [
          el(doc, "label", { for: id }, [fieldLabel(spec, options.system)]),
          el(doc, "input", {
            id,
            name: spec.field,
            type: "text",
            inputmode: "decimal",
            autocomplete: "off",
            spellcheck: "false",
            value: options.texts[spec.field],
          }),
        ]);
      }),
    ),
    el(doc, "button", { type: "submit", class: "primary" }, ["Draw path"]),
  ]);
  form.addEventListener("submit", (event) => {
    event.preventDefault();
    options.onDraw(formTexts(form));
  });
  return form;
}
