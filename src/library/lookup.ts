/**
 * The alias index of a merged library: normalized lookup key → substance id. Built once per
 * library (the cache); a key claimed by substances of different layers belongs to the higher layer,
 * and the hidden claim is reported.
 */
import { normalizeName } from "./normalize";
import type { SuggestKey } from "./suggest";
import type { LayerName, SubstanceRecord, ValidationIssue } from "./types";
import { LAYER_ORDER } from "./types";
import { lookupNames } from "./validate/semantics";

export interface IndexedSubstance {
  record: SubstanceRecord;
  layer: LayerName;
  /** Index of the record in its layer's substances array. */
  index: number;
}

export interface AliasIndex {
  /** key → substance id. */
  byKey: ReadonlyMap<string, string>;
  /** Every usable key with its display text, for suggestions. */
  keys: readonly SuggestKey[];
  /** substance id → its keys (sorted), for the fingerprint. */
  keysOf: ReadonlyMap<string, readonly string[]>;
  issues: (ValidationIssue & { layer: LayerName; severity: "error" | "warning" })[];
}

const rank = (l: LayerName): number => LAYER_ORDER.indexOf(l);

export function buildAliasIndex(substances: readonly IndexedSubstance[]): AliasIndex {
  const owner = new Map<string, { id: string; layer: LayerName; text: string }>();
  const issues: AliasIndex["issues"] = [];
  const ordered = [...substances].sort((a, b) => rank(a.layer) - rank(b.layer) || a.index - b.index);
  for (const s of ordered) {
    for (const n of lookupNames(s.record, `substances[${s.index}]`)) {
      if (n.key === "") continue;
      const prev = owner.get(n.key);
      if (prev && prev.id !== s.record.id) {
        if (rank(prev.layer) === rank(s.layer)) {
          issues.push({ layer: s.layer, severity: "error", path: n.path, message: `duplicate of '${prev.text}' used by ${prev.id}; the name keeps meaning ${prev.id}` });
          continue;
        }
        issues.push({
          layer: s.layer,
          severity: "warning",
          path: n.path,
          message: `'${n.text}' now means ${s.record.id} (${s.layer}), hiding ${prev.id} (${prev.layer})`,
        });
      }
      owner.set(n.key, { id: s.record.id, layer: s.layer, text: n.text });
    }
  }
  const byKey = new Map<string, string>();
  const keysOf = new Map<string, string[]>();
  const names = new Map(substances.map((s) => [s.record.id, s.record.name]));
  const keys: SuggestKey[] = [];
  for (const [key, o] of owner) {
    byKey.set(key, o.id);
    keysOf.set(o.id, [...(keysOf.get(o.id) ?? []), key]);
    keys.push({ key, id: o.id, name: names.get(o.id) ?? o.id, alias: o.text });
  }
  for (const list of keysOf.values()) list.sort();
  return { byKey, keys, keysOf, issues };
}

export { normalizeName };
