/**
 * The buffer-break case: a buffer overwhelmed by strong acid or base gives the strong acid or base
 * pH, and the regime says so. The expected pH is computed here from the excess and the Davies
 * activity coefficient (log γ = −A(√I/(1+√I) − 0.3 I), Davies 1962) at the ionic strength of the
 * fully protonated / deprotonated mixture, independently of the solver.
 */
import { debyeHuckelA, pKw, solveEquilibrium } from "../../src/chem";
import * as f from "./fixtures";

const A25 = debyeHuckelA(25);
const davies = (I: number): number => -A25 * (Math.sqrt(I) / (1 + Math.sqrt(I)) - 0.3 * I);

// ±0.003 pH: acetic acid's own dissociation at pH < 1 (Ka/h ≈ 1e-4, i.e. < 0.0001 pH) and acetate's
// hydrolysis at pH > 13 are neglected in the expected value, and I is taken from the idealised
// composition (a 1e-4 relative change in I moves log γ by < 1e-5).
const TOL = 0.003;

describe("acetate buffer 0.05/0.05 M overwhelmed by strong acid or base (Davies, 25 °C)", () => {
  const buffer: [f.Component, number][] = [[f.aceticAcid, 0.05], [f.sodiumAcetate, 0.05]];

  test("+ HCl 0.2 M: excess 0.15 M strong acid, regime excess-strong-acid", () => {
    const eq = solveEquilibrium(f.mixture(...buffer, [f.HCl, 0.2]));
    if (!eq.ok) throw new Error(eq.message);
    // Na⁺ 0.05, Cl⁻ 0.2, H⁺ 0.15, acetate all HAc: I = ½(0.05 + 0.2 + 0.15) = 0.2.
    const expected = -Math.log10(0.15) - davies(0.2);
    f.expectAbs(eq.pH, expected, TOL, "acetate 0.05/0.05 + HCl 0.2");
    expect(eq.regime).toBe("excess-strong-acid");
  });

  test("+ NaOH 0.2 M: excess 0.15 M strong base, regime excess-strong-base", () => {
    const eq = solveEquilibrium(f.mixture(...buffer, [f.NaOH, 0.2]));
    if (!eq.ok) throw new Error(eq.message);
    // Na⁺ 0.25, acetate⁻ 0.1, OH⁻ 0.15: I = ½(0.25 + 0.1 + 0.15) = 0.25; pH = pKw + log a(OH⁻).
    const expected = pKw(25) + Math.log10(0.15) + davies(0.25);
    f.expectAbs(eq.pH, expected, TOL, "acetate 0.05/0.05 + NaOH 0.2");
    expect(eq.regime).toBe("excess-strong-base");
  });

  test("+ HCl 0.02 M (within capacity): still a buffer", () => {
    const eq = solveEquilibrium(f.mixture(...buffer, [f.HCl, 0.02]));
    expect(eq.ok && eq.regime).toBe("buffer");
  });

  test("no acid–base system: no-buffer (NaCl 0.1 M gives pH ≈ ½pKw, corrected for activity)", () => {
    const eq = solveEquilibrium(f.mixture([f.NaCl, 0.1]));
    if (!eq.ok) throw new Error(eq.message);
    expect(eq.regime).toBe("no-buffer");
    // a(H⁺) = a(OH⁻) = √Kw exactly in a neutral salt: pH = pKw/2 (1e-9: solver precision).
    f.expectAbs(eq.pH, pKw(25) / 2, 1e-9, "NaCl 0.1 M");
  });

  test("pure water: pH = pKw/2 at 0, 25, 60 and 100 °C, no-buffer", () => {
    for (const t of [0, 25, 60, 100]) {
      const eq = solveEquilibrium([], { temperatureC: t });
      if (!eq.ok) throw new Error(eq.message);
      f.expectAbs(eq.pH, pKw(t) / 2, 1e-9, `water at ${t} °C`);
      expect(eq.regime).toBe("no-buffer");
    }
  });
});
