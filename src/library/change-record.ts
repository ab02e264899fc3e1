/**
 * The change record of a workbook library: every add, edit, delete, import, copy and pin, with
 * when, who, what changed (old and new values, as JSON text, path by path) and the reason given.
 * It is kept in the workbook library itself, travels with it and goes out with its exports. It is a
 * record of changes, not a claim of compliance with any regulation: the user's name is what they
 * typed (or what the host reports), nothing here authenticates it.
 */
import type { ChangeAction, ChangeRecord, EntryRef, LibraryDoc } from "./types";

export type Diff = NonNullable<ChangeRecord["diff"]>;

const isPlain = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** Leaf-by-leaf differences between two JSON records ("steps[1].pKa.value": "4.761" → "4.8"). */
export function diffRecords(before: unknown, after: unknown, path = ""): Diff {
  if (JSON.stringify(before) === JSON.stringify(after)) return [];
  const both = (isPlain(before) && isPlain(after)) || (Array.isArray(before) && Array.isArray(after));
  if (!both) {
    const d: Diff[number] = { path: path || "(entry)" };
    if (before !== undefined) d.old = JSON.stringify(before);
    if (after !== undefined) d.new = JSON.stringify(after);
    return [d];
  }
  if (Array.isArray(before) && Array.isArray(after)) {
    const out: Diff = [];
    for (let i = 0; i < Math.max(before.length, after.length); i++) out.push(...diffRecords(before[i], after[i], `${path}[${i}]`));
    return out;
  }
  const a = before as Record<string, unknown>;
  const b = after as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
  return keys.flatMap((k) => diffRecords(a[k], b[k], path ? `${path}.${k}` : k));
}

export interface ChangeInput {
  action: ChangeAction;
  who: string;
  entry?: EntryRef;
  name?: string;
  summary?: string;
  before?: unknown;
  after?: unknown;
  reason?: string;
}

/** One change, stamped with `now`; texts are cut to the file format's limits. */
export function makeChange(input: ChangeInput, now: Date = new Date()): ChangeRecord {
  const cut = (t: string, n: number): string => (t.length > n ? `${t.slice(0, n - 1)}…` : t);
  const change: ChangeRecord = { at: now.toISOString(), who: cut(input.who.trim() || "unnamed user", 200), action: input.action };
  if (input.entry) change.entry = input.entry;
  if (input.name) change.name = cut(input.name, 200);
  if (input.summary) change.summary = cut(input.summary, 2000);
  if (input.before !== undefined || input.after !== undefined) {
    const diff = diffRecords(input.before, input.after).slice(0, 500).map((d) => ({ ...d, ...(d.old ? { old: cut(d.old, 2000) } : {}), ...(d.new ? { new: cut(d.new, 2000) } : {}) }));
    if (diff.length) change.diff = diff;
  }
  if (input.reason?.trim()) change.reason = cut(input.reason.trim(), 2000);
  return change;
}

/** `doc` with `change` appended to its change record (a copy; `doc` is not touched). */
export function withChange(doc: LibraryDoc, change: ChangeRecord): LibraryDoc {
  return { ...doc, changes: [...(doc.changes ?? []), change] };
}
