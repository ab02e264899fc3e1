/**
 * Saturation indices of sparingly soluble solids (a system's `solids`), from the solved speciation:
 * SI = m·log a(M) + l·log a(L) + p·log a(H⁺) − log Ksp, with a = concentration × γ (γ of charge z from
 * γH: log γ(z) = z²·log γH, as the activity models here give). SI > 0: supersaturated, a solid may
 * form; the engine never precipitates it, so the equilibrium reported is that of the clear solution.
 * Ksp is used at its 25 °C value at every temperature (no ΔrH° is carried for solids).
 */
import type { Aggregate } from "./aggregate";
import { DEFAULTS } from "./defaults";
import { speciesName } from "./species-names";
import type { Saturation, Species } from "./types";

export function saturationIndices(agg: Aggregate, species: readonly Species[], pH: number, gammaH: number): Saturation[] {
  const out: Saturation[] = [];
  const lgH = Math.log10(gammaH);
  for (let s = 0; s < agg.systems.length; s++) {
    const sys = agg.systems[s];
    if (sys.solids === undefined || !(agg.totals[s] > 0)) continue;
    const last = sys.steps.length;
    const Lname = speciesName(sys, last);
    const L = species.find((sp) => sp.systemId === sys.id && sp.name === Lname);
    if (!L || !(L.conc > 0)) continue;
    const laL = Math.log10(L.conc) + L.charge * L.charge * lgH;
    for (const solid of sys.solids) {
      const ion = agg.ions.find((x) => x.ion.id === solid.metal);
      if (!ion || !(ion.conc > 0)) continue;
      const M = species.find((sp) => sp.systemId === null && sp.name === ion.ion.name);
      if (!M || !(M.conc > 0)) continue;
      const laM = Math.log10(M.conc) + M.charge * M.charge * lgH;
      const si = solid.metals * laM + solid.ligands * laL - solid.protons * pH - solid.logKsp;
      if (Number.isFinite(si)) out.push({ name: solid.name, systemId: sys.id, saturationIndex: si });
    }
  }
  return out;
}

/** One warning per supersaturated solid (SI > 0), for the equilibrium's warnings (AQ.CHECK prints them). */
export function saturationWarnings(saturation: readonly Saturation[], temperatureC: number): string[] {
  const at = temperatureC === DEFAULTS.temperatureC ? "" : `; its Ksp is the ${DEFAULTS.temperatureC} °C value, used at ${temperatureC} °C`;
  return saturation
    .filter((x) => x.saturationIndex > 0)
    .map((x) => `Supersaturated in ${x.name} (saturation index +${x.saturationIndex.toFixed(2)}, from its solubility product${at}): a solid may form; the result is for the clear solution, no precipitation is modelled.`);
}
