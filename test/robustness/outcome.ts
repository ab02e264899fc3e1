/**
 * What a spreadsheet call may produce, and the check every robustness test applies to it: a finite
 * number, a string or boolean, a well-formed matrix of those, or a CustomFunctions.Error with code
 * #VALUE! or #N/A and a one-line message of 1–250 characters that is not an "internal error" (an
 * exception the code did not expect). Anything else is a defect.
 */
export type Outcome =
  | { kind: "value"; value: unknown }
  | { kind: "error"; code: string; message: string }
  | { kind: "escaped"; error: unknown };

/** Calls `fn(...args)`, classifying what comes out; never throws. */
export function outcomeOf(fn: (...a: any[]) => unknown, args: unknown[]): Outcome {
  try {
    return { kind: "value", value: fn(...args) };
  } catch (error) {
    if (error instanceof CustomFunctions.Error) return { kind: "error", code: error.code, message: error.message ?? "" };
    return { kind: "escaped", error };
  }
}

function scalarProblem(v: unknown): string | null {
  if (typeof v === "number") return Number.isFinite(v) ? null : `non-finite number ${String(v)}`;
  if (typeof v === "string" || typeof v === "boolean") return null;
  return `a cell of type ${v === null ? "null" : typeof v}`;
}

/** A cell of a row-wise table: a value, or one row's error value that keeps the error contract. */
function columnCellProblem(v: unknown): string | null {
  if (v instanceof CustomFunctions.Error) return errorProblem(v.code, v.message ?? "");
  return scalarProblem(v);
}

/**
 * Why a returned value is not a proper cell value (null when it is fine). "column": a function that
 * gives one value per row — a 1×1 table for one mixture, an N×1 column (cells may be a row's error) for a table.
 */
export function valueProblem(value: unknown, result: "scalar" | "matrix" | "column"): string | null {
  if (result === "scalar") return Array.isArray(value) ? "a scalar function returned an array" : scalarProblem(value);
  if (result === "column") {
    if (!Array.isArray(value) || value.length === 0 || !value.every((r) => Array.isArray(r) && r.length === 1)) return "a row-wise function returned something other than an N×1 table";
    for (const [cell] of value as unknown[][]) {
      const p = columnCellProblem(cell);
      if (p) return p;
    }
    return null;
  }
  if (!Array.isArray(value) || value.length === 0) return "a table function returned no rows";
  if (!value.every(Array.isArray)) return "a table function returned a row that is not an array";
  const width = (value[0] as unknown[]).length;
  if (width === 0) return "a table function returned an empty row";
  for (const row of value as unknown[][]) {
    if (row.length !== width) return `a ragged table (row widths ${width} and ${row.length})`;
    for (const cell of row) {
      const p = columnCellProblem(cell); // AQ.SPECIES of a named species is row-wise too
      if (p) return p;
    }
  }
  return null;
}

export const ALLOWED_CODES = ["#VALUE!", "#N/A"];

/** Why an outcome breaks the contract (null when it keeps it). */
export function outcomeProblem(o: Outcome, result: "scalar" | "matrix" | "column"): string | null {
  if (o.kind === "escaped") {
    const e = o.error as { constructor?: { name?: string }; message?: unknown };
    return `an exception other than CustomFunctions.Error escaped: ${e?.constructor?.name ?? typeof e}: ${String(e?.message ?? e)}`;
  }
  if (o.kind === "value") return valueProblem(o.value, result);
  return errorProblem(o.code, o.message);
}

function errorProblem(code: string, message: string): string | null {
  if (!ALLOWED_CODES.includes(code)) return `error code ${code} (only #VALUE! and #N/A show a message)`;
  if (typeof message !== "string" || message.trim() === "") return "an error without a message";
  if (/[\r\n]/.test(message)) return "a message on more than one line";
  if (message.length > 250) return `a message of ${message.length} characters (at most 250)`;
  // errors.ts turns an unexpected exception into "internal error: …": allowed in a cell, a defect here.
  if (/^internal error/.test(message)) return `an unexpected exception inside: ${message}`;
  return null;
}

/** Short printable form of arguments for a failure report. */
export function show(args: unknown): string {
  let s: string;
  try {
    s = JSON.stringify(args, (_k, v) => (typeof v === "number" && !Number.isFinite(v) ? String(v) : v === undefined ? "<undefined>" : v));
  } catch {
    s = String(args);
  }
  return s.length > 400 ? `${s.slice(0, 400)}… (${s.length} chars)` : s;
}
