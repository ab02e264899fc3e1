/**
 * The pane's state and every action a user can take, with no DOM: load the stored layers, save an
 * entry (validated first; nothing stored when invalid), delete, duplicate, import (preview, then
 * apply on confirmation), export, report and reset unreadable stored layers, and the try-it
 * calculation. The views call these and re-render on `subscribe`.
 *
 * Order of a save: build the layer's next file → validate it with the library's validator →
 * store it → put it in effect (setLayer). If storing fails, nothing is put in effect; if the file is
 * invalid, nothing is stored.
 */
import {
  exportLibraryText,
  loadLayer,
  makeBlob,
  flattenLibrary,
  getActiveLibrary,
  getLayerProblems,
  LIBRARY_FORMAT,
  MAX_LIBRARY_BYTES,
  mergeLibraryDocs,
  parseLibraryText,
  SCHEMA_VERSION,
  setLayer,
  validateLibraryDoc,
} from "../library";
import type { EntryKind, Library, LibraryDoc, SourceRecord, SubstanceRecord, SystemRecord, UserLayer, ValidationIssue } from "../library";
import type { HostInfo } from "./host";
import { describeImport, type ImportChange, type ImportMode } from "./import-preview";
import { duplicateDraft, editDraft, type EditDraft, type EditKind } from "./drafts";
import { buildSource, buildSubstance, buildSystem, makeId } from "./forms";
import type { Built, FieldIssue, SourceInput, SubstanceInput, SystemInput } from "./forms";
import type { PaneStores } from "./storage";
import { tryMixture, type TryResult, type TryRow } from "./tryit";

/** A stored layer that could not be read: kept as it was until the user resets it. */
export interface StoredProblem {
  layer: UserLayer;
  code: "corrupt" | "newer-version" | "unavailable" | "read-failed";
  message: string;
  /** The stored text exactly as found (null when even reading failed). */
  raw: string | null;
}

export type ActionResult =
  | { ok: true; message: string; warnings: string[]; notes: string[]; id?: string }
  | { ok: false; message: string; issues: FieldIssue[]; other: string[] };

export interface ImportPreview {
  layer: UserLayer;
  mode: ImportMode;
  fileName: string;
  changes: ImportChange[];
  next: LibraryDoc;
}

export type { EditDraft, EditKind } from "./drafts";

type Listener = () => void;

const LAYER_DOC_NAME: Record<UserLayer, string> = { workbook: "Workbook library", personal: "Personal library" };

function emptyDoc(layer: UserLayer): LibraryDoc {
  return { format: LIBRARY_FORMAT, schemaVersion: SCHEMA_VERSION, name: LAYER_DOC_NAME[layer] };
}

function isEmpty(doc: LibraryDoc): boolean {
  return !Object.keys(doc.sources ?? {}).length && !Object.keys(doc.atomicWeights ?? {}).length && !doc.systems?.length && !doc.ions?.length && !doc.substances?.length;
}

function clone<T>(v: T): T {
  return JSON.parse(JSON.stringify(v)) as T;
}

/** Drop empty sections so the stored file stays small and valid. */
function tidy(doc: LibraryDoc): LibraryDoc {
  const out = clone(doc);
  for (const k of ["systems", "ions", "substances"] as const) if (out[k] && out[k]!.length === 0) delete out[k];
  for (const k of ["sources", "atomicWeights"] as const) if (out[k] && Object.keys(out[k]!).length === 0) delete out[k];
  return out;
}

const SECTION: Record<"system" | "ion" | "substance", "systems" | "ions" | "substances"> = { system: "systems", ion: "ions", substance: "substances" };

export class PaneController {
  library: Library;
  readonly problems = new Map<UserLayer, StoredProblem>();
  pendingImport: ImportPreview | null = null;
  /** Problems met while starting (a failed recalculation), for the status line. */
  readonly startupWarnings: string[] = [];
  private readonly listeners = new Set<Listener>();
  private queue: Promise<unknown> = Promise.resolve();

  constructor(
    readonly host: HostInfo,
    readonly stores: PaneStores,
    /** False when browser storage is unavailable and layers live in memory only. */
    readonly persistent = true,
  ) {
    this.library = getActiveLibrary();
  }

  subscribe(listener: Listener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private changed(): void {
    this.library = getActiveLibrary();
    for (const l of [...this.listeners]) l();
  }

  /** One action at a time (a double click must not interleave two saves). */
  private serial<T>(task: () => Promise<T>): Promise<T> {
    const run = this.queue.then(task, task);
    this.queue = run.catch(() => undefined);
    return run;
  }

  /** Load both stored layers; a layer that cannot be read is reported, kept untouched, and left out. */
  init(): Promise<void> {
    return this.serial(async () => {
      for (const layer of ["workbook", "personal"] as const) {
        const where = this.stores[layer].where;
        const r = await loadLayer(layer, this.stores[layer].storage);
        if (r.ok) {
          // Cells may have been calculated before this layer was in effect (Excel: recalculate).
          const after = r.blob && this.stores[layer].afterChange ? await this.stores[layer].afterChange!() : null;
          if (after) this.startupWarnings.push(after);
          continue;
        }
        const lead = {
          corrupt: "is damaged or not a Protolyte library",
          "newer-version": "was saved by a newer version of Protolyte",
          unavailable: "cannot be reached",
          "read-failed": "could not be read",
        }[r.code];
        this.problems.set(layer, { layer, code: r.code, message: `The stored ${layer} library (${where}) ${lead}: ${r.message}. It is not in use; the layers below it apply.`, raw: r.raw });
      }
      this.changed();
    });
  }

  /**
   * The layers a user layer's references may point into. The workbook layer travels with the file
   * and must stand on the built-in layer alone; the personal layer may use the workbook's entries.
   */
  contextFor(layer: UserLayer): LibraryDoc[] {
    const lib = getActiveLibrary();
    return layer === "workbook" ? [lib.layers.builtin] : [lib.layers.builtin, ...(lib.layers.workbook ? [lib.layers.workbook] : [])];
  }

  layerDoc(layer: UserLayer): LibraryDoc {
    return clone(this.library.layers[layer] ?? emptyDoc(layer));
  }

  /** Why a layer cannot be written now, or null. */
  blocked(layer: UserLayer): string | null {
    const p = this.problems.get(layer);
    return p ? `The stored ${layer} library could not be read. Export its stored text, then reset it, before saving into it (nothing was changed).` : null;
  }

  /** Validate, store and apply a layer's next file. `entryPath` maps validator paths back to the edited entry's fields. */
  private async commit(layer: UserLayer, next: LibraryDoc, entryPath: string | null, done: string, notes: string[] = []): Promise<ActionResult> {
    const blocked = this.blocked(layer);
    if (blocked) return { ok: false, message: blocked, issues: [], other: [] };
    const doc = tidy(next);
    const v = validateLibraryDoc(doc, this.contextFor(layer));
    if (!v.ok) return this.invalid(v.errors, entryPath, layer);
    const before = new Set(this.library.problems.map((p) => `${p.layer}:${p.path}:${p.message}`));
    const store = this.stores[layer];
    const storageWarnings: string[] = [];
    if (isEmpty(doc)) {
      try {
        await store.storage.clear();
      } catch (e) {
        return { ok: false, message: `Nothing was changed: ${e instanceof Error ? e.message : String(e)}`, issues: [], other: [] };
      }
    } else {
      const saved = await store.storage.save(makeBlob(doc));
      if (!saved.ok) return { ok: false, message: `Nothing was changed: ${saved.message}`, issues: [], other: [] };
      storageWarnings.push(...saved.warnings);
    }
    const applied = setLayer(layer, isEmpty(doc) ? null : doc);
    if (!applied.ok) return this.invalid(applied.errors, entryPath, layer);
    this.changed();
    const warnings = [
      ...storageWarnings,
      ...this.library.problems.filter((p) => !before.has(`${p.layer}:${p.path}:${p.message}`)).map((p) => `${p.layer} library, ${p.path}: ${p.message}`),
    ];
    const after = store.afterChange ? await store.afterChange() : null;
    if (after) warnings.push(after);
    return { ok: true, message: done, warnings, notes };
  }

  private invalid(errors: ValidationIssue[], entryPath: string | null, layer: UserLayer): ActionResult {
    const issues: FieldIssue[] = [];
    const other: string[] = [];
    for (const e of errors) {
      if (entryPath !== null && (e.path === entryPath || e.path.startsWith(`${entryPath}.`) || e.path.startsWith(`${entryPath}[`))) {
        issues.push({ path: e.path.slice(entryPath.length).replace(/^\./, ""), message: e.message });
      } else other.push(`${LAYER_DOC_NAME[layer]}, ${e.path || "(file)"}: ${e.message}`);
    }
    const n = errors.length;
    return { ok: false, message: `Not saved: ${n} problem${n === 1 ? "" : "s"} to fix.`, issues, other };
  }

  /** Is this id used by an entry of this kind anywhere in effect? */
  private taken(kind: EntryKind, id: string): boolean {
    return this.library.get(id, kind) !== undefined;
  }

  private saveRecord(kind: "system" | "substance", layer: UserLayer, built: Built<SystemRecord | SubstanceRecord>, originalId: string | null, name: string): Promise<ActionResult> {
    return this.serial(async () => {
      if (!built.ok) return { ok: false, message: `Not saved: ${built.issues.length} problem${built.issues.length === 1 ? "" : "s"} to fix.`, issues: built.issues, other: [] };
      const record = built.record;
      if (!record.id) record.id = makeId(name, (id) => this.taken(kind, id));
      const doc = this.layerDoc(layer);
      const list = ((doc[SECTION[kind]] as { id: string }[] | undefined) ?? []).slice();
      const at = list.findIndex((r) => r.id === (originalId ?? record.id));
      const index = at >= 0 ? at : list.length;
      list[index] = record;
      (doc as unknown as Record<string, unknown>)[SECTION[kind]] = list;
      const r = await this.commit(layer, doc, `${SECTION[kind]}[${index}]`, `Saved '${record.name}' in the ${layer} library.`, built.notes);
      return r.ok ? { ...r, id: record.id } : r;
    });
  }

  saveSystem(layer: UserLayer, input: SystemInput, originalId: string | null = null): Promise<ActionResult> {
    return this.saveRecord("system", layer, buildSystem(input), originalId, input.name);
  }

  saveSubstance(layer: UserLayer, input: SubstanceInput, originalId: string | null = null): Promise<ActionResult> {
    return this.saveRecord("substance", layer, buildSubstance(input), originalId, input.name);
  }

  saveSource(layer: UserLayer, input: SourceInput, originalId: string | null = null): Promise<ActionResult> {
    return this.serial(async () => {
      const built = buildSource(input);
      if (!built.ok) return { ok: false, message: `Not saved: ${built.issues.length} problem(s) to fix.`, issues: built.issues, other: [] };
      const id = originalId ?? (input.id.trim() || makeId(input.title, (k) => this.taken("source", k)));
      const doc = this.layerDoc(layer);
      doc.sources = { ...(doc.sources ?? {}), [id]: built.record as SourceRecord };
      const path = /^[a-z0-9][a-z0-9._-]*$/.test(id) ? `sources.${id}` : `sources[${JSON.stringify(id)}]`;
      const r = await this.commit(layer, doc, path, `Saved source '${built.record.title}' (${id}) in the ${layer} library.`);
      return r.ok ? { ...r, id } : r;
    });
  }

  /** Remove an entry from a user layer; a built-in entry it overrode applies again. */
  deleteEntry(layer: UserLayer, kind: EntryKind, id: string): Promise<ActionResult> {
    return this.serial(async () => {
      const doc = this.layerDoc(layer);
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
      const r = await this.commit(layer, doc, null, `Deleted '${name}' from the ${layer} library.${after}`);
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
    if (!parsed.ok) return fail(`'${fileName}' was not imported (nothing changed): ${parsed.message}`, parsed.errors.map((e) => `${e.path || "(file)"}: ${e.message}`));
    const next = mode === "merge" ? mergeLibraryDocs(this.library.layers[layer], parsed.library) : clone(parsed.library);
    if (mode === "merge") next.name = this.library.layers[layer]?.name ?? LAYER_DOC_NAME[layer];
    const v = validateLibraryDoc(tidy(next), this.contextFor(layer));
    if (!v.ok) return fail(`'${fileName}' was not imported (nothing changed): combined with the ${layer} library it ${v.message}`, v.errors.map((e) => `${e.path || "(file)"}: ${e.message}`));
    this.pendingImport = { layer, mode, fileName, changes: describeImport(this.library, layer, parsed.library, mode), next };
    this.changed();
    return { ok: true, preview: this.pendingImport };
  }

  async confirmImport(): Promise<ActionResult> {
    const p = this.pendingImport;
    if (!p) return { ok: false, message: "There is no import waiting for confirmation.", issues: [], other: [] };
    const r = await this.serial(() => this.commit(p.layer, p.next, null, `Imported '${p.fileName}' into the ${p.layer} library (${p.changes.length} change${p.changes.length === 1 ? "" : "s"}).`));
    this.pendingImport = null;
    this.changed();
    return r.ok ? r : { ...r, message: `Import not applied (nothing changed): ${r.message} ${r.other.join(" ")}`.trim() };
  }

  cancelImport(): void {
    this.pendingImport = null;
    this.changed();
  }

  /** A library file of one user layer, or of everything in effect. Null for an empty layer. */
  exportFile(which: UserLayer | "effective"): { fileName: string; text: string } | null {
    if (which === "effective") return { fileName: "protolyte-constants-in-effect.json", text: exportLibraryText(flattenLibrary(this.library)) };
    const doc = this.library.layers[which];
    if (!doc) return null;
    return { fileName: `protolyte-${which}-library.json`, text: exportLibraryText(doc) };
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
