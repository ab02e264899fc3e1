/**
 * Bracketed root finding: Brent's method (R. P. Brent, "Algorithms for Minimization without
 * Derivatives", Prentice-Hall 1973, ch. 4, the algorithm known as zeroin).
 *
 * Method: inverse quadratic interpolation or a secant step when it falls well inside the current
 * bracket and shrinks it fast enough, bisection otherwise. The bracket [a, b] with f(a)·f(b) ≤ 0 is
 * kept at every step, so the iteration cannot leave it and converges for any continuous f; Brent
 * shows at most about (log2((b − a)/tol))² evaluations. The caller's function may fail (an engine
 * failure is returned as is, never replaced by a guess).
 *
 * Stops when the bracket is narrower than 2·(2ε|x| + xtol/2) or when |f(x)| ≤ ftol.
 */
import { fail, fmt } from "../failure";
import type { Failure, Result } from "../types";

const EPS = 2.220446049250313e-16;

/** A function evaluation that may fail: a number, or the engine's failure. */
export type Evaluation = { ok: true; value: number } | Failure;

export type RootResult = Result<{ x: number; fx: number; evaluations: number }>;

export interface RootOptions {
  /** Absolute tolerance on x. Default: 1e-13 × the initial bracket width. */
  xtol?: number;
  /** Stop as soon as |f(x)| ≤ ftol. Default 0 (bracket width only). */
  ftol?: number;
  /** Evaluation cap. Default 300 (bisection alone needs < 110 for a double-precision bracket). */
  maxEvaluations?: number;
}

/**
 * Root of f in [a, b] given f(a) = fa and f(b) = fb of opposite signs (or one of them zero).
 * Fails with "bad-input" when the bracket is invalid and "no-convergence" when the cap is reached.
 */
export function brentRoot(
  f: (x: number) => Evaluation,
  a: number,
  b: number,
  fa: number,
  fb: number,
  options: RootOptions = {},
): RootResult {
  if (!(Number.isFinite(a) && Number.isFinite(b) && Number.isFinite(fa) && Number.isFinite(fb))) {
    return fail("bad-input", "Root bracket or function values are not finite numbers.");
  }
  if (fa === 0) return { ok: true, x: a, fx: 0, evaluations: 0 };
  if (fb === 0) return { ok: true, x: b, fx: 0, evaluations: 0 };
  if (Math.sign(fa) === Math.sign(fb)) {
    return fail("bad-input", `No sign change over [${fmt(a)}, ${fmt(b)}]: f = ${fmt(fa)} and ${fmt(fb)}.`);
  }
  const xtol = options.xtol ?? 1e-13 * Math.abs(b - a);
  const ftol = options.ftol ?? 0;
  const maxEvaluations = options.maxEvaluations ?? 300;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let evaluations = 0; evaluations <= maxEvaluations; ) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol1 = 2 * EPS * Math.abs(b) + 0.5 * xtol;
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || fb === 0 || Math.abs(fb) <= ftol) {
      return { ok: true, x: b, fx: fb, evaluations };
    }
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * xm * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      p = Math.abs(p);
      const min1 = 3 * xm * q - Math.abs(tol1 * q);
      const min2 = Math.abs(e * q);
      if (2 * p < Math.min(min1, min2)) {
        e = d;
        d = p / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm > 0 ? tol1 : -tol1;
    const r = f(b);
    evaluations++;
    if (!r.ok) return r;
    if (!Number.isFinite(r.value)) return fail("no-convergence", `The function is not finite at ${fmt(b)}; no result is given.`);
    fb = r.value;
  }
  return fail("no-convergence", `Root finding did not converge in ${maxEvaluations} evaluations; no result is given.`);
}
