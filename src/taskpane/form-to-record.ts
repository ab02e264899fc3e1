/**
 * The editor's fields → library records. Number fields are read here and reported at their field;
 * everything else about a record is checked by the library's validator when the layer is saved.
 * Pure: no DOM, no storage.
 */
import { parseDecimalComma } from "../chem/number-text";
import { convertPKa, measuredConditionsText, pKbToPKa, PKW_25C, reviseValue } from "../library";
import type { MeasuredPKa, SourceRecord, StepRecord, SubstanceRecord, SystemRecord, ValueRecord } from "../library";
import { DEFAULT_CONDITIONS, readNumber, STATUS_LABEL } from "./forms";
import type { Built, FieldIssue, SourceInput, StepInput, SubstanceInput, SystemInput, ValueInput } from "./forms";

const lines = (text: string): string[] =>
  text
    .split(/\r?\n/)
    .map((s) => s.trim())
    .filter((s) => s !== "");

function setIf<T extends object, K extends keyof T>(target: T, key: K, value: T[K] | undefined | ""): void {
  if (value !== undefined && value !== "") target[key] = value as T[K];
}

/** The note of a pKb conversion (derived: recomputed on every save, never typed). */
const PKB_NOTE = /(^|;\s*)converted from pKb [^;]*/g;

/**
 * A value record from its fields; `optional` values with an empty number are left out. A value
 * opened from a stored record (`input.origin`) that changed loses the old provenance it did not
 * renew (the library's rule, reviseValue); what was dropped is added to `notes`.
 */
export function buildValue(input: ValueInput, unit: string, path: string, issues: FieldIssue[], optional: boolean, override?: { value: number; note: string }, notes: string[] = []): ValueRecord | undefined {
  if (input.value.trim() === "" && optional) return undefined;
  const n = override ? override.value : readNumber(input.value);
  if (n === null) {
    issues.push({ path: `${path}.value`, message: numberProblem(input.value) });
    return undefined;
  }
  const typedNote = input.note.replace(PKB_NOTE, "").replace(/^;\s*/, "").trim();
  const originNote = input.origin?.note?.replace(PKB_NOTE, "").replace(/^;\s*/, "").trim();
  const draft: ValueRecord = { value: n, unit, conditions: input.conditions.trim(), status: input.status };
  setIf(draft, "source", input.source.trim());
  setIf(draft, "locator", input.locator.trim());
  setIf(draft, "note", typedNote);
  const origin = input.origin ? { ...input.origin, note: originNote || undefined } : undefined;
  if (origin && origin.note === undefined) delete origin.note;
  const { record, reset } = reviseValue(origin, draft);
  if (reset) notes.push(`${path.replace(/\.(pKa|dH|dCp|molarMass)$/, "")} ${reset}`.replace(/^steps\[(\d+)\]/, (_, i) => `step ${Number(i) + 1}`));
  if (record.status === "published" && record.source === undefined) {
    issues.push({ path: `${path}.source`, message: "a published value names its source: choose one (add it under 'Source' first — this draft is kept), or choose 'entered by the user'" });
  }
  if ((record.status === "common-practice" || record.status === "unverified") && record.note === undefined && !override?.note) {
    issues.push({ path: `${path}.note`, message: `a '${STATUS_LABEL[record.status]}' value says why in a note` });
  }
  const note = [record.note ?? "", override?.note ?? ""].filter((s) => s !== "").join("; ");
  if (note) record.note = note;
  else delete record.note;
  return record;
}

/** Why a number field's text is not read as a number. */
export function numberProblem(text: string): string {
  const t = text.trim();
  if (t === "") return "a number is needed";
  const comma = t.includes(",") ? parseDecimalComma(t) : null;
  if (comma !== null) return `'${text}' uses a decimal comma: write it with a point ('${comma}')`;
  return `'${text}' is not a number`;
}

/** "pKa = pKw − pKb = 13.995 − 4.75 = 9.245", or null when the text is not a number. */
export function describePkbConversion(pKbText: string): string | null {
  const pKb = readNumber(pKbText);
  if (pKb === null) return null;
  const r = pKbToPKa(pKb);
  if (!r.ok) return null;
  return `pKa = pKw − pKb = ${PKW_25C.value} − ${pKb} = ${r.pKa} (pKw at 25 °C: CRC Handbook, after Marshall & Franck 1981)`;
}

/**
 * The measured conditions typed for step `i` (null when none: the value is at 25 °C, I = 0), or the
 * problems at their fields. Empty temperature means 25 °C, empty ionic strength 0.
 */
export function readMeasured(s: StepInput, i: number, issues: FieldIssue[]): Omit<MeasuredPKa, "value"> | null {
  const m = s.measured;
  if (m.temperature.trim() === "" && m.ionicStrength.trim() === "") return null;
  const p = `steps[${i}].pKa.measured`;
  const read = (text: string, fallback: number, key: string, what: string): number | null => {
    if (text.trim() === "") return fallback;
    const n = readNumber(text);
    if (n === null) issues.push({ path: `${p}.${key}`, message: `${what}: ${numberProblem(text)}` });
    return n;
  };
  const temperature = read(m.temperature, 25, "temperature", "temperature in °C");
  const ionicStrength = read(m.ionicStrength, 0, "ionicStrength", "ionic strength in mol/L");
  if (temperature === null || ionicStrength === null) return null;
  if (s.enteredAsPkb) {
    issues.push({ path: `${p}.temperature`, message: "a pKb is taken at 25 °C, I = 0: enter the pKa measured at these conditions instead, or clear them" });
    return null;
  }
  const out: Omit<MeasuredPKa, "value"> = { temperature, ionicStrength, scale: m.scale };
  if (m.medium.trim() !== "") out.medium = m.medium.trim();
  return out;
}

/** "Stored as pKa 7.0912 at 25 °C, I = 0 — converted from …", the refusal, or null (no conditions, or no number yet). */
export function describeMeasured(system: SystemInput, i: number): string | null {
  const issues: FieldIssue[] = [];
  const s = system.steps[i];
  const m = readMeasured(s, i, issues);
  if (issues.length) return issues.map((x) => x.message).join("; ");
  const value = readNumber(s.pKa.value);
  if (m === null || value === null) return null;
  const dH = readNumber(s.dH.value);
  const dCp = readNumber(s.dCp.value);
  const step = { dH: dH === null ? undefined : { value: dH, unit: "kJ/mol", conditions: "", status: "entered" as const }, dCp: dCp === null ? undefined : { value: dCp, unit: "J/(K·mol)", conditions: "", status: "entered" as const } };
  const c = convertPKa({ ...m, value }, step, readNumber(system.topCharge) ?? 0, i);
  if (!c.ok) return `Cannot convert: ${c.message}.`;
  return `Stored as pKa ${+c.value.toFixed(4)} at 25 °C, I = 0 — ${c.method}. ${c.uncertainty}`.trim();
}

/** A base entered by pKb is stored through its conjugate acid BH⁺: a top charge of 0 is almost surely a slip. */
export function pkbChargeWarning(system: SystemInput): string | null {
  if (!system.steps.some((s) => s.enteredAsPkb) || readNumber(system.topCharge) !== 0) return null;
  return "Check the charge: a base entered by its pKb is stored through its conjugate acid, so a neutral base B (ammonia, Tris) has BH⁺ as its fully protonated form, charge +1. With 0 its salts will not balance.";
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
    const measured = readMeasured(s, i, issues);
    const dH = buildValue(s.dH, "kJ/mol", `${p}.dH`, issues, true, undefined, notes);
    const dCp = buildValue(s.dCp, "J/(K·mol)", `${p}.dCp`, issues, true, undefined, notes);
    const typed = readNumber(s.pKa.value);
    if (measured && typed !== null && topCharge !== null) {
      const c = convertPKa({ ...measured, value: typed }, { dH, dCp }, topCharge, i);
      if (!c.ok) issues.push({ path: `${p}.pKa.measured.${/ΔrH°|°C/.test(c.message) && !/ionic strength/i.test(c.message) ? "temperature" : "ionicStrength"}`, message: c.message });
      else {
        override = { value: c.value, note: "" };
        notes.push(`step ${i + 1}: ${c.method}. ${c.uncertainty}`.trim());
      }
    }
    // The conditions text of a converted value is written here; cleared conditions leave no stale text.
    const conditions = measured && override ? `converted to 25 °C, I = 0 from ${measuredConditionsText({ ...measured, value: typed as number })}` : s.pKa.conditions.startsWith("converted to 25 °C") ? DEFAULT_CONDITIONS : s.pKa.conditions;
    const pKaInput = { ...s.pKa, conditions };
    const pKa = buildValue(pKaInput, "1", `${p}.pKa`, issues, false, override, notes);
    if (pKa && measured && override) {
      pKa.measured = { value: typed as number, ...measured };
      if (pKa.note === "") delete pKa.note;
    }
    const step: StepRecord = { pKa: pKa as ValueRecord };
    if (dH) step.dH = dH;
    if (dCp) step.dCp = dCp;
    return step;
  });
  if (issues.length) return { ok: false, issues };
  const record: SystemRecord = { id: input.id, name: input.name.trim(), topCharge: topCharge as number, steps };
  const species = lines(input.speciesNames);
  if (species.length) record.speciesNames = species;
  // Complexes and solids are not edited in this form: the record keeps those it had.
  if (input.complexes) record.complexes = input.complexes;
  if (input.solids) record.solids = input.solids;
  setIf(record, "note", input.note.trim());
  return { ok: true, record, notes };
}

export function buildSubstance(input: SubstanceInput): Built<SubstanceRecord> {
  const issues: FieldIssue[] = [];
  const notes: string[] = [];
  const record: SubstanceRecord = { id: input.id, name: input.name.trim(), nature: input.nature };
  const aliases = lines(input.aliases);
  if (aliases.length) record.aliases = aliases;
  setIf(record, "formula", input.formula.trim());
  if (input.formula.trim() !== "" && !input.formulaAlias) record.formulaAlias = false;
  if (input.formula.trim() === "" || input.molarMass.value.trim() !== "") {
    const mm = buildValue(input.molarMass, "g/mol", "molarMass", issues, input.formula.trim() !== "", undefined, notes);
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
  return issues.length ? { ok: false, issues } : { ok: true, record, notes };
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
