/**
 * curve: titration curves with dilution, and equivalence points as maxima of |dpH/dv|.
 * Checks: stoichiometric equivalence volumes (c_a·V = c_b·v and its multiples) for strong and weak
 * acids and bases, the pH there against the solution of the equivalence composition, rows against
 * the engine at the same composition, monotonicity, no false points, bad input.
 */
import fc from "fast-check";
import { pKw, type Component } from "../../../src/chem";
import { curve } from "../../../src/chem/workflows";
import { mixedWithStock } from "../../../src/chem/workflows/mixing";
import * as f from "./fixtures";

const H3PO4: Component = { id: "H3PO4", name: "H3PO4", systems: [{ system: f.phosphate, stoich: 1 }], ions: [] };

// The maximum of dpH/dv (the inflection) is not exactly the stoichiometric point; the offset grows
// as the jump gets shallower. 0.1 % of the equivalence volume covers every case below (the largest,
// the second phosphate step, is ~0.002 %).
const VOLUME_RTOL = 1e-3;

describe("curve: equivalence points at the stoichiometric volumes", () => {
  test.each([
    { label: "HCl 0.1 M (50 mL) with 0.1 M NaOH", mix: f.mixture([f.HCl, 0.1]), titrant: f.NaOH, V: 0.05, c: 0.1, vmax: 0.1, expected: [0.05] },
    { label: "acetic acid 0.1 M (25 mL) with 0.1 M NaOH", mix: f.mixture([f.aceticAcid, 0.1]), titrant: f.NaOH, V: 0.025, c: 0.1, vmax: 0.05, expected: [0.025] },
    { label: "H3PO4 0.05 M (50 mL) with 0.1 M NaOH: two steps, the third (pKa 12.35) too shallow", mix: f.mixture([H3PO4, 0.05]), titrant: f.NaOH, V: 0.05, c: 0.1, vmax: 0.1, expected: [0.025, 0.05] },
    { label: "Na2CO3 0.05 M (50 mL) with 0.1 M HCl", mix: f.mixture([f.Na2CO3, 0.05]), titrant: f.HCl, V: 0.05, c: 0.1, vmax: 0.1, expected: [0.025, 0.05] },
    { label: "Tris 0.1 M (50 mL) with 0.1 M HCl", mix: f.mixture([f.trisBase, 0.1]), titrant: f.HCl, V: 0.05, c: 0.1, vmax: 0.1, expected: [0.05] },
    { label: "borax 0.01 M (50 mL) with 0.1 M HCl (2 mol HCl per mol borax)", mix: f.mixture([f.borax, 0.01]), titrant: f.HCl, V: 0.05, c: 0.1, vmax: 0.02, expected: [0.01] },
  ])("$label", ({ label, mix, titrant, V, c, vmax, expected }) => {
    for (const activity of ["ideal", "davies"] as const) {
      const r = f.ok(curve(mix, titrant, { stockConc: c, volume: V, maxVolume: vmax }, { activity }));
      const found = r.equivalence.map((e) => e.volume);
      if (found.length !== expected.length) throw new Error(`${label}, ${activity}: expected ${expected.length} points at ${expected}, found ${found}`);
      found.forEach((v, i) => f.expectRel(v, expected[i], VOLUME_RTOL, `${label}, ${activity}, equivalence point ${i + 1}`));
    }
  });

  // At the inflection of a strong acid–strong base curve the solution is NaCl in water: pH = ½·pKw
  // (ideal activity; pKw from the engine's water model, itself tested against Marshall & Franck).
  test("strong acid with strong base: pH ½·pKw at the equivalence point (ideal, ±0.01)", () => {
    const r = f.ok(curve(f.mixture([f.HCl, 0.1]), f.NaOH, { stockConc: 0.1, volume: 0.05, maxVolume: 0.1 }, { activity: "ideal" }));
    f.expectAbs(r.equivalence[0].pH, pKw(25) / 2, 0.01, "HCl/NaOH equivalence pH");
  });

  // Weak acid: at the equivalence point the solution is the conjugate base at C·V/(V + v), here
  // sodium acetate 0.05 M; the inflection sits a hair before it (±0.01 pH).
  test("acetic acid with NaOH: pH at the point = pH of 0.05 M sodium acetate (±0.01)", () => {
    for (const activity of ["ideal", "davies"] as const) {
      const r = f.ok(curve(f.mixture([f.aceticAcid, 0.1]), f.NaOH, { stockConc: 0.1, volume: 0.025, maxVolume: 0.05 }, { activity }));
      f.expectAbs(r.equivalence[0].pH, f.pH(f.mixture([f.sodiumAcetate, 0.05]), { activity }), 0.01, `acetic acid/NaOH, ${activity}`);
    }
  });

  test("the nearest row index points at the row closest to each equivalence volume", () => {
    const r = f.ok(curve(f.mixture([H3PO4, 0.05]), f.NaOH, { stockConc: 0.1, volume: 0.05, maxVolume: 0.1, points: 41 }));
    for (const e of r.equivalence) {
      const d = Math.abs(r.points[e.nearestIndex].volume - e.volume);
      for (const p of r.points) expect(d).toBeLessThanOrEqual(Math.abs(p.volume - e.volume));
    }
  });

  test("no equivalence point inside a buffer region", () => {
    const r = f.ok(curve(f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]), f.NaOH, { stockConc: 0.1, volume: 0.05, maxVolume: 0.005 }));
    expect(r.equivalence).toEqual([]);
  });
});

describe("curve: rows", () => {
  test("n rows from 0 to v_max, each row the engine's pH of the diluted mixture", () => {
    const mix = f.mixture([f.aceticAcid, 0.05], [f.sodiumAcetate, 0.05]);
    const r = f.ok(curve(mix, f.NaOH, { stockConc: 1, volume: 0.8, maxVolume: 0.1, points: 11 }));
    expect(r.points.length).toBe(11);
    expect(r.points[0].volume).toBe(0);
    expect(r.points[10].volume).toBe(0.1);
    r.points.forEach(({ volume, pH }) => {
      f.expectAbs(pH as number, f.pH(mixedWithStock(mix, f.NaOH, 1, volume / (0.8 + volume))), 1e-12, `row at ${volume} L`);
    });
    f.expectAbs(r.points[0].pH as number, f.pH(mix), 1e-12, "first row is the mixture itself");
  });

  test("pH rises monotonically with a strong base and falls with a strong acid (random buffers)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 0.2, noNaN: true }),
        fc.double({ min: 1e-3, max: 0.2, noNaN: true }),
        fc.boolean(),
        fc.integer({ min: 2, max: 60 }),
        (ca, cb, base, n) => {
          const mix = f.mixture([f.KH2PO4, ca], [f.Na2HPO4, cb]);
          const r = f.ok(curve(mix, base ? f.NaOH : f.HCl, { stockConc: 0.5, volume: 0.1, maxVolume: 0.05, points: n }));
          for (let i = 1; i < r.points.length; i++) {
            const step = (r.points[i].pH as number) - (r.points[i - 1].pH as number);
            if (base ? !(step > 0) : !(step < 0)) throw new Error(`KH2PO4 ${ca} + Na2HPO4 ${cb}, ${base ? "NaOH" : "HCl"}: row ${i} step ${step}`);
          }
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe("curve: bad input", () => {
  const mix = f.mixture([f.aceticAcid, 0.1]);
  test.each([
    { label: "points 1", req: { stockConc: 0.1, volume: 0.1, maxVolume: 0.1, points: 1 }, text: "number of points" },
    { label: "points 2.5", req: { stockConc: 0.1, volume: 0.1, maxVolume: 0.1, points: 2.5 }, text: "number of points" },
    { label: "points 5000", req: { stockConc: 0.1, volume: 0.1, maxVolume: 0.1, points: 5000 }, text: "number of points" },
    { label: "stock 0", req: { stockConc: 0, volume: 0.1, maxVolume: 0.1 }, text: "stock concentration" },
    { label: "volume −1", req: { stockConc: 0.1, volume: -1, maxVolume: 0.1 }, text: "initial volume" },
    { label: "max volume NaN", req: { stockConc: 0.1, volume: 0.1, maxVolume: NaN }, text: "largest titrant volume" },
  ])("$label → bad-input", ({ req, text }) => {
    const r = curve(mix, f.NaOH, req);
    expect(r.ok ? "ok" : r.code).toBe("bad-input");
    if (!r.ok) expect(r.message).toContain(text);
  });

  test("a neutral titrant → bad-input", () => {
    const r = curve(mix, f.sucrose, { stockConc: 0.1, volume: 0.1, maxVolume: 0.1 });
    expect(r.ok ? "ok" : r.code).toBe("bad-input");
  });
});
