/**
 * What the editor's fields hold (text, as typed) ↔ library records. Pure: no DOM, no storage.
 * Number fields are read here and reported at their field; everything else about a record is
 * checked by the library's validator when the layer is saved.
 */
import { pKbToPKa, PKW_25C } from "../library";
import type { PhysicalState, SourceRecord, StepRecord, SubstanceNature, SubstanceRecord, SystemRecord, ValueRecord, ValueStatus } from "../library";

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
}

export interface StepInput {
  pKa: ValueInput;
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
  published: "published",
  "common-practice": "common practice",
  unverified: "from memory, unverified",
};

export function emptyValue(conditions = DEFAULT_CONDITIONS): ValueInput {
  return { value: "", conditions, status: "published", source: "", locator: "", note: "" };
}

export function emptyStep(): StepInput {
  return { pKa: emptyValue(), enteredAsPkb: false, dH: emptyValue(), dCp: emptyValue() };
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

/** A number as typed: accepts the Unicode minus and surrounding spaces. */
export function readNumber(text: string): number | null {
  const t = text.trim().replace(/\u2212/g, "-");
  if (t === "" || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
}

const lines = (text: string): string[] =>
  text
    .split(/\r?\n/)
    .map((s) => s.trim())
    .filter((s) => s !== "");

function setIf<T extends object, K extends keyof T>(target: T, key: K, value: T[K] | undefined | ""): void {
  if (value !== undefined && value !== "") target[key] = value as T[K];
}

/** A value record from its fields; `optional` values with an empty number are left out. */
export function buildValue(input: ValueInput, unit: string, path: string, issues: FieldIssue[], optional: boolean, override?: { value: number; note: string }): ValueRecord | undefined {
  if (input.value.trim() === "" && optional) return undefined;
  const n = override ? override.value : readNumber(input.value);
  if (n === null) {
    issues.push({ path: `${path}.value`, message: input.value.trim() === "" ? "a number is needed" : `'${input.value}' is not a number` });
    return undefined;
  }
  const record: ValueRecord = { value: n, unit, conditions: input.conditions.trim(), status: input.status };
  if (input.status === "published" && input.source.trim() === "") {
    issues.push({ path: `${path}.source`, message: "a published value names its source: choose one (add it under 'Source' first), or mark the value 'common practice' or 'from memory, unverified'" });
  }
  if (input.status !== "published" && input.note.trim() === "" && !override) {
    issues.push({ path: `${path}.note`, message: `a '${STATUS_LABEL[input.status]}' value says why in a note` });
  }
  setIf(record, "source", input.source.trim());
  setIf(record, "locator", input.locator.trim());
  const note = [input.note.trim(), override?.note ?? ""].filter((s) => s !== "").join("; ");
  setIf(record, "note", note);
  return record;
}

/** "pKa = pKw − pKb = 13.995 − 4.75 = 9.245", or null when the text is not a number. */
export function describePkbConversion(pKbText: string): string | null {
  const pKb = readNumber(pKbText);
  if (pKb === null) return null;
  const r = pKbToPKa(pKb);
  if (!r.ok) return null;
  return `pKa = pKw − pKb = ${PKW_25C.value} − ${pKb} = ${r.pKa} (pKw at 25 °C: CRC Handbook, after Marshall & Franck 1981)`;
}

export function buildSystem(input: SystemInput): Built<SystemRecord> {
  const issues: FieldIssue[] = [];
  const notes: string[] = [];
  const topCharge = readNumber(input.topCharge);
  if (topCharge === null || !Number.isInteger(topCharge)) issues.push({ path: "topCharge", message: "a whole number (charge of the fully protonated form, e.g. 0 for an acid HA, 1 for BH⁺)" });
  if (input.steps.length === 0) issues.push({ path: "steps", message: "at least one step" });
  const steps: StepRecord[] = input.steps.map((s, i) => {
    const p = `steps[${i}]`;
    let override: { value: number; note: string } | undefined;
    if (s.enteredAsPkb) {
      const pKb = readNumber(s.pKa.value);
      if (pKb !== null) {
        const r = pKbToPKa(pKb);
        if (r.ok) {
          override = { value: r.pKa, note: r.note };
          notes.push(`step ${i + 1}: ${describePkbConversion(s.pKa.value)}`);
        }
      }
    }
    const pKa = buildValue(s.pKa, "1", `${p}.pKa`, issues, false, override);
    const step: StepRecord = { pKa: pKa as ValueRecord };
    const dH = buildValue(s.dH, "kJ/mol", `${p}.dH`, issues, true);
    const dCp = buildValue(s.dCp, "J/(K·mol)", `${p}.dCp`, issues, true);
    if (dH) step.dH = dH;
    if (dCp) step.dCp = dCp;
    return step;
  });
  if (issues.length) return { ok: false, issues };
  const record: SystemRecord = { id: input.id, name: input.name.trim(), topCharge: topCharge as number, steps };
  const species = lines(input.speciesNames);
  if (species.length) record.speciesNames = species;
  setIf(record, "note", input.note.trim());
  return { ok: true, record, notes };
}

export function buildSubstance(input: SubstanceInput): Built<SubstanceRecord> {
  const issues: FieldIssue[] = [];
  const record: SubstanceRecord = { id: input.id, name: input.name.trim(), nature: input.nature };
  const aliases = lines(input.aliases);
  if (aliases.length) record.aliases = aliases;
  setIf(record, "formula", input.formula.trim());
  if (input.formula.trim() !== "" && !input.formulaAlias) record.formulaAlias = false;
  if (input.formula.trim() === "" || input.molarMass.value.trim() !== "") {
    const mm = buildValue(input.molarMass, "g/mol", "molarMass", issues, input.formula.trim() !== "");
    if (input.formula.trim() === "" && input.molarMass.value.trim() === "") {
      issues.splice(issues.length - 1, 1, { path: "molarMass.value", message: "give a formula (the molar mass is computed from it) or a molar mass" });
    }
    if (mm) record.molarMass = mm;
  }
  setIf(record, "state", input.state);
  const count = (text: string, path: string, what: string, positive: boolean): number | undefined => {
    const n = readNumber(text);
    if (n === null || n < 0 || (positive && n === 0)) {
      issues.push({ path, message: `${what}: ${positive ? "a number above 0" : "a number, 0 or more"}` });
      return undefined;
    }
    return n;
  };
  const systems = input.systems.filter((s) => s.system !== "" || s.stoich.trim() !== "" && s.stoich.trim() !== "1");
  if (systems.length) {
    record.systems = systems.map((s, i) => {
      if (s.system === "") issues.push({ path: `systems[${i}].system`, message: "choose an acid–base system" });
      return {
        system: s.system,
        stoich: count(s.stoich, `systems[${i}].stoich`, "units per mole", true) ?? 1,
        protons: count(s.protons, `systems[${i}].protons`, "dissociable protons carried", false) ?? 0,
      };
    });
  }
  const ions = input.ions.filter((s) => s.ion !== "");
  if (ions.length) {
    record.ions = ions.map((s, i) => ({ ion: s.ion, stoich: count(s.stoich, `ions[${i}].stoich`, "ions per mole", true) ?? 1 }));
  }
  for (const [key, label] of [
    ["neutral", "neutral particles per mole"],
    ["freeH", "H⁺ released outright per mole"],
    ["freeOH", "OH⁻ released outright per mole"],
  ] as const) {
    if (input[key].trim() !== "") {
      const n = count(input[key], key, label, false);
      if (n !== undefined) record[key] = n;
    }
  }
  setIf(record, "note", input.note.trim());
  return issues.length ? { ok: false, issues } : { ok: true, record, notes: [] };
}

export function buildSource(input: SourceInput): Built<SourceRecord> {
  const issues: FieldIssue[] = [];
  const record: SourceRecord = { title: input.title.trim() };
  setIf(record, "kind", input.kind);
  setIf(record, "authors", input.authors.trim());
  setIf(record, "container", input.container.trim());
  setIf(record, "edition", input.edition.trim());
  setIf(record, "volume", input.volume.trim());
  setIf(record, "pages", input.pages.trim());
  if (input.year.trim() !== "") {
    const y = readNumber(input.year);
    if (y === null || !Number.isInteger(y)) issues.push({ path: "year", message: "a year such as 2019" });
    else record.year = y;
  }
  setIf(record, "doi", input.doi.trim());
  setIf(record, "url", input.url.trim());
  setIf(record, "locators", input.locators.trim());
  setIf(record, "note", input.note.trim());
  return issues.length ? { ok: false, issues } : { ok: true, record, notes: [] };
}

// ---- records → fields (edit, duplicate) ----

const num = (n: number | undefined): string => (n === undefined ? "" : String(n));

export function valueToInput(v: ValueRecord | undefined, conditions = DEFAULT_CONDITIONS): ValueInput {
  if (!v) return emptyValue(conditions);
  return { value: String(v.value), conditions: v.conditions, status: v.status, source: v.source ?? "", locator: v.locator ?? "", note: v.note ?? "" };
}

export function systemToInput(r: SystemRecord): SystemInput {
  return {
    id: r.id,
    name: r.name,
    topCharge: String(r.topCharge),
    speciesNames: (r.speciesNames ?? []).join("\n"),
    note: r.note ?? "",
    steps: r.steps.map((s) => ({ pKa: valueToInput(s.pKa), enteredAsPkb: false, dH: valueToInput(s.dH), dCp: valueToInput(s.dCp) })),
  };
}

export function substanceToInput(r: SubstanceRecord): SubstanceInput {
  return {
    id: r.id,
    name: r.name,
    aliases: (r.aliases ?? []).join("\n"),
    formula: r.formula ?? "",
    formulaAlias: r.formulaAlias !== false,
    molarMass: valueToInput(r.molarMass, "form as weighed"),
    nature: r.nature,
    state: r.state ?? "",
    systems: (r.systems ?? []).map((s) => ({ system: s.system, stoich: String(s.stoich), protons: String(s.protons) })),
    ions: (r.ions ?? []).map((s) => ({ ion: s.ion, stoich: String(s.stoich) })),
    neutral: num(r.neutral),
    freeH: num(r.freeH),
    freeOH: num(r.freeOH),
    note: r.note ?? "",
  };
}

export function sourceToInput(id: string, r: SourceRecord): SourceInput {
  return {
    id,
    kind: r.kind ?? "",
    title: r.title,
    authors: r.authors ?? "",
    container: r.container ?? "",
    edition: r.edition ?? "",
    volume: r.volume ?? "",
    pages: r.pages ?? "",
    year: num(r.year),
    doi: r.doi ?? "",
    url: r.url ?? "",
    locators: r.locators ?? "",
    note: r.note ?? "",
  };
}

/** An id from a name: lower case, [a-z0-9._-], at most 64 characters, unique under `taken`. */
export function makeId(name: string, taken: (id: string) => boolean): string {
  let base = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9._-]+/g, "-")
    .replace(/^[^a-z0-9]+/, "")
    .replace(/-+$/, "")
    .slice(0, 56);
  if (base === "" || base === "constructor" || base === "prototype") base = `entry${base ? `-${base}` : ""}`;
  let id = base;
  for (let n = 2; taken(id); n++) id = `${base}-${n}`;
  return id;
}
