/**
 * Equivalence points of a sampled titration curve: the maxima of |dpH/dv|.
 *
 * Method:
 * 1. Secant slopes s_i = ΔpH/Δv between consecutive samples. A candidate is an interior local
 *    maximum of |s| (larger than the secant before it, not smaller than the one after; the first and
 *    last secants are never candidates, so the steep start of a weak-acid titration is not one).
 * 2. Prominence: going left and right from the candidate until a steeper secant (or the end of the
 *    curve), the smallest |s| on each side is a base; the candidate is kept when its |s| is at least
 *    EQUIVALENCE_PROMINENCE times the higher base. This drops shoulders and numerical ripples and
 *    keeps the jumps a chemist would call equivalence points.
 * 3. Refinement: the window of the two neighbouring secants is resampled in 16 steps and narrowed
 *    to the neighbours of its steepest secant, until narrower than 1e-12 of the curve's range; the
 *    point is the middle of the steepest secant. A jump sharper than the sampling (a strong acid with
 *    a strong base) is located to that precision too.
 * Limits: an equivalence point within one sample of either end, or whose jump is less than
 * EQUIVALENCE_PROMINENCE times the slope around it (a very weak acid, pKa ≳ 10), is not reported.
 */
import type { Failure } from "../types";

/** Ratio of a peak's slope to the higher of its two bases for the peak to count. */
export const EQUIVALENCE_PROMINENCE = 1.5;
const REFINE_STEPS = 16;
const REFINE_MAX_ROUNDS = 60;

export interface EquivalencePoint {
  /** Titrant volume, L. */
  volume: number;
  pH: number;
  /** dpH/dv at the point, pH units per litre of titrant (negative for an acid titrant). */
  slope: number;
  /** Index of the sample nearest to the point. */
  nearestIndex: number;
}

type PHAt = (v: number) => { ok: true; pH: number } | Failure;

function candidates(v: readonly number[], pH: readonly number[]): number[] {
  const s = v.slice(1).map((vi, i) => Math.abs((pH[i + 1] - pH[i]) / (vi - v[i])));
  const kept: number[] = [];
  for (let i = 1; i < s.length - 1; i++) {
    if (!(s[i] > s[i - 1] && s[i] >= s[i + 1])) continue;
    let left = s[i];
    for (let j = i - 1; j >= 0 && s[j] <= s[i]; j--) left = Math.min(left, s[j]);
    let right = s[i];
    for (let j = i + 1; j < s.length && s[j] <= s[i]; j++) right = Math.min(right, s[j]);
    if (s[i] >= EQUIVALENCE_PROMINENCE * Math.max(left, right)) kept.push(i);
  }
  return kept;
}

function refine(pHAt: PHAt, lo: number, hi: number, tolerance: number): { volume: number; pH: number; slope: number } | Failure {
  let a = lo;
  let b = hi;
  let best = { volume: 0.5 * (a + b), slope: 0 };
  for (let round = 0; round < REFINE_MAX_ROUNDS; round++) {
    const us: number[] = [];
    const ps: number[] = [];
    for (let k = 0; k <= REFINE_STEPS; k++) {
      const u = a + ((b - a) * k) / REFINE_STEPS;
      const r = pHAt(u);
      if (!r.ok) return r;
      us.push(u);
      ps.push(r.pH);
    }
    let j = 0;
    let steepest = -1;
    for (let k = 0; k < REFINE_STEPS; k++) {
      const slope = (ps[k + 1] - ps[k]) / (us[k + 1] - us[k]);
      if (Math.abs(slope) > steepest) {
        steepest = Math.abs(slope);
        j = k;
        best = { volume: 0.5 * (us[k] + us[k + 1]), slope };
      }
    }
    const na = us[Math.max(0, j - 1)];
    const nb = us[Math.min(REFINE_STEPS, j + 2)];
    if (nb - na <= tolerance) break;
    a = na;
    b = nb;
  }
  const at = pHAt(best.volume);
  if (!at.ok) return at;
  return { volume: best.volume, pH: at.pH, slope: best.slope };
}

/** Equivalence points of the curve sampled at volumes v (ascending) with pH values pH. */
export function equivalencePoints(v: readonly number[], pH: readonly number[], pHAt: PHAt): EquivalencePoint[] | Failure {
  const out: EquivalencePoint[] = [];
  const tolerance = 1e-12 * (v[v.length - 1] - v[0]);
  for (const i of candidates(v, pH)) {
    const r = refine(pHAt, v[i - 1], v[i + 2], tolerance);
    if ("ok" in r) return r;
    let nearestIndex = 0;
    for (let k = 1; k < v.length; k++) if (Math.abs(v[k] - r.volume) < Math.abs(v[nearestIndex] - r.volume)) nearestIndex = k;
    out.push({ ...r, nearestIndex });
  }
  return out;
}
