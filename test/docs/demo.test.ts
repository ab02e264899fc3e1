/**
 * The demo workbook (examples/demo.csv, and examples/demo.xlsx written from it by
 * scripts/make-demo-xlsx.ts) evaluates headlessly as Excel would: no error cells except the
 * labelled deliberate ones, every AQ function used, and its identities hold — the RECIPE fed back
 * reads its target pH, the ADJUST result added to the batch reads the target pH. The XLSX holds the
 * same content with formulas as formulas, and is what the script writes today.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import ExcelJS from "exceljs";
import type { RawCellContent } from "hyperformula";
import { csvToSheet, formatCell } from "../../src/cli/csv";
import { evaluateSheets, type SheetResult } from "../../src/cli/evaluate";
import { readWorkbook } from "../../src/cli/xlsx";
import { CATALOGUE } from "../../src/functions/catalogue";
import { DEMO_SHEET_NAME, makeDemoWorkbook } from "../../scripts/make-demo-xlsx";

const CSV = join(__dirname, "..", "..", "examples", "demo.csv");
const XLSX = join(__dirname, "..", "..", "examples", "demo.xlsx");

const csvText = readFileSync(CSV, "utf8");
const csvCells = csvToSheet(csvText);
let csvResult: SheetResult;
let xlsxCells: RawCellContent[][];
let xlsxResult: SheetResult;

beforeAll(async () => {
  [csvResult] = evaluateSheets({ Sheet1: csvCells });
  const sheets = await readWorkbook(XLSX);
  expect([...sheets.keys()]).toEqual([DEMO_SHEET_NAME]);
  // Text cells of a workbook come with the engine's "text follows" apostrophe: drop it here.
  xlsxCells = sheets.get(DEMO_SHEET_NAME)!.map((row) => row.map((c) => (typeof c === "string" && c.startsWith("'") ? c.slice(1) : c)));
  [xlsxResult] = evaluateSheets(sheets);
}, 120_000);

/** Row index (0-based) of the row whose label in column A starts with `prefix`. */
function rowOf(cells: RawCellContent[][], prefix: string): number {
  const i = cells.findIndex((row) => typeof row[0] === "string" && row[0].startsWith(prefix));
  if (i < 0) throw new Error(`no row labelled "${prefix}…" in the demo`);
  return i;
}

function numberAt(result: SheetResult, r: number, c: number): number {
  const v = result.values[r]?.[c];
  if (typeof v !== "number") throw new Error(`expected a number at row ${r + 1}, column ${c + 1}, got ${JSON.stringify(v)}`);
  return v;
}

function expectWithin(actual: number, expected: number, tolerance: number, what: string): void {
  if (!(Math.abs(actual - expected) <= tolerance)) throw new Error(`${what}\n  actual   ${actual}\n  expected ${expected} ± ${tolerance}`);
}

describe.each([
  ["examples/demo.csv", () => ({ cells: csvCells, result: csvResult })],
  ["examples/demo.xlsx", () => ({ cells: xlsxCells, result: xlsxResult })],
])("%s", (_file, get) => {
  test("has no error cells except the labelled deliberate ones, and each of those is an error", () => {
    const { cells, result } = get();
    const deliberate = new Set(cells.flatMap((row, r) => (typeof row[0] === "string" && row[0].startsWith("DELIBERATE") ? [r + 1] : [])));
    const unexpected = result.errors.filter((e) => !deliberate.has(Number(e.address.replace(/^[A-Z]+/, ""))));
    expect(unexpected).toEqual([]);
    expect(deliberate.size).toBeGreaterThan(0);
    for (const r of deliberate) expect(result.errors.some((e) => e.address === `B${r}`)).toBe(true);
    expect(result.errors.map((e) => e.error).sort()).toEqual(["#N/A", "#VALUE!"]);
  });

  test("uses every AQ function", () => {
    const { cells } = get();
    const formulas = cells.flat().filter((c): c is string => typeof c === "string" && c.startsWith("="));
    for (const { id } of CATALOGUE) expect({ id, used: formulas.some((f) => f.includes(`AQ.${id}(`)) }).toEqual({ id, used: true });
  });

  test("the RECIPE fed back through AQ.PH reads its target pH (5 °C and the gel at 25 °C)", () => {
    const { cells, result } = get();
    const target = numberAt(result, rowOf(cells, "target pH"), 1);
    // Rounded to 3 decimals in the sheet: ±0.0005.
    expectWithin(numberAt(result, rowOf(cells, "check: pH at 5 degC (reads the target)"), 1), target, 0.0005, "recipe fed back at 5 °C");
    expectWithin(numberAt(result, rowOf(cells, "check: pH of the gel buffer"), 1), 5, 0.0005, "gel recipe fed back at 25 °C");
  });

  test("the ADJUST result added to the batch reads the target pH", () => {
    const { cells, result } = get();
    const target = numberAt(result, rowOf(cells, "target pH"), 1);
    const litres = numberAt(result, rowOf(cells, "1 M NaOH to add"), 1);
    expect(litres).toBeGreaterThan(0);
    // The sheet rounds the litres to 1 mL of 800 L and the pH to 3 decimals: within 0.001 pH.
    expectWithin(numberAt(result, rowOf(cells, "check: pH after the addition"), 1), target, 0.001, "pH after the ADJUST addition");
  });

  test("RECIPE with the NaCl held fixed reads the target fed back; the recipe without it misses; ADJUST from the measured pH equals the back-fit", () => {
    const { cells, result } = get();
    const target = numberAt(result, rowOf(cells, "target pH"), 1);
    expectWithin(numberAt(result, rowOf(cells, "check: pH of HB-217S"), 1), target, 0.0005, "saline recipe fed back at 5 °C");
    expect(Math.abs(numberAt(result, rowOf(cells, "pH at 5 degC (misses the target)"), 1) - target)).toBeGreaterThan(0.01);
    expect(result.values[rowOf(cells, "same as the back-fit of section 7?")][1]).toBe("yes");
  });

  test("AQ.OSMOLALITY of the sucrose-made-isotonic HB-217 reads above its ideal osmolarity", () => {
    const { cells, result } = get();
    expect(numberAt(result, rowOf(cells, "HB-217 (mOsm/kg"), 1)).toBeGreaterThan(numberAt(result, rowOf(cells, "ideal osmolarity (mOsm/L)"), 1));
  });

  test("the specification block and the what-if grid compute", () => {
    const { cells, result } = get();
    expect(result.values[rowOf(cells, "band inside the specification?")][1]).toBe("yes");
    const grid = rowOf(cells, "total (mol/L)");
    for (let r = grid + 1; r <= grid + 3; r++) for (let c = 3; c <= 5; c++) expect(numberAt(result, r, c)).toBeGreaterThan(5);
  });

  test("section 17: TD-3 made with 37 % HCl as supplied reads its target fed back; grams over mL is the reagent's density; the band at 5 ± 3 °C holds it; 50 % NaOH carries section 14's NaOH", () => {
    const { cells, result } = get();
    // Rounded to 3 decimals in the sheet: ±0.0005.
    expectWithin(numberAt(result, rowOf(cells, "check: pH of TD-3"), 1), 8, 0.0005, "TD-3 fed back at 5 °C");
    const ml = numberAt(result, rowOf(cells, "37 % HCl to measure (mL"), 1);
    const g = numberAt(result, rowOf(cells, "37 % HCl to weigh instead (g"), 1);
    // 37 % HCl is 1.18–1.19 g/mL at 20 °C (docs/references.md, section 8); both rounded to 0.01
    expect(g / ml).toBeGreaterThan(1.17);
    expect(g / ml).toBeLessThan(1.2);
    const worst = rowOf(cells, "TD-3 at 5 +/- 3 degC, worst case");
    const gum = rowOf(cells, "TD-3 at 5 +/- 3 degC, GUM band");
    expect(numberAt(result, worst, 1)).toBeLessThan(8);
    expect(numberAt(result, worst, 2)).toBeGreaterThan(8);
    expect(numberAt(result, gum, 1)).toBeGreaterThanOrEqual(numberAt(result, worst, 1));
    expect(numberAt(result, gum, 2)).toBeLessThanOrEqual(numberAt(result, worst, 2));
    // 50 % NaOH (about 19 mol/L) in mL against section 14's litres of 1 M NaOH: the same mol within 2 % (less dilution, rounding)
    const mol50 = (numberAt(result, rowOf(cells, "50 % NaOH for HB-217-B07"), 1) / 1000) * 19.07;
    const mol1 = numberAt(result, rowOf(cells, "1 M NaOH to add from the measured pH"), 1);
    expect(Math.abs(mol50 - mol1) / mol1).toBeLessThan(0.02);
  });

  test("the what-if grid written as one row-wise formula per column spills the same values", () => {
    const { cells, result } = get();
    expect(result.values[rowOf(cells, "same as the grid of section 10?")][1]).toBe("yes");
  });
});

describe("demo content", () => {
  test("states that it is fictional and carries the cautions", () => {
    expect(csvText).toMatch(/Halvorsen Biologics/);
    expect(csvText).toMatch(/Fictional company and product/);
    expect(csvText).toMatch(/invented/);
    expect(csvText).toMatch(/calibrated pH meter/);
    expect(csvText).toMatch(/corrosive/);
    expect(csvText).toMatch(/Validated procedures, pharmacopoeial methods and local regulations/);
  });

  test("prints readably in a terminal (npm start): no row wider than 110 columns before its last cell's text", () => {
    // A long text in the last cell of a row (an AQ.CHECK verdict with its reasons) wraps at the end of
    // the line without pushing any column; everything before it must fit, and start within 80.
    for (const row of csvResult.values) {
      const cells = row.map(formatCell);
      while (cells.length > 0 && cells[cells.length - 1] === "") cells.pop();
      const last = cells[cells.length - 1] ?? "";
      const lastIsText = cells.length > 1 && Number.isNaN(Number(last));
      const line = (lastIsText ? cells.slice(0, -1) : cells).join("\t");
      let width = 0;
      for (const ch of line) width = ch === "\t" ? width + 8 - (width % 8) : width + 1;
      expect({ line, ok: lastIsText ? width <= 80 : width <= 110 }).toEqual({ line, ok: true });
    }
  });

  test("the XLSX evaluates to exactly the values of the CSV", () => {
    expect(xlsxResult.values).toEqual(csvResult.values);
  });

  test("the XLSX keeps formulas as formulas, table functions as array formulas over their spill, with a title and column widths", async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(XLSX);
    const ws = wb.getWorksheet(DEMO_SHEET_NAME)!;
    expect(String(ws.getCell("A1").value)).toMatch(/^Halvorsen Biologics/);
    expect(ws.getCell("A1").font?.bold).toBe(true);
    expect(ws.getColumn(1).width).toBeGreaterThanOrEqual(40);
    const recipe = ws.getCell(rowOf(csvCells, "1. RECIPE") + 2, 1).value as ExcelJS.CellFormulaValue & { shareType?: string; ref?: string };
    expect(recipe.formula).toMatch(/^AQ\.RECIPE\(/);
    expect(recipe.shareType).toBe("array");
    expect(recipe.ref).toMatch(/^A\d+:D\d+$/);
    expect(ws.getCell(rowOf(csvCells, "pH at 5 degC") + 1, 2).formula).toMatch(/AQ\.PH\(/);
  });

  test("examples/demo.xlsx is what scripts/make-demo-xlsx.ts writes from demo.csv today (npm run demo:xlsx)", async () => {
    const fresh = await makeDemoWorkbook(csvText);
    const onDisk = new ExcelJS.Workbook();
    await onDisk.xlsx.readFile(XLSX);
    const dump = (wb: ExcelJS.Workbook) => {
      const out: string[] = [];
      wb.eachSheet((ws) => ws.eachRow((row, r) => row.eachCell((cell, c) => out.push(`${ws.name}!${r},${c}=${JSON.stringify(cell.value)}`))));
      return out;
    };
    expect(dump(onDisk)).toEqual(dump(fresh));
  });
});
