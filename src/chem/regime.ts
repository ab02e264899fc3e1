/**
 * Which root the charge balance landed on.
 *
 * Let S = Q + Σ C·z0 (strong-ion charge plus the charge of every system in its fully protonated
 * form) and N = Σ C·n (protons the systems can give up). The charge balance reads
 *   Σ C·D = S + [H⁺] − [OH⁻],   0 ≤ Σ C·D ≤ N,
 * so S < 0 means strong acid beyond what the fully protonated systems can hold, and S > N strong
 * base beyond what the fully deprotonated systems can take up.
 *
 * - "no-buffer": no acid–base system with a positive total.
 * - "excess-strong-acid": S < 0 and −S ≥ ½[H⁺]: the unabsorbed strong acid supplies at least half
 *   of the free H⁺ (the systems are fully protonated and the pH follows the excess acid).
 * - "excess-strong-base": S > N and S − N ≥ ½[OH⁻]: likewise for the unabsorbed strong base.
 * - "buffer": otherwise.
 */
import type { Regime } from "./types";

export function classifyRegime(
  hasSystem: boolean,
  S: number,
  N: number,
  h: number,
  oh: number,
): Regime {
  if (!hasSystem) return "no-buffer";
  if (S < 0 && -S >= 0.5 * h) return "excess-strong-acid";
  if (S > N && S - N >= 0.5 * oh) return "excess-strong-base";
  return "buffer";
}
