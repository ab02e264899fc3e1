/**
 * CSV in and out. Reading: papaparse splits the text (RFC 4180 quoting, CRLF or LF) with the
 * separator given or detected among , ; tab |; each field then becomes what Excel makes of it when
 * it opens the file: empty → empty, a number → number (with a decimal comma in a ";"-separated
 * file, the usual export where the comma is the decimal mark), a field whose first character is
 * "=" → formula, anything else → text (" =1+1" with a leading space stays text, as in Excel).
 * Writing: UTF-8 with a byte-order mark and CRLF line ends (what Excel opens correctly), every
 * field holding , ; " tab CR or LF quoted, and text that a spreadsheet would run as a formula
 * neutralised (see inert()).
 */
import Papa from "papaparse";
import type { RawCellContent } from "hyperformula";
import { parseDecimal, parseDecimalComma } from "../chem/number-text";
import type { CellResult } from "./evaluate";

export class CsvError extends Error {}

export interface ParsedCsv {
  rows: string[][];
  separator: string;
}

const GUESS = [",", ";", "\t", "|"];

/** Splits CSV text into rows of fields. `separator`: one character, or undefined to detect it. */
export function parseCsvText(text: string, separator?: string): ParsedCsv {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  // Detection looks at the first rows without the empty ones (an empty row has one field under any
  // separator and would spoil papaparse's count); the file is then read with every row in place.
  const delimiter = separator ?? (Papa.parse<string[]>(body, { preview: 50, skipEmptyLines: "greedy", delimitersToGuess: GUESS }).meta.delimiter || ",");
  const result = Papa.parse<string[]>(body, { delimiter, skipEmptyLines: false });
  const broken = result.errors.find((e) => e.type === "Quotes");
  if (broken) throw new CsvError(`CSV: ${broken.message.toLowerCase()} (row ${(broken.row ?? 0) + 1})`);
  const rows = result.data;
  // A final line end gives one empty field after it: not a row.
  while (rows.length > 0 && rows[rows.length - 1]!.length === 1 && rows[rows.length - 1]![0] === "") rows.pop();
  return { rows, separator: delimiter };
}

/** Rows of fields (comma-separated unless another separator is detected). */
export function parseCsv(text: string): string[][] {
  return parseCsvText(text).rows;
}

/** One CSV field → what a user typing it into a cell would get. `decimalComma`: the file's numbers use "," as decimal mark. */
export function toCellContent(field: string, decimalComma = false): RawCellContent {
  if (field === "") return null;
  if (field[0] === "=") return field.length > 1 ? field : "'=";
  const text = field.trim();
  if (text === "") return field;
  // Number text: src/chem/number-text.ts ("−" stays text, as when typed into a cell). With decimal
  // commas, "1.234" is one thousand two hundred and thirty-four, not a decimal point number.
  const n = decimalComma ? parseDecimalComma(text) : parseDecimal(text, { unicodeMinus: false });
  if (n !== null) return n;
  // The engine reads a leading apostrophe as "text follows": keep one the file really has.
  return field[0] === "'" ? `'${field}` : field;
}

/** Decimal commas are read in a ";"-separated file (the export of Excel where "," is the decimal mark). */
export function csvToSheet(text: string, separator?: string): RawCellContent[][] {
  const parsed = parseCsvText(text, separator);
  const decimalComma = parsed.separator === ";";
  return parsed.rows.map((row) => row.map((f) => toCellContent(f, decimalComma)));
}

function quote(text: string): string {
  return /[",;\t\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function formatCell(cell: CellResult): string {
  if (cell === null) return "";
  if (typeof cell === "object") return cell.error;
  return String(cell);
}

/**
 * Computed text that a spreadsheet would read as a formula when the CSV is opened (=, +, -, @, tab,
 * CR at the start, or right after a separator character inside the text, for a reader that splits
 * at another separator than ours) gets an apostrophe before it, so it never becomes a live formula.
 */
function inert(cell: CellResult): string {
  const text = formatCell(cell);
  if (typeof cell !== "string") return text;
  return text.replace(/^[=+\-@\t\r]/, "'$&").replace(/([,;\t|])([=+\-@])/g, "$1'$2");
}

/** CSV text for Excel: UTF-8 byte-order mark, CRLF line ends. */
export function toCsv(values: CellResult[][]): string {
  return `\ufeff${values.map((row) => row.map((c) => quote(inert(c))).join(",")).join("\r\n")}\r\n`;
}
