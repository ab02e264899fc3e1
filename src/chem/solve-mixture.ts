/**
 * Entry points of the equilibrium engine.
 *
 * solveEquilibrium(mix, opts): the full Equilibrium (pH = −log10 a(H⁺), p[H], I, γH, pKw, β, every
 * species including strong ions, H⁺ and OH⁻, residual, iterations, regime, warnings) or a Failure.
 * solvePH(mix, opts): the fast path, pH, p[H] and I only.
 *
 * Model and method: see solver-core.ts (charge balance, bracket, convergence), ionic-strength-iteration.ts, beta.ts (β),
 * regime.ts (regimes) and README.md.
 */
import { prepare } from "./prepared";
import type { ChemOptions, Equilibrium, Failure, Mixture, PHResult } from "./types";

/** Solves a mixture for its full equilibrium. */
export function solveEquilibrium(mix: Mixture, opts?: ChemOptions): Equilibrium | Failure {
  const p = prepare(mix);
  if (!p.ok) return p;
  return p.solve(opts);
}

/** Solves a mixture for pH, p[H] and ionic strength only (allocation-light). */
export function solvePH(mix: Mixture, opts?: ChemOptions): PHResult {
  const p = prepare(mix);
  if (!p.ok) return p;
  return p.solvePH(opts);
}
