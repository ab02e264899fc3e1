/**
 * Where each region of a solver's one array of numbers starts, for n systems with m steps in all.
 * Per system s (each region n long): its total mol/L, z0 (the charge of its fully protonated form),
 * its number of steps, and the index of its first step among all steps (0…m−1). Per step i (each
 * region m long, the systems' steps one after another): pKa at 25 °C, ΔrH° (kJ/mol), ΔrCp°
 * (J/(K·mol)), the exponent z0 − j of exp(2g) in the conditional constant of step j (1-based within
 * its system), the thermodynamic Ka at the current temperature, and the conditional (concentration)
 * Ka′ at the current temperature and ionic strength.
 */
export interface DataLayout {
  readonly total: number;
  readonly topCharge: number;
  readonly stepCount: number;
  readonly firstStep: number;
  readonly pKa: number;
  readonly dH: number;
  readonly dCp: number;
  readonly exponent: number;
  readonly kaT: number;
  readonly kc: number;
  /** Length of the whole array. */
  readonly length: number;
}

/** Layouts made so far, by (n, m) (at most 1024): preparing a mixture then allocates nothing for its layout. */
const made = new Map<number, DataLayout>();

/** The layout for n systems with m steps in all (one shared object per (n, m)). */
export function dataLayout(n: number, m: number): DataLayout {
  const key = n * 1_000_000 + m;
  let at = made.get(key);
  if (at === undefined) {
    const pKa = 4 * n;
    at = { total: 0, topCharge: n, stepCount: 2 * n, firstStep: 3 * n, pKa, dH: pKa + m, dCp: pKa + 2 * m, exponent: pKa + 3 * m, kaT: pKa + 4 * m, kc: pKa + 5 * m, length: pKa + 6 * m };
    if (made.size < 1024) made.set(key, at);
  }
  return at;
}
