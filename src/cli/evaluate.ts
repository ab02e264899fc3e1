/**
 * Headless evaluation with HyperFormula: one formula, or whole sheets of values and formulas.
 * Results are plain data: a number, string or boolean, a table (rows of cells), or an error
 * value with its message — the same things a user sees in Excel.
 */
import { DetailedCellError, HyperFormula, type RawCellContent } from "hyperformula";
import { installEdgeIndex } from "./hf-edge-index";
import { registerAqFunctions, TABLE_FUNCTIONS } from "./hf-plugin";

export type CellResult = number | string | boolean | null | { error: string; message: string };

export interface FormulaResult {
  /** A scalar, or rows of cells for a spilled table. */
  value?: CellResult | CellResult[][];
  error?: string;
  message?: string;
}

// smartRounding off: HyperFormula would otherwise round results to about 10 significant digits.
// useArrayArithmetic: {1;1}*A4 is an array, as in Excel with dynamic arrays.
const CONFIG = { licenseKey: "gpl-v3", maxRows: 200_000, maxColumns: 1_000, smartRounding: false, useArrayArithmetic: true } as const;

function toResult(value: unknown): CellResult {
  if (value instanceof DetailedCellError) return { error: value.value, message: value.message ?? "" };
  if (value === null || value === undefined) return null;
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  return String(value);
}

const TABLE_CALL = new RegExp(`(?:${TABLE_FUNCTIONS.map((f) => f.replace(".", "\\.")).join("|")})\\s*\\(`, "i");

/**
 * HyperFormula reserves a table's spill area when it first parses the formula, before the cells it
 * refers to are computed; a table whose arguments hold formula cells cannot be sized then. Entering
 * those formulas again once the sheet is computed (as a user would press Enter on them) sizes them
 * from the real values. Two rounds cover a table whose arguments come from another table.
 */
function resizeTables(hf: HyperFormula, sheets: Record<string, RawCellContent[][]>): void {
  for (let round = 0; round < 2; round++) {
    const pending: { sheet: number; row: number; col: number; formula: string }[] = [];
    for (const name of Object.keys(sheets)) {
      const sheet = hf.getSheetId(name) as number;
      (sheets[name] ?? []).forEach((row, r) =>
        (row ?? []).forEach((cell, c) => {
          if (typeof cell !== "string" || !cell.startsWith("=") || !TABLE_CALL.test(cell)) return;
          const value = hf.getCellValue({ sheet, row: r, col: c });
          if (value instanceof DetailedCellError) pending.push({ sheet, row: r, col: c, formula: cell });
        }),
      );
    }
    if (pending.length === 0) return;
    hf.batch(() => {
      for (const p of pending) hf.setCellContents({ sheet: p.sheet, row: p.row, col: p.col }, p.formula);
    });
  }
}

/** Builds an engine holding the given sheets (name → rows of raw cell contents), every table sized. */
export function buildEngine(sheets: Record<string, RawCellContent[][]>): HyperFormula {
  registerAqFunctions();
  installEdgeIndex();
  const hf = HyperFormula.buildFromSheets(sheets, CONFIG);
  resizeTables(hf, sheets);
  return hf;
}

/** Evaluates one formula as if typed in cell A1 of an empty sheet; a spilled result comes back as rows. */
export function evaluateFormula(formula: string): FormulaResult {
  const text = formula.trim().startsWith("=") ? formula.trim() : `=${formula.trim()}`;
  const hf = buildEngine({ Sheet1: [[text]] });
  try {
    const sheetValues = hf.getSheetValues(0);
    const first = toResult(sheetValues[0]?.[0]);
    if (first !== null && typeof first === "object") return { error: first.error, message: first.message };
    const spill = hf.getSheetDimensions(0);
    if (spill.height === 1 && spill.width === 1) return { value: first };
    const rows = sheetValues.map((row) => row.map(toResult));
    return { value: rows };
  } finally {
    hf.destroy();
  }
}

export interface SheetResult {
  name: string;
  /** Computed values, same layout as the input (spills filled in). */
  values: CellResult[][];
  /** Cells that evaluated to an error, with their A1 address and message. */
  errors: { address: string; error: string; message: string }[];
}

export function columnName(index: number): string {
  let n = index + 1;
  let name = "";
  while (n > 0) {
    const r = (n - 1) % 26;
    name = String.fromCharCode(65 + r) + name;
    n = Math.floor((n - 1) / 26);
  }
  return name;
}

/** Evaluates every sheet of a workbook given as name → rows of raw contents. */
export function evaluateSheets(sheets: Record<string, RawCellContent[][]>): SheetResult[] {
  const hf = buildEngine(sheets);
  try {
    return Object.keys(sheets).map((name) => {
      const id = hf.getSheetId(name) as number;
      const values = hf.getSheetValues(id).map((row) => row.map(toResult));
      const errors: SheetResult["errors"] = [];
      values.forEach((row, r) =>
        row.forEach((cell, c) => {
          if (cell !== null && typeof cell === "object") errors.push({ address: `${columnName(c)}${r + 1}`, ...cell });
        }),
      );
      return { name, values, errors };
    });
  } finally {
    hf.destroy();
  }
}
