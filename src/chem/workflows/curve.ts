/**
 * curve: the titration curve of a mixture with a titrant stock, dilution included, and its
 * equivalence points.
 *
 * A stock at c mol/L is added to an initial volume V of the mixture, from 0 to v_max litres in n
 * equally spaced points. At v the solution is the mixture at V/(V + v) of its concentrations plus
 * c·v/(V + v) of titrant (mixing.ts), solved by the engine. A point whose solution is beyond the
 * ionic-strength limit (ionic-limit.ts) has no pH: it carries the refusal instead, and the others
 * are still given. The steepest points are the maxima of |dpH/dv| (equivalence.ts: prominence
 * filter, then refinement to 1e-12 of v_max), searched within each run of points that have a pH;
 * the stoichiometric equivalence volumes come from the amounts (stoichiometric.ts), with the pH
 * there. The two are different things and are reported apart: for a dilute weak system the
 * steepest point lies a few per cent before the stoichiometric one.
 */
import { fail } from "../failure";
import { prepare } from "../prepared";
import type { ChemOptions, Component, Failure, Mixture, Result } from "../types";
import { resolveOptions } from "../validate-options";
import { equivalencePoints, type EquivalencePoint } from "./equivalence";
import { compact, maxAddable, mixedWithStock, pHOf } from "./mixing";
import { stoichiometricVolumes } from "./stoichiometric";
import { checkPositive, checkTitrant } from "./validate";

export interface CurveRequest {
  /** Titrant stock concentration, mol/L. */
  stockConc: number;
  /** Initial volume of the mixture, L. */
  volume: number;
  /** Largest titrant volume, L. */
  maxVolume: number;
  /** Number of points including 0 and maxVolume, 2–1000. Default 51. */
  points?: number;
}

export interface CurvePoint {
  /** Titrant volume added, L. */
  volume: number;
  /** null when the solution there is beyond the ionic-strength limit (`refused` says so). */
  pH: number | null;
  refused?: Failure;
}

export interface StoichiometricPoint {
  /** Titrant volume, L, from the amounts. */
  volume: number;
  /** pH of the curve at that volume; null beyond the ionic-strength limit. */
  pH: number | null;
  refused?: Failure;
}

export interface CurveValue {
  points: CurvePoint[];
  /** The steepest points of the curve (maxima of |dpH/dv|, the inflections). */
  equivalence: EquivalencePoint[];
  /** Stoichiometric equivalence volumes within the curve's range (strong titrants only). */
  stoichiometric: StoichiometricPoint[];
  /** The engine's warnings at the start and at the end of the curve (distinct). */
  warnings: string[];
}

export type CurveResult = Result<CurveValue>;

export const CURVE_POINTS_DEFAULT = 51;
export const CURVE_POINTS_MIN = 2;
export const CURVE_POINTS_MAX = 1000;

export function curve(mix: Mixture, titrant: Component, req: CurveRequest, opts: ChemOptions = {}): CurveResult {
  const o = resolveOptions(opts);
  if (!o.ok) return o;
  const chem: ChemOptions = { temperatureC: o.temperatureC, activity: o.activity };
  const bad =
    checkTitrant(titrant) ??
    checkPositive(req?.stockConc, "stock concentration", "mol/L") ??
    checkPositive(req?.volume, "initial volume", "L") ??
    checkPositive(req?.maxVolume, "largest titrant volume", "L");
  if (bad) return bad;
  const n = req.points ?? CURVE_POINTS_DEFAULT;
  if (!Number.isInteger(n) || n < CURVE_POINTS_MIN || n > CURVE_POINTS_MAX) {
    return fail("bad-input", `The number of points must be a whole number from ${CURVE_POINTS_MIN} to ${CURVE_POINTS_MAX}, got ${String(n)}.`);
  }
  const most = maxAddable([], titrant);
  if (req.stockConc > most) {
    return fail("out-of-range", `A ${titrant.name} stock at ${req.stockConc} mol/L is above the ${most.toPrecision(3)} mol/L the engine accepts.`);
  }
  const valid = prepare(mix);
  if (!valid.ok) return valid;
  const one = compact(mix);
  const { stockConc, volume, maxVolume } = req;
  const at = (v: number) => mixedWithStock(one, titrant, stockConc, v / (volume + v));
  const pHAt = (v: number) => pHOf(at(v), chem);
  const points: CurvePoint[] = [];
  for (let i = 0; i < n; i++) {
    const v = i === n - 1 ? maxVolume : (maxVolume * i) / (n - 1);
    const r = pHAt(v);
    if (r.ok) points.push({ volume: v, pH: r.pH });
    else if (r.code === "beyond-limit") points.push({ volume: v, pH: null, refused: r });
    else return r;
  }
  if (points.every((p) => p.pH === null)) return points[0].refused as Failure;
  const equivalence = steepestPoints(points, pHAt);
  if (!Array.isArray(equivalence)) return equivalence;
  const stoichiometric: StoichiometricPoint[] = [];
  for (const v of stoichiometricVolumes(one, titrant, stockConc, volume, maxVolume)) {
    const r = pHAt(v);
    if (r.ok) stoichiometric.push({ volume: v, pH: r.pH });
    else if (r.code === "beyond-limit") stoichiometric.push({ volume: v, pH: null, refused: r });
    else return r;
  }
  const warnings: string[] = [];
  for (const p of [points[0], points[points.length - 1]]) {
    if (p.pH === null) continue;
    const s = solveWarnings(at(p.volume), chem);
    if (!Array.isArray(s)) return s;
    for (const w of s) if (!warnings.includes(w)) warnings.push(w);
  }
  return { ok: true, points, equivalence, stoichiometric, warnings };
}

/** Steepest points within each run of consecutive points that have a pH (indices into all points). */
function steepestPoints(points: CurvePoint[], pHAt: (v: number) => ReturnType<typeof pHOf>): EquivalencePoint[] | Failure {
  const out: EquivalencePoint[] = [];
  let start = 0;
  while (start < points.length) {
    while (start < points.length && points[start].pH === null) start++;
    let end = start;
    while (end < points.length && points[end].pH !== null) end++;
    if (end - start >= 4) {
      const run = points.slice(start, end);
      const found = equivalencePoints(run.map((p) => p.volume), run.map((p) => p.pH as number), pHAt);
      if (!Array.isArray(found)) {
        // the refinement stepped beyond the ionic-strength limit: no steepest point in this run
        if (found.code !== "beyond-limit") return found;
      } else {
        for (const e of found) out.push({ ...e, nearestIndex: e.nearestIndex + start });
      }
    }
    start = end;
  }
  return out;
}

function solveWarnings(mix: Mixture, chem: ChemOptions): string[] | Failure {
  const p = prepare(mix);
  if (!p.ok) return p;
  const eq = p.solve(chem);
  return eq.ok ? eq.warnings : eq;
}
