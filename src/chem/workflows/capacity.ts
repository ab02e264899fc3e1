/**
 * capacity: mol/L of strong base (delta > 0) or strong acid (delta < 0) that moves the pH of a
 * mixture by delta, without change of volume.
 *
 * The strong base is the buffer value's own reagent (beta.ts: NaOH, one monovalent cation per OH⁻);
 * the strong acid likewise releases one monovalent anion per H⁺ (HCl). Both are generic ions with
 * ids of their own, so they never merge with an ion of the mixture. The amount is found by adjust
 * (per litre): a bracketed first crossing refined by Brent's method.
 *
 * Relation to β: capacity(δ) = ∫ β dpH over [pH₀, pH₀ + δ] along the same addition, exactly for base
 * (β is dC_b/dpH along that path, ionic-strength change included) and, with ideal activity, for
 * acid too. With an activity model and acid, β (defined for added base, which raises I by ½·dC_b)
 * and the acid path (which raises I by ½·dC_a while lowering the pH) differ by the ionic-strength
 * term: see test/chem/workflows/capacity.test.ts for the size.
 */
import type { ChemOptions, Mixture, Result } from "../types";
import { fail, fmt } from "../failure";
import { resolveOptions } from "../validate-options";
import { adjust } from "./adjust";
import { pHOf } from "./mixing";
import { checkTargetPH } from "./validate";

import { STRONG_ACID, STRONG_BASE } from "./strong-reagents";

export { STRONG_ACID, STRONG_BASE };

export interface CapacityValue {
  /** mol/L of the reagent, ≥ 0. */
  value: number;
  reagent: "strong base" | "strong acid";
  startPH: number;
  pH: number;
  ionicStrength: number;
  warnings: string[];
}

export type CapacityResult = Result<CapacityValue>;

/** Strong base (deltaPH > 0) or acid (deltaPH < 0), mol/L, that moves the pH by deltaPH. */
export function capacity(mix: Mixture, deltaPH: number, opts: ChemOptions = {}): CapacityResult {
  if (typeof deltaPH !== "number" || !Number.isFinite(deltaPH)) {
    return fail("bad-input", `The pH change must be a finite number, got ${String(deltaPH)}.`);
  }
  const o = resolveOptions(opts);
  if (!o.ok) return o;
  const chem: ChemOptions = { temperatureC: o.temperatureC, activity: o.activity };
  const start = pHOf(mix, chem);
  if (!start.ok) return start;
  const reagent = deltaPH >= 0 ? STRONG_BASE : STRONG_ACID;
  const target = start.pH + deltaPH;
  const bad = checkTargetPH(target, `pH to reach (${fmt(start.pH)} ${deltaPH >= 0 ? "+" : "−"} ${fmt(Math.abs(deltaPH))})`);
  if (bad) return bad;
  const r = adjust(mix, reagent, target, chem);
  if (!r.ok) return r;
  return {
    ok: true,
    value: r.value,
    reagent: deltaPH >= 0 ? "strong base" : "strong acid",
    startPH: r.startPH,
    pH: r.pH,
    ionicStrength: r.ionicStrength,
    warnings: r.warnings,
  };
}
