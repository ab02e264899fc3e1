/**
 * Keys that could pollute prototypes when data is merged or spread (`__proto__`, `constructor`,
 * `prototype`) are refused anywhere in a file, as are trees too deep or too large to be a library.
 */
import type { ValidationIssue } from "../types";
import { childPath } from "./paths";

export const UNSAFE_KEYS: ReadonlySet<string> = new Set(["__proto__", "constructor", "prototype"]);
const MAX_DEPTH = 32;
const MAX_NODES = 2_000_000;

/** Issues for every unsafe key (and for excessive depth), empty when the tree is clean. */
export function findUnsafeKeys(value: unknown): ValidationIssue[] {
  const out: ValidationIssue[] = [];
  let nodes = 0;
  const walk = (v: unknown, path: string, depth: number): void => {
    if (out.length >= 50) return;
    if (++nodes > MAX_NODES) {
      if (nodes === MAX_NODES + 1) out.push({ path, message: "too many values for a library file" });
      return;
    }
    if (typeof v !== "object" || v === null) return;
    if (depth > MAX_DEPTH) {
      out.push({ path, message: `nested deeper than ${MAX_DEPTH} levels` });
      return;
    }
    if (Array.isArray(v)) {
      v.forEach((item, i) => walk(item, childPath(path, i), depth + 1));
      return;
    }
    for (const key of Object.keys(v)) {
      if (UNSAFE_KEYS.has(key)) out.push({ path: childPath(path, key), message: `the key '${key}' is not allowed` });
      else walk((v as Record<string, unknown>)[key], childPath(path, key), depth + 1);
    }
  };
  walk(value, "", 0);
  return out;
}
