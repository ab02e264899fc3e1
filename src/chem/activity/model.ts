/**
 * Dispatch by activity model (the models and their shapes: models.ts). Every model has the form
 * log10 γ(z) = −A z² f(I); neutral species have γ = 1 (no salting-out term).
 */
import type { ActivityModel } from "../types";
import { ACTIVITY_MODELS } from "./models";

/** f(I) of the model. */
export function activityShape(model: ActivityModel, ionicStrength: number): number {
  return ACTIVITY_MODELS[model].shape(ionicStrength);
}

/** df/dI of the model. */
export function activityShapeDerivative(model: ActivityModel, ionicStrength: number): number {
  return ACTIVITY_MODELS[model].shapeDerivative(ionicStrength);
}

/** log10 γ of an ion of charge z at ionic strength I (mol/L) and Debye–Hückel A. */
export function log10Gamma(model: ActivityModel, charge: number, ionicStrength: number, A: number): number {
  return -A * charge * charge * activityShape(model, ionicStrength);
}
