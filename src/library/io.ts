/**
 * Import and export of library files (our own public format, see README.md).
 *
 * Import is all-or-nothing: the text is size-checked, parsed, checked for unsafe keys, validated
 * against the schema and the semantic rules (references may point into the layers below), and only
 * then applied. Names are stored exactly as written; nothing here interprets HTML, and the task pane
 * shows names as text. Export writes a file that imports back to the same fingerprint.
 */
import { getActiveLibrary, referenceContext, setLayer, type UserLayer } from "./active";
import type { Library } from "./layers";
import type { LibraryDoc, SubstanceRecord, ValidationIssue } from "./types";
import { LIBRARY_FORMAT, SCHEMA_VERSION } from "./types";
import { duplicateKey } from "./json-keys";
import { validateLibraryDoc, type ValidationCode } from "./validate";

export const MAX_LIBRARY_BYTES = 5 * 1024 * 1024;

export type ImportCode = "too-large" | "not-json" | ValidationCode;

export type ParseResult =
  | { ok: true; library: LibraryDoc }
  | { ok: false; code: ImportCode; message: string; errors: ValidationIssue[]; lines: string[] };

export type ImportResult = { ok: true; library: Library } | { ok: false; code: ImportCode; message: string; errors: ValidationIssue[]; lines: string[] };

/** UTF-8 byte length without allocating for the common case. */
export function utf8Length(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) n += 1;
    else if (c < 0x800) n += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      n += 4;
      i++;
    } else n += 3;
  }
  return n;
}

const mb = (bytes: number): string => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;

/** Parse and validate a library file's text. `context`: the layers it will sit on. */
export function parseLibraryText(text: string, context: readonly LibraryDoc[] = []): ParseResult {
  if (typeof text !== "string") return { ok: false, code: "not-json", message: "a library file is text", errors: [], lines: ["a library file is text"] };
  const bytes = text.length > MAX_LIBRARY_BYTES ? text.length : utf8Length(text);
  if (bytes > MAX_LIBRARY_BYTES) {
    const message = `the file is ${mb(bytes)}; library files are limited to ${mb(MAX_LIBRARY_BYTES)}`;
    return { ok: false, code: "too-large", message, errors: [{ path: "", message }], lines: [message] };
  }
  let value: unknown;
  try {
    value = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (e) {
    const message = `not valid JSON: ${(e as Error).message}`;
    return { ok: false, code: "not-json", message, errors: [{ path: "", message }], lines: [message] };
  }
  const twice = duplicateKey(text);
  if (twice) {
    const message = `the key '${twice.key}' is written twice in one object (line ${twice.line}); a library file names each field once, so that no value is read in place of another`;
    return { ok: false, code: "not-json", message, errors: [{ path: "", message }], lines: [message] };
  }
  const v = validateLibraryDoc(value, context);
  return v.ok ? { ok: true, library: v.doc } : v;
}

const ORDER = ["format", "schemaVersion", "name", "version", "description", "exported", "pin", "sources", "atomicWeights", "systems", "ions", "substances", "changes"] as const;

/** The text of a library file: fixed section order, two-space indentation, final newline. */
export function exportLibraryText(doc: LibraryDoc): string {
  const ordered: Record<string, unknown> = {};
  for (const k of ORDER) if (doc[k] !== undefined) ordered[k] = doc[k];
  return `${JSON.stringify(ordered, null, 2)}\n`;
}

/** `incoming` entries added to `base`, replacing entries with the same id; `base` keeps its pin and change record. */
export function mergeLibraryDocs(base: LibraryDoc | null, incoming: LibraryDoc): LibraryDoc {
  if (!base) return incoming;
  const byId = <T extends { id: string }>(a: T[] = [], b: T[] = []): T[] | undefined => {
    const ids = new Set(b.map((x) => x.id));
    const out = [...a.filter((x) => !ids.has(x.id)), ...b];
    return out.length ? out : undefined;
  };
  const keyed = <T>(a?: Record<string, T>, b?: Record<string, T>): Record<string, T> | undefined =>
    a || b ? Object.assign(Object.create(null) as Record<string, T>, a, b) : undefined;
  const merged: LibraryDoc = {
    format: LIBRARY_FORMAT,
    schemaVersion: SCHEMA_VERSION,
    name: base.name,
    version: base.version,
    description: base.description,
    sources: keyed(base.sources, incoming.sources),
    atomicWeights: keyed(base.atomicWeights, incoming.atomicWeights),
    systems: byId(base.systems, incoming.systems),
    ions: byId(base.ions, incoming.ions),
    substances: byId(base.substances, incoming.substances),
    pin: base.pin ?? incoming.pin,
    changes: base.changes,
  };
  return JSON.parse(JSON.stringify(merged)) as LibraryDoc;
}

/**
 * Import a file into a user layer of the active library: "replace" the layer, or "merge" into it
 * (same ids replaced). On any error nothing changes and the errors are returned.
 */
export function importIntoLayer(layer: UserLayer, text: string, mode: "replace" | "merge" = "replace"): ImportResult {
  const lib = getActiveLibrary();
  const parsed = parseLibraryText(text, referenceContext(layer));
  if (!parsed.ok) return parsed;
  const doc = mode === "merge" ? mergeLibraryDocs(lib.layers[layer], parsed.library) : parsed.library;
  return setLayer(layer, doc);
}

/**
 * Everything in effect as one library file (for an archive or a colleague): the entry of the
 * highest layer for each id. Names hidden by a higher layer are left out of the lower entry, and
 * unusable entries are omitted, so the file is valid on its own.
 */
export function flattenLibrary(library: Library, name = "Protolyte constants in effect"): LibraryDoc {
  const owner = (s: SubstanceRecord, text: string): boolean => {
    const r = library.resolve(text);
    return r.ok && r.component.id === s.id;
  };
  const substances = library
    .list("substance")
    .map((e) => e.record as SubstanceRecord)
    .filter((s) => owner(s, s.id))
    .map((s) => {
      const copy: SubstanceRecord = JSON.parse(JSON.stringify(s));
      if (copy.aliases) copy.aliases = copy.aliases.filter((a) => owner(s, a));
      if (copy.formula !== undefined && copy.formulaAlias !== false && !owner(s, copy.formula)) copy.formulaAlias = false;
      return copy;
    });
  const entries = <T>(kind: "source" | "atomicWeight"): Record<string, T> =>
    Object.fromEntries(library.list(kind).map((e) => [e.id, e.record as T]));
  return JSON.parse(
    JSON.stringify({
      format: LIBRARY_FORMAT,
      schemaVersion: SCHEMA_VERSION,
      name,
      version: library.version,
      sources: entries("source"),
      atomicWeights: entries("atomicWeight"),
      systems: library.list("system").map((e) => e.record),
      ions: library.list("ion").map((e) => e.record),
      substances,
    }),
  ) as LibraryDoc;
}
