/**
 * Stoichiometric equivalence volumes of a titration, from the amounts alone.
 *
 * With S = Σ z·c(strong ions) + Σ C·z0 (strong-ion charge plus every system in its fully protonated
 * form) the charge balance reads Σ C·D = S + [H⁺] − [OH⁻], D the mean number of protons a system
 * has lost (regime.ts). Order every dissociation step of every system by its pKa (25 °C, I = 0) and
 * let b_k be the sum of the totals C of the first k steps (b_0 = 0). Stoichiometric equivalence k is
 * where the titrant has brought S to b_k: every proton of the first k steps removed (a base titrant)
 * or every proton from step k + 1 on put back (an acid titrant), water's own H⁺ and OH⁻ aside.
 * A strong titrant with strong-ion charge q per mole, at c mol/L, added to V litres: S·(V + v) =
 * S0·V + q·c·v and b_k scales the same way, so v_k = (b_k − S0)·V/(q·c).
 *
 * This is the volume a titration is designed around; the steepest point of the computed curve (the
 * inflection, equivalence.ts) lies near it, not on it: for a dilute weak system the two differ by a
 * few per cent, because the curve's slope is shaped by the water's H⁺ and OH⁻ as well.
 * A titrant that carries an acid–base system itself (a weak titrant) has no single q: none is given.
 */
import type { Component, Mixture } from "../types";

/** Strong-ion charge per mole of a titrant without acid–base systems; null for a weak titrant or none. */
export function strongCharge(titrant: Component): number | null {
  if (titrant.systems.some((s) => s.stoich > 0)) return null;
  let q = 0;
  for (const { ion, stoich } of titrant.ions) q += ion.charge * stoich;
  return q === 0 ? null : q;
}

/**
 * Stoichiometric equivalence volumes (L) within (0, maxVolume], ascending; [] for a weak titrant.
 */
export function stoichiometricVolumes(mix: Mixture, titrant: Component, stockConc: number, volume: number, maxVolume: number): number[] {
  const q = strongCharge(titrant);
  if (q === null) return [];
  let S0 = 0;
  // One entry per dissociation step of each system, summed over the forms that carry it: two forms
  // of one system (a base and its salt) share its steps, they do not each add a step of their own.
  const steps = new Map<string, { pKa: number; conc: number }>();
  for (const { component, conc } of mix) {
    for (const { ion, stoich } of component.ions) S0 += ion.charge * stoich * conc;
    for (const { system, stoich } of component.systems) {
      S0 += system.topCharge * stoich * conc;
      system.steps.forEach((step, i) => {
        const key = `${system.id}\u0000${i}`;
        const entry = steps.get(key);
        if (entry) entry.conc += stoich * conc;
        else steps.set(key, { pKa: step.pKa, conc: stoich * conc });
      });
    }
  }
  const ordered = [...steps.values()].sort((a, b) => a.pKa - b.pKa);
  const found: number[] = [];
  let b = 0;
  for (let k = 0; k <= ordered.length; k++) {
    if (k > 0) b += ordered[k - 1].conc;
    const v = ((b - S0) / (q * stockConc)) * volume;
    if (v > 0 && v <= maxVolume * (1 + 1e-12)) found.push(v);
  }
  // An acid titrant reaches the steps from the top down: sort by volume, then drop repeats.
  found.sort((x, y) => x - y);
  const out: number[] = [];
  for (const v of found) {
    const last = out[out.length - 1];
    if (last === undefined || v > last * (1 + 1e-12)) out.push(v);
  }
  return out;
}
