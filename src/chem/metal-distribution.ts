/**
 * A metal ion's distribution against pH: the share of each complexing metal's total that is free and
 * in each of its complexes, over a pH axis, at the solved mixture's temperature and ionic strength
 * (both held along the axis).
 *
 * At each meter pH the complexing solver's mass balances are solved at that fixed ln[H⁺] (x = −pH·ln10
 * − ln γ(H⁺), the solve's own γ): every metal and ligand keeps the mixture's totals, as if the pH
 * were set by an acid or base whose ions take part in nothing. At the mixture's own pH the shares are
 * the solved speciation's. The solver is left in the solved state afterwards.
 */
import type { Aggregate } from "./aggregate";
import type { ComplexingSolver } from "./complex-solver";
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
