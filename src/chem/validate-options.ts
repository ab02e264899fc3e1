/** Validation of ChemOptions (temperature range, activity model name), with defaults from defaults.ts. */
import { isActivityModel, unknownActivityModelMessage } from "./activity/models";
import { DEFAULTS } from "./defaults";
import { fail, fmt } from "./failure";
import { parseQuantity } from "./units";
import type { ActivityModel, ChemOptions, Failure } from "./types";

export interface ResolvedOptions {
  ok: true;
  temperatureC: number;
  activity: ActivityModel;
}

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

/**
 * A temperature as typed (a number in °C, or text such as "37", "37 degC", "310 K"; blank text for
 * the default, DEFAULTS.temperatureC) → °C within the range, or a failure saying why not.
 */
export function readTemperature(value: number | string): { ok: true; value: number } | Failure {
  if (typeof value === "string" && value.trim() === "") return { ok: true, value: DEFAULTS.temperatureC };
  const t = parseQuantity(value, "temperature");
  if (!t.ok) return t;
  return checkTemperature(t.value) ?? t;
}

/** Fills in defaults and validates the options. */
export function resolveOptions(opts?: ChemOptions): ResolvedOptions | Failure {
  const temperatureC = opts?.temperatureC ?? DEFAULTS.temperatureC;
  const activity = opts?.activity ?? DEFAULTS.activity;
  const bad = checkTemperature(temperatureC);
  if (bad) return bad;
  if (!isActivityModel(activity)) return fail("bad-input", unknownActivityModelMessage(String(activity)));
  return { ok: true, temperatureC, activity };
}
