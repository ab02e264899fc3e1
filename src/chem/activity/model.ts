/**
 * Dispatch by activity model. Every model has the form log10 γ(z) = −A z² f(I); neutral species have
 * γ = 1 (no salting-out term).
 */
import type { ActivityModel } from "../types";
import { daviesShape, daviesShapeDerivative } from "./davies";
import { debyeHuckelShape, debyeHuckelShapeDerivative } from "./debye-huckel";

/** f(I) of the model. */
export function activityShape(model: ActivityModel, ionicStrength: number): number {
  switch (model) {
    case "davies":
      return daviesShape(ionicStrength);
    case "debye-huckel":
      return debyeHuckelShape(ionicStrength);
    default:
      return 0;
  }
}

/** df/dI of the model. */
export function activityShapeDerivative(model: ActivityModel, ionicStrength: number): number {
  switch (model) {
    case "davies":
      return daviesShapeDerivative(ionicStrength);
    case "debye-huckel":
      return debyeHuckelShapeDerivative(ionicStrength);
    default:
      return 0;
  }
}

/** log10 γ of an ion of charge z at ionic strength I (mol/L) and Debye–Hückel A. */
export function log10Gamma(model: ActivityModel, charge: number, ionicStrength: number, A: number): number {
  return -A * charge * charge * activityShape(model, ionicStrength);
}
