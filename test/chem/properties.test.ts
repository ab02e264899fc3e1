/**
 * Identities that must hold at every solved state, over thousands of random mixtures (fast-check).
 * These are consequences of the model's definitions, not published values: charge balance, mass
 * balance, fractions summing to 1, a(H⁺)·a(OH⁻) = Kw, ionic-strength self-consistency, pH rising
 * with added base, analytic β equal to the derivative of the titration curve.
 * They hold for the solver over its whole domain, so the states are solved with solveBeyondLimit
 * (the ionic-strength limit is a policy on what is reported, tested in ionic-limit.test.ts); the
 * fast path is compared where it gives a value and must refuse exactly beyond the limit.
 */
import fc from "fast-check";
import { beyondIonicLimit, kw, prepare, solvePH, type Equilibrium, type Mixture } from "../../src/chem";
import { caseArb, concArb, describeCase, NaOHComponent, type Case } from "./arbitraries";

/** Set CHEM_PROPERTY_RUNS_SCALE=10 (or more) for a longer local search; the default keeps the run short. */
const SCALE = Number(process.env.CHEM_PROPERTY_RUNS_SCALE ?? "1");

function solved(c: Case, extraBase = 0): Equilibrium {
  const mix: Mixture = extraBase > 0 ? [...c.mix, { component: NaOHComponent, conc: extraBase }] : c.mix;
  const p = prepare(mix);
  if (!p.ok) throw new Error(`${describeCase(c)}: ${p.message}`);
  const r = p.solveBeyondLimit({ temperatureC: c.temperatureC, activity: c.activity });
  if (!r.ok) throw new Error(`${describeCase(c)} + NaOH ${extraBase}: ${r.code} ${r.message}`);
  return r;
}

function check(cond: boolean, c: Case, what: string, actual: number, expected: number, tol: number): void {
  if (!cond) {
    throw new Error(`${what}\n  input ${describeCase(c)}\n  actual ${actual}\n  expected ${expected} ± ${tol}`);
  }
}

describe("identities at the solved state (2000 random mixtures)", () => {
  test("finite results, charge balance, mass balance, fractions, Kw, ionic strength", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const eq = solved(c);
        const numbers = [eq.pH, eq.pcH, eq.ionicStrength, eq.gammaH, eq.pKw, eq.beta, eq.residual];
        for (const sp of eq.species) numbers.push(sp.conc, sp.fraction);
        check(numbers.every(Number.isFinite), c, "every number finite", NaN, NaN, 0);

        // Charge balance, recomputed from the species list: ≤ 1e-10 of the largest charge term
        // (the solver stops at a few ulps; 1e-10 leaves room for summation order).
        let sum = 0;
        let largest = 0;
        for (const sp of eq.species) {
          sum += sp.charge * sp.conc;
          largest = Math.max(largest, Math.abs(sp.charge * sp.conc));
        }
        check(Math.abs(sum) <= 1e-10 * largest, c, "charge balance Σ z·c", sum, 0, 1e-10 * largest);

        // Mass balance and fractions per system (relative 1e-12: a sum of ≤ 4 positive terms).
        for (const e of c.mix) {
          const sys = e.component.systems[0]?.system;
          if (!sys) continue;
          const sp = eq.species.filter((s) => s.systemId === sys.id);
          const total = sp.reduce((a, s) => a + s.conc, 0);
          const frac = sp.reduce((a, s) => a + s.fraction, 0);
          check(Math.abs(total - e.conc) <= 1e-12 * e.conc, c, `mass balance of ${sys.id}`, total, e.conc, 1e-12 * e.conc);
          check(Math.abs(frac - 1) <= 1e-12, c, `fractions of ${sys.id} sum to 1`, frac, 1, 1e-12);
        }

        // a(H⁺)·a(OH⁻) = Kw(T): γ(H⁺) = γ(OH⁻) (both singly charged). 1e-12 in log10 units.
        const h = eq.species.find((s) => s.name === "H+")!.conc;
        const oh = eq.species.find((s) => s.name === "OH-")!.conc;
        const logIonProduct = Math.log10(eq.gammaH * h * eq.gammaH * oh);
        const logKw = Math.log10(kw(c.temperatureC));
        check(Math.abs(logIonProduct - logKw) <= 1e-12, c, "log10 a(H+)·a(OH-)", logIonProduct, logKw, 1e-12);

        // Ionic strength ½Σ z²c over the species equals the reported I (self-consistency 1e-12,
        // checked at 1e-10 for summation order).
        const I = 0.5 * eq.species.reduce((a, s) => a + s.charge * s.charge * s.conc, 0);
        check(Math.abs(I - eq.ionicStrength) <= 1e-10 * I, c, "ionic strength ½Σz²c", eq.ionicStrength, I, 1e-10 * I);

        // The fast path gives the same pH, bit for bit (same iteration path), within the limit, and
        // refuses beyond it.
        const fast = solvePH(c.mix, { temperatureC: c.temperatureC, activity: c.activity });
        if (beyondIonicLimit(eq.ionicStrength)) check(!fast.ok && fast.code === "beyond-limit", c, "solvePH refuses beyond the limit", eq.ionicStrength, 1, 0);
        else check(fast.ok && fast.pH === eq.pH, c, "solvePH equals the full solve", fast.ok ? fast.pH : NaN, eq.pH, 0);
      }),
      { numRuns: 2000 * SCALE },
    );
  });
});

describe("titration with NaOH (1000 random mixtures each)", () => {
  test("pH strictly increases as strong base is added", () => {
    fc.assert(
      fc.property(caseArb, concArb, (c, dose) => {
        const before = solved(c, dose).pH;
        const after = solved(c, dose * 1.5).pH;
        check(after > before, c, `pH with NaOH ${dose * 1.5} > pH with NaOH ${dose}`, after, before, 0);
      }),
      { numRuns: 1000 * SCALE },
    );
  });

  // Tolerance: 1e-6 relative, plus the floating-point noise of the numerical derivative itself.
  // Each pH carries rounding noise of up to ~8·ε·Σ|z·c|/β (the charge balance cannot be resolved
  // better than the rounding of its largest terms, and dpH = dF/β); a central difference over ±ΔpH
  // divides it by ΔpH and Richardson extrapolation triples it. Where that bound exceeds 1e-7 (tiny β
  // next to large cancelling strong-ion terms, e.g. near an equivalence point) the step grows, up to
  // ΔpH = 0.02, where the O(ΔpH⁴) truncation error is still below 1e-6.
  test("analytic β equals the derivative dC(NaOH)/dpH of the titration curve within 1e-6 relative", () => {
    const EPS = Number.EPSILON;
    fc.assert(
      fc.property(caseArb, concArb, (c, dose) => {
        // Test point: NaOH at `base`, large enough for a central difference around it.
        const beta0 = solved(c, dose).beta;
        const base = dose + 0.1 * Math.abs(beta0);
        const eq = solved(c, base);
        const beta = eq.beta;
        const absCharge = eq.species.reduce((a, sp) => a + Math.abs(sp.charge * sp.conc), 0);
        const noiseAt = (dpH: number): number => (24 * EPS * absCharge) / (Math.abs(beta) * dpH);
        let dpH = 1e-3;
        if (noiseAt(dpH) > 1e-7) dpH = Math.min(0.02, noiseAt(1) / 1e-7);
        const d = Math.min(dpH * Math.abs(beta), base / 4);
        const pH = (cb: number): number => solved(c, cb).pH;
        const slope = (step: number): number => (pH(base + step) - pH(base - step)) / (2 * step);
        // Richardson extrapolation of the central difference: error O(step⁴).
        const s1 = slope(d);
        const s2 = slope(d / 2);
        const numeric = 1 / ((4 * s2 - s1) / 3);
        const rtol = 1e-6 + noiseAt(d / Math.abs(beta));
        check(Math.abs(beta - numeric) <= rtol * Math.abs(numeric), c, `β at NaOH ${base} (ΔpH ${d / Math.abs(beta)})`, beta, numeric, rtol * Math.abs(numeric));
      }),
      { numRuns: 1000 * SCALE },
    );
  });
});
