/**
 * adjust: the amount of a titrant (any component: NaOH, HCl, a buffer salt, a concentrated buffer)
 * that brings a mixture to a target pH.
 *
 * Modes:
 * - per litre (no stock given): n mol of titrant per litre of mixture, volume unchanged, so that
 *   pH(mix + n titrant) = target. n is searched in [0, n_max], n_max the most the engine accepts.
 * - stock (stock = { conc: c_s mol/L, volume: V L }): v litres of stock such that the batch diluted
 *   to V + v, plus c_s·v/(V + v) of titrant, has the target pH. The search variable is the stock's
 *   volume fraction f = v/(V + v) ∈ [0, 1]; f = 1 is the stock alone, the limit as v → ∞.
 *
 * Method: first crossing along the path (crossing.ts): a geometric grid in n (2 points per decade
 * from 1e-12 mol/L) or in v/V (1e-12 … 1e8, then f = 1), the first sign change of pH − target is a
 * guaranteed bracket, refined by Brent's method to |pH − target| ≤ 1e-11. A target that no grid
 * point crosses is "unreachable", with a message saying which way the titrant moves the pH and how
 * far it can take it (unreachable.ts). A target equal to the current pH gives 0.
 *
 * From a measured pH (opts.measuredPH): the mixture as given is what the batch should contain; the
 * difference between its computed pH and the measured one is attributed to an unknown excess of
 * strong base (measured above computed) or strong acid (below), one monovalent counter-ion per mole
 * (strong-reagents.ts). The excess e ≥ 0 solves pH(mixture + e) = measured by the same per-litre
 * search; the titrant is then computed from that measured state. The assumption is wrong when the
 * deviation has another cause (a wrong buffer concentration, the wrong salt form, CO₂ uptake): the
 * answer is then off by the difference in buffer value between the assumed and the real batch.
 */
import { fail } from "../failure";
import { prepare } from "../prepared";
import type { ChemOptions, Component, Mixture, Result } from "../types";
import { resolveOptions } from "../validate-options";
import { firstCrossing, geometricGrid } from "./crossing";
import { compact, maxAddable, mixedWithStock, pHOffset, withAdded } from "./mixing";
import { unreachable } from "./unreachable";
import { STRONG_ACID, STRONG_BASE } from "./strong-reagents";
import { checkPositive, checkTargetPH, checkTitrant, fmtPH } from "./validate";

export interface AdjustStock {
  /** Stock concentration of the titrant, mol/L. */
  conc: number;
  /** Batch volume before the addition, L. */
  volume: number;
}

export interface AdjustOptions extends ChemOptions {
  /** Given: the answer is litres of stock for the batch, dilution included. */
  stock?: AdjustStock;
  /** The pH read on the batch: the gap to the computed pH is taken as an excess of strong acid or base. */
  measuredPH?: number;
}

/** The unknown excess behind a measured pH, mol/L of the generic strong reagent (0: none). */
export interface AdjustExcess {
  reagent: "strong base" | "strong acid";
  conc: number;
  /** The pH computed from the mixture as given, before the excess. */
  computedPH: number;
}

export interface AdjustValue {
  mode: "per-litre" | "stock";
  /** mol of titrant per litre of mixture ("per-litre"), or litres of stock for the batch ("stock"). */
  value: number;
  /** mol/L of titrant in the final solution. */
  titrantConc: number;
  /** pH before the addition and after it (the latter equals the target within 1e-11). */
  startPH: number;
  pH: number;
  /** Ionic strength of the final solution, mol/L. */
  ionicStrength: number;
  /** The engine's warnings about the final solution. */
  warnings: string[];
  /** With a measured pH: the excess of strong acid or base that explains it. */
  excess?: AdjustExcess;
}

export type AdjustResult = Result<AdjustValue>;

/** |pH − target| at which the refinement stops, pH units. */
export const ADJUST_PH_TOLERANCE = 1e-11;

/** Geometric grid of the per-litre search: first point and points per decade. */
const FIRST_AMOUNT = 1e-12;
const STOCK_RATIO_MIN = 1e-12;
const STOCK_RATIO_MAX = 1e8;
const PER_DECADE = 2;

function finish(mode: AdjustValue["mode"], value: number, titrantConc: number, startPH: number, final: Mixture, opts: ChemOptions): AdjustResult {
  const p = prepare(final);
  if (!p.ok) return p;
  const eq = p.solve(opts);
  if (!eq.ok) return eq;
  return { ok: true, mode, value, titrantConc, startPH, pH: eq.pH, ionicStrength: eq.ionicStrength, warnings: eq.warnings };
}

/** Amount of titrant to reach a target pH: mol/L without a stock, litres of stock with one. */
export function adjust(mix: Mixture, titrant: Component, targetPH: number, opts: AdjustOptions = {}): AdjustResult {
  const o = resolveOptions(opts);
  if (!o.ok) return o;
  const chem: ChemOptions = { temperatureC: o.temperatureC, activity: o.activity };
  const bad = checkTitrant(titrant) ?? checkTargetPH(targetPH);
  if (bad) return bad;
  const prepared = prepare(mix);
  if (!prepared.ok) return prepared;
  let one = compact(mix);
  let excess: AdjustExcess | undefined;
  if (opts.measuredPH !== undefined) {
    const state = measuredState(one, opts.measuredPH, chem);
    if (!state.ok) return state;
    one = state.mixture;
    excess = state.excess;
  }
  const r = opts.stock === undefined ? adjustPerLitre(one, titrant, targetPH, chem) : adjustWithStock(one, titrant, targetPH, opts.stock, chem);
  return r.ok && excess !== undefined ? { ...r, excess } : r;
}

/** The mixture plus the excess of strong base or acid that gives the measured pH. */
function measuredState(mix: Mixture, measured: number, chem: ChemOptions): Result<{ mixture: Mixture; excess: AdjustExcess }> {
  const bad = checkTargetPH(measured, "measured pH");
  if (bad) return bad;
  const start = pHOffset(mix, measured, chem);
  if (!start.ok) return start;
  const computedPH = start.value + measured;
  const reagent = start.value < 0 ? STRONG_BASE : STRONG_ACID;
  const r = adjustPerLitre(mix, reagent, measured, chem);
  if (!r.ok) {
    // The search's own message calls the measured pH "the target": say what it is here.
    const inner = r.message.replace(/\bthe target\b/g, "the measured pH");
    const why = r.code === "unreachable" || r.code === "beyond-limit" ? `no excess of ${reagent.name} explains it: ${inner.charAt(0).toLowerCase()}${inner.slice(1)}` : r.message;
    return fail(r.code, `The measured pH ${fmtPH(measured, computedPH)} differs from the computed ${fmtPH(computedPH, measured)}, and ${why}`);
  }
  const excess: AdjustExcess = { reagent: reagent === STRONG_BASE ? "strong base" : "strong acid", conc: r.value, computedPH };
  return { ok: true, mixture: withAdded(mix, reagent, r.value), excess };
}

function adjustPerLitre(mix: Mixture, titrant: Component, target: number, chem: ChemOptions): AdjustResult {
  const nMax = maxAddable(mix, titrant);
  const grid = nMax > FIRST_AMOUNT ? geometricGrid(FIRST_AMOUNT, nMax, PER_DECADE) : [0];
  const g = (n: number) => pHOffset(withAdded(mix, titrant, n), target, chem);
  const r = firstCrossing(g, grid, ADJUST_PH_TOLERANCE);
  if (!r.ok) return r;
  if (!r.found) return unreachable({ titrant, target, samples: r.samples, mode: "per-litre", limit: nMax, stoppedBy: r.failure });
  const start = g(0);
  if (!start.ok) return start;
  return finish("per-litre", r.t, r.t, start.value + target, withAdded(mix, titrant, r.t), chem);
}

function adjustWithStock(mix: Mixture, titrant: Component, target: number, stock: AdjustStock, chem: ChemOptions): AdjustResult {
  const bad = checkPositive(stock?.conc, "stock concentration", "mol/L") ?? checkPositive(stock?.volume, "batch volume", "L");
  if (bad) return bad;
  const most = maxAddable([], titrant);
  if (stock.conc > most) {
    return fail("out-of-range", `A ${titrant.name} stock at ${stock.conc} mol/L is above the ${most.toPrecision(3)} mol/L the engine accepts.`);
  }
  const grid = geometricGrid(STOCK_RATIO_MIN, STOCK_RATIO_MAX, PER_DECADE).map((r) => r / (1 + r));
  grid.push(1);
  const g = (f: number) => pHOffset(mixedWithStock(mix, titrant, stock.conc, f), target, chem);
  const r = firstCrossing(g, grid, ADJUST_PH_TOLERANCE);
  if (!r.ok) return r;
  if (!r.found || r.t >= 1) {
    const samples = r.found ? [] : r.samples;
    if (r.found) {
      // The target is the stock's own pH: reached only in the limit of infinite stock volume.
      return fail("unreachable", `The target is the pH of the ${titrant.name} stock itself: it is approached only as the stock volume grows without bound.`);
    }
    return unreachable({ titrant, target, samples, mode: "stock", limit: stock.conc, stoppedBy: r.failure });
  }
  const f = r.t;
  const litres = (stock.volume * f) / (1 - f);
  const start = g(0);
  if (!start.ok) return start;
  return finish("stock", litres, stock.conc * f, start.value + target, mixedWithStock(mix, titrant, stock.conc, f), chem);
}
