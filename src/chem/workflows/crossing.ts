/**
 * First crossing of a target along a path: the smallest parameter t ≥ 0 at which g(t) = 0, where
 * g(t) = pH(t) − target along a titration or mixing path.
 *
 * Method: g is evaluated at t = 0 and then at the points of an ascending grid, lazily, until its
 * sign differs from the sign at 0 (or it is exactly 0). That grid interval is a guaranteed bracket,
 * refined with Brent's method (brent.ts). The grid makes the search robust to a pH that is not
 * monotone in t (it finds the first crossing, not just any); a crossing that enters and leaves
 * within one grid interval is not seen, so grids are fine near 0 (geometric spacing).
 * If no grid point changes sign the target is not reached along the path: the caller gets every
 * value seen, to say which way and how far the path goes.
 * A point beyond the ionic-strength limit ("beyond-limit") ends the path there: the boundary
 * between the last point with a value and the first without is found by bisection (to 1e-12 of
 * the interval), each point on the way checked for the crossing, so a target reached just inside
 * the limit is still found and an unreachable one is reported with the last pH the limit allows.
 */
import { brentRoot, type Evaluation } from "./brent";
import type { Failure } from "../types";

export interface Sample {
  t: number;
  value: number;
}

export type CrossingResult =
  | { ok: true; found: true; t: number; evaluations: number }
  | { ok: true; found: false; samples: Sample[]; failure?: Failure }
  | Failure;

/**
 * Scans `grid` (ascending, grid[0] is the start) for the first sign change of g and refines it.
 * When an evaluation fails part-way, the scan stops there and reports found: false with the
 * samples so far and the failure (the path cannot be followed further); a failure at grid[0] is
 * returned as is.
 */
export function firstCrossing(g: (t: number) => Evaluation, grid: readonly number[], ftol: number): CrossingResult {
  const first = g(grid[0]);
  if (!first.ok) return first;
  const samples: Sample[] = [{ t: grid[0], value: first.value }];
  if (first.value === 0) return { ok: true, found: true, t: grid[0], evaluations: 1 };
  const s0 = Math.sign(first.value);
  const bracketed = (prev: Sample, t: number, value: number, evaluations: number): CrossingResult => {
    const root = brentRoot(g, prev.t, t, prev.value, value, { ftol });
    if (!root.ok) return root;
    return { ok: true, found: true, t: root.x, evaluations: evaluations + root.evaluations };
  };
  for (let i = 1; i < grid.length; i++) {
    const r = g(grid[i]);
    if (!r.ok && r.code === "beyond-limit") return toBoundary(g, samples, grid[i], r, s0, i + 1, bracketed);
    if (!r.ok) return { ok: true, found: false, samples, failure: r };
    samples.push({ t: grid[i], value: r.value });
    if (r.value === 0) return { ok: true, found: true, t: grid[i], evaluations: i + 1 };
    if (Math.sign(r.value) !== s0) return bracketed(samples[i - 1], grid[i], r.value, i + 1);
  }
  return { ok: true, found: false, samples };
}

/** Bisection towards the ionic-strength limit between the last sample and `bad` (see the header). */
function toBoundary(
  g: (t: number) => Evaluation,
  samples: Sample[],
  bad: number,
  failure: Failure,
  s0: number,
  evaluations: number,
  bracketed: (prev: Sample, t: number, value: number, evaluations: number) => CrossingResult,
): CrossingResult {
  let a = samples[samples.length - 1].t;
  let b = bad;
  const width = b - a;
  let n = evaluations;
  let stop = failure;
  while (b - a > 1e-12 * width) {
    const m = 0.5 * (a + b);
    if (m <= a || m >= b) break;
    const r = g(m);
    n++;
    if (!r.ok) {
      if (r.code !== "beyond-limit") return { ok: true, found: false, samples, failure: r };
      b = m;
      stop = r;
      continue;
    }
    if (r.value === 0) return { ok: true, found: true, t: m, evaluations: n };
    if (Math.sign(r.value) !== s0) return bracketed(samples[samples.length - 1], m, r.value, n);
    samples.push({ t: m, value: r.value });
    a = m;
  }
  return { ok: true, found: false, samples, failure: stop };
}

/** 0 followed by geometric points from `from` to `to` (inclusive), `perDecade` per factor of ten. */
export function geometricGrid(from: number, to: number, perDecade: number): number[] {
  const grid = [0];
  const decades = Math.log10(to / from);
  const n = Math.max(1, Math.ceil(decades * perDecade));
  for (let i = 0; i <= n; i++) grid.push(from * Math.pow(to / from, i / n));
  return grid;
}
