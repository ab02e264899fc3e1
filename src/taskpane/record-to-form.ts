/** Library records → the editor's fields, to edit or duplicate an entry. Pure: no DOM, no storage. */
import type { SourceRecord, SubstanceRecord, SystemRecord, ValueRecord } from "../library";
import { DEFAULT_CONDITIONS, emptyMeasured, emptyValue } from "./forms";
import type { MeasuredInput, SourceInput, SubstanceInput, SystemInput, ValueInput } from "./forms";

const num = (n: number | undefined): string => (n === undefined ? "" : String(n));

export function valueToInput(v: ValueRecord | undefined, conditions = DEFAULT_CONDITIONS): ValueInput {
  if (!v) return emptyValue(conditions);
  return { value: String(v.value), conditions: v.conditions, status: v.status, source: v.source ?? "", locator: v.locator ?? "", note: v.note ?? "", origin: v };
}

/** A pKa measured at other conditions opens as measured: its value field holds the measured value. */
function pKaToInput(v: ValueRecord): { pKa: ValueInput; measured: MeasuredInput } {
  const pKa = valueToInput(v);
  const m = v.measured;
  if (m === undefined) return { pKa, measured: emptyMeasured() };
  pKa.value = String(m.value);
  return { pKa, measured: { temperature: String(m.temperature), ionicStrength: String(m.ionicStrength), medium: m.medium ?? "", scale: m.scale ?? "concentration" } };
}

export function systemToInput(r: SystemRecord): SystemInput {
  return {
    id: r.id,
    name: r.name,
    topCharge: String(r.topCharge),
    speciesNames: (r.speciesNames ?? []).join("\n"),
    note: r.note ?? "",
    steps: r.steps.map((s) => ({ ...pKaToInput(s.pKa), enteredAsPkb: false, dH: valueToInput(s.dH), dCp: valueToInput(s.dCp) })),
    ...(r.complexes ? { complexes: r.complexes } : {}),
    ...(r.solids ? { solids: r.solids } : {}),
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
