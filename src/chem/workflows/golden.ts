/**
 * Bounded 1-D maximisation by golden-section search (Kiefer 1953), keeping the best point seen.
 *
 * The bracket shrinks by 0.618 per evaluation whatever f does, so the search always ends; for a
 * unimodal f on [a, b] it converges to the maximum, for a monotone f to the higher end. The result
 * is the best value among every evaluation (interior points and both ends), never a guess.
 */
import type { Evaluation } from "./brent";
import type { Failure } from "../types";

const INV_PHI = (Math.sqrt(5) - 1) / 2;
/** 0.618^200 ≈ 1e-42: far more than any bracket of doubles needs. */
const MAX_ITERATIONS = 200;

export interface Best {
  x: number;
  value: number;
}

/** Maximum of f over [a, b] to an interval width of `xtol`; fa and fb are f at the ends. */
export function goldenMax(f: (x: number) => Evaluation, a: number, b: number, fa: number, fb: number, xtol: number): Best | Failure {
  let best: Best = fa >= fb ? { x: a, value: fa } : { x: b, value: fb };
  let lo = a;
  let hi = b;
  let x1 = hi - INV_PHI * (hi - lo);
  let x2 = lo + INV_PHI * (hi - lo);
  const r1 = f(x1);
  if (!r1.ok) return r1;
  const r2 = f(x2);
  if (!r2.ok) return r2;
  let f1 = r1.value;
  let f2 = r2.value;
  const keep = (x: number, v: number) => {
    if (v > best.value) best = { x, value: v };
  };
  keep(x1, f1);
  keep(x2, f2);
  // The bracket cannot shrink below the spacing of doubles at its ends: a smaller xtol (a tolerance
  // interval of 1e-12 around a pKa of 7) would loop forever. The cap is a second guard.
  const tol = Math.max(xtol, 4 * Number.EPSILON * Math.max(Math.abs(a), Math.abs(b)));
  for (let it = 0; hi - lo > tol && it < MAX_ITERATIONS; it++) {
    if (f1 >= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - INV_PHI * (hi - lo);
      const r = f(x1);
      if (!r.ok) return r;
      f1 = r.value;
      keep(x1, f1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + INV_PHI * (hi - lo);
      const r = f(x2);
      if (!r.ok) return r;
      f2 = r.value;
      keep(x2, f2);
    }
  }
  return best;
}
