/**
 * `protolyte table [FUNCTION] FILE.csv [name=value …] [--out OUT.csv] [--workers N] [--library F] [--separator C]`:
 * a what-if table of any length, streamed. The CSV's header names the columns: a column named like
 * one of the function's arguments (temperature, target_pH, delta_pH, titrant_conc, volume, …)
 * gives it per row, every other column is a substance with its amounts. Fixed arguments come as
 * name=value on the command line, or on the file's first line: `#AQ.ADJUST,titrant=NaOH,target_pH=7`
 * (which may also name the function). Output: the input columns, then the result (`AQ.<ID>`) and a
 * `message` column holding each error row's message; a blank row gives a blank result.
 *
 * No spreadsheet engine: rows are read with papaparse's streaming parser, computed in batches of
 * BATCH rows by the row-wise function (table-rows.ts) and written as they are done, so memory does
 * not grow with the number of rows (the parser is paused while output or workers are behind).
 * --workers N spreads the batches over N worker threads (table-worker.ts); results are written in
 * input order. Exit status 0 when computed (rows may hold error values: counted on stderr), 2 for a
 * usage, file or constants-library problem (nothing written).
 */
import { createReadStream, existsSync, renameSync, rmSync, statSync, createWriteStream } from "node:fs";
import { join } from "node:path";
import { Worker } from "node:worker_threads";
import Papa from "papaparse";
import { inertText } from "./format";
import { InputError, describeFsError } from "./input";
import { useLibraries } from "./library";
import { parseOptions, UsageError } from "./options";
import { checkOutPath } from "./output";
import type { Printer } from "./printer";
import { computeRows, layoutOf, namesProblem, tableEntry, type RowResult, type TableLayout } from "./table-rows";

/** Rows per batch: large enough that a batch's fixed cost vanishes, small enough to keep memory flat. */
export const BATCH = 2000;
/** Errors listed on stderr by row; the rest are counted. */
const LISTED_ERRORS = 10;

interface TableArgs {
  fn?: string;
  file: string;
  fixed: Record<string, string>;
  out?: string;
  workers: number;
  libraries: string[];
  separator?: string;
}

function readArgs(argv: string[]): TableArgs {
  let workers = 0;
  const rest: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] as string;
    if (a === "--workers" || a.startsWith("--workers=")) {
      const v = a === "--workers" ? argv[++i] : a.slice(10);
      const n = Number(v);
      if (!Number.isInteger(n) || n < 0 || n > 64) throw new UsageError(`--workers takes a whole number from 0 to 64, not '${v ?? ""}'`);
      workers = n;
    } else rest.push(a);
  }
  const options = parseOptions(rest);
  if (options.json || options.digits !== undefined || options.sheet !== undefined) throw new UsageError("table writes CSV at full precision: --json, --digits and --sheet do not apply");
  const fixed: Record<string, string> = {};
  const plain: string[] = [];
  for (const p of options.positional) {
    const eq = p.indexOf("=");
    if (eq > 0) fixed[p.slice(0, eq).trim()] = p.slice(eq + 1);
    else plain.push(p);
  }
  if (plain.length < 1 || plain.length > 2) throw new UsageError("table takes [FUNCTION] FILE.csv, then any fixed arguments as name=value");
  const [fn, file] = plain.length === 2 ? plain : [undefined, plain[0]];
  return { fn, file: file as string, fixed, out: options.out, workers, libraries: options.libraries, separator: options.separator };
}

function quote(field: string): string {
  return /[",;\t\r\n]/.test(field) ? `"${field.replace(/"/g, '""')}"` : field;
}

/** Text a spreadsheet would run as a formula gets a leading apostrophe (as the sheet command's CSV). */
function inert(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

function resultFields(r: RowResult): [string, string] {
  if (typeof r === "object") return [r.error, inert(r.message)];
  if (typeof r === "string") return [inert(r), ""];
  return [String(r), ""];
}

/** The directive line "#AQ.ADJUST,titrant=NaOH,…": the function (optional) and fixed arguments. */
function readDirective(fields: string[], into: { fn?: string; fixed: Record<string, string> }): void {
  const first = (fields[0] as string).slice(1).trim();
  const items = [first, ...fields.slice(1)].map((f) => f.trim()).filter((f) => f !== "");
  for (const item of items) {
    const eq = item.indexOf("=");
    if (eq > 0) into.fixed[item.slice(0, eq).trim()] ??= item.slice(eq + 1).trim();
    else if (into.fn === undefined) into.fn = item;
    else throw new UsageError(`the first line names two functions ('${into.fn}' and '${item}')`);
  }
}

/**
 * The worker file: dist/cli/table-worker.js beside the compiled command line; from source (tsx),
 * the .ts file loaded through tsx's register hook inside the worker.
 */
function newWorker(libraries: string[]): Worker {
  const js = join(__dirname, "table-worker.js");
  if (existsSync(js)) return new Worker(js, { workerData: { libraries } });
  const ts = join(__dirname, "table-worker.ts");
  return new Worker(`require("tsx/cjs/api").register(); require(${JSON.stringify(ts)});`, { eval: true, workerData: { libraries } });
}

class WorkerPool {
  private readonly workers: Worker[] = [];
  private next = 0;
  private failure: string | null = null;
  private readonly pending = new Map<number, { resolve: (results: RowResult[]) => void; reject: (e: Error) => void }>();
  readonly fingerprints: string[] = [];

  constructor(count: number, libraries: string[]) {
    for (let i = 0; i < count; i++) {
      const w = newWorker(libraries);
      w.on("message", (m: { seq?: number; results?: RowResult[]; failed?: string; ready?: boolean; fingerprint?: string }) => {
        if (m.failed !== undefined) this.fail(m.failed);
        if (m.ready) this.fingerprints.push(m.fingerprint ?? "");
        if (m.seq !== undefined && m.results !== undefined) {
          this.pending.get(m.seq)?.resolve(m.results);
          this.pending.delete(m.seq);
        }
      });
      w.on("error", (e) => this.fail(e.message));
      w.on("exit", (code) => {
        if (!this.closing) this.fail(`a worker thread stopped (exit ${code})`);
      });
      this.workers.push(w);
    }
  }

  private closing = false;

  private fail(message: string): void {
    this.failure ??= message;
    for (const p of this.pending.values()) p.reject(new Error(`a worker thread failed: ${this.failure}`));
    this.pending.clear();
  }

  run(seq: number, layout: TableLayout, rows: string[][]): Promise<RowResult[]> {
    return new Promise((resolve, reject) => {
      if (this.failure !== null) return reject(new Error(`a worker thread failed: ${this.failure}`));
      this.pending.set(seq, { resolve, reject });
      this.workers[this.next]!.postMessage({ seq, layout, rows });
      this.next = (this.next + 1) % this.workers.length;
    });
  }

  async close(): Promise<void> {
    this.closing = true;
    await Promise.all(this.workers.map((w) => w.terminate()));
  }
}

export async function runTable(argv: string[], print: Printer): Promise<number> {
  const args = readArgs(argv);
  if (args.out !== undefined && checkOutPath(args.out, args.file) !== "csv") throw new UsageError("table writes CSV: --out must end in .csv");
  try {
    if (!statSync(args.file).isFile()) throw new InputError(`cannot read '${args.file}': it is not a file`);
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw new InputError(`cannot read '${args.file}': ${describeFsError(e)}`);
  }
  const library = await useLibraries(null, args.libraries);
  const pool = args.workers > 0 ? new WorkerPool(args.workers, args.libraries) : null;
  const partial = args.out !== undefined ? `${args.out}.partial-${process.pid}` : undefined;
  const sink: NodeJS.WritableStream = partial !== undefined ? createWriteStream(partial) : process.stdout;
  const eol = partial !== undefined ? "\r\n" : "\n";
  if (partial !== undefined) sink.write("\ufeff");

  const head: { fn?: string; fixed: Record<string, string> } = { fn: args.fn, fixed: { ...args.fixed } };
  let layout: TableLayout | null = null;
  let header: string[] | null = null;
  let directiveSeen = false;
  let batch: string[][] = [];
  let seq = 0;
  let written = 0;
  let rows = 0;
  let errors = 0;
  let blanks = 0;
  const listed: string[] = [];
  let queue: Promise<void> = Promise.resolve(); // batches written in input order
  let inflight = 0;

  const write = (text: string): Promise<void> =>
    sink.write(text) ? Promise.resolve() : new Promise((resolve) => sink.once("drain", () => resolve()));

  const emit = async (inputRows: string[][], results: RowResult[]): Promise<void> => {
    let text = "";
    inputRows.forEach((row, i) => {
      const r = results[i] as RowResult;
      written++;
      if (typeof r === "object") {
        errors++;
        if (listed.length < LISTED_ERRORS) listed.push(`row ${written}: ${r.error} ${inertText(r.message)}`);
      } else if (r === "") blanks++;
      text += [...row.map(quote), ...resultFields(r).map(quote)].join(",") + eol;
    });
    await write(text);
  };

  const dispatch = (): void => {
    if (batch.length === 0 || layout === null) return;
    const rowsOfBatch = batch;
    batch = [];
    const mine = seq++;
    const results = pool !== null ? pool.run(mine, layout, rowsOfBatch) : Promise.resolve(computeRows(layout, rowsOfBatch));
    inflight++;
    queue = queue.then(async () => {
      await emit(rowsOfBatch, await results);
      inflight--;
    });
  };

  const start = (fields: string[], delimiter: string): void => {
    header = fields;
    if (head.fn === undefined) throw new UsageError("name the function: on the command line (table AQ.PH FILE.csv) or on the file's first line (#AQ.PH)");
    layout = layoutOf(tableEntry(head.fn), fields, head.fixed, delimiter === ";");
    const problem = namesProblem(layout);
    if (problem !== null) throw new UsageError(`the header's substances cannot be used: ${problem}`);
    void write([...fields.map(quote), `AQ.${layout.id}`, "message"].join(",") + eol);
  };

  try {
    await new Promise<void>((resolve, reject) => {
      let failed = false;
      const fail = (error: unknown, parser?: Papa.Parser): void => {
        if (failed) return;
        failed = true;
        parser?.abort();
        reject(error);
      };
      Papa.parse<string[]>(createReadStream(args.file), {
        delimiter: args.separator ?? "",
        delimitersToGuess: [",", ";", "\t", "|"],
        skipEmptyLines: true,
        chunk(results, parser) {
          parser.pause();
          try {
            for (const raw of results.data) {
              const fields = raw.length > 0 && rows === 0 && header === null && typeof raw[0] === "string" ? [raw[0].replace(/^\ufeff/, ""), ...raw.slice(1)] : raw;
              if (header === null) {
                if (!directiveSeen && fields[0]?.startsWith("#")) {
                  readDirective(fields, head);
                  directiveSeen = true;
                  continue;
                }
                start(fields, results.meta.delimiter);
                continue;
              }
              rows++;
              batch.push(fields);
              if (batch.length >= BATCH) dispatch();
            }
          } catch (error) {
            fail(error, parser);
            return;
          }
          // Resume once the output and the workers have caught up (memory stays flat).
          const limit = pool !== null ? 2 * args.workers : 1;
          const wait = (): void => {
            if (inflight < limit) parser.resume();
            else queue.then(wait, (e) => fail(e, parser));
          };
          wait();
        },
        complete: () => {
          if (failed) return;
          if (header === null) return fail(new InputError(`'${args.file}' has no header row: its first line names the columns`));
          dispatch();
          queue.then(() => resolve(), (e) => fail(e));
        },
        error: (e: Error) => fail(new InputError(`cannot read '${args.file}': ${e.message}`)),
      });
    });
    if (pool !== null && pool.fingerprints.some((f) => f !== library.fingerprint)) throw new Error("a worker thread computed with other constants than the main thread");
    if (partial !== undefined) {
      await new Promise<void>((resolve) => sink.end(() => resolve()));
      renameSync(partial, args.out as string);
    }
  } catch (error) {
    if (partial !== undefined) {
      sink.end();
      rmSync(partial, { force: true });
    }
    throw error;
  } finally {
    await pool?.close();
  }
  listed.forEach((l) => print.note(l));
  if (errors > listed.length) print.note(`… and ${errors - listed.length} more error rows`);
  const where = args.out !== undefined ? `wrote ${args.out}: ` : "";
  print.note(`${where}${rows} row${rows === 1 ? "" : "s"} of AQ.${(layout as TableLayout | null)?.id ?? "?"}, ${errors} error row${errors === 1 ? "" : "s"}, ${blanks} blank; constants ${library.fingerprint} (${library.layers})`);
  return 0;
}
