/**
 * Workbooks in and out via exceljs: formulas are read as "=…" text, values as values.
 *
 * A file saved by Excel spells some function names for the file format, not as a user types them:
 * functions newer than Excel 2007 carry "_xlfn." (and worksheet functions "_xlfn._xlws."), and an
 * add-in's custom function can be stored as "_xldudf_AQ_PH" (the form Excel also shows when the
 * add-in is not loaded). normaliseFormula gives back the typed form, so that such a workbook
 * evaluates here as it does in Excel with Protolyte loaded.
 *
 * Cells are read as Excel holds them: a text cell is text even when it reads "=HYPERLINK(…)" or
 * "0.05", and a date or time is its serial number (so =A1+30 and a temperature in a cell formatted
 * h:mm compute as in Excel).
 */
import ExcelJS from "exceljs";
import type { RawCellContent } from "hyperformula";
import { readFileSync } from "node:fs";
import type { SheetResult, Workbook } from "./evaluate";
import { formatCell } from "./csv";

/** The formula as a user types it: "_xlfn." / "_xlws." prefixes dropped, "_xldudf_AQ_PH(" → "AQ.PH(". Text in quotes is left alone. */
export function normaliseFormula(formula: string): string {
  // Outside string literals only: split on quotes (Excel doubles a quote inside a string, which
  // keeps the even-numbered pieces outside every string).
  return formula
    .split('"')
    .map((piece, i) =>
      i % 2 === 1
        ? piece
        : piece.replace(/_xlfn\.(?:_xlws\.)?/gi, "").replace(/_xldudf_AQ_([A-Z][A-Z0-9_]*)(?=\s*\()/gi, (_m, id: string) => `AQ.${id.toUpperCase()}`),
    )
    .join('"');
}

/** Excel's serial number of a date (days since 1899-12-30 in the 1900 date system, since 1904-01-01 in the 1904 one). */
export function dateSerial(date: Date, date1904 = false): number {
  const base = date1904 ? Date.UTC(1904, 0, 1) : Date.UTC(1899, 11, 30);
  return (date.getTime() - base) / 86_400_000;
}

/** Text as the engine must keep it: a leading apostrophe means "text follows", so "=HYPERLINK(…)" or "0.05" stays text. */
const asText = (text: string): RawCellContent => (text === "" ? null : `'${text}`);

function cellContent(value: ExcelJS.CellValue, date1904: boolean): RawCellContent {
  if (value === null || value === undefined) return null;
  if (typeof value === "number" || typeof value === "boolean") return value;
  if (typeof value === "string") return asText(value);
  if (value instanceof Date) return dateSerial(value, date1904);
  if (typeof value === "object") {
    if ("formula" in value && typeof value.formula === "string") return `=${normaliseFormula(value.formula)}`;
    if ("sharedFormula" in value) return null; // expanded by exceljs into the formula of its master cell
    if ("richText" in value) return asText(value.richText.map((t) => t.text).join(""));
    if ("text" in value && typeof value.text === "string") return asText(value.text); // hyperlink
    if ("error" in value) return String(value.error);
  }
  return asText(String(value));
}

/** The sheets of an XLSX package (already checked against the limits by its declared sizes). */
export async function readWorkbookBuffer(buffer: Buffer): Promise<Workbook> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(buffer as never);
  const date1904 = Boolean((wb.properties as { date1904?: boolean }).date1904);
  const sheets: Workbook = new Map();
  wb.eachSheet((ws) => {
    const rows: RawCellContent[][] = [];
    ws.eachRow({ includeEmpty: true }, (row, r) => {
      const cells: RawCellContent[] = [];
      row.eachCell({ includeEmpty: true }, (cell, c) => {
        const formula = cell.formula;
        cells[c - 1] = formula ? `=${normaliseFormula(formula)}` : cellContent(cell.value, date1904);
      });
      rows[r - 1] = Array.from(cells, (c) => c ?? null);
    });
    sheets.set(ws.name, Array.from(rows, (r) => r ?? []));
  });
  return sheets;
}

export async function readWorkbook(file: string): Promise<Workbook> {
  return readWorkbookBuffer(readFileSync(file));
}

/** The values as an XLSX package (every sheet given); errors are written as their error text. */
export async function workbookBytes(results: SheetResult[]): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  for (const sheet of results) {
    const ws = wb.addWorksheet(sheet.name);
    sheet.values.forEach((row, r) =>
      row.forEach((cell, c) => {
        if (cell === null) return;
        ws.getCell(r + 1, c + 1).value = typeof cell === "object" ? formatCell(cell) : cell;
      }),
    );
  }
  return Buffer.from(await wb.xlsx.writeBuffer());
}
