/**
 * A one-formula table as tall as a sheet may be (LIMITS.rows, 200 000 rows) spills every row. Its
 * spill size was once taken with Math.max(...widths), which overflows the call stack beyond about
 * 120 000 rows: every cell of the table became "#VALUE! internal error: Maximum call stack size
 * exceeded" (found by scripts/bench-tables.ts, part f2).
 */
import { evaluateSheets } from "../../src/cli/evaluate";
import { LIMITS } from "../../src/cli/limits";
import * as Functions from "../../src/functions/functions";

const amountsOf = (i: number): [number, number] => [0.01 + (i % 100) * 0.001, 0.01 + (Math.floor(i / 100) % 100) * 0.001];

test(`a one-formula table of ${LIMITS.rows} rows spills every row, each equal to its row alone`, () => {
  const n = LIMITS.rows;
  const sheet: (string | number | null)[][] = [];
  for (let i = 0; i < n; i++) {
    const [a, b] = amountsOf(i);
    sheet.push(i === 0 ? [a, b, `=AQ.PH(E1:F1,A1:B${n})`, null, "acetic acid", "sodium acetate"] : [a, b]);
  }
  const [result] = evaluateSheets({ Sheet1: sheet });
  expect(result!.errors.slice(0, 3)).toEqual([]);
  expect(result!.values).toHaveLength(n);
  for (const i of [0, 1, 9_999, 123_456, n - 1]) {
    const alone = (Functions.PH([["acetic acid", "sodium acetate"]], [amountsOf(i)]) as number[][])[0]![0];
    expect({ row: i + 1, pH: result!.values[i]![2] }).toEqual({ row: i + 1, pH: alone });
  }
});
