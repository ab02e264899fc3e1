/**
 * Peak memory of `protolyte sheet FILE.xlsx` against the number of cells, to set LIMITS.cells for
 * workbooks (src/cli/limits.ts; README, command line). Not part of `npm run bench`: it writes
 * workbooks of up to millions of cells and runs the compiled command line on each (build it first:
 * `npx webpack --mode production --config-name cli`).
 *
 *   npx tsx scripts/xlsx-memory.ts [--text] [cells…]        e.g. 250000 500000 1000000
 *
 * Each workbook is one sheet of 20 columns, written by exceljs's streaming writer as Excel lays it
 * out (every row and cell numbered): 19 columns of numbers and, in the 20th, a formula per row
 * (=A1*B1+C1), the shape of a what-if table; with --text the 19 columns hold short texts instead (and the formula is =LEN(A1)+LEN(B1))
 * ("lot 1234-07", a different one in every cell, kept as shared strings). The command line reads it, evaluates it and prints
 * every value as CSV (to /dev/null here); /usr/bin/time gives its maximum resident set and its time.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, openSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import ExcelJS from "exceljs";

const COLUMNS = 20;

/** An XLSX file of about `cells` cells (whole rows of COLUMNS cells). */
async function writeWorkbook(file: string, cells: number, text: boolean): Promise<number> {
  const rows = Math.ceil(cells / COLUMNS);
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ filename: file, useSharedStrings: text, useStyles: false });
  const ws = wb.addWorksheet("S");
  for (let r = 1; r <= rows; r++) {
    const values: (number | string | { formula: string })[] = [];
    for (let c = 0; c < COLUMNS - 1; c++) values.push(text ? `lot ${r}-${c}` : ((r * 31 + c * 17) % 1000) / 100);
    values.push({ formula: text ? `LEN(A${r})+LEN(B${r})` : `A${r}*B${r}+C${r}` });
    ws.addRow(values).commit();
  }
  ws.commit();
  await wb.commit();
  return rows * COLUMNS;
}

async function main(): Promise<void> {
  const cli = join(__dirname, "..", "dist", "cli", "protolyte.js");
  if (!existsSync(cli)) throw new Error("build the command line first: npx webpack --mode production --config-name cli");
  const text = process.argv.includes("--text");
  const sizes = process.argv.slice(2).map(Number).filter((n) => n > 0);
  const dir = mkdtempSync(join(tmpdir(), "protolyte-xlsx-memory-"));
  try {
    console.log(`cells${text ? " (text)" : ""}       file      peak memory (max RSS)   wall     exit`);
    for (const size of sizes.length > 0 ? sizes : [250_000, 500_000, 1_000_000]) {
      const file = join(dir, `${size}.xlsx`);
      const cells = await writeWorkbook(file, size, text);
      const out = openSync("/dev/null", "w");
      const r = spawnSync("/usr/bin/time", ["-f", "%M %e", process.execPath, cli, "sheet", file], { stdio: ["ignore", out, "pipe"], encoding: "utf8", maxBuffer: 256 << 20 });
      const [kb, wall] = (r.stderr.trim().split("\n").pop() ?? "").split(" ").map(Number);
      const mb = (statSync(file).size / 1e6).toFixed(1);
      console.log(`${cells.toLocaleString("en-US").padEnd(11)} ${`${mb} MB`.padStart(8)}  ${`${((kb! * 1024) / 1e6).toFixed(0)} MB`.padStart(22)}  ${`${wall} s`.padStart(7)}  ${r.status}`);
      if (r.status !== 0) console.log(`    ${r.stderr.trim().split("\n")[0]}`);
      rmSync(file);
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

void main();
