/**
 * The last guard before a number reaches a cell: above an ionic strength of 1 mol/L none of the
 * activity models here (Davies; extended Debye–Hückel; ideal) describes the solution — Davies is
 * meant for I ≲ 0.3–0.5 mol/L (Davies, Ion Association, 1962) — so a pH computed there is not a
 * number we trust. Between 0.3 and 1 mol/L a value is still given and AQ.CHECK carries the warning.
 */
import { notAvailable } from "../errors";

export const MAX_TRUSTED_IONIC_STRENGTH = 1.0;

/** Throws #N/A when the solved ionic strength is beyond what the activity models can describe. */
export function trustIonicStrength<T extends { ionicStrength: number }>(result: T, what: string): T {
  if (result.ionicStrength > MAX_TRUSTED_IONIC_STRENGTH * (1 + 1e-6)) {
    const I = Number(result.ionicStrength.toPrecision(3));
    throw notAvailable(
      `${what} is not given: the ionic strength would be ${I} mol/L, beyond ${MAX_TRUSTED_IONIC_STRENGTH} mol/L where no activity model here describes the solution (AQ.IONIC and AQ.CHECK still report it)`,
    );
  }
  return result;
}
