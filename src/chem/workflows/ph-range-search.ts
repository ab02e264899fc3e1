/**
 * Worst-case search over the tolerance box of PHRANGE. See ph-range.ts for the method as a whole.
 *
 * Sign convention: every search maximises s·pH with s = +1 (highest pH) or s = −1 (lowest pH).
 */
import type { Failure } from "../types";
import { goldenMax } from "./golden";
import type { BoxPH } from "./ph-range-model";

export interface BoxPoint {
  values: number[];
  pH: number;
}

/** Relative width (of each interval) to which a coordinate's 1-D search narrows its bracket. */
const LINE_XTOL = 1e-7;
/** Sweeps of the coordinate-wise refinement and of the corner flips (each stops earlier when nothing improves). */
const MAX_SWEEPS = 6;
/** An improvement smaller than this (pH units) does not start another sweep. */
const IMPROVEMENT = 1e-12;

function corner(box: BoxPH, mask: number): number[] {
  return box.qs.map((q, i) => ((mask >> i) & 1 ? q.hi : q.lo));
}

/** Every corner of the box (2^k evaluations): the lowest and the highest pH found. */
export function allCorners(box: BoxPH): { low: BoxPoint; high: BoxPoint } | Failure {
  const k = box.qs.length;
  let low: BoxPoint | null = null;
  let high: BoxPoint | null = null;
  for (let mask = 0; mask < 2 ** k; mask++) {
    const values = corner(box, mask);
    const r = box.at(values);
    if (!r.ok) return r;
    if (low === null || r.value < low.pH) low = { values, pH: r.value };
    if (high === null || r.value > high.pH) high = { values, pH: r.value };
  }
  return { low: low as BoxPoint, high: high as BoxPoint };
}

/**
 * Coordinate-wise bounded 1-D maximisation of s·pH from `start`: for each quantity in turn, a
 * golden-section search over its whole interval with the others held (both ends evaluated too),
 * moving to any better point; repeated until a sweep improves by less than 1e-12 pH.
 */
export function refineCoordinates(box: BoxPH, start: BoxPoint, s: 1 | -1): BoxPoint | Failure {
  let cur = { values: [...start.values], pH: start.pH };
  for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
    const before = s * cur.pH;
    for (let i = 0; i < box.qs.length; i++) {
      const q = box.qs[i];
      const g = (x: number) => {
        const v = [...cur.values];
        v[i] = x;
        const r = box.at(v);
        return r.ok ? { ok: true as const, value: s * r.value } : r;
      };
      const ga = g(q.lo);
      if (!ga.ok) return ga;
      const gb = g(q.hi);
      if (!gb.ok) return gb;
      const best = goldenMax(g, q.lo, q.hi, ga.value, gb.value, LINE_XTOL * (q.hi - q.lo));
      if ("ok" in best) return best;
      if (best.value > s * cur.pH) {
        const values = [...cur.values];
        values[i] = best.x;
        cur = { values, pH: s * best.value };
      }
    }
    if (s * cur.pH - before < IMPROVEMENT) break;
  }
  return cur;
}

/**
 * Local search over corners from `start` (a corner): flip one quantity to its other end whenever
 * that raises s·pH, sweeping until no single flip helps (a 1-flip local optimum among corners).
 */
export function flipCorners(box: BoxPH, start: BoxPoint, s: 1 | -1): BoxPoint | Failure {
  let cur = { values: [...start.values], pH: start.pH };
  for (let sweep = 0; sweep < MAX_SWEEPS * 2; sweep++) {
    let improved = false;
    for (let i = 0; i < box.qs.length; i++) {
      const q = box.qs[i];
      const values = [...cur.values];
      values[i] = values[i] === q.hi ? q.lo : q.hi;
      const r = box.at(values);
      if (!r.ok) return r;
      if (s * r.value > s * cur.pH + IMPROVEMENT) {
        cur = { values, pH: r.value };
        improved = true;
      }
    }
    if (!improved) break;
  }
  return cur;
}
