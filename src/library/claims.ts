/**
 * An entry is never replaced silently. Before a user layer takes a new entry, these say what it
 * would take from entries already in effect: its id (a new entry under a taken id is refused: an
 * override of another layer's entry is its own explicit action), and the lookup names a substance
 * would take from another substance (so that `AQ.PH("sodium acetate", 0.1)` cannot quietly move to
 * a different entry). The pane refuses both unless the user confirms the takeover.
 */
import type { Library, MergedEntry } from "./layers";
import type { EntryKind, LayerName, SubstanceRecord } from "./types";
import { lookupNames } from "./validate/semantics";

/** The entry in effect that already has this id, of this kind. */
export function takenBy(library: Library, kind: EntryKind, id: string): MergedEntry | undefined {
  return id === "" ? undefined : library.get(id, kind);
}

export interface NameClaim {
  /** The name as written in the new record. */
  name: string;
  /** Where in the record: "name", "formula", "aliases[1]". */
  path: string;
  ownerId: string;
  ownerName: string;
  ownerLayer: LayerName;
}

/** Lookup names of `record` that mean another substance in effect now. */
export function nameClaims(library: Library, record: SubstanceRecord): NameClaim[] {
  const claims: NameClaim[] = [];
  for (const n of lookupNames(record, "")) {
    const owner = library.ownerOf(n.text);
    if (!owner || owner.id === record.id) continue;
    claims.push({ name: n.text, path: n.path.replace(/^\./, ""), ownerId: owner.id, ownerName: owner.record.name, ownerLayer: owner.layer });
  }
  return claims;
}
