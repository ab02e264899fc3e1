/**
 * pKa as a function of temperature: van 't Hoff with a constant heat-capacity change.
 *
 * Formula: pK(T) = pK(θ) + ΔrH°/(R ln10)·(1/T − 1/θ) − ΔrCp°/(R ln10)·(θ/T − 1 + ln(T/θ)), θ = 298.15 K
 * (integrated van 't Hoff equation with ΔrH°(T) = ΔrH°(θ) + ΔrCp°·(T − θ); as used by Goldberg,
 * Kishore & Lennen, J. Phys. Chem. Ref. Data 31, 231 (2002), eq. 10).
 *
 * Notes: a missing ΔrH° is taken as 0 (pK held at its 25 °C value) and the equilibrium reports a
 * warning when |T − 25 °C| > 5 K; a missing ΔrCp° is taken as 0.
 */
import { checkTemperature } from "./validate-options";
import { fail } from "./failure";
import { LN10, R, THETA_K, ZERO_CELSIUS_K } from "./physical-constants";
import type { PkaStep, ValueResult } from "./types";

/** pK at temperature T (K) from pK(25 °C), ΔrH° (kJ/mol) and ΔrCp° (J/(K·mol)). No validation. */
export function pKaAtTemperature(pKa25: number, dHkJ: number, dCp: number, temperatureK: number): number {
  const T = temperatureK;
  const rl = R * LN10;
  return (
    pKa25 +
    ((dHkJ * 1000) / rl) * (1 / T - 1 / THETA_K) -
    (dCp / rl) * (THETA_K / T - 1 + Math.log(T / THETA_K))
  );
}

/** Thermodynamic (I = 0) pKa of one step at a temperature in °C (0–100). */
export function thermodynamicPKa(step: PkaStep, temperatureC: number): ValueResult {
  const bad = checkTemperature(temperatureC);
  if (bad) return bad;
  if (!Number.isFinite(step?.pKa)) return fail("bad-input", "The step has no finite pKa.");
  const dH = step.dH ?? 0;
  const dCp = step.dCp ?? 0;
  if (!Number.isFinite(dH) || !Number.isFinite(dCp)) {
    return fail("bad-input", "The step's ΔrH° or ΔrCp° is not a finite number.");
  }
  return { ok: true, value: pKaAtTemperature(step.pKa, dH, dCp, temperatureC + ZERO_CELSIUS_K) };
}
