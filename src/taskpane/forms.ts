/**
 * What the editor's fields hold (text, as typed): their shapes, empty forms, and how a typed number
 * is read. Pure: no DOM, no storage. Fields → records is form-to-record.ts, records → fields
 * record-to-form.ts, ids from names entry-id.ts.
 */
import { readDecimal } from "../chem";
import type { PhysicalState, SourceRecord, SubstanceNature, SystemRecord, ValueRecord, ValueStatus } from "../library";

/** A problem at a field of the entry being edited: path relative to the entry ("steps[0].pKa.value"). */
export interface FieldIssue {
  path: string;
  message: string;
}

export interface ValueInput {
  value: string;
  conditions: string;
  status: ValueStatus;
  source: string;
  locator: string;
  note: string;
  /** The stored record this input was opened from (edit, override, duplicate): a changed value loses its provenance. */
  origin?: ValueRecord;
}

/** Where a pKa was measured, as typed; all empty = at 25 °C, I = 0 (or only the Conditions text). */
export interface MeasuredInput {
  /** °C. */
  temperature: string;
  /** mol/L. */
  ionicStrength: string;
  medium: string;
  scale: "concentration" | "mixed";
}

export interface StepInput {
  pKa: ValueInput;
  /** The pKa value field holds a value measured at these conditions; stored converted to 25 °C, I = 0. */
  measured: MeasuredInput;
  /** The value field holds a pKb of the base (25 °C); stored as the conjugate acid's pKa. */
  enteredAsPkb: boolean;
  dH: ValueInput;
  dCp: ValueInput;
}

export interface SystemInput {
  id: string;
  name: string;
  topCharge: string;
  /** One species name per line, most protonated first (optional). */
  speciesNames: string;
  note: string;
  steps: StepInput[];
  /** Complexes and solids of the record being edited: not editable here, carried over unchanged. */
  complexes?: SystemRecord["complexes"];
  solids?: SystemRecord["solids"];
}

export interface SubstanceInput {
  id: string;
  name: string;
  /** One alias per line. */
  aliases: string;
  formula: string;
  /** False when the formula is shared with another substance: then it is not a lookup name. */
  formulaAlias: boolean;
  molarMass: ValueInput;
  nature: SubstanceNature;
  state: PhysicalState | "";
  systems: { system: string; stoich: string; protons: string }[];
  ions: { ion: string; stoich: string }[];
  neutral: string;
  freeH: string;
  freeOH: string;
  note: string;
  /** The user confirmed that this entry may take lookup names other entries use now. */
  takeOverNames?: boolean;
}

export interface SourceInput {
  id: string;
  kind: NonNullable<SourceRecord["kind"]> | "";
  title: string;
  authors: string;
  container: string;
  edition: string;
  volume: string;
  pages: string;
  year: string;
  doi: string;
  url: string;
  /** How locators in value records point into this source. */
  locators: string;
  note: string;
}

export type Built<T> = { ok: true; record: T; notes: string[] } | { ok: false; issues: FieldIssue[] };

export const DEFAULT_CONDITIONS = "25 °C, I = 0";

export const STATUS_LABEL: Record<ValueStatus, string> = {
  entered: "entered by the user",
  published: "published",
  "common-practice": "common practice",
  unverified: "from memory, unverified",
};

export function emptyValue(conditions = DEFAULT_CONDITIONS): ValueInput {
  // A new value starts as "entered by the user", which needs nothing absent: a source and locator
  // make it "published", a note makes it common practice or unverified.
  return { value: "", conditions, status: "entered", source: "", locator: "", note: "" };
}

export function emptyMeasured(): MeasuredInput {
  return { temperature: "", ionicStrength: "", medium: "", scale: "concentration" };
}

export function emptyStep(): StepInput {
  return { pKa: emptyValue(), measured: emptyMeasured(), enteredAsPkb: false, dH: emptyValue(), dCp: emptyValue() };
}

export function emptySystem(): SystemInput {
  return { id: "", name: "", topCharge: "0", speciesNames: "", note: "", steps: [emptyStep()] };
}

export function emptySubstance(): SubstanceInput {
  return {
    id: "",
    name: "",
    aliases: "",
    formula: "",
    formulaAlias: true,
    molarMass: emptyValue("form as weighed"),
    nature: "weak-acid-base",
    state: "solid",
    systems: [{ system: "", stoich: "1", protons: "0" }],
    ions: [],
    neutral: "",
    freeH: "",
    freeOH: "",
    note: "",
  };
}

export function emptySource(): SourceInput {
  return { id: "", kind: "", title: "", authors: "", container: "", edition: "", volume: "", pages: "", year: "", doi: "", url: "", locators: "", note: "" };
}

/** A number as typed in a field (the one rule for number text: src/chem/number-text.ts). */
export function readNumber(text: string): number | null {
  return readDecimal(text);
}
