/** Plain-language warnings attached to an equilibrium. */
import { ACTIVITY_MODELS } from "./activity/models";
import { DEFAULTS, LIMITS } from "./defaults";
import { fmt } from "./failure";
import { fmtAgainst, sideOf } from "./ionic-limit";
import type { AcidBaseSystem, ActivityModel } from "./types";

/** Ionic strength beyond the activity model's range. */
export function ionicStrengthWarning(I: number, model: ActivityModel): string | null {
  const strong = ACTIVITY_MODELS[model].unreliableAbove;
  if (sideOf(I, strong) > 0) {
    return `Ionic strength ${fmtAgainst(I, [strong])} mol/L is above ${strong} mol/L: the ${model} activity model is unreliable here, treat the pH as a rough estimate.`;
  }
  const caution = ACTIVITY_MODELS[model].cautionAbove;
  if (sideOf(I, caution) > 0) {
    return `Ionic strength ${fmtAgainst(I, [caution])} mol/L is above ${caution} mol/L: the ${model} activity model loses accuracy here.`;
  }
  return null;
}

/** pKa steps without ΔrH° used away from 25 °C, where they matter (pKa within a few units of the pH). */
export function missingEnthalpyWarnings(systems: AcidBaseSystem[], totals: ArrayLike<number>, temperatureC: number, pH: number): string[] {
  const out: string[] = [];
  if (Math.abs(temperatureC - DEFAULTS.temperatureC) <= LIMITS.missingEnthalpyWarnK) return out;
  for (let s = 0; s < systems.length; s++) {
    if (!(totals[s] > 0)) continue;
    const relevant = (pKa: number) => Math.abs(pKa - pH) <= LIMITS.missingEnthalpyRelevance;
    const missing = systems[s].steps.map((st, j) => (st.dH === undefined && relevant(st.pKa) ? j + 1 : 0)).filter((j) => j > 0);
    if (missing.length > 0) {
      out.push(
        `ΔrH° is unknown for ${systems[s].name} (step ${missing.join(", ")}): its pKa is held at the 25 °C value at ${fmt(temperatureC)} °C.`,
      );
    }
  }
  return out;
}
