/**
 * The same fuzzing through the headless spreadsheet engine, as a user types formulas: literals and
 * inline arrays (evaluateFormula), and sheets whose ranges hold empty cells, text, numbers and
 * booleans (evaluateSheets). Property: the formula cell and its spill hold finite numbers, text or
 * booleans, or the cell is #VALUE!/#N/A with a one-line message of 1–250 characters.
 *
 * Fixed seed (arbitraries.ts); a longer campaign: PROTOLYTE_FUZZ_RUNS=50 npx jest test/robustness
 */
import fc from "fast-check";
import type { RawCellContent } from "hyperformula";
import { columnName, evaluateFormula, evaluateSheets, type CellResult } from "../../src/cli/evaluate";
import { CATALOGUE, type CatalogueEntry } from "../../src/functions/catalogue";
import { resetActiveLibrary } from "../../src/library";
import { argsFor as entryArgs, runs, SEED } from "./arbitraries";
import { show } from "./outcome";

beforeAll(() => resetActiveLibrary());

/** Excel's formula text limit is 8192 characters: keep literals well inside it. */
const MAX_TEXT = 300;

/** A string literal; a double quote is spelled CHAR(34) (the engine does not read "" inside literals). */
function stringLiteral(s: string): string {
  const cut = s.length > MAX_TEXT ? s.slice(0, MAX_TEXT) : s;
  return cut
    .split('"')
    .map((part) => `"${part}"`)
    .join("&CHAR(34)&");
}

/** One value as formula text (inside an inline array when `inArray`: no blanks, no functions of text). */
function literal(v: unknown, inArray = false): string {
  if (typeof v === "number") return Number.isFinite(v) ? String(v) : `"${String(v)}"`;
  if (typeof v === "boolean") return v ? "TRUE()" : "FALSE()";
  if (typeof v === "string") return inArray && v.includes('"') ? `"${v.replace(/"/g, "'").slice(0, MAX_TEXT)}"` : stringLiteral(v);
  return inArray ? '""' : "";
}

/** An argument as formula text: a scalar literal, or an inline array padded to a rectangle. */
function argument(v: unknown): string {
  if (!Array.isArray(v)) return literal(v);
  const rows = v.map((r) => (Array.isArray(r) ? r : [r]));
  const width = Math.max(0, ...rows.map((r) => r.length));
  if (rows.length === 0 || width === 0) return '""';
  return `{${rows.map((r) => Array.from({ length: width }, (_, c) => literal(r[c], true)).join(",")).join(";")}}`;
}

function formulaOf(entry: CatalogueEntry, args: unknown[]): string {
  const texts = args.map(argument);
  while (texts.length > 0 && texts[texts.length - 1] === "") texts.pop();
  return `=AQ.${entry.id}(${texts.join(",")})`;
}

function argsFor(entry: CatalogueEntry, hostile: boolean): fc.Arbitrary<unknown[]> {
  return entryArgs(entry.params, hostile ? "hostile" : "plausible");
}

const anyArgs = (entry: CatalogueEntry) => fc.oneof(argsFor(entry, true), argsFor(entry, false));

function cellProblem(v: CellResult): string | null {
  if (v === null || typeof v === "string" || typeof v === "boolean") return null;
  if (typeof v === "number") return Number.isFinite(v) ? null : `non-finite ${v}`;
  if (!["#VALUE!", "#N/A"].includes(v.error)) return `error ${v.error} (${v.message})`;
  if (v.message.trim() === "") return `${v.error} without a message`;
  if (/[\r\n]/.test(v.message)) return "a message on more than one line";
  if (v.message.length > 250) return `a message of ${v.message.length} characters`;
  if (/^internal error/.test(v.message)) return `an unexpected exception inside: ${v.message}`;
  return null;
}

const counts: Record<string, number> = { formula: 0, sheet: 0 };
afterAll(() => {
  console.log(`fuzz (through the spreadsheet engine, seed ${SEED}): ${counts.formula + counts.sheet} formulas — ${counts.formula} by evaluateFormula, ${counts.sheet} in sheets`);
});

describe("evaluateFormula: literals and inline arrays", () => {
  test.each(CATALOGUE.map((e) => [e.id, e] as const))("AQ.%s", (_id, entry) => {
    fc.assert(
      fc.property(anyArgs(entry), (args) => {
        const formula = formulaOf(entry, args);
        const r = evaluateFormula(formula);
        counts.formula++;
        const problems: string[] = [];
        if (r.error !== undefined) {
          const p = cellProblem({ error: r.error, message: r.message ?? "" });
          if (p) problems.push(p);
        } else if (Array.isArray(r.value)) {
          for (const row of r.value) for (const cell of row) {
            const p = cellProblem(cell);
            if (p) problems.push(p);
          }
        } else {
          const p = cellProblem(r.value ?? null);
          if (p) problems.push(p);
        }
        if (problems.length) throw new Error(`${formula}: ${problems[0]}`);
      }),
      { seed: SEED, numRuns: runs(entry.params.length === 0 ? 2 : 12) },
    );
  });
});

/** Data go from column K on, right of any spill (tables are at most 4 columns wide). */
const DATA_COL = 10;

/** A raw cell as a user would have typed it: text that starts with "=" or "'" is kept as text. */
function raw(v: unknown): RawCellContent {
  if (typeof v === "number") return Number.isFinite(v) ? v : String(v);
  if (typeof v === "boolean") return v;
  if (typeof v === "string") {
    const t = v.length > 32_767 ? v.slice(0, 32_767) : v;
    return /^[='"]/.test(t) ? `'${t}` : t;
  }
  return null;
}

/** One sheet: the formula in A1, any range argument written into the data columns and referenced. */
function sheetOf(entry: CatalogueEntry, args: unknown[]): { rows: RawCellContent[][]; formula: string } {
  const rows: RawCellContent[][] = [];
  const put = (r: number, c: number, v: RawCellContent) => {
    while (rows.length <= r) rows.push([]);
    rows[r][c] = v;
  };
  let col = DATA_COL;
  const texts = args.map((a) => {
    if (!Array.isArray(a)) return literal(a);
    const grid = a.map((r) => (Array.isArray(r) ? r : [r]));
    const width = Math.max(0, ...grid.map((r) => r.length));
    if (grid.length === 0 || width === 0) {
      col++;
      return `${columnName(col - 1)}1:${columnName(col - 1)}1`; // an empty one-cell range
    }
    grid.forEach((r, i) => r.forEach((v, j) => put(i, col + j, raw(v))));
    const ref = `${columnName(col)}1:${columnName(col + width - 1)}${grid.length}`;
    col += width;
    return ref;
  });
  while (texts.length > 0 && texts[texts.length - 1] === "") texts.pop();
  const formula = `=AQ.${entry.id}(${texts.join(",")})`;
  put(0, 0, formula);
  return { rows, formula };
}

describe("evaluateSheets: ranges with blanks, text, numbers and booleans", () => {
  test("every AQ function, one sheet per formula, one workbook per batch", () => {
    const perFunction = runs(40);
    const batches: { entry: CatalogueEntry; args: unknown[] }[][] = [];
    for (const entry of CATALOGUE) {
      const samples = fc.sample(anyArgs(entry), { seed: SEED, numRuns: entry.params.length === 0 ? 2 : perFunction });
      samples.forEach((args, i) => {
        const b = Math.floor(i / 20);
        (batches[b] ??= []).push({ entry, args });
      });
    }
    const problems: string[] = [];
    for (const batch of batches) {
      const sheets: Record<string, RawCellContent[][]> = {};
      const formulas: string[] = [];
      batch.forEach(({ entry, args }, i) => {
        const s = sheetOf(entry, args);
        sheets[`S${i}`] = s.rows;
        formulas.push(s.formula);
      });
      const results = evaluateSheets(sheets);
      results.forEach((sheet, i) => {
        counts.sheet++;
        for (const row of sheet.values) {
          for (let c = 0; c < Math.min(row.length, DATA_COL); c++) {
            const p = cellProblem(row[c]);
            if (p) problems.push(`${formulas[i]} with data ${show(sheets[`S${i}`].map((r) => r.slice(DATA_COL)))}: ${p}`);
          }
        }
      });
    }
    expect(problems.slice(0, 5)).toEqual([]);
  });

  test("an error value in an input cell propagates as that error (as in Excel)", () => {
    const [sheet] = evaluateSheets({ S: [["NaCl", "=1/0", "=AQ.PH(A1,B1)", "=AQ.SPECIES(A1:A1,B1:B1)"]] });
    expect(sheet.values[0][2]).toMatchObject({ error: "#DIV/0!" });
    expect(sheet.values[0][3]).toMatchObject({ error: "#DIV/0!" });
  });

  test("a whole-column reference evaluates like the filled cells", () => {
    const [sheet] = evaluateSheets({ S: [["acetic acid", 0.1, "=AQ.PH(A:A,B:B)", "=AQ.PH(A1:A2,B1:B2)"], ["sodium acetate", 0.1]] });
    expect(typeof sheet.values[0][2]).toBe("number");
    expect(sheet.values[0][2]).toBe(sheet.values[0][3]);
  });
});
