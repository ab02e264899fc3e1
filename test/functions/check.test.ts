/**
 * AQ.CHECK puts the buffering verdict, the engine's warnings and the ionic strength beside a pH,
 * where a number alone cannot carry them. "OK" only for a real buffer by the rule of
 * src/chem/buffering.ts (docs/functions/check.md states it and its basis): the weak systems give
 * at least ⅔ of β, and the pH is within 1 of the nearest pKa′ (mixed scale) of the buffering
 * system. Evaluated as a user types it, in the embedded spreadsheet engine (issue 14, item 1).
 */
import { evaluateFormula } from "../../src/cli/evaluate";

function check(formula: string): string {
  const r = evaluateFormula(formula);
  expect(r.error).toBeUndefined();
  return r.value as string;
}

function num(formula: string): number {
  const r = evaluateFormula(formula);
  if (typeof r.value !== "number") throw new Error(`${formula} → ${r.error} ${r.message}`);
  return r.value;
}

/** The release test the docs recommend. */
function released(formula: string): boolean {
  return evaluateFormula(`=LEFT(${formula.slice(1)},2)="OK"`).value === true;
}

describe("AQ.CHECK: OK only for a real buffer", () => {
  test("an equimolar acetate buffer is OK and states its ionic strength", () => {
    // 0.05 M sodium acetate + 0.05 M acetic acid: I = 0.05 mol/L from Na⁺ and acetate; pH at the pKa′.
    const f = '=AQ.CHECK({"acetic acid";"sodium acetate"},{0.05;0.05})';
    expect(check(f)).toBe("OK: buffer, 0.00 from pKa′ 4.67 (acetate), I = 0.05 mol/L");
    expect(released(f)).toBe(true);
  });

  // The three cases of the issue: each passed =LEFT(AQ.CHECK(…),2)="OK" before.
  test("Tris + an equal amount of HCl (pH 4.77, 3.4 below the pKa′) is not buffered", () => {
    const f = '=AQ.CHECK({"Tris";"HCl"},{0.05;0.05})';
    expect(check(f)).toMatch(/^CHECK: not buffered: pH 4\.77 is 3\.\d\d from pKa′ 8\.\d\d of Tris: under 1 % of that system is in its minor form, I = 0\.05 mol\/L\.$/);
    expect(released(f)).toBe(false);
    // β is tiny, as the issue says (about 1e-4 mol/(L·pH)), against 0.029 for a 50/50 mM pair
    expect(num('=AQ.BETA({"Tris";"HCl"},{0.05;0.05})')).toBeLessThan(2e-4);
  });

  test("sodium acetate alone (pH 8.77, 4 above the pKa′) is not buffered", () => {
    const f = '=AQ.CHECK("sodium acetate",0.1)';
    expect(check(f)).toMatch(/^CHECK: not buffered: pH 8\.77 is 4\.\d\d from pKa′ 4\.\d\d of acetate/);
    expect(released(f)).toBe(false);
  });

  test("Tris 50 mM + HCl 49 mM (pH 6.47, 1.7 below the pKa′) is weakly buffered", () => {
    const f = '=AQ.CHECK({"Tris";"HCl"},{0.05;0.049})';
    expect(check(f)).toMatch(/^CHECK: weakly buffered: pH 6\.47 is 1\.\d\d from pKa′ 8\.\d\d of Tris, beyond ±1 \(common practice\), I = 0\.049 mol\/L\.$/);
    expect(released(f)).toBe(false);
  });

  test("excess strong acid is called out: the pH no longer follows the buffer", () => {
    const text = check('=AQ.CHECK({"acetic acid";"sodium acetate";"HCl"},{0.05;0.05;0.2})');
    expect(text).toMatch(/^CHECK: overwhelmed by strong acid: pH 0\.95 follows the excess acid/);
  });

  test("excess strong base likewise", () => {
    expect(check('=AQ.CHECK({"acetic acid";"NaOH"},{0.05;0.1})')).toMatch(/^CHECK: overwhelmed by strong base/);
  });

  test("no weak acid or base: not buffered", () => {
    expect(check('=AQ.CHECK("NaCl",0.1)')).toBe("CHECK: not buffered: no weak acid or base present (pH 7.00), I = 0.1 mol/L.");
  });
});

describe("AQ.CHECK: the boundaries of the rule", () => {
  // Acetic acid + sodium acetate at 0.1 mol/L total, ratio r = [acetate]/[acetic acid] around the
  // thresholds. The distance is checked against its definition, computed on the same sheet:
  // |AQ.PH − AQ.PKA(…, AQ.IONIC, "mixed")|, and the verdict against the rule (≤ 1 buffer, ≤ 2 weak).
  const amounts = (r: number) => `{${0.1 / (1 + r)};${(0.1 * r) / (1 + r)}}`;
  test.each([0.98, 1.02, 1.98, 2.02, -0.98, -1.02, -1.98])("acetate ratio 10^%s: the distance from pKa′ decides", (log) => {
    const mix = `{"acetic acid";"sodium acetate"},${amounts(10 ** log)}`;
    const pH = num(`=AQ.PH(${mix})`);
    const pKa = num(`=AQ.PKA("acetic acid",1,25,AQ.IONIC(${mix}),"mixed")`);
    const d = Math.abs(pH - pKa);
    const text = check(`=AQ.CHECK(${mix})`);
    const expected = d <= 1 ? "OK: buffer" : d <= 2 ? "CHECK: weakly buffered" : "CHECK: not buffered";
    expect({ log, d, text: text.slice(0, expected.length) }).toEqual({ log, d, text: expected });
    expect(text).toContain(`${d.toFixed(2)} from pKa′ ${pKa.toFixed(2)}`);
    // on the basic side the pair's own OH⁻ is negligible at 0.1 mol/L: the distance is log10 r within
    // 0.01, so these cases sit on both sides of each threshold (on the acidic side the acid's own
    // dissociation moves the ratio, and the distance is the equilibrium's, not the weighed one).
    if (log > 0) expect(Math.abs(d - log)).toBeLessThan(0.01);
  });

  test("near pKa ± 1 the distance shows enough decimals to be on its own side of 1", () => {
    const mix = `{"acetic acid";"sodium acetate"},${amounts(10 ** 1.0004)}`;
    const d = Math.abs(num(`=AQ.PH(${mix})`) - num(`=AQ.PKA("acetic acid",1,25,AQ.IONIC(${mix}),"mixed")`));
    expect(d).toBeGreaterThan(1);
    expect(check(`=AQ.CHECK(${mix})`)).toMatch(new RegExp(`^CHECK: weakly buffered: pH \\d\\.\\d\\d is ${d.toFixed(3).replace(".", "\\.")} from pKa′`));
  });

  test("a dilute pair at its pKa is not buffered: its own H⁺ rivals the weak β (share below ⅔)", () => {
    // 10 µM + 10 µM acetate: [H⁺] ≈ 5e-6 against C·α(1−α) = 5e-6: the weak systems give about 40 %.
    expect(check('=AQ.CHECK({"acetic acid";"sodium acetate"},{1e-5;1e-5})')).toMatch(/^CHECK: not buffered: at pH 5\.\d\d the weak acids and bases give only \d\d % of the buffer value, free H⁺ the rest/);
    // 1 mM + 1 mM is a buffer (share ≈ 99 %)
    expect(check('=AQ.CHECK({"acetic acid";"sodium acetate"},{1e-3;1e-3})')).toMatch(/^OK: buffer/);
  });

  test("the weak share threshold: ⅔ crossed between 30 µM and 100 µM of an equimolar acetate pair", () => {
    expect(check('=AQ.CHECK({"acetic acid";"sodium acetate"},{3e-5;3e-5})')).toMatch(/^CHECK: not buffered: at pH/);
    expect(check('=AQ.CHECK({"acetic acid";"sodium acetate"},{1e-4;1e-4})')).toMatch(/^OK: buffer/);
  });
});

describe("AQ.CHECK: warnings and errors", () => {
  test("ionic strength beyond the Davies range is reported, with the model named", () => {
    const text = check('=AQ.CHECK({"NaH2PO4";"Na2HPO4";"NaCl"},{0.025;0.025;0.6})');
    expect(text).toMatch(/^CHECK: buffer, 0\.\d\d from pKa′ \d\.\d\d \(phosphate\), I = 0\.7\d* mol\/L\./);
    expect(text).toMatch(/davies activity model is unreliable/);
  });

  test("a pKa without ΔrH° used at 37 °C is reported (sorbic acid has none in the library)", () => {
    const text = check('=AQ.CHECK({"sorbic acid";"potassium sorbate"},{0.01;0.01},37)');
    expect(text).toMatch(/^CHECK: buffer/);
    expect(text).toMatch(/ΔrH° is unknown for sorbate/);
    // and at 25 °C the same mixture needs no temperature warning (its pKa, unverified, is still named)
    expect(check('=AQ.CHECK({"sorbic acid";"potassium sorbate"},{0.01;0.01})')).not.toMatch(/ΔrH°/);
  });

  test("benzoate now carries a published ΔrH° and ΔrCp°: no temperature warning at 37 °C", () => {
    expect(check('=AQ.CHECK({"benzoic acid";"sodium benzoate"},{0.01;0.01},37)')).not.toMatch(/ΔrH° is unknown for benzoate/);
  });

  test("a step without ΔrH° far from the pH is not reported (histidine pK1 ≈ 1.8 at pH 6 and 5 °C)", () => {
    // histidine's carboxyl step has no ΔrH° in the library; at pH ≈ 6 it holds < 0.1 % of the system.
    const text = check('=AQ.CHECK({"L-histidine";"L-histidine monohydrochloride monohydrate"},{0.01;0.01},5)');
    expect(text).toMatch(/^CHECK: buffer/);
    expect(text).not.toMatch(/ΔrH°/);
  });

  describe("a pKa from memory, unverified, near the pH is named (status 'unverified' in the library)", () => {
    test("histidine at pH 6: its imidazolium step (unverified) is named, its amino step (pKa′ > 8) is not", () => {
      const text = check('=AQ.CHECK({"L-histidine";"L-histidine monohydrochloride monohydrate"},{0.01;0.01})');
      expect(text).toMatch(/^CHECK: buffer, 0\.\d\d from pKa′ 6\.\d\d \(histidine\)/);
      expect(text).toMatch(/The pKa of histidine step 2 \(pKa′ 6\.\d\d\) is from memory, unverified/);
      expect(text).not.toMatch(/step 3/);
    });

    test("the same step more than 2 pH units away is not named: under 1 % of the pair is in its minor form", () => {
      // 10 mM histidine hydrochloride with 10 mM HCl sits near pH 2.3, about 3.8 below the unverified
      // imidazolium step (pKa ≈ 6.1); the near step there is the carboxyl (1.82, published).
      const text = check('=AQ.CHECK({"L-histidine monohydrochloride monohydrate";"hydrochloric acid"},{0.01;0.01})');
      expect(text).not.toMatch(/unverified/);
    });

    test("a system whose constants were seen in a source is not named (acetate, published)", () => {
      expect(check('=AQ.CHECK({"acetic acid";"sodium acetate"},{0.05;0.05})')).toMatch(/^OK: buffer/);
    });
  });

  test("bad input is still #VALUE! with a message", () => {
    const r = evaluateFormula('=AQ.CHECK({"acetic acid";"sodium acetate"},{0.05})');
    expect(r.error).toBe("#VALUE!");
    expect(r.message).toMatch(/2×1/);
  });
});

describe("AQ.CHECK under the Pitzer model (issue 20: a fallback rule is flagged)", () => {
  test("Tris–HCl: TrisH⁺ has no Pitzer parameters here, so CHECK names the Davies fallback", () => {
    const f = '=AQ.CHECK({"Tris";"HCl"},{0.1;0.05},25,"pitzer")';
    expect(check(f)).toMatch(/^CHECK: buffer.*No published Pitzer parameters here for TrisH\+: Davies activity is used for that ion\.$/);
  });
  test("McIlvaine-type citrate–phosphate: the citrate anions borrow the phosphate parameters, and CHECK says so", () => {
    expect(check('=AQ.CHECK({"citric acid";"Na2HPO4"},{0.02;0.06},25,"pitzer")')).toMatch(/HCit-2 \(as HPO4-2\).*not published values/);
  });
  test("a phosphate buffer with saline has every parameter (no fallback reason), but Pitzer & Mayorga's values are from memory, unverified (the primary tables not seen here), and CHECK names them", () => {
    const r = check('=AQ.CHECK({"NaH2PO4";"Na2HPO4";"NaCl"},{0.01;0.01;0.15},25,"pitzer")');
    expect(r).not.toMatch(/No published Pitzer parameters/);
    expect(r).toMatch(/^CHECK: buffer.*from memory, unverified, are used here: Na\+–Cl-, Na\+–H2PO4-, Na\+–HPO4\^2-\.$/);
  });
  test("parameters from memory, unverified, are named: sodium with acetate; H⁺–Cl⁻, θ and ψ of H⁺ with K⁺ in HCl + KCl; θ of K⁺ with Na⁺ (seen) not in a K/Na phosphate", () => {
    expect(check('=AQ.CHECK({"acetic acid";"sodium acetate"},{0.05;0.05},25,"pitzer")')).toMatch(/^CHECK: .*Pitzer parameters from memory, unverified, are used here: Na\+–CH3COO-\.$/);
    expect(check('=AQ.CHECK({"HCl";"KCl"},{0.01;0.1},25,"pitzer")')).toMatch(/from memory, unverified, are used here: K\+–Cl-, H\+–Cl-, θ\(H\+, K\+\), ψ\(H\+, K\+, Cl-\)\.$/);
    expect(check('=AQ.CHECK({"KH2PO4";"Na2HPO4"},{0.025;0.025},25,"pitzer")')).not.toMatch(/θ\(K\+, Na\+\)/);
  });
});
