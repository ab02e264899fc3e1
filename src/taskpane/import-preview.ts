/**
 * What an imported library file would do to a layer, before anything is applied: entries added,
 * entries that override a lower layer, entries replaced in the same layer, entries a replace would
 * remove. Pure.
 */
import type { EntryKind, LayerName, Library, LibraryDoc, UserLayer } from "../library";
import { LAYER_ORDER } from "../library";
import { LAYER_LABEL, KIND_LABEL } from "./describe";

export type ImportMode = "merge" | "replace";

export type ChangeAction = "add" | "override" | "replace" | "hidden" | "remove";

export interface ImportChange {
  kind: EntryKind;
  id: string;
  name: string;
  action: ChangeAction;
  /** "adds", "overrides the built-in entry", … */
  text: string;
}

interface Item {
  kind: EntryKind;
  id: string;
  name: string;
}

export function itemsOf(doc: LibraryDoc | null): Item[] {
  if (!doc) return [];
  return [
    ...Object.entries(doc.sources ?? {}).map(([id, r]) => ({ kind: "source" as const, id, name: r.title })),
    ...Object.entries(doc.atomicWeights ?? {}).map(([id]) => ({ kind: "atomicWeight" as const, id, name: id })),
    ...(doc.systems ?? []).map((r) => ({ kind: "system" as const, id: r.id, name: r.name })),
    ...(doc.ions ?? []).map((r) => ({ kind: "ion" as const, id: r.id, name: r.name })),
    ...(doc.substances ?? []).map((r) => ({ kind: "substance" as const, id: r.id, name: r.name })),
  ];
}

const rank = (l: LayerName): number => LAYER_ORDER.indexOf(l);

/** Changes to `layer` if `incoming` is imported in `mode`, judged against the library in effect now. */
export function describeImport(library: Library, layer: UserLayer, incoming: LibraryDoc, mode: ImportMode): ImportChange[] {
  const changes: ImportChange[] = [];
  const key = (i: Item): string => `${i.kind}\u0000${i.id}`;
  const incomingKeys = new Set(itemsOf(incoming).map(key));
  for (const item of itemsOf(incoming)) {
    const current = library.get(item.id, item.kind);
    const what = KIND_LABEL[item.kind];
    let action: ChangeAction = "add";
    let text = `adds a new ${what}`;
    if (current) {
      // The entry of this layer (if any) sits below a higher one; find what this layer would hide.
      const lowers = current.layer === layer ? current.overrides : rank(current.layer) < rank(layer) ? [current.layer, ...current.overrides] : current.overrides.filter((l) => rank(l) < rank(layer));
      if (current.layer === layer || current.overrides.includes(layer)) {
        action = "replace";
        text = `replaces the ${LAYER_LABEL[layer]} ${what}`;
      } else if (lowers.length) {
        action = "override";
        text = `overrides the ${LAYER_LABEL[lowers[0]]} ${what}`;
      }
      if (rank(current.layer) > rank(layer)) {
        action = "hidden";
        text = `${text}, but your ${LAYER_LABEL[current.layer]} ${what} stays in effect`;
      }
    }
    changes.push({ kind: item.kind, id: item.id, name: item.name, action, text });
  }
  if (mode === "replace") {
    for (const item of itemsOf(library.layers[layer])) {
      if (incomingKeys.has(key(item))) continue;
      const below = library.get(item.id, item.kind)?.overrides.filter((l) => rank(l) < rank(layer)) ?? [];
      const text = `removes the ${LAYER_LABEL[layer]} ${KIND_LABEL[item.kind]}${below.length ? ` (the ${LAYER_LABEL[below[0]]} one applies again)` : ""}`;
      changes.push({ kind: item.kind, id: item.id, name: item.name, action: "remove", text });
    }
  }
  return changes;
}
