/**
 * npm run demo:xlsx — writes examples/demo.xlsx from examples/demo.csv (the one source of the demo's
 * content), with formulas as formulas, so the workbook opens in Excel with the add-in and computes
 * there. The sheet is also evaluated headlessly here, only to learn how far each table function
 * spills: those formulas are written as array formulas over exactly that range (a plain formula in
 * a file without dynamic-array metadata would show only its first cell in Excel). Column widths, a
 * title style and the section headings are set; values are not stored, so nothing stale is shipped.
 *
 *   npx tsx scripts/make-demo-xlsx.ts [IN.csv] [OUT.xlsx]
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import ExcelJS from "exceljs";
import type { RawCellContent } from "hyperformula";
import { csvToSheet } from "../src/cli/csv";
import { columnName, evaluateSheets } from "../src/cli/evaluate";
import { CATALOGUE } from "../src/functions/catalogue";

const root = join(__dirname, "..");
const input = process.argv[2] ?? join(root, "examples", "demo.csv");
const output = process.argv[3] ?? join(root, "examples", "demo.xlsx");

export const DEMO_SHEET_NAME = "HB-217 demo";

/** AQ functions that return a table (they spill). */
const TABLE_FUNCTIONS = CATALOGUE.filter((c) => c.result === "matrix").map((c) => `AQ.${c.id}(`);

const WIDTHS = [56, 20, 20, 16, 22, 12];

interface ArrayFormulaSheet {
  fillFormula(range: string, formula: string, results: undefined, shareType: "array" | "shared"): void;
}

function isTableFormula(text: string): boolean {
  const t = text.trim();
  return TABLE_FUNCTIONS.some((f) => t.startsWith(`=${f}`));
}

/** How many rows and columns the table formula at (r, c) fills, from the headless evaluation. */
function spillSize(values: unknown[][], cells: RawCellContent[][], r: number, c: number): { rows: number; cols: number } {
  let rows = 1;
  while (r + rows < values.length && (cells[r + rows]?.[c] ?? null) === null && values[r + rows]?.[c] !== null && values[r + rows]?.[c] !== undefined) rows++;
  let cols = 1;
  while ((cells[r]?.[c + cols] ?? null) === null && values[r]?.[c + cols] !== null && values[r]?.[c + cols] !== undefined) cols++;
  return { rows, cols };
}

export async function makeDemoWorkbook(csvText: string): Promise<ExcelJS.Workbook> {
  const cells = csvToSheet(csvText);
  const [evaluated] = evaluateSheets({ Sheet1: cells });
  const wb = new ExcelJS.Workbook();
  wb.creator = "Protolyte demo (scripts/make-demo-xlsx.ts)";
  wb.calcProperties.fullCalcOnLoad = true;
  const ws = wb.addWorksheet(DEMO_SHEET_NAME, { views: [{ state: "frozen", ySplit: 1 }] });
  ws.columns = WIDTHS.map((width) => ({ width }));

  cells.forEach((row, r) => {
    row.forEach((content, c) => {
      if (content === null || content === undefined) return;
      const cell = ws.getCell(r + 1, c + 1);
      if (typeof content === "string" && content.startsWith("=")) {
        if (isTableFormula(content)) {
          const size = spillSize(evaluated.values, cells, r, c);
          const ref = `${columnName(c)}${r + 1}:${columnName(c + size.cols - 1)}${r + size.rows}`;
          // exceljs supports shareType "array" at run time; its typings omit the fourth parameter.
          (ws as unknown as ArrayFormulaSheet).fillFormula(ref, content.slice(1), undefined, "array");
        } else {
          cell.value = { formula: content.slice(1) } as ExcelJS.CellFormulaValue;
        }
      } else {
        cell.value = content as ExcelJS.CellValue;
      }
    });
  });

  // Styles: the title, the cautions, the block headings, the deliberate errors.
  ws.getCell("A1").font = { bold: true, size: 14, color: { argb: "FF124E66" } };
  for (let r = 2; r <= 4; r++) ws.getCell(r, 1).font = { italic: true, color: { argb: "FF8A3324" } };
  cells.forEach((row, r) => {
    const label = row[0];
    if (typeof label !== "string") return;
    if (/^(\d+\. |INPUTS$)/.test(label)) ws.getCell(r + 1, 1).font = { bold: true, color: { argb: "FF124E66" } };
    if (label.startsWith("DELIBERATE")) ws.getRow(r + 1).font = { italic: true, color: { argb: "FF8A3324" } };
  });
  return wb;
}

async function main(): Promise<void> {
  const wb = await makeDemoWorkbook(readFileSync(input, "utf8"));
  await wb.xlsx.writeFile(output);
  process.stdout.write(`wrote ${output}\n`);
}

if (require.main === module) {
  main().catch((error) => {
    process.stderr.write(`${(error as Error).stack ?? String(error)}\n`);
    process.exit(1);
  });
}
