/**
 * Command-line options, read once: `--name value`, `--name=value`, and flags. Anything else that
 * starts with "--" is a usage error, so a mistyped option never passes silently as a file name.
 */
export class UsageError extends Error {}

export interface Options {
  json: boolean;
  out?: string;
  sheet?: string;
  /** --library FILE.json, in the order given (each may repeat). */
  libraries: string[];
  /** --separator: one character, or "tab". */
  separator?: string;
  /** --digits N: significant figures in printed numbers. */
  digits?: number;
  /** --no-workbook-library: compute with the built-in (and --library) constants even when the workbook carries its own. */
  noWorkbookLibrary: boolean;
  positional: string[];
}

const FLAGS = new Set(["--json", "--no-workbook-library"]);
const VALUED = new Set(["--out", "--sheet", "--library", "--separator", "--digits"]);

function separatorOf(text: string): string {
  if (text === "tab" || text === "\\t" || text === "\t") return "\t";
  if ([...text].length !== 1 || /["\r\n]/.test(text)) throw new UsageError(`--separator takes one character (or "tab"), not '${text}'`);
  return text;
}

export function parseOptions(argv: readonly string[]): Options {
  const options: Options = { json: false, libraries: [], noWorkbookLibrary: false, positional: [] };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string;
    if (arg === "--") {
      options.positional.push(...argv.slice(i + 1));
      break;
    }
    const eq = arg.startsWith("--") ? arg.indexOf("=") : -1;
    const name = eq > 0 ? arg.slice(0, eq) : arg;
    if (FLAGS.has(name) && eq < 0) {
      if (name === "--json") options.json = true;
      else options.noWorkbookLibrary = true;
      continue;
    }
    if (VALUED.has(name)) {
      const value = eq > 0 ? arg.slice(eq + 1) : argv[++i];
      if (value === undefined || value === "") throw new UsageError(`${name} needs a value`);
      if (name === "--out") {
        if (options.out !== undefined) throw new UsageError("--out is given twice");
        options.out = value;
      } else if (name === "--sheet") options.sheet = value;
      else if (name === "--library") options.libraries.push(value);
      else if (name === "--separator") options.separator = separatorOf(value);
      else {
        const n = Number(value);
        if (!Number.isInteger(n) || n < 1 || n > 17) throw new UsageError(`--digits takes a whole number from 1 to 17, not '${value}'`);
        options.digits = n;
      }
      continue;
    }
    if (arg.startsWith("--")) throw new UsageError(`unknown option '${arg}'`);
    options.positional.push(arg);
  }
  return options;
}
