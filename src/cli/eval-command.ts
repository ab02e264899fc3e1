/**
 * `protolyte eval '<formula>'`: one formula, evaluated as if typed into A1 of an empty sheet.
 * Plain output is rounded for reading (see format.ts; --digits N); --json keeps full precision.
 * Exit 0 for a value, 1 for an error value.
 */
import { evaluateFormula } from "./evaluate";
import { readableCell, roundingFor, type Rounding } from "./format";
import { useLibraries } from "./library";
import { UsageError, type Options } from "./options";
import type { Printer } from "./printer";

export async function runEval(options: Options, print: Printer): Promise<number> {
  if (options.out !== undefined || options.sheet !== undefined || options.separator !== undefined) {
    throw new UsageError("eval takes no --out, --sheet or --separator (they belong to sheet)");
  }
  if (options.positional.length !== 1) throw new UsageError("eval takes exactly one formula (quote it for the shell)");
  const formula = options.positional[0] as string;
  if (options.libraries.length > 0) {
    const library = await useLibraries(null, options.libraries);
    library.warnings.forEach((w) => print.note(w));
    print.note(`constants ${library.fingerprint} (${library.layers})`);
  }
  const result = evaluateFormula(formula);
  if (options.json) {
    print.out(JSON.stringify(result.error !== undefined ? { error: result.error, message: result.message ?? "" } : { value: result.value }));
  } else if (result.error !== undefined) {
    print.out(`${result.error} ${readableCell(result.message ?? "")}`);
  } else {
    const rounding: Rounding = options.digits !== undefined ? { significant: options.digits } : roundingFor(formula);
    const value = result.value ?? null;
    if (Array.isArray(value)) for (const row of value) print.out(row.map((c) => readableCell(c, rounding)).join("\t"));
    else print.out(readableCell(value, rounding));
    print.note("caution: a calculated pH is an estimate; confirm with a calibrated meter and your validated procedures");
  }
  return result.error !== undefined ? 1 : 0;
}
