/**
 * Validation of a library file at run time: unsafe keys, then the JSON Schema (interpreted by
 * schema-check.ts from the schema file itself), then the semantic checks. The result lists every
 * problem as {path, message}.
 */
import schemaJson from "../schema/library.schema.json";
import type { LibraryDoc, ValidationIssue } from "../types";
import { LIBRARY_FORMAT, SCHEMA_VERSION } from "../types";
import { checkAgainstSchema, type Schema } from "./schema-check";
import { checkSemantics } from "./semantics";
import { findUnsafeKeys } from "./unsafe-keys";
import { issueLines } from "./words";

export const LIBRARY_SCHEMA = schemaJson as unknown as Schema;

export type ValidationCode = "unsafe-key" | "wrong-format" | "newer-version" | "wrong-version" | "invalid";

export type ValidationResult =
  | { ok: true; doc: LibraryDoc }
  | { ok: false; code: ValidationCode; message: string; errors: ValidationIssue[]; lines: string[] };

/** The problems in words (naming entries, each line once); the message shows the first three. */
function failure(code: ValidationCode, lead: string, errors: ValidationIssue[], doc: unknown): ValidationResult {
  const lines = issueLines(doc, errors);
  const more = lines.length > 3 ? ` (and ${lines.length - 3} more)` : "";
  return { ok: false, code, message: `${lead}: ${lines.slice(0, 3).join("; ")}${more}`, errors, lines };
}

/** Structural check only (the JSON Schema), for tests comparing with ajv. */
export function checkShape(value: unknown): ValidationIssue[] {
  return checkAgainstSchema(LIBRARY_SCHEMA, value);
}

/**
 * Validate an untrusted value as a library file. References (sources, systems, ions, elements) may
 * point into `context`, the layers it will sit on. With `ignoreReferences`, dangling references are
 * let through (stored layers: the merged library then reports them and marks those entries unusable,
 * rather than the whole layer being dropped).
 */
export function validateLibraryDoc(
  value: unknown,
  context: readonly LibraryDoc[] = [],
  options: { ignoreReferences?: boolean } = {},
): ValidationResult {
  const unsafe = findUnsafeKeys(value);
  if (unsafe.length) return failure("unsafe-key", "refused", unsafe, value);
  const top = typeof value === "object" && value !== null && !Array.isArray(value) ? (value as Record<string, unknown>) : null;
  if (!top || top.format !== LIBRARY_FORMAT) {
    return failure("wrong-format", "not a Protolyte library file", [{ path: "format", message: `must be '${LIBRARY_FORMAT}'` }], value);
  }
  const v = top.schemaVersion;
  if (typeof v === "number" && Number.isInteger(v) && v > SCHEMA_VERSION) {
    return failure("newer-version", "made by a newer Protolyte", [
      { path: "schemaVersion", message: `is ${v}; this version reads schemaVersion ${SCHEMA_VERSION}. Update Protolyte to open it.` },
    ], value);
  }
  if (v !== SCHEMA_VERSION) {
    return failure("wrong-version", "unsupported schema version", [{ path: "schemaVersion", message: `must be ${SCHEMA_VERSION}, found ${JSON.stringify(v)}` }], value);
  }
  const shape = checkShape(value);
  if (shape.length) return failure("invalid", "invalid library", shape, value);
  const doc = value as LibraryDoc;
  const semantic = checkSemantics(doc, context)
    .filter((i) => !(options.ignoreReferences && i.reference))
    .map(({ path, message }) => ({ path, message }));
  if (semantic.length) return failure("invalid", "invalid library", semantic, value);
  return { ok: true, doc };
}
