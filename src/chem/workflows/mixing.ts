/**
 * Building the mixtures the workflows solve: a titrant added without change of volume, a mixture
 * diluted, a stock mixed in, and the pH of the result.
 */
import { DEFAULTS } from "../defaults";
import { prepare } from "../prepared";
import type { ChemOptions, Component, Mixture, PHResult } from "../types";
import type { Evaluation } from "./brent";

/** Key of a component for merging: the same object, or the same id with the same content. */
function sameComponent(a: Component, b: Component): boolean {
  return a === b || (a.id === b.id && JSON.stringify(a) === JSON.stringify(b));
}

/**
 * Groups the entries of a mixture by component (first appearance order): the engine adds entries
 * of the same component up anyway, so solving the groups gives the same equilibrium, with one entry
 * per substance however long the list typed in a sheet. `groupOf[i]` is the group of entry i.
 */
export function groupEntries(mix: Mixture): { components: Component[]; groupOf: number[] } {
  const components: Component[] = [];
  const byId = new Map<string, number[]>();
  const groupOf = mix.map((e) => {
    const candidates = byId.get(e.component.id) ?? [];
    const found = candidates.find((g) => sameComponent(components[g], e.component));
    if (found !== undefined) return found;
    components.push(e.component);
    candidates.push(components.length - 1);
    byId.set(e.component.id, candidates);
    return components.length - 1;
  });
  return { components, groupOf };
}

/** One entry per component, concentrations added (call after validating the original mixture). */
export function compact(mix: Mixture): Mixture {
  const { components, groupOf } = groupEntries(mix);
  if (components.length === mix.length) return mix;
  const conc = components.map(() => 0);
  mix.forEach((e, i) => (conc[groupOf[i]] += e.conc));
  return components.map((component, g) => ({ component, conc: conc[g] }));
}

/** The mixture with `conc` mol/L of `titrant` added, volume unchanged. */
export function withAdded(mix: Mixture, titrant: Component, conc: number): Mixture {
  return conc === 0 ? mix : [...mix, { component: titrant, conc }];
}

/** Every concentration multiplied by `factor` (a dilution for factor < 1). */
export function scaled(mix: Mixture, factor: number): Mixture {
  return mix.map((e) => ({ component: e.component, conc: e.conc * factor }));
}

/**
 * A batch of volume V mixed with v litres of a stock at c_s mol/L, written with the stock's volume
 * fraction f = v/(V + v) ∈ [0, 1]: the batch at (1 − f) of its concentrations plus c_s·f of titrant.
 */
export function mixedWithStock(mix: Mixture, titrant: Component, stockConc: number, f: number): Mixture {
  return withAdded(scaled(mix, 1 - f), titrant, stockConc * f);
}

/** pH of a mixture (fast path). */
export function pHOf(mix: Mixture, opts: ChemOptions): PHResult {
  const p = prepare(mix);
  if (!p.ok) return p;
  return p.solvePH(opts);
}

/** pH − target as an Evaluation for the root finders. */
export function pHOffset(mix: Mixture, target: number, opts: ChemOptions): Evaluation {
  const r = pHOf(mix, opts);
  return r.ok ? { ok: true, value: r.pH - target } : r;
}

/**
 * Largest amount of `titrant` (mol/L) the engine accepts on top of `mix`: no entry, system total or
 * ion total above DEFAULTS.maxConcentration. 0 when the mixture is already at that limit.
 */
export function maxAddable(mix: Mixture, titrant: Component): number {
  const limit: number = DEFAULTS.maxConcentration;
  let n: number = limit;
  const sysTotal = new Map<string, number>();
  const ionTotal = new Map<string, number>();
  for (const e of mix) {
    for (const { system, stoich } of e.component.systems) sysTotal.set(system.id, (sysTotal.get(system.id) ?? 0) + e.conc * stoich);
    for (const { ion, stoich } of e.component.ions) ionTotal.set(ion.id, (ionTotal.get(ion.id) ?? 0) + e.conc * stoich);
  }
  for (const { system, stoich } of titrant.systems) {
    if (stoich > 0) n = Math.min(n, (limit - (sysTotal.get(system.id) ?? 0)) / stoich);
  }
  for (const { ion, stoich } of titrant.ions) {
    if (stoich > 0) n = Math.min(n, (limit - (ionTotal.get(ion.id) ?? 0)) / stoich);
  }
  // A hair below the limit so rounding in the engine's own sums never trips it.
  return Math.max(0, n * (1 - 1e-9));
}
