/**
 * AQ.CHECK puts the engine's warnings and regime beside a pH, where a number alone cannot carry them.
 * Evaluated as a user types it, in the embedded spreadsheet engine.
 */
import { evaluateFormula } from "../../src/cli/evaluate";

function check(formula: string): string {
  const r = evaluateFormula(formula);
  expect(r.error).toBeUndefined();
  return r.value as string;
}

describe("AQ.CHECK", () => {
  test("an ordinary buffer is OK and states its ionic strength", () => {
    // 0.05 M sodium acetate + 0.05 M acetic acid: I = 0.05 mol/L from Na⁺ and acetate (acetic acid is barely ionised).
    expect(check('=AQ.CHECK({"acetic acid";"sodium acetate"},{0.05;0.05})')).toBe("OK: buffer, I = 0.05 mol/L");
  });

  test("excess strong acid is called out: the pH no longer follows the buffer", () => {
    const text = check('=AQ.CHECK({"acetic acid";"sodium acetate";"HCl"},{0.05;0.05;0.2})');
    expect(text).toMatch(/^CHECK: buffer overwhelmed by strong acid/);
  });

  test("excess strong base likewise", () => {
    const text = check('=AQ.CHECK({"acetic acid";"NaOH"},{0.05;0.1})');
    expect(text).toMatch(/^CHECK: buffer overwhelmed by strong base/);
  });

  test("ionic strength beyond the Davies range is reported, with the model named", () => {
    const text = check('=AQ.CHECK({"NaH2PO4";"NaCl"},{0.05;0.6})');
    expect(text).toMatch(/^CHECK: buffer, I = 0\.65 mol\/L\./);
    expect(text).toMatch(/davies activity model is unreliable/);
  });

  test("a pKa without ΔrH° used at 37 °C is reported (benzoic acid has none in the library)", () => {
    const text = check('=AQ.CHECK({"benzoic acid";"sodium benzoate"},{0.01;0.01},37)');
    expect(text).toMatch(/^CHECK:/);
    expect(text).toMatch(/ΔrH° is unknown for benzoate/);
    // and at 25 °C the same mixture needs no warning
    expect(check('=AQ.CHECK({"benzoic acid";"sodium benzoate"},{0.01;0.01})')).toMatch(/^OK: buffer/);
  });

  test("bad input is still #VALUE! with a message", () => {
    const r = evaluateFormula('=AQ.CHECK({"acetic acid";"sodium acetate"},{0.05})');
    expect(r.error).toBe("#VALUE!");
    expect(r.message).toMatch(/2×1/);
  });
});

test("a step without ΔrH° far from the pH is not reported (histidine pK1 ≈ 1.5 at pH 6 and 5 °C)", () => {
  // histidine's carboxyl step has no ΔrH° in the library; at pH ≈ 6 it holds < 0.1 % of the system.
  const text = check('=AQ.CHECK({"L-histidine";"L-histidine monohydrochloride monohydrate"},{0.01;0.01},5)');
  expect(text).toMatch(/^OK: buffer/);
});
