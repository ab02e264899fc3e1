/**
 * curve: the titration curve of a mixture with a titrant stock, dilution included, and its
 * equivalence points.
 *
 * A stock at c mol/L is added to an initial volume V of the mixture, from 0 to v_max litres in n
 * equally spaced points. At v the solution is the mixture at V/(V + v) of its concentrations plus
 * c·v/(V + v) of titrant (mixing.ts), solved by the engine. Equivalence points are the maxima of
 * |dpH/dv| (equivalence.ts: prominence filter, then refinement to 1e-12 of v_max).
 */
import { fail } from "../failure";
import { prepare } from "../prepared";
import type { ChemOptions, Component, Failure, Mixture, Result } from "../types";
import { resolveOptions } from "../validate-options";
import { equivalencePoints, type EquivalencePoint } from "./equivalence";
import { compact, maxAddable, mixedWithStock, pHOf } from "./mixing";
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
  pH: number;
}

export interface CurveValue {
  points: CurvePoint[];
  equivalence: EquivalencePoint[];
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
  const vs: number[] = [];
  const pHs: number[] = [];
  for (let i = 0; i < n; i++) {
    const v = i === n - 1 ? maxVolume : (maxVolume * i) / (n - 1);
    const r = pHAt(v);
    if (!r.ok) return r;
    vs.push(v);
    pHs.push(r.pH);
  }
  const eq = equivalencePoints(vs, pHs, pHAt);
  if (!Array.isArray(eq)) return eq;
  const warnings: string[] = [];
  for (const v of [0, maxVolume]) {
    const s = solveWarnings(at(v), chem);
    if (!Array.isArray(s)) return s;
    for (const w of s) if (!warnings.includes(w)) warnings.push(w);
  }
  return { ok: true, points: vs.map((v, i) => ({ volume: v, pH: pHs[i] })), equivalence: eq, warnings };
}

function solveWarnings(mix: Mixture, chem: ChemOptions): string[] | Failure {
  const p = prepare(mix);
  if (!p.ok) return p;
  const eq = p.solve(chem);
  return eq.ok ? eq.warnings : eq;
}
