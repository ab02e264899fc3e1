/**
 * The buffer part of a recipe, at a fixed background (salt) mixture: the concentrations of the two
 * components that give the target pH at the total system concentration C.
 *
 * - pair: acid form A and base form B of the same system, stoichiometries s_A, s_B (moles of the
 *   system per mole of component). With the base share φ ∈ [0, 1]: [A] = (1 − φ)·C/s_A,
 *   [B] = φ·C/s_B, so the system total is C for every φ. φ is found by a first crossing over a grid
 *   (geometric towards both ends, where very lopsided ratios live) refined by Brent's method.
 *   A target outside [pH(φ = 0), pH(φ = 1)] is "unreachable": the pair spans only that range.
 * - titrant: one form at C/s plus a strong titrant, the amount from adjust (per litre: the batch is
 *   made up to its final volume, so there is no dilution to account for).
 */
import { fail, fmt } from "../failure";
import type { ChemOptions, Component, Mixture, Result } from "../types";
import { adjust, ADJUST_PH_TOLERANCE } from "./adjust";
import { firstCrossing, geometricGrid } from "./crossing";
import { IONIC_LIMIT_TEXT } from "../ionic-limit";
import { pHOffset } from "./mixing";
import { fmtPH } from "./validate";

export type BufferPlan =
  | { mode: "pair"; acid: Component; base: Component; sA: number; sB: number }
  | { mode: "titrant"; form: Component; s: number; titrant: Component; formIsAcidSlot: boolean };

export type BufferSolution = Result<{ entries: Mixture }>;

function onlySystem(c: Component): { id: string; stoich: number; count: number } {
  const present = c.systems.filter((x) => x.stoich > 0);
  return { id: present[0]?.system.id ?? "", stoich: present[0]?.stoich ?? 0, count: present.length };
}

/** Decides pair or titrant mode from the two components, or says why neither fits. */
export function planBuffer(acidForm: Component, baseForm: Component): BufferPlan | ReturnType<typeof fail> {
  const a = onlySystem(acidForm);
  const b = onlySystem(baseForm);
  for (const [c, s] of [[acidForm, a], [baseForm, b]] as const) {
    if (s.count > 1) return fail("bad-input", `"${c.name}" carries more than one acid–base system: a recipe needs one form of one system (or a strong titrant).`);
  }
  if (a.count === 1 && b.count === 1) {
    if (a.id !== b.id) {
      return fail("bad-input", `"${acidForm.name}" and "${baseForm.name}" are forms of different systems (${a.id}, ${b.id}): give two forms of the same system, or one form and a strong titrant.`);
    }
    return { mode: "pair", acid: acidForm, base: baseForm, sA: a.stoich, sB: b.stoich };
  }
  if (a.count === 0 && b.count === 0) {
    return fail("bad-input", `Neither "${acidForm.name}" nor "${baseForm.name}" carries an acid–base system: one of them must be a form of the buffer system.`);
  }
  const formIsAcidSlot = a.count === 1;
  const form = formIsAcidSlot ? acidForm : baseForm;
  const titrant = formIsAcidSlot ? baseForm : acidForm;
  if (!titrant.ions.some((i) => i.stoich > 0 && i.ion.charge !== 0)) {
    return fail("bad-input", `"${titrant.name}" releases no ions: as the second component it must be a strong titrant (such as NaOH or HCl) or another form of the system.`);
  }
  return { mode: "titrant", form, s: formIsAcidSlot ? a.stoich : b.stoich, titrant, formIsAcidSlot };
}

/** Grid over φ ∈ [0, 1], fine near both ends. */
function shareGrid(): number[] {
  const low = geometricGrid(1e-10, 0.5, 2);
  const high = low.slice(1, -1).reverse().map((x) => 1 - x);
  return [...low, ...high, 1];
}

const SHARE_GRID = shareGrid();

function pairEntries(plan: Extract<BufferPlan, { mode: "pair" }>, C: number, phi: number): Mixture {
  return [
    { component: plan.acid, conc: ((1 - phi) * C) / plan.sA },
    { component: plan.base, conc: (phi * C) / plan.sB },
  ];
}

/** The buffer entries for the target pH at total C on top of `background`. */
export function solveBuffer(plan: BufferPlan, C: number, target: number, background: Mixture, chem: ChemOptions): BufferSolution {
  if (plan.mode === "titrant") {
    const formEntry = { component: plan.form, conc: C / plan.s };
    const r = adjust([formEntry, ...background], plan.titrant, target, chem);
    if (!r.ok) return r;
    const entries: Mixture = [formEntry, { component: plan.titrant, conc: r.value }];
    return { ok: true, entries: plan.formIsAcidSlot ? entries : entries.reverse() };
  }
  const g = (phi: number) => pHOffset([...pairEntries(plan, C, phi), ...background], target, chem);
  const r = firstCrossing(g, SHARE_GRID, ADJUST_PH_TOLERANCE);
  if (!r.ok) return r;
  if (!r.found) {
    const first = r.samples[0].value + target;
    const last = r.samples[r.samples.length - 1].value + target;
    const atLimit = r.failure?.code === "beyond-limit";
    const stopped = !r.failure
      ? ""
      : atLimit
        ? ` (beyond a base share of ${fmt(r.samples[r.samples.length - 1].t)} the ionic strength exceeds the ${IONIC_LIMIT_TEXT} limit, where no pH is given)`
        : ` (the engine has no result beyond a share of ${fmt(r.samples[r.samples.length - 1].t)}: ${r.failure.message})`;
    return fail(
      atLimit ? "beyond-limit" : "unreachable",
      `${plan.acid.name} and ${plan.base.name} at ${fmt(C)} mol/L in total span pH ${fmtPH(first, target)} (all ${plan.acid.name}) to ${fmtPH(last, target)} (all ${plan.base.name}): the target ${fmtPH(target, first)} is outside that range${stopped}.`,
    );
  }
  return { ok: true, entries: pairEntries(plan, C, r.t) };
}
