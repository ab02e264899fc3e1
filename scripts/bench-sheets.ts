/**
 * The sheets of part (f) of `npm run bench` and their timing, shared by f1 (scripts/bench-tables.ts)
 * and f2 (scripts/bench-per-row.ts). The sheets are evaluated by the sources bundled into one scope
 * as the product ships them (scripts/bench-shipped.ts).
 */
import { join } from "node:path";
import { shippedCode, type ShippedCode } from "./bench-shipped";

let shipped: ShippedCode | null = null;
/** The product's code bundled as shipped (made once per process). */
export function code(): ShippedCode {
  shipped ??= shippedCode(join(__dirname, ".."));
  return shipped;
}

export type Raw = (string | number | null)[][];

/** CPU seconds of this process (user + system, every thread). */
export function cpuNow(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

export function print(header: string[], rows: string[][]): void {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] ?? "").length)));
  const line = (cells: string[]) => cells.map((x, c) => (c === 0 ? x.padEnd(widths[c]!) : x.padStart(widths[c]!))).join("  ");
  console.log(line(header));
  console.log(widths.map((w) => "-".repeat(w)).join("  "));
  for (const r of rows) console.log(line(r));
}

/** Microseconds per row, as text. */
export const us = (seconds: number, rows: number): string => `${((seconds / rows) * 1e6).toFixed(2)} µs`;
export const verdict = (ok: boolean): string => (ok ? "met" : "NOT met");

/** Row i: acetic acid and sodium acetate, mol/L (the grid of part b). */
export function amountsOf(i: number): [number, number] {
  return [0.01 + (i % 100) * 0.001, 0.01 + (Math.floor(i / 100) % 100) * 0.001];
}

/** Data in A1:B<rows>, names in E1:F1, and either one table formula in C1 or a formula per row. */
export function sheetOf(rows: number, perRow: ((r: number) => string) | null): Raw {
  const sheet: Raw = [];
  for (let i = 0; i < rows; i++) {
    const [a, b] = amountsOf(i);
    const r = i + 1;
    const c = perRow !== null ? perRow(r) : i === 0 ? `=AQ.PH(E1:F1,A1:B${rows})` : null;
    sheet.push(i === 0 ? [a, b, c, null, "acetic acid", "sodium acetate"] : [a, b, c]);
  }
  return sheet;
}

/** The sheet of values alone (names in E1:F1), with `formula` in C1 if given. */
export function valuesSheet(rows: number, formula: string | null): Raw {
  return sheetOf(rows, (r) => (r === 1 && formula !== null ? formula : (null as never)));
}

/** The Henderson–Hasselbalch sheet: one built-in formula per row (the baseline of f1). */
export const hhSheet = (rows: number): Raw => sheetOf(rows, (r) => `=4.756+LOG10(B${r}/A${r})`);

/** CPU seconds of one evaluateSheets of the sheet (a new engine), and its number of error cells. */
export function sheetCpu(sheet: Raw): { cpu: number; errors: number } {
  const { clearMixtureCache, evaluateSheets } = code();
  clearMixtureCache();
  const t0 = cpuNow();
  const [result] = evaluateSheets({ Sheet1: sheet as never });
  return { cpu: cpuNow() - t0, errors: result!.errors.length };
}

/** Median of a list of numbers. */
export function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
}
