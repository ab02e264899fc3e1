/**
 * Which complexes take part in a mixture's equilibrium, and their validation.
 *
 * A complex of system S (its ligand L, the fully deprotonated form of S) takes part when S is in
 * the mixture with a total above 0 and, if the complex has a metal, that metal is one of the
 * mixture's strong ions with a total above 0. A mixture with no complex taking part is solved by
 * the plain charge balance (solver-core.ts) exactly as before; one with complexes by
 * ComplexingSolver (complex-solver.ts).
 */
import type { Aggregate } from "./aggregate";
import type { AcidBaseSystem, ComplexSpecies } from "./types";

/** One complex taking part, with indices into the setup's ligand and metal lists. */
export interface ActiveComplex {
  spec: ComplexSpecies;
  /** Index into ComplexSetup.ligands. */
  ligand: number;
  /** Index into ComplexSetup.metals, or −1 for a species of the ligand alone. */
  metal: number;
}

export interface ComplexSetup {
  /** Indices into aggregate.systems of the systems that form complexes here. */
  ligands: number[];
  /** Indices into aggregate.ions of the metal ions that form complexes here. */
  metals: number[];
  complexes: ActiveComplex[];
}

/** What a system's complexes need: the metal ids they name, and whether any has no metal. */
interface Needs {
  metals: string[];
  ligandOnly: boolean;
}

/** Needs of frozen complex lists (the library's), computed once: preparing a mixture stays cheap. */
const needsCache = new WeakMap<readonly ComplexSpecies[], Needs>();

function needsOf(list: readonly ComplexSpecies[]): Needs {
  let n = needsCache.get(list);
  if (n !== undefined) return n;
  n = { metals: [], ligandOnly: false };
  for (const c of list) {
    if (c.metal === undefined) n.ligandOnly = true;
    else if (!n.metals.includes(c.metal)) n.metals.push(c.metal);
  }
  if (Object.isFrozen(list)) needsCache.set(list, n);
  return n;
}

/** Index of the strong ion with this id and a total above 0, or −1. */
function ionIndex(agg: Aggregate, id: string): number {
  for (let i = 0; i < agg.ions.length; i++) if (agg.ions[i].ion.id === id) return agg.ions[i].conc > 0 ? i : -1;
  return -1;
}

/** True when some complex of the list can form with the mixture's ions. */
function canForm(agg: Aggregate, list: readonly ComplexSpecies[]): boolean {
  const needs = needsOf(list);
  if (needs.ligandOnly) return true;
  for (let k = 0; k < needs.metals.length; k++) if (ionIndex(agg, needs.metals[k]) >= 0) return true;
  return false;
}

/** The complexes that take part in an aggregated mixture, or null when there are none. */
export function complexSetup(agg: Aggregate): ComplexSetup | null {
  let any = false;
  for (let s = 0; s < agg.systems.length; s++) {
    const list = agg.systems[s].complexes;
    if (list !== undefined && list.length > 0 && agg.totals[s] > 0 && canForm(agg, list)) any = true;
  }
  if (!any) return null;
  const ligands: number[] = [];
  const metals: number[] = [];
  const complexes: ActiveComplex[] = [];
  for (let s = 0; s < agg.systems.length; s++) {
    const list = agg.systems[s].complexes;
    if (list === undefined || !(agg.totals[s] > 0)) continue;
    let lig = -1;
    for (const spec of list) {
      let metal = -1;
      if (spec.metal !== undefined) {
        const i = ionIndex(agg, spec.metal);
        if (i < 0) continue;
        metal = metals.indexOf(i);
        if (metal < 0) metal = metals.push(i) - 1;
      }
      if (lig < 0) lig = ligands.push(s) - 1;
      complexes.push({ spec, ligand: lig, metal });
    }
  }
  return complexes.length > 0 ? { ligands, metals, complexes } : null;
}

/** Complex lists already found valid (frozen ones only: a mutable list is checked every time). */
const validLists = new WeakSet<readonly ComplexSpecies[]>();

/** What is wrong with a system's complexes (a sentence), or null. */
export function complexProblem(sys: AcidBaseSystem): string | null {
  const list = sys.complexes;
  if (list === undefined || validLists.has(list)) return null;
  if (!Array.isArray(list)) return "its complexes are not a list.";
  for (const c of list) {
    const name = typeof c?.name === "string" ? c.name : "a complex";
    if (typeof c?.name !== "string" || c.name === "") return "a complex has no name.";
    if (c.metal !== undefined && (typeof c.metal !== "string" || c.metal === "")) return `complex ${name} has an invalid metal id.`;
    if (!Number.isInteger(c.ligands) || c.ligands < 1 || c.ligands > 12) return `complex ${name} needs a whole number of ligands from 1 to 12.`;
    if (!Number.isInteger(c.protons) || Math.abs(c.protons) > 24) return `complex ${name} needs a whole number of protons from −24 to 24.`;
    if (c.metal === undefined && c.ligands === 1) return `complex ${name} of the ligand alone needs at least 2 ligands (a protonated form is a pKa step).`;
    if (typeof c.logBeta !== "number" || !Number.isFinite(c.logBeta) || Math.abs(c.logBeta) > 200) return `complex ${name} needs a finite log β within ±200.`;
    if (c.dH !== undefined && !Number.isFinite(c.dH)) return `complex ${name}: ΔrH° is not a finite number.`;
  }
  if (Object.isFrozen(list) && list.every((c) => Object.isFrozen(c))) validLists.add(list);
  return null;
}

/** Same complexes, value for value (two components naming one system must agree on them too). */
export function sameComplexes(a: readonly ComplexSpecies[] | undefined, b: readonly ComplexSpecies[] | undefined): boolean {
  if (a === b) return true;
  const x = a ?? [];
  const y = b ?? [];
  if (x.length !== y.length) return false;
  return x.every((c, i) => {
    const d = y[i];
    return c.name === d.name && c.metal === d.metal && c.ligands === d.ligands && c.protons === d.protons && c.logBeta === d.logBeta && c.dH === d.dH;
  });
}
