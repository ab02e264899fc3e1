/**
 * What `npm run --silent protolyte -- eval '<formula>'` prints, computed in-process: the value, a
 * spilled table as tab-separated rows, or the error value and its message (src/cli/main.ts).
 */
import { formatCell } from "../../src/cli/csv";
import { evaluateFormula, type CellResult } from "../../src/cli/evaluate";

export function printedLines(formula: string): string[] {
  const r = evaluateFormula(formula);
  if (r.error !== undefined) return [`${r.error} ${r.message ?? ""}`];
  if (Array.isArray(r.value)) return r.value.map((row) => row.map(formatCell).join("\t"));
  return [formatCell((r.value ?? null) as CellResult)];
}
