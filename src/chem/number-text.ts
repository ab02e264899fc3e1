/**
 * What counts as a number in text, defined once for the functions, the pane and the command line:
 * decimal notation as a person types it ("7", "-0.5", ".5", "1e-3", "+2.", with "−" U+2212 read as
 * a minus sign). JavaScript's Number() alone would also read "0x10", "0b11", "0o17", "Infinity" and
 * "" (16, 3, 15, ∞, 0): text in a cell or a form field never means those.
 */

/**
 * A decimal number without its sign, as a regular-expression source (no capturing groups; use with
 * the "i" flag for "1E-3"), for code that finds a number inside longer text ("HCl 37 %").
 */
export const UNSIGNED_DECIMAL_SOURCE = String.raw`(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?`;
/** The whole text is one decimal number (after trimming). */
const DECIMAL = new RegExp(`^[+-]?${UNSIGNED_DECIMAL_SOURCE}$`, "i");
/** A decimal number at the start of the text (the rest may be a unit). */
const LEADING_DECIMAL = new RegExp(`^[+-]?${UNSIGNED_DECIMAL_SOURCE}`, "i");

/** The Unicode minus sign (U+2212), as word processors and some keyboards type it, read as "-". */
function asciiMinus(text: string): string {
  return text.replace(/\u2212/g, "-");
}

/**
 * The number the text spells, or null when it is not decimal text. ±Infinity when it is decimal text
 * too large for a double ("1e999"), so a caller can say so. `unicodeMinus: false` reads "−" as text,
 * as a spreadsheet does when the text is typed into a cell (the command line's CSV reader).
 */
export function parseDecimal(text: string, opts: { unicodeMinus?: boolean } = {}): number | null {
  const t = opts.unicodeMinus === false ? text.trim() : asciiMinus(text.trim());
  return DECIMAL.test(t) ? Number(t) : null;
}

/** A number with a decimal comma, optionally with points grouping thousands: 0,05  1.234,5  -2,5E-3. */
const COMMA_DECIMAL = /^[+-]?(\d{1,3}(\.\d{3})+|\d*)(,\d+)?(e[+-]?\d+)?$/i;
/** Points grouping thousands without a decimal part: "1.234" where the comma is the decimal mark. */
const GROUPED_THOUSANDS = /^[+-]?\d{1,3}\.\d{3}$/;

/**
 * Number text where "," is the decimal mark and "." groups thousands (a ";"-separated export of a
 * spreadsheet set to such a locale): "0,05", "1.234,5", "-2,5E-3"; plain decimal text such as "7"
 * or "0.5" is read as well, except "1.234" (a thousands group there). "−" is text, as in a cell.
 */
export function parseDecimalComma(text: string): number | null {
  const t = text.trim();
  if (DECIMAL.test(t) && !GROUPED_THOUSANDS.test(t)) return Number(t);
  if (/\d/.test(t) && COMMA_DECIMAL.test(t)) return Number(t.replace(/\./g, "").replace(",", "."));
  return null;
}

/** The finite number the text spells, or null (not decimal text, or too large for a double). */
export function readDecimal(text: string): number | null {
  const n = parseDecimal(text);
  return n !== null && Number.isFinite(n) ? n : null;
}

/**
 * The decimal number at the start of the text and the text after it (untrimmed), or null when the
 * text does not start with one. The number may be ±Infinity when it does not fit a double.
 */
export function leadingDecimal(text: string): { value: number; rest: string } | null {
  const t = asciiMinus(text);
  const m = LEADING_DECIMAL.exec(t);
  if (!m) return null;
  return { value: Number(m[0]), rest: t.slice(m[0].length) };
}
