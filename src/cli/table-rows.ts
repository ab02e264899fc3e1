/**
 * The computing half of `protolyte table` (src/cli/table.ts), shared by the main thread and the
 * worker threads (table-worker.ts): which columns of the CSV are substances and which are the
 * function's arguments, and a batch of rows → one result per row. No spreadsheet engine: each batch
 * is one row-wise call of the very function object Excel calls (src/functions/rowwise.ts), so the
 * validation, blank rows and per-row error values are the ones a sheet shows.
 */
import { CATALOGUE, type CatalogueEntry } from "../functions/catalogue";
import { toCellContent } from "./csv";
import { UsageError } from "./options";

/** One row's result: a value, blank (""), or an error value with its message. */
export type RowResult = number | string | boolean | { error: string; message: string };

/** Plain data (it crosses to worker threads). */
export interface TableLayout {
  id: string;
  /** Substance names: the header of each amount column, in order. */
  names: string[];
  /** Input column of each substance. */
  substanceColumns: number[];
  /** For each parameter after amounts: the input column giving it per row, or null. */
  perRow: (number | null)[];
  /** For each parameter after amounts: its fixed value (cell content), or null when omitted. */
  fixed: (string | number | null)[];
  decimalComma: boolean;
}

/** The functions a table can run: those that give one value per row (AQ.SPECIES with a species). */
export function tableEntry(name: string): CatalogueEntry {
  const id = name.replace(/^=?AQ\./i, "").toUpperCase();
  const entry = CATALOGUE.find((e) => e.id === id);
  const usable = CATALOGUE.filter((e) => e.result === "column" || e.id === "SPECIES").map((e) => e.id);
  if (entry === undefined || !usable.includes(entry.id)) {
    throw new UsageError(`'${name}' is not a function a table can run: use one of ${usable.map((u) => `AQ.${u}`).join(", ")}`);
  }
  return entry;
}

/**
 * Reads the header: a column named like one of the function's parameters (case-insensitive, after
 * names and amounts) gives that argument per row; every other column is a substance with its
 * amounts. `fixed`: name=value arguments from the command line or the file's first line.
 */
export function layoutOf(entry: CatalogueEntry, header: string[], fixed: Record<string, string>, decimalComma: boolean): TableLayout {
  const params = entry.params.slice(2);
  const lower = params.map((p) => p.name.toLowerCase());
  const perRow: (number | null)[] = params.map(() => null);
  const names: string[] = [];
  const substanceColumns: number[] = [];
  header.forEach((h, c) => {
    const k = lower.indexOf(h.trim().toLowerCase());
    if (k >= 0) {
      if (perRow[k] !== null) throw new UsageError(`the header names '${params[k]!.name}' twice`);
      perRow[k] = c;
    } else {
      names.push(h.trim());
      substanceColumns.push(c);
    }
  });
  const fixedValues: (string | number | null)[] = params.map(() => null);
  for (const [key, value] of Object.entries(fixed)) {
    const k = lower.indexOf(key.toLowerCase());
    if (k < 0) throw new UsageError(`AQ.${entry.id} has no argument '${key}' (it takes ${params.map((p) => p.name).join(", ")})`);
    if (perRow[k] !== null) throw new UsageError(`'${params[k]!.name}' is given twice: as a column and as ${key}=${value}`);
    const cell = toCellContent(value, decimalComma);
    fixedValues[k] = typeof cell === "string" || typeof cell === "number" ? cell : null;
  }
  params.forEach((p, k) => {
    if (!p.optional && perRow[k] === null && fixedValues[k] === null) {
      throw new UsageError(`AQ.${entry.id} needs '${p.name}': give a column of that name, or ${p.name}=VALUE`);
    }
  });
  if (names.length === 0) throw new UsageError("the header names no substance: every column that is not an argument is a substance with its amounts");
  return { id: entry.id, names, substanceColumns, perRow, fixed: fixedValues, decimalComma };
}

function cell(field: string | undefined, decimalComma: boolean): unknown {
  const c = toCellContent(field ?? "", decimalComma);
  return c === null ? "" : c; // Excel passes an empty cell as ""
}

function resultOf(value: unknown): RowResult {
  if (value instanceof CustomFunctions.Error) return { error: value.code, message: value.message ?? "" };
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  return "";
}

/** One result per row, in order. A batch of one row is padded with a blank row (always a table). */
export function computeRows(layout: TableLayout, rows: readonly string[][]): RowResult[] {
  const entry = tableEntry(layout.id);
  const n = Math.max(rows.length, 2);
  const amounts: unknown[][] = [];
  for (let r = 0; r < n; r++) {
    const row = rows[r];
    amounts.push(layout.substanceColumns.map((c) => (row === undefined ? "" : cell(row[c], layout.decimalComma))));
  }
  const args = layout.perRow.map((c, k) => {
    if (c === null) return layout.fixed[k];
    const column: unknown[][] = [];
    for (let r = 0; r < n; r++) column.push([rows[r] === undefined ? "" : cell(rows[r]![c], layout.decimalComma)]);
    return column;
  });
  try {
    const out = entry.fn([layout.names], amounts, ...args) as unknown[][];
    return rows.map((_, r) => resultOf(out[r]?.[0]));
  } catch (error) {
    const e = error instanceof CustomFunctions.Error ? error : new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, String(error));
    return rows.map(() => resultOf(e));
  }
}

/**
 * Checks the header's substance names once, before any row: an unknown name stops the run with
 * the closest names (every row would show it). Returns the message, or null when they are known.
 */
export function namesProblem(layout: TableLayout): string | null {
  const blank = layout.substanceColumns.map(() => "");
  try {
    tableEntry(layout.id).fn([layout.names], [blank, blank], ...layout.fixed);
    return null;
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
}
