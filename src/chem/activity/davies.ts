/**
 * Davies equation: log10 γ = −A z² (√I/(1 + √I) − 0.3 I).
 *
 * Source: C. W. Davies, Ion Association (Butterworths, 1962), with the coefficient 0.3 (the 1938
 * paper used 0.2). Useful up to I ≈ 0.3–0.5 mol/L.
 *
 * Every model in this folder has the form log10 γ = −A z² f(I); the solver uses the shape f and its
 * derivative f′ (for the buffer value).
 */

/** Davies shape f(I) = √I/(1 + √I) − 0.3 I, I in mol/L. */
export function daviesShape(ionicStrength: number): number {
  const s = Math.sqrt(ionicStrength);
  return s / (1 + s) - 0.3 * ionicStrength;
}

/** df/dI of the Davies shape (I > 0). */
export function daviesShapeDerivative(ionicStrength: number): number {
  const s = Math.sqrt(ionicStrength);
  const d = 1 + s;
  return 1 / (2 * s * d * d) - 0.3;
}

/** log10 γ of an ion of charge z at ionic strength I (mol/L), with Debye–Hückel A. */
export function daviesLog10Gamma(charge: number, ionicStrength: number, A: number): number {
  return -A * charge * charge * daviesShape(ionicStrength);
}
