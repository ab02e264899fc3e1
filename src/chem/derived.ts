/**
 * Quantities derived from the constants or the equilibrium: apparent pKa, osmolarity, ionic strength.
 */
import { activityShape } from "./activity/model";
import { isActivityModel, unknownActivityModelMessage } from "./activity/models";
import { debyeHuckelA } from "./activity/debye-huckel-a";
import { solveEquilibrium } from "./solve-mixture";
import { fail, fmt } from "./failure";
import { thermodynamicPKa } from "./temperature";
import type { AcidBaseSystem, ActivityModel, ChemOptions, Mixture, ValueResult } from "./types";
import { checkTemperature } from "./validate-options";

/**
 * Apparent (concentration) pKa of one step: pK′ = −log10([H⁺][B]/[A]) at a temperature and ionic
 * strength, pK′ = pK(T) − log10(γA/(γH·γB)) = pK(T) + 2·A·f(I)·(zA − 1), zA the charge of the acid
 * form of the step (log10 γ = −A z² f(I) for every model). stepIndex is 0-based. A p[H]-based value:
 * the pH a meter reads at [A] = [B] is pK′ + A·f(I).
 */
export function apparentPKa(
  system: AcidBaseSystem,
  stepIndex: number,
  temperatureC: number,
  ionicStrength: number,
  model: ActivityModel,
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
  if (!isActivityModel(model)) return fail("bad-input", unknownActivityModelMessage(String(model)));
  const pK = thermodynamicPKa(step, temperatureC);
  if (!pK.ok) return pK;
  const zA = system.topCharge - stepIndex;
  const value = pK.value + 2 * debyeHuckelA(temperatureC) * activityShape(model, ionicStrength) * (zA - 1);
  return { ok: true, value };
}

/** Ideal osmolarity, osmol/L: every solute particle at equilibrium (ions, H⁺, OH⁻, system species, neutral particles). */
export function osmolarity(mix: Mixture, opts?: ChemOptions): ValueResult {
  const eq = solveEquilibrium(mix, opts);
  if (!eq.ok) return eq;
  let sum = 0;
  for (const sp of eq.species) sum += sp.conc;
  for (const entry of mix) sum += entry.conc * (entry.component.neutral ?? 0);
  return { ok: true, value: sum };
}

/** Ionic strength of the mixture at equilibrium, mol/L (self-consistent with the activity model). */
export function ionicStrength(mix: Mixture, opts?: ChemOptions): ValueResult {
  const eq = solveEquilibrium(mix, opts);
  if (!eq.ok) return eq;
  return { ok: true, value: eq.ionicStrength };
}
