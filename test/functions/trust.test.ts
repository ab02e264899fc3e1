/**
 * The ionic-strength limit (1 mol/L, src/chem/ionic-limit.ts): above it no activity model in the
 * engine describes the solution (Davies is meant for I ≲ 0.3–0.5 mol/L: Davies, Ion Association,
 * 1962), so every pH-derived number is refused with #N/A and a message — by every function — while
 * AQ.IONIC and AQ.CHECK still say where the mixture stands. Messages quote numbers with enough
 * digits to be true. Every case is a formula as a user types it (issue 14, items 2 and 3).
 */
import { evaluateFormula, type CellResult } from "../../src/cli/evaluate";

function refused(formula: string, ionic: RegExp): void {
  const r = evaluateFormula(formula);
  expect({ formula, error: r.error }).toEqual({ formula, error: "#N/A" });
  expect(r.message ?? "").toMatch(ionic);
  expect(r.message ?? "").toMatch(/beyond the 1 mol\/L limit/);
}

describe("no pH-derived number beyond I = 1 mol/L, from any function", () => {
  test("19 mol/L NaOH: no pH, #N/A naming the ionic strength; IONIC and CHECK still report it", () => {
    refused('=AQ.PH("NaOH",19)', /ionic strength would be 19 mol\/L/);
    expect(evaluateFormula('=AQ.IONIC("NaOH",19)').value).toBeCloseTo(19, 6);
    expect(evaluateFormula('=AQ.CHECK("NaOH",19)').value).toBe("CHECK: no pH is given: I = 19 mol/L, beyond the 1 mol/L limit of the activity models.");
  });

  test("a 1 mol/L NaOH stock still has a pH (at the limit, not beyond it)", () => {
    const r = evaluateFormula('=AQ.PH("NaOH",1)');
    expect(r.error).toBeUndefined();
    // pKw 13.995 at 25 °C (CRC after Marshall & Franck 1981); γ(OH⁻) < 1 lowers the pH below 13.995.
    expect(r.value as number).toBeGreaterThan(13.5);
    expect(r.value as number).toBeLessThan(13.995);
  });

  test.each([
    ['=AQ.PH({"NaH2PO4";"NaCl"},{0.05;3})'],
    ['=AQ.BETA({"NaH2PO4";"NaCl"},{0.05;3})'],
    ['=AQ.SPECIES({"NaH2PO4";"NaCl"},{0.05;3})'],
    ['=AQ.SPECIES({"NaH2PO4";"NaCl"},{0.05;3},"H2PO4-")'],
    ['=AQ.CAPACITY({"NaH2PO4";"NaCl"},{0.05;3},0.5)'],
    ['=AQ.ADJUST({"NaH2PO4";"NaCl"},{0.05;3},7,"NaOH")'],
    ['=AQ.PHRANGE({"NaH2PO4";"NaCl"},{0.05;3},0.02)'],
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,3)'],
  ])("%s → #N/A", (formula) => {
    refused(formula, /ionic strength would be 3(\.\d+)? mol\/L/);
  });

  test("AQ.PKA at an ionic strength beyond the limit is refused, at the limit it is given", () => {
    refused('=AQ.PKA("phosphate",2,25,19.9)', /19\.9 mol\/L/);
    refused('=AQ.PKA("phosphate",2,25,"1.5 M")', /1\.5 mol\/L/);
    expect(typeof evaluateFormula('=AQ.PKA("phosphate",2,25,1)').value).toBe("number");
  });

  test("0.6 mol/L NaCl is still answered (AQ.CHECK warns)", () => {
    expect(typeof evaluateFormula('=AQ.PH({"NaH2PO4";"NaCl"},{0.05;0.6})').value).toBe("number");
    expect(evaluateFormula('=AQ.CHECK({"NaH2PO4";"NaCl"},{0.05;0.6})').value).toMatch(/davies activity model is unreliable/);
  });

  test("AQ.CURVE: a point beyond the limit is #N/A in its own cell, the others are pH values", () => {
    // 10 mL of 0.1 M HCl with 10 M NaOH: at 25 mL added the solution holds 10·0.025/0.035 ≈ 7.1 mol/L NaOH.
    const r = evaluateFormula('=AQ.CURVE("HCl",0.1,"NaOH",10,0.01,0.05,3)');
    expect(r.error).toBeUndefined();
    const rows = r.value as CellResult[][];
    expect(rows.map((row) => row[0])).toEqual(["titrant volume (L)", 0, 0.025, 0.05]);
    expect(typeof rows[1][1]).toBe("number");
    for (const row of rows.slice(2)) {
      expect(row[1]).toMatchObject({ error: "#N/A" });
      expect((row[1] as { message: string }).message).toMatch(/ionic strength would be \d+(\.\d+)? mol\/L, beyond the 1 mol\/L limit/);
    }
    // no pH above 14.5 anywhere (the 15.57 and 15.81 came from beyond the limit)
    for (const row of rows.slice(1)) if (typeof row[1] === "number") expect(row[1]).toBeLessThan(14.5);
  });

  test("AQ.CURVE entirely beyond the limit is one #N/A", () => {
    refused('=AQ.CURVE("NaCl",3,"NaOH",1,0.01,0.01,3)', /ionic strength would be 3(\.\d+)? mol\/L/);
  });
});

describe("messages quote only numbers the tool would give (item 3)", () => {
  test("1.0005 mol/L reads 1.0005, not 1, in AQ.PH and AQ.CHECK", () => {
    refused('=AQ.PH("NaOH",1.0005)', /ionic strength would be 1\.0005 mol\/L, beyond the 1 mol\/L limit/);
    expect(evaluateFormula('=AQ.CHECK("NaOH",1.0005)').value).toBe("CHECK: no pH is given: I = 1.0005 mol/L, beyond the 1 mol/L limit of the activity models.");
  });

  test("an unreachable ADJUST quotes the pH at the limit, not a pH computed beyond it", () => {
    const r = evaluateFormula('=AQ.ADJUST({"acetic acid";"sodium acetate"},{0.05;0.05},10.5,"sodium acetate")');
    expect(r.error).toBe("#N/A");
    const m = /reaches at most (\d+\.\d+) \(at (\d+\.\d+) mol\/L, where the ionic strength reaches the 1 mol\/L limit/.exec(r.message ?? "");
    expect(m).not.toBeNull();
    const [, pHText, addedText] = m as RegExpExecArray;
    const added = Number(addedText);
    // the amount quoted is within the range where numbers are given, and the pH quoted is the pH there
    const I = evaluateFormula(`=AQ.IONIC({"acetic acid";"sodium acetate"},{0.05;${0.05 + added}})`).value as number;
    expect(I).toBeLessThanOrEqual(1);
    expect(I).toBeGreaterThan(0.99);
    const pH = evaluateFormula(`=AQ.PH({"acetic acid";"sodium acetate"},{0.05;${0.05 + added}})`).value as number;
    expect(pH.toFixed(2)).toBe(pHText);
  });

  test("an ADJUST that reaches its target just inside the limit is answered, not refused", () => {
    // NaCl lowers the Davies pH of an acetate buffer until I ≈ 0.5 mol/L and raises it beyond; the
    // per-litre search stops at the limit only after checking every point up to it.
    const target = evaluateFormula('=AQ.PH({"acetic acid";"sodium acetate";"NaCl"},{0.05;0.05;0.9})').value as number;
    const n = evaluateFormula(`=AQ.ADJUST({"acetic acid";"sodium acetate";"NaCl"},{0.05;0.05;0.8},${target},"NaCl")`);
    expect(n.error).toBeUndefined();
    expect(n.value as number).toBeCloseTo(0.1, 6);
  });
});

describe("one titrant reader for ADJUST and RECIPE (item 8)", () => {
  const ACETATE = '{"acetic acid";"sodium acetate"},{0.05;0.05}';
  test.each([
    ['"1 M NaOH"', '"NaOH",1'],
    ['"NaOH 1 M"', '"NaOH",1'],
    ['"NaOH 0.01 M"', '"NaOH",0.01'],
    ['"1 M HCl"', '"HCl",1'],
  ])("AQ.ADJUST with %s reads as %s", (named, separate) => {
    const target = named.includes("HCl") ? 4.5 : 5;
    const a = evaluateFormula(`=AQ.ADJUST(${ACETATE},${target},${named},,"800 L")`);
    const b = evaluateFormula(`=AQ.ADJUST(${ACETATE},${target},${separate},"800 L")`);
    expect(a.error).toBeUndefined();
    expect(a.value).toBe(b.value);
  });

  test("a stock given twice, or a named stock without a batch volume, is #VALUE! saying so", () => {
    expect(evaluateFormula(`=AQ.ADJUST(${ACETATE},5,"1 M NaOH",1,"800 L")`).message).toMatch(/already names its stock concentration/);
    expect(evaluateFormula(`=AQ.ADJUST(${ACETATE},5,"1 M NaOH")`).message).toMatch(/give the batch volume too/);
  });

  test("AQ.RECIPE reads the same forms", () => {
    const a = evaluateFormula('=AQ.RECIPE("acetic acid","1 M NaOH",5,0.1,1)');
    const b = evaluateFormula('=AQ.RECIPE("acetic acid","NaOH 1 M",5,0.1,1)');
    expect(a.error).toBeUndefined();
    expect(a.value).toEqual(b.value);
  });
});
