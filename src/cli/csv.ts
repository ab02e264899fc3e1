/**
 * CSV in and out (RFC 4180: comma separator, double-quoted fields, "" for a quote inside a field,
 * CRLF or LF line ends). Cells: empty → empty, a number → number, text starting with "=" → formula.
 */
import type { RawCellContent } from "hyperformula";
import type { CellResult } from "./evaluate";

export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  let i = 0;
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  while (i < body.length) {
    const ch = body[i];
    if (quoted) {
      if (ch === '"') {
        if (body[i + 1] === '"') {
          field += '"';
          i += 2;
          continue;
        }
        quoted = false;
        i++;
        continue;
      }
      field += ch;
      i++;
      continue;
    }
    if (ch === '"' && field === "") {
      quoted = true;
      i++;
    } else if (ch === ",") {
      row.push(field);
      field = "";
      i++;
    } else if (ch === "\n" || ch === "\r") {
      row.push(field);
      rows.push(row);
      row = [];
      field = "";
      i += ch === "\r" && body[i + 1] === "\n" ? 2 : 1;
    } else {
      field += ch;
      i++;
    }
  }
  if (quoted) throw new Error("CSV: a quoted field is not closed before the end of the file");
  if (field !== "" || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  return rows;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** One CSV field → what a user typing it into a cell would get. */
export function toCellContent(field: string): RawCellContent {
  const text = field.trim();
  if (text === "") return null;
  if (text.startsWith("=")) return text;
  if (NUMBER.test(text)) return Number(text);
  return field;
}

export function csvToSheet(text: string): RawCellContent[][] {
  return parseCsv(text).map((row) => row.map(toCellContent));
}

function quote(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function formatCell(cell: CellResult): string {
  if (cell === null) return "";
  if (typeof cell === "object") return cell.error;
  if (typeof cell === "number") return String(cell);
  return String(cell);
}

/**
 * Text that a spreadsheet would read as a formula when the CSV is opened (=, +, -, @, tab, CR at the
 * start) is written with a leading apostrophe, so computed text never becomes a live formula.
 */
function inert(cell: CellResult): string {
  const text = formatCell(cell);
  return typeof cell === "string" && /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

export function toCsv(values: CellResult[][]): string {
  return values.map((row) => row.map((c) => quote(inert(c))).join(",")).join("\n") + "\n";
}
