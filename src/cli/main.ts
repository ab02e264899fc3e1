/**
 * protolyte — evaluate AQ formulas and sheets without Excel, in the embedded spreadsheet engine.
 *
 *   protolyte eval '<formula>' [--json]
 *   protolyte sheet FILE.csv|FILE.xlsx [--out OUT.csv|OUT.xlsx] [--json]
 *
 * Exit status: 0 when evaluated (a sheet may contain error cells: they are listed), 1 when `eval`
 * gives an error value, 2 for a usage or file problem.
 */
import { readFileSync, writeFileSync } from "node:fs";
import { extname } from "node:path";
import type { RawCellContent } from "hyperformula";
import { csvToSheet, formatCell, toCsv } from "./csv";
import { evaluateFormula, evaluateSheets, type CellResult, type SheetResult } from "./evaluate";
import { readWorkbook, writeValues } from "./xlsx";

const USAGE = `Usage:
  protolyte eval '<formula>' [--json]        evaluate one formula, e.g. eval '=AQ.PH({"acetic acid";"sodium acetate"},{0.1;0.1})'
  protolyte sheet FILE.csv|FILE.xlsx [--out OUT.csv|OUT.xlsx] [--json]
                                             evaluate every formula of a sheet and print (or write) the values
Spilled tables print as tab-separated rows. Errors print as the error value and its message.`;

class UsageError extends Error {}

function formatScalar(value: CellResult): string {
  return formatCell(value);
}

function printEval(formula: string, json: boolean): number {
  const result = evaluateFormula(formula);
  if (json) {
    const out = result.error !== undefined ? { error: result.error, message: result.message ?? "" } : { value: result.value };
    process.stdout.write(`${JSON.stringify(out)}\n`);
  } else if (result.error !== undefined) {
    process.stdout.write(`${result.error} ${result.message ?? ""}\n`);
  } else if (Array.isArray(result.value)) {
    process.stdout.write(result.value.map((row) => row.map(formatScalar).join("\t")).join("\n") + "\n");
  } else {
    process.stdout.write(`${formatScalar(result.value ?? null)}\n`);
  }
  return result.error !== undefined ? 1 : 0;
}

async function loadSheets(file: string): Promise<Record<string, RawCellContent[][]>> {
  const ext = extname(file).toLowerCase();
  if (ext === ".csv") return { Sheet1: csvToSheet(readFileSync(file, "utf8")) };
  if (ext === ".xlsx") return readWorkbook(file);
  throw new UsageError(`cannot read '${file}': use a .csv or .xlsx file`);
}

function printSheets(results: SheetResult[]): void {
  for (const sheet of results) {
    if (results.length > 1) process.stdout.write(`== ${sheet.name}\n`);
    process.stdout.write(sheet.values.map((row) => row.map(formatScalar).join("\t")).join("\n") + "\n");
    for (const e of sheet.errors) process.stdout.write(`${sheet.name}!${e.address}: ${e.error} ${e.message}\n`);
  }
}

async function runSheet(file: string, out: string | undefined, json: boolean): Promise<number> {
  let sheets: Record<string, RawCellContent[][]>;
  try {
    sheets = await loadSheets(file);
  } catch (error) {
    if (error instanceof UsageError) throw error;
    throw new UsageError(`cannot read '${file}': ${(error as Error).message}`);
  }
  const results = evaluateSheets(sheets);
  if (out !== undefined) {
    const ext = extname(out).toLowerCase();
    if (ext === ".csv") writeFileSync(out, toCsv(results[0]?.values ?? []));
    else if (ext === ".xlsx") await writeValues(out, results);
    else throw new UsageError(`cannot write '${out}': use a .csv or .xlsx file`);
  }
  if (json) process.stdout.write(`${JSON.stringify(results)}\n`);
  else if (out === undefined) printSheets(results);
  else process.stdout.write(`wrote ${out} (${results.reduce((n, s) => n + s.errors.length, 0)} error cells)\n`);
  return 0;
}

export async function main(argv: string[]): Promise<number> {
  const json = argv.includes("--json");
  const rest = argv.filter((a) => a !== "--json");
  const command = rest[0];
  try {
    if (command === "eval") {
      if (rest.length !== 2) throw new UsageError("eval takes exactly one formula (quote it for the shell)");
      return printEval(rest[1] as string, json);
    }
    if (command === "sheet") {
      const outAt = rest.indexOf("--out");
      const out = outAt >= 0 ? rest[outAt + 1] : undefined;
      if (outAt >= 0 && out === undefined) throw new UsageError("--out needs a file name");
      const files = rest.slice(1).filter((_, i) => i + 1 !== outAt && i + 1 !== outAt + 1);
      if (files.length !== 1) throw new UsageError("sheet takes exactly one input file");
      return await runSheet(files[0] as string, out, json);
    }
    if (command === "--help" || command === "help" || command === undefined) {
      process.stdout.write(`${USAGE}\n`);
      return command === undefined ? 2 : 0;
    }
    throw new UsageError(`unknown command '${command}'`);
  } catch (error) {
    if (error instanceof UsageError) {
      process.stderr.write(`protolyte: ${error.message}\n${USAGE}\n`);
      return 2;
    }
    throw error;
  }
}

if (require.main === module) {
  main(process.argv.slice(2)).then(
    (code) => process.exit(code),
    (error) => {
      process.stderr.write(`protolyte: ${(error as Error).stack ?? String(error)}\n`);
      process.exit(2);
    },
  );
}
