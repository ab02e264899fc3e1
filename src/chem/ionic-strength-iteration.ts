/**
 * Ionic strength to self-consistency around the charge balance.
 *
 * G(I) = I computed from the speciation solved at the constants for I. G(I_strong)
 * ≥ I_strong (the strong ions alone), and G is bounded, so I = G(I) has a root in a bracket
 * [lo, hi] found on the way. The iteration is a fixed point with adaptive damping (Wegstein, i.e. a
 * secant step on G(I) − I), kept inside the bracket and replaced by bisection when it leaves it or
 * stalls. It stops when |G(I) − I| ≤ 1e-12·G(I).
 *
 * Each evaluation of G warm-starts the charge balance from the previous root, so after the first,
 * cold, solve most evaluations take two or three Newton steps. The ideal model needs one solve.
 */
import { ACTIVITY_MODELS } from "./activity/models";
import { SOLVER } from "./defaults";
import type { ChargeBalanceSolver } from "./solver-core";
import type { ActivityModel } from "./types";

/**
 * Solves charge balance and ionic strength together at the solver's current temperature under
 * `model`. Returns true on convergence; the solver's state (x, ionicStrength, kc, kwc, lnGamma1) is
 * then the solution. Returns false if the iteration cap is reached (the caller reports
 * "no-convergence").
 */
export function solveCoupled(core: ChargeBalanceSolver, model: ActivityModel): boolean {
  core.model = model;
  core.evaluations = 0;
  core.outerIterations = 0;
  let I = core.strongIonic;
  core.setIonicStrength(I);
  if (!core.solveLnH(NaN)) return false;
  core.outerIterations = 1;
  if (!ACTIVITY_MODELS[model].dependsOnIonicStrength) {
    core.setIonicStrength(core.ionicFromSpeciation);
    return true;
  }
  let lo = I;
  let hi = Infinity;
  let prevI = NaN;
  let prevG = NaN;
  let lastAbsG = Infinity;
  let Gv = core.ionicFromSpeciation;
  const rtol = SOLVER.ionicStrengthRelTolerance;
  for (let it = 1; it < SOLVER.maxIonicStrengthIterations; it++) {
    const g = Gv - I;
    if (Math.abs(g) <= rtol * Gv) {
      // Converged: the state is the solution for I; report I as the ionic strength.
      return true;
    }
    if (g > 0) lo = I > lo ? I : lo;
    else hi = I < hi ? I : hi;
    let In = Gv;
    if (!Number.isNaN(prevI) && I !== prevI) {
      const slope = (g - prevG) / (I - prevI);
      if (slope < 0) In = I - g / slope;
    }
    const stalled = Math.abs(g) > 0.5 * lastAbsG;
    if (!(In > lo && In < hi) || (stalled && hi !== Infinity)) {
      In = hi === Infinity ? Gv : 0.5 * (lo + hi);
    }
    lastAbsG = Math.abs(g);
    prevI = I;
    prevG = g;
    I = In;
    core.setIonicStrength(I);
    if (!core.solveLnH(core.x)) return false;
    core.outerIterations = it + 1;
    Gv = core.ionicFromSpeciation;
  }
  return false;
}
