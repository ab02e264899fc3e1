/**
 * Validates a Mixture and adds it up into what the charge balance needs: the total of every distinct
 * acid–base system, the strong ions by id, the neutral particles.
 *
 * Two components that name the same system id (KH₂PO₄ and Na₂HPO₄ both carry "phosphate") add to one
 * total; if they carry different data for that id the mixture is rejected, since the engine cannot
 * know which is meant.
 */
import { DEFAULTS } from "./defaults";
import { fail, fmt } from "./failure";
import type { AcidBaseSystem, Failure, Mixture, StrongIon } from "./types";
import { complexProblem, sameComplexes } from "./complexation";

export interface Aggregate {
  ok: true;
  /** Distinct systems, in order of first appearance. */
  systems: AcidBaseSystem[];
  /** mol/L of each system in `systems`. */
  totals: number[];
  /** Distinct strong ions with their total mol/L, in order of first appearance. */
  ions: { ion: StrongIon; conc: number }[];
  /** mol/L of uncharged, non-reacting particles. */
  neutral: number;
}

function isNonNegative(x: unknown): x is number {
  return typeof x === "number" && Number.isFinite(x) && x >= 0;
}

/** What is wrong with one pKa step, or null. */
function stepProblem(s: AcidBaseSystem["steps"][number] | undefined): { code: "bad-input" | "out-of-range"; text: string } | null {
  if (typeof s?.pKa !== "number" || !Number.isFinite(s.pKa)) return { code: "bad-input", text: " has no finite pKa." };
  if (s.pKa < -20 || s.pKa > 40) return { code: "out-of-range", text: `: pKa ${fmt(s.pKa)} is outside −20…40.` };
  if (s.dH !== undefined && !Number.isFinite(s.dH)) return { code: "bad-input", text: ": ΔrH° is not a finite number." };
  if (s.dCp !== undefined && !Number.isFinite(s.dCp)) return { code: "bad-input", text: ": ΔrCp° is not a finite number." };
  return null;
}

function checkSystem(sys: AcidBaseSystem, where: string): Failure | null {
  if (!sys || typeof sys.id !== "string") return fail("bad-input", `${where}: an acid–base system has no id.`);
  if (!Number.isInteger(sys.topCharge)) {
    return fail("bad-input", `${where}: system "${sys.id}" has a non-integer top charge ${String(sys.topCharge)}.`);
  }
  if (!Array.isArray(sys.steps) || sys.steps.length === 0) {
    return fail("bad-input", `${where}: system "${sys.id}" has no pKa steps.`);
  }
  for (let j = 0; j < sys.steps.length; j++) {
    // The message is built only when a step is wrong: this check runs for every mixture a sheet prepares.
    const problem = stepProblem(sys.steps[j]);
    if (problem !== null) return fail(problem.code, `${where}: system "${sys.id}" step ${j + 1}${problem.text}`);
  }
  if (sys.speciesNames !== undefined && sys.speciesNames.length !== sys.steps.length + 1) {
    return fail("bad-input", `${where}: system "${sys.id}" needs ${sys.steps.length + 1} species names, has ${sys.speciesNames.length}.`);
  }
  if (sys.complexes !== undefined) {
    const problem = complexProblem(sys);
    if (problem !== null) return fail("bad-input", `${where}: system "${sys.id}": ${problem}`);
  }
  return null;
}

function sameSystem(a: AcidBaseSystem, b: AcidBaseSystem): boolean {
  if (a === b) return true;
  if (a.topCharge !== b.topCharge || a.steps.length !== b.steps.length) return false;
  return a.steps.every((s, j) => s.pKa === b.steps[j].pKa && s.dH === b.steps[j].dH && s.dCp === b.steps[j].dCp) && sameComplexes(a.complexes, b.complexes);
}

/** Validates and aggregates a mixture. */
export function aggregate(mix: Mixture): Aggregate | Failure {
  if (!Array.isArray(mix)) return fail("bad-input", "The mixture must be a list of components with concentrations.");
  const systems: AcidBaseSystem[] = [];
  const totals: number[] = [];
  const ions: { ion: StrongIon; conc: number }[] = [];
  let neutral = 0;
  for (let e = 0; e < mix.length; e++) {
    const entry = mix[e];
    const comp = entry?.component;
    const name = comp?.name ?? `entry ${e + 1}`;
    if (!comp || !Array.isArray(comp.systems) || !Array.isArray(comp.ions)) {
      return fail("bad-input", `Entry ${e + 1} has no valid component.`);
    }
    const c = entry.conc;
    if (typeof c !== "number" || Number.isNaN(c)) return fail("bad-input", `Concentration of ${name} is not a number.`);
    if (c < 0) return fail("bad-input", `Concentration of ${name} is negative (${fmt(c)} mol/L).`);
    if (!Number.isFinite(c) || c > DEFAULTS.maxConcentration) {
      return fail("out-of-range", `Concentration of ${name} (${fmt(c)} mol/L) is above ${DEFAULTS.maxConcentration} mol/L.`);
    }
    for (let k = 0; k < comp.systems.length; k++) {
      const { system, stoich } = comp.systems[k];
      if (!isNonNegative(stoich)) return fail("bad-input", `${name}: stoichiometry of a system must be a number ≥ 0.`);
      const bad = checkSystem(system, name);
      if (bad) return bad;
      let i = systems.length - 1;
      while (i >= 0 && systems[i].id !== system.id) i--;
      if (i < 0) {
        systems.push(system);
        totals.push(c * stoich);
      } else if (!sameSystem(systems[i], system)) {
        return fail("bad-input", `${name}: system "${system.id}" appears with two different sets of constants.`);
      } else {
        totals[i] += c * stoich;
      }
    }
    for (let k = 0; k < comp.ions.length; k++) {
      const { ion, stoich } = comp.ions[k];
      if (!isNonNegative(stoich)) return fail("bad-input", `${name}: stoichiometry of an ion must be a number ≥ 0.`);
      if (!ion || typeof ion.id !== "string" || !Number.isInteger(ion.charge)) {
        return fail("bad-input", `${name}: a strong ion needs an id and an integer charge.`);
      }
      let i = ions.length - 1;
      while (i >= 0 && ions[i].ion.id !== ion.id) i--;
      if (i < 0) ions.push({ ion, conc: c * stoich });
      else if (ions[i].ion.charge !== ion.charge) {
        return fail("bad-input", `${name}: ion "${ion.id}" appears with two different charges.`);
      } else ions[i].conc += c * stoich;
    }
    const n = comp.neutral ?? 0;
    if (!isNonNegative(n)) return fail("bad-input", `${name}: neutral particles per mole must be a number ≥ 0.`);
    neutral += c * n;
  }
  for (let i = 0; i < systems.length; i++) {
    if (totals[i] > DEFAULTS.maxConcentration) {
      return fail("out-of-range", `Total ${systems[i].name} (${fmt(totals[i])} mol/L) is above ${DEFAULTS.maxConcentration} mol/L.`);
    }
  }
  for (const x of ions) {
    if (x.conc > DEFAULTS.maxConcentration) {
      return fail("out-of-range", `Total ${x.ion.name} (${fmt(x.conc)} mol/L) is above ${DEFAULTS.maxConcentration} mol/L.`);
    }
  }
  return { ok: true, systems, totals, ions, neutral };
}
