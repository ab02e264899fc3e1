/**
 * protolyte — evaluate AQ formulas and sheets without Excel, in the embedded spreadsheet engine.
 * This file only dispatches: options are read in options.ts, each command lives in its own file.
 *
 * Exit status: 0 when evaluated (a sheet may contain error cells: they are listed on stderr), 1 when
 * `eval` gives an error value, 2 for a usage, file, limit or constants-library problem (one line
 * on stderr, nothing written).
 */
import { runEval } from "./eval-command";
import { InputError } from "./input";
import { LibraryError } from "./library";
import { LimitError } from "./limits";
import { parseOptions, UsageError } from "./options";
import { processPrinter, type Printer } from "./printer";
import { runSheet } from "./sheet-command";
import { runTable } from "./table";
import { CsvError } from "./csv";

export const USAGE = `Usage:
  protolyte eval '<formula>' [--json] [--digits N] [--library FILE.json]…
      evaluate one formula, e.g. eval '=AQ.PH({"acetic acid";"sodium acetate"},{0.1;0.1})'
  protolyte sheet FILE.csv|FILE.xlsx [--out OUT.csv|OUT.xlsx] [--sheet NAME] [--json] [--digits N]
                  [--separator C] [--library FILE.json]… [--no-workbook-library]
      evaluate every formula of a sheet; print the values, or write them with --out
  protolyte table [FUNCTION] FILE.csv [name=value]… [--out OUT.csv] [--workers N] [--library FILE.json]…
      a what-if table of any length, streamed: one result per CSV row (see the README)
Spilled tables print as tab-separated rows; error cells and a summary go to stderr.
Exit status: 0 evaluated, 1 eval gave an error value, 2 usage, file, limit or library problem.`;

/** Problems that end the run with one line and exit 2. */
const ONE_LINE = [UsageError, InputError, LimitError, LibraryError, CsvError];

export async function main(argv: string[], print: Printer = processPrinter()): Promise<number> {
  const command = argv[0];
  try {
    if (command === "--help" || command === "help" || command === "-h") {
      print.out(USAGE);
      print.flush();
      return 0;
    }
    if (command === undefined) throw new UsageError("no command given");
    if (command === "table") {
      const code = await runTable(argv.slice(1), print);
      print.flush();
      return code;
    }
    const options = parseOptions(argv.slice(1));
    let code: number;
    if (command === "eval") code = await runEval(options, print);
    else if (command === "sheet") code = await runSheet(options, print);
    else throw new UsageError(`unknown command '${command}'`);
    print.flush();
    return code;
  } catch (error) {
    print.flush();
    if (command === undefined) {
      print.note(`no command given\n${USAGE}`);
      return 2;
    }
    if (ONE_LINE.some((kind) => error instanceof kind)) {
      print.note((error as Error).message);
      return 2;
    }
    if (error instanceof RangeError) {
      print.note(`the input is beyond what the headless engine can evaluate (${error.message}); see the limits in the README`);
      return 2;
    }
    if (error instanceof Error && /Sheet size limit exceeded/i.test(error.message)) {
      print.note(`a sheet is larger than the engine's limits (${error.message}); see the limits in the README`);
      return 2;
    }
    throw error;
  }
}
