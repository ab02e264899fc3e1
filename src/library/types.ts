/**
 * The library file format (schemaVersion 1) as TypeScript types, and the typed results of the
 * library API. The JSON Schema in schema/library.schema.json is the authority for the format;
 * these types mirror it.
 */

export const LIBRARY_FORMAT = "protolyte-library";
export const SCHEMA_VERSION = 1;

/**
 * How a value is known. "entered": typed by a user with no citation checked (the status a value
 * takes when it changes without a new source and locator; never used by the built-in data).
 */
export type ValueStatus = "published" | "common-practice" | "unverified" | "entered";

/** A number with its unit, conditions and provenance. */
export interface ValueRecord {
  value: number;
  unit: string;
  /** e.g. "25 °C, I = 0". */
  conditions: string;
  /** Key into `sources`; required when status is "published". */
  source?: string;
  /** Where in the source: "Table 2", "entry: acetic acid". */
  locator?: string;
  status: ValueStatus;
  /** Required for "common-practice" and "unverified": the reason. */
  note?: string;
  /**
   * pKa only: the value as measured at other conditions; `value` then holds it converted to 25 °C
   * and I = 0 with the engine's models (conditions.ts), and the validator checks that it does.
   */
  measured?: MeasuredPKa;
}

/** A pKa as measured: at a temperature (°C) and ionic strength (mol/L), in a medium, on a scale. */
export interface MeasuredPKa {
  value: number;
  temperature: number;
  ionicStrength: number;
  /** The salt or buffer medium ("KCl"): recorded; the activity model does not tell media apart. */
  medium?: string;
  /** "concentration" ([H⁺][B]/[A], the default) or "mixed" (a(H⁺)[B]/[A], a glass electrode's). */
  scale?: "concentration" | "mixed";
}

export interface SourceRecord {
  kind?: "paper" | "book" | "handbook" | "standard" | "data-compilation" | "web" | "other";
  authors?: string;
  title: string;
  /** Journal, book or series. */
  container?: string;
  edition?: string;
  volume?: string;
  pages?: string;
  year?: number;
  doi?: string;
  url?: string;
  /** How locators in value records point into this source. */
  locators?: string;
  note?: string;
}

export interface StepRecord {
  pKa: ValueRecord;
  dH?: ValueRecord;
  dCp?: ValueRecord;
}

/** A species M + l·L + p·H⁺ of a system's fully deprotonated form L (no metal: the ligand alone). */
export interface ComplexRecord {
  name: string;
  /** Strong-ion id. */
  metal?: string;
  ligands: number;
  protons: number;
  /** log β at 25 °C and I = 0, unit "1". */
  logBeta: ValueRecord;
  /** ΔrH° of the formation reaction, kJ/mol. */
  dH?: ValueRecord;
  note?: string;
}

/** A solid M_m L_l H_p (s) ⇌ m M + l L + p H⁺, for saturation warnings only. */
export interface SolidRecord {
  name: string;
  metal: string;
  metals: number;
  ligands: number;
  protons: number;
  /** log Ksp at 25 °C and I = 0, unit "1". */
  logKsp: ValueRecord;
  note?: string;
}

export interface SystemRecord {
  id: string;
  name: string;
  topCharge: number;
  speciesNames?: string[];
  steps: StepRecord[];
  /** Species of this system's fully deprotonated form with metal ions, protons or itself. */
  complexes?: ComplexRecord[];
  /** Sparingly soluble solids of this system's ligand, checked for saturation (AQ.CHECK). */
  solids?: SolidRecord[];
  note?: string;
}

export interface IonRecord {
  id: string;
  name: string;
  formula?: string;
  charge: number;
  note?: string;
}

export type SubstanceNature = "weak-acid-base" | "strong-acid" | "strong-base" | "neutral-salt" | "non-electrolyte";
export type PhysicalState = "solid" | "liquid" | "solution" | "gas";

export interface SubstanceRecord {
  id: string;
  name: string;
  aliases?: string[];
  /** Hill-ish formula of the form weighed, hydrate water included: "Na2HPO4·7H2O". */
  formula?: string;
  /** False when the formula is shared by another substance (sucrose/trehalose): not a lookup name. */
  formulaAlias?: boolean;
  /** Only for entries without a formula (user entries); built-in masses are computed. */
  molarMass?: ValueRecord;
  nature: SubstanceNature;
  state?: PhysicalState;
  /** Systems released per mole; `protons` = dissociable protons the weighed form carries on them, per mole of substance. */
  systems?: { system: string; stoich: number; protons: number }[];
  ions?: { ion: string; stoich: number }[];
  neutral?: number;
  /** H⁺ released outright per mole (strong acid proton, PIPES sulfonic acid). Checked for charge balance only. */
  freeH?: number;
  /** OH⁻ released outright per mole (NaOH). Checked for charge balance only. */
  freeOH?: number;
  note?: string;
}

export interface EntryRef {
  kind: EntryKind;
  id: string;
}

/** When, from which constants and by which software a file was exported. Not kept in a layer. */
export interface ExportStamp {
  at: string;
  fingerprint: string;
  /** "Protolyte 0.1.0". */
  software: string;
  /** What was exported: "workbook library", "constants in effect", "entries the workbook uses". */
  what?: string;
}

/** A snapshot of the constants a workbook's formulas use, copied into the workbook library. */
export interface PinRecord {
  at: string;
  builtinVersion: string;
  /** The fingerprint of the constants in effect right after pinning. */
  fingerprint?: string;
  entries: EntryRef[];
}

export type ChangeAction = "add" | "edit" | "delete" | "import" | "pin" | "copy";

/** One change to a workbook library (the change record): values as JSON text. */
export interface ChangeRecord {
  at: string;
  who: string;
  action: ChangeAction;
  entry?: EntryRef;
  name?: string;
  summary?: string;
  diff?: { path: string; old?: string; new?: string }[];
  reason?: string;
}

/** A library file (and a layer): our own public format. */
export interface LibraryDoc {
  format: typeof LIBRARY_FORMAT;
  schemaVersion: typeof SCHEMA_VERSION;
  name: string;
  version?: string;
  description?: string;
  sources?: Record<string, SourceRecord>;
  atomicWeights?: Record<string, ValueRecord>;
  systems?: SystemRecord[];
  ions?: IonRecord[];
  substances?: SubstanceRecord[];
  exported?: ExportStamp;
  pin?: PinRecord;
  changes?: ChangeRecord[];
}

/** One problem a person can act on: "substances[3].aliases[0]: duplicate of 'tris' used by tris-base". */
export interface ValidationIssue {
  path: string;
  message: string;
}

export type LayerName = "builtin" | "workbook" | "personal";
/**
 * Lowest first: a later layer overrides an earlier one. The workbook is on top: what it carries
 * decides on every computer, and a personal entry (this computer) only fills what it lacks.
 */
export const LAYER_ORDER: readonly LayerName[] = ["builtin", "personal", "workbook"];

export type EntryKind = "source" | "atomicWeight" | "system" | "ion" | "substance";
