/**
 * Part (f5) of `npm run bench` (scripts/bench-tables.ts runs it): would starting each row of a
 * what-if table from its neighbour's solution pay? Measured, not built.
 */
import { prepare } from "../src/chem";
import { solveCoupled } from "../src/chem/ionic-strength-iteration";
import { getActiveLibrary } from "../src/library";

function cpuNow(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

const us = (seconds: number, rows: number): string => `${((seconds / rows) * 1e6).toFixed(2)} µs`;

/** Row i: acetic acid and sodium acetate, mol/L (the grid of part b and of f1). */
function amountsOf(i: number): [number, number] {
  return [0.01 + (i % 100) * 0.001, 0.01 + (Math.floor(i / 100) % 100) * 0.001];
}

/**
 * f5, a probe for the neighbour warm start (issue 19, item 2): the charge-balance evaluations per row
 * of a 10 000-row acetate grid solved cold (the product's path) and with the first solve started from
 * the previous row's ln[H⁺]; a count, so independent of the machine's load. Reaches into the solver
 * (not an API): it measures whether the change would be worth making.
 */
export function f5(tablePerRow: number): void {
  const lib = getActiveLibrary();
  const comp = (n: string) => {
    const r = lib.resolve(n);
    if (!r.ok) throw new Error(`bench: ${n}`);
    return r.component;
  };
  const [acid, salt] = [comp("acetic acid"), comp("sodium acetate")];
  const N = 10_000;
  type Core = { evaluations: number; x: number; lnGamma1: number; setTemperature(t: number): void; solveLnH(x: number): boolean };
  const cores = Array.from({ length: N }, (_, i) => {
    const [a, b] = amountsOf(i);
    return (prepare([{ component: acid, conc: a }, { component: salt, conc: b }]) as unknown as { core: Core }).core;
  });
  const solve = (core: Core, start: number): number => {
    core.setTemperature(25);
    const own = core.solveLnH.bind(core);
    let first = true;
    core.solveLnH = (x: number) => {
      const from = first ? start : x;
      first = false;
      return own(from);
    };
    solveCoupled(core as never, "davies");
    core.solveLnH = own;
    return -(core.x + core.lnGamma1) / Math.LN10;
  };
  // CPU time per row, cold and warm, each a pass over the grid (best of 5, taking turns).
  const pass = (warmStart: boolean): number => {
    let previous = NaN;
    const t0 = cpuNow();
    for (const core of cores) {
      solve(core, warmStart ? previous : NaN);
      previous = core.x;
    }
    return (cpuNow() - t0) / N;
  };
  const time = { cold: Infinity, warm: Infinity };
  for (let r = 0; r < 5; r++) {
    time.cold = Math.min(time.cold, pass(false));
    time.warm = Math.min(time.warm, pass(true));
  }
  let cold = 0;
  let warm = 0;
  let largest = 0;
  let previous = NaN;
  for (const core of cores) {
    const pH = solve(core, NaN);
    cold += core.evaluations;
    const x = core.x;
    const pHWarm = solve(core, previous);
    warm += core.evaluations;
    largest = Math.max(largest, Math.abs(pHWarm - pH));
    previous = x;
  }
  console.log(`\n(f5) Neighbour warm start, probe: charge-balance evaluations and CPU per row, ${N.toLocaleString("en-US")}-row acetate grid, Davies, 25 °C`);
  console.log(`    evaluations: cold (as shipped) ${(cold / N).toFixed(2)}; from the previous row's ln[H+] ${(warm / N).toFixed(2)} (${((1 - warm / cold) * 100).toFixed(0)} % fewer); largest pH difference ${largest.toExponential(1)}`);
  const saved = time.cold - time.warm;
  const share = Number.isFinite(tablePerRow) ? `, ${((saved / tablePerRow) * 100).toFixed(1)} % of the one-formula table's ${us(tablePerRow, 1)} a row (f1)` : "";
  console.log(`    solve CPU per row: cold ${us(time.cold, 1)}, warm ${us(time.warm, 1)}: ${us(saved, 1)} saved${share}`);
}

