/**
 * Pinning: a workbook stores a snapshot of the constants its formulas use, so that a later
 * Protolyte whose built-in values were revised does not change a released sheet. The snapshot is
 * plain workbook-library entries (same ids, so they override the built-in and personal ones: the
 * workbook decides) plus a `pin` record listing them, the built-in version and the fingerprint.
 *
 * What a substance's result depends on, and so what is copied: the substance; its acid–base systems
 * and strong ions; the sources their values cite; and the atomic weights of its formula's elements
 * (its molar mass). Entries the workbook already holds are kept as they are (they are the workbook's
 * own values). `pinDrift` compares the pinned entries with the built-in library in effect now.
 */
import { diffRecords, type Diff } from "./change-record";
import { parseFormula } from "./formula";
import { createLibrary, type Library } from "./layers";
import type { EntryKind, EntryRef, IonRecord, LibraryDoc, PinRecord, SourceRecord, SubstanceRecord, SystemRecord, ValueRecord } from "./types";

export interface PinPlan {
  /** The workbook library with the snapshot added and its pin record set. */
  doc: LibraryDoc;
  /** Entries copied now (from the built-in or personal layer). */
  copied: EntryRef[];
  /** Names that did not resolve (nothing to pin for them). */
  unknown: string[];
}

const sourcesOf = (values: (ValueRecord | undefined)[]): string[] => values.flatMap((v) => (v?.source ? [v.source] : []));

/** The entries a substance's results depend on, itself first. */
export function dependenciesOf(library: Library, substanceId: string): EntryRef[] {
  const entry = library.get(substanceId, "substance");
  if (!entry) return [];
  const s = entry.record as SubstanceRecord;
  const refs: EntryRef[] = [{ kind: "substance", id: s.id }];
  const cited: string[] = sourcesOf([s.molarMass]);
  for (const share of s.systems ?? []) {
    refs.push({ kind: "system", id: share.system });
    const sys = library.get(share.system, "system")?.record as SystemRecord | undefined;
    for (const step of sys?.steps ?? []) cited.push(...sourcesOf([step.pKa, step.dH, step.dCp]));
    // complexes and solids name metal ions and cite their constants' sources
    for (const c of sys?.complexes ?? []) {
      if (c.metal) refs.push({ kind: "ion", id: c.metal });
      cited.push(...sourcesOf([c.logBeta, c.dH]));
    }
    for (const sol of sys?.solids ?? []) {
      refs.push({ kind: "ion", id: sol.metal });
      cited.push(...sourcesOf([sol.logKsp]));
    }
  }
  for (const share of s.ions ?? []) refs.push({ kind: "ion", id: share.ion });
  if (s.formula) {
    const parsed = parseFormula(s.formula);
    if (parsed.ok) {
      for (const el of [...parsed.counts.keys()].sort()) {
        refs.push({ kind: "atomicWeight", id: el });
        cited.push(...sourcesOf([library.get(el, "atomicWeight")?.record as ValueRecord | undefined]));
      }
    }
  }
  for (const id of cited) refs.push({ kind: "source", id });
  const seen = new Set<string>();
  return refs.filter((r) => {
    const k = `${r.kind}:${r.id}`;
    if (seen.has(k) || !library.get(r.id, r.kind)) return false;
    seen.add(k);
    return true;
  });
}

const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

/** Put one entry's record into a layer file under its id (replacing one of the same id). */
export function putEntry(doc: LibraryDoc, kind: EntryKind, id: string, record: unknown): void {
  if (kind === "source") doc.sources = { ...(doc.sources ?? {}), [id]: record as SourceRecord };
  else if (kind === "atomicWeight") doc.atomicWeights = { ...(doc.atomicWeights ?? {}), [id]: record as ValueRecord };
  else {
    const key = kind === "system" ? "systems" : kind === "ion" ? "ions" : "substances";
    const list = ((doc[key] ?? []) as { id: string }[]).filter((r) => r.id !== id);
    (doc as unknown as Record<string, unknown>)[key] = [...list, record as SystemRecord | IonRecord | SubstanceRecord];
  }
}

/**
 * Pin the constants the named substances use: copy what the workbook does not hold yet into its
 * library, and record the pin (the entries, the built-in version, the time). Pinning again adds to
 * the snapshot; `updatePin` refreshes it from the built-in library.
 */
export function pinNames(library: Library, names: readonly string[], now: Date = new Date()): PinPlan {
  const doc: LibraryDoc = clone(library.layers.workbook ?? { format: "protolyte-library", schemaVersion: 1, name: "Workbook library" });
  const unknown: string[] = [];
  const refs: EntryRef[] = [...(doc.pin?.entries ?? [])];
  const has = new Set(refs.map((r) => `${r.kind}:${r.id}`));
  const copied: EntryRef[] = [];
  for (const name of names) {
    const owner = library.ownerOf(name);
    if (!owner) {
      if (name.trim() !== "") unknown.push(name);
      continue;
    }
    for (const ref of dependenciesOf(library, owner.id)) {
      const k = `${ref.kind}:${ref.id}`;
      if (has.has(k)) continue;
      has.add(k);
      refs.push(ref);
      const e = library.get(ref.id, ref.kind)!;
      if (e.layer === "workbook") continue;
      putEntry(doc, ref.kind, ref.id, clone(e.record));
      copied.push(ref);
    }
  }
  const pin: PinRecord = { at: now.toISOString(), builtinVersion: library.version, entries: refs };
  doc.pin = pin;
  pin.fingerprint = createLibrary({ builtin: library.layers.builtin, personal: library.layers.personal, workbook: doc }).fingerprint();
  return { doc, copied, unknown };
}

export interface DriftItem extends EntryRef {
  name: string;
  /** Pinned (workbook) → built-in now, path by path. */
  diff: Diff;
}

/** Pinned entries whose built-in counterpart now differs (values, names, releases: any field). */
export function pinDrift(library: Library): DriftItem[] {
  const wb = library.layers.workbook;
  if (!wb?.pin) return [];
  const builtinDoc = library.layers.builtin;
  const out: DriftItem[] = [];
  for (const ref of wb.pin.entries) {
    const pinned = recordOf(wb, ref);
    const now = recordOf(builtinDoc, ref);
    if (pinned === undefined || now === undefined) continue;
    const diff = diffRecords(pinned, now);
    if (diff.length) out.push({ ...ref, name: (pinned as { name?: string; title?: string }).name ?? (pinned as { title?: string }).title ?? ref.id, diff });
  }
  return out;
}

/** A record of a layer file by kind and id. */
export function recordOf(doc: LibraryDoc, ref: EntryRef): unknown {
  if (ref.kind === "source") return doc.sources?.[ref.id];
  if (ref.kind === "atomicWeight") return doc.atomicWeights?.[ref.id];
  const list = (ref.kind === "system" ? doc.systems : ref.kind === "ion" ? doc.ions : doc.substances) as { id: string }[] | undefined;
  return list?.find((r) => r.id === ref.id);
}

/** The workbook library with every drifted pinned entry replaced by the built-in one now (a deliberate update). */
export function updatePin(library: Library, now: Date = new Date()): { doc: LibraryDoc; updated: DriftItem[] } | null {
  const wb = library.layers.workbook;
  if (!wb?.pin) return null;
  const doc = clone(wb);
  const updated = pinDrift(library);
  for (const d of updated) putEntry(doc, d.kind, d.id, clone(recordOf(library.layers.builtin, d)));
  doc.pin = { ...wb.pin, at: now.toISOString(), builtinVersion: library.version };
  return { doc, updated };
}
