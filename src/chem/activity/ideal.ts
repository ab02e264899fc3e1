/** Ideal solution: every activity coefficient is 1 (log10 γ = 0). For comparison and very dilute solutions. */

/** log10 γ = 0 for every ion. */
export function idealLog10Gamma(_charge: number, _ionicStrength: number, _A: number): number {
  return 0;
}
