/**
 * Buffer value β of standards against Lange's Handbook of Chemistry, 15th ed., Table 8.15 (V),
 * and the ideal-solution identity.
 *
 * Tolerance 0.0015 mol/(L·pH): the table prints β to 0.001 (±0.0005 rounding) and does not state
 * its activity treatment; for these solutions the activity correction itself moves β by 0.002–0.003
 * (Davies vs ideal), so another 0.001 is allowed for the convention. β here is dC(NaOH)/dpH with
 * pH = −log a(H⁺), Davies, 25 °C.
 */
import { solveEquilibrium, kw, type Mixture } from "../../src/chem";
import * as f from "./fixtures";

const TOL = 0.0015;

function betaOf(mix: Mixture, activity: "davies" | "ideal" = "davies") {
  const r = solveEquilibrium(mix, { temperatureC: 25, activity });
  if (!r.ok) throw new Error(r.message);
  return r;
}

describe("β of standards vs Lange's Table 8.15", () => {
  test("KH phthalate 0.05 M: 0.016", () => {
    f.expectAbs(betaOf(f.mixture([f.KHphthalate, 0.05])).beta, 0.016, TOL, "β KHP 0.05 M");
  });
  test("phosphate 0.025/0.025 M: 0.029", () => {
    f.expectAbs(betaOf(f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025])).beta, 0.029, TOL, "β phosphate 0.025/0.025 M");
  });

  // Known failure (documented, asserted): borax 0.01 M is tabulated as 0.020, below ln10·C/4 =
  // 0.0230, the largest β a one-step acid of C = 0.04 mol/L total can have in an ideal solution; the
  // model gives 0.0237 (Davies) and 0.0231 (ideal). The tabulated value must include effects outside
  // a single B(OH)₃/B(OH)₄⁻ step (polyborate ions form at this boron level — from memory,
  // unverified), so no choice of the borate constants can match it.
  test("known failure: borax 0.01 M (tabulated 0.020) stays 0.003–0.005 above the table", () => {
    const beta = betaOf(f.mixture([f.borax, 0.01])).beta;
    const diff = beta - 0.02;
    if (!(diff > TOL && diff < 0.005)) {
      throw new Error(`borax β no longer deviates as documented\n  actual ${beta}\n  expected 0.020 + (${TOL}…0.005)`);
    }
    expect(diff).toBeGreaterThan(TOL);
  });
});

describe("ideal-solution identity β = ln10·(h + Kw/h + Σ C·Var)", () => {
  test("one-step acid at pH = pKa: β = ln10·(C/4 + h + Kw/h)", () => {
    // Acetic acid 0.05 + sodium acetate 0.05, ideal: h ≈ Ka, α = ½ within the small water terms.
    const eq = betaOf(f.mixture([f.aceticAcid, 0.05], [f.sodiumAcetate, 0.05]), "ideal");
    const h = eq.species.find((s) => s.name === "H+")!.conc;
    const a1 = eq.species.find((s) => s.systemId === "acetate" && s.charge === -1)!.fraction;
    const expected = Math.LN10 * (h + kw(25) / h + 0.1 * a1 * (1 - a1));
    f.expectRel(eq.beta, expected, 1e-12, "β ideal acetate 0.05/0.05");
  });
  test("strong acid alone: β = ln10·(h + Kw/h) (HCl 0.01 M, ideal)", () => {
    const eq = betaOf(f.mixture([f.HCl, 0.01]), "ideal");
    const h = eq.species.find((s) => s.name === "H+")!.conc;
    f.expectRel(eq.beta, Math.LN10 * (h + kw(25) / h), 1e-12, "β ideal HCl 0.01");
  });
});
