/**
 * Is the solution a buffer? A verdict from what buffering means, at the solved state.
 *
 * A buffer resists a change of pH because a weak acid–base pair takes up added H⁺ or OH⁻. Its
 * buffer value splits (ideal solution) into the weak systems' part and the free H⁺ and OH⁻ part:
 *   β = ln10·([H⁺] + [OH⁻]) + ln10·Σ_s C_s·Var_s,   Var_s the variance of the protons system s has lost
 * (the buffer value of Van Slyke, J. Biol. Chem. 52, 525 (1922), split by its terms; citation from
 * memory, unverified). Free H⁺ or OH⁻ also resist a change
 * of pH, but only by their sheer amount — that is a strong acid or base, not a buffer. Rules, in
 * order (the first that applies decides):
 * 1. "no-system": no acid–base system present.
 * 2. "excess-strong-acid" / "excess-strong-base": the charge balance's regime (regime.ts): strong
 *    acid or base beyond what the systems can take up supplies at least half of the free H⁺ or OH⁻.
 * 3. By the distance d from the pH to the nearest pKa′ (mixed scale, at the solution's temperature
 *    and ionic strength, so that pH − pKa′ = log10 of the pair's concentration ratio) of the system
 *    that gives the largest share of the weak β: d > 2 "not-buffered" (under 1 % of the pair in
 *    its minor form: a solution of one form, not a buffer pair); 1 < d ≤ 2 "weak" (weakly
 *    buffered: the minor form 1–9 %). Common practice: a buffer is used within pKa ± 1, where the
 *    minor form is ≥ 9 % of the pair and β ≥ 33 % of the pair's maximum.
 * 4. "not-buffered": within pKa ± 1 but the weak systems give less than ⅔ of β (less than twice
 *    what free H⁺ and OH⁻ give). Basis: in a solution of one form alone the proton condition
 *    makes the two parts equal ([A⁻] = [H⁺] for a weak acid HA), so a buffer must clearly exceed an
 *    even split; a dilute pair whose own H⁺ or OH⁻ rivals it is not holding the pH.
 * 5. Otherwise "buffer".
 */
import { apparentPKa } from "./derived";
import { LN10 } from "./physical-constants";
import type { AcidBaseSystem, ActivityModel, Equilibrium } from "./types";

export type BufferVerdict = "buffer" | "weak" | "not-buffered" | "no-system" | "excess-strong-acid" | "excess-strong-base";

/** Thresholds of the rule (see the file's header). */
export const BUFFERING = {
  /** The weak systems' least share of β for a buffer (twice the free H⁺ and OH⁻ part). */
  weakShareMin: 2 / 3,
  /** pH units from the nearest pKa′: within this a buffer (common practice, pKa ± 1). */
  bufferDistance: 1,
  /** pH units: beyond this not a buffer at all (minor form < 1 %). */
  weakDistance: 2,
} as const;

export interface BufferAssessment {
  verdict: BufferVerdict;
  /** β of the weak systems and of free H⁺ + OH⁻ (ideal split), mol/(L·pH). */
  betaWeak: number;
  betaFree: number;
  /** betaWeak / (betaWeak + betaFree); 0 without systems. */
  weakShare: number;
  /** The system giving the most weak β, its nearest pKa′ (mixed scale) and |pH − pKa′|; null without systems. */
  nearest: { system: string; pKa: number; distance: number } | null;
}

export function assessBuffering(eq: Equilibrium, systems: readonly AcidBaseSystem[], temperatureC: number, model: ActivityModel): BufferAssessment {
  const h = eq.species.find((s) => s.name === "H+" && s.systemId === null)?.conc ?? 0;
  const oh = eq.species.find((s) => s.name === "OH-" && s.systemId === null)?.conc ?? 0;
  const betaFree = LN10 * (h + oh);
  let betaWeak = 0;
  let top: { system: AcidBaseSystem; beta: number } | null = null;
  for (const system of systems) {
    // The free forms only (the first steps + 1 species of the system; complexes follow them): the
    // variance of protons lost among them, weighted by their own total.
    const sp = eq.species.filter((s) => s.systemId === system.id).slice(0, system.steps.length + 1);
    const C = sp.reduce((a, s) => a + s.conc, 0);
    if (!(C > 0)) continue;
    let mean = 0;
    let square = 0;
    sp.forEach((s, k) => {
      mean += (k * s.conc) / C;
      square += (k * k * s.conc) / C;
    });
    const beta = LN10 * C * Math.max(0, square - mean * mean);
    betaWeak += beta;
    if (top === null || beta > top.beta) top = { system, beta };
  }
  const weakShare = betaWeak + betaFree > 0 ? betaWeak / (betaWeak + betaFree) : 0;
  let nearest: BufferAssessment["nearest"] = null;
  if (top !== null) {
    for (let j = 0; j < top.system.steps.length; j++) {
      const pK = apparentPKa(top.system, j, temperatureC, eq.ionicStrength, model, "mixed");
      if (!pK.ok) continue;
      const distance = Math.abs(eq.pH - pK.value);
      if (nearest === null || distance < nearest.distance) nearest = { system: top.system.name, pKa: pK.value, distance };
    }
  }
  const verdict = verdictOf(eq.regime, weakShare, nearest);
  return { verdict, betaWeak, betaFree, weakShare, nearest };
}

function verdictOf(regime: Equilibrium["regime"], weakShare: number, nearest: BufferAssessment["nearest"]): BufferVerdict {
  if (regime === "no-buffer" || nearest === null) return "no-system";
  if (regime === "excess-strong-acid" || regime === "excess-strong-base") return regime;
  if (nearest.distance > BUFFERING.weakDistance) return "not-buffered";
  if (nearest.distance > BUFFERING.bufferDistance) return "weak";
  if (weakShare < BUFFERING.weakShareMin) return "not-buffered";
  return "buffer";
}

/** A pKa from memory, unverified, close enough to the pH to shape the result: its system, step (1-based) and pKa′. */
export interface UnverifiedStep {
  system: string;
  step: number;
  pKa: number;
}

/**
 * The unverified pKa steps (PkaStep.unverified) of the systems present whose pKa′ lies within
 * BUFFERING.weakDistance of the pH: nearer than that, at least 1 % of the pair is in its minor form,
 * so the step's value moves the pH and the speciation; farther, it hardly does (rule 3 above).
 */
export function unverifiedStepsNear(eq: Equilibrium, systems: readonly AcidBaseSystem[], temperatureC: number, model: ActivityModel): UnverifiedStep[] {
  const out: UnverifiedStep[] = [];
  for (const system of systems) {
    system.steps.forEach((step, j) => {
      if (!step.unverified) return;
      const pK = apparentPKa(system, j, temperatureC, eq.ionicStrength, model, "mixed");
      if (pK.ok && Math.abs(eq.pH - pK.value) <= BUFFERING.weakDistance) out.push({ system: system.name, step: j + 1, pKa: pK.value });
    });
  }
  return out;
}
