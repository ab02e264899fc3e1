/**
 * Merging layers: for each kind of entry, the entry of the highest layer with a given id is the one
 * in effect, and it records which lower layers it overrides.
 */
import type { EntryKind, IonRecord, LayerName, LibraryDoc, SourceRecord, SubstanceRecord, SystemRecord, ValueRecord } from "./types";
import { LAYER_ORDER } from "./types";

export interface MergedEntry<T = unknown> {
  kind: EntryKind;
  id: string;
  /** The layer this entry comes from. */
  layer: LayerName;
  /** Lower layers that also define this id and are hidden by it, nearest first. */
  overrides: LayerName[];
  /** Position in its layer (array index, or key order for sources and atomic weights). */
  index: number;
  record: T;
}

export interface MergedView {
  sources: Map<string, MergedEntry<SourceRecord>>;
  atomicWeights: Map<string, MergedEntry<ValueRecord>>;
  systems: Map<string, MergedEntry<SystemRecord>>;
  ions: Map<string, MergedEntry<IonRecord>>;
  substances: Map<string, MergedEntry<SubstanceRecord>>;
}

function put<T>(map: Map<string, MergedEntry<T>>, kind: EntryKind, id: string, layer: LayerName, index: number, record: T): void {
  const below = map.get(id);
  map.set(id, { kind, id, layer, index, record, overrides: below ? [below.layer, ...below.overrides] : [] });
}

export function mergeLayers(layers: Partial<Record<LayerName, LibraryDoc | null>>): MergedView {
  const view: MergedView = { sources: new Map(), atomicWeights: new Map(), systems: new Map(), ions: new Map(), substances: new Map() };
  for (const layer of LAYER_ORDER) {
    const doc = layers[layer];
    if (!doc) continue;
    Object.entries(doc.sources ?? {}).forEach(([id, r], i) => put(view.sources, "source", id, layer, i, r));
    Object.entries(doc.atomicWeights ?? {}).forEach(([el, r], i) => put(view.atomicWeights, "atomicWeight", el, layer, i, r));
    (doc.systems ?? []).forEach((r, i) => put(view.systems, "system", r.id, layer, i, r));
    (doc.ions ?? []).forEach((r, i) => put(view.ions, "ion", r.id, layer, i, r));
    (doc.substances ?? []).forEach((r, i) => put(view.substances, "substance", r.id, layer, i, r));
  }
  return view;
}
