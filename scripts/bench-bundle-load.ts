/**
 * Part of (d) of `npm run bench`: what the production functions bundle costs when Excel opens it.
 * In a fresh Node process each run: dist/functions.js is run in the process's own context with the
 * custom-functions runtime stubbed (associate collects the functions), then AQ.PH is called once with
 * numbers (the engine's first solve) and once with unit text ("25 mM": mathjs's Unit class and the
 * trade's units are made on that first use), then once more with other unit text. CPU time of the
 * process (user + system) around each step; best of RUNS runs (other processes only slow a run down).
 * Node is not Excel's JavaScript runtime: the figures compare builds on one machine.
 */
import { spawnSync } from "node:child_process";

const CHILD = String.raw`
const fs = require("fs"), vm = require("vm");
const file = process.argv[1];
const code = fs.readFileSync(file, "utf8");
const fns = {};
globalThis.CustomFunctions = {
  associate: (id, f) => { fns[id] = f; },
  Error: class extends Error { constructor(code, message) { super(message); this.code = code; } },
  ErrorCode: new Proxy({}, { get: (_, k) => String(k) }),
};
globalThis.Office = { onReady: () => Promise.resolve({}) };
globalThis.self = globalThis;
const cpu = (f) => { const c = process.cpuUsage(); const r = f(); const d = process.cpuUsage(c); return [(d.user + d.system) / 1000, r]; };
const names = [["acetic acid", "sodium acetate"]];
const [load] = cpu(() => vm.runInThisContext(code, { filename: file }));
const [numbers, a] = cpu(() => fns.PH(names, [[0.021, 0.029]]));
const [firstUnit, b] = cpu(() => fns.PH(names, [["25 mM", "25 mM"]]));
const [nextUnit, c] = cpu(() => fns.PH(names, [["20 mmol/L", "30 mM"]]));
const ok = [a, b, c].every((r) => Array.isArray(r) && typeof r[0][0] === "number" && r[0][0] > 3 && r[0][0] < 7);
process.stdout.write(JSON.stringify({ ok, load, numbers, firstUnit, nextUnit }));
`;

interface LoadCost {
  load: number;
  numbers: number;
  firstUnit: number;
  nextUnit: number;
}

/** Best (lowest) CPU milliseconds of each step over `runs` fresh processes; null if a run failed. */
export function bundleLoadCost(file: string, runs: number): LoadCost | null {
  const best: LoadCost = { load: Infinity, numbers: Infinity, firstUnit: Infinity, nextUnit: Infinity };
  for (let i = 0; i < runs; i++) {
    const r = spawnSync(process.execPath, ["-e", CHILD, file], { encoding: "utf8" });
    if (r.status !== 0) return null;
    const got = JSON.parse(r.stdout) as LoadCost & { ok: boolean };
    if (!got.ok) return null;
    for (const k of Object.keys(best) as (keyof LoadCost)[]) best[k] = Math.min(best[k], got[k]);
  }
  return best;
}

export function printBundleLoadCost(file: string, runs: number): void {
  const cost = bundleLoadCost(file, runs);
  if (!cost) {
    console.log("    load cost: the bundle did not load or AQ.PH gave no pH in Node: not measured");
    return;
  }
  const ms = (x: number): string => `${x.toFixed(1)} ms`;
  console.log(
    `    load cost (CPU, fresh Node process, best of ${runs}): loading dist/functions.js ${ms(cost.load)}; ` +
      `first AQ.PH with numbers ${ms(cost.numbers)}; first with unit text (makes mathjs's Unit class) ${ms(cost.firstUnit)}; ` +
      `next unit text ${ms(cost.nextUnit)}`,
  );
}
