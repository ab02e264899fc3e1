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
  for (let i = 1; i < grid.length; i++) {
    const r = g(grid[i]);
    if (!r.ok) return { ok: true, found: false, samples, failure: r };
    samples.push({ t: grid[i], value: r.value });
    if (r.value === 0) return { ok: true, found: true, t: grid[i], evaluations: i + 1 };
    if (Math.sign(r.value) !== s0) {
      const prev = samples[i - 1];
      const root = brentRoot(g, prev.t, grid[i], prev.value, r.value, { ftol });
      if (!root.ok) return root;
      return { ok: true, found: true, t: root.x, evaluations: i + 1 + root.evaluations };
    }
  }
  return { ok: true, found: false, samples };
}

/** 0 followed by geometric points from `from` to `to` (inclusive), `perDecade` per factor of ten. */
export function geometricGrid(from: number, to: number, perDecade: number): number[] {
  const grid = [0];
  const decades = Math.log10(to / from);
  const n = Math.max(1, Math.ceil(decades * perDecade));
  for (let i = 0; i <= n; i++) grid.push(from * Math.pow(to / from, i / n));
  return grid;
}
