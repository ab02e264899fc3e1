/**
 * pHRange: worst-case pH band over amount tolerances and pKa uncertainty.
 * Checks: the band's end points reproduce their pH, every point of the box lies inside the band
 * (fast-check), a dense grid never beats it, the interior extremum of a non-monotone case is found,
 * the linearised band agrees for small tolerances, the local-search fallback agrees with the
 * exhaustive search on a monotone case, a closed form for a single pKa, bad input.
 */
import fc from "fast-check";
import { phRange, type PHRangeValue } from "../../../src/chem/workflows";
import { mixtureAt } from "../../../src/chem/workflows/ph-range-model";
import type { Mixture } from "../../../src/chem";
import * as f from "./fixtures";

const phosphate = f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]);
const acetateTris = f.mixture([f.aceticAcid, 0.02], [f.sodiumAcetate, 0.03], [f.trisBase, 0.01], [f.HCl, 0.004]);

function pointInBox(r: PHRangeValue, u: readonly number[]): number[] {
  return r.quantities.map((q, i) => q.lo + u[i] * (q.hi - q.lo));
}

describe("pHRange: the band", () => {
  test.each([
    { label: "phosphate ±2 %", mix: phosphate, tol: 0.02, u: 0 },
    { label: "phosphate ±5 %, pKa ±0.03", mix: phosphate, tol: 0.05, u: 0.03 },
    { label: "acetate + Tris + HCl ±10 %", mix: acetateTris, tol: 0.1, u: 0 },
  ])("$label: the end points reproduce the band and the nominal pH lies inside", ({ label, mix, tol, u }) => {
    const r = f.ok(phRange(mix, tol, { pKaUncertainty: u }));
    f.expectAbs(f.pH(mixtureAt(r.mixture, r.quantities, r.lowAt.values)), r.low, 1e-12, `${label}: pH at lowAt`);
    f.expectAbs(f.pH(mixtureAt(r.mixture, r.quantities, r.highAt.values)), r.high, 1e-12, `${label}: pH at highAt`);
    f.expectAbs(r.nominal, f.pH(mix), 1e-12, `${label}: nominal`);
    expect(r.low).toBeLessThanOrEqual(r.nominal);
    expect(r.high).toBeGreaterThanOrEqual(r.nominal);
    expect(r.method).toBe("corners");
    expect(r.exhaustive).toBe(true);
  });

  test("every point of the box has its pH inside the band (random points)", () => {
    const mix = acetateTris;
    const r = f.ok(phRange(mix, [0.1, 0.05, 0.2, 0.1], { pKaUncertainty: 0.02 }));
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: r.quantities.length, maxLength: r.quantities.length }), (u) => {
        const p = f.pH(mixtureAt(r.mixture, r.quantities, pointInBox(r, u)));
        if (!(p >= r.low - 1e-12 && p <= r.high + 1e-12)) throw new Error(`point ${u}: pH ${p} outside [${r.low}, ${r.high}]`);
      }),
      { numRuns: 300 },
    );
  });

  test("a dense grid over two amounts never beats the band, and reaches it within 1e-9", () => {
    const r = f.ok(phRange(phosphate, 0.1));
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i <= 40; i++) {
      for (let j = 0; j <= 40; j++) {
        const p = f.pH(mixtureAt(r.mixture, r.quantities, pointInBox(r, [i / 40, j / 40])));
        lo = Math.min(lo, p);
        hi = Math.max(hi, p);
      }
    }
    expect(lo).toBeGreaterThanOrEqual(r.low - 1e-12);
    expect(hi).toBeLessThanOrEqual(r.high + 1e-12);
    f.expectAbs(r.low, lo, 1e-9, "grid minimum vs band low");
    f.expectAbs(r.high, hi, 1e-9, "grid maximum vs band high");
  });

  // Davies: log γ = −A z²(√I/(1 + √I) − 0.3 I) has its most negative value near I ≈ 0.39 mol/L, so
  // the pH of a phosphate buffer (pH ≈ pK2 − 3A·f(I) + log ratio) is lowest there: NaCl 0.35 M ±50 %
  // brackets it. The low end is an interior point, lower than both corners.
  test("an interior extremum (salt near the top of the Davies curve) is found by the refinement", () => {
    const mix = f.mixture([f.KH2PO4, 0.01], [f.Na2HPO4, 0.01], [f.NaCl, 0.35]);
    const r = f.ok(phRange(mix, [0, 0, 0.5]));
    const atLo = f.pH(f.mixture([f.KH2PO4, 0.01], [f.Na2HPO4, 0.01], [f.NaCl, 0.175]));
    const atHi = f.pH(f.mixture([f.KH2PO4, 0.01], [f.Na2HPO4, 0.01], [f.NaCl, 0.525]));
    let scan = Infinity;
    for (let i = 0; i <= 2000; i++) scan = Math.min(scan, f.pH(f.mixture([f.KH2PO4, 0.01], [f.Na2HPO4, 0.01], [f.NaCl, 0.175 + (0.35 * i) / 2000])));
    expect(r.low).toBeLessThan(Math.min(atLo, atHi) - 1e-4);
    f.expectAbs(r.low, scan, 1e-8, "interior minimum vs a 2000-step scan");
    const x = r.lowAt.values[0];
    expect(x).toBeGreaterThan(0.175);
    expect(x).toBeLessThan(0.525);
  });
});

describe("pHRange: linearised estimate and closed forms", () => {
  // For small tolerances the worst case is linear to second order: the two bands agree within a
  // few times (half-width)²·|∂²pH| — below 1e-6 pH at ±0.1 %.
  test("linear and exact bands agree at ±0.1 %", () => {
    const r = f.ok(phRange(acetateTris, 0.001));
    f.expectAbs(r.linear.low, r.low, 1e-6, "linear low vs exact low");
    f.expectAbs(r.linear.high, r.high, 1e-6, "linear high vs exact high");
  });

  // One monoprotic system, pKa ± u, amounts exact, ideal activity: pH depends on pKa through the
  // charge balance only, and for an equimolar buffer well away from pH 7 it follows the pKa almost
  // one for one (Henderson–Hasselbalch), so the band is pH₀ ± u within 1 %·u.
  test("acetate 0.05/0.05 M with pKa ±0.05: band pH₀ ± 0.05 (ideal)", () => {
    const mix = f.mixture([f.aceticAcid, 0.05], [f.sodiumAcetate, 0.05]);
    const r = f.ok(phRange(mix, 0, { pKaUncertainty: 0.05, activity: "ideal" }));
    expect(r.quantities.map((q) => q.label)).toEqual(["acetate pKa1"]);
    f.expectAbs(r.high - r.nominal, 0.05, 5e-4, "high − nominal");
    f.expectAbs(r.nominal - r.low, 0.05, 5e-4, "nominal − low");
  });

  test("no tolerance at all: a zero-width band", () => {
    const r = f.ok(phRange(phosphate, 0));
    expect(r.method).toBe("none");
    expect(r.low).toBe(r.nominal);
    expect(r.high).toBe(r.nominal);
  });
});

describe("pHRange: beyond the exhaustive limit", () => {
  // 13 varied quantities: 8 amounts and 5 pKa steps (acetate 1, phosphate 3, Tris 1). With
  // maxExhaustive 13 all 8192 corners are evaluated; with the default (12) the flagged local search
  // runs. In this mixture pH is monotone in every quantity, so both must agree.
  const mix: Mixture = f.mixture(
    [f.KH2PO4, 0.01], [f.Na2HPO4, 0.012], [f.aceticAcid, 0.01], [f.sodiumAcetate, 0.01],
    [f.trisBase, 0.01], [f.HCl, 0.004], [f.NaCl, 0.05], [f.NaOH, 0.001],
  );
  test("the local search is flagged and matches the exhaustive corners on a monotone case", () => {
    const fallback = f.ok(phRange(mix, 0.05, { pKaUncertainty: 0.02 }));
    expect(fallback.quantities.length).toBe(13);
    expect(fallback.method).toBe("local-search");
    expect(fallback.exhaustive).toBe(false);
    const full = f.ok(phRange(mix, 0.05, { pKaUncertainty: 0.02, maxExhaustive: 13 }));
    expect(full.method).toBe("corners");
    expect(full.exhaustive).toBe(true);
    f.expectAbs(fallback.low, full.low, 1e-9, "local-search low vs all corners");
    f.expectAbs(fallback.high, full.high, 1e-9, "local-search high vs all corners");
  });
});

describe("pHRange: entries of the same substance", () => {
  // The engine sees only the sum of two entries of one component; the sums reachable from
  // independent tolerances fill [Σ c(1 − t), Σ c(1 + t)] exactly, so splitting an amount in two
  // entries must give the band of the merged entry: Na₂HPO₄ 0.010 ± 2 % + 0.015 ± 4 % is
  // 0.025 mol/L from 0.0242 to 0.0258, i.e. ± 3.2 %.
  test("two entries of one component give the band of their merged entry", () => {
    const split = f.ok(phRange(f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.01], [f.Na2HPO4, 0.015]), [0.05, 0.02, 0.04]));
    const merged = f.ok(phRange(f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]), [0.05, 0.032]));
    expect(split.mixture.length).toBe(2);
    f.expectAbs(split.low, merged.low, 1e-12, "split vs merged, low");
    f.expectAbs(split.high, merged.high, 1e-12, "split vs merged, high");
  });

  test("more than 64 varied quantities → out-of-range", () => {
    const many = Array.from({ length: 70 }, (_, i) => ({
      component: { id: `salt ${i}`, name: `salt ${i}`, systems: [], ions: [{ ion: { id: `ion ${i}`, name: `ion ${i}`, charge: i % 2 === 0 ? 1 : -1 }, stoich: 1 }] },
      conc: 0.001,
    }));
    const r = phRange([...phosphate, ...many], 0.01);
    expect(r.ok ? "ok" : r.code).toBe("out-of-range");
    if (!r.ok) expect(r.message).toContain("at most 64");
  });
});

describe("pHRange: bad input", () => {
  test.each([
    { label: "tolerance 1", tol: 1 as number | number[], opts: {}, text: "tolerance" },
    { label: "tolerance −0.1", tol: -0.1, opts: {}, text: "tolerance" },
    { label: "wrong number of tolerances", tol: [0.1], opts: {}, text: "one per mixture entry" },
    { label: "tolerance NaN", tol: [0.1, NaN], opts: {}, text: "tolerance of entry 2" },
    { label: "pKa uncertainty −1", tol: 0.1, opts: { pKaUncertainty: -1 }, text: "pKa uncertainty" },
    { label: "maxExhaustive 40", tol: 0.1, opts: { maxExhaustive: 40 }, text: "maxExhaustive" },
  ])("$label → bad-input", ({ tol, opts, text }) => {
    const r = phRange(phosphate, tol, opts);
    expect(r.ok ? "ok" : r.code).toBe("bad-input");
    if (!r.ok) expect(r.message).toContain(text);
  });
});
