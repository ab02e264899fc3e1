/**
 * The entries a workbook's AQ formulas use: the names found in the formulas (excel-workbook-uses.ts
 * reads them inside Excel) → the substances they mean and everything their results depend on (the
 * library's dependenciesOf: systems, ions, sources, atomic weights), each with its layer and the
 * status of its values; and a library file of exactly those entries, for export. Pure.
 */
import { dependenciesOf, LIBRARY_FORMAT, putEntry, SCHEMA_VERSION, type EntryKind, type EntryRef, type LayerName, type Library, type LibraryDoc, type SystemRecord } from "../library";
import { readDecimal } from "../chem";
import { entryName, LAYER_LABEL, valuesOf } from "./describe";

/** What reading the workbook found: the names, the formulas read, and what could not be read. */
export interface WorkbookNames {
  names: string[];
  formulas: number;
  /** "Sheet1!C4: the names argument (Names) cannot be used: …". */
  unread: string[];
}

export interface UsedEntryRow {
  kind: EntryKind;
  id: string;
  name: string;
  layer: LayerName;
  /** "built-in", "workbook (overrides built-in)". */
  layerText: string;
  /** The statuses of its values: "published", "published, from memory, unverified", or "". */
  status: string;
}

export interface EntriesUsed {
  rows: UsedEntryRow[];
  refs: EntryRef[];
  /** Names (as written) the library does not know. */
  unknown: string[];
}

/**
 * The name a cell gives, and the same without a stock concentration ("HCl 1 M", "0.1 M NaOH",
 * "hydrochloric acid 37 %" also mean the reagent's entry).
 */
export function nameCandidates(text: string): string[] {
  const t = text.trim();
  let words = t.split(/\s+/);
  const unit = (w: string | undefined): boolean => w !== undefined && /^(m?M|mol\/L|%)$/i.test(w);
  const num = (w: string | undefined): boolean => w !== undefined && readDecimal(w) !== null;
  if (/^w\/[wv]$/i.test(words[words.length - 1] ?? "") && words[words.length - 2] === "%") words = words.slice(0, -1);
  if (words.length >= 3 && num(words[0]) && unit(words[1])) words = words.slice(2);
  else if (words.length >= 3 && num(words[words.length - 2]) && unit(words[words.length - 1])) words = words.slice(0, -2);
  const bare = words.join(" ");
  return bare !== t && bare !== "" ? [t, bare] : [t];
}

export function entriesUsed(library: Library, names: readonly string[]): EntriesUsed {
  const refs: EntryRef[] = [];
  const seen = new Set<string>();
  const unknown: string[] = [];
  for (const name of names) {
    const owner = nameCandidates(name).map((n) => library.ownerOf(n)).find((o) => o !== undefined);
    // AQ.PKA may name a system ("phosphate"): the system and the sources its values cite
    const system = owner ? undefined : library.system(name);
    if (!owner && !system) {
      if (!unknown.includes(name)) unknown.push(name);
      continue;
    }
    const deps: EntryRef[] = owner ? dependenciesOf(library, owner.id) : [{ kind: "system", id: system!.id }, ...systemSources(library, system!.id)];
    for (const ref of deps) {
      const key = `${ref.kind}:${ref.id}`;
      if (seen.has(key)) continue;
      seen.add(key);
      refs.push(ref);
    }
  }
  const sources = (id: string) => library.get(id, "source")?.record as Parameters<typeof valuesOf>[1] extends (id: string) => infer R ? R : never;
  const rows = refs.map((ref): UsedEntryRow => {
    const e = library.get(ref.id, ref.kind)!;
    const statuses = [...new Set(valuesOf(e, sources).map((v) => v.statusText))];
    const over = e.overrides.length ? ` (overrides ${e.overrides.map((l) => LAYER_LABEL[l]).join(", ")})` : "";
    return { kind: ref.kind, id: ref.id, name: entryName(e), layer: e.layer, layerText: `${LAYER_LABEL[e.layer]}${over}`, status: statuses.join(", ") };
  });
  return { rows, refs, unknown };
}

function systemSources(library: Library, id: string): EntryRef[] {
  const r = library.get(id, "system")?.record as SystemRecord | undefined;
  const ids = (r?.steps ?? []).flatMap((st) => [st.pKa, st.dH, st.dCp]).flatMap((v) => (v?.source ? [v.source] : []));
  return [...new Set(ids)].filter((sid) => library.get(sid, "source")).map((sid) => ({ kind: "source" as const, id: sid }));
}

/** A library file holding exactly these entries as they are in effect. */
export function entriesDoc(library: Library, refs: readonly EntryRef[]): LibraryDoc {
  const doc: LibraryDoc = { format: LIBRARY_FORMAT, schemaVersion: SCHEMA_VERSION, name: "Entries the workbook's formulas use" };
  for (const ref of refs) {
    const e = library.get(ref.id, ref.kind);
    if (e) putEntry(doc, ref.kind, ref.id, JSON.parse(JSON.stringify(e.record)));
  }
  return doc;
}
