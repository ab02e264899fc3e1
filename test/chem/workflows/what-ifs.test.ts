/**
 * Temperature and dilution what-ifs: a batch made at one condition, used at another.
 * Invented scenario: Halvorsen Biologics makes its phosphate and Tris buffers at 25 °C and uses them
 * in a cold room (5 °C) and at 37 °C, and keeps a 10× phosphate stock.
 */
import { debyeHuckelA, solveEquilibrium, type Mixture } from "../../../src/chem";
import { recipe } from "../../../src/chem/workflows";
import { scaled } from "../../../src/chem/workflows/mixing";
import { evaluate, referenceCase, referenceTable } from "../../reference";
import * as f from "./fixtures";

const phosphateStandard = f.referenceMixture(referenceCase("ph-eur-buffers", "PHEUR-PHOS-1-1-25").mixture);
/** Ph. Eur. ΔpH/Δt of the 0.025/0.025 phosphate, pH/K. */
const PHOS_SLOPE = referenceTable("ph-eur-buffers").slopes!.values["PHOS-1-1"];

describe("temperature what-ifs", () => {
  // European Pharmacopoeia 2.2.3, Table 2.2.3.-2 (test/reference/ph-eur-buffers.json; docs/references.md,
  // section 1, V): phosphate 0.025/0.025 M, ΔpH/Δt = −0.0028 K⁻¹; the table's 15/20/25 °C values are 6.90/6.88/6.87.
  // (1) Near 25 °C: the slope over 15–25 °C within ±0.001 K⁻¹ — the table prints two decimals, so
  //     its own 10 K difference is uncertain by ±0.01 pH, i.e. ±0.001 K⁻¹.
  test("phosphate standard, 15 → 25 °C: slope −0.0028 ± 0.001 K⁻¹ (Ph. Eur.)", () => {
    const slope = (f.pH(phosphateStandard, { temperatureC: 25 }) - f.pH(phosphateStandard, { temperatureC: 15 })) / 10;
    f.expectAbs(slope, PHOS_SLOPE, 0.001, "phosphate 0.025/0.025 M, (pH(25) − pH(15))/10 K");
  });

  // (2) 5 °C vs 25 °C: the pH is higher in the cold, and the shift is the coefficient's
  //     −0.0028 × (−20 K) = +0.056 within ±0.035: ±0.02 from the coefficient's own uncertainty over
  //     20 K (as above), and up to 0.015 more because pH(T) is convex (ΔrCp° of pK2 and the fall of
  //     the Debye–Hückel A with temperature) — a linear coefficient fitted near 25 °C understates the
  //     slope below 15 °C. The convexity itself is checked: the 5–15 °C slope is the steeper.
  test("phosphate standard at 5 °C vs 25 °C: higher in the cold by 0.056 ± 0.035 (Ph. Eur. coefficient)", () => {
    const p5 = f.pH(phosphateStandard, { temperatureC: 5 });
    const p15 = f.pH(phosphateStandard, { temperatureC: 15 });
    const p25 = f.pH(phosphateStandard, { temperatureC: 25 });
    expect(p5).toBeGreaterThan(p25);
    f.expectAbs(p5 - p25, -PHOS_SLOPE * 20, 0.035, "phosphate 0.025/0.025 M, pH(5 °C) − pH(25 °C)");
    expect((p5 - p15) / 10).toBeGreaterThan((p15 - p25) / 10);
  });

  // A batch made by recipe at 25 °C to pH 6.865 and carried to 5 °C moves the same way: the recipe's
  // amounts, solved at 5 °C, give the same shift as the standard (the two are the same mixture
  // within ±0.02 pH, so within 0.005 pH of each other's shift).
  test("a recipe made at 25 °C and used at 5 °C shifts like the standard", () => {
    const r = f.ok(recipe({ acidForm: f.KH2PO4m, baseForm: f.Na2HPO4m, targetPH: 6.865, totalConc: 0.05, volume: 20 }));
    const shift = f.pH(r.mixture, { temperatureC: 5 }) - r.pH;
    const standardShift = f.pH(phosphateStandard, { temperatureC: 5 }) - f.pH(phosphateStandard, { temperatureC: 25 });
    f.expectAbs(shift, standardShift, 0.005, "recipe batch shift 25 → 5 °C vs the standard's");
  });

  // Tris: the pK equation of Bates & Hetzer, J. Phys. Chem. 65, 667 (1961) (docs/references.md,
  // section 3, X): 8.072 at 25 °C, 7.752 at 37 °C. In a 1:1 Tris/Tris·H⁺ buffer the pH follows
  // the pK: pH = pK + log([L]/[HL⁺]) + A·f(I) for the +1 → 0 step, and A·f(I) changes by ~0.001
  // between 5 and 37 °C at I = 0.025. Tolerance ±0.01: the engine's pK(T) comes from Goldberg 2002's
  // ΔrH° 47.45 kJ/mol and ΔrCp° −59 J/(K·mol), not from this equation.
  // (the equation and its printed check values: test/reference/tris-pk.json, checked in test/chem/temperature.test.ts)
  const batesHetzer = (tC: number): number => evaluate(referenceTable("tris-pk").equation!, tC);
  test.each([37, 5])("Tris 0.05 M + HCl 0.025 M made at 25 °C, used at %s °C: pH shift = Bates–Hetzer pK shift ± 0.01", (t) => {
    const tris: Mixture = f.mixture([f.trisBase, 0.05], [f.HCl, 0.025]);
    const shift = f.pH(tris, { temperatureC: t }) - f.pH(tris, { temperatureC: 25 });
    f.expectAbs(shift, batesHetzer(t) - batesHetzer(25), 0.01, `Tris/Tris·HCl 1:1, 25 → ${t} °C`);
  });

  test("a Tris recipe for pH 7.4 made at 25 °C is far off at 37 °C; made at 37 °C it is right there", () => {
    const at25 = f.ok(recipe({ acidForm: f.trisBaseM, baseForm: f.HClM, targetPH: 7.4, totalConc: 0.05, volume: 1 }));
    const at37 = f.ok(recipe({ acidForm: f.trisBaseM, baseForm: f.HClM, targetPH: 7.4, totalConc: 0.05, volume: 1 }, { temperatureC: 37 }));
    expect(f.pH(at25.mixture, { temperatureC: 37 })).toBeLessThan(7.4 - 0.25);
    f.expectAbs(f.pH(at37.mixture, { temperatureC: 37 }), 7.4, 1e-8, "Tris recipe made for 37 °C, at 37 °C");
    expect(at37.lines[1].mol).toBeLessThan(at25.lines[1].mol);
  });
});

describe("dilution what-ifs", () => {
  // A 10× phosphate stock (0.05/0.05 M, I ≈ 0.2 mol/L) diluted to 0.005/0.005 M (I ≈ 0.02).
  // No published dilution value ΔpH½ is in docs/references.md, so the check is against the activity
  // model itself: for the pK2 step (acid charge −1) Henderson–Hasselbalch with Davies gives
  // pH = pK2 + log([HPO₄²⁻]/[H₂PO₄⁻]) − 3·A·F(I), F(I) = √I/(1 + √I) − 0.3·I, and the ratio does not
  // change on dilution, so ΔpH = 3·A·(F(I_stock) − F(I_diluted)) with the solved ionic strengths.
  // Tolerance 0.002: the closed form leaves out H⁺, OH⁻ and the other phosphate steps.
  const stock = f.mixture([f.KH2PO4, 0.05], [f.Na2HPO4, 0.05]);
  const diluted = scaled(stock, 0.1);
  const davies = (I: number) => Math.sqrt(I) / (1 + Math.sqrt(I)) - 0.3 * I;

  test("pH rises on a 10× dilution, by the Davies closed form", () => {
    const s = solveEquilibrium(stock);
    const d = solveEquilibrium(diluted);
    if (!s.ok || !d.ok) throw new Error("solve failed");
    expect(d.pH).toBeGreaterThan(s.pH);
    expect(d.ionicStrength).toBeLessThan(s.ionicStrength);
    const expected = 3 * debyeHuckelA(25) * (davies(s.ionicStrength) - davies(d.ionicStrength));
    f.expectAbs(d.pH - s.pH, expected, 0.002, "phosphate 0.05/0.05 → 0.005/0.005 M, Davies");
  });

  // With ideal activity the ratio fixes the pH: dilution moves it only through [H⁺] and [OH⁻]
  // against 10 mM of buffer, well under 0.001.
  test("with ideal activity a 10× dilution leaves the pH within 0.001", () => {
    f.expectAbs(f.pH(diluted, { activity: "ideal" }), f.pH(stock, { activity: "ideal" }), 0.001, "phosphate 10× dilution, ideal");
  });

  test("a recipe for the diluted buffer needs a different ratio than the stock's (the activity shift)", () => {
    const target = f.pH(diluted);
    const r = f.ok(recipe({ acidForm: f.KH2PO4, baseForm: f.Na2HPO4, targetPH: target, totalConc: 0.1, volume: 1 }));
    const share = r.lines[1].conc / 0.1;
    // At the stock's strength the same pH needs more base form than 1:1 (pH falls as I rises).
    expect(share).toBeGreaterThan(0.5);
    f.expectAbs(f.pH(r.mixture), target, 1e-8, "recipe at stock strength for the diluted buffer's pH");
  });
});
