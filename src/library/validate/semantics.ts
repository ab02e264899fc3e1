/**
 * Checks JSON Schema cannot express: unique ids, references to sources, systems, ions and
 * elements that exist (in this file or in the layers below it), species-name counts, formulas that
 * parse, charge balance of each weighed form, and lookup names that mean one substance only.
 */
import { convertPKa } from "../conditions";
import { molarMassOf, parseFormula } from "../formula";
import { normalizeName } from "../normalize";
import type { IonRecord, LibraryDoc, SourceRecord, SubstanceRecord, SystemRecord, ValidationIssue, ValueRecord } from "../types";
import { nameCharacterProblem } from "./name-chars";
import { childPath } from "./paths";

/** A semantic problem; `reference` marks a dangling reference (which may be mended by another layer). */
export interface SemanticIssue extends ValidationIssue {
  reference?: boolean;
}

/** Everything a reference may point at. */
export interface World {
  sources: ReadonlyMap<string, SourceRecord>;
  systems: ReadonlyMap<string, SystemRecord>;
  ions: ReadonlyMap<string, IonRecord>;
  elements: ReadonlySet<string>;
  /** Atomic weights by element, g/mol (the later doc's value). */
  atomicWeights: ReadonlyMap<string, number>;
}

/** Build the reference world from docs, later docs overriding earlier ones. */
export function worldOf(docs: readonly LibraryDoc[]): World {
  const sources = new Map<string, SourceRecord>();
  const systems = new Map<string, SystemRecord>();
  const ions = new Map<string, IonRecord>();
  const elements = new Set<string>();
  const atomicWeights = new Map<string, number>();
  for (const d of docs) {
    for (const [k, v] of Object.entries(d.sources ?? {})) sources.set(k, v);
    for (const s of d.systems ?? []) systems.set(s.id, s);
    for (const i of d.ions ?? []) ions.set(i.id, i);
    for (const [el, w] of Object.entries(d.atomicWeights ?? {})) {
      elements.add(el);
      if (typeof w?.value === "number") atomicWeights.set(el, w.value);
    }
  }
  return { sources, systems, ions, elements, atomicWeights };
}

/**
 * Why measured conditions are refused on a value other than a pKa: it is used as entered, at 25 °C
 * and I = 0, and the engine has no model that would convert it (conditions.ts converts a pKa only).
 */
const NOT_CONVERTED: Record<string, string> = {
  dH: "a ΔrH° is used as entered, for 25 °C and I = 0; moving one measured elsewhere to 25 °C would need ΔrCp° over that range, and to I = 0 the temperature derivative of the activity model, neither of which the engine applies to ΔrH°",
  dCp: "a ΔrCp° is used as entered and taken as constant with temperature; the engine has nothing to convert it with",
  logBeta: "a log β is used as entered, for 25 °C and I = 0; its activity term would need the charges of the metal, the ligand and the complex together, which the conversion of a pKa does not cover",
  logKsp: "a log Ksp is used as entered, for 25 °C and I = 0; the conversion covers a pKa only",
  molarMass: "a molar mass or atomic weight does not depend on temperature or ionic strength",
};

function checkValue(v: ValueRecord | undefined, path: string, world: World, out: SemanticIssue[], pKa = false): void {
  if (v?.source !== undefined && !world.sources.has(v.source)) {
    out.push({ path: childPath(path, "source"), message: `unknown source '${v.source}' (add it to sources)`, reference: true });
  }
  if (v?.measured !== undefined && !pKa) {
    const key = path.startsWith("atomicWeights") ? "molarMass" : path.slice(path.lastIndexOf(".") + 1);
    const why = NOT_CONVERTED[key] ?? "only a pKa is converted from measured conditions";
    out.push({ path: childPath(path, "measured"), message: `measured conditions cannot be converted here: ${why}. Enter the value for 25 °C, I = 0 (its conditions as text), or leave the measured conditions off` });
  }
}

/** A pKa with measured conditions must hold their conversion to 25 °C, I = 0 (conditions.ts). */
function checkMeasured(s: SystemRecord, k: number, path: string, out: SemanticIssue[]): void {
  const step = s.steps[k];
  const m = step.pKa.measured;
  if (m === undefined) return;
  const c = convertPKa(m, step, s.topCharge, k);
  if (!c.ok) out.push({ path: childPath(path, "measured"), message: c.message });
  else if (Math.abs(c.value - step.pKa.value) > 5e-4) {
    out.push({ path: childPath(path, "value"), message: `${step.pKa.value} is not the measured ${m.value} converted to 25 °C, I = 0 (${+c.value.toFixed(6)})` });
  }
}

export function checkSystem(s: SystemRecord, path: string, world: World, out: SemanticIssue[]): void {
  if (s.speciesNames && s.speciesNames.length !== s.steps.length + 1) {
    out.push({ path: childPath(path, "speciesNames"), message: `has ${s.speciesNames.length} names; ${s.steps.length} steps need ${s.steps.length + 1}` });
  }
  s.steps.forEach((step, i) => {
    const p = childPath(childPath(path, "steps"), i);
    checkValue(step.pKa, childPath(p, "pKa"), world, out, true);
    checkMeasured(s, i, childPath(p, "pKa"), out);
    checkValue(step.dH, childPath(p, "dH"), world, out);
    checkValue(step.dCp, childPath(p, "dCp"), world, out);
  });
  const names = new Set<string>(s.speciesNames ?? []);
  (s.complexes ?? []).forEach((c, i) => {
    const p = childPath(childPath(path, "complexes"), i);
    if (c.metal !== undefined && !world.ions.has(c.metal)) out.push({ path: childPath(p, "metal"), message: `unknown strong ion '${c.metal}'`, reference: true });
    if (c.metal === undefined && c.ligands < 2) out.push({ path: childPath(p, "ligands"), message: "a species of the ligand alone needs at least 2 ligands (a protonated form is a pKa step)" });
    if (names.has(c.name)) out.push({ path: childPath(p, "name"), message: `'${c.name}' is already the name of another species of ${s.id}` });
    names.add(c.name);
    checkValue(c.logBeta, childPath(p, "logBeta"), world, out);
    checkValue(c.dH, childPath(p, "dH"), world, out);
  });
  (s.solids ?? []).forEach((x, i) => {
    const p = childPath(childPath(path, "solids"), i);
    if (!world.ions.has(x.metal)) out.push({ path: childPath(p, "metal"), message: `unknown strong ion '${x.metal}'`, reference: true });
    checkValue(x.logKsp, childPath(p, "logKsp"), world, out);
  });
}

/** Net charge of one formula unit as the record describes it (0 for a consistent record), or null if a reference is missing. */
export function formulaCharge(s: SubstanceRecord, world: World): number | null {
  let z = (s.freeH ?? 0) - (s.freeOH ?? 0);
  for (const share of s.systems ?? []) {
    const sys = world.systems.get(share.system);
    if (!sys) return null;
    z += share.stoich * (sys.topCharge - sys.steps.length) + share.protons;
  }
  for (const share of s.ions ?? []) {
    const ion = world.ions.get(share.ion);
    if (!ion) return null;
    z += share.stoich * ion.charge;
  }
  return z;
}

export function checkSubstance(s: SubstanceRecord, path: string, world: World, out: SemanticIssue[]): void {
  (s.systems ?? []).forEach((share, i) => {
    const p = childPath(childPath(path, "systems"), i);
    const sys = world.systems.get(share.system);
    if (!sys) out.push({ path: childPath(p, "system"), message: `unknown acid–base system '${share.system}'`, reference: true });
    else if (share.protons > share.stoich * sys.steps.length + 1e-9) {
      out.push({ path: childPath(p, "protons"), message: `${share.protons} protons on ${share.stoich} × ${sys.id}, which has only ${sys.steps.length} dissociable per unit` });
    }
  });
  (s.ions ?? []).forEach((share, i) => {
    if (!world.ions.has(share.ion)) out.push({ path: childPath(childPath(childPath(path, "ions"), i), "ion"), message: `unknown strong ion '${share.ion}'`, reference: true });
  });
  checkValue(s.molarMass, childPath(path, "molarMass"), world, out);
  if (s.formula !== undefined) {
    const parsed = parseFormula(s.formula);
    if (!parsed.ok) out.push({ path: childPath(path, "formula"), message: parsed.message });
    else {
      const missing = [...parsed.counts.keys()].filter((el) => !world.elements.has(el));
      if (missing.length) out.push({ path: childPath(path, "formula"), message: `no atomic weight for ${missing.map((e) => `'${e}'`).join(", ")}`, reference: true });
      else {
        const m = molarMassOf(s.formula, world.atomicWeights);
        // it depends on atomic weights, which another layer may change: like a reference, a stored
        // layer keeps its other entries and this one is listed as unusable with the message
        if (!m.ok && m.code === "too-large") out.push({ path: childPath(path, "formula"), message: m.message, reference: true });
      }
    }
  }
  const releases = (s.systems?.length ?? 0) + (s.ions?.length ?? 0);
  if (s.nature === "non-electrolyte") {
    if (releases > 0) out.push({ path, message: "a non-electrolyte releases no acid–base systems or ions" });
    if (!(s.neutral && s.neutral > 0)) out.push({ path: childPath(path, "neutral"), message: "a non-electrolyte needs neutral > 0 (particles per mole)" });
  } else if (releases === 0) {
    out.push({ path, message: `a ${s.nature} substance must release at least one acid–base system or strong ion` });
  }
  const z = formulaCharge(s, world);
  if (z !== null && Math.abs(z) > 1e-9) {
    out.push({ path, message: `charges do not balance: one formula unit as described carries ${z > 0 ? "+" : ""}${+z.toFixed(6)} (check protons, ions, freeH, freeOH)` });
  }
}

/** Lookup names of a substance with where each is written. */
export function lookupNames(s: SubstanceRecord, path: string): { text: string; key: string; path: string }[] {
  const names = [
    { text: s.id, path: childPath(path, "id") },
    { text: s.name, path: childPath(path, "name") },
    ...(s.formula !== undefined && s.formulaAlias !== false ? [{ text: s.formula, path: childPath(path, "formula") }] : []),
    ...(s.aliases ?? []).map((a, i) => ({ text: a, path: childPath(childPath(path, "aliases"), i) })),
  ];
  return names.map((n) => ({ ...n, key: normalizeName(n.text) }));
}

function duplicateIds(items: { id: string }[] | undefined, section: string, out: SemanticIssue[]): void {
  const first = new Map<string, number>();
  (items ?? []).forEach((item, i) => {
    const seen = first.get(item.id);
    if (seen === undefined) first.set(item.id, i);
    else out.push({ path: childPath(childPath(section, i), "id"), message: `duplicate id '${item.id}' (also ${section}[${seen}])` });
  });
}

/** Semantic checks of one library file; references may also point into `context` (the layers below). */
export function checkSemantics(doc: LibraryDoc, context: readonly LibraryDoc[] = []): SemanticIssue[] {
  const out: SemanticIssue[] = [];
  const world = worldOf([...context, doc]);
  duplicateIds(doc.systems, "systems", out);
  duplicateIds(doc.ions, "ions", out);
  duplicateIds(doc.substances, "substances", out);
  for (const [el, v] of Object.entries(doc.atomicWeights ?? {})) checkValue(v, childPath("atomicWeights", el), world, out);
  (doc.systems ?? []).forEach((s, i) => {
    checkSystem(s, childPath("systems", i), world, out);
    const bad = nameCharacterProblem(s.name);
    if (bad) out.push({ path: childPath(childPath("systems", i), "name"), message: `'${s.name}' ${bad}` });
  });
  const owners = new Map<string, { id: string; text: string }>();
  (doc.substances ?? []).forEach((s, i) => {
    const path = childPath("substances", i);
    checkSubstance(s, path, world, out);
    for (const n of lookupNames(s, path)) {
      const bad = nameCharacterProblem(n.text);
      if (bad) {
        out.push({ path: n.path, message: `'${n.text}' ${bad}` });
        continue;
      }
      if (n.key === "") {
        out.push({ path: n.path, message: `'${n.text}' has no letters or digits to look up` });
        continue;
      }
      const owner = owners.get(n.key);
      if (!owner) owners.set(n.key, { id: s.id, text: n.text });
      else if (owner.id !== s.id) out.push({ path: n.path, message: `duplicate of '${owner.text}' used by ${owner.id}` });
    }
  });
  return out;
}
