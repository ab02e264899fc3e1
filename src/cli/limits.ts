/**
 * The limits of the command line, checked before any evaluation so that a hostile or mistaken file
 * ends with one clear line instead of exhausting memory. The README's command-line section quotes
 * these numbers; change them here only.
 */
export const LIMITS = {
  /** Bytes of the input file (CSV text, or the XLSX package as stored). */
  fileBytes: 64 * 1024 * 1024,
  /** Bytes of an XLSX package once unpacked (all its parts together, as the package declares them). */
  unpackedBytes: 256 * 1024 * 1024,
  /** Rows of one sheet (the last filled row). */
  rows: 200_000,
  /** Columns of one sheet (the last filled column). */
  columns: 1_000,
  /**
   * Cells of the rectangle from A1 to the last filled row and column, all sheets together, for a CSV
   * file: the headless engine holds about 0.5 kB a cell. Measured peak of `protolyte sheet F.csv`
   * (/usr/bin/time -f %M, 2026-12-03; 25 columns: 24 numbers and a formula per row): 1.80 GB for
   * 3 500 000 cells, 1.96 GB for 4 000 000, 2.46 GB for 5 000 000 (the limit before); short texts
   * instead of numbers, 1.58 GB for 3 500 000. This keeps a CSV within the same 2 GB budget as a
   * workbook.
   */
  cells: 3_500_000,
  /**
   * The same for an XLSX workbook (and its <c> elements, counted before loading): exceljs, which
   * reads it, holds about 1 kB a cell. Measured peak (scripts/xlsx-memory.ts, 2026-12-03): 0.94 GB
   * for 1 000 000 cells, 2.1 GB for 2 000 000, 2.9 GB for 3 000 000; this keeps a workbook within
   * a budget of 2 GB.
   */
  xlsxCells: 1_500_000,
  /** Characters in one cell (Excel's own limit for a cell). */
  cellChars: 32_767,
  /** Characters in one formula (Excel's own limit). */
  formulaChars: 8_192,
  /** Nesting of parentheses and function calls in one formula (Excel's own limit is 64 levels of functions). */
  formulaNesting: 64,
  /** Operators in one formula: deeper expression trees exhaust the headless engine's stack. */
  formulaOperators: 500,
  /** Rounds of re-sizing spilled tables that read other spilled tables. */
  resizeRounds: 50,
} as const;

/** A limit exceeded by the input as a whole: one line, exit 2. */
export class LimitError extends Error {}

const OPERATOR = /[-+*/^&=<>]/;

/**
 * Why a formula is beyond what is evaluated here (null when it is fine). Counts outside string
 * literals only. Such a cell gets #VALUE! with this message; every other cell is computed.
 */
export function formulaProblem(formula: string): string | null {
  if (formula.length > LIMITS.formulaChars) return `the formula has ${formula.length} characters; Excel and Protolyte accept at most ${LIMITS.formulaChars}`;
  let depth = 0;
  let maxDepth = 0;
  let operators = 0;
  let inString = false;
  for (let i = 1; i < formula.length; i++) {
    const ch = formula[i] as string;
    if (ch === '"') inString = !inString;
    else if (inString) continue;
    else if (ch === "(" || ch === "{") maxDepth = Math.max(maxDepth, ++depth);
    else if (ch === ")" || ch === "}") depth--;
    else if (OPERATOR.test(ch)) operators++;
  }
  if (maxDepth > LIMITS.formulaNesting) return `the formula nests ${maxDepth} levels deep; Excel accepts at most ${LIMITS.formulaNesting} levels of functions`;
  if (operators > LIMITS.formulaOperators) {
    return `the formula has ${operators} operators; the headless engine evaluates at most ${LIMITS.formulaOperators} in one formula (split it over several cells, e.g. with SUM over a range)`;
  }
  return null;
}

/** The rectangle a sheet occupies, checked against the row, column and cell limits. */
export function checkSheetSize(name: string, rows: number, columns: number): void {
  if (rows > LIMITS.rows) throw new LimitError(`sheet '${name}' has ${rows} rows; at most ${LIMITS.rows} are read`);
  if (columns > LIMITS.columns) throw new LimitError(`sheet '${name}' has ${columns} columns; at most ${LIMITS.columns} are read`);
}

/** The cell limit of an input: LIMITS.xlsxCells for a workbook, LIMITS.cells for a CSV file. */
export const cellLimit = (kind: "csv" | "xlsx"): number => (kind === "xlsx" ? LIMITS.xlsxCells : LIMITS.cells);

/** Why an XLSX workbook has its own, lower limit: said in its refusals. */
export const XLSX_CELLS_REASON = `from an XLSX workbook, whose reader needs about 1 kB of memory a cell (a CSV file may span ${LIMITS.cells})`;

export function checkCellCount(total: number, kind: "csv" | "xlsx" = "csv"): void {
  const limit = cellLimit(kind);
  if (total > limit) {
    const why = kind === "xlsx" ? ` ${XLSX_CELLS_REASON}` : "";
    throw new LimitError(`the sheets span ${total} cells (rows × columns up to the last filled cell); at most ${limit} are evaluated${why}`);
  }
}
