/**
 * Workbooks in and out via exceljs: formulas are read as "=…" text, values as values.
 *
 * A file saved by Excel spells some function names for the file format, not as a user types them:
 * functions newer than Excel 2007 carry "_xlfn." (and worksheet functions "_xlfn._xlws."), and an
 * add-in's custom function can be stored as "_xldudf_AQ_PH" (the form Excel also shows when the
 * add-in is not loaded). normaliseFormula gives back the typed form, so that such a workbook
 * evaluates here as it does in Excel with Protolyte loaded.
 */
import ExcelJS from "exceljs";
import type { RawCellContent } from "hyperformula";
import type { SheetResult } from "./evaluate";
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

function cellContent(value: ExcelJS.CellValue): RawCellContent {
  if (value === null || value === undefined) return null;
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  if (value instanceof Date) return value.toISOString();
  if (typeof value === "object") {
    if ("formula" in value && typeof value.formula === "string") return `=${normaliseFormula(value.formula)}`;
    if ("sharedFormula" in value) return null; // expanded by exceljs into the formula of its master cell
    if ("richText" in value) return value.richText.map((t) => t.text).join("");
    if ("text" in value && typeof value.text === "string") return value.text; // hyperlink
    if ("error" in value) return String(value.error);
  }
  return String(value);
}

export async function readWorkbook(file: string): Promise<Record<string, RawCellContent[][]>> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(file);
  const sheets: Record<string, RawCellContent[][]> = {};
  wb.eachSheet((ws) => {
    const rows: RawCellContent[][] = [];
    ws.eachRow({ includeEmpty: true }, (row, r) => {
      const cells: RawCellContent[] = [];
      row.eachCell({ includeEmpty: true }, (cell, c) => {
        const formula = cell.formula;
        cells[c - 1] = formula ? `=${normaliseFormula(formula)}` : cellContent(cell.value);
      });
      rows[r - 1] = Array.from(cells, (c) => c ?? null);
    });
    sheets[ws.name] = Array.from(rows, (r) => r ?? []);
  });
  return sheets;
}

export async function writeValues(file: string, results: SheetResult[]): Promise<void> {
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
  await wb.xlsx.writeFile(file);
}
