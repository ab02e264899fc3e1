/**
 * Buffer value β at a solved state, analytic.
 *
 * Definition: β = dC_b/dpH, where C_b is NaOH added without change of volume (one Na⁺ per OH⁻) and
 * pH = −log10 a(H⁺) is the reported pH. Units mol/(L·pH).
 *
 * Method: the state (x = ln[H⁺], I) solves two equations,
 *   F(x, I) = h − K′w/h + Q + C_b + Σ C·(z0 − D) = 0           (charge balance)
 *   H(x, I) = I − [I_strong + ½C_b + ½(h + K′w/h) + ½ Σ C·Σ α_k z_k²] = 0   (ionic strength)
 * with ln γ(z) = z²·g(I). With species k of a system (k protons lost, charge z_k = z0 − k), and
 * w_k = z0² − z_k² − k (so that ∂ln α_k/∂I = g′·(w_k − w̄)), the partial derivatives are
 *   F_x = h + K′w/h + Σ C·Var(k)             F_I = 2g′·K′w/h − g′·Σ C·Cov(k, w)
 *   H_x = −½(h − K′w/h − Σ C·Cov(k, z²))     H_I = 1 + g′·K′w/h − ½ g′·Σ C·Cov(w, z²)
 * and ∂F/∂C_b = 1, ∂H/∂C_b = −½. The implicit-function theorem gives dx/dC_b and dI/dC_b, and
 * dpH/dC_b = −(dx/dC_b + g′·dI/dC_b)/ln 10; β is its reciprocal.
 * With ideal activity (g′ = 0) this is β = ln10·(h + Kw/h + Σ C·Var(k)).
 *
 * Notes: checked against a Richardson-extrapolated central difference of the titration curve to
 * 1e-6 relative (test/chem/properties.test.ts).
 */
import { LN10 } from "./physical-constants";
import type { ChargeBalanceSolver } from "./solver-core";

/** β, mol/(L·pH), at the state the solver holds (call after a successful solve). */
export function bufferValue(core: ChargeBalanceSolver): number {
  const h = Math.exp(core.x);
  const invH = 1 / h;
  const oh = core.kwc * invH;
  const gp = core.lnGamma1Derivative();
  let varSum = 0;
  let covKW = 0;
  let covKQ = 0;
  let covWQ = 0;
  for (let s = 0; s < core.nSys; s++) {
    const C = core.total(s);
    if (C === 0) continue;
    const n = core.stepCount(s);
    const z0 = core.topChargeOf(s);
    // First pass: means of k, w and z² over the species (relative amounts t_k, rescaled against
    // overflow as in the solver). Second pass: variance and covariances as sums of products of
    // deviations, which avoids cancellation.
    let t = 1;
    let s0 = 1;
    let sk = 0;
    let sw = 0;
    let sq = z0 * z0;
    for (let k = 1; k <= n; k++) {
      t *= core.conditionalKa(s, k) * invH;
      const z = z0 - k;
      s0 += t;
      sk += k * t;
      sw += (z0 * z0 - z * z - k) * t;
      sq += z * z * t;
      if (t > 1e200) {
        t *= 1e-200;
        s0 *= 1e-200;
        sk *= 1e-200;
        sw *= 1e-200;
        sq *= 1e-200;
      }
    }
    const inv = 1 / s0;
    const kBar = sk * inv;
    const wBar = sw * inv;
    const qBar = sq * inv;
    // Species 0 (t_0 = 1): k = 0, w = 0, z² = z0².
    let vkk = kBar * kBar;
    let vkw = kBar * wBar;
    let vkq = -kBar * (z0 * z0 - qBar);
    let vwq = -wBar * (z0 * z0 - qBar);
    t = 1;
    for (let k = 1; k <= n; k++) {
      t *= core.conditionalKa(s, k) * invH;
      const z = z0 - k;
      const dk = k - kBar;
      const dw = z0 * z0 - z * z - k - wBar;
      const dq = z * z - qBar;
      vkk += dk * dk * t;
      vkw += dk * dw * t;
      vkq += dk * dq * t;
      vwq += dw * dq * t;
      if (t > 1e200) {
        t *= 1e-200;
        vkk *= 1e-200;
        vkw *= 1e-200;
        vkq *= 1e-200;
        vwq *= 1e-200;
      }
    }
    varSum += C * vkk * inv;
    covKW += C * vkw * inv;
    covKQ += C * vkq * inv;
    covWQ += C * vwq * inv;
  }
  const Fx = h + oh + varSum;
  const FI = 2 * gp * oh - gp * covKW;
  const Hx = -0.5 * (h - oh - covKQ);
  const HI = 1 + gp * oh - 0.5 * gp * covWQ;
  const det = Fx * HI - FI * Hx;
  const dx = (-HI - 0.5 * FI) / det;
  const dI = (0.5 * Fx + Hx) / det;
  const dpH = -(dx + gp * dI) / LN10;
  return 1 / dpH;
}
