/**
 * Row-wise tables: a whole what-if table in one formula. The one generic place where the functions
 * that give one value (PH, BETA, CAPACITY, IONIC, OSMOLARITY, CHECK, ADJUST, SPECIES of a named
 * species, OSMOLALITY) learn to take a table; each wrapper in functions.ts only hands its
 * implementation and arguments to `rowwise`.
 *
 * Shapes (decided by `tableRows`, used by Excel's call and by the headless engine's spill sizing):
 * - names one row of k names, amounts N×k with N ≥ 2 → N rows, row i being amounts row i;
 * - otherwise one mixture; if an argument after amounts is an N×1 column with N ≥ 2, the mixture is
 *   repeated for N rows (pH over a column of temperatures, say);
 * - every argument after amounts is one value or an N×1 column (one value per row); two columns of
 *   different lengths, or a block that is neither, are an error of the whole formula.
 * Anything else is one mixture, exactly as before: the result is one value, returned as a 1×1 table
 * (Excel shows it as the value; the functions are declared any[][] so that a table can spill).
 *
 * Per row: a blank row (every amount blank; with a fixed mixture, every column cell blank) gives a
 * blank cell; a bad row gives its own error value with its own message, in its own cell, and never
 * fails the table. Names are resolved once for the table: an unknown name is an error of the whole
 * formula (every row would show it).
 */
import { isBlank, shapeOf, text, type Cell } from "./args";
import { badInput, guard, toCustomFunctionsError } from "./errors";
import { readMixtureArgs, tableRowReader, withRowMixture } from "./mixture";
import { resolveComponent } from "./substances";

/** The implementation of a function that gives one value: names, amounts, then its other arguments. */
export type RowImplementation = (names: Cell, amounts: Cell, ...rest: Cell[]) => unknown;

const ORDINAL = ["1st", "2nd", "3rd"];
function ordinal(i: number): string {
  return ORDINAL[i] ?? `${i + 1}th`;
}

/**
 * Number of table rows for arguments of these shapes ([rows, columns] each, names and amounts
 * first), or 0 for one mixture (a single value). Never throws: shapes it cannot read as a table are
 * one mixture, and the function's own checks then name what is wrong.
 */
export function tableRows(shapes: readonly (readonly [number, number])[]): number {
  const [names, amounts] = shapes;
  let n = 0;
  if (names !== undefined && amounts !== undefined && names[0] === 1 && amounts[0] >= 2 && amounts[1] === names[1]) n = amounts[0];
  for (let i = 2; i < shapes.length; i++) {
    const [r, c] = shapes[i];
    if (c !== 1 || r < 2) continue;
    if (n === 0) n = r;
    else if (r !== n) return 0;
  }
  return n;
}

/** A 1×1 range → its cell; anything else unchanged. */
function unwrap(value: Cell): Cell {
  if (Array.isArray(value) && value.length === 1) {
    const row: unknown = value[0];
    if (!Array.isArray(row)) return row;
    if (row.length === 1) return row[0];
  }
  return value;
}

/**
 * Argument i (0-based, after names and amounts) where one value is expected: never a block. `rows`:
 * the number of rows of the table the amounts make (0 for one mixture), for the message.
 */
function single(value: Cell, i: number, rows = 0): Cell {
  const v = unwrap(value);
  if (Array.isArray(v)) {
    const [r, c] = shapeOf(v);
    const table = rows > 0 ? `but the table has ${rows} rows: give one value, or a column of ${rows}` : ": give one value, or a column with one value per row of a table";
    throw badInput(`the ${ordinal(i + 2)} argument is ${r}×${c} cells ${table}`.replace(" :", ":"));
  }
  return v;
}

/** Resolves every name of the row once, so that an unknown name fails the formula, not each row. */
function checkNames(names: Cell): void {
  const row: unknown = Array.isArray(names) ? names[0] : names;
  const cells: unknown[] = Array.isArray(row) ? row : [row];
  cells.forEach((cell) => {
    if (!isBlank(cell)) resolveComponent(typeof cell === "string" ? cell.trim() : text(cell, "name"));
  });
}

function rowIsBlank(row: unknown): boolean {
  if (!Array.isArray(row)) return isBlank(row);
  for (const cell of row) if (!isBlank(cell)) return false;
  return true;
}

/** One row's result as a cell: a value, or the error value with its message. */
function cellOf(result: unknown): unknown {
  const v = unwrap(result);
  if (Array.isArray(v)) {
    throw badInput("this gives a table, not one value, so it cannot fill one cell of a row-wise table (AQ.SPECIES: name the species)");
  }
  return v;
}

/**
 * Calls `impl` once (one mixture → a 1×1 table) or once per row (a table → an N×1 column), as the
 * shapes of the arguments say. A result that is already a table (AQ.SPECIES without a species) is
 * returned as it is.
 */
export function rowwise(impl: RowImplementation, names: Cell, amounts: Cell, ...rest: Cell[]): unknown[][] {
  return guard(() => {
    const n = tableRows([shapeOf(names), shapeOf(amounts), ...rest.map(shapeOf)]);
    if (n === 0) {
      const rows = tableRows([shapeOf(names), shapeOf(amounts)]); // > 0: a column of another length
      const result = impl(names, amounts, ...rest.map((v, i) => single(v, i, rows)));
      return Array.isArray(result) ? (result as unknown[][]) : [[result]];
    }
    const amountRows = Array.isArray(amounts) && amounts.length === n && shapeOf(names)[0] === 1 ? (amounts as unknown[][]) : null;
    const columns = rest.map((value, i) => {
      const [r, c] = shapeOf(value);
      if (r === n && c === 1 && n >= 2) return value as unknown[][];
      if (r === 1 && c === 1) return null;
      return single(value, i, n) as never; // throws: a block or a column of another length
    });
    // One mixture for every row: its errors are the formula's. A table of mixtures: its names are.
    if (amountRows === null) readMixtureArgs(names, amounts);
    else checkNames(names);
    // Rows of plain numbers are read in place, the names once (mixture.ts, tableRowReader).
    const reader = amountRows === null ? null : tableRowReader(names);
    const fixed = rest.map((v, i) => (columns[i] === null ? single(v, i) : undefined));
    const out: unknown[][] = new Array(n);
    // The call's arguments, filled in place per row (no spread, no closure per row); the row's
    // amounts go in one 1-row range reused for every row (nothing keeps it beyond its row's call).
    const call: [Cell, Cell, ...Cell[]] = [names, amounts, ...fixed];
    const oneRow: unknown[][] = [[]];
    if (amountRows !== null) call[1] = oneRow;
    for (let r = 0; r < n; r++) {
      const blank = amountRows !== null ? rowIsBlank(amountRows[r]) : columns.every((col) => col === null || isBlank(col[r][0]));
      if (blank) {
        out[r] = [""];
        continue;
      }
      if (amountRows !== null) oneRow[0] = amountRows[r];
      for (let i = 0; i < rest.length; i++) if (columns[i] !== null) call[i + 2] = columns[i]![r][0];
      try {
        const read = reader === null ? null : reader(amountRows![r]);
        out[r] = [cellOf(read === null ? impl.apply(undefined, call) : withRowMixture(names, call[1], read, impl, call))];
      } catch (error) {
        out[r] = [toCustomFunctionsError(error)];
      }
    }
    return out;
  });
}
