/**
 * pHRange: the lowest and highest pH over a tolerance box on the amounts (a relative tolerance per
 * entry) and, optionally, ± an uncertainty on every pKa.
 *
 * Method (worst case, not a statistical interval):
 * - The varied quantities are the k amounts with a positive tolerance (entries of the same
 *   component merged, exactly) and, with u > 0, every pKa step of every system present
 *   (ph-range-model.ts); at most PHRANGE_MAX_QUANTITIES (64), else "out-of-range".
 * - pH is monotone in each quantity only in some cases: in a strong-ion amount and in a pKa with
 *   ideal activity (the charge balance is monotone in both), but not in general — an amount also
 *   changes the ionic strength, and with an activity model the pH can have an interior extremum in
 *   it (a salt near the top of the Davies curve, ≈ 0.7 mol/L). So:
 * - k ≤ maxExhaustive (default 12): every one of the 2^k corners is evaluated ("corners",
 *   exhaustive), then from the lowest and from the highest corner a coordinate-wise bounded 1-D
 *   search (golden section over each quantity's whole interval, the others held; repeated sweeps)
 *   moves to any better interior point. This is exact when pH is monotone in every quantity, and
 *   finds interior extrema along the coordinate directions from the worst corner; an extremum that
 *   is interior in several quantities jointly and not reachable that way is the stated limit.
 * - k > maxExhaustive: 2^k corners are too many ("local-search", not exhaustive, flagged): start at
 *   the corner the linearisation points to (each quantity at the end its derivative favours), flip
 *   single quantities to their other end while that helps (a 1-flip local optimum), then the same
 *   coordinate-wise refinement. Exact for monotone, non-interacting quantities; otherwise a bound
 *   from inside (the true band may be wider), which is why it is flagged.
 * - The linearised band pH₀ ± Σ|∂pH/∂qᵢ|·Δqᵢ (central differences at the nominal point, step 1e-4
 *   of each half-width) is returned too, for comparison; it is never the answer.
 * - Beside the worst case, a statistical band after the ISO Guide to the expression of uncertainty
 *   in measurement (GUM, JCGM 100:2008, §5.1.2 linear propagation, §4.3.7 rectangular distribution):
 *   each varied quantity uniform over its interval, u(qᵢ) = half-width/√3, uncorrelated, so
 *   u(pH)² = Σ (∂pH/∂qᵢ)²·u(qᵢ)², reported as pH₀ ± k·u with k = 2 (about 95 % for a near-normal
 *   result). Same derivatives as the linearised band.
 */
import { fail } from "../failure";
import type { ChemOptions, Mixture, Result } from "../types";
import { resolveOptions } from "../validate-options";
import { prepare } from "../prepared";
import { groupEntries } from "./mixing";
import { BoxPH, quantitiesOf, type Quantity } from "./ph-range-model";
import { allCorners, flipCorners, refineCoordinates, type BoxPoint } from "./ph-range-search";

export interface PHRangeOptions extends ChemOptions {
  /** ± on every pKa, pH units (≥ 0, ≤ 2). Default 0. */
  pKaUncertainty?: number;
  /** Largest k for the exhaustive corner search. Default 12 (4096 corners), at most 16. */
  maxExhaustive?: number;
}

export interface PHRangeValue {
  low: number;
  high: number;
  /** pH at the nominal amounts and constants. */
  nominal: number;
  method: "corners" | "local-search" | "none";
  /** True when all 2^k corners were evaluated. */
  exhaustive: boolean;
  /** The mixture searched: one entry per distinct component (entries of the same one merged). */
  mixture: Mixture;
  /** The quantities varied (entry indices into `mixture`), in the order of the points' values. */
  quantities: Quantity[];
  lowAt: BoxPoint;
  highAt: BoxPoint;
  linear: { low: number; high: number };
  /** GUM band: pH₀ ± k·u, u from linear propagation of rectangular standard uncertainties. */
  statistical: StatisticalBand;
  evaluations: number;
}

export interface StatisticalBand {
  low: number;
  high: number;
  /** Combined standard uncertainty of the pH. */
  u: number;
  /** Coverage factor. */
  k: number;
  method: string;
}

/** Coverage factor of the statistical band. */
export const PHRANGE_COVERAGE_K = 2;
export const PHRANGE_STATISTICAL_METHOD = "GUM linear propagation, rectangular distributions (u = half-width/√3), k = 2";

/** The GUM band around pH₀ from a sum of squared (derivative × half-width) terms. */
export function statisticalBand(nominal: number, sumSquaresOfHalfWidthEffects: number): StatisticalBand {
  const u = Math.sqrt(sumSquaresOfHalfWidthEffects / 3);
  const k = PHRANGE_COVERAGE_K;
  return { low: nominal - k * u, high: nominal + k * u, u, k, method: PHRANGE_STATISTICAL_METHOD };
}

export type PHRangeResult = Result<PHRangeValue>;

export const PHRANGE_MAX_EXHAUSTIVE = 12;
/** Most quantities the search takes on (the local search costs about 40·k² pH evaluations). */
export const PHRANGE_MAX_QUANTITIES = 64;
const MAX_EXHAUSTIVE_LIMIT = 16;
const MAX_PKA_UNCERTAINTY = 2;

function checkInputs(mix: Mixture, tolerances: number | readonly number[], opts: PHRangeOptions): number[] | ReturnType<typeof fail> {
  const list = typeof tolerances === "number" ? mix.map(() => tolerances) : tolerances;
  if (!Array.isArray(list) || list.length !== mix.length) {
    return fail("bad-input", `Give one amount tolerance, or one per mixture entry (${mix.length}); got ${Array.isArray(list) ? list.length : String(tolerances)}.`);
  }
  for (let i = 0; i < list.length; i++) {
    const t = list[i];
    if (typeof t !== "number" || !Number.isFinite(t) || t < 0 || t >= 1) {
      return fail("bad-input", `The amount tolerance of entry ${i + 1} must be a relative tolerance from 0 to below 1 (0.02 for ±2 %), got ${String(t)}.`);
    }
  }
  const u = opts.pKaUncertainty ?? 0;
  if (typeof u !== "number" || !Number.isFinite(u) || u < 0 || u > MAX_PKA_UNCERTAINTY) {
    return fail("bad-input", `The pKa uncertainty must be a number from 0 to ${MAX_PKA_UNCERTAINTY} pH units, got ${String(u)}.`);
  }
  const m = opts.maxExhaustive ?? PHRANGE_MAX_EXHAUSTIVE;
  if (!Number.isInteger(m) || m < 0 || m > MAX_EXHAUSTIVE_LIMIT) {
    return fail("bad-input", `maxExhaustive must be a whole number from 0 to ${MAX_EXHAUSTIVE_LIMIT}, got ${String(m)}.`);
  }
  return list as number[];
}

/** Linearised band and the derivative signs at the nominal point. */
function linearise(box: BoxPH, nominal: number): { low: number; high: number; signs: number[]; sumSq: number } | ReturnType<typeof fail> {
  let spread = 0;
  let sumSq = 0;
  const signs: number[] = [];
  const x0 = box.nominal;
  for (let i = 0; i < box.qs.length; i++) {
    const q = box.qs[i];
    const half = 0.5 * (q.hi - q.lo);
    const h = 1e-4 * half;
    const up = [...x0];
    const dn = [...x0];
    up[i] += h;
    dn[i] -= h;
    const a = box.at(up);
    if (!a.ok) return a;
    const b = box.at(dn);
    if (!b.ok) return b;
    // An interval below the resolution of doubles has no measurable effect (h underflows to 0).
    const d = h > 0 ? (a.value - b.value) / (2 * h) : 0;
    if (!Number.isFinite(d)) return fail("no-convergence", `The pH derivative with respect to ${q.label} is not finite; no result is given.`);
    signs.push(d >= 0 ? 1 : -1);
    spread += Math.abs(d) * half;
    sumSq += d * half * (d * half);
  }
  return { low: nominal - spread, high: nominal + spread, signs, sumSq };
}

/** Lowest and highest pH over the tolerance box (worst case), with the linearised band for comparison. */
export function phRange(mix: Mixture, tolerances: number | readonly number[], opts: PHRangeOptions = {}): PHRangeResult {
  const o = resolveOptions(opts);
  if (!o.ok) return o;
  const p = prepare(mix);
  if (!p.ok) return p;
  const tol = checkInputs(mix, tolerances, opts);
  if (!Array.isArray(tol)) return tol;
  const chem: ChemOptions = { temperatureC: o.temperatureC, activity: o.activity };
  const { components, groupOf } = groupEntries(mix);
  const nominalConc = components.map(() => 0);
  const lo = components.map(() => 0);
  const hi = components.map(() => 0);
  mix.forEach((e, i) => {
    const g = groupOf[i];
    nominalConc[g] += e.conc;
    lo[g] += e.conc * (1 - tol[i]);
    hi[g] += e.conc * (1 + tol[i]);
  });
  const merged: Mixture = components.map((component, g) => ({ component, conc: nominalConc[g] }));
  const qs = quantitiesOf(merged, lo, hi, opts.pKaUncertainty ?? 0);
  if (qs.length > PHRANGE_MAX_QUANTITIES) {
    return fail(
      "out-of-range",
      `${qs.length} quantities vary (amounts of distinct substances and pKa steps): the worst-case search handles at most ${PHRANGE_MAX_QUANTITIES}. Give tolerances only to the amounts that vary, or leave out the pKa uncertainty.`,
    );
  }
  const box = new BoxPH(merged, qs, chem);
  const nom = box.at(box.nominal);
  if (!nom.ok) return nom;
  const nominalPoint = { values: box.nominal, pH: nom.value };
  const lin = linearise(box, nom.value);
  if (!("signs" in lin)) return lin;
  if (qs.length === 0) {
    return { ok: true, low: nom.value, high: nom.value, nominal: nom.value, method: "none", exhaustive: true, mixture: merged, quantities: qs, lowAt: nominalPoint, highAt: nominalPoint, linear: { low: lin.low, high: lin.high }, statistical: statisticalBand(nom.value, lin.sumSq), evaluations: box.evaluations };
  }
  const exhaustive = qs.length <= (opts.maxExhaustive ?? PHRANGE_MAX_EXHAUSTIVE);
  let lowStart: BoxPoint;
  let highStart: BoxPoint;
  if (exhaustive) {
    const c = allCorners(box);
    if ("ok" in c) return c;
    lowStart = c.low;
    highStart = c.high;
  } else {
    const guided = (s: 1 | -1): BoxPoint | ReturnType<typeof fail> => {
      const values = qs.map((q, i) => (lin.signs[i] * s > 0 ? q.hi : q.lo));
      const r = box.at(values);
      if (!r.ok) return r;
      return flipCorners(box, { values, pH: r.value }, s);
    };
    const l = guided(-1);
    if ("ok" in l) return l;
    const h = guided(1);
    if ("ok" in h) return h;
    lowStart = l;
    highStart = h;
  }
  const low = refineCoordinates(box, lowStart, -1);
  if ("ok" in low) return low;
  const high = refineCoordinates(box, highStart, 1);
  if ("ok" in high) return high;
  // The nominal point is in the box too: with a pH that is not monotone it can be the extreme.
  return {
    ok: true,
    low: Math.min(low.pH, nom.value),
    high: Math.max(high.pH, nom.value),
    nominal: nom.value,
    method: exhaustive ? "corners" : "local-search",
    exhaustive,
    mixture: merged,
    quantities: qs,
    lowAt: low.pH <= nom.value ? low : nominalPoint,
    highAt: high.pH >= nom.value ? high : nominalPoint,
    linear: { low: lin.low, high: lin.high },
    statistical: statisticalBand(nom.value, lin.sumSq),
    evaluations: box.evaluations,
  };
}
