/**
 * Formulation workflows on top of the equilibrium engine: titrant to a target pH, buffer capacity,
 * titration curves, the pH band over tolerances, and buffer recipes. Pure: no Office API, no DOM.
 */
export { adjust, ADJUST_PH_TOLERANCE, type AdjustOptions, type AdjustExcess, type AdjustStock, type AdjustValue, type AdjustResult } from "./adjust";
export { capacity, STRONG_BASE, STRONG_ACID, type CapacityValue, type CapacityResult } from "./capacity";
export { curve, CURVE_POINTS_DEFAULT, CURVE_POINTS_MIN, CURVE_POINTS_MAX, type CurveRequest, type CurvePoint, type StoichiometricPoint, type CurveValue, type CurveResult } from "./curve";
export { stoichiometricVolumes, strongCharge } from "./stoichiometric";
export { EQUIVALENCE_PROMINENCE, type EquivalencePoint } from "./equivalence";
export { phRange, statisticalBand, PHRANGE_COVERAGE_K, PHRANGE_MAX_EXHAUSTIVE, PHRANGE_MAX_QUANTITIES, type PHRangeOptions, type PHRangeValue, type PHRangeResult, type StatisticalBand } from "./ph-range";
export { phRangeOverTemperature, PHRANGE_MAX_TEMPERATURES, type PHRangeOverTemperatureValue } from "./ph-range-temperature";
export type { Quantity as PHRangeQuantity } from "./ph-range-model";
export type { BoxPoint as PHRangePoint } from "./ph-range-search";
export { recipe, RECIPE_I_TOLERANCE, type RecipeRequest, type RecipeLine, type RecipeValue, type RecipeResult } from "./recipe";
