/**
 * Drafts for the editor: an existing user entry to edit, or a copy ("duplicate to edit"). A built-in
 * entry is copied under its own id into the workbook layer, so that saving overrides it there; a user
 * entry is copied under a new id and name in its own layer, without its lookup names.
 */
import type { EntryKind, Library, SourceRecord, SubstanceRecord, SystemRecord, UserLayer } from "../library";
import { makeId } from "./entry-id";
import { clone } from "./layer-docs";
import { sourceToInput, substanceToInput, systemToInput } from "./record-to-form";
import type { SourceInput, SubstanceInput, SystemInput } from "./forms";

export type EditKind = "system" | "substance" | "source";

export type EditDraft =
  | { kind: "system"; layer: UserLayer; originalId: string | null; input: SystemInput; overrides: boolean }
  | { kind: "substance"; layer: UserLayer; originalId: string | null; input: SubstanceInput; overrides: boolean }
  | { kind: "source"; layer: UserLayer; originalId: string | null; input: SourceInput; overrides: boolean };

/** A draft for editing an existing user entry. */
export function editDraft(library: Library, kind: EditKind, id: string): EditDraft | null {
  const entry = library.get(id, kind);
  if (!entry || entry.layer === "builtin") return null;
  const layer = entry.layer;
  const overrides = entry.overrides.length > 0;
  if (kind === "system") return { kind, layer, originalId: id, input: systemToInput(entry.record as SystemRecord), overrides };
  if (kind === "substance") return { kind, layer, originalId: id, input: substanceToInput(entry.record as SubstanceRecord), overrides };
  return { kind, layer, originalId: id, input: sourceToInput(id, entry.record as SourceRecord), overrides };
}

/**
 * "Duplicate to edit": a built-in entry is copied under its own id into the workbook layer (saving
 * overrides it there); a user entry is copied under a new id and name in its own layer.
 */
export function duplicateDraft(library: Library, kind: EditKind, id: string, taken: (kind: EntryKind, id: string) => boolean): EditDraft | null {
  const entry = library.get(id, kind);
  if (!entry) return null;
  if (entry.layer === "builtin") {
    const layer = "workbook" as const;
    if (kind === "system") return { kind, layer, originalId: id, input: systemToInput(entry.record as SystemRecord), overrides: true };
    if (kind === "substance") return { kind, layer, originalId: id, input: substanceToInput(entry.record as SubstanceRecord), overrides: true };
    return { kind, layer, originalId: id, input: sourceToInput(id, entry.record as SourceRecord), overrides: true };
  }
  const layer = entry.layer;
  if (kind === "system") {
    const r = clone(entry.record as SystemRecord);
    r.name = `${r.name} (copy)`;
    r.id = makeId(r.name, (x) => taken("system", x));
    return { kind, layer, originalId: null, input: systemToInput(r), overrides: false };
  }
  if (kind === "substance") {
    const r = clone(entry.record as SubstanceRecord);
    r.name = `${r.name} (copy)`;
    r.id = makeId(r.name, (x) => taken("substance", x));
    delete r.aliases;
    // The copy's formula must not claim the original's lookup name.
    if (r.formula) r.formulaAlias = false;
    const input = substanceToInput(r);
    return { kind, layer, originalId: null, input, overrides: false };
  }
  const src = clone(entry.record as SourceRecord);
  const newId = makeId(`${id}-copy`, (x) => taken("source", x));
  return { kind, layer, originalId: null, input: { ...sourceToInput(newId, src), id: newId }, overrides: false };
}
