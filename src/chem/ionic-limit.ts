/**
 * The ionic-strength limit, enforced in one place for every pH-derived number.
 *
 * LIMITS.maxIonicStrength (defaults.ts, 1 mol/L) is where the activity models here stop describing
 * a solution. PreparedMixture.solve and solvePH return the failure "beyond-limit" for a solution
 * whose self-consistent ionic strength exceeds it, so every pH, β, capacity, speciation, titrant
 * amount, recipe, curve point, pH band and picture built on them inherits the refusal; apparentPKa
 * refuses an ionic strength beyond it. The ionic strength itself (and the ideal osmolarity, which
 * counts particles and does not depend on the pH beyond [H⁺] and [OH⁻]) are still reported, from
 * solveBeyondLimit, so a user can see where the mixture stands.
 *
 * Numbers in the messages are printed with enough digits to be true against the limit: 1.0005 mol/L
 * reads "1.0005", never "1" (fmtAgainst).
 */
import { LIMITS } from "./defaults";
import { fail } from "./failure";
import type { Failure } from "./types";

/** True when I is beyond the limit (a rounding allowance of LIMITS.maxIonicStrengthRounding, relative). */
export function beyondIonicLimit(ionicStrength: number): boolean {
  return !(ionicStrength <= LIMITS.maxIonicStrength * (1 + LIMITS.maxIonicStrengthRounding));
}

/** Relative allowance within which a value counts as at a soft threshold (the warnings'), not beyond it. */
export const THRESHOLD_ROUNDING = 1e-6;

/** -1, 0 or +1: x below, at (within `rel` of) or above the threshold t. */
export function sideOf(x: number, t: number, rel = THRESHOLD_ROUNDING): number {
  return Math.abs(x - t) <= rel * Math.abs(t) ? 0 : Math.sign(x - t);
}

/**
 * x with the fewest significant digits (3 at least) that leave it on its own side of every
 * threshold (sideOf) and round it by under 5 % of its distance from each threshold it is not at:
 * fmtAgainst(1.0005, [1]) is "1.0005" (not "1" nor "1.001"), fmtAgainst(0.650269, [0.5]) "0.65",
 * fmtAgainst(0.1000001, [0.1]) "0.1" (at the threshold within the rounding allowance).
 */
export function fmtAgainst(x: number, thresholds: readonly number[], rel = THRESHOLD_ROUNDING): string {
  if (!Number.isFinite(x)) return String(x);
  for (let p = 3; p <= 17; p++) {
    const s = Number(x.toPrecision(p));
    const true_ = thresholds.every((t) => {
      const side = sideOf(x, t, rel);
      return sideOf(s, t, rel) === side && (side === 0 || Math.abs(s - x) <= 0.05 * Math.abs(x - t));
    });
    if (true_) return String(s);
  }
  return String(x);
}

/** The limit with its unit, as messages quote it. */
export const IONIC_LIMIT_TEXT = `${LIMITS.maxIonicStrength} mol/L`;

/** The failure for a solution beyond the limit, or null within it. */
export function ionicLimitFailure(ionicStrength: number): Failure | null {
  if (!beyondIonicLimit(ionicStrength)) return null;
  return fail(
    "beyond-limit",
    `The ionic strength would be ${fmtAgainst(ionicStrength, [LIMITS.maxIonicStrength], LIMITS.maxIonicStrengthRounding)} mol/L, beyond the ${IONIC_LIMIT_TEXT} limit of the activity models: no pH or pH-derived value is given.`,
  );
}
