/**
 * The only way the pane builds DOM: elements with attributes and children, text always set as text
 * (textContent / text nodes). There is no innerHTML anywhere in src/taskpane: library files come
 * from outside, and a name such as `<img src=x onerror=…>` must show as those characters.
 */

export type Child = Node | string | number | null | undefined | false;
export type Attrs = Record<string, string | number | boolean | null | undefined>;

/** `el("button", { type: "button", "aria-expanded": false }, "Edit")`. Boolean true → empty attribute, false/null/undefined → absent (except aria-*, which keep "true"/"false"). */
export function el<K extends keyof HTMLElementTagNameMap>(tag: K, attrs: Attrs = {}, ...children: Child[]): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [name, value] of Object.entries(attrs)) {
    if (value === null || value === undefined) continue;
    if (name.startsWith("aria-") && typeof value === "boolean") node.setAttribute(name, String(value));
    else if (value === false) continue;
    else if (value === true) node.setAttribute(name, "");
    else node.setAttribute(name, String(value));
  }
  append(node, ...children);
  return node;
}

export function append(parent: Node, ...children: Child[]): void {
  for (const c of children) {
    if (c === null || c === undefined || c === false) continue;
    parent.appendChild(typeof c === "string" || typeof c === "number" ? document.createTextNode(String(c)) : c);
  }
}

/** Replace every child of `parent` by `children`. */
export function replaceChildren(parent: Element, ...children: Child[]): void {
  while (parent.firstChild) parent.removeChild(parent.firstChild);
  append(parent, ...children);
}

/** Element by id that must exist in taskpane.html. */
export function byId<T extends HTMLElement = HTMLElement>(id: string): T {
  const node = document.getElementById(id);
  if (!node) throw new Error(`taskpane.html has no #${id}`);
  return node as T;
}

let counter = 0;
/** A fresh id for label/aria wiring. */
export function uid(prefix: string): string {
  counter += 1;
  return `${prefix}-${counter}`;
}

/** Polite announcement for screen readers (the #live region in taskpane.html). */
export function announce(text: string): void {
  const live = document.getElementById("live");
  if (!live) return;
  live.textContent = "";
  // A separate task so that repeating the same text is announced again.
  setTimeout(() => {
    live.textContent = text;
  }, 30);
}
