/** Validation of ChemOptions (temperature range, activity model name), with defaults from defaults.ts. */
import { DEFAULTS } from "./defaults";
import { fail, fmt } from "./failure";
import type { ActivityModel, ChemOptions, Failure } from "./types";

export interface ResolvedOptions {
  ok: true;
  temperatureC: number;
  activity: ActivityModel;
}

const MODELS: readonly ActivityModel[] = ["davies", "ideal", "debye-huckel"];

/** Checks a temperature in °C: NaN → "bad-input", outside 0–100 °C → "out-of-range". */
export function checkTemperature(temperatureC: number): Failure | null {
  if (typeof temperatureC !== "number" || Number.isNaN(temperatureC)) {
    return fail("bad-input", `Temperature must be a number in °C, got ${String(temperatureC)}.`);
  }
  if (!(temperatureC >= DEFAULTS.minTemperatureC && temperatureC <= DEFAULTS.maxTemperatureC)) {
    return fail(
      "out-of-range",
      `Temperature ${fmt(temperatureC)} °C is outside ${DEFAULTS.minTemperatureC}–${DEFAULTS.maxTemperatureC} °C, the range of the water and activity formulas.`,
    );
  }
  return null;
}

/** Fills in defaults and validates the options. */
export function resolveOptions(opts?: ChemOptions): ResolvedOptions | Failure {
  const temperatureC = opts?.temperatureC ?? DEFAULTS.temperatureC;
  const activity = opts?.activity ?? DEFAULTS.activity;
  const bad = checkTemperature(temperatureC);
  if (bad) return bad;
  if (!MODELS.includes(activity)) {
    return fail("bad-input", `Unknown activity model "${String(activity)}": use "davies", "ideal" or "debye-huckel".`);
  }
  return { ok: true, temperatureC, activity };
}
