/**
 * A small element builder so the render modules read as markup. Text goes in as text nodes, never
 * as HTML, so nothing from data can inject markup.
 */

/** A child: an element, text, or nothing (skipped). */
export type Child = Node | string | null | undefined | false;

/** Attributes; `false` and `undefined` leave an attribute out, `true` sets it empty. */
export type Attributes = Readonly<Record<string, string | boolean | undefined>>;

/** Creates an element with attributes and children. */
export function el<K extends keyof HTMLElementTagNameMap>(
  doc: Document,
  tag: K,
  attributes: Attributes = {},
  children: readonly Child[] = [],
): HTMLElementTagNameMap[K] {
  const element = doc.createElement(tag);
  for (const [name, value] of Object.entries(attributes)) {
    if (value === undefined || value === false) continue;
    element.setAttribute(name, value === true ? "" : value);
  }
  append(element, children);
  return element;
}

/** Appends children, turning strings into text nodes. */
export function append(parent: Node, children: readonly Child[]): void {
  for (const child of children) {
    if (child === null || child === undefined || child === false) continue;
    parent.appendChild(typeof child === "string" ? parent.ownerDocument!.createTextNode(child) : child);
  }
}

/** Turns a key into a fragment usable inside an element id. */
export function idPart(key: string): string {
  return key.replace(/[^A-Za-z0-9_-]+/g, "-");
}
