/**
 * Registers the AQ custom functions in HyperFormula, so formulas evaluate headlessly exactly as a
 * user types them in Excel. The function objects are the very ones Excel calls (src/functions/functions.ts);
 * this adapter only converts HyperFormula's argument values to the shapes Excel passes
 * (ranges as rows of columns, omitted arguments as null) and thrown CustomFunctions errors back to
 * HyperFormula error values with their messages.
 */
import {
  ArraySize,
  CellError,
  EmptyValue,
  ErrorType,
  FunctionArgumentType,
  FunctionPlugin,
  HyperFormula,
  SimpleRangeValue,
} from "hyperformula";
import "../functions/runtime-shim";
import { CATALOGUE, type CatalogueEntry } from "../functions/catalogue";
import { tableRows } from "../functions/rowwise";

type Ast = { args: any[] };
type State = any;

const ERROR_TYPES: Record<string, ErrorType> = {
  "#VALUE!": ErrorType.VALUE,
  "#N/A": ErrorType.NA,
  "#DIV/0!": ErrorType.DIV_BY_ZERO,
  "#NUM!": ErrorType.NUM,
  "#NAME?": ErrorType.NAME,
  "#REF!": ErrorType.REF,
};

class ArgumentError {
  constructor(readonly error: CellError) {}
}

/** One HyperFormula scalar → what Excel would pass for an `any` parameter. */
function toExcelScalar(value: unknown): unknown {
  if (value === EmptyValue || value === undefined || value === null) return "";
  if (value instanceof CellError) throw new ArgumentError(value);
  if (typeof value === "object" && value !== null && "val" in value) return (value as { val: number }).val; // rich number (date, percent)
  return value;
}

/** True when every cell is a plain number, text or boolean: what Excel passes for such a range. */
function plainRows(rows: readonly (readonly unknown[])[]): boolean {
  for (let r = 0; r < rows.length; r++) {
    const row = rows[r];
    for (let c = 0; c < row.length; c++) {
      const t = typeof row[c];
      if (t !== "number" && t !== "string" && t !== "boolean") return false;
    }
  }
  return true;
}

function toExcelArgument(value: unknown, optional: boolean): unknown {
  if (value === undefined) return optional ? null : "";
  if (value instanceof SimpleRangeValue) {
    const rows = value.data as unknown[][];
    // Plain cells pass as they are, without a copy per call (the AQ functions never modify their
    // arguments); blanks, errors and rich numbers (dates, percentages) are converted.
    return plainRows(rows) ? rows : rows.map((row) => row.map(toExcelScalar));
  }
  return toExcelScalar(value);
}

function toHyperFormulaError(error: unknown): CellError {
  if (error instanceof ArgumentError) return error.error;
  if (error instanceof CustomFunctions.Error) {
    return new CellError(ERROR_TYPES[error.code] ?? ErrorType.VALUE, error.message);
  }
  const detail = error instanceof Error ? error.message : String(error);
  return new CellError(ErrorType.VALUE, `internal error: ${detail}`);
}

function toHyperFormulaScalar(value: unknown): unknown {
  if (value === null || value === undefined) return "";
  if (value instanceof CustomFunctions.Error) return toHyperFormulaError(value); // a row's error in a row-wise table
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  return String(value);
}

/** Calls the Excel function object with converted arguments; returns a value or throws. */
function call(entry: CatalogueEntry, values: unknown[]): unknown {
  const args = entry.params.map((p, i) => toExcelArgument(values[i], p.optional));
  return entry.fn(...args);
}

function matrixOf(result: unknown): unknown[][] {
  if (!Array.isArray(result) || !result.every(Array.isArray)) throw new Error("a table function returned something other than a matrix");
  return result as unknown[][];
}

/**
 * The table at the size HyperFormula reserved for it (padded with "" or cut), its cells converted.
 * `fresh`: the table was made by this very call (a row-wise table, rowwise.ts), so when it already
 * has that size it is converted in place: a 200 000-row column copied row by row was 200 000 more
 * arrays for the garbage collector.
 */
function fit(rows: unknown[][], size: ArraySize, fresh: boolean): unknown[][] {
  if (fresh && rows.length === size.height && rows.every((row) => row.length === size.width)) {
    for (const row of rows) for (let c = 0; c < row.length; c++) row[c] = toHyperFormulaScalar(row[c]);
    return rows;
  }
  const out: unknown[][] = new Array(size.height);
  for (let r = 0; r < size.height; r++) {
    const row = rows[r] ?? [];
    const cells: unknown[] = new Array(size.width);
    for (let c = 0; c < size.width; c++) cells[c] = toHyperFormulaScalar(row[c] ?? "");
    out[r] = cells;
  }
  return out;
}

function buildPlugin(): typeof FunctionPlugin {
  class AqPlugin extends FunctionPlugin {}
  const implemented: Record<string, unknown> = {};
  const proto = AqPlugin.prototype as unknown as Record<string, unknown>;
  for (const entry of CATALOGUE) {
    const name = `AQ.${entry.id}`;
    const method = `aq_${entry.id.toLowerCase()}`;
    const sizeMethod = `${method}_size`;
    const parameters = entry.params.map((p) => ({ argumentType: FunctionArgumentType.ANY, optionalArg: p.optional }));

    proto[method] = function (this: AqPlugin & { runFunction: Function; metadata: Function }, ast: Ast, state: State) {
      return this.runFunction(ast.args, state, this.metadata(name), (...values: unknown[]): any => {
        try {
          const result = call(entry, values);
          if (entry.result === "scalar") return toHyperFormulaScalar(result);
          const rows = matrixOf(result);
          if (entry.result === "column" && rows.length === 1 && rows[0].length === 1) return toHyperFormulaScalar(rows[0][0]);
          const size = sizeOf(rows);
          return SimpleRangeValue.onlyValues(fit(rows, size, entry.result === "column") as never);
        } catch (error) {
          return toHyperFormulaError(error);
        }
      });
    };

    if (entry.result === "column") {
      // One value, or a row-wise table: its size follows from the shapes of the arguments alone.
      proto[sizeMethod] = function (this: AqPlugin & { evaluateAst: Function }, ast: Ast, state: State) {
        try {
          const rows = tableRows(ast.args.map((a) => shapeOfArgument(this, a, state)));
          return rows === 0 ? ArraySize.scalar() : new ArraySize(1, rows);
        } catch {
          return ArraySize.scalar();
        }
      };
    }

    if (entry.result === "matrix") {
      // HyperFormula reserves a spill area before evaluation: compute the table once to learn its size.
      proto[sizeMethod] = function (this: AqPlugin & { evaluateAst: Function }, ast: Ast, state: State) {
        try {
          const values = ast.args.map((a) => (a === undefined ? undefined : this.evaluateAst(a, state)));
          return sizeOf(matrixOf(call(entry, values)));
        } catch {
          // Typically a range holding formula cells that are not computed yet while the sheet is
          // being built: evaluate.ts re-enters such formulas once the values exist.
          return ArraySize.scalar();
        }
      };
    }

    implemented[name] = {
      method,
      parameters,
      vectorizationForbidden: true,
      ...(entry.result !== "scalar" ? { sizeOfResultArrayMethod: sizeMethod } : {}),
    };
  }
  (AqPlugin as unknown as { implementedFunctions: unknown }).implementedFunctions = implemented;
  return AqPlugin;
}

const ONE_CELL_AST = new Set(["EMPTY", "NUMBER", "STRING", "CELL_REFERENCE"]);

/**
 * [rows, columns] of one argument, read from the formula where it is a cell range or a literal (no
 * evaluation: the cells may not be computed yet), otherwise from its value.
 */
function shapeOfArgument(plugin: { evaluateAst: Function }, ast: any, state: State): [number, number] {
  // HyperFormula's AstNodeType values (the enum is not exported).
  if (ast === undefined || ONE_CELL_AST.has(ast.type)) return [1, 1];
  if (ast.type === "CELL_RANGE") {
    const start = ast.start.toSimpleCellAddress(state.formulaAddress);
    const end = ast.end.toSimpleCellAddress(state.formulaAddress);
    return [Math.abs(end.row - start.row) + 1, Math.abs(end.col - start.col) + 1];
  }
  const value = plugin.evaluateAst(ast, state);
  return value instanceof SimpleRangeValue ? [value.height(), value.width()] : [1, 1];
}

function sizeOf(rows: unknown[][]): ArraySize {
  const height = Math.max(1, rows.length);
  // A loop, not Math.max(...widths): a table of 200 000 rows overflows the call stack as arguments.
  let width = 1;
  for (const r of rows) if (r.length > width) width = r.length;
  return new ArraySize(width, height);
}

let registered = false;

/** Registers the AQ functions once per process (HyperFormula keeps a global plugin registry). */
/** Ids of the AQ functions that return tables (their spill size is predicted before evaluation). */
export const TABLE_FUNCTIONS: readonly string[] = CATALOGUE.filter((e) => e.result !== "scalar").map((e) => `AQ.${e.id}`);

export function registerAqFunctions(): void {
  if (registered) return;
  const translations: Record<string, string> = {};
  for (const entry of CATALOGUE) translations[`AQ.${entry.id}`] = `AQ.${entry.id}`;
  HyperFormula.registerFunctionPlugin(buildPlugin() as never, { enGB: translations });
  registered = true;
}
