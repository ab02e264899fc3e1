/**
 * A user layer's library file as the controller handles it: its empty form, whether it holds
 * anything, the tidy copy that is stored, and where each kind of listed entry sits in it. Pure.
 */
import { LIBRARY_FORMAT, SCHEMA_VERSION } from "../library";
import type { LibraryDoc, UserLayer } from "../library";

export const LAYER_DOC_NAME: Record<UserLayer, string> = { workbook: "Workbook library", personal: "Personal library" };

export function emptyDoc(layer: UserLayer): LibraryDoc {
  return { format: LIBRARY_FORMAT, schemaVersion: SCHEMA_VERSION, name: LAYER_DOC_NAME[layer] };
}

export function isEmpty(doc: LibraryDoc): boolean {
  // A change record or a pin alone is content: deleting every entry must not erase the record of it.
  return !Object.keys(doc.sources ?? {}).length && !Object.keys(doc.atomicWeights ?? {}).length && !doc.systems?.length && !doc.ions?.length && !doc.substances?.length && !doc.changes?.length && !doc.pin;
}

/** A deep copy of plain JSON data (library records and layer files are JSON). */
export function clone<T>(v: T): T {
  return JSON.parse(JSON.stringify(v)) as T;
}

/** Drop empty sections so the stored file stays small and valid. */
export function tidy(doc: LibraryDoc): LibraryDoc {
  const out = clone(doc);
  for (const k of ["systems", "ions", "substances"] as const) if (out[k] && out[k]!.length === 0) delete out[k];
  for (const k of ["sources", "atomicWeights"] as const) if (out[k] && Object.keys(out[k]!).length === 0) delete out[k];
  return out;
}

/** The list that holds each kind of listed entry. */
export const SECTION: Record<"system" | "ion" | "substance", "systems" | "ions" | "substances"> = { system: "systems", ion: "ions", substance: "substances" };
