/**
 * AQ.CHECK: what a reviewer should know about a mixture's result, as one line of text.
 *
 * A cell holding a pH cannot carry a warning, so this function states it beside the pH: "OK" with
 * the regime and ionic strength when nothing needs saying; otherwise every warning of the engine
 * (ionic strength beyond the activity model's range, ΔrH° unknown away from 25 °C) and whether the
 * mixture is still a buffer (excess strong acid or base: the pH follows the excess, not the buffer).
 */
import type { Equilibrium } from "../../chem/types";
import type { Cell } from "../args";
import { equilibriumOf } from "./equilibrium-of-args";

const REGIME_TEXT: Record<Equilibrium["regime"], string> = {
  buffer: "buffer",
  "no-buffer": "no weak acid or base present (not a buffer)",
  "excess-strong-acid": "buffer overwhelmed by strong acid: the pH follows the excess acid",
  "excess-strong-base": "buffer overwhelmed by strong base: the pH follows the excess base",
};

function round(value: number): string {
  return Number(value.toPrecision(3)).toString();
}

export function check(names: Cell, amounts: Cell, temperature: Cell, activity: Cell): string {
  const eq = equilibriumOf(names, amounts, temperature, activity);
  const regime = REGIME_TEXT[eq.regime];
  const state = `${regime}, I = ${round(eq.ionicStrength)} mol/L`;
  const attention = eq.regime === "excess-strong-acid" || eq.regime === "excess-strong-base";
  if (eq.warnings.length === 0 && !attention) return `OK: ${state}`;
  return `CHECK: ${state}. ${eq.warnings.join(" ")}`.trim();
}
