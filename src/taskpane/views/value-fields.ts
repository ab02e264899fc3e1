/** Field groups every entry form of the editor shares: the id, and a value with its provenance. */
import type { Library, SourceRecord, ValueStatus } from "../../library";
import { el } from "../dom";
import { STATUS_LABEL, type ValueInput } from "../forms";
import { citation } from "../describe";
import { field, select, textInput } from "./ui";

/** The id (or source key): locked while editing, made from the name when left empty. */
export function idField(input: { id: string }, locked: boolean, label = "Id"): HTMLElement {
  const attrs: Record<string, string> = { pattern: "[a-z0-9][a-z0-9._-]*", maxlength: "64" };
  if (locked) attrs.readonly = "";
  return field(label, textInput(input.id, (v) => (input.id = v), attrs), {
    path: "id",
    hint: locked ? "The id cannot change: sheets and other entries refer to it." : "Lower-case letters, digits, '.', '_' or '-'. Left empty, it is made from the name.",
  }).wrap;
}

/** The sources in effect to choose from, after "(no source)". */
export function sourceOptions(library: Library): [string, string][] {
  const list = library.list("source").map((e) => [e.id, `${e.id} — ${citation(e.record as SourceRecord, e.id).slice(0, 70)}`] as [string, string]);
  return [["", "(no source)"], ...list];
}

/** Value + conditions + status + source + locator + note. */
export function valueFields(library: Library, v: ValueInput, path: string, legend: string, extra?: HTMLElement): HTMLElement {
  const status = select<ValueStatus>(v.status, (Object.keys(STATUS_LABEL) as ValueStatus[]).map((s) => [s, STATUS_LABEL[s]] as const), (s) => (v.status = s));
  const source = select<string>(v.source, sourceOptions(library), (s) => (v.source = s));
  return el(
    "fieldset",
    { "data-path": path },
    el("legend", {}, legend),
    el("div", { class: "row" }, field("Value", textInput(v.value, (x) => (v.value = x), { inputmode: "decimal" }), { path: `${path}.value` }).wrap, field("Conditions", textInput(v.conditions, (x) => (v.conditions = x)), { path: `${path}.conditions` }).wrap),
    extra ?? null,
    el("div", { class: "row" }, field("Status", status, { path: `${path}.status` }).wrap, field("Source", source, { path: `${path}.source` }).wrap),
    el("div", { class: "row" }, field("Where in the source", textInput(v.locator, (x) => (v.locator = x), { placeholder: "Table 2" }), { path: `${path}.locator` }).wrap, field("Note", textInput(v.note, (x) => (v.note = x)), { path: `${path}.note` }).wrap),
    el("p", { class: "hint" }, "A published value names its source; a common-practice or unverified one says why in the note; a value entered by the user needs neither. A changed value loses the old citation unless you give a new source and locator."),
  );
}
