/**
 * The titration curve of a mixture with a strong titrant (NaOH or HCl stock), dilution included,
 * through chem's curve workflow, with its equivalence points. Pure: no DOM.
 *
 * Which titrant (when not chosen by the user): the one that has more of the mixture to work through
 * — the amount of strong base that takes the mixture from its pH to pH 11, against the amount of
 * strong acid that takes it to pH 3, both at fixed volume from the fraction formulas at the
 * mixture's conditions (titratableAmounts). Between pH 3 and 11 the water's own H⁺ and OH⁻ stay
 * below 1 mmol/L, so the larger amount is the side where the mixture's acid–base systems (or its
 * excess strong acid or base) make a curve worth reading; amounts within 10 % of each other go to
 * NaOH.
 *
 * How far: the stock volume that brings the sample to pH 11.5 (NaOH) or 2.5 (HCl) — or one pH unit
 * beyond the start when the start is already past that — found by chem's adjust with dilution,
 * plus 15 %, rounded up to a round number of mL. When the stock cannot get there (too dilute, or a
 * hot solution, whose pKw is lower), the end is 85 % of the way from the start to the stock's own
 * pH; a stock that hardly moves the pH gets twice the sample's volume.
 */
import { adjust, curve, solvePH } from "../../chem";
import type { ActivityModel, Component, Failure, Mixture } from "../../chem";
import type { SpeciationData } from "./speciation";
import { fractionsAt } from "./speciation";
import { niceCeil } from "./ticks";

export type TitrantName = "NaOH" | "HCl";

export interface TitrationOptions {
  /** "auto" picks by titratableAmounts. */
  titrant?: TitrantName | "auto";
  /** Stock concentration, mol/L. Default 0.1. */
  stockConc?: number;
  /** Sample volume, L. Default 0.010 (10 mL). */
  sampleVolume?: number;
  /** Largest titrant volume, L (as an AQ.CURVE formula sets it). Default: found as described above. */
  maxVolume?: number;
  points?: number;
}

export interface TitrationPoint {
  /** Titrant added, mL. */
  mL: number;
  pH: number;
}

export interface TitrationData {
  ok: true;
  titrant: TitrantName;
  /** Why this titrant: chosen by the user, or the automatic rule's numbers. */
  reason: string;
  stockConc: number;
  sampleVolumeML: number;
  maxML: number;
  points: TitrationPoint[];
  equivalence: TitrationPoint[];
  startPH: number;
  warnings: string[];
}

export const TITRATION_DEFAULTS = { stockConc: 0.1, sampleVolume: 0.01, points: 161 } as const;
/** The window of the automatic choice (pH at which each titrant's amount is counted). */
export const AUTO_WINDOW = { acid: 3, base: 11 } as const;
/** Amounts within this ratio count as a tie (NaOH). */
export const AUTO_TIE = 1.1;
const END = { acid: 2.5, base: 11.5 } as const;

/**
 * mol/L of strong base taking the mixture from its pH to pH `base`, and of strong acid taking it to
 * pH `acid`, at fixed volume: Σ C·Δ(mean bound protons) of every system plus the change of free H⁺
 * and OH⁻ (from the speciation at the mixture's conditions). 0 when the mixture is already there.
 */
export function titratableAmounts(sp: SpeciationData, window: { acid: number; base: number } = AUTO_WINDOW): { base: number; acid: number } {
  const bound = (pH: number): number => {
    let sum = 0;
    for (const sys of sp.systems) {
      // the crossings are the pK′ on the meter scale, so they pair with the meter pH directly
      const pKs = sys.crossings;
      const f = fractionsAt(pKs, pH);
      // mean protons bound per system = Σ_k (n − k)·α_k
      const n = pKs.length;
      sum += sys.total * f.reduce((acc, a, k) => acc + (n - k) * a, 0);
    }
    return sum;
  };
  const free = (pH: number) => Math.pow(10, -pH) - Math.pow(10, pH - sp.pKw);
  const at0 = bound(sp.mixturePH) + free(sp.mixturePH);
  return {
    base: Math.max(0, at0 - (bound(window.base) + free(window.base))),
    acid: Math.max(0, bound(window.acid) + free(window.acid) - at0),
  };
}

function fmtMol(x: number): string {
  if (x < 5e-7) return "none";
  return x >= 0.1 ? `${x.toFixed(2)} mol/L` : `${(x * 1000).toPrecision(2)} mmol/L`;
}

/** Litres of stock the curve runs to (see the file's comment); notes go to `warnings`. */
function curveEnd(mix: Mixture, titrant: Component, base: boolean, sp: SpeciationData, stockConc: number, volume: number, warnings: string[]): number {
  const chem = { temperatureC: sp.temperatureC, activity: sp.activity };
  const name = base ? "NaOH" : "HCl";
  const target = base ? Math.max(END.base, sp.mixturePH + 1) : Math.min(END.acid, sp.mixturePH - 1);
  const stock = { conc: stockConc, volume };
  let toEnd = adjust(mix, titrant, target, { ...chem, stock });
  let reached = target;
  if (!toEnd.ok || !(toEnd.value > 0)) {
    // the stock cannot get there (a dilute stock, or pKw lower when hot): go 85 % of the way to the stock's own pH
    const own = solvePH([{ component: titrant, conc: stockConc }], chem);
    if (own.ok && (base ? own.pH > sp.mixturePH : own.pH < sp.mixturePH)) {
      reached = sp.mixturePH + 0.85 * (own.pH - sp.mixturePH);
      toEnd = adjust(mix, titrant, reached, { ...chem, stock });
    }
  }
  let maxL: number;
  if (toEnd.ok && toEnd.value > 0) maxL = niceCeil(toEnd.value * 1.15 * 1000) / 1000;
  else {
    maxL = 2 * volume;
    warnings.push(`A ${stockConc} mol/L ${name} stock hardly moves this sample's pH: the curve stops at ${(maxL * 1000).toPrecision(3)} mL.`);
  }
  if (reached !== target && toEnd.ok) {
    warnings.push(`A ${stockConc} mol/L ${name} stock cannot bring this sample to pH ${target.toFixed(1)} at ${sp.temperatureC} °C: the curve goes to about pH ${reached.toFixed(1)}.`);
  }
  return maxL;
}

export function titration(mix: Mixture, titrants: Record<TitrantName, Component>, sp: SpeciationData, opts: TitrationOptions = {}): TitrationData | Failure {
  const stockConc = opts.stockConc ?? TITRATION_DEFAULTS.stockConc;
  const volume = opts.sampleVolume ?? TITRATION_DEFAULTS.sampleVolume;
  const chem = { temperatureC: sp.temperatureC, activity: sp.activity as ActivityModel };
  let titrant: TitrantName;
  let reason: string;
  if (opts.titrant === "NaOH" || opts.titrant === "HCl") {
    titrant = opts.titrant;
    reason = `${titrant}, as chosen.`;
  } else {
    const amt = titratableAmounts(sp);
    const from = `from pH ${sp.mixturePH.toFixed(2)} the mixture takes`;
    const b = `${fmtMol(amt.base)} of strong base to reach pH ${AUTO_WINDOW.base}`;
    const a = `${fmtMol(amt.acid)} of strong acid to reach pH ${AUTO_WINDOW.acid}`;
    if (amt.acid > AUTO_TIE * amt.base) {
      titrant = "HCl";
      reason = `HCl: ${from} ${a}, but ${b}.`;
    } else if (amt.base > AUTO_TIE * amt.acid) {
      titrant = "NaOH";
      reason = `NaOH: ${from} ${b}, but ${a}.`;
    } else {
      titrant = "NaOH";
      reason = `NaOH: ${from} about as much strong base to reach pH ${AUTO_WINDOW.base} (${fmtMol(amt.base)}) as strong acid to reach pH ${AUTO_WINDOW.acid} (${fmtMol(amt.acid)}).`;
    }
  }
  const base = titrant === "NaOH";
  const warnings: string[] = [];
  const maxL = opts.maxVolume ?? curveEnd(mix, titrants[titrant], base, sp, stockConc, volume, warnings);
  const r = curve(mix, titrants[titrant], { stockConc, volume, maxVolume: maxL, points: opts.points ?? TITRATION_DEFAULTS.points }, chem);
  if (!r.ok) return r;
  if (r.points[0].refused) return r.points[0].refused;
  for (const w of r.warnings) if (!warnings.includes(w)) warnings.push(w);
  // Points beyond the ionic-strength limit have no pH (as in AQ.CURVE): not drawn, and said so.
  const refused = r.points.find((p) => p.refused);
  if (refused?.refused) warnings.push(`No pH is drawn from ${(refused.volume * 1000).toPrecision(3)} mL on: ${refused.refused.message}`);
  return {
    ok: true,
    titrant,
    reason,
    stockConc,
    sampleVolumeML: volume * 1000,
    maxML: maxL * 1000,
    points: r.points.flatMap((p) => (p.pH === null ? [] : [{ mL: p.volume * 1000, pH: p.pH }])),
    equivalence: r.equivalence.map((e) => ({ mL: e.volume * 1000, pH: e.pH })),
    startPH: r.points[0].pH as number,
    warnings,
  };
}
