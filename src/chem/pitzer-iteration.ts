/**
 * The "pitzer" activity model inside the solve: each ion's own γ from Pitzer's equations
 * (activity/pitzer.ts) at the current speciation, iterated to self-consistency with the charge
 * balance.
 *
 * Method: start from the Davies solution (ionic-strength-iteration.ts); then repeat — molalities of
 * every ion from the current [H⁺] and conditional constants; ln γ of every ion (Pitzer; the fallback
 * rule below for an ion without parameters); conditional constants from those γ
 * (ChargeBalanceSolver.setSpeciesGammas); the charge balance again from the last root — until ln[H⁺]
 * moves by less than 1e-12. The γ depend on [H⁺] only through the speciation, weakly, so the fixed
 * point contracts fast (typically 4–8 passes).
 *
 * Fallback rule: an ion with no published cation–anion parameters here (citrate, Tris, histidine,
 * Good's buffers…; activity/pitzer-ions.ts, COVERED_IONS) takes the Davies γ at the Pitzer ionic
 * strength; it still counts in I and Z. A cation–anion pair of covered ions without parameters has
 * β0 = β1 = Cφ = 0, and an absent θ or ψ is 0. Both are reported as warnings (AQ.CHECK shows them)
 * when the ions concerned are present at ≥ 1 mM and ≥ 1 % of I.
 *
 * pH convention: single-ion γ are not measurable; only neutral combinations (γH·γCl, the ratios in
 * every Ka and in Kw) are, and those are what Pitzer's equations are fitted to. A meter calibrated
 * with the pH(S) standards reads on the scale those standards were assigned on, where ln γ(Cl⁻) is
 * fixed by the Bates–Guggenheim convention, log10 γCl = −A√I/(1 + 1.5√I) (Bates & Guggenheim, Pure
 * Appl. Chem. 1, 163 (1960); Buck et al., Pure Appl. Chem. 74, 2169 (2002), the pH(S) assignment).
 * So each Pitzer ion's ln γ is moved by z·k with k = ln γCl(Pitzer) − ln γCl(Bates–Guggenheim), Cl⁻
 * taken as a trace ion when the mixture holds none. The neutral combinations, and with them the
 * speciation, are unchanged; the reported pH is then on the meter's scale (it moves by −k/ln 10,
 * +0.002 to +0.03 in the phosphate tables at I = 0.1–0.3). The fallback ions keep Davies γ, itself
 * a conventional single-ion value of the same Debye–Hückel shape.
 *
 * Concentrations in mol/L are used as molalities, as everywhere in the engine (README, Model): at
 * 1 mol/L NaCl the molality is about 2 % higher, which moves ln γ± by under 0.005.
 */
import { daviesLog10Gamma } from "./activity/davies";
import { analogueOf, binaryParameters, COVERED_IONS, osmoticSlope, pitzerModelFor, type PitzerModel } from "./activity/pitzer";
import { strongIonName, systemSpeciesName } from "./activity/pitzer-ions";
import { unverifiedParametersAmong } from "./activity/pitzer-provenance";
import type { Aggregate } from "./aggregate";
import { DEFAULTS, LIMITS } from "./defaults";
import { LN10 } from "./physical-constants";
import { solveCoupled } from "./ionic-strength-iteration";
import type { ChargeBalanceSolver } from "./solver-core";
import { ION_SPECIFIC_START } from "./activity/models";
import type { ActivityModel } from "./types";

const X_TOLERANCE = 1e-12;

/** ln γ(Cl⁻) by the Bates–Guggenheim convention: log10 γ = −A√I/(1 + 1.5√I) (Bates & Guggenheim 1960). */
function batesGuggenheimLnGammaCl(I: number, A: number): number {
  const s = Math.sqrt(I);
  return (-LN10 * A * s) / (1 + 1.5 * s);
}
const MAX_PASSES = 200;

/** The ions of one prepared mixture, compiled once: H⁺, OH⁻, Na⁺ (for β), strong ions, charged system species. */
export class PitzerState {
  readonly names: string[] = [];
  readonly charges: number[] = [];
  private readonly fallback: boolean[] = [];
  private readonly strongM: number[] = [];
  private readonly model: PitzerModel;
  /** Per system species (index firstStep(s) + s + k): its ion index, or −1 for a neutral species. */
  private readonly speciesIon: number[] = [];
  readonly m: number[];
  readonly lnGamma: number[];
  readonly lnGammaSpecies: number[];
  private readonly naIndex: number;
  /** Cl⁻ is always one of the ions (a trace ion when absent): the pH convention reads its γ. */
  private readonly clIndex: number;
  /** Σ m_i(φ − 1) over the ions at the last evaluation, and its ionic strength. */
  osmoticExcess = 0;
  ionicStrength = 0;

  constructor(agg: Aggregate) {
    const index = new Map<string, number>();
    const add = (name: string, z: number): number => {
      let i = index.get(name);
      if (i === undefined) {
        i = this.names.length;
        index.set(name, i);
        this.names.push(name);
        this.charges.push(z);
        this.fallback.push(!COVERED_IONS.has(name) && !COVERED_IONS.has(analogueOf(name) ?? ""));
        this.strongM.push(0);
      }
      return i;
    };
    add("H+", 1);
    add("OH-", -1);
    this.naIndex = add("Na+", 1);
    this.clIndex = add("Cl-", -1);
    for (const { ion, conc } of agg.ions) {
      if (ion.charge === 0) continue;
      this.strongM[add(strongIonName(ion.id), ion.charge)] += conc;
    }
    for (const sys of agg.systems) {
      for (let k = 0; k <= sys.steps.length; k++) {
        const z = sys.topCharge - k;
        this.speciesIon.push(z === 0 ? -1 : add(systemSpeciesName(sys.id, k), z));
      }
    }
    this.model = pitzerModelFor(this.names, this.charges);
    this.m = this.strongM.map(() => 0);
    this.lnGamma = this.strongM.map(() => 0);
    this.lnGammaSpecies = this.speciesIon.map(() => 0);
  }

  /** The fixed Na⁺ molality. */
  sodium(): number {
    return this.strongM[this.naIndex];
  }

  /** Sets the fixed Na⁺ molality (restores what sodium() returned). */
  setSodium(value: number): void {
    this.strongM[this.naIndex] = value;
  }

  /** Adds delta mol/kg of Na⁺ to the fixed ions (with ChargeBalanceSolver.shiftStrongBase). */
  shiftSodium(delta: number): void {
    this.strongM[this.naIndex] += delta;
  }

  /** Molalities of every ion from the solver's current root and conditional constants. */
  private fillMolalities(core: ChargeBalanceSolver): void {
    const m = this.m;
    for (let i = 0; i < m.length; i++) m[i] = this.strongM[i];
    const x = core.x;
    m[0] += Math.exp(x);
    m[1] += core.kwc * Math.exp(-x);
    let b = 0;
    for (let s = 0; s < core.nSys; s++) {
      const n = core.stepCount(s);
      const C = core.total(s);
      if (C > 0) {
        // log of the relative amounts, then normalised: robust for any pKa and [H⁺]
        let l = 0;
        let top = 0;
        const g = this.lnGammaSpecies; // scratch: overwritten by computeGammas below
        g[b] = 0;
        for (let k = 1; k <= n; k++) {
          l += Math.log(core.conditionalKa(s, k)) - x;
          g[b + k] = l;
          if (l > top) top = l;
        }
        let sum = 0;
        for (let k = 0; k <= n; k++) sum += Math.exp(g[b + k] - top);
        for (let k = 0; k <= n; k++) {
          const i = this.speciesIon[b + k];
          if (i >= 0) m[i] += (C * Math.exp(g[b + k] - top)) / sum;
        }
      }
      b += n + 1;
    }
  }

  /** ln γ of every ion and species at the molalities in m, at Debye–Hückel A (log10). */
  private computeGammas(A: number): void {
    const lnG = this.lnGamma;
    this.osmoticExcess = this.model.evaluate(this.m, osmoticSlope(A), lnG);
    const I = this.model.ionicStrength;
    this.ionicStrength = I;
    // The pH convention (module comment): every Pitzer ion's ln γ moves by z·k, k chosen so that
    // ln γ(Cl⁻) takes its Bates–Guggenheim value; the fallback ions keep their Davies γ.
    const k = lnG[this.clIndex] - batesGuggenheimLnGammaCl(I, A);
    for (let i = 0; i < lnG.length; i++) {
      lnG[i] = this.fallback[i] ? LN10 * daviesLog10Gamma(this.charges[i], I, A) : lnG[i] + this.charges[i] * k;
    }
    for (let j = 0; j < this.speciesIon.length; j++) {
      const i = this.speciesIon[j];
      this.lnGammaSpecies[j] = i >= 0 ? lnG[i] : 0;
    }
  }

  /**
   * Σ m_i(φ − 1) of the ions at the last solve's speciation with every molality multiplied by
   * scale (1/w turns the engine's mol/L into mol/kg of water), at Debye–Hückel A (log10).
   */
  osmoticExcessScaled(scale: number, A: number): number {
    return this.model.evaluate(
      this.m.map((v) => v * scale),
      osmoticSlope(A),
      this.m.map(() => 0),
    );
  }

  /** One pass: speciation → γ → conditional constants → charge balance. False if the balance fails. */
  pass(core: ChargeBalanceSolver): boolean {
    this.fillMolalities(core);
    this.computeGammas(core.debyeA);
    core.setSpeciesGammas(this.ionicStrength, this.lnGamma[0], this.lnGamma[1], this.lnGammaSpecies);
    return core.solveLnH(core.x);
  }

  /** The reasons a Pitzer result leans on the fallback rule, or on 25 °C parameters away from 25 °C. */
  warnings(temperatureC: number): string[] {
    const out: string[] = [];
    const I = this.ionicStrength;
    const major = (i: number) => this.m[i] >= 1e-3 && this.m[i] >= 0.01 * I;
    const missing = this.names.filter((n, i) => this.fallback[i] && major(i)).map((n) => n.replace(/^(\w+)\[(\d+)\]$/, "$1 species $2"));
    if (missing.length > 0) {
      out.push(`No published Pitzer parameters here for ${missing.join(", ")}: Davies activity is used for ${missing.length === 1 ? "that ion" : "those ions"}.`);
    }
    const borrowed = this.names.filter((n, i) => !this.fallback[i] && !COVERED_IONS.has(n) && major(i)).map((n) => `${n} (as ${analogueOf(n)})`);
    if (borrowed.length > 0) {
      out.push(`No published Pitzer parameters here for ${borrowed.join(", ")}: the parameters of the phosphate analogue are used (a stated rule, not published values).`);
    }
    const pairs: string[] = [];
    for (let c = 0; c < this.names.length; c++) {
      if (this.charges[c] <= 0 || this.fallback[c] || !major(c)) continue;
      for (let a = 0; a < this.names.length; a++) {
        if (this.charges[a] >= 0 || this.fallback[a] || !major(a)) continue;
        if (!binaryParameters(this.names[c], this.names[a]) && !binaryParameters(analogueOf(this.names[c]) ?? this.names[c], analogueOf(this.names[a]) ?? this.names[a])) pairs.push(`${this.names[c]}–${this.names[a]}`);
      }
    }
    if (pairs.length > 0) out.push(`No published Pitzer parameters here for the pair${pairs.length === 1 ? "" : "s"} ${pairs.join(", ")}: taken as zero.`);
    const unverified = unverifiedParametersAmong(this.names.filter((n, i) => !this.fallback[i] && major(i)));
    if (unverified.length > 0) out.push(`Pitzer parameters from memory, unverified, are used here: ${unverified.join(", ")}.`);
    if (Math.abs(temperatureC - DEFAULTS.temperatureC) > LIMITS.missingEnthalpyWarnK) {
      out.push(`The Pitzer parameters are 25 °C values (only the Debye–Hückel slope follows the temperature).`);
    }
    return out;
  }
}

/**
 * Solves charge balance and Pitzer activity coefficients together at the solver's temperature.
 * warm: start from the solver's current state (after a successful solve) instead of Davies.
 * Returns false when the iteration does not settle (the caller reports "no-convergence").
 */
export function solvePitzer(core: ChargeBalanceSolver, st: PitzerState, model: ActivityModel, warm = false): boolean {
  if (!warm) {
    if (!solveCoupled(core, ION_SPECIFIC_START)) return false;
    core.outerIterations = 0;
  }
  core.model = model;
  for (let it = 0; it < MAX_PASSES; it++) {
    const x = core.x;
    if (!st.pass(core)) return false;
    core.outerIterations++;
    if (Math.abs(core.x - x) <= X_TOLERANCE) return true;
  }
  return false;
}

/**
 * β = dC_b/dpH under the Pitzer model, by a second-order one-sided difference in NaOH added
 * without volume change (Na⁺ enters the Pitzer sums): β ≈ 2d/(−3pH₀ + 4pH₁ − pH₂) with pH_k at k·d,
 * d = 1e-4 × the Davies-shaped estimate `estimate`. Leaves the solver at the original state.
 */
export function pitzerBufferValue(core: ChargeBalanceSolver, st: PitzerState, estimate: number): number {
  const pHNow = () => -(core.x + core.lnGamma1) / LN10;
  const d = 1e-4 * (estimate > 0 && Number.isFinite(estimate) ? estimate : 1e-6);
  const p0 = pHNow();
  // The exact inputs, restored by assignment afterwards (a cached mixture's next solve, which
  // starts cold from them, is then bit-identical to a fresh one's).
  const saved = [core.strongCharge, core.strongIonic, core.strongAbs, core.pMax, core.pMin];
  const savedNa = st.sodium();
  const at = (shift: number): number => {
    core.shiftStrongBase(shift);
    st.shiftSodium(shift);
    return solvePitzer(core, st, core.model, true) ? pHNow() : NaN;
  };
  const p1 = at(d);
  const p2 = at(d);
  [core.strongCharge, core.strongIonic, core.strongAbs, core.pMax, core.pMin] = saved;
  st.setSodium(savedNa);
  solvePitzer(core, st, core.model, true);
  return (2 * d) / (-3 * p0 + 4 * p1 - p2);
}
