/** Input checks shared by the workflows: each returns a "bad-input" Failure naming the problem, or null. */
import { fail, fmt } from "../failure";
import type { Component, Failure } from "../types";

/** pH targets are accepted in this range (a 1 mol/L strong acid or base sits just inside it). */
export const PH_TARGET_MIN = -1;
export const PH_TARGET_MAX = 15;

export function checkTargetPH(value: unknown, what = "target pH"): Failure | null {
  if (typeof value !== "number" || !Number.isFinite(value)) return fail("bad-input", `The ${what} must be a finite number, got ${String(value)}.`);
  if (value < PH_TARGET_MIN || value > PH_TARGET_MAX) {
    return fail("bad-input", `The ${what} ${fmt(value)} is outside ${PH_TARGET_MIN}–${PH_TARGET_MAX}.`);
  }
  return null;
}

export function checkPositive(value: unknown, what: string, unit: string): Failure | null {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    return fail("bad-input", `The ${what} must be a number > 0 ${unit}, got ${typeof value === "number" ? fmt(value) : String(value)}.`);
  }
  return null;
}

export function checkComponent(value: unknown, what: string): Failure | null {
  const c = value as Component | undefined;
  if (!c || typeof c !== "object" || !Array.isArray(c.systems) || !Array.isArray(c.ions)) {
    return fail("bad-input", `The ${what} is not a valid component (it needs lists of systems and ions).`);
  }
  return null;
}

/** A titrant must release at least one system or ion: a neutral particle cannot move the pH. */
export function checkTitrant(value: unknown, what = "titrant"): Failure | null {
  const bad = checkComponent(value, what);
  if (bad) return bad;
  const c = value as Component;
  const acts = c.systems.some((s) => s.stoich > 0) || c.ions.some((i) => i.stoich > 0 && i.ion.charge !== 0);
  if (!acts) return fail("bad-input", `The ${what} "${c.name}" releases no ions and no acid–base system: it cannot change the pH.`);
  return null;
}

/** Formats a pH for a message: 2 decimals, more when needed to tell two values apart. */
export function fmtPH(x: number, other?: number): string {
  for (let d = 2; d <= 6; d++) {
    if (other === undefined || x.toFixed(d) !== other.toFixed(d)) return x.toFixed(d);
  }
  return x.toFixed(6);
}
