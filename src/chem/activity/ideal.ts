/** Ideal solution: every activity coefficient is 1 (log10 γ = 0). For comparison and very dilute solutions. */

/** Shape f(I) = 0. */
export function idealShape(_ionicStrength: number): number {
  return 0;
}

/** df/dI = 0. */
export function idealShapeDerivative(_ionicStrength: number): number {
  return 0;
}

/** log10 γ = 0 for every ion. */
export function idealLog10Gamma(_charge: number, _ionicStrength: number, _A: number): number {
  return 0;
}
