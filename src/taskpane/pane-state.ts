/**
 * The pane's state, with no DOM: the library in effect, the stored layers that could not be read,
 * the listeners, one action at a time, and the one way a user layer changes (`commit`). The actions
 * a user takes are in controller.ts, which builds on this.
 *
 * Order of a save: build the layer's next file → validate it with the library's validator →
 * store it → put it in effect (setLayer). If storing fails, nothing is put in effect; if the file is
 * invalid, nothing is stored.
 */
import { issueWords, once } from "../library";
import { getActiveLibrary, loadLayer, makeBlob, makeChange, referenceContext, setLayer, validateLibraryDoc, withChange } from "../library";
import type { ChangeInput, EntryKind, Library, LibraryDoc, UserLayer, ValidationIssue } from "../library";
import type { FieldIssue } from "./forms";
import type { HostInfo } from "./host";
import { clone, emptyDoc, isEmpty, LAYER_DOC_NAME, tidy } from "./layer-docs";
import type { PaneStores } from "./storage";

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

type Listener = () => void;

/** What a change to the workbook library records, besides who and when (see the library's change-record.ts). */
export type ChangeNote = Omit<ChangeInput, "who" | "reason">;

/** Where the name typed for the change record is remembered on this computer. */
export const USER_NAME_KEY = "protolyte.user-name";

function rememberedName(): string {
  try {
    return (globalThis as { localStorage?: Storage }).localStorage?.getItem(USER_NAME_KEY) ?? "";
  } catch {
    return "";
  }
}

export class PaneState {
  library: Library;
  readonly problems = new Map<UserLayer, StoredProblem>();
  /** Problems met while starting (a failed recalculation), for the status line. */
  readonly startupWarnings: string[] = [];
  /** The name written into the change record (typed once, remembered on this computer). */
  userName = rememberedName();
  /** The reason the user gave for the next change to the workbook library (used once, then cleared). */
  changeReason = "";
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

  protected changed(): void {
    this.library = getActiveLibrary();
    for (const l of [...this.listeners]) l();
  }

  /** One action at a time (a double click must not interleave two saves). */
  protected serial<T>(task: () => Promise<T>): Promise<T> {
    const run = this.queue.then(task, task);
    this.queue = run.catch(() => undefined);
    return run;
  }

  /** Load both stored layers; a layer that cannot be read is reported, kept untouched, and left out. */
  init(): Promise<void> {
    return this.serial(async () => {
      for (const layer of ["personal", "workbook"] as const) {
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

  /** The layers a user layer's references may point into (the library's rule: built-in only). */
  contextFor(layer: UserLayer): LibraryDoc[] {
    return referenceContext(layer);
  }

  layerDoc(layer: UserLayer): LibraryDoc {
    return clone(this.library.layers[layer] ?? emptyDoc(layer));
  }

  /** Why a layer cannot be written now, or null. */
  blocked(layer: UserLayer): string | null {
    const p = this.problems.get(layer);
    return p ? `The stored ${layer} library could not be read. Export its stored text, then reset it, before saving into it (nothing was changed).` : null;
  }

  /** Remember the name for the change record on this computer. */
  setUserName(name: string): void {
    this.userName = name.trim();
    try {
      (globalThis as { localStorage?: Storage }).localStorage?.setItem(USER_NAME_KEY, this.userName);
    } catch {
      // no browser storage: the name lasts for this session
    }
  }

  /**
   * Validate, store and apply a layer's next file. `entryPath` maps validator paths back to the
   * edited entry's fields. A change to the workbook library is added to its change record.
   */
  protected async commit(layer: UserLayer, next: LibraryDoc, entryPath: string | null, done: string, notes: string[] = [], change?: ChangeNote): Promise<ActionResult> {
    const blocked = this.blocked(layer);
    if (blocked) return { ok: false, message: blocked, issues: [], other: [] };
    const recorded = layer === "workbook" && change ? withChange(next, makeChange({ ...change, who: this.userName, reason: this.changeReason })) : next;
    const doc = tidy(recorded);
    const v = validateLibraryDoc(doc, this.contextFor(layer));
    if (!v.ok) return this.invalid(v.errors, entryPath, layer, doc);
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
    if (!applied.ok) return this.invalid(applied.errors, entryPath, layer, doc);
    this.changeReason = "";
    this.changed();
    const warnings = [
      ...storageWarnings,
      ...this.library.problems.filter((p) => !before.has(`${p.layer}:${p.path}:${p.message}`)).map((p) => issueWords(this.library.layers[p.layer], p, `${p.layer} library`)),
    ];
    const after = store.afterChange ? await store.afterChange() : null;
    if (after) warnings.push(after);
    return { ok: true, message: done, warnings, notes };
  }

  private invalid(errors: ValidationIssue[], entryPath: string | null, layer: UserLayer, doc: LibraryDoc): ActionResult {
    const issues: FieldIssue[] = [];
    const other: string[] = [];
    for (const e of errors) {
      if (entryPath !== null && (e.path === entryPath || e.path.startsWith(`${entryPath}.`) || e.path.startsWith(`${entryPath}[`))) {
        issues.push({ path: e.path.slice(entryPath.length).replace(/^\./, ""), message: e.message });
      } else other.push(issueWords(doc, e, LAYER_DOC_NAME[layer].toLowerCase()));
    }
    const n = issues.length + once(other).length;
    return { ok: false, message: `Not saved: ${n} problem${n === 1 ? "" : "s"} to fix.`, issues, other: once(other) };
  }

  /** Is this id used by an entry of this kind anywhere in effect? */
  protected taken(kind: EntryKind, id: string): boolean {
    return this.library.get(id, kind) !== undefined;
  }
}
