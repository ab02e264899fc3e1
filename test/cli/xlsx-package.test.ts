/**
 * An XLSX package is checked before exceljs loads it (src/cli/input.ts, checkPackage): its declared
 * sizes, then every part inflated as a stream and held to its declared size, the sheets' XML counted
 * as it passes. Zip bombs and oversized workbooks, built here as real packages (test/cli/support/
 * zip-parts.ts), end in one line and exit 2 with the program's heap capped at 160 MB: a package that
 * were inflated in memory or loaded by exceljs would run out of that heap (hundreds of MB) and crash.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { LIMITS } from "../../src/cli/limits";
import { requireBuild, run } from "./support/run";
import { workbookBuffer } from "./support/workbook-with-library";
import { deflatedRepeat, readParts, writeParts, type PackedPart } from "./support/zip-parts";

const SHEET = "xl/worksheets/sheet1.xml";
const HEAD = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?><worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData>';
const TAIL = "</sheetData></worksheet>";
/** The program's heap, capped: what a package costs before it is refused must fit in it. */
const LOW_MEMORY = ["--max-old-space-size=160"];

let dir = "";
let base: Map<string, Buffer | string | PackedPart> = new Map();
beforeAll(async () => {
  requireBuild();
  dir = mkdtempSync(join(tmpdir(), "protolyte-package-"));
  base = readParts(await workbookBuffer({ S: [[1]] }));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The one-cell workbook with its sheet part replaced. */
function packageWith(sheet: PackedPart, name: string): string {
  const parts = new Map(base);
  parts.set(SHEET, sheet);
  const file = join(dir, name);
  writeFileSync(file, writeParts(parts));
  return file;
}

function expectRefused(file: string, message: RegExp): void {
  const r = run(["sheet", file], { node: LOW_MEMORY });
  expect(r.err).toMatch(message);
  expect(r.code).toBe(2);
  expect(r.out).toBe("");
  expect(r.err.trim().split("\n")).toHaveLength(1);
  expect(r.err).not.toMatch(/\n\s+at |heap out of memory/i);
}

const row = (cells: number): string => `<row>${"<c><v>1</v></c>".repeat(cells)}</row>`;

test("a zip bomb that tells its size (300 MB of XML packed over 100 to 1): refused by the declared size", async () => {
  const bomb = await deflatedRepeat(HEAD, row(20), 1_000_000, TAIL);
  expect(bomb.size).toBeGreaterThan(LIMITS.unpackedBytes);
  expect(bomb.packed.length * 100).toBeLessThan(bomb.size);
  expectRefused(packageWith(bomb, "honest-bomb.xlsx"), new RegExp(`unpacks to ${(bomb.size / 2 ** 20).toFixed(0)} MB; at most 256 MB are read`));
});

test("a zip bomb that lies (declares 1 kB, unpacks to 300 MB): refused while inflating, after its first kilobyte", async () => {
  const bomb = await deflatedRepeat(HEAD, row(20), 1_000_000, TAIL);
  expectRefused(packageWith({ ...bomb, declared: 1024 }, "lying-bomb.xlsx"), /not a readable XLSX workbook: part xl\/worksheets\/sheet1\.xml: it unpacks to more than the 1024 bytes its directory declares/);
});

test("within the byte limits, more cells than the limit: refused from the sheet's XML before loading", async () => {
  // 5 200 000 cells in 200 000 rows, 86 MB of XML (each a <c> with a value).
  const sheet = await deflatedRepeat(HEAD, row(26), 200_000, TAIL);
  expect(sheet.size).toBeLessThan(LIMITS.unpackedBytes);
  expectRefused(packageWith(sheet, "many-cells.xlsx"), new RegExp(`holds more than ${LIMITS.xlsxCells} cells \\(counted in its sheets' XML before loading\\)`));
});

test("a workbook's own cell limit (its reader's memory): just over it is refused before loading, with the reason", async () => {
  // Below the CSV limit, above the workbook one: 60 000 rows of 26 cells.
  expect(LIMITS.xlsxCells).toBeLessThan(LIMITS.cells);
  const rows = Math.floor(LIMITS.xlsxCells / 26) + 1;
  const sheet = await deflatedRepeat(HEAD, row(26), rows, TAIL);
  expectRefused(
    packageWith(sheet, "over-xlsx-cells.xlsx"),
    new RegExp(`holds more than ${LIMITS.xlsxCells} cells .* at most ${LIMITS.xlsxCells} are evaluated from an XLSX workbook, whose reader needs about 1 kB of memory a cell \\(a CSV file may span ${LIMITS.cells}\\)`),
  );
});

test("a workbook whose rectangle (A1 to the last filled cell) passes its limit, with few cells: refused after loading", async () => {
  const rows = Math.floor(LIMITS.xlsxCells / 1000) + 1;
  const sheet = await deflatedRepeat(HEAD, '<row r="1"><c r="A1"><v>1</v></c></row>', 1, `<row r="${rows}"><c r="ALL${rows}"><v>2</v></c></row>${TAIL}`);
  expectRefused(packageWith(sheet, "wide-rectangle.xlsx"), new RegExp(`span ${rows * 1000} cells .* at most ${LIMITS.xlsxCells} are evaluated from an XLSX workbook`));
});

test("more rows than the limit: refused from the sheet's XML before loading", async () => {
  const sheet = await deflatedRepeat(HEAD, row(1), LIMITS.rows + 1, TAIL);
  expectRefused(packageWith(sheet, "many-rows.xlsx"), new RegExp(`has a sheet of more than ${LIMITS.rows} rows \\(xl/worksheets/sheet1\\.xml\\)`));
});

test("a sheet hidden under another folder, which exceljs loads as a sheet all the same, is counted as well", async () => {
  const parts = new Map(base);
  parts.set("a/xl/worksheets/sheet9.xml", await deflatedRepeat(HEAD, row(1), LIMITS.rows + 1, TAIL));
  const file = join(dir, "hidden-sheet.xlsx");
  writeFileSync(file, writeParts(parts));
  expectRefused(file, /has a sheet of more than 200000 rows \(a\/xl\/worksheets\/sheet9\.xml\)/);
});

test("a sheet written with a namespace prefix (<x:row>, <x:c>) is counted as well", async () => {
  const sheet = await deflatedRepeat(HEAD, "<x:row><x:c><x:v>1</x:v></x:c></x:row>", LIMITS.rows + 1, TAIL);
  expectRefused(packageWith(sheet, "prefixed.xlsx"), /has a sheet of more than 200000 rows/);
});

test("a sheet whose rows or cells lack their number (no r attribute, which exceljs needs): refused in one line that says so", async () => {
  // The format allows it; Excel always writes r. exceljs stopped with "internal error: Invalid row number in model".
  const rows = await deflatedRepeat(HEAD, '<row><c r="A1"><v>1</v></c></row>', 3, TAIL);
  expectRefused(packageWith(rows, "rows-without-r.xlsx"), /sheet xl\/worksheets\/sheet1\.xml has 3 rows without their row number \(the r attribute, .*save it again\n?$/);
  const cells = await deflatedRepeat(HEAD, '<row r="1"><c><v>1</v></c></row>', 1, TAIL);
  expectRefused(packageWith(cells, "cells-without-r.xlsx"), /has 1 cell without its address \(the r attribute/);
  const both = await deflatedRepeat(HEAD, "<row><c><v>1</v></c><c><v>2</v></c></row>", 2, TAIL);
  expectRefused(packageWith(both, "neither-r.xlsx"), /has 2 rows without their row number and 4 cells without their address/);
});

test("a workbook within the limits still loads under the same heap cap", async () => {
  const sheet = await deflatedRepeat(HEAD, '<row r="1"><c r="A1"><v>2</v></c></row>', 1, TAIL);
  const r = run(["sheet", packageWith(sheet, "small.xlsx"), "--json"], { node: LOW_MEMORY });
  expect(r.err).toMatch(/^protolyte: sheet 'S', 0 error cells/);
  expect(r.code).toBe(0);
  expect((JSON.parse(r.out) as { values: unknown[][] }[])[0]!.values).toEqual([[2]]);
});
