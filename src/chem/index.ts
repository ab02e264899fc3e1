/**
 * Public API of the equilibrium engine (pure TypeScript: no Office API, no DOM).
 * Units: mol/L, L, °C at the interface; kJ/mol for ΔrH°, J/(K·mol) for ΔrCp°.
 */
export type {
  ActivityModel,
  PkaStep,
  AcidBaseSystem,
  ComplexSpecies,
  SolidSpecies,
  Saturation,
  StrongIon,
  Component,
  MixtureEntry,
  Mixture,
  ChemOptions,
  Species,
  Regime,
  Equilibrium,
  FailureCode,
  Failure,
  Result,
  ValueResult,
  PHResult,
} from "./types";
export { DEFAULTS, SOLVER, LIMITS } from "./defaults";
export { solveEquilibrium, solvePH } from "./solve-mixture";
export { prepare, PreparedMixture } from "./prepared";
export type { MetalDistribution, MetalForm, LigandDistribution, LigandForm } from "./metal-distribution";
export { pKw, kw, pKwMarshallFranck, pKwIapws2006 } from "./water";
export { waterDensity } from "./water-density";
export { pKaAtTemperature, thermodynamicPKa } from "./temperature";
export { debyeHuckelA, waterPermittivity } from "./activity/debye-huckel-a";
export { daviesLog10Gamma } from "./activity/davies";
export { debyeHuckelLog10Gamma, BATES_GUGGENHEIM_BA } from "./activity/debye-huckel";
export { idealLog10Gamma } from "./activity/ideal";
export { log10Gamma } from "./activity/model";
export { apparentPKa, osmolarity, ionicStrength, PKA_SCALES, type PKaScale } from "./derived";
export { classifyRegime } from "./regime";
export { parseDecimal, readDecimal, leadingDecimal, UNSIGNED_DECIMAL_SOURCE } from "./number-text";
export { assessBuffering, BUFFERING, unverifiedStepsNear, type BufferAssessment, type BufferVerdict, type UnverifiedStep } from "./buffering";
export { beyondIonicLimit, ionicLimitFailure, fmtAgainst, sideOf, IONIC_LIMIT_TEXT, THRESHOLD_ROUNDING } from "./ionic-limit";
export { parseQuantity, parseTemperatureTolerance, writtenVolumeUnit, type QuantityDimension, type ParseOptions, type WrittenVolumeUnit } from "./units";
export * from "./workflows";
export {
  ACTIVITY_MODELS,
  ACTIVITY_MODEL_IDS,
  activityModelNamed,
  activityModelChoices,
  isActivityModel,
  unknownActivityModelMessage,
  readActivityModel,
} from "./activity/models";
export { pitzerCoverage, pitzerRuleText, PITZER_STATUS_TEXT, type PitzerCoverage, type PitzerParameterLine, type PitzerRule } from "./activity/pitzer-provenance";
export { checkTemperature, readTemperature } from "./validate-options";
export { isBlankCell, cellPosition, pairShapeProblem, pairAt, EMPTY_MIXTURE_MESSAGE } from "./name-amount-pairs";
