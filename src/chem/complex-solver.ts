/**
 * The charge balance with complexes: metal ions, chelators and species of a ligand alone
 * (polyborates), solved exactly together with the mass balances of every metal and ligand.
 *
 * Components: H⁺ (x = ln[H⁺]), the fully deprotonated form L of each complexing system (u_ℓ =
 * ln[L]) and each complexing metal M (v_j = ln[M]). Every species is exp(ln K′ + ν·(x, u, v)) with
 * its conditional constant K′ at the current T and I (ln γ(z) = z²·g as for every other ion).
 *
 * Charge balance, written through the components (each species' charge is the sum of its
 * components' charges): F(x) = h − K′w/h + Q + Σ_ℓ C_ℓ·z(L_ℓ) + (protons bound on ligand species),
 * the metals' charge being in Q at their totals. With the mass balances solved for u and v at each
 * x, F is strictly increasing in x: dF/dx is the Schur complement H_xx − H_xuᵀ H_uu⁻¹ H_xu of the
 * positive-definite matrix Σ c·ν νᵀ, which is positive. Bound protons per ligand lie between the
 * smallest and largest proton count per ligand of its species (0…n for the free forms, p/l for a
 * complex), which brackets the root as in solver-core.ts; the same safeguarded Newton runs on it.
 *
 * Mass balances at fixed x (nested, each step monotone, so none can fail to converge):
 * - a metal, given the free ligands: [M] = T_M / (1 + Σ_c β′_c [L]^l h^p), closed form (one metal
 *   per species);
 * - a ligand, given the others: C_ℓ = [L]·P_ℓ(h) + Σ_c l·[complex], with each metal at its closed
 *   form, is strictly increasing in u_ℓ (a partial minimum of a convex function); solved by Newton
 *   on ln(total) − ln C_ℓ inside an analytic bracket, bisection when a step leaves it;
 * - several ligands: Gauss–Seidel sweeps over the ligands (block coordinate descent on the strictly
 *   convex function whose gradient is the mass balances, which converges), until no ligand moves.
 *
 * Every solve starts cold (free ligand = total), so results do not depend on earlier solves.
 */
import type { Aggregate } from "./aggregate";
import type { ComplexSetup } from "./complexation";
import { LN10, ZERO_CELSIUS_K } from "./physical-constants";
import { ChargeBalanceSolver } from "./solver-core";
import { pKaAtTemperature } from "./temperature";
import { solveLigand } from "./complex-ligand";

export class ComplexingSolver extends ChargeBalanceSolver {
  readonly setup: ComplexSetup;
  readonly nL: number;
  readonly nM: number;
  readonly nC: number;
  /** Per ligand: system index, total, charge of L, steps. */
  readonly ligSys: Int32Array;
  readonly ligC: Float64Array;
  readonly ligZ: Float64Array;
  readonly ligN: Int32Array;
  /** Per ligand: ln of the first step's conditional Ka′ index into lnKa (one entry per step). */
  readonly ligStep0: Int32Array;
  readonly lnKa: Float64Array;
  /** Per metal: total and charge. */
  readonly metT: Float64Array;
  readonly metZ: Float64Array;
  /** Per complex: ligand, metal (−1 none), ligands, protons, log β (25 °C), ΔrH°, charge, ln β(T), ln β′. */
  readonly cLig: Int32Array;
  readonly cMet: Int32Array;
  readonly cL: Float64Array;
  readonly cP: Float64Array;
  readonly cLogB: Float64Array;
  readonly cDH: Float64Array;
  readonly cZ: Float64Array;
  readonly cLnBT: Float64Array;
  readonly cLnBc: Float64Array;
  /** State at the current x: ln[L], ln[M], ln P_ℓ(h), and per complex ln of its concentration. */
  readonly u: Float64Array;
  readonly v: Float64Array;
  readonly lnP: Float64Array;
  readonly lnc: Float64Array;
  /** Per ligand at the current x: mean protons and mean square protons of the free forms, Σ|z|·w/P. */
  readonly pBar: Float64Array;
  readonly p2Bar: Float64Array;
  readonly absBar: Float64Array;
  /** Work space of the ligand solves (complex-ligand.ts): per metal D and dD/du; φ and φ′. */
  readonly scrD: Float64Array;
  readonly scrDD: Float64Array;
  readonly scrPhi = new Float64Array(2);
  /** Work space of the Schur complement (H_uu, H_xu), (nL + nM)². */
  private readonly huu: Float64Array;
  private readonly hxu: Float64Array;
  /** Strong base added (mol/L), for the buffer value by differences; 0 otherwise. */
  addedBase = 0;
  private readonly pMax0: number;
  private readonly pMin0: number;
  private tC = NaN;
  /** Gauss–Seidel sweeps of the last evaluation (diagnostics). */
  sweeps = 0;
  /** False when a mass balance hit its iteration cap (not expected). */
  innerOk = true;

  constructor(agg: Aggregate, setup: ComplexSetup) {
    const totals = agg.totals.slice();
    for (const s of setup.ligands) totals[s] = 0;
    let q = 0;
    let zz = 0;
    let abs = 0;
    agg.ions.forEach(({ ion, conc }, i) => {
      q += ion.charge * conc;
      abs += Math.abs(ion.charge) * conc;
      if (!setup.metals.includes(i)) zz += ion.charge * ion.charge * conc;
    });
    super(agg.systems, totals, q, 0.5 * zz, abs);
    this.setup = setup;
    const nL = setup.ligands.length;
    const nM = setup.metals.length;
    const nC = setup.complexes.length;
    this.nL = nL;
    this.nM = nM;
    this.nC = nC;
    this.ligSys = new Int32Array(nL);
    this.ligC = new Float64Array(nL);
    this.ligZ = new Float64Array(nL);
    this.ligN = new Int32Array(nL);
    this.ligStep0 = new Int32Array(nL);
    let steps = 0;
    for (let l = 0; l < nL; l++) {
      const s = setup.ligands[l];
      const sys = agg.systems[s];
      this.ligSys[l] = s;
      this.ligC[l] = agg.totals[s];
      this.ligN[l] = sys.steps.length;
      this.ligZ[l] = sys.topCharge - sys.steps.length;
      this.ligStep0[l] = steps;
      steps += sys.steps.length;
    }
    this.lnKa = new Float64Array(steps);
    this.metT = new Float64Array(nM);
    this.metZ = new Float64Array(nM);
    for (let j = 0; j < nM; j++) {
      const { ion, conc } = agg.ions[setup.metals[j]];
      this.metT[j] = conc;
      this.metZ[j] = ion.charge;
    }
    this.cLig = new Int32Array(nC);
    this.cMet = new Int32Array(nC);
    this.cL = new Float64Array(nC);
    this.cP = new Float64Array(nC);
    this.cLogB = new Float64Array(nC);
    this.cDH = new Float64Array(nC);
    this.cZ = new Float64Array(nC);
    this.cLnBT = new Float64Array(nC);
    this.cLnBc = new Float64Array(nC);
    // Bounds on bound protons per ligand: free forms 0…n, a complex p/l.
    const lo = new Float64Array(nL);
    const hi = Float64Array.from(this.ligN);
    for (let c = 0; c < nC; c++) {
      const { spec, ligand, metal } = setup.complexes[c];
      this.cLig[c] = ligand;
      this.cMet[c] = metal;
      this.cL[c] = spec.ligands;
      this.cP[c] = spec.protons;
      this.cLogB[c] = spec.logBeta;
      this.cDH[c] = spec.dH ?? 0;
      this.cZ[c] = (metal >= 0 ? this.metZ[metal] : 0) + spec.ligands * this.ligZ[ligand] + spec.protons;
      const per = spec.protons / spec.ligands;
      if (per < lo[ligand]) lo[ligand] = per;
      if (per > hi[ligand]) hi[ligand] = per;
    }
    let pMax = this.pMax;
    let pMin = this.pMin;
    for (let l = 0; l < nL; l++) {
      pMax += this.ligC[l] * (this.ligZ[l] + hi[l]);
      pMin += this.ligC[l] * (this.ligZ[l] + lo[l]);
    }
    this.pMax0 = pMax;
    this.pMin0 = pMin;
    this.pMax = pMax;
    this.pMin = pMin;
    this.u = new Float64Array(nL).fill(NaN);
    this.v = new Float64Array(nM);
    this.lnP = new Float64Array(nL);
    this.lnc = new Float64Array(nC);
    this.pBar = new Float64Array(nL);
    this.p2Bar = new Float64Array(nL);
    this.absBar = new Float64Array(nL);
    this.scrD = new Float64Array(nM);
    this.scrDD = new Float64Array(nM);
    const nu = nL + nM;
    this.huu = new Float64Array(nu * nu);
    this.hxu = new Float64Array(nu);
  }

  /** Sets the strong base added (mol/L) and moves the bracket with it. */
  setAddedBase(cb: number): void {
    this.addedBase = cb;
    this.pMax = this.pMax0 + cb;
    this.pMin = this.pMin0 + cb;
  }

  override setTemperature(temperatureC: number): void {
    super.setTemperature(temperatureC);
    if (temperatureC === this.tC) return;
    const T = temperatureC + ZERO_CELSIUS_K;
    // ln β(T): van 't Hoff on the formation reaction (its "pK" is −log β, with the formation ΔrH°).
    for (let c = 0; c < this.nC; c++) this.cLnBT[c] = -LN10 * pKaAtTemperature(-this.cLogB[c], this.cDH[c], 0, T);
    this.tC = temperatureC;
  }

  override setIonicStrength(I: number): void {
    super.setIonicStrength(I);
    const g = this.lnGamma1;
    for (let l = 0; l < this.nL; l++) {
      const s = this.ligSys[l];
      for (let k = 1; k <= this.ligN[l]; k++) this.lnKa[this.ligStep0[l] + k - 1] = Math.log(this.conditionalKa(s, k));
    }
    for (let c = 0; c < this.nC; c++) {
      const l = this.cLig[c];
      const m = this.cMet[c];
      const zm = m >= 0 ? this.metZ[m] : 0;
      const zl = this.ligZ[l];
      const z = this.cZ[c];
      this.cLnBc[c] = this.cLnBT[c] + g * (zm * zm + this.cL[c] * zl * zl + this.cP[c] - z * z);
    }
  }

  override solveLnH(xStart: number): boolean {
    if (Number.isNaN(xStart)) this.u.fill(NaN);
    return super.solveLnH(xStart);
  }

  /** ln P_ℓ(h) and the moments of the free forms' protons at x. */
  private freeForms(x: number): void {
    for (let l = 0; l < this.nL; l++) {
      const n = this.ligN[l];
      const o = this.ligStep0[l];
      const zl = this.ligZ[l];
      // ln w_p for p = 0…n protons: w_p = h^p / (Ka′_n·…·Ka′_{n−p+1}).
      let lw = 0;
      let top = 0;
      for (let p = 1; p <= n; p++) {
        lw += x - this.lnKa[o + n - p];
        if (lw > top) top = lw;
      }
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let sa = 0;
      lw = 0;
      for (let p = 0; p <= n; p++) {
        if (p > 0) lw += x - this.lnKa[o + n - p];
        const w = Math.exp(lw - top);
        s0 += w;
        s1 += p * w;
        s2 += p * p * w;
        sa += Math.abs(zl + p) * w;
      }
      this.lnP[l] = top + Math.log(s0);
      this.pBar[l] = s1 / s0;
      this.p2Bar[l] = s2 / s0;
      this.absBar[l] = sa / s0;
    }
  }

  /** Free metal j from the current free ligands: ln[M] = ln T − ln(1 + Σ exp(ln β′ + l·u + p·x)). */
  metalFree(j: number, x: number): void {
    let s = 1;
    for (let c = 0; c < this.nC; c++) {
      if (this.cMet[c] !== j) continue;
      s += Math.exp(this.cLnBc[c] + this.cL[c] * this.u[this.cLig[c]] + this.cP[c] * x);
    }
    this.v[j] = Math.log(this.metT[j]) - Math.log(s);
  }

  /** Solves every mass balance at x (the state u, v, lnc is then consistent with x). */
  private massBalances(x: number): void {
    this.freeForms(x);
    const nL = this.nL;
    let ok = true;
    let sweep = 0;
    for (; sweep < 2000; sweep++) {
      let moved = 0;
      for (let l = 0; l < nL; l++) {
        const before = this.u[l];
        if (!solveLigand(this, l, x)) ok = false;
        const d = Math.abs(this.u[l] - before);
        if (!(d <= moved)) moved = d;
      }
      if (nL === 1 || moved <= 1e-13) break;
    }
    this.sweeps = sweep + 1;
    for (let j = 0; j < this.nM; j++) this.metalFree(j, x);
    for (let c = 0; c < this.nC; c++) {
      const m = this.cMet[c];
      this.lnc[c] = this.cLnBc[c] + this.cL[c] * this.u[this.cLig[c]] + this.cP[c] * x + (m >= 0 ? this.v[m] : 0);
    }
    this.innerOk = ok && sweep < 2000;
  }

  override evaluate(x: number): void {
    super.evaluate(x);
    this.massBalances(x);
    const nL = this.nL;
    const nM = this.nM;
    const nu = nL + nM;
    const huu = this.huu;
    const hxu = this.hxu;
    huu.fill(0);
    let F = this.addedBase;
    let zz = this.addedBase;
    let abs = this.addedBase;
    let hxx = 0;
    for (let l = 0; l < nL; l++) {
      const free = Math.exp(this.u[l] + this.lnP[l]);
      const zl = this.ligZ[l];
      const pb = this.pBar[l];
      F += this.ligC[l] * zl + free * pb;
      zz += free * (zl * zl + 2 * zl * pb + this.p2Bar[l]);
      abs += free * this.absBar[l];
      hxx += free * this.p2Bar[l];
      hxu[l] = free * pb;
      huu[l * nu + l] = free;
    }
    for (let j = 0; j < nM; j++) {
      const m = Math.exp(this.v[j]);
      const z = this.metZ[j];
      zz += z * z * m;
      hxu[nL + j] = 0;
      huu[(nL + j) * nu + nL + j] = m;
    }
    for (let c = 0; c < this.nC; c++) {
      const conc = Math.exp(this.lnc[c]);
      const p = this.cP[c];
      const l = this.cLig[c];
      const L = this.cL[c];
      const z = this.cZ[c];
      F += p * conc;
      zz += z * z * conc;
      abs += Math.abs(z) * conc;
      hxx += p * p * conc;
      hxu[l] += p * L * conc;
      huu[l * nu + l] += L * L * conc;
      const m = this.cMet[c];
      if (m >= 0) {
        const j = nL + m;
        hxu[j] += p * conc;
        huu[j * nu + j] += conc;
        huu[l * nu + j] += L * conc;
        huu[j * nu + l] += L * conc;
      }
    }
    const schur = hxx - quadraticInverse(huu, hxu, nu);
    this.F += F;
    this.dF += schur > 0 ? schur : 0;
    this.absCharge += abs;
    this.ionicFromSpeciation += 0.5 * zz;
  }
}

/** bᵀ A⁻¹ b for a symmetric positive-definite A (n × n, row-major; overwritten), by Cholesky. */
function quadraticInverse(A: Float64Array, b: Float64Array, n: number): number {
  let q = 0;
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < i; k++) {
      let s = A[i * n + k];
      for (let m = 0; m < k; m++) s -= A[i * n + m] * A[k * n + m];
      A[i * n + k] = s / A[k * n + k];
    }
    let d = A[i * n + i];
    for (let m = 0; m < i; m++) d -= A[i * n + m] * A[i * n + m];
    if (!(d > 0)) return q;
    A[i * n + i] = Math.sqrt(d);
    // Forward substitution for y = L⁻¹ b, row i; q = |y|².
    let y = b[i];
    for (let m = 0; m < i; m++) y -= A[i * n + m] * b[m];
    y /= A[i * n + i];
    b[i] = y;
    q += y * y;
  }
  return q;
}
