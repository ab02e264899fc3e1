/**
 * recipe: buffer batches from a conjugate pair or one form + a strong titrant, optionally made up to
 * a target ionic strength with a salt.
 * Checks: the batch fed back reproduces the target pH (and ionic strength); published preparations
 * (DIN 19266 phosphate standard, Sørensen/Gomori phosphate, Walpole-type acetate, Bates & Bower
 * KHP + HCl) within their stated precision; grams = molar mass × mol; litres of stock; unreachable
 * targets; bad input; a fast-check property over random targets.
 */
import fc from "fast-check";
import type { Component } from "../../../src/chem";
import { recipe, type RecipeRequest, type RecipeValue } from "../../../src/chem/workflows";
import { casesOf, referenceCase, type ReferenceCase } from "../../reference";
import * as f from "./fixtures";

function baseShare(r: RecipeValue): number {
  return r.lines[1].conc / (r.lines[0].conc + r.lines[1].conc);
}

function pair(acidForm: Component, baseForm: Component, targetPH: number, totalConc: number): RecipeValue {
  return f.ok(recipe({ acidForm, baseForm, targetPH, totalConc, volume: 1 }));
}

/**
 * A published composition is reproduced "within ±d pH" when it lies between the recipes for
 * target − d and target + d (the base share is monotone in the target).
 */
function expectShareWithin(acid: Component, base: Component, C: number, target: number, d: number, share: number, context: string): void {
  const lo = baseShare(pair(acid, base, target - d, C));
  const hi = baseShare(pair(acid, base, target + d, C));
  const ok = share >= lo && share <= hi;
  if (!ok) throw new Error(`${context}: published base share ${share} outside [${lo}, ${hi}] (recipes for pH ${target} ∓ ${d})`);
  expect(ok).toBe(true);
}

/** A preparation-table case as a recipe: the published share within the case's tolerance, or, for a known deviation, outside it and within its bound. */
function expectShareAsReference(acid: Component, base: Component, C: number, c: ReferenceCase & { tolerance: { value: number } }, share: number): void {
  if (c.knownDeviation === undefined) {
    expectShareWithin(acid, base, C, c.expected, c.tolerance.value, share, `${c.id}: ${c.label}`);
    return;
  }
  expectShareWithin(acid, base, C, c.expected, c.knownDeviation.bound, share, `${c.id} (known deviation: ${c.knownDeviation.reason})`);
  const lo = baseShare(pair(acid, base, c.expected - c.tolerance.value, C));
  const hi = baseShare(pair(acid, base, c.expected + c.tolerance.value, C));
  if (share >= lo && share <= hi) throw new Error(`${c.id}: the known deviation is gone (share ${share} inside [${lo}, ${hi}]): update test/reference`);
  expect(share < lo || share > hi).toBe(true);
}

describe("recipe: the batch fed back reproduces the target", () => {
  const cases: { label: string; req: RecipeRequest; temperatureC?: number }[] = [
    { label: "KH2PO4 + Na2HPO4, pH 6.865, 0.05 M", req: { acidForm: f.KH2PO4m, baseForm: f.Na2HPO4m, targetPH: 6.865, totalConc: 0.05, volume: 1 } },
    { label: "NaH2PO4·H2O + Na2HPO4·7H2O, pH 7.4, 0.02 M, 5 °C", req: { acidForm: f.NaH2PO4H2O, baseForm: f.Na2HPO47H2O, targetPH: 7.4, totalConc: 0.02, volume: 3 }, temperatureC: 5 },
    { label: "histidine + histidine HCl, pH 6.0, 0.02 M", req: { acidForm: f.histidineBase, baseForm: f.histidineHCl, targetPH: 6.0, totalConc: 0.02, volume: 1 } },
    { label: "Tris base + HCl, pH 8.0, 0.05 M", req: { acidForm: f.trisBaseM, baseForm: f.HClM, targetPH: 8.0, totalConc: 0.05, volume: 1 } },
    { label: "HCl + Tris base (titrant in the acid slot), pH 7.5, 0.05 M", req: { acidForm: f.HClM, baseForm: f.trisBaseM, targetPH: 7.5, totalConc: 0.05, volume: 1 } },
    { label: "citric acid + NaOH, pH 5.0, 0.02 M, 37 °C", req: { acidForm: f.citricAcid, baseForm: f.NaOHM, targetPH: 5.0, totalConc: 0.02, volume: 1 }, temperatureC: 37 },
    { label: "boric acid + borax (4 borate per borax), pH 9.0, 0.04 M borate", req: { acidForm: { id: "boric acid", name: "boric acid", systems: [{ system: f.borate, stoich: 1 }], ions: [] }, baseForm: f.borax, targetPH: 9.0, totalConc: 0.04, volume: 1 } },
  ];
  test.each(cases)("$label", ({ label, req, temperatureC }) => {
    const r = f.ok(recipe(req, { temperatureC }));
    f.expectAbs(f.pH(r.mixture, { temperatureC }), req.targetPH, 1e-8, `${label}: pH of the batch`);
    let total = 0;
    for (const line of r.lines) {
      for (const s of line.component.systems) total += line.conc * s.stoich;
      f.expectRel(line.mol, line.conc * req.volume, 1e-15, `${label}: mol of ${line.name}`);
    }
    f.expectRel(total, req.totalConc, 1e-12, `${label}: total system concentration`);
  });

  test.each([
    { label: "phosphate pH 7.0, 0.02 M, I = 0.15 with NaCl", req: { acidForm: f.NaH2PO4H2O, baseForm: f.Na2HPO47H2O, targetPH: 7.0, totalConc: 0.02, volume: 2, ionicStrength: 0.15, salt: f.NaClM } },
    { label: "Tris + HCl pH 7.4, 0.02 M, I = 0.1 with NaCl, 37 °C", req: { acidForm: f.trisBaseM, baseForm: f.HClM, targetPH: 7.4, totalConc: 0.02, volume: 1, ionicStrength: 0.1, salt: f.NaClM } },
    { label: "acetate pH 5.0, 0.01 M, I = 0.05 with KCl", req: { acidForm: f.aceticAcid, baseForm: f.sodiumAcetate, targetPH: 5.0, totalConc: 0.01, volume: 1, ionicStrength: 0.05, salt: { id: "KCl", name: "KCl", systems: [], ions: [{ ion: f.K, stoich: 1 }, { ion: f.Cl, stoich: 1 }] } as Component } },
  ])("$label: pH and ionic strength both reproduced", ({ label, req }) => {
    const temperatureC = label.includes("37 °C") ? 37 : 25;
    const r = f.ok(recipe(req, { temperatureC }));
    f.expectAbs(f.pH(r.mixture, { temperatureC }), req.targetPH, 1e-8, `${label}: pH`);
    f.expectRel(r.ionicStrength, req.ionicStrength, 1e-9, `${label}: ionic strength`);
    expect(r.lines.map((l) => l.role)).toEqual([expect.any(String), expect.any(String), "salt"]);
    expect(r.lines[2].conc).toBeGreaterThan(0);
  });

  test("random phosphate targets (pK2 ± 1.2), totals and temperatures: pH reproduced", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 6.0, max: 8.4, noNaN: true }),
        fc.double({ min: 0.005, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        (target, C, temperatureC) => {
          const r = f.ok(recipe({ acidForm: f.NaH2PO4, baseForm: f.Na2HPO4, targetPH: target, totalConc: C, volume: 1 }, { temperatureC }));
          f.expectAbs(f.pH(r.mixture, { temperatureC }), target, 1e-8, `phosphate pair to ${target} at ${C} M, ${temperatureC} °C`);
        },
      ),
      { numRuns: 80 },
    );
  });
});

describe("recipe: published preparations (test/reference; docs/references.md)", () => {
  // The DIN 19266 phosphate standard (ph-standards.json): Davies against pH(S) is expected within
  // the table's ±0.02, so the 1:1 composition must lie between the recipes for pH(S) ∓ 0.02 at C = 0.05.
  test("phosphate standard: a recipe for pH 6.865 at 0.05 M is 1:1 within ±0.02 pH", () => {
    const c = referenceCase("ph-standards", "STD25-PHOS-1-1");
    expectShareWithin(f.KH2PO4m, f.Na2HPO4m, 0.05, c.expected, c.tolerance.value, 0.5, `${c.id}: KH2PO4 + Na2HPO4, pH ${c.printed}`);
  });

  // Sørensen phosphate (sorensen-phosphate.json): x mL 0.2 M NaH₂PO₄ + y mL 0.2 M Na₂HPO₄ diluted to
  // twice the volume, so 0.1 M phosphate with base share y/(x + y); the table's tolerance.
  test.each(casesOf("sorensen-phosphate"))("$id: x/y = $stock.acid_mL/$stock.base_mL within ±$tolerance.value pH", (c) => {
    const { acid_mL: x, base_mL: y } = c.stock!;
    expectShareAsReference(f.NaH2PO4, f.Na2HPO4, 0.1, c, y / (x + y));
  });

  // Acetate (acetate.json): 0.1 N acetic acid x mL + 0.1 N sodium acetate y mL, 200 mL in all, so
  // 0.1 M acetate with base share y/200; the table's tolerance, its pH 4.6 row a known deviation.
  test.each(casesOf("acetate"))("$id: $stock.acid_mL/$stock.base_mL mL", (c) => {
    const { acid_mL: x, base_mL: y } = c.stock!;
    expectShareAsReference(f.aceticAcid, f.sodiumAcetate, 0.1, c, y / (x + y));
  });

  // KHP + HCl (khp-hcl.json): 50 mL 0.1 M KHP + x mL 0.1 M HCl diluted to 100 mL. As a recipe: KHP
  // 0.05 M and HCl from a 0.1 M stock for a 0.1 L batch, so litres of stock × 1000 = x mL.
  test.each(casesOf("khp-hcl"))("$id: $stock.titrant_mL mL of 0.1 M HCl", (c) => {
    const x = c.stock!.titrant_mL;
    const tol = c.tolerance.value;
    const mL = (target: number) => {
      const r = f.ok(recipe({ acidForm: f.KHPm, baseForm: f.HClM, targetPH: target, totalConc: 0.05, volume: 0.1, stocks: { HCl: 0.1 } }));
      const hcl = r.lines.find((l) => l.role === "titrant");
      expect(hcl?.grams).toBeUndefined();
      return (hcl?.litres ?? NaN) * 1000;
    };
    const lo = mL(c.expected + tol);
    const hi = mL(c.expected - tol);
    if (!(x >= lo && x <= hi)) throw new Error(`${c.id}: table ${x} mL outside [${lo}, ${hi}] mL (±${tol} pH)`);
  });
});

describe("recipe: what to weigh", () => {
  test("grams = molar mass × mol; litres of stock = mol / stock concentration", () => {
    const r = f.ok(recipe({ acidForm: f.trisBaseM, baseForm: f.HClM, targetPH: 8.0, totalConc: 0.05, volume: 2, stocks: { HCl: 1 } }));
    const [tris, hcl] = r.lines;
    expect(tris.role).toBe("acid form");
    f.expectRel(tris.mol, 0.1, 1e-15, "Tris mol for 2 L of 0.05 M");
    f.expectRel(tris.grams ?? NaN, 0.1 * 121.136, 1e-12, "Tris grams (121.136 g/mol, CIAAW)");
    expect(hcl.role).toBe("titrant");
    f.expectRel(hcl.litres ?? NaN, hcl.mol / 1, 1e-15, "litres of 1 M HCl");
  });

  test("a component without molar mass and without stock gets mol only", () => {
    const r = f.ok(recipe({ acidForm: f.aceticAcid, baseForm: f.sodiumAcetate, targetPH: 4.8, totalConc: 0.1, volume: 1 }));
    expect(r.lines[0].grams).toBeUndefined();
    expect(r.lines[0].litres).toBeUndefined();
  });
});

describe("recipe: unreachable and bad input", () => {
  test("a pair cannot go past its own ends", () => {
    const r = recipe({ acidForm: f.KH2PO4, baseForm: f.Na2HPO4, targetPH: 9.5, totalConc: 0.05, volume: 1 });
    expect(r.ok ? "ok" : r.code).toBe("unreachable");
    if (!r.ok) expect(r.message).toMatch(/span pH 4\.\d\d \(all KH2PO4\) to 9\.\d\d \(all Na2HPO4\)/);
  });

  test("HCl cannot raise the pH of Tris base", () => {
    const r = recipe({ acidForm: f.trisBase, baseForm: f.HCl, targetPH: 11.5, totalConc: 0.05, volume: 1 });
    expect(r.ok ? "ok" : r.code).toBe("unreachable");
    if (!r.ok) expect(r.message).toContain("HCl lowers the pH");
  });

  test("a target ionic strength below the buffer's own is unreachable", () => {
    const r = recipe({ acidForm: f.KH2PO4, baseForm: f.Na2HPO4, targetPH: 7, totalConc: 0.05, volume: 1, ionicStrength: 0.01, salt: f.NaCl });
    expect(r.ok ? "ok" : r.code).toBe("unreachable");
    if (!r.ok) expect(r.message).toContain("already has an ionic strength");
  });

  const good = { acidForm: f.KH2PO4, baseForm: f.Na2HPO4, targetPH: 7, totalConc: 0.05, volume: 1 };
  test.each([
    { label: "forms of different systems", req: { ...good, baseForm: f.sodiumAcetate }, text: "different systems" },
    { label: "no system at all", req: { ...good, acidForm: f.NaCl, baseForm: f.HCl }, text: "Neither" },
    { label: "a neutral second component", req: { ...good, baseForm: f.sucrose }, text: "releases no ions" },
    { label: "total concentration 0", req: { ...good, totalConc: 0 }, text: "total concentration" },
    { label: "volume NaN", req: { ...good, volume: NaN }, text: "batch volume" },
    { label: "target pH 30", req: { ...good, targetPH: 30 }, text: "target pH" },
    { label: "ionic strength without a salt", req: { ...good, ionicStrength: 0.2 }, text: "needs a salt" },
    { label: "a salt with an acid–base system", req: { ...good, ionicStrength: 0.2, salt: f.sodiumAcetate }, text: "neutral salt" },
    { label: "negative ionic strength", req: { ...good, ionicStrength: -1, salt: f.NaCl }, text: "ionic strength" },
    { label: "stock concentration 0", req: { ...good, stocks: { KH2PO4: 0 } }, text: "stock concentration" },
  ])("$label → bad-input", ({ req, text }) => {
    const r = recipe(req as RecipeRequest);
    expect(r.ok ? "ok" : r.code).toBe("bad-input");
    if (!r.ok) expect(r.message).toContain(text);
  });
});
