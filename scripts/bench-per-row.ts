/**
 * Part (f2) of `npm run bench` (scripts/bench-tables.ts runs it): is the one-formula table's cost per
 * row flat from 1 000 to 200 000 rows in the sheet? Two figures per size, both CPU time:
 *
 *   first call    the first evaluation of that sheet at that size in this process (the code is
 *                 compiled already by the smaller sizes, and by f1 when it ran before; the heap is not
 *                 grown to the size yet);
 *   steady state  the best of several evaluations after warm-up evaluations of the same sheet at the
 *                 same size: what a sheet costs once the process has seen it.
 * Flat is judged on the steady state: the largest cost per row within 1.3× the smallest. Printed
 * beside the table, HyperFormula's own sheets at the same sizes (the values alone, and the
 * Henderson–Hasselbalch sheet of one built-in formula per row), and AQ.PH called directly on the
 * same rows without a spreadsheet engine (our part alone). The sheets take turns within a size.
 */
import { amountsOf, code, cpuNow, hhSheet, print, sheetCpu, sheetOf, us, valuesSheet, verdict, type Raw } from "./bench-sheets";

interface Timing {
  first: number;
  steady: number;
}

/** First call and steady state of each sheet, taking turns: `warm` unmeasured rounds, then `runs` measured. */
function timeSheets(sheets: Raw[], warm: number, runs: number): Timing[] {
  const out = sheets.map(() => ({ first: NaN, steady: Infinity }));
  for (let round = 0; round < warm + runs; round++) {
    sheets.forEach((s, k) => {
      const t = sheetCpu(s);
      if (t.errors > 0) throw new Error(`bench: f2: ${t.errors} error cells`);
      if (round === 0) out[k]!.first = t.cpu;
      if (round >= warm) out[k]!.steady = Math.min(out[k]!.steady, t.cpu);
    });
  }
  return out;
}

/** AQ.PH called directly on n rows (bundled as shipped): best of `runs` after two warm-up calls. */
function direct(n: number, runs: number): number {
  const { PH, clearMixtureCache } = code();
  const names = [["acetic acid", "sodium acetate"]];
  const amounts = Array.from({ length: n }, (_, i) => amountsOf(i));
  let best = Infinity;
  for (let r = 0; r < runs + 2; r++) {
    clearMixtureCache();
    const t0 = cpuNow();
    PH(names, amounts);
    if (r >= 2) best = Math.min(best, cpuNow() - t0);
  }
  return best;
}

const spread = (xs: number[]): number => Math.max(...xs) / Math.min(...xs);

export function f2(quick: boolean): void {
  const sizes = quick ? [1_000, 10_000, 50_000] : [1_000, 10_000, 50_000, 200_000];
  const plan = (n: number): [number, number] => (n >= 200_000 ? [1, 2] : n >= 50_000 ? [2, 3] : quick ? [2, 5] : [3, 9]);
  console.log(
    `\n(f2) One-formula table =AQ.PH(E1:F1,A1:B<n>) in the sheet: CPU time per row against the number of rows.` +
      `\n    first call: the first evaluation at that size; steady state: best of ${sizes.map((n) => plan(n)[1]).join("/")} after ${sizes.map((n) => plan(n)[0]).join("/")} warm-up evaluations of the same sheet (sheets take turns)`,
  );
  // The engine's fixed cost: a one-row table (parser, function registry, sheet set-up), steady state.
  const [fixedTiming] = timeSheets([sheetOf(1, (r) => `=AQ.PH(E1:F1,A${r}:B${r})`)], 3, 7);
  const fixed = fixedTiming!.steady;
  const rows = sizes.map((n) => {
    const [warm, runs] = plan(n);
    const [table, values, hh] = timeSheets([sheetOf(n, null), valuesSheet(n, null), hhSheet(n)], warm, runs) as [Timing, Timing, Timing];
    return { n, table, values, hh, direct: direct(n, runs) };
  });
  const line = (label: string, f: (r: (typeof rows)[number]) => number): string[] => [label, ...rows.map((r) => us(Math.max(0, f(r)), r.n))];
  print(
    ["CPU per row", ...sizes.map((n) => n.toLocaleString("en-US"))],
    [
      line("one-formula table, first call", (r) => r.table.first),
      line("one-formula table, steady state", (r) => r.table.steady),
      line("  beyond the fixed cost", (r) => r.table.steady - fixed),
      line("  above the values alone", (r) => r.table.steady - r.values.steady),
      line("values alone (HyperFormula's own), steady", (r) => r.values.steady),
      line("HH sheet, a formula per row, steady", (r) => r.hh.steady),
      line("AQ.PH directly, no engine (ours), steady", (r) => r.direct),
    ],
  );
  console.log(`    fixed cost of an engine (a one-row table, steady state): ${(fixed * 1000).toFixed(1)} ms`);
  const perRow = (f: (r: (typeof rows)[number]) => number): number[] => rows.map((r) => Math.max(1e-12, f(r)) / r.n);
  const table = spread(perRow((r) => r.table.steady));
  const last = sizes[sizes.length - 1]!.toLocaleString("en-US");
  console.log(`    target: flat from 1 000 to ${last} rows, steady state (largest per-row cost within 1.3× the smallest): ${verdict(table <= 1.3)} (${table.toFixed(2)}×)`);
  console.log(
    `    spread of the steady per-row cost (largest / smallest): table beyond the fixed cost ${spread(perRow((r) => r.table.steady - fixed)).toFixed(2)}×,` +
      ` table above the values alone ${spread(perRow((r) => r.table.steady - r.values.steady)).toFixed(2)}×;` +
      ` HyperFormula's own: the values alone ${spread(perRow((r) => r.values.steady)).toFixed(2)}×, the HH sheet ${spread(perRow((r) => r.hh.steady)).toFixed(2)}×;` +
      ` AQ.PH directly ${spread(perRow((r) => r.direct)).toFixed(2)}×; first call of the table ${spread(perRow((r) => r.table.first)).toFixed(2)}×`,
  );
}
