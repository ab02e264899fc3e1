/**
 * Above I = 1 mol/L no activity model in the engine describes the solution (Davies is meant for
 * I ≲ 0.3–0.5 mol/L: Davies, Ion Association, 1962), so pH-derived results are refused with #N/A
 * and a message, while AQ.IONIC and AQ.CHECK still say where the mixture stands.
 */
import { evaluateFormula } from "../../src/cli/evaluate";

describe("results beyond the activity models' range", () => {
  test("19 mol/L NaOH: no pH, #N/A naming the ionic strength", () => {
    const r = evaluateFormula('=AQ.PH("NaOH",19)');
    expect(r.error).toBe("#N/A");
    expect(r.message).toMatch(/ionic strength would be 19 mol\/L/);
    expect(evaluateFormula('=AQ.IONIC("NaOH",19)').value).toBeCloseTo(19, 6);
    expect(evaluateFormula('=AQ.CHECK("NaOH",19)').value).toMatch(/^CHECK: .*unreliable/);
  });

  test("a 1 mol/L NaOH stock still has a pH (at the limit, not beyond it)", () => {
    const r = evaluateFormula('=AQ.PH("NaOH",1)');
    expect(r.error).toBeUndefined();
    // pKw 13.995 at 25 °C (CRC after Marshall & Franck 1981); γ(OH⁻) < 1 lowers the pH below 13.995.
    expect(r.value as number).toBeGreaterThan(13.5);
    expect(r.value as number).toBeLessThan(13.995);
  });

  test("a salt 'titrant' that reaches the target only at 10 mol/L is refused, not answered", () => {
    const r = evaluateFormula('=AQ.ADJUST({"acetic acid";"sodium acetate"},{0.05;0.05},6,"NaCl")');
    expect(r.error).toBe("#N/A");
    expect(r.message).toMatch(/ionic strength would be 1\d(\.\d+)? mol\/L/);
  });

  test("BETA and SPECIES are refused there too; 0.6 mol/L NaCl is still answered (AQ.CHECK warns)", () => {
    expect(evaluateFormula('=AQ.BETA({"NaH2PO4";"NaCl"},{0.05;3})').error).toBe("#N/A");
    expect(evaluateFormula('=AQ.SPECIES({"NaH2PO4";"NaCl"},{0.05;3})').error).toBe("#N/A");
    expect(typeof evaluateFormula('=AQ.PH({"NaH2PO4";"NaCl"},{0.05;0.6})').value).toBe("number");
  });
});
