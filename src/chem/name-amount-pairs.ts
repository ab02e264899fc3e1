/**
 * How a mixture's names pair with its amounts, defined once for the functions (cells → mixture) and
 * the pane (a formula's values → its rows): two ranges of the same shape, paired cell by cell in
 * reading order; a pair with both cells blank is skipped (an empty cell of a number range may read
 * 0); a name without an amount, or an amount without a name, is an error; positions are counted
 * from 1 as a user counts. Each layer keeps its own reading of a cell's type (Excel's errors,
 * TRUE/FALSE) and of the amount's unit.
 */

/** Blank: nothing, or text of spaces only. */
export function isBlankCell(value: unknown): boolean {
  return value === null || value === undefined || (typeof value === "string" && value.trim() === "");
}

/** " (item 3)" for a single row or column, " (row 2, column 1)" for a table, "" for one cell. */
export function cellPosition(row: number, col: number, shape: readonly [number, number]): string {
  if (shape[0] === 1 && shape[1] === 1) return "";
  if (shape[1] === 1) return ` (item ${row + 1})`;
  if (shape[0] === 1) return ` (item ${col + 1})`;
  return ` (row ${row + 1}, column ${col + 1})`;
}

/** The message when the shapes differ, or null when they agree. */
export function pairShapeProblem(names: readonly [number, number], amounts: readonly [number, number]): string | null {
  if (names[0] === amounts[0] && names[1] === amounts[1]) return null;
  return `names is ${names[0]}×${names[1]} cells but amounts is ${amounts[0]}×${amounts[1]}: give one amount per name, paired cell by cell`;
}

/**
 * What the name and amount cells at one position make: "pair" (both given), "skip" (both blank) or
 * the message of a half-blank pair. The message is built only when needed (a sheet reads thousands).
 */
export function pairAt(name: unknown, amount: unknown, row: number, col: number, shape: readonly [number, number]): "pair" | "skip" | string {
  if (isBlankCell(name)) {
    if (isBlankCell(amount) || amount === 0) return "skip";
    return `amount ${String(amount)}${cellPosition(row, col, shape)} has no substance name beside it`;
  }
  if (isBlankCell(amount)) return `no amount for '${String(name).trim()}'${cellPosition(row, col, shape)}`;
  return "pair";
}

/** The message when every pair is blank. */
export const EMPTY_MIXTURE_MESSAGE = "the mixture is empty: give at least one substance name with its amount";
