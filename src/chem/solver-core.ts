/**
 * The numerical core: the charge balance in ln[H⁺] at fixed conditional constants, and the
 * ionic-strength iteration around it. One instance per prepared mixture; its one array of numbers
 * is allocated once, in the constructor, and the inner loops allocate nothing.
 *
 * Charge balance (x = ln h, h = [H⁺] in mol/L, conditional constants at the current I):
 *   F(x) = h − K′w/h + Q + Σ_s C_s·Σ_k z_k·α_k(h) = 0,
 * Q = Σ z·c over strong ions, z_k = z0 − k the charge of the species that has lost k protons, z0 the
 * charge of the fully protonated form. dF/dx = h + K′w/h + Σ C_s·Var_s(z) > 0 (d α_k/dx =
 * −α_k·(k − k̄)), so F is strictly increasing in x and has exactly one root.
 *
 * Bracket: the mean charge lies between z0 − n and z0, which gives h − K′w/h + Pmin ≤ F ≤ h − K′w/h + Pmax with Pmax = Q + Σ C·z0 and
 * Pmin = Pmax − Σ C·n, so the root lies between the water-only roots for Pmax and Pmin. A Newton step
 * that leaves the bracket, or that does not halve |F|, is replaced by bisection: convergence is
 * guaranteed, and quadratic near the root.
 *
 * The ionic-strength iteration around it is in ionic-strength-iteration.ts.
 */
import { activityShape, activityShapeDerivative } from "./activity/model";
import { DEFAULTS, SOLVER } from "./defaults";
import { LN10, ZERO_CELSIUS_K } from "./physical-constants";
import { pKaAtTemperature } from "./temperature";
import type { ActivityModel, AcidBaseSystem } from "./types";
import { kw } from "./water";
import { debyeHuckelA } from "./activity/debye-huckel-a";
import { dataLayout, type DataLayout } from "./solver-data-layout";

/** Smallest positive root of h − kwc/h + P = 0, computed without cancellation. */
function waterRoot(P: number, kwc: number): number {
  const s = Math.sqrt(P * P + 4 * kwc);
  return P > 0 ? (2 * kwc) / (P + s) : (s - P) / 2;
}

const EPS = 2.220446049250313e-16;

export class ChargeBalanceSolver {
  readonly nSys: number;
  /**
   * Every per-system and per-step number in one array, laid out as `at` says (DataLayout), so that
   * preparing a mixture makes one array rather than ten typed arrays (a 10 000-row what-if table
   * prepares 10 000 mixtures; each typed array cost about 200 bytes of heap and a backing store for
   * the garbage collector to sweep). Read it through the accessors below.
   */
  private readonly data: number[];
  /** Where each region of `data` starts. */
  readonly at: DataLayout;
  /** Number of steps over all systems. */
  readonly nStepsTotal: number;
  /** Σ z·c of the strong ions, mol/L (shifted only by shiftStrongBase). */
  strongCharge: number;
  /** ½ Σ z²·c of the strong ions, mol/L. */
  strongIonic: number;
  /** Σ |z|·c of the strong ions. */
  strongAbs: number;
  pMax: number;
  pMin: number;

  temperatureC = NaN;
  model: ActivityModel = DEFAULTS.activity; // set by every solve
  kwT = NaN;
  debyeA = NaN;
  /** Ionic strength the conditional constants are set for, mol/L. */
  ionicStrength = 0;
  /** ln γ of a singly charged ion at `ionicStrength`. */
  lnGamma1 = 0;
  /** K′w = Kw/(γH·γOH). */
  kwc = NaN;
  /** Last solution of the charge balance, ln[H⁺]. */
  x = NaN;
  /** Outputs of evaluate(). */
  F = NaN;
  dF = NaN;
  ionicFromSpeciation = NaN;
  /** Σ |z·c| over every charged term at the last evaluation: the scale of the charge balance. */
  absCharge = NaN;
  /** Counters of the last solve. */
  evaluations = 0;
  outerIterations = 0;

  constructor(systems: readonly AcidBaseSystem[], totals: readonly number[], strongCharge: number, strongIonic: number, strongAbs: number) {
    const n = systems.length;
    this.nSys = n;
    let m = 0;
    for (let s = 0; s < n; s++) m += systems[s].steps.length;
    this.nStepsTotal = m;
    const at = dataLayout(n, m);
    this.at = at;
    // A plain array of doubles (NaN until set keeps V8's packed-double kind from the start): on the
    // JS heap, unlike a typed array's separate backing store, and half the time to make.
    const d: number[] = [];
    for (let i = at.length; i > 0; i--) d.push(NaN);
    this.data = d;
    let pMax = strongCharge;
    let capacity = 0;
    let first = 0;
    for (let s = 0; s < n; s++) {
      const sys = systems[s];
      const C = totals[s];
      const z0 = sys.topCharge;
      const ns = sys.steps.length;
      d[at.total + s] = C;
      d[at.topCharge + s] = z0;
      d[at.stepCount + s] = ns;
      d[at.firstStep + s] = first;
      for (let j = 0; j < ns; j++) {
        const step = sys.steps[j];
        const i = first + j;
        d[at.pKa + i] = step.pKa;
        d[at.dH + i] = step.dH ?? 0;
        d[at.dCp + i] = step.dCp ?? 0;
        d[at.exponent + i] = z0 - (j + 1);
      }
      first += ns;
      pMax += C * z0;
      capacity += C * ns;
    }
    this.strongCharge = strongCharge;
    this.strongIonic = strongIonic;
    this.strongAbs = strongAbs;
    this.pMax = pMax;
    this.pMin = pMax - capacity;
  }

  /**
   * Other totals for the same systems and strong-ion charges (the next row of a what-if table,
   * PreparedMixture.setMixture): the totals, the strong ions' sums and the bracket, computed as the
   * constructor computes them. The constants stay, with their values at the last temperature; every
   * solve starts cold, so the results are those of a solver made with these totals.
   */
  setTotals(totals: readonly number[], strongCharge: number, strongIonic: number, strongAbs: number): void {
    const d = this.data;
    const at = this.at;
    let pMax = strongCharge;
    let capacity = 0;
    for (let s = 0; s < this.nSys; s++) {
      const C = totals[s];
      d[at.total + s] = C;
      pMax += C * d[at.topCharge + s];
      capacity += C * d[at.stepCount + s];
    }
    this.strongCharge = strongCharge;
    this.strongIonic = strongIonic;
    this.strongAbs = strongAbs;
    this.pMax = pMax;
    this.pMin = pMax - capacity;
  }

  /** Total mol/L of system s. */
  total(s: number): number {
    return this.data[this.at.total + s];
  }

  /** z0 of system s: the charge of its fully protonated form. */
  topChargeOf(s: number): number {
    return this.data[this.at.topCharge + s];
  }

  /** Number of pKa steps of system s. */
  stepCount(s: number): number {
    return this.data[this.at.stepCount + s];
  }

  /** The conditional (concentration) Ka′ of step k (1-based) of system s, at the current T and I. */
  conditionalKa(s: number, k: number): number {
    return this.data[this.at.kc + this.data[this.at.firstStep + s] + k - 1];
  }

  /** Sets Kw, A and every thermodynamic Ka for a temperature in °C (cached). */
  setTemperature(temperatureC: number): void {
    if (temperatureC === this.temperatureC) return;
    const T = temperatureC + ZERO_CELSIUS_K;
    const d = this.data;
    const at = this.at;
    for (let i = 0; i < this.nStepsTotal; i++) {
      d[at.kaT + i] = Math.exp(-LN10 * pKaAtTemperature(d[at.pKa + i], d[at.dH + i], d[at.dCp + i], T));
    }
    this.kwT = kw(temperatureC);
    this.debyeA = debyeHuckelA(temperatureC);
    this.temperatureC = temperatureC;
  }

  /** Sets the conditional constants for an ionic strength (mol/L) under the current model. */
  setIonicStrength(I: number): void {
    const g = -LN10 * this.debyeA * activityShape(this.model, I);
    this.ionicStrength = I;
    this.lnGamma1 = g;
    const twoG = 2 * g;
    const d = this.data;
    const { kc, kaT, exponent } = this.at;
    for (let i = 0; i < this.nStepsTotal; i++) d[kc + i] = d[kaT + i] * Math.exp(twoG * d[exponent + i]);
    this.kwc = this.kwT * Math.exp(-twoG);
  }

  /**
   * Sets the conditional constants from each species' own ln γ (an ion-specific model, see
   * pitzer-iteration.ts): K′a = Ka·γ(acid)/(γH·γ(base)) for every step, K′w = Kw/(γH·γOH).
   * lnGammaSpecies[firstStep(s) + s + k] is ln γ of the species of system s that has lost k protons;
   * I is the ionic strength those coefficients belong to; lnGamma1 then holds ln γ(H⁺).
   */
  setSpeciesGammas(I: number, lnGammaH: number, lnGammaOH: number, lnGammaSpecies: readonly number[]): void {
    this.ionicStrength = I;
    this.lnGamma1 = lnGammaH;
    const d = this.data;
    const { kc, kaT, firstStep, stepCount } = this.at;
    for (let s = 0; s < this.nSys; s++) {
      const o = d[firstStep + s];
      const n = d[stepCount + s];
      const b = o + s;
      for (let j = 0; j < n; j++) d[kc + o + j] = d[kaT + o + j] * Math.exp(lnGammaSpecies[b + j] - lnGammaH - lnGammaSpecies[b + j + 1]);
    }
    this.kwc = this.kwT * Math.exp(-lnGammaH - lnGammaOH);
  }

  /** Adds delta mol/L of a univalent strong cation (NaOH without volume change; negative removes it). */
  shiftStrongBase(delta: number): void {
    this.strongCharge += delta;
    this.strongIonic += 0.5 * delta;
    this.strongAbs += delta;
    this.pMax += delta;
    this.pMin += delta;
  }

  /** d ln γ1 / dI at the current ionic strength. */
  lnGamma1Derivative(): number {
    return -LN10 * this.debyeA * activityShapeDerivative(this.model, this.ionicStrength);
  }

  /**
   * Evaluates F, dF/dx, the ionic strength of the speciation and the sum of |charge terms| at
   * x = ln[H⁺]. Each system's charge is summed as Σ z_k·α_k (not z0 − D), so a dominant neutral
   * species contributes exactly 0 and the rounding error scales with the charged terms only.
   */
  evaluate(x: number): void {
    const h = Math.exp(x);
    const invH = 1 / h;
    const oh = this.kwc * invH;
    let F = h - oh + this.strongCharge;
    let dF = h + oh;
    let zz = h + oh;
    let abs = h + oh + this.strongAbs;
    const d = this.data;
    const nSys = this.nSys;
    const { total, topCharge, stepCount, firstStep, kc } = this.at;
    for (let s = 0; s < nSys; s++) {
      const C = d[total + s];
      if (C === 0) continue;
      const z0 = d[topCharge + s];
      const n = d[stepCount + s];
      const o = kc + d[firstStep + s];
      let t = 1;
      let s0 = 1;
      let sz = z0;
      let szz = z0 * z0;
      let sa = z0 < 0 ? -z0 : z0;
      for (let k = 1; k <= n; k++) {
        t *= d[o + k - 1] * invH;
        const z = z0 - k;
        s0 += t;
        sz += z * t;
        szz += z * z * t;
        sa += (z < 0 ? -z : z) * t;
        if (t > 1e200) {
          t *= 1e-200;
          s0 *= 1e-200;
          sz *= 1e-200;
          szz *= 1e-200;
          sa *= 1e-200;
        }
      }
      const inv = 1 / s0;
      const m = sz * inv;
      const m2 = szz * inv;
      const v = m2 - m * m;
      F += C * m;
      dF += C * (v > 0 ? v : 0);
      zz += C * m2;
      abs += C * sa * inv;
    }
    this.F = F;
    this.dF = dF;
    this.absCharge = abs;
    this.ionicFromSpeciation = this.strongIonic + 0.5 * zz;
    this.evaluations++;
  }

  /**
   * Solves the charge balance at the current conditional constants, starting from xStart when it
   * lies inside the bracket. Leaves the root in this.x and the evaluation at the root in F, dF,
   * ionicFromSpeciation. Returns false only if the iteration cap is hit (not expected: bisection
   * alone converges well within it).
   */
  solveLnH(xStart: number): boolean {
    const kwc = this.kwc;
    let xlo = Math.log(waterRoot(this.pMax, kwc));
    let xhi = Math.log(waterRoot(this.pMin, kwc));
    const tol = SOLVER.lnHTolerance;
    let x = xStart > xlo && xStart < xhi ? xStart : 0.5 * (xlo + xhi);
    if (xhi - xlo <= tol) {
      this.x = x;
      this.evaluate(x);
      return true;
    }
    let lastAbsF = Infinity;
    for (let it = 0; it < SOLVER.maxChargeBalanceIterations; it++) {
      this.evaluate(x);
      const F = this.F;
      const absF = Math.abs(F);
      if (absF <= 8 * EPS * this.absCharge) break;
      if (F < 0) xlo = x;
      else xhi = x;
      let xn = x - F / this.dF;
      if (!(xn > xlo && xn < xhi) || absF > 0.5 * lastAbsF) xn = 0.5 * (xlo + xhi);
      lastAbsF = absF;
      const step = Math.abs(xn - x);
      x = xn;
      if (step <= tol || xhi - xlo <= tol) {
        this.evaluate(x);
        this.x = x;
        return true;
      }
    }
    this.x = x;
    return Math.abs(this.F) <= 8 * EPS * this.absCharge || xhi - xlo <= tol;
  }
}
