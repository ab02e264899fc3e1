/**
 * Every action a user can take in the pane, with no DOM: save an entry (validated first; nothing
 * stored when invalid), delete, duplicate, import (preview, then apply on confirmation), export,
 * report and reset unreadable stored layers, and the try-it calculation. The views call these and
 * re-render on `subscribe`. The state, loading and the order of a save are in pane-state.ts.
 */
import {
  exportLibraryText,
  flattenLibrary,
  getLayerProblems,
  MAX_LIBRARY_BYTES,
  mergeLibraryDocs,
  nameClaims,
  parseLibraryText,
  takenBy,
  setLayer,
  validateLibraryDoc,
  describeStamp,
  exportFileName,
  recordOf,
  stampExport,
  withoutStamp,
} from "../library";
import type { EntryKind, EntryRef, LibraryDoc, SourceRecord, SubstanceRecord, SystemRecord, UserLayer } from "../library";
import { describeImport, type ImportChange, type ImportMode } from "./import-preview";
import { duplicateDraft, editDraft, type EditDraft, type EditKind } from "./drafts";
import { makeId } from "./entry-id";
import { buildSource, buildSubstance, buildSystem } from "./form-to-record";
import type { Built, FieldIssue, SourceInput, SubstanceInput, SystemInput } from "./forms";
import { entryName, KIND_LABEL, LAYER_LABEL } from "./describe";
import { clone, LAYER_DOC_NAME, SECTION, tidy } from "./layer-docs";
import type { ActionResult } from "./pane-state";
import { WorkbookActions } from "./workbook-actions";
import { tryMixture, type TryResult, type TryRow } from "./tryit";
import { entriesDoc, type WorkbookNames } from "./workbook-uses";

export type { ActionResult, StoredProblem } from "./pane-state";
export type { EditDraft, EditKind } from "./drafts";

/** A checked import waiting for the user's confirmation: what it changes and the layer's next file. */
export interface ImportPreview {
  layer: UserLayer;
  mode: ImportMode;
  fileName: string;
  /** The file's export stamp in words (fingerprint, date, software), or that it has none. */
  stamp: string;
  changes: ImportChange[];
  next: LibraryDoc;
}

function notSaved(issues: FieldIssue[]): ActionResult {
  return { ok: false, message: `Not saved: ${issues.length} problem${issues.length === 1 ? "" : "s"} to fix.`, issues, other: [] };
}

export class PaneController extends WorkbookActions {
  /** Inside Excel: reads the names the workbook's AQ formulas use (set by the entry point); null in a browser page. */
  workbookNames: (() => Promise<WorkbookNames>) | null = null;

  pendingImport: ImportPreview | null = null;

  private saveRecord(kind: "system" | "substance", layer: UserLayer, built: Built<SystemRecord | SubstanceRecord>, originalId: string | null, name: string, takeOverNames = false): Promise<ActionResult> {
    return this.serial(async () => {
      if (!built.ok) return notSaved(built.issues);
      const record = built.record;
      if (!record.id) record.id = makeId(name, (id) => this.taken(kind, id));
      const refused = [...(originalId === null ? this.idRefusal(kind, record.id) : []), ...(kind === "substance" && !takeOverNames ? this.nameRefusals(record as SubstanceRecord) : [])];
      if (refused.length) return notSaved(refused);
      const doc = this.layerDoc(layer);
      const list = ((doc[SECTION[kind]] as { id: string }[] | undefined) ?? []).slice();
      const at = list.findIndex((r) => r.id === (originalId ?? record.id));
      const index = at >= 0 ? at : list.length;
      const before = at >= 0 ? list[at] : this.library.get(record.id, kind)?.record;
      list[index] = record;
      (doc as unknown as Record<string, unknown>)[SECTION[kind]] = list;
      const over = at < 0 && before ? `overrides the ${LAYER_LABEL[this.library.get(record.id, kind)!.layer]} entry` : undefined;
      const change = { action: at >= 0 ? "edit" : "add", entry: { kind, id: record.id }, name: record.name, summary: over, before, after: record } as const;
      const r = await this.commit(layer, doc, `${SECTION[kind]}[${index}]`, `Saved '${record.name}' in the ${layer} library.`, built.notes, change);
      return r.ok ? { ...r, id: record.id } : r;
    });
  }

  /** A new entry never takes a taken id: refused at the field, with a free one suggested. */
  private idRefusal(kind: EntryKind, id: string): FieldIssue[] {
    const owner = takenBy(this.library, kind, id);
    if (!owner) return [];
    const free = makeId(id, (x) => this.taken(kind, x));
    const how = owner.layer === "builtin" ? "; to override the built-in entry, use 'Override in the workbook' on it in Browse" : "; to change it, edit that entry in Browse";
    return [{ path: "id", message: `the id '${id}' is taken by the ${LAYER_LABEL[owner.layer]} ${KIND_LABEL[kind]} '${entryName(owner)}'. Use a free id such as '${free}'${how}.` }];
  }

  /** Names a substance would take from another substance in effect, unless the user confirmed it. */
  private nameRefusals(record: SubstanceRecord): FieldIssue[] {
    return nameClaims(this.library, record).map((c) => ({
      path: c.path,
      message: `'${c.name}' already means the ${LAYER_LABEL[c.ownerLayer]} substance '${c.ownerName}' (${c.ownerId}); formulas using it would change to this entry. Remove the name, or tick 'Take over names used by other entries' to confirm.`,
    }));
  }

  saveSystem(layer: UserLayer, input: SystemInput, originalId: string | null = null): Promise<ActionResult> {
    return this.saveRecord("system", layer, buildSystem(input), originalId, input.name);
  }

  saveSubstance(layer: UserLayer, input: SubstanceInput, originalId: string | null = null): Promise<ActionResult> {
    return this.saveRecord("substance", layer, buildSubstance(input), originalId, input.name, input.takeOverNames === true);
  }

  saveSource(layer: UserLayer, input: SourceInput, originalId: string | null = null): Promise<ActionResult> {
    return this.serial(async () => {
      const built = buildSource(input);
      if (!built.ok) return notSaved(built.issues);
      const id = originalId ?? (input.id.trim() || makeId(input.title, (k) => this.taken("source", k)));
      if (originalId === null && this.idRefusal("source", id).length) return notSaved(this.idRefusal("source", id));
      const doc = this.layerDoc(layer);
      const before = doc.sources?.[id] ?? this.library.get(id, "source")?.record;
      const action = doc.sources?.[id] ? "edit" : "add";
      doc.sources = { ...(doc.sources ?? {}), [id]: built.record as SourceRecord };
      const path = /^[a-z0-9][a-z0-9._-]*$/.test(id) ? `sources.${id}` : `sources[${JSON.stringify(id)}]`;
      const change = { action, entry: { kind: "source", id }, name: built.record.title, before, after: built.record } as const;
      const r = await this.commit(layer, doc, path, `Saved source '${built.record.title}' (${id}) in the ${layer} library.`, [], change);
      return r.ok ? { ...r, id } : r;
    });
  }

  /** Remove an entry from a user layer; a built-in entry it overrode applies again. */
  deleteEntry(layer: UserLayer, kind: EntryKind, id: string): Promise<ActionResult> {
    return this.serial(async () => {
      const doc = this.layerDoc(layer);
      const before = this.library.layers[layer] ? recordOf(this.library.layers[layer]!, { kind, id }) : undefined;
      let name = id;
      if (kind === "source" || kind === "atomicWeight") {
        const section = kind === "source" ? "sources" : "atomicWeights";
        const map = { ...(doc[section] ?? {}) } as Record<string, unknown>;
        if (!(id in map)) return { ok: false, message: `There is no ${kind} '${id}' in the ${layer} library.`, issues: [], other: [] };
        delete map[id];
        (doc as unknown as Record<string, unknown>)[section] = map;
      } else {
        const list = (doc[SECTION[kind]] as { id: string; name: string }[] | undefined) ?? [];
        const found = list.find((r) => r.id === id);
        if (!found) return { ok: false, message: `There is no ${kind} '${id}' in the ${layer} library.`, issues: [], other: [] };
        name = found.name;
        (doc as unknown as Record<string, unknown>)[SECTION[kind]] = list.filter((r) => r.id !== id);
      }
      const below = this.library.get(id, kind)?.overrides ?? [];
      const after = below.length ? ` The ${below[0] === "builtin" ? "built-in" : below[0]} entry applies again.` : "";
      const change = { action: "delete", entry: { kind, id }, name, before } as const;
      const r = await this.commit(layer, doc, null, `Deleted '${name}' from the ${layer} library.${after}`, [], change);
      if (!r.ok) return { ...r, message: `Not deleted: other entries still use it. ${r.other.join(" ")}`.trim() };
      return r;
    });
  }

  /** A draft for editing an existing user entry (null for built-in entries: they are read-only). */
  editDraft(kind: EditKind, id: string): EditDraft | null {
    return editDraft(this.library, kind, id);
  }

  /** "Duplicate to edit": see drafts.ts. */
  duplicateDraft(kind: EditKind, id: string): EditDraft | null {
    return duplicateDraft(this.library, kind, id, (k, x) => this.taken(k, x));
  }

  // ---- import / export ----

  /** Read and check a chosen file; nothing changes until confirmImport. */
  async previewImport(layer: UserLayer, fileName: string, size: number, readText: () => Promise<string>, mode: ImportMode = "merge"): Promise<{ ok: true; preview: ImportPreview } | { ok: false; message: string; errors: string[] }> {
    this.pendingImport = null;
    const fail = (message: string, errors: string[] = []) => {
      this.changed();
      return { ok: false as const, message, errors };
    };
    if (size > MAX_LIBRARY_BYTES) {
      return fail(`'${fileName}' was not imported: it is ${(size / 1048576).toFixed(1)} MB; library files are limited to ${(MAX_LIBRARY_BYTES / 1048576).toFixed(1)} MB.`);
    }
    const blocked = this.blocked(layer);
    if (blocked) return fail(blocked);
    let text: string;
    try {
      text = await readText();
    } catch (e) {
      return fail(`'${fileName}' could not be read: ${e instanceof Error ? e.message : String(e)}`);
    }
    const parsed = parseLibraryText(text, this.contextFor(layer));
    // One problem is said in the message; several are counted there and listed once each below it.
    const refused = (lead: string, r: { message: string; lines: string[] }, one = r.message) =>
      r.lines.length > 1 ? fail(`${lead}: ${r.lines.length} problems, each named below.`, r.lines) : fail(`${lead}: ${one}`);
    if (!parsed.ok) return refused(`'${fileName}' was not imported (nothing changed)`, parsed);
    const next = withoutStamp(mode === "merge" ? mergeLibraryDocs(this.library.layers[layer], parsed.library) : clone(parsed.library));
    if (mode === "merge") next.name = this.library.layers[layer]?.name ?? LAYER_DOC_NAME[layer];
    const v = validateLibraryDoc(tidy(next), this.contextFor(layer));
    if (!v.ok) return refused(`'${fileName}' was not imported (nothing changed): combined with the ${layer} library it would be invalid`, v, v.lines[0]);
    this.pendingImport = { layer, mode, fileName, stamp: describeStamp(parsed.library.exported), changes: describeImport(this.library, layer, parsed.library, mode), next };
    this.changed();
    return { ok: true, preview: this.pendingImport };
  }

  async confirmImport(): Promise<ActionResult> {
    const p = this.pendingImport;
    if (!p) return { ok: false, message: "There is no import waiting for confirmation.", issues: [], other: [] };
    const counted = `${p.changes.length} change${p.changes.length === 1 ? "" : "s"}`;
    const change = { action: "import", name: p.fileName, summary: `${p.mode === "merge" ? "added to" : "replaced"} the workbook library: ${counted}. ${p.stamp} ${p.changes.map((c) => `${c.name} (${c.id}): ${c.text}`).join("; ")}` } as const;
    const r = await this.serial(() => this.commit(p.layer, p.next, null, `Imported '${p.fileName}' into the ${p.layer} library (${counted}).`, [], change));
    this.pendingImport = null;
    this.changed();
    return r.ok ? r : { ...r, message: `Import not applied (nothing changed): ${r.message} ${r.other.join(" ")}`.trim() };
  }

  cancelImport(): void {
    this.pendingImport = null;
    this.changed();
  }

  /** A library file of one user layer, or of everything in effect. Null for an empty layer. */
  exportFile(which: UserLayer | "effective", now: Date = new Date()): { fileName: string; text: string } | null {
    const doc = which === "effective" ? flattenLibrary(this.library) : this.library.layers[which];
    if (!doc) return null;
    const base = which === "effective" ? "protolyte-constants-in-effect" : `protolyte-${which}-library`;
    const stamped = stampExport(doc, this.library.fingerprint(), which === "effective" ? "constants in effect" : `${which} library`, now);
    return { fileName: exportFileName(base, stamped.exported!), text: exportLibraryText(stamped) };
  }

  /** A file of exactly the entries a workbook's formulas use (workbook-uses.ts), stamped like every export. */
  exportEntries(refs: readonly EntryRef[], now: Date = new Date()): { fileName: string; text: string } | null {
    if (refs.length === 0) return null;
    const stamped = stampExport(entriesDoc(this.library, refs), this.library.fingerprint(), "entries the workbook uses", now);
    return { fileName: exportFileName("protolyte-entries-the-workbook-uses", stamped.exported!), text: exportLibraryText(stamped) };
  }

  /** The unreadable stored text exactly as found, to keep before a reset. */
  exportRaw(layer: UserLayer): { fileName: string; text: string } | null {
    const p = this.problems.get(layer);
    if (!p || p.raw === null) return null;
    return { fileName: `protolyte-${layer}-library-as-stored.txt`, text: p.raw };
  }

  /** Discard an unreadable stored layer (only when the user says so). */
  resetLayer(layer: UserLayer): Promise<ActionResult> {
    return this.serial(async () => {
      const store = this.stores[layer];
      try {
        await store.storage.clear();
      } catch (e) {
        return { ok: false, message: `Not reset: ${e instanceof Error ? e.message : String(e)}`, issues: [], other: [] };
      }
      this.problems.delete(layer);
      setLayer(layer, null);
      this.changed();
      const after = store.afterChange ? await store.afterChange() : null;
      return { ok: true, message: `The stored ${layer} library was reset to empty.`, warnings: after ? [after] : [], notes: [] };
    });
  }

  /** Problems the library itself recorded (for tests and the banner). */
  libraryProblems(): ReturnType<typeof getLayerProblems> {
    return getLayerProblems();
  }

  tryIt(rows: readonly TryRow[], temperature: string): TryResult {
    return tryMixture(this.library, rows, temperature);
  }
}
