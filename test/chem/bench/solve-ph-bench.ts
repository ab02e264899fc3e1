/**
 * Throughput of the fast path: phosphate (NaH2PO4) + NaCl + NaOH, Davies, 25 °C, one core.
 * Run: npx tsx test/chem/bench/solve-ph-bench.ts   (not a jest test: timings depend on the machine)
 * 35 slightly different mixtures are cycled so that no result can be cached; a warm-up precedes
 * each timed loop of 400 000 calls.
 */
import { prepare, solvePH } from "../../../src/chem";
import * as f from "../fixtures";

const mixes = Array.from({ length: 35 }, (_, i) =>
  f.mixture([f.NaH2PO4, 0.05 + (i % 7) * 1e-3], [f.NaCl, 0.1], [f.NaOH, 0.02 + (i % 5) * 1e-3]),
);
const opts = { temperatureC: 25, activity: "davies" as const };

function bench(label: string, fn: (i: number) => number): void {
  let sink = 0;
  for (let i = 0; i < 20000; i++) sink += fn(i);
  const n = 400000;
  const t0 = process.hrtime.bigint();
  for (let i = 0; i < n; i++) sink += fn(i);
  const seconds = Number(process.hrtime.bigint() - t0) / 1e9;
  console.log(`${label}: ${Math.round(n / seconds)} solves/s (${((seconds / n) * 1e6).toFixed(2)} µs each; checksum ${sink.toFixed(3)})`);
}

bench("solvePH(mix, opts), mixture prepared on every call", (i) => {
  const r = solvePH(mixes[i % 35], opts);
  return r.ok ? r.pH : 0;
});
const prepared = mixes.map((m) => {
  const p = prepare(m);
  if (!p.ok) throw new Error(p.message);
  return p;
});
bench("prepare(mix) once, then p.solvePH(opts)", (i) => {
  const r = prepared[i % 35].solvePH(opts);
  return r.ok ? r.pH : 0;
});
bench("prepare(mix) once, then p.solve(opts) (full equilibrium)", (i) => {
  const r = prepared[i % 35].solve(opts);
  return r.ok ? r.pH : 0;
});
