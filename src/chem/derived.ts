/**
 * Quantities derived from the constants or the equilibrium: apparent pKa, osmolarity, ionic strength.
 */
import { activityShape } from "./activity/model";
import { isActivityModel, unknownActivityModelMessage } from "./activity/models";
import { debyeHuckelA } from "./activity/debye-huckel-a";
import { ionicLimitFailure } from "./ionic-limit";
import { prepare } from "./prepared";
import { fail, fmt } from "./failure";
import { thermodynamicPKa } from "./temperature";
import type { AcidBaseSystem, ActivityModel, ChemOptions, Mixture, ValueResult } from "./types";
import { checkTemperature } from "./validate-options";

/** The scale of a pKa: which of H⁺, the acid form A and the base form B enter as activities. */
export type PKaScale = "thermodynamic" | "concentration" | "mixed";
export const PKA_SCALES: readonly PKaScale[] = ["concentration", "mixed", "thermodynamic"];

/**
 * pKa of one step at a temperature and ionic strength, on a scale (log10 γ = −A z² f(I) for every
 * model, zA the charge of the acid form of the step, zB = zA − 1):
 * - "thermodynamic": pK(T) = −log10(a(H⁺)·a(B)/a(A)), independent of I;
 * - "concentration" (default): pKc = −log10([H⁺][B]/[A]) = pK(T) + log10(γH·γB/γA)
 *   = pK(T) + 2·A·f(I)·(zA − 1);
 * - "mixed" (Brønsted/"practical"): pKm = −log10(a(H⁺)[B]/[A]) = pK(T) + log10(γB/γA)
 *   = pKc − log10 γH = pKc + A·f(I): with pH = −log10 a(H⁺) read on a meter,
 *   pH = pKm + log10([B]/[A]) (Henderson–Hasselbalch with concentrations).
 * stepIndex is 0-based. An ionic strength beyond the limit (ionic-limit.ts) is refused.
 */
export function apparentPKa(
  system: AcidBaseSystem,
  stepIndex: number,
  temperatureC: number,
  ionicStrength: number,
  model: ActivityModel,
  scale: PKaScale = "concentration",
): ValueResult {
  const step = system?.steps?.[stepIndex];
  if (!Number.isInteger(stepIndex) || step === undefined) {
    return fail("not-found", `System "${system?.name}" has no step ${String(stepIndex)} (steps are numbered from 0 to ${(system?.steps?.length ?? 0) - 1}).`);
  }
  const bad = checkTemperature(temperatureC);
  if (bad) return bad;
  if (typeof ionicStrength !== "number" || !Number.isFinite(ionicStrength) || ionicStrength < 0) {
    return fail("bad-input", `Ionic strength must be a number ≥ 0 mol/L, got ${fmt(ionicStrength)}.`);
  }
  const beyond = ionicLimitFailure(ionicStrength);
  if (beyond) return beyond;
  if (!isActivityModel(model)) return fail("bad-input", unknownActivityModelMessage(String(model)));
  if (!PKA_SCALES.includes(scale)) {
    return fail("bad-input", `Unknown pKa scale "${String(scale)}": use ${PKA_SCALES.map((x) => `"${x}"`).join(", ")}.`);
  }
  const pK = thermodynamicPKa(step, temperatureC);
  if (!pK.ok) return pK;
  if (scale === "thermodynamic") return pK;
  const zA = system.topCharge - stepIndex;
  const Af = debyeHuckelA(temperatureC) * activityShape(model, ionicStrength);
  const concentration = pK.value + 2 * Af * (zA - 1);
  return { ok: true, value: scale === "mixed" ? concentration + Af : concentration };
}

/**
 * Ideal osmolarity, osmol/L: every solute particle at equilibrium (ions, H⁺, OH⁻, system species,
 * neutral particles). Given beyond the ionic-strength limit too: it counts particles, and only
 * [H⁺] and [OH⁻] among them depend on the pH.
 */
export function osmolarity(mix: Mixture, opts?: ChemOptions): ValueResult {
  const p = prepare(mix);
  if (!p.ok) return p;
  const eq = p.solveBeyondLimit(opts);
  if (!eq.ok) return eq;
  let sum = 0;
  for (const sp of eq.species) sum += sp.conc;
  for (const entry of mix) sum += entry.conc * (entry.component.neutral ?? 0);
  return { ok: true, value: sum };
}

/** Ionic strength of the mixture at equilibrium, mol/L (self-consistent with the activity model; given beyond the limit too). */
export function ionicStrength(mix: Mixture, opts?: ChemOptions): ValueResult {
  const p = prepare(mix);
  if (!p.ok) return p;
  const eq = p.solveBeyondLimit(opts);
  if (!eq.ok) return eq;
  return { ok: true, value: eq.ionicStrength };
}
