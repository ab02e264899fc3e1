/**
 * One ligand's mass balance at fixed [H⁺] and fixed other ligands (complex-solver.ts):
 *   S(u) = [L]·P(h) + Σ_c l_c·[complex c] = C,  u = ln[L],
 * with each metal at its closed form [M] = T_M/D_M, D_M = 1 + Σ_c β′_c [L_c]^l h^p over M's complexes.
 * S is strictly increasing in u, so φ(u) = ln S(u) − ln C has one root. Bracket: at
 * u_hi = ln C − ln P the free forms alone hold C (φ ≥ 0); at u_lo each of the K + 1 terms is at most
 * C/(K + 1) (a complex's metal at most T_M), so φ ≤ 0. Newton on φ inside the bracket (exact in one
 * step when one term dominates), bisection when a step leaves it or does not halve |φ|.
 */
import type { ComplexingSolver } from "./complex-solver";

const EPS = 2.220446049250313e-16;
const MAX_ITERATIONS = 200;

/** φ and dφ/du at u (sets core.u[l] = u). */
function phi(core: ComplexingSolver, l: number, x: number, u: number, lnC: number, out: Float64Array): void {
  core.u[l] = u;
  const nC = core.nC;
  const D = core.scrD;
  const dD = core.scrDD;
  for (let j = 0; j < core.nM; j++) {
    D[j] = 1;
    dD[j] = 0;
  }
  for (let c = 0; c < nC; c++) {
    const j = core.cMet[c];
    if (j < 0) continue;
    const lig = core.cLig[c];
    const e = Math.exp(core.cLnBc[c] + core.cL[c] * core.u[lig] + core.cP[c] * x);
    D[j] += e;
    if (lig === l) dD[j] += core.cL[c] * e;
  }
  const free = Math.exp(u + core.lnP[l]);
  let S = free;
  let dS = free;
  for (let c = 0; c < nC; c++) {
    if (core.cLig[c] !== l) continue;
    const L = core.cL[c];
    const j = core.cMet[c];
    let conc = Math.exp(core.cLnBc[c] + L * u + core.cP[c] * x);
    let slope = L;
    if (j >= 0) {
      conc *= core.metT[j] / D[j];
      slope -= dD[j] / D[j];
    }
    S += L * conc;
    dS += L * conc * slope;
  }
  out[0] = Math.log(S) - lnC;
  out[1] = dS / S;
}

/** Solves ligand l's mass balance at x; leaves the root in core.u[l]. False only at the iteration cap. */
export function solveLigand(core: ComplexingSolver, l: number, x: number): boolean {
  const C = core.ligC[l];
  const lnC = Math.log(C);
  const lnP = core.lnP[l];
  let hi = lnC - lnP;
  let K = 1;
  for (let c = 0; c < core.nC; c++) if (core.cLig[c] === l) K++;
  let lo = Math.log(C / K) - lnP;
  for (let c = 0; c < core.nC; c++) {
    if (core.cLig[c] !== l) continue;
    const j = core.cMet[c];
    const L = core.cL[c];
    const b = (Math.log(C / (K * L)) - core.cLnBc[c] - core.cP[c] * x - (j >= 0 ? Math.log(core.metT[j]) : 0)) / L;
    if (b < lo) lo = b;
  }
  const out = core.scrPhi;
  const start = core.u[l];
  let u = start > lo && start < hi ? start : hi;
  let lastAbs = Infinity;
  for (let it = 0; it < MAX_ITERATIONS; it++) {
    phi(core, l, x, u, lnC, out);
    const f = out[0];
    const af = Math.abs(f);
    if (af <= 4 * EPS) return true;
    if (f < 0) lo = u;
    else hi = u;
    let un = u - f / out[1];
    if (!(un > lo && un < hi) || af > 0.5 * lastAbs) un = 0.5 * (lo + hi);
    lastAbs = af;
    const step = Math.abs(un - u);
    u = un;
    if (step <= 2 * EPS * Math.max(1, Math.abs(u)) || hi - lo <= 2 * EPS * Math.max(1, Math.abs(u))) {
      core.u[l] = u;
      return true;
    }
  }
  core.u[l] = u;
  return false;
}
