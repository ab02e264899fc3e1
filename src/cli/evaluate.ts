/**
 * Headless evaluation with HyperFormula: one formula, or whole sheets of values and formulas.
 * Results are plain data: a number, string or boolean, a table (rows of cells), or an error
 * value with its message — the same things a user sees in Excel.
 */
import { DetailedCellError, HyperFormula, type RawCellContent } from "hyperformula";
import { installEdgeIndex } from "./hf-edge-index";
import { registerAqFunctions, TABLE_FUNCTIONS } from "./hf-plugin";
import { formulaProblem, LIMITS } from "./limits";

export type CellResult = number | string | boolean | null | { error: string; message: string };

export interface FormulaResult {
  /** A scalar, or rows of cells for a spilled table. */
  value?: CellResult | CellResult[][];
  error?: string;
  message?: string;
}

// smartRounding off: HyperFormula would otherwise round results to about 10 significant digits.
// useArrayArithmetic: {1;1}*A4 is an array, as in Excel with dynamic arrays.
const CONFIG = { licenseKey: "gpl-v3", maxRows: LIMITS.rows, maxColumns: LIMITS.columns, smartRounding: false, useArrayArithmetic: true } as const;

function toResult(value: unknown): CellResult {
  if (value instanceof DetailedCellError) return { error: value.value, message: value.message ?? "" };
  if (value === null || value === undefined) return null;
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  return String(value);
}

const TABLE_CALL = new RegExp(`(?:${TABLE_FUNCTIONS.map((f) => f.replace(".", "\\.")).join("|")})\\s*\\(`, "i");

/** Sheets by name. A Map, never a plain object: a sheet may be called "__proto__". */
export type Workbook = Map<string, RawCellContent[][]>;

function toWorkbook(sheets: Workbook | Record<string, RawCellContent[][]>): Workbook {
  return sheets instanceof Map ? sheets : new Map(Object.entries(sheets));
}

/** The shape HyperFormula takes: an object without a prototype, every name an own property. */
function toEngineSheets(sheets: Workbook): Record<string, RawCellContent[][]> {
  const out = Object.create(null) as Record<string, RawCellContent[][]>;
  for (const [name, rows] of sheets) Object.defineProperty(out, name, { value: rows, enumerable: true, writable: true, configurable: true });
  return out;
}

/** Messages for cells whose formula was refused before evaluation, by "sheet\u0000address". */
type Refusals = Map<string, string>;
const REFUSED = '=1+"refused"'; // evaluates to #VALUE!, so dependents see an error too
const refusalKey = (sheet: string, row: number, col: number): string => `${sheet}\u0000${columnName(col)}${row + 1}`;

/** Replaces formulas beyond the engine's limits by an error cell (on a copy of the row), recording why. */
function guardFormulas(sheets: Workbook, refusals: Refusals): Workbook {
  const out: Workbook = new Map();
  for (const [name, rows] of sheets) {
    out.set(
      name,
      rows.map((row, r) => {
        let copy: RawCellContent[] | null = null;
        (row ?? []).forEach((cell, c) => {
          if (typeof cell !== "string" || cell[0] !== "=") return;
          const problem = formulaProblem(cell);
          if (problem === null) return;
          copy ??= [...row];
          copy[c] = REFUSED;
          refusals.set(refusalKey(name, r, c), `formula not evaluated: ${problem}`);
        });
        return copy ?? row;
      }),
    );
  }
  return out;
}

/**
 * HyperFormula reserves a table's spill area when it first parses the formula, before the cells it
 * refers to are computed; a table whose arguments hold formula cells cannot be sized then. Entering
 * those formulas again once the sheet is computed (as a user would press Enter on them) sizes them
 * from the real values. A chain of tables (RECIPE → RECIPE → SPECIES) settles one link per round:
 * rounds continue while the number of tables in error shrinks, up to LIMITS.resizeRounds; tables
 * still in error then are left with their error, and the ones that did not settle say so.
 */
function resizeTables(hf: HyperFormula, sheets: Workbook, refusals: Refusals): void {
  let previous = Infinity;
  for (let round = 0; ; round++) {
    const pending: { sheet: number; name: string; row: number; col: number; formula: string }[] = [];
    for (const [name, rows] of sheets) {
      const sheet = hf.getSheetId(name) as number;
      rows.forEach((row, r) =>
        (row ?? []).forEach((cell, c) => {
          if (typeof cell !== "string" || cell[0] !== "=" || !TABLE_CALL.test(cell)) return;
          const value = hf.getCellValue({ sheet, row: r, col: c });
          if (value instanceof DetailedCellError) pending.push({ sheet, name, row: r, col: c, formula: cell });
        }),
      );
    }
    if (pending.length === 0 || pending.length >= previous) return;
    if (round >= LIMITS.resizeRounds) {
      for (const p of pending) refusals.set(refusalKey(p.name, p.row, p.col), `the table's size did not settle after ${LIMITS.resizeRounds} rounds of tables reading tables`);
      return;
    }
    previous = pending.length;
    hf.batch(() => {
      for (const p of pending) hf.setCellContents({ sheet: p.sheet, row: p.row, col: p.col }, p.formula);
    });
  }
}

function buildGuarded(sheets: Workbook, refusals: Refusals): HyperFormula {
  registerAqFunctions();
  installEdgeIndex();
  const guarded = guardFormulas(sheets, refusals);
  const hf = HyperFormula.buildFromSheets(toEngineSheets(guarded), CONFIG);
  resizeTables(hf, guarded, refusals);
  return hf;
}

/** Builds an engine holding the given sheets (name → rows of raw cell contents), every table sized. */
export function buildEngine(sheets: Workbook | Record<string, RawCellContent[][]>): HyperFormula {
  return buildGuarded(toWorkbook(sheets), new Map());
}

/** Evaluates one formula as if typed in cell A1 of an empty sheet; a spilled result comes back as rows. */
export function evaluateFormula(formula: string): FormulaResult {
  const text = formula.trim().startsWith("=") ? formula.trim() : `=${formula.trim()}`;
  const refusals: Refusals = new Map();
  const hf = buildGuarded(new Map([["Sheet1", [[text]]]]), refusals);
  try {
    const refused = refusals.get(refusalKey("Sheet1", 0, 0));
    if (refused !== undefined) return { error: "#VALUE!", message: refused };
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
export function evaluateSheets(input: Workbook | Record<string, RawCellContent[][]>): SheetResult[] {
  const sheets = toWorkbook(input);
  const refusals: Refusals = new Map();
  const hf = buildGuarded(sheets, refusals);
  try {
    return [...sheets.keys()].map((name) => {
      const id = hf.getSheetId(name) as number;
      const values = hf.getSheetValues(id).map((row) => row.map(toResult));
      const errors: SheetResult["errors"] = [];
      values.forEach((row, r) =>
        row.forEach((cell, c) => {
          if (cell === null || typeof cell !== "object") return;
          const address = `${columnName(c)}${r + 1}`;
          const refused = refusals.get(`${name}\u0000${address}`);
          if (refused !== undefined) row[c] = { error: cell.error, message: refused };
          errors.push({ address, ...(row[c] as { error: string; message: string }) });
        }),
      );
      return { name, values, errors };
    });
  } finally {
    hf.destroy();
  }
}
