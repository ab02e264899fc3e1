/**
 * Speciation over pH 0–14: the fraction of each acid–base system of a mixture in each of its forms,
 * at the mixture's temperature and ionic strength. Pure: no DOM.
 *
 * Method: the fraction formulas of each system, not re-solved mixtures. The mixture is solved once
 * (src/chem) for its pH and ionic strength I; each step's apparent (concentration) pK′ at that
 * temperature and I comes from chem's apparentPKa; at a meter pH x the concentration p[H] is
 * x + log10 γ(H⁺), and α_k ∝ Π_{j<k} K′_j / [H⁺]^k (computed in log space). I is held at the
 * mixture's value along the whole axis.
 *
 * Why not solve the mixture with added strong acid or base at every pH: reaching pH 0 or 14 takes
 * about 1 mol/L of HCl or NaOH, so the diagram would mix the effect of pH with an ionic strength of
 * ~1 mol/L, where the activity models are out of their range (the engine warns above 0.3 mol/L); the
 * curves at the ends would show the model's failure rather than the system. The fraction formulas
 * at fixed conditions give the exact picture of "this system, these conditions, that pH", and at the
 * mixture's own pH they coincide with the solved speciation (test/taskpane/charts.test.ts).
 *
 * A metal ion that forms complexes in the mixture (Ca²⁺ with citrate, …) gets its own distribution:
 * free and in each complex, as shares of the metal's total, from chem's complexing solver at each
 * pH of the same axis, the same temperature and ionic strength (chem: PreparedMixture.metalDistribution).
 * A system that forms complexes here (citrate with calcium, borate with its polyborates) is drawn the
 * same way (PreparedMixture.ligandDistribution): its free forms and its complexes as shares of its
 * total (a complex of l ligands counts l times), so the bound share shows; its crossings stay pK′.
 */
import { apparentPKa, debyeHuckelA, log10Gamma, prepare, DEFAULTS } from "../../chem";
import type { AcidBaseSystem, ActivityModel, Failure, MetalDistribution, Mixture, Regime } from "../../chem";

export const SPECIATION_PH_MIN = 0;
export const SPECIATION_PH_MAX = 14;
/** pH step of the sampled curves: 281 points, finer than a pixel at the pane's width. */
export const SPECIATION_PH_STEP = 0.05;

export interface SpeciesCurve {
  /** The library's name for the form (H2PO4-), or the engine's default. */
  name: string;
  charge: number;
  /** Fraction of the system in this form at each pH of SpeciationData.pH. */
  fractions: number[];
  /** Fraction at the mixture's own pH. */
  atMixture: number;
  /** A complex's number of ligands (its mol/L is fraction × total / ligands); absent for a free form. */
  ligands?: number;
}

export interface SystemSpeciation {
  id: string;
  name: string;
  /** Total of the system in the mixture, mol/L. */
  total: number;
  species: SpeciesCurve[];
  /** Meter pH at which forms k and k + 1 are equal (the apparent pKa on the pH scale), per step. */
  crossings: number[];
}

export interface SpeciationData {
  ok: true;
  /** The pH axis (meter scale, −log10 a(H⁺)). */
  pH: number[];
  mixturePH: number;
  temperatureC: number;
  ionicStrength: number;
  /** Thermodynamic pKw at the temperature. */
  pKw: number;
  activity: ActivityModel;
  regime: Regime;
  systems: SystemSpeciation[];
  /** Each metal ion that forms complexes here: free and in each complex (empty when none). */
  metals: MetalDistribution[];
  warnings: string[];
}

export interface SpeciationOptions {
  temperatureC?: number;
  activity?: ActivityModel;
  step?: number;
}

/** Fractions of a system's forms at one concentration p[H], from the apparent pK′ values (log space). */
export function fractionsAt(pKs: readonly number[], pcH: number): number[] {
  const logs = [0];
  for (let k = 1; k <= pKs.length; k++) logs.push(logs[k - 1] - pKs[k - 1] + pcH);
  const top = Math.max(...logs);
  const rel = logs.map((v) => Math.pow(10, v - top));
  const sum = rel.reduce((a, b) => a + b, 0);
  return rel.map((r) => r / sum);
}

function speciesName(sys: AcidBaseSystem, k: number, eqNames: Map<string, string[]>): string {
  return sys.speciesNames?.[k] ?? eqNames.get(sys.id)?.[k] ?? `${sys.name} form ${k + 1}`;
}

export function speciation(mix: Mixture, opts: SpeciationOptions = {}): SpeciationData | Failure {
  const temperatureC = opts.temperatureC ?? DEFAULTS.temperatureC;
  const activity = opts.activity ?? DEFAULTS.activity;
  const step = opts.step ?? SPECIATION_PH_STEP;
  const p = prepare(mix);
  if (!p.ok) return p;
  const eq = p.solve({ temperatureC, activity });
  if (!eq.ok) return eq;
  const I = eq.ionicStrength;
  const log10GammaH = log10Gamma(activity, 1, I, debyeHuckelA(temperatureC));
  const n = Math.round((SPECIATION_PH_MAX - SPECIATION_PH_MIN) / step);
  const axis = Array.from({ length: n + 1 }, (_, i) => (i === n ? SPECIATION_PH_MAX : SPECIATION_PH_MIN + i * step));
  const eqNames = new Map<string, string[]>();
  for (const sp of eq.species) if (sp.systemId) eqNames.set(sp.systemId, [...(eqNames.get(sp.systemId) ?? []), sp.name]);
  const bound = new Map(p.ligandDistribution(axis).map((l) => [l.systemId, l.forms]));
  const systems: SystemSpeciation[] = [];
  const { systems: list, totals } = p.aggregate;
  for (let s = 0; s < list.length; s++) {
    const sys = list[s];
    const pKs: number[] = [];
    for (let j = 0; j < sys.steps.length; j++) {
      const r = apparentPKa(sys, j, temperatureC, I, activity);
      if (!r.ok) return r;
      pKs.push(r.value);
    }
    const forms = bound.get(sys.id);
    const columns = forms ? [] : axis.map((x) => fractionsAt(pKs, x + log10GammaH));
    const here = forms ? [] : fractionsAt(pKs, eq.pH + log10GammaH);
    systems.push({
      id: sys.id,
      name: sys.name,
      total: totals[s],
      species: forms
        ? forms.map((f, k) => ({ name: f.name, charge: f.charge, fractions: f.fractions, atMixture: f.atMixture, ...(k > sys.steps.length ? { ligands: f.ligands } : {}) }))
        : here.map((atMixture, k) => ({ name: speciesName(sys, k, eqNames), charge: sys.topCharge - k, fractions: columns.map((c) => c[k]), atMixture })),
      crossings: pKs.map((pK) => pK - log10GammaH),
    });
  }
  const metals = p.metalDistribution(axis);
  return { ok: true, pH: axis, mixturePH: eq.pH, temperatureC, ionicStrength: I, pKw: eq.pKw, activity, regime: eq.regime, systems, metals, warnings: eq.warnings };
}
