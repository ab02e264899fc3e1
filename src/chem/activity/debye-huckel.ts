/**
 * Extended Debye–Hückel equation with one ion-size term for every ion:
 * log10 γ = −A z² √I / (1 + B·å·√I), B·å = 1.5 (kg/mol)^(1/2) at every temperature.
 *
 * Source: the Bates–Guggenheim convention (Bates & Guggenheim, Pure Appl. Chem. 1, 163 (1960);
 * IUPAC, Buck et al., Pure Appl. Chem. 74, 2169 (2002), §5), which fixes B·å = 1.5 for Cl⁻ to define
 * pH(S) of the primary standards. Using it for every ion is common practice (an ion-size parameter
 * å ≈ 4.6 Å at 25 °C). Valid for I ≤ 0.1 mol/L.
 */

/** Product B·å of the extended Debye–Hückel denominator, (kg/mol)^(1/2). */
export const BATES_GUGGENHEIM_BA = 1.5;

/** Shape f(I) = √I/(1 + 1.5 √I), I in mol/L. */
export function debyeHuckelShape(ionicStrength: number): number {
  const s = Math.sqrt(ionicStrength);
  return s / (1 + BATES_GUGGENHEIM_BA * s);
}

/** df/dI of the extended Debye–Hückel shape (I > 0). */
export function debyeHuckelShapeDerivative(ionicStrength: number): number {
  const s = Math.sqrt(ionicStrength);
  const d = 1 + BATES_GUGGENHEIM_BA * s;
  return 1 / (2 * s * d * d);
}

/** log10 γ of an ion of charge z at ionic strength I (mol/L), with Debye–Hückel A. */
export function debyeHuckelLog10Gamma(charge: number, ionicStrength: number, A: number): number {
  return -A * charge * charge * debyeHuckelShape(ionicStrength);
}
