/**
 * `protolyte sheet FILE`: every formula of a CSV or XLSX evaluated with the constants the workbook
 * carries (and any --library files). Everything that can be refused is refused before the work:
 * usage, the --out path, the input's limits, the constants library. Then the values go to stdout
 * (plain: rounded for reading; --json: full precision) or to --out (full precision), every error
 * cell with its message goes to stderr, and a summary line ends the run.
 */
import { evaluateSheets, type SheetResult } from "./evaluate";
import { toCsv } from "./csv";
import { DEFAULT_ROUNDING, inertText, readableCell, type Rounding } from "./format";
import { loadInput } from "./input";
import { useLibraries } from "./library";
import { UsageError, type Options } from "./options";
import { checkOutPath, writeAtomically } from "./output";
import type { Printer } from "./printer";

function pickSheets(results: SheetResult[], wanted: string | undefined, names: string[]): SheetResult[] {
  if (wanted === undefined) return results;
  const found = results.filter((r) => r.name === wanted);
  if (found.length === 0) throw new UsageError(`no sheet '${wanted}' in the workbook (it has ${names.map((n) => `'${n}'`).join(", ")})`);
  return found;
}

function printValues(results: SheetResult[], rounding: Rounding, print: Printer): void {
  for (const sheet of results) {
    if (results.length > 1) print.out(`== ${inertText(sheet.name)}`);
    for (const row of sheet.values) print.out(row.map((c) => readableCell(c, rounding)).join("\t"));
  }
}

export async function runSheet(options: Options, print: Printer): Promise<number> {
  if (options.positional.length !== 1) throw new UsageError("sheet takes exactly one input file");
  const file = options.positional[0] as string;
  const outKind = options.out !== undefined ? checkOutPath(options.out, file) : undefined;

  const input = await loadInput(file, { separator: options.separator, workbookLibrary: !options.noWorkbookLibrary });
  input.notes.forEach((n) => print.note(n));
  const names = [...input.sheets.keys()];
  if (options.sheet !== undefined && !input.sheets.has(options.sheet)) pickSheets([], options.sheet, names);
  if (outKind === "csv" && names.length > 1 && options.sheet === undefined) {
    throw new UsageError(
      `the workbook has ${names.length} sheets (${names.map((n) => `'${inertText(n)}'`).join(", ")}) and a CSV file holds one: ` +
        "choose it with --sheet NAME, or write .xlsx, which keeps every sheet",
    );
  }
  const library = await useLibraries(input.libraryText, options.libraries);
  library.warnings.forEach((w) => print.note(w));

  const results = pickSheets(evaluateSheets(input.sheets), options.sheet, names);

  if (options.out !== undefined) {
    if (outKind === "csv") writeAtomically(options.out, toCsv(results[0]?.values ?? []));
    else {
      const { workbookBytes } = await import("./xlsx");
      writeAtomically(options.out, await workbookBytes(results));
    }
  }
  if (options.json) print.out(JSON.stringify(results));
  else if (options.out === undefined) printValues(results, options.digits !== undefined ? { significant: options.digits } : DEFAULT_ROUNDING, print);
  print.flush();

  let errors = 0;
  for (const sheet of results) {
    for (const e of sheet.errors) {
      errors++;
      if (!options.json) print.note(`${inertText(sheet.name)}!${e.address}: ${e.error} ${inertText(e.message)}`);
    }
  }
  const sheets = results.length === 1 ? `sheet '${inertText(results[0]!.name)}'` : `${results.length} sheets`;
  const written = options.out !== undefined ? `wrote ${options.out}: ` : "";
  print.note(`${written}${sheets}, ${errors} error cell${errors === 1 ? "" : "s"}; constants ${library.fingerprint} (${library.layers})`);
  return 0;
}
