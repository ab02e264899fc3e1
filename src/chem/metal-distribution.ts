/**
 * A metal ion's distribution against pH: the share of each complexing metal's total that is free and
 * in each of its complexes, over a pH axis, at the solved mixture's temperature and ionic strength
 * (both held along the axis).
 *
 * At each meter pH the complexing solver's mass balances are solved at that fixed ln[H⁺] (x = −pH·ln10
 * − ln γ(H⁺), the solve's own γ): every metal and ligand keeps the mixture's totals, as if the pH
 * were set by an acid or base whose ions take part in nothing. At the mixture's own pH the shares are
 * the solved speciation's. The solver is left in the solved state afterwards.
 *
 * The same for each complexing system (a ligand): its free forms and its complexes as shares of the
 * system's total (a complex with l ligands counts l times), so a citrate diagram shows the citrate
 * bound to calcium and a borate diagram its polyborates.
 */
import type { Aggregate } from "./aggregate";
import type { ComplexingSolver } from "./complex-solver";
import { complexingSystemSpecies } from "./complex-report";
import { LN10 } from "./physical-constants";

export interface MetalForm {
  /** The free ion's name (Ca2+) or the complex's (CaCit-). */
  name: string;
  charge: number;
  /** Share of the metal's total in this form at each pH of the axis (moles of metal / total). */
  fractions: number[];
  /** Share at the mixture's own pH. */
  atMixture: number;
}

export interface MetalDistribution {
  /** The strong ion's id and name. */
  id: string;
  name: string;
  charge: number;
  /** Total of the metal in the mixture, mol/L. */
  total: number;
  /** The free ion first, then each of its complexes in the library's order. */
  forms: MetalForm[];
}

/** Shares of metal j in its forms at the solver's current state (free first). */
function shares(core: ComplexingSolver, j: number, complexes: readonly number[]): number[] {
  const T = core.metT[j];
  return [Math.exp(core.v[j]) / T, ...complexes.map((c) => Math.exp(core.lnc[c]) / T)];
}

/** Each complexing metal's distribution over the meter pH values given; call after a solve. */
export function metalDistributionOf(core: ComplexingSolver, agg: Aggregate, pH: readonly number[]): MetalDistribution[] {
  const out: MetalDistribution[] = [];
  const lists: number[][] = [];
  for (let j = 0; j < core.nM; j++) {
    const { ion } = agg.ions[core.setup.metals[j]];
    const complexes: number[] = [];
    for (let c = 0; c < core.nC; c++) if (core.cMet[c] === j) complexes.push(c);
    lists.push(complexes);
    const here = shares(core, j, complexes);
    out.push({
      id: ion.id,
      name: ion.name,
      charge: ion.charge,
      total: core.metT[j],
      forms: [
        { name: ion.name, charge: ion.charge, fractions: [], atMixture: here[0] },
        ...complexes.map((c, k) => ({ name: core.setup.complexes[c].spec.name, charge: core.cZ[c], fractions: [], atMixture: here[k + 1] })),
      ],
    });
  }
  if (out.length === 0) return out;
  const x0 = core.x;
  for (const p of pH) {
    core.evaluate(-p * LN10 - core.lnGamma1);
    for (let j = 0; j < out.length; j++) {
      const s = shares(core, j, lists[j]);
      out[j].forms.forEach((f, k) => f.fractions.push(s[k]));
    }
  }
  core.evaluate(x0);
  return out;
}

export interface LigandForm extends MetalForm {
  /** Ligands per species: 1 for a free form, l for a complex with l ligands. */
  ligands: number;
}

export interface LigandDistribution {
  /** The acid–base system's id. */
  systemId: string;
  /** Its free forms (most protonated first), then its complexes in the library's order. */
  forms: LigandForm[];
}

/** Each complexing system's free forms and complexes over the meter pH values given; call after a solve. */
export function ligandDistributionOf(core: ComplexingSolver, agg: Aggregate, pH: readonly number[]): LigandDistribution[] {
  const metalIds = core.setup.metals.map((i) => agg.ions[i].ion.id);
  const at = (): { sys: number; species: ReturnType<typeof complexingSystemSpecies> }[] =>
    core.setup.ligands.map((s) => ({ sys: s, species: complexingSystemSpecies(core, agg.systems[s], s, metalIds) }));
  const here = at();
  const out: LigandDistribution[] = here.map(({ sys, species }, l) => {
    // per species: 1 for each free form, then cL of each complex of this ligand in the solver's order
    const counts = Array.from({ length: agg.systems[sys].steps.length + 1 }, () => 1);
    for (let c = 0; c < core.nC; c++) if (core.cLig[c] === l) counts.push(core.cL[c]);
    return {
      systemId: agg.systems[sys].id,
      forms: (species ?? []).map((sp, k) => ({ name: sp.name, charge: sp.charge, ligands: counts[k], fractions: [], atMixture: sp.fraction })),
    };
  });
  // complexingSystemSpecies reads the free forms at core.x: move it with each evaluation, then restore.
  const x0 = core.x;
  for (const p of pH) {
    const x = -p * LN10 - core.lnGamma1;
    core.x = x;
    core.evaluate(x);
    at().forEach(({ species }, l) => (species ?? []).forEach((sp, k) => out[l].forms[k].fractions.push(sp.fraction)));
  }
  core.x = x0;
  core.evaluate(x0);
  return out;
}
