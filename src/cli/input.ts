/**
 * Reading the input file of `protolyte sheet`: recognised by its content (an XLSX renamed .csv is
 * read as a workbook, binary data is refused), decoded as Excel would (a byte-order mark means
 * UTF-8 or UTF-16; text that is not valid UTF-8 is read as Windows-1252, Excel's default CSV
 * encoding on Windows, and a note says so), checked against LIMITS before any evaluation.
 */
import { readFileSync, statSync } from "node:fs";
import { extname } from "node:path";
import type { RawCellContent } from "hyperformula";
import { parseCsvText, toCellContent } from "./csv";
import type { Workbook } from "./evaluate";
import { checkCellCount, checkSheetSize, LimitError, LIMITS, XLSX_CELLS_REASON } from "./limits";
import { readAddinSettings, workbookLibraryText } from "./workbook-library";
import { textPartKind, XmlPartScanner } from "./xlsx-text-limit";
import { listZip, streamZipEntry, type ZipEntry } from "./zip";

export class InputError extends Error {}

export interface LoadedInput {
  kind: "csv" | "xlsx";
  sheets: Workbook;
  /** The stored text of the workbook's own constants library, or null. */
  libraryText: string | null;
  /** One-line notes for stderr (encoding guessed, separator detected, content differs from the name). */
  notes: string[];
}

/** One line for a file system error, never a stack trace. */
export function describeFsError(error: unknown): string {
  const e = error as NodeJS.ErrnoException;
  switch (e.code) {
    case "ENOENT":
      return "no such file or directory";
    case "EACCES":
    case "EPERM":
      return "permission denied";
    case "EISDIR":
      return "it is a directory";
    case "ENOTDIR":
      return "a part of the path is not a directory";
    default:
      return e.message ?? String(error);
  }
}

const startsWith = (buffer: Buffer, bytes: number[]): boolean => bytes.every((b, i) => buffer[i] === b);

function decodeText(buffer: Buffer, notes: string[], file: string): string {
  if (startsWith(buffer, [0xef, 0xbb, 0xbf])) return buffer.toString("utf8", 3);
  if (startsWith(buffer, [0xff, 0xfe])) return new TextDecoder("utf-16le").decode(buffer.subarray(2));
  if (startsWith(buffer, [0xfe, 0xff])) return new TextDecoder("utf-16be").decode(buffer.subarray(2));
  if (buffer.subarray(0, 8192).includes(0)) throw new InputError(`'${file}' is not a text file (it holds NUL bytes); use a .csv or .xlsx file`);
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(buffer);
  } catch {
    notes.push(`'${file}' is not valid UTF-8: read as Windows-1252 (Excel's default CSV encoding on Windows)`);
    return new TextDecoder("windows-1252").decode(buffer);
  }
}

/** Rows × columns of each sheet and in total, against the limits; and every cell's length. */
function checkSheets(sheets: Workbook, kind: "csv" | "xlsx"): void {
  let total = 0;
  for (const [name, rows] of sheets) {
    let columns = 0;
    rows.forEach((row, r) => {
      columns = Math.max(columns, row?.length ?? 0);
      (row ?? []).forEach((cell, c) => {
        if (typeof cell !== "string") return;
        // A leading apostrophe is the engine's "text follows" mark (xlsx.ts, csv.ts), not the cell's text.
        const length = cell[0] === "'" ? cell.length - 1 : cell.length;
        if (length > LIMITS.cellChars) {
          throw new LimitError(`sheet '${name}' row ${r + 1} column ${c + 1} holds ${length} characters; a cell holds at most ${LIMITS.cellChars}`);
        }
      });
    });
    checkSheetSize(name, rows.length, columns);
    total += rows.length * columns;
  }
  checkCellCount(total, kind);
}

function readCsv(buffer: Buffer, file: string, separator: string | undefined, notes: string[]): Workbook {
  const text = decodeText(buffer, notes, file);
  const parsed = parseCsvText(text, separator);
  const decimalComma = parsed.separator === ";";
  if (separator === undefined && parsed.separator !== ",") {
    const name = parsed.separator === "\t" ? "tab" : `'${parsed.separator}'`;
    notes.push(`'${file}' read as ${name}-separated${decimalComma ? ", numbers with a decimal comma" : ""} (--separator to choose)`);
  }
  return new Map([["Sheet1", parsed.rows.map((row) => row.map((f) => toCellContent(f, decimalComma)))]]);
}

/** "1 row without its row number", "3 rows without their row number". */
const without = (n: number, thing: string, what: string): string => (n === 1 ? `1 ${thing} without its ${what}` : `${n} ${thing}s without their ${what}`);

/** The message for a sheet whose rows or cells lack their `r` attribute (xlsx-text-limit.ts). */
function unnumbered(file: string, part: string, scan: XmlPartScanner): string {
  const missing = [
    scan.rowsWithoutNumber > 0 ? without(scan.rowsWithoutNumber, "row", "row number") : null,
    scan.cellsWithoutAddress > 0 ? without(scan.cellsWithoutAddress, "cell", "address") : null,
  ].filter((x) => x !== null);
  return (
    `'${file}' is not read: its sheet ${part} has ${missing.join(" and ")} (the r attribute, which Excel always writes and the` +
    ` workbook reader used here needs); open the file in Excel or LibreOffice and save it again`
  );
}

/**
 * The package before exceljs loads it, at low memory: its declared sizes against the limit, then
 * every part inflated as a stream and held to its declared size (a package that lies about its sizes
 * is refused), the XML of the worksheets and shared strings scanned as it passes (xlsx-text-limit.ts):
 * a text longer than a cell holds, more rows than a sheet may have, or more cells than the sheets may
 * span, and the inflation stops there with one line. A sheet whose rows or cells lack their number
 * (the `r` attribute) is refused with one line too: exceljs cannot load it.
 */
async function checkPackage(buffer: Buffer, file: string): Promise<ZipEntry[]> {
  let entries;
  try {
    entries = listZip(buffer);
  } catch (e) {
    throw new InputError(`'${file}' is not a readable XLSX workbook: ${(e as Error).message}`);
  }
  const declared = entries.reduce((n, e) => n + e.uncompressedSize, 0);
  if (declared > LIMITS.unpackedBytes) {
    throw new LimitError(`'${file}' unpacks to ${(declared / 2 ** 20).toFixed(0)} MB; at most ${LIMITS.unpackedBytes / 2 ** 20} MB are read`);
  }
  let cellsBefore = 0; // <c> elements of the sheets scanned before this part
  for (const entry of entries) {
    const kind = textPartKind(entry.name);
    const scan = kind === null ? null : new XmlPartScanner(kind === "shared");
    try {
      await streamZipEntry(buffer, entry, (bytes) => {
        if (scan === null) return;
        scan.write(bytes);
        if (scan.longest > LIMITS.cellChars) {
          throw new LimitError(`'${file}' holds a text of at least ${scan.longest} characters (${entry.name}); a cell holds at most ${LIMITS.cellChars}`);
        }
        if (scan.rows > LIMITS.rows) throw new LimitError(`'${file}' has a sheet of more than ${LIMITS.rows} rows (${entry.name}); at most ${LIMITS.rows} are read`);
        if (cellsBefore + scan.cells > LIMITS.xlsxCells) {
          throw new LimitError(
            `'${file}' holds more than ${LIMITS.xlsxCells} cells (counted in its sheets' XML before loading); at most ${LIMITS.xlsxCells} are evaluated ${XLSX_CELLS_REASON}`,
          );
        }
      });
    } catch (e) {
      if (e instanceof LimitError) throw e;
      throw new InputError(`'${file}' is not a readable XLSX workbook: part ${entry.name}: ${(e as Error).message}`);
    }
    cellsBefore += scan?.cells ?? 0;
    if (scan !== null && (scan.rowsWithoutNumber > 0 || scan.cellsWithoutAddress > 0)) throw new InputError(unnumbered(file, entry.name, scan));
  }
  return entries;
}

export async function loadInput(file: string, options: { separator?: string; workbookLibrary: boolean }): Promise<LoadedInput> {
  let size: number;
  try {
    const stat = statSync(file);
    if (stat.isDirectory()) throw Object.assign(new Error("directory"), { code: "EISDIR" });
    size = stat.size;
  } catch (e) {
    throw new InputError(`cannot read '${file}': ${describeFsError(e)}`);
  }
  if (size > LIMITS.fileBytes) throw new LimitError(`'${file}' is ${(size / 2 ** 20).toFixed(1)} MB; at most ${LIMITS.fileBytes / 2 ** 20} MB are read`);
  let buffer: Buffer;
  try {
    buffer = readFileSync(file);
  } catch (e) {
    throw new InputError(`cannot read '${file}': ${describeFsError(e)}`);
  }
  const ext = extname(file).toLowerCase();
  const notes: string[] = [];
  const zip = startsWith(buffer, [0x50, 0x4b, 0x03, 0x04]);
  if (startsWith(buffer, [0xd0, 0xcf, 0x11, 0xe0])) throw new InputError(`'${file}' is an Excel 97–2003 (.xls) file or another OLE document; save it as .xlsx`);
  if (zip) {
    if (ext !== ".xlsx" && ext !== ".xlsm") notes.push(`'${file}' is an XLSX workbook by its content: read as one`);
    const entries = await checkPackage(buffer, file);
    const { readWorkbookBuffer } = await import("./xlsx");
    const sheets = await readWorkbookBuffer(buffer);
    checkSheets(sheets, "xlsx");
    const libraryText = options.workbookLibrary ? workbookLibraryText(readAddinSettings(buffer, entries)) : null;
    return { kind: "xlsx", sheets, libraryText, notes };
  }
  if (ext === ".xlsx" || ext === ".xlsm") throw new InputError(`'${file}' is not an XLSX workbook (it is not a ZIP package)`);
  if (![".csv", ".tsv", ".txt"].includes(ext)) throw new InputError(`cannot read '${file}': use a .csv or .xlsx file`);
  const sheets = readCsv(buffer, file, options.separator ?? (ext === ".tsv" ? "\t" : undefined), notes);
  checkSheets(sheets, "csv");
  return { kind: "csv", sheets, libraryText: null, notes };
}

export type { RawCellContent };
