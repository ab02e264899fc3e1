/**
 * `npm run bench`: the speed figures of the add-in, in one process, printed as tables with units.
 *
 *   (a) engine solves per second: representative mixtures × activity model × temperature, via
 *       solvePH on a fresh mixture and via a prepared mixture;
 *   (b) a 10 000-row what-if sheet in the embedded spreadsheet engine (HyperFormula): =AQ.PH(...)
 *       per row against the same sheet computing the closed-form Henderson–Hasselbalch value with
 *       built-in functions (the comparison baseline only; the engine never uses that shortcut);
 *   (c) AQ.ADJUST and AQ.RECIPE calls per second;
 *   (d) production bundle sizes, raw and gzip (builds first unless --no-build), and the CPU to load
 *       the functions bundle and read the first unit text (scripts/bench-bundle-load.ts);
 *   (e) the batching pattern for Excel, simulated, against synchronous calls;
 *   (f) what-if tables in one formula and the streamed `protolyte table` (scripts/bench-tables.ts).
 *   (g) the command line\'s start-up: one eval against Node loading HyperFormula (scripts/bench-startup.ts).
 *
 * Options: --only=a,b,c,d,e,f,g   run some parts; --no-build   read dist/ as it is; --quick   shorter runs.
 * Timings depend on the machine and its load: the header prints the machine and the load average;
 * every figure is the best of several timed runs after a warm-up, in CPU time of this process (see
 * now()). Not a test: nothing here asserts a speed.
 */
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync, readdirSync, statSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { FunctionArgumentType, FunctionPlugin, HyperFormula, SimpleRangeValue } from "hyperformula";
import { prepare, solvePH, type ActivityModel, type Component, type Mixture } from "../src/chem";
import { evaluateSheets } from "../src/cli/evaluate";
import { installEdgeIndex, uninstallEdgeIndex } from "../src/cli/hf-edge-index";
import * as AQ from "../src/functions/functions";
import { clearMixtureCache, mixtureKey } from "../src/functions/mixture";
import { getActiveLibrary } from "../src/library";
import { printBundleLoadCost } from "./bench-bundle-load";
import { partStartup } from "./bench-startup";
import { partF } from "./bench-tables";

const root = join(__dirname, "..");
const argv = process.argv.slice(2);
const only = (argv.find((a) => a.startsWith("--only="))?.slice(7).split(",") ?? ["a", "b", "c", "d", "e", "f", "g"]).map((s) => s.trim());
const quick = argv.includes("--quick");
const build = !argv.includes("--no-build");
const RUNS = quick ? 3 : 9;
const RUN_SECONDS = quick ? 0.05 : 0.1;

// ---- helpers -------------------------------------------------------------------------------

/** Wall-clock seconds. */
function wall(): number {
  return Number(process.hrtime.bigint()) / 1e9;
}

/**
 * CPU seconds of this process (user + system, every thread: garbage collector and compiler threads
 * included). Rates are computed from CPU time: other processes on a shared machine delay a run's
 * wall clock but hardly its CPU time, and on an idle machine wall time is no longer than CPU time.
 */
function now(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

let sink = 0;

/**
 * Calls per second of fn(i): the best of RUNS timed runs of ≈ RUN_SECONDS each, after a warm-up.
 * The best run, not the mean: on a shared machine other processes only ever slow a run down.
 */
function rate(fn: (i: number) => number): number {
  let n = 64;
  let i = 0;
  // Warm-up and calibration: grow n until one run takes a tenth of the target time.
  for (;;) {
    const t0 = now();
    for (let k = 0; k < n; k++) sink += fn(i++);
    if (now() - t0 > RUN_SECONDS / 10) break;
    n *= 2;
  }
  n = Math.max(1, Math.round(n * 10));
  const rates: number[] = [];
  for (let r = 0; r < RUNS; r++) {
    const t0 = now();
    for (let k = 0; k < n; k++) sink += fn(i++);
    rates.push(n / (now() - t0));
  }
  return Math.max(...rates);
}

function fmtRate(perSecond: number): string {
  return `${Math.round(perSecond).toLocaleString("en-US")} /s`;
}

function fmtMicro(perSecond: number): string {
  return `${(1e6 / perSecond).toFixed(2)} µs`;
}

function table(header: string[], rows: string[][]): void {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] ?? "").length)));
  const line = (cells: string[]) => cells.map((x, c) => (c === 0 ? x.padEnd(widths[c]) : x.padStart(widths[c]))).join("  ");
  console.log(line(header));
  console.log(widths.map((w) => "-".repeat(w)).join("  "));
  for (const r of rows) console.log(line(r));
}

function component(name: string): Component {
  const r = getActiveLibrary().resolve(name);
  if (!r.ok) throw new Error(`bench: ${r.message}`);
  return r.component;
}

function check(ok: boolean, what: string): void {
  if (!ok) throw new Error(`bench: ${what}`);
}

// ---- header ------------------------------------------------------------------------------

const cpuList = cpus();
console.log("Protolyte benchmark (npm run bench)");
console.log(`date:    ${new Date().toISOString()}`);
console.log(`machine: ${cpuList[0]?.model ?? "unknown cpu"}, ${cpuList.length} logical cores; node ${process.version} (${process.platform} ${process.arch})`);
console.log(`load:    ${loadavg().map((x) => x.toFixed(2)).join(" / ")} (1 / 5 / 15 min load average at start: other processes share the cores)`);
console.log(`method:  CPU time of this process (user + system); best of ${RUNS} timed runs after a warm-up; single-threaded code`);
console.log(`library: ${getActiveLibrary().fingerprint()}`);

// ---- (a) engine ----------------------------------------------------------------------------

interface MixCase {
  label: string;
  /** 35 slightly different mixtures, cycled so that nothing can be answered from a cache. */
  variants: Mixture[];
}

const VARIANTS = 35;

function variants(make: (i: number) => Mixture): Mixture[] {
  return Array.from({ length: VARIANTS }, (_, i) => make(i));
}

function engineCases(): MixCase[] {
  const aceticAcid = component("acetic acid");
  const sodiumAcetate = component("sodium acetate");
  const nah2po4 = component("NaH2PO4");
  const nacl = component("NaCl");
  const naoh = component("NaOH");
  const citric = component("citric acid");
  const na2hpo4 = component("Na2HPO4");
  return [
    {
      label: "acetate 0.05/0.05 M",
      variants: variants((i) => [
        { component: aceticAcid, conc: 0.05 + (i % 7) * 1e-3 },
        { component: sodiumAcetate, conc: 0.05 + (i % 5) * 1e-3 },
      ]),
    },
    {
      label: "phosphate 0.05 + NaCl 0.1 + NaOH 0.02 M",
      variants: variants((i) => [
        { component: nah2po4, conc: 0.05 + (i % 7) * 1e-3 },
        { component: nacl, conc: 0.1 },
        { component: naoh, conc: 0.02 + (i % 5) * 1e-3 },
      ]),
    },
    {
      label: "citrate 0.01 + phosphate 0.03 M",
      variants: variants((i) => [
        { component: citric, conc: 0.01 + (i % 7) * 1e-4 },
        { component: na2hpo4, conc: 0.03 + (i % 5) * 1e-4 },
      ]),
    },
  ];
}

function partA(): void {
  console.log("\n(a) Engine: pH solves per second, one core");
  console.log("    fresh    = solvePH(mixture, options): validate, aggregate and solve on every call");
  console.log("    prepared = prepare(mixture) once, then p.solvePH(options) (what the functions' cache serves)");
  const rows: string[][] = [];
  const cases = engineCases();
  // Warm-up of every path before any timing, so that the first case is not charged for the JIT.
  const WARM: ActivityModel[] = ["davies", "ideal", "pitzer"];
  for (const c of cases) for (let i = 0; i < 20_000; i++) sink += solvePH(c.variants[i % VARIANTS], { activity: WARM[i % 3], temperatureC: 25 + (i % 3) * 6 }).ok ? 1 : 0;
  for (const c of cases) {
    for (const activity of ["ideal", "davies", "pitzer"] as ActivityModel[]) {
      for (const temperatureC of [25, 37]) {
        const opts = { temperatureC, activity };
        const prepared = c.variants.map((m) => {
          const p = prepare(m);
          check(p.ok, `${c.label} does not prepare`);
          return p as Exclude<typeof p, { ok: false }>;
        });
        const fresh = rate((i) => {
          const r = solvePH(c.variants[i % VARIANTS], opts);
          return r.ok ? r.pH : NaN;
        });
        const warm = rate((i) => {
          const r = prepared[i % VARIANTS].solvePH(opts);
          return r.ok ? r.pH : NaN;
        });
        const first = prepared[0].solvePH(opts);
        check(first.ok, `${c.label} does not solve`);
        rows.push([c.label, activity, `${temperatureC} °C`, first.ok ? first.pH.toFixed(3) : "", fmtRate(fresh), fmtMicro(fresh), fmtRate(warm), fmtMicro(warm)]);
      }
    }
  }
  table(["mixture", "activity", "T", "pH", "fresh", "per solve", "prepared", "per solve"], rows);
  console.log("    target: ≥ 200 000 Davies solves/s for phosphate + NaCl + NaOH; ≥ 50 000 Pitzer solves/s for the same (issue 20)");
  partA2();
}

/** The functions layer's cost per call, as Excel calls AQ.PH (ranges as rows of columns). */
function partA2(): void {
  console.log("\n(a2) AQ.PH called as Excel calls it (names and amounts as rows of columns; Davies, 25 °C)");
  const names = [["acetic acid", "sodium acetate"]];
  const rows = Array.from({ length: SHEET_ROWS }, (_, i) => [amountsOf(i)]);
  const mixtures = rows.map(([[a, b]]) => [
    { component: component("acetic acid"), conc: a },
    { component: component("sodium acetate"), conc: b },
  ]);
  const PH = (n: unknown, a: unknown, t: unknown, m: unknown): number => (AQ.PH as (...x: unknown[]) => number[][])(n, a, t, m)[0][0];
  const engine = rate((i) => {
    const r = solvePH(mixtures[i % SHEET_ROWS], {});
    return r.ok ? r.pH : NaN;
  });
  const cold = rate((i) => {
    if (i % SHEET_ROWS === 0) clearMixtureCache();
    return PH(names, rows[i % SHEET_ROWS], null, null);
  });
  const hit = rate((i) => PH(names, rows[i % 20], null, null));
  table(
    ["call", "calls", "per call"],
    [
      ["engine only: solvePH(mixture) on a new mixture", fmtRate(engine), fmtMicro(engine)],
      ["AQ.PH, a new mixture on every call (a what-if table's rows)", fmtRate(cold), fmtMicro(cold)],
      ["AQ.PH, a mixture asked for before (cache hit: PH, BETA… on one row)", fmtRate(hit), fmtMicro(hit)],
    ],
  );
}

// ---- (b) what-if sheet ---------------------------------------------------------------------

const SHEET_ROWS = 10_000;
const SHEET_RUNS = quick ? 3 : 5;

type Raw = (string | number)[][];

/** Row i: acetic acid and sodium acetate, mol/L, every row a different pair (100 × 100 grid). */
function amountsOf(i: number): [number, number] {
  return [0.01 + (i % 100) * 0.001, 0.01 + Math.floor(i / 100) * 0.001];
}

function whatIfSheet(rows: number, formula: (r: number) => string): Raw {
  const sheet: Raw = [["acid mol/L", "salt mol/L", "pH", "", "acetic acid", "sodium acetate"]];
  for (let i = 0; i < rows; i++) {
    const [a, b] = amountsOf(i);
    sheet.push([a, b, formula(i + 2)]);
  }
  return sheet;
}

const SHEETS: { label: string; formula: (r: number) => string }[] = [
  { label: "=AQ.PH($E$1:$F$1,A2:B2)  (names in a fixed range)", formula: (r) => `=AQ.PH($E$1:$F$1,A${r}:B${r})` },
  { label: '=AQ.PH({"acetic acid","sodium acetate"},A2:B2)  (inline array)', formula: (r) => `=AQ.PH({"acetic acid","sodium acetate"},A${r}:B${r})` },
  { label: "=4.756+LOG10(B2/A2)  (Henderson–Hasselbalch, built-ins: baseline)", formula: (r) => `=4.756+LOG10(B${r}/A${r})` },
  { label: "=BENCH.FLOOR($E$1:$F$1,A2:B2)  (custom function returning 7)", formula: (r) => `=BENCH.FLOOR($E$1:$F$1,A${r}:B${r})` },
];

/**
 * HyperFormula's own cost for a custom function with AQ.PH's arguments: a plugin registered the way
 * src/cli/hf-plugin.ts registers the AQ functions (runFunction, ANY arguments, no vectorization)
 * that reads both ranges and returns a constant. Not part of the product: it shows what bounds (b).
 */
function registerFloorFunction(): void {
  class BenchFloor extends FunctionPlugin {
    floor(ast: { args: unknown[] }, state: unknown): unknown {
      const self = this as unknown as { runFunction: Function; metadata: (name: string) => unknown };
      return self.runFunction(ast.args, state, self.metadata("BENCH.FLOOR"), (names: unknown, amounts: unknown) => {
        let cells = 0;
        for (const v of [names, amounts]) if (v instanceof SimpleRangeValue) for (const row of v.data) cells += row.length;
        return cells > 0 ? 7 : 0;
      });
    }
  }
  const any = { argumentType: FunctionArgumentType.ANY };
  (BenchFloor as unknown as { implementedFunctions: unknown }).implementedFunctions = {
    "BENCH.FLOOR": { method: "floor", parameters: [any, any], vectorizationForbidden: true },
  };
  HyperFormula.registerFunctionPlugin(BenchFloor as never, { enGB: { "BENCH.FLOOR": "BENCH.FLOOR" } });
}

/** CPU and wall seconds to build and evaluate the sheet and read every value back (evaluateSheets). */
function sheetSeconds(sheet: Raw): { cpu: number; wall: number; errors: number; sample: unknown } {
  clearMixtureCache(); // every row is a first evaluation, as when a table is filled in
  const c0 = now();
  const w0 = wall();
  const [result] = evaluateSheets({ Sheet1: sheet });
  return { cpu: now() - c0, wall: wall() - w0, errors: result.errors.length, sample: result.values[1]?.[2] };
}

/**
 * How the fixed-range sheet grows with its length, with HyperFormula's dependency graph as shipped
 * and with the edge index of src/cli/hf-edge-index.ts: every row depends on $E$1:$F$1, and
 * HyperFormula checks each new dependent against all earlier ones.
 */
function partBScaling(): void {
  const lengths = quick ? [5_000, 20_000] : [5_000, 10_000, 20_000, 40_000];
  const formula = SHEETS[0].formula;
  const measure = (): string[] =>
    lengths.map((n) => {
      const sheet = whatIfSheet(n, formula);
      let best = Infinity;
      for (let r = 0; r < 3; r++) best = Math.min(best, sheetSeconds(sheet).cpu);
      return `${((best / n) * 1e6).toFixed(1)} µs`;
    });
  console.log(`\n    ${SHEETS[0].label.split("  ")[0]}: CPU time per row against the number of rows`);
  const indexed = measure();
  uninstallEdgeIndex();
  const shipped = measure();
  installEdgeIndex({ reenable: true });
  table(
    ["dependency graph", ...lengths.map((n) => `${n.toLocaleString("en-US")} rows`)],
    [
      ["with the edge index (what protolyte uses)", ...indexed],
      ["HyperFormula as shipped", ...shipped],
    ],
  );
}

function partB(): void {
  console.log(`\n(b) What-if sheet: ${SHEET_ROWS.toLocaleString("en-US")} rows, HyperFormula via src/cli/evaluate.ts evaluateSheets`);
  console.log("    columns A, B: acetic acid and sodium acetate, mol/L, a different pair on every row; C: the formula;");
  console.log("    time = build the engine, evaluate every formula, read all values back (mixture cache cleared first);");
  console.log(`    the sheets take turns, ${SHEET_RUNS} rounds; best CPU time and best wall time of each`);
  registerFloorFunction();
  // Warm-up: JIT-compile HyperFormula's and our code on a smaller sheet of each kind.
  for (const s of SHEETS) sheetSeconds(whatIfSheet(2000, s.formula));
  const sheets = SHEETS.map((s) => whatIfSheet(SHEET_ROWS, s.formula));
  const best = SHEETS.map(() => ({ cpu: Infinity, wall: Infinity, errors: 0, sample: undefined as unknown }));
  const rounds: number[][] = []; // CPU seconds of every sheet, per round
  for (let r = 0; r < SHEET_RUNS; r++) {
    rounds.push([]);
    sheets.forEach((sheet, k) => {
      const t = sheetSeconds(sheet);
      rounds[r].push(t.cpu);
      const b = best[k];
      b.cpu = Math.min(b.cpu, t.cpu);
      b.wall = Math.min(b.wall, t.wall);
      b.errors = Math.max(b.errors, t.errors);
      b.sample = t.sample;
    });
  }
  const rows = SHEETS.map((s, k) => {
    const b = best[k];
    check(b.errors === 0, `${s.label}: ${b.errors} error cells`);
    const sample = typeof b.sample === "number" ? b.sample.toFixed(4) : String(b.sample);
    return [s.label, `${(b.cpu * 1000).toFixed(0)} ms`, `${((b.cpu / SHEET_ROWS) * 1e6).toFixed(1)} µs`, `${(b.wall * 1000).toFixed(0)} ms`, sample];
  });
  table(["sheet", "CPU time", "per row", "wall", "C2"], rows);
  const hh = best[2];
  const ratio = (k: number) => `${(best[k].cpu / hh.cpu).toFixed(2)}× CPU, ${(best[k].wall / hh.wall).toFixed(2)}× wall`;
  console.log(`    ratio AQ.PH / Henderson–Hasselbalch: ${ratio(0)} (fixed range); ${ratio(1)} (inline array)`);
  console.log(`    ratio of a custom function returning 7 with the same arguments / Henderson–Hasselbalch: ${ratio(3)} (HyperFormula's floor)`);
  // The same ratio within each round (the sheets ran back to back): less sensitive to the load of
  // the machine changing between rounds than a ratio of two bests.
  const perRound = (k: number): string => {
    const r = rounds.map((t) => t[k] / t[2]).sort((a, b) => a - b);
    return `median ${r[Math.floor(r.length / 2)].toFixed(2)}×, range ${r[0].toFixed(2)}–${r[r.length - 1].toFixed(2)}×`;
  };
  console.log(`    CPU ratio within each round: AQ.PH (fixed range) ${perRound(0)}; floor ${perRound(3)}`);
  console.log("    target: AQ.PH sheet within 2× the Henderson–Hasselbalch sheet's time");
  partBScaling();
}

// ---- (c) ADJUST and RECIPE -----------------------------------------------------------------

type AnyFn = (...args: unknown[]) => unknown;

function aqFunction(id: string): AnyFn | undefined {
  const fn = (AQ as unknown as Record<string, unknown>)[id];
  return typeof fn === "function" ? (fn as AnyFn) : undefined;
}

function partC(): void {
  console.log("\n(c) Workflow functions: calls per second, one core (target pH varied on every call)");
  const rows: string[][] = [];
  const targets = Array.from({ length: 101 }, (_, i) => 6.8 + i * 0.005);

  const ADJUST = aqFunction("ADJUST");
  const RECIPE = aqFunction("RECIPE");
  check(ADJUST !== undefined && RECIPE !== undefined, "AQ.ADJUST and AQ.RECIPE must exist");
  const names = [["NaH2PO4"], ["Na2HPO4"]];
  const amounts = [[0.03], [0.02]];
  const r1 = rate((i) => (ADJUST!(names, amounts, targets[i % 101], "NaOH") as number[][])[0][0]);
  const r2 = rate((i) => (ADJUST!(names, amounts, targets[i % 101], "NaOH", 1, 800) as number[][])[0][0]);
  rows.push(["AQ.ADJUST(phosphate 30/20 mM, target, \"NaOH\")  mol/L", fmtRate(r1), fmtMicro(r1)]);
  rows.push(["AQ.ADJUST(..., \"NaOH\", 1, 800)  litres of 1 M stock for 800 L", fmtRate(r2), fmtMicro(r2)]);
  const r3 = rate((i) => (RECIPE!("NaH2PO4", "Na2HPO4", targets[i % 101], 0.05, 1) as unknown[][]).length);
  const r4 = rate((i) => (RECIPE!("NaH2PO4", "Na2HPO4", targets[i % 101], 0.05, 1, 25, 0.15, "NaCl") as unknown[][]).length);
  rows.push(["AQ.RECIPE(\"NaH2PO4\", \"Na2HPO4\", target, 0.05, 1)", fmtRate(r3), fmtMicro(r3)]);
  rows.push(["AQ.RECIPE(..., 25, 0.15, \"NaCl\")  made up to I = 0.15 M", fmtRate(r4), fmtMicro(r4)]);
  table(["call", "calls", "per call"], rows);
}

// ---- (d) bundle sizes ----------------------------------------------------------------------

function newestSource(dir: string): number {
  let newest = 0;
  for (const name of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, name.name);
    newest = Math.max(newest, name.isDirectory() ? newestSource(p) : statSync(p).mtimeMs);
  }
  return newest;
}

/** Budget for dist/functions.js, minified (mathjs units included: about 45 kB of it, README Performance (d)). */
const FUNCTIONS_BUDGET_KB = 450;

function kB(bytes: number): string {
  return `${(bytes / 1000).toFixed(1)} kB`;
}

function partD(): void {
  console.log("\n(d) Production bundles (kB = 1000 bytes; gzip level 9)");
  const dist = join(root, "dist");
  let builtNow = false;
  if (build) {
    console.log("    building: npx webpack --mode production");
    const r = spawnSync("npx", ["webpack", "--mode", "production", "--stats", "errors-warnings"], { cwd: root, encoding: "utf8" });
    builtNow = r.status === 0;
    if (r.status !== 0) {
      console.log(`    build FAILED (exit ${r.status}); sizes below are of the dist/ already there, if any`);
      console.log((r.stdout + r.stderr).split("\n").slice(0, 20).map((l) => `      ${l}`).join("\n"));
    }
  }
  const files = ["functions.js", "taskpane.js"];
  if (!files.every((f) => existsSync(join(dist, f)))) {
    console.log("    dist/ has no bundles: run without --no-build");
    return;
  }
  const built = Math.min(...files.map((f) => statSync(join(dist, f)).mtimeMs));
  // webpack leaves a bundle whose content did not change unwritten, with its old date: after a
  // successful build here the sizes are current whatever the dates say.
  const stale = !builtNow && built < newestSource(join(root, "src"));
  const rows = files.map((f) => {
    const bytes = readFileSync(join(dist, f));
    const gz = gzipSync(bytes, { level: 9 }).length;
    return [`dist/${f}`, kB(bytes.length), `${bytes.length.toLocaleString("en-US")} B`, kB(gz), `${gz.toLocaleString("en-US")} B`];
  });
  table(["bundle", "minified", "bytes", "gzip", "bytes"], rows);
  if (stale) console.log("    NOTE: a file in src/ changed after dist/ was built: these sizes may be stale");
  const functionsKB = statSync(join(dist, "functions.js")).size / 1000;
  console.log(`    target: functions bundle ≤ ${FUNCTIONS_BUDGET_KB} kB minified: ${functionsKB <= FUNCTIONS_BUDGET_KB ? "met" : "NOT met"} (${functionsKB.toFixed(1)} kB)`);
  printBundleLoadCost(join(dist, "functions.js"), quick ? 3 : 7);
}

// ---- (e) batching ----------------------------------------------------------------------------

/**
 * The batching pattern documented for custom functions (collect the calls made in one tick, work
 * through them together, resolve each promise), simulated around AQ.PH with equal mixtures grouped,
 * against plain synchronous calls. It does not include Excel's own cost per call, the same either way
 * for the calls themselves; it shows what the pattern adds or saves inside the add-in.
 */
async function partE(): Promise<void> {
  console.log("\n(e) Batching pattern (calls collected in one tick, equal mixtures solved once, promises resolved) vs synchronous calls");
  const PH = (n: unknown, a: unknown, t: unknown, m: unknown): number => (AQ.PH as (...x: unknown[]) => number[][])(n, a, t, m)[0][0];
  const names = [["acetic acid", "sodium acetate"]];
  const rows = Array.from({ length: SHEET_ROWS }, (_, i) => [amountsOf(i)]);
  type Pending = { amounts: unknown; resolve: (v: number) => void; reject: (e: unknown) => void };
  let queue: Pending[] = [];
  let timer: NodeJS.Timeout | null = null;
  const flush = (): void => {
    const batch = queue;
    queue = [];
    timer = null;
    const groups = new Map<string | Pending, Pending[]>();
    for (const p of batch) {
      const key = mixtureKey(names, p.amounts) ?? p;
      const group = groups.get(key);
      if (group) group.push(p);
      else groups.set(key, [p]);
    }
    for (const group of groups.values()) {
      try {
        const v = PH(names, group[0].amounts, null, null);
        for (const p of group) p.resolve(v);
      } catch (error) {
        for (const p of group) p.reject(error);
      }
    }
  };
  const batched = (amounts: unknown): Promise<number> =>
    new Promise((resolve, reject) => {
      queue.push({ amounts, resolve, reject });
      timer ??= setTimeout(flush, 0);
    });
  const modes: [string, number, () => Promise<void>][] = [
    ["synchronous, a new mixture in every call", 1, async () => { for (const r of rows) sink += PH(names, r, null, null); }],
    ["synchronous, each mixture asked 3 times", 3, async () => { for (const r of rows) for (let k = 0; k < 3; k++) sink += PH(names, r, null, null); }],
    ["batched, a new mixture in every call", 1, async () => { for (const v of await Promise.all(rows.map((r) => batched(r)))) sink += v; }],
    ["batched, each mixture asked 3 times", 3, async () => { for (const v of await Promise.all(rows.flatMap((r) => [batched(r), batched(r), batched(r)]))) sink += v; }],
  ];
  // Synchronous modes first: 10 000 pending promises leave a heap in which everything measured
  // afterwards in this process runs slower, so the batched modes come last.
  const best = modes.map(() => Infinity);
  for (let m = 0; m < modes.length; m++) {
    for (let r = 0; r < RUNS; r++) {
      clearMixtureCache();
      const t0 = now();
      await modes[m][2]();
      best[m] = Math.min(best[m], now() - t0);
    }
  }
  const out = modes.map(([label, per], m) => [label, `${((best[m] / (SHEET_ROWS * per)) * 1e6).toFixed(2)} µs`]);
  table([`${SHEET_ROWS.toLocaleString("en-US")} rows of AQ.PH`, "per call"], out);
}

// ---- main ----------------------------------------------------------------------------------

const parts: Record<string, () => void | Promise<void>> = {
  a: partA,
  b: partB,
  c: partC,
  d: partD,
  e: partE,
  f: () => partF(root, quick, build),
  g: () => partStartup(root, quick ? 3 : 7, table),
};

async function main(): Promise<void> {
  for (const p of only) {
    const run = parts[p];
    if (run === undefined) throw new Error(`bench: unknown part '${p}' (use a, b, c, d, e, f, g)`);
    await run();
  }
  if (Number.isNaN(sink)) console.log("(a result was NaN)");
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
