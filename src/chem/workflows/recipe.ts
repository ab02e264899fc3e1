/**
 * recipe: what to weigh (or measure) for a buffer batch at a target pH, total system concentration
 * C, batch volume V, temperature and activity model, optionally made up to a target ionic strength
 * with a named salt.
 *
 * Buffer part (recipe-buffer.ts): a conjugate pair (x + y = C solved for the pH) or one form plus a
 * strong titrant (the form at C, the titrant amount from adjust).
 *
 * Ionic strength: with a target I*, the salt amount s solves I(s) = I*, where I(s) is the solved
 * ionic strength of the batch with s mol/L of salt after the buffer part has been re-solved for the
 * target pH at that s (nested solve). I(0) > I* is "unreachable" (the buffer alone is already above
 * it). The bracket [0, s_hi] starts from s_hi = 1.5·(I* − I(0))/(½ Σ ν z² of the salt) and doubles
 * until I(s_hi) ≥ I* (capped at the most the engine accepts: "unreachable" beyond); Brent's method
 * then refines s to |I − I*| ≤ 1e-12·I*.
 *
 * Background: other components of the batch (salts, arginine, sucrose, polysorbate, a second buffer)
 * at fixed concentrations, present in every solve, so they count in the ionic strength and the pH.
 * A background component that carries the buffer's own system is refused (it belongs in C).
 *
 * Output per component: mol for the batch (mol/L × V); grams = molar mass × mol when the molar mass
 * is known and no stock is named; litres of stock = mol / stock concentration when a stock
 * concentration is given for the component (liquids such as hydrochloric acid), and with them the
 * grams of the reagent as supplied when the stock is a concentrated reagent given by mass fraction.
 * Stocks that would fill the batch are refused with the largest total concentration they allow
 * (recipe-stock-room.ts).
 */
import { fail, fmt } from "../failure";
import { ionicLimitFailure } from "../ionic-limit";
import { prepare } from "../prepared";
import type { ChemOptions, Component, Mixture, Result } from "../types";
import { resolveOptions } from "../validate-options";
import { brentRoot } from "./brent";
import { maxAddable } from "./mixing";
import { planBuffer, solveBuffer, type BufferPlan } from "./recipe-buffer";
import { checkStockRoom } from "./recipe-stock-room";
import { checkComponent, checkPositive, checkTargetPH } from "./validate";

export interface RecipeRequest {
  /** The acidic form, or a strong titrant when baseForm is the system's form. */
  acidForm: Component;
  /** The basic form, or a strong titrant (NaOH, HCl). */
  baseForm: Component;
  targetPH: number;
  /** Total concentration of the acid–base system in the batch, mol/L. */
  totalConc: number;
  /** Batch volume, L. */
  volume: number;
  /** Target ionic strength, mol/L, made up with `salt`. */
  ionicStrength?: number;
  /** The salt for the ionic strength (the caller resolves the default, NaCl). */
  salt?: Component;
  /** Other components of the batch at fixed concentrations (mol/L), held while the recipe is solved. */
  background?: Mixture;
  /** Stock concentrations, mol/L, by component id: those components are given in litres of stock. */
  stocks?: Record<string, number>;
  /**
   * g of stock per mol of the component, by component id, for a stock that is a concentrated reagent
   * sold by mass fraction (chem/reagents.ts: M / w): those lines also give grams of the reagent as
   * supplied.
   */
  stockGramsPerMol?: Record<string, number>;
}

export interface RecipeLine {
  role: "acid form" | "base form" | "titrant" | "salt" | "background";
  name: string;
  component: Component;
  /** mol/L in the batch. */
  conc: number;
  /** mol for the batch. */
  mol: number;
  /** g for the batch (molar mass known, no stock given); g of the reagent as supplied for a stock given by mass fraction. */
  grams?: number;
  /** L of stock for the batch (stock concentration given). */
  litres?: number;
}

export interface RecipeValue {
  mode: "pair" | "titrant";
  lines: RecipeLine[];
  /** The batch as the engine sees it (mol/L), for feeding back. */
  mixture: Mixture;
  pH: number;
  ionicStrength: number;
  warnings: string[];
}

export type RecipeResult = Result<RecipeValue>;

/** Relative tolerance on the ionic strength target. */
export const RECIPE_I_TOLERANCE = 1e-12;

function checkRequest(req: RecipeRequest): ReturnType<typeof fail> | null {
  const bad =
    checkComponent(req?.acidForm, "acid form") ??
    checkComponent(req?.baseForm, "base form") ??
    checkTargetPH(req.targetPH) ??
    checkPositive(req.totalConc, "total concentration", "mol/L") ??
    checkPositive(req.volume, "batch volume", "L");
  if (bad) return bad;
  if (req.ionicStrength !== undefined) {
    const I = req.ionicStrength;
    if (typeof I !== "number" || !Number.isFinite(I) || I < 0) return fail("bad-input", `The target ionic strength must be a number ≥ 0 mol/L, got ${String(I)}.`);
    const beyond = ionicLimitFailure(I);
    if (beyond) return beyond;
    const badSalt = checkComponent(req.salt, "salt");
    if (badSalt) return fail("bad-input", "A target ionic strength needs a salt to make it up with (for example NaCl).");
    const salt = req.salt as Component;
    if (salt.systems.some((s) => s.stoich > 0)) {
      return fail("bad-input", `The salt "${salt.name}" carries an acid–base system: use a neutral salt such as NaCl or KCl.`);
    }
    if (!salt.ions.some((i) => i.stoich > 0 && i.ion.charge !== 0)) return fail("bad-input", `The salt "${salt.name}" releases no ions: it cannot raise the ionic strength.`);
  }
  for (const e of req.background ?? []) {
    const badE = checkComponent(e?.component, "background component");
    if (badE) return badE;
    if (typeof e.conc !== "number" || !Number.isFinite(e.conc) || e.conc < 0) return fail("bad-input", `The amount of "${e.component.name}" must be a number ≥ 0 mol/L, got ${String(e.conc)}.`);
  }
  for (const [id, c] of Object.entries(req.stocks ?? {})) {
    if (typeof c !== "number" || !Number.isFinite(c) || c <= 0) return fail("bad-input", `The stock concentration of "${id}" must be a number > 0 mol/L, got ${String(c)}.`);
  }
  return null;
}

type Batch = Result<{ entries: Mixture; roles: RecipeLine["role"][]; pH: number; ionicStrength: number; warnings: string[] }>;

/** The buffer's system id: a background component carrying it is refused. */
function bufferSystem(plan: BufferPlan): string {
  const c = plan.mode === "pair" ? plan.acid : plan.form;
  return c.systems.find((s) => s.stoich > 0)?.system.id ?? "";
}

function checkBackground(plan: BufferPlan, background: Mixture): ReturnType<typeof fail> | null {
  const id = bufferSystem(plan);
  for (const e of background) {
    if (e.conc > 0 && e.component.systems.some((s) => s.stoich > 0 && s.system.id === id)) {
      return fail("bad-input", `"${e.component.name}" among the other components carries the buffer's own system (${id}): count it in the total concentration instead.`);
    }
  }
  return null;
}

function batchAt(plan: BufferPlan, req: RecipeRequest, salt: number, chem: ChemOptions): Batch {
  const saltEntry: Mixture = req.salt !== undefined && req.ionicStrength !== undefined ? [{ component: req.salt, conc: salt }] : [];
  const others = req.background ?? [];
  const background = [...saltEntry, ...others];
  const buf = solveBuffer(plan, req.totalConc, req.targetPH, background, chem);
  if (!buf.ok) return buf;
  const entries = [...buf.entries, ...background];
  const roles: RecipeLine["role"][] = [...buf.entries.map((e, i) => roleOf(plan, e.component, i)), ...saltEntry.map(() => "salt" as const), ...others.map(() => "background" as const)];
  const p = prepare(entries);
  if (!p.ok) return p;
  const eq = p.solve(chem);
  if (!eq.ok) return eq;
  return { ok: true, entries, roles, pH: eq.pH, ionicStrength: eq.ionicStrength, warnings: eq.warnings };
}

function saltForIonicStrength(plan: BufferPlan, req: RecipeRequest, chem: ChemOptions): Batch {
  const target = req.ionicStrength as number;
  const salt = req.salt as Component;
  const b0 = batchAt(plan, req, 0, chem);
  if (!b0.ok) return b0;
  const gap = target - b0.ionicStrength;
  if (Math.abs(gap) <= RECIPE_I_TOLERANCE * target) return b0;
  if (gap < 0) {
    return fail("unreachable", `The buffer${req.background?.length ? " with the other components" : " alone"} already has an ionic strength of ${fmt(b0.ionicStrength)} mol/L, above the target ${fmt(target)} mol/L: no amount of ${salt.name} can lower it.`);
  }
  const perMole = 0.5 * salt.ions.reduce((sum, i) => sum + i.stoich * i.ion.charge * i.ion.charge, 0);
  const most = maxAddable(b0.entries, salt);
  const h = (s: number) => {
    const b = batchAt(plan, req, s, chem);
    return b.ok ? { ok: true as const, value: b.ionicStrength - target } : b;
  };
  // Bracket [lo, hi] with I(lo) < I* ≤ I(hi): hi doubles from an estimate; a trial beyond the
  // ionic-strength limit (I* itself is within it) halves back towards lo.
  let lo = 0;
  let hLo = -gap;
  let hi = Math.min(most, (1.5 * gap) / perMole);
  let hHi: number | null = null;
  for (let k = 0; k < 400 && hHi === null; k++) {
    const r = h(hi);
    if (!r.ok) {
      if (r.code !== "beyond-limit") return r;
      hi = lo + 0.5 * (hi - lo);
      continue;
    }
    if (r.value >= 0) {
      hHi = r.value;
      break;
    }
    if (hi >= most) {
      return fail("unreachable", `Even ${fmt(most)} mol/L of ${salt.name}, the most the engine accepts, leaves the ionic strength below ${fmt(target)} mol/L.`);
    }
    lo = hi;
    hLo = r.value;
    hi = Math.min(most, 2 * hi);
  }
  if (hHi === null) return fail("no-convergence", `No amount of ${salt.name} could be bracketed for the ionic strength ${fmt(target)} mol/L.`);
  const root = brentRoot(h, lo, hi, hLo, hHi, { ftol: RECIPE_I_TOLERANCE * target });
  if (!root.ok) return root;
  return batchAt(plan, req, root.x, chem);
}

function roleOf(plan: BufferPlan, c: Component, index: number): RecipeLine["role"] {
  if (plan.mode === "pair") return index === 0 ? "acid form" : "base form";
  return c === plan.titrant ? "titrant" : index === 0 ? "acid form" : "base form";
}

/** Recipe for a buffer batch: amounts of each component, with grams or litres of stock (which must leave room in the batch). */
export function recipe(req: RecipeRequest, opts: ChemOptions = {}): RecipeResult {
  const r = recipeAsListed(req, opts);
  if (!r.ok) return r;
  return checkStockRoom(req, r, (totalConc) => recipeAsListed({ ...req, totalConc }, opts));
}

function recipeAsListed(req: RecipeRequest, opts: ChemOptions): RecipeResult {
  const o = resolveOptions(opts);
  if (!o.ok) return o;
  const bad = checkRequest(req);
  if (bad) return bad;
  const plan = planBuffer(req.acidForm, req.baseForm);
  if ("ok" in plan) return plan;
  const chem: ChemOptions = { temperatureC: o.temperatureC, activity: o.activity };
  const badBackground = checkBackground(plan, req.background ?? []);
  if (badBackground) return badBackground;
  const batch = req.ionicStrength === undefined ? batchAt(plan, req, 0, chem) : saltForIonicStrength(plan, req, chem);
  if (!batch.ok) return batch;
  const lines: RecipeLine[] = batch.entries.map((e, i) => {
    const mol = e.conc * req.volume;
    const stock = req.stocks?.[e.component.id];
    const line: RecipeLine = { role: batch.roles[i], name: e.component.name, component: e.component, conc: e.conc, mol };
    const gramsPerMol = req.stockGramsPerMol?.[e.component.id];
    if (stock !== undefined) {
      line.litres = mol / stock;
      if (gramsPerMol !== undefined) line.grams = mol * gramsPerMol;
    } else if (e.component.molarMass !== undefined) line.grams = mol * e.component.molarMass;
    return line;
  });
  return { ok: true, mode: plan.mode, lines, mixture: batch.entries, pH: batch.pH, ionicStrength: batch.ionicStrength, warnings: batch.warnings };
}
