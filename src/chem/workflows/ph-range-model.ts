/**
 * The quantities PHRANGE varies and the mixture at a point of the tolerance box.
 *
 * Quantities: each component with a positive amount and a positive tolerance (entries of the same
 * component are merged first: the engine only sees their sum, and the sums reachable from
 * independent tolerances c_i·[1 − t_i, 1 + t_i] fill exactly [Σ c_i(1 − t_i), Σ c_i(1 + t_i)], so the
 * merge loses nothing); with a pKa uncertainty u > 0, each pKa step of each system present
 * at a positive total (interval pKa ± u). Every pKa varies independently. Systems are matched by id:
 * components carrying the same system all see the same shifted constants.
 */
import type { AcidBaseSystem, ChemOptions, Component, Mixture } from "../types";
import type { Evaluation } from "./brent";
import { pHOf } from "./mixing";

export interface Quantity {
  kind: "amount" | "pKa";
  /** "sodium acetate (mol/L)" or "phosphate pKa2". */
  label: string;
  nominal: number;
  lo: number;
  hi: number;
  /** Entry index (amount) or system id and 0-based step (pKa). */
  entry?: number;
  systemId?: string;
  step?: number;
}

/** Quantities of a mixture whose entry i may range over [lo[i], hi[i]] (entries are distinct components). */
export function quantitiesOf(mix: Mixture, lo: readonly number[], hi: readonly number[], pKaUncertainty: number): Quantity[] {
  const out: Quantity[] = [];
  mix.forEach((e, i) => {
    if (e.conc > 0 && hi[i] > lo[i]) {
      out.push({ kind: "amount", label: `${e.component.name} (mol/L)`, nominal: e.conc, lo: lo[i], hi: hi[i], entry: i });
    }
  });
  if (pKaUncertainty > 0) {
    const seen = new Set<string>();
    for (const e of mix) {
      for (const { system, stoich } of e.component.systems) {
        if (!(e.conc * stoich > 0) || seen.has(system.id)) continue;
        seen.add(system.id);
        system.steps.forEach((s, j) => {
          out.push({ kind: "pKa", label: `${system.name} pKa${j + 1}`, nominal: s.pKa, lo: s.pKa - pKaUncertainty, hi: s.pKa + pKaUncertainty, systemId: system.id, step: j });
        });
      }
    }
  }
  return out;
}

/** The mixture with the quantities set to `values` (same order as `qs`). */
export function mixtureAt(mix: Mixture, qs: readonly Quantity[], values: readonly number[]): Mixture {
  const conc = mix.map((e) => e.conc);
  const shifts = new Map<string, number[]>();
  qs.forEach((q, i) => {
    if (q.kind === "amount") conc[q.entry as number] = values[i];
    else {
      const id = q.systemId as string;
      const list = shifts.get(id) ?? [];
      list[q.step as number] = values[i];
      shifts.set(id, list);
    }
  });
  if (shifts.size === 0) return mix.map((e, i) => ({ component: e.component, conc: conc[i] }));
  const replaced = new Map<string, AcidBaseSystem>();
  const systemFor = (s: AcidBaseSystem): AcidBaseSystem => {
    const pk = shifts.get(s.id);
    if (pk === undefined) return s;
    let r = replaced.get(s.id);
    if (r === undefined) {
      r = { ...s, steps: s.steps.map((st, j) => ({ ...st, pKa: pk[j] ?? st.pKa })) };
      replaced.set(s.id, r);
    }
    return r;
  };
  return mix.map((e, i) => {
    const component: Component = { ...e.component, systems: e.component.systems.map((x) => ({ system: systemFor(x.system), stoich: x.stoich })) };
    return { component, conc: conc[i] };
  });
}

/** pH at a point of the box, counting evaluations. */
export class BoxPH {
  evaluations = 0;
  constructor(
    private readonly mix: Mixture,
    readonly qs: readonly Quantity[],
    private readonly chem: ChemOptions,
  ) {}

  at(values: readonly number[]): Evaluation {
    this.evaluations++;
    const r = pHOf(mixtureAt(this.mix, this.qs, values), this.chem);
    return r.ok ? { ok: true, value: r.pH } : r;
  }

  get nominal(): number[] {
    return this.qs.map((q) => q.nominal);
  }
}
