/** Small building blocks shared by the views: messages, labelled fields, downloads. All text is text. */
import { el, uid, type Child } from "../dom";
import type { ActionResult } from "../controller";
import { fieldWords, once } from "../../library";

export type Tone = "ok" | "error" | "warn";

export function message(tone: Tone, text: string, items: string[] = [], extra?: Child): HTMLElement {
  const box = el("div", { class: `msg ${tone}`, role: tone === "error" ? "alert" : null }, el("p", {}, text));
  if (items.length) box.appendChild(el("ul", {}, ...items.map((i) => el("li", {}, i))));
  if (extra) box.appendChild(typeof extra === "string" ? document.createTextNode(extra) : (extra as Node));
  return box;
}

/** The outcome of an action as a message box. */
export function resultMessage(r: ActionResult): HTMLElement {
  if (r.ok) {
    const items = [...r.notes, ...r.warnings];
    return message(r.warnings.length ? "warn" : "ok", r.message, items);
  }
  return message("error", r.message, once([...r.issues.map((i) => `${fieldWords(i.path)}: ${i.message}`), ...r.other]));
}

export interface FieldParts {
  wrap: HTMLElement;
  control: HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement;
}

/**
 * A labelled control with an optional hint and a slot for its error. `path` (the field's place in
 * the entry, "steps[0].pKa.value") lets the editor put validation messages next to it.
 */
export function field(label: string, control: HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement, opts: { path?: string; hint?: string } = {}): FieldParts {
  const id = control.id || uid("f");
  control.id = id;
  const describedBy: string[] = [];
  const wrap = el("div", { class: "field" }, el("label", { for: id }, label), control);
  if (opts.hint) {
    const hid = `${id}-hint`;
    wrap.appendChild(el("p", { class: "hint", id: hid }, opts.hint));
    describedBy.push(hid);
  }
  if (opts.path) {
    control.dataset.path = opts.path;
    const eid = `${id}-err`;
    wrap.appendChild(el("p", { class: "field-error", id: eid, hidden: true }));
    describedBy.push(eid);
  }
  if (describedBy.length) control.setAttribute("aria-describedby", describedBy.join(" "));
  return { wrap, control };
}

export function textInput(value: string, onInput: (v: string) => void, attrs: Record<string, string> = {}): HTMLInputElement {
  const input = el("input", { type: "text", autocomplete: "off", spellcheck: "false", ...attrs });
  input.value = value;
  input.addEventListener("input", () => onInput(input.value));
  return input;
}

export function textArea(value: string, onInput: (v: string) => void, rows = 2): HTMLTextAreaElement {
  const t = el("textarea", { rows, spellcheck: "false" });
  t.value = value;
  t.addEventListener("input", () => onInput(t.value));
  return t;
}

export function select<T extends string>(value: T, options: readonly (readonly [T, string])[], onChange: (v: T) => void): HTMLSelectElement {
  const s = el("select", {}, ...options.map(([v, text]) => el("option", { value: v }, text)));
  s.value = value;
  s.addEventListener("change", () => onChange(s.value as T));
  return s;
}

export function button(text: string, onClick: () => void, attrs: Record<string, string | boolean> = {}): HTMLButtonElement {
  const b = el("button", { type: "button", ...attrs }, text);
  b.addEventListener("click", onClick);
  return b;
}

/** Offer text as a file download (Blob + a temporary link). */
export function download(fileName: string, text: string, type = "application/json"): void {
  const blob = new Blob([text], { type: `${type};charset=utf-8` });
  const url = URL.createObjectURL(blob);
  const a = el("a", { href: url, download: fileName, hidden: true });
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10000);
}
