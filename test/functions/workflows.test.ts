/**
 * AQ.ADJUST, AQ.CAPACITY, AQ.RECIPE, AQ.CURVE and AQ.PHRANGE in the embedded spreadsheet engine,
 * typed as a user types them. Answers are fed back through AQ.PH / AQ.IONIC in the same engine
 * (the identity a QA reviewer would check on the sheet), errors are the values Excel shows.
 * Invented scenario: Halvorsen Biologics adjusting an 800 L acetate batch and making its buffers.
 */
import { evaluateFormula, evaluateSheets, type CellResult } from "../../src/cli/evaluate";

function num(formula: string): number {
  const r = evaluateFormula(formula);
  if (r.error !== undefined) throw new Error(`${formula}\n  → ${r.error} ${r.message}`);
  if (typeof r.value !== "number") throw new Error(`${formula}\n  → not a number: ${JSON.stringify(r.value)}`);
  return r.value;
}

function table(formula: string): CellResult[][] {
  const r = evaluateFormula(formula);
  if (r.error !== undefined) throw new Error(`${formula}\n  → ${r.error} ${r.message}`);
  if (!Array.isArray(r.value)) throw new Error(`${formula}\n  → not a table: ${JSON.stringify(r.value)}`);
  return r.value;
}

function expectError(formula: string, error: string, message: RegExp): void {
  const r = evaluateFormula(formula);
  expect({ formula, error: r.error }).toEqual({ formula, error });
  expect(r.message ?? "").toMatch(message);
}

function expectNear(actual: number, expected: number, tol: number, context: string): void {
  if (!(Math.abs(actual - expected) <= tol)) throw new Error(`${context}\n  actual ${actual}\n  expected ${expected} ± ${tol}`);
}

const ACETATE = '{"acetic acid";"sodium acetate"},{0.05;0.05}';
const PHOSPHATE = '{"KH2PO4";"Na2HPO4"},{0.025;0.025}';

describe("AQ.ADJUST", () => {
  test("litres of 1 M NaOH for an 800 L acetate batch: the batch with it reads the target (sheet)", () => {
    const [sheet] = evaluateSheets({
      Batch: [
        ["=AQ.ADJUST({\"acetic acid\";\"sodium acetate\"},{0.05;0.05},5.0,\"NaOH\",1,\"800 L\")"],
        ["=AQ.PH({\"acetic acid\";\"sodium acetate\";\"NaOH\"},{0.05*800/(800+A1);0.05*800/(800+A1);1*A1/(800+A1)})"],
      ],
    });
    expect(sheet.errors).toEqual([]);
    const litres = sheet.values[0][0] as number;
    expect(litres).toBeGreaterThan(0);
    expectNear(sheet.values[1][0] as number, 5.0, 1e-6, `pH after ${litres} L of 1 M NaOH into 800 L`);
  });

  test("mol per litre without a stock: the mixture with it reads the target", () => {
    const n = num(`=AQ.ADJUST(${ACETATE},5.0,"NaOH")`);
    expectNear(num(`=AQ.PH({"acetic acid";"sodium acetate";"NaOH"},{0.05;0.05;${n}})`), 5.0, 1e-6, `acetate + ${n} mol/L NaOH`);
  });

  test("a target on the wrong side is #N/A saying which way the titrant goes", () => {
    expectError(`=AQ.ADJUST(${ACETATE},4.0,"NaOH")`, "#N/A", /raises the pH: this mixture is at pH 4\.67, already above the target 4\.00/);
  });

  test("a weak titrant stock cannot pass its own pH: #N/A with the limit", () => {
    expectError(`=AQ.ADJUST(${ACETATE},9.5,"sodium acetate",0.1,1)`, "#N/A", /cannot pass its own pH.*at most 8\.\d\d/);
  });

  test.each([
    [`=AQ.ADJUST(${ACETATE},5.0,"NaOH",,"800 L")`, /volume needs titrant_conc/],
    [`=AQ.ADJUST(${ACETATE},5.0,"NaOH",1)`, /titrant_conc needs volume/],
    [`=AQ.ADJUST(${ACETATE},"five","NaOH")`, /target_pH must be a (finite )?number/],
    [`=AQ.ADJUST(${ACETATE},5.0,"sodium hydroxyde")`, /Unknown substance/],
    [`=AQ.ADJUST(${ACETATE},5.0,"NaOH",0,10)`, /stock concentration/],
  ])("%s → #VALUE!", (formula, message) => {
    expectError(formula, "#VALUE!", message);
  });
});

describe("AQ.CAPACITY", () => {
  test("the base it gives moves AQ.PH by delta; acid likewise", () => {
    const before = num(`=AQ.PH(${PHOSPHATE})`);
    const base = num(`=AQ.CAPACITY(${PHOSPHATE},0.5)`);
    expectNear(num(`=AQ.PH({"KH2PO4";"Na2HPO4";"NaOH"},{0.025;0.025;${base}})`) - before, 0.5, 1e-6, `phosphate + ${base} mol/L NaOH`);
    const acid = num(`=AQ.CAPACITY(${PHOSPHATE},-0.5)`);
    expectNear(num(`=AQ.PH({"KH2PO4";"Na2HPO4";"HCl"},{0.025;0.025;${acid}})`) - before, -0.5, 1e-6, `phosphate + ${acid} mol/L HCl`);
  });

  test("small delta: capacity/delta approaches AQ.BETA", () => {
    const beta = num(`=AQ.BETA(${PHOSPHATE})`);
    expectNear(num(`=AQ.CAPACITY(${PHOSPHATE},0.001)`) / 0.001, beta, beta * 1e-3, "capacity(0.001)/0.001 vs β");
  });

  test("a pH change beyond reach is #N/A; text is #VALUE!", () => {
    expectError(`=AQ.CAPACITY(${PHOSPHATE},"a lot")`, "#VALUE!", /delta_pH must be a (finite )?number/);
    expectError(`=AQ.CAPACITY(${PHOSPHATE},-14)`, "#VALUE!", /pH to reach/);
  });
});

describe("AQ.RECIPE", () => {
  test("Tris with a 1 M HCl stock at 37 °C: grams of Tris, litres of stock; fed back it reads the target", () => {
    const rows = table('=AQ.RECIPE("Tris","HCl 1 M",7.4,"50 mM","2 L",37)');
    expect(rows[0]).toEqual(["component", "mol", "grams", "litres of stock"]);
    expect(rows).toHaveLength(3);
    const [tris, hcl] = [rows[1], rows[2]];
    expect(tris[0]).toBe("Tris base");
    expectNear(tris[1] as number, 0.1, 1e-12, "Tris mol for 2 L at 50 mM");
    expectNear(tris[2] as number, 0.1 * num('=AQ.MOLARMASS("Tris")'), 1e-9, "Tris grams = mol × AQ.MOLARMASS");
    expect(tris[3]).toBe("");
    expect(hcl[2]).toBe("");
    expectNear(hcl[3] as number, hcl[1] as number, 1e-15, "litres of 1 M stock = mol");
    const pH = num(`=AQ.PH({"Tris";"HCl"},{${(tris[1] as number) / 2};${(hcl[1] as number) / 2}},37)`);
    expectNear(pH, 7.4, 1e-6, "Tris recipe fed back at 37 °C");
  });

  test("phosphate pair at I = 0.15 with NaCl (default salt): pH and ionic strength fed back", () => {
    const rows = table('=AQ.RECIPE("NaH2PO4·H2O","Na2HPO4·7H2O",7.0,0.02,2,25,0.15)');
    expect(rows.map((r) => r[0])).toEqual(["component", "sodium dihydrogen phosphate monohydrate", "disodium hydrogen phosphate heptahydrate", "sodium chloride"]);
    const names = rows.slice(1).map((r) => `"${r[0]}"`).join(";");
    const concs = rows.slice(1).map((r) => (r[1] as number) / 2).join(";");
    expectNear(num(`=AQ.PH({${names}},{${concs}})`), 7.0, 1e-6, "phosphate recipe fed back");
    expectNear(num(`=AQ.IONIC({${names}},{${concs}})`), 0.15, 1e-9, "ionic strength fed back");
  });

  test("a stock concentration may lead or trail the name, with or without parentheses", () => {
    const a = table('=AQ.RECIPE("citric acid","1 M NaOH",5,0.02,1)');
    const b = table('=AQ.RECIPE("citric acid","NaOH (1000 mM)",5,0.02,1)');
    expect(a[2][0]).toBe("sodium hydroxide");
    expect(a[2][2]).toBe("");
    expectNear(a[2][3] as number, a[2][1] as number, 1e-15, "litres of 1 M NaOH = mol");
    expect(b[2][3]).toBe(a[2][3]);
    // Without a stock, NaOH (a solid) comes in grams.
    const c = table('=AQ.RECIPE("citric acid","NaOH",5,0.02,1)');
    expectNear(c[2][2] as number, (c[2][1] as number) * num('=AQ.MOLARMASS("NaOH")'), 1e-12, "grams of NaOH");
  });

  test("a pair cannot reach past its ends: #N/A with the span", () => {
    expectError('=AQ.RECIPE("KH2PO4","Na2HPO4",9.5,0.05,1)', "#N/A", /span pH .* to .*: the target 9\.50 is outside/);
  });

  test("a target ionic strength below the buffer's own: #N/A", () => {
    expectError('=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,0.01)', "#N/A", /already has an ionic strength/);
  });

  test.each([
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,,"KCl")', /salt is used only with ionic_strength/],
    ['=AQ.RECIPE("KH2PO4","KH2PO4",7,0.05,1)', /same substance/],
    ['=AQ.RECIPE("KH2PO4","sodium acetate",7,0.05,1)', /different systems/],
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0,1)', /total concentration/],
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,0.2,"sucrose")', /releases no ions/],
  ])("%s → #VALUE!", (formula, message) => {
    expectError(formula, "#VALUE!", message);
  });
});

describe("AQ.CURVE", () => {
  test("acetic acid with NaOH: header, n rows, the steepest point and the stoichiometric equivalence at 25 mL", () => {
    // volumes come back in the unit the starting volume is written in: here L (a number)
    const rows = table('=AQ.CURVE("acetic acid",0.1,"NaOH",0.1,0.025,"50 mL",11)');
    expect(rows[0]).toEqual(["titrant volume (L)", "pH", "marked point", "marked volume (L)", "marked pH"]);
    expect(rows).toHaveLength(12);
    expectNear(rows[1][1] as number, num('=AQ.PH("acetic acid",0.1)'), 1e-12, "first row = the mixture itself");
    const marks = rows.slice(1).filter((r) => r[2] !== "");
    expect(marks.map((r) => r[2])).toEqual(["steepest point 1 (inflection)", "stoichiometric equivalence 1"]);
    // stoichiometric: 0.1 mol/L × 25 mL / 0.1 mol/L = 25 mL exactly; the inflection within 0.1 % of it.
    expectNear(marks[1][3] as number, 0.025, 1e-15, "stoichiometric volume");
    expectNear(marks[0][3] as number, 0.025, 0.025e-3, "steepest point");
    // the pH listed at the stoichiometric volume is the curve's pH there: 0.05 M sodium acetate after dilution
    expectNear(marks[1][4] as number, num('=AQ.PH("sodium acetate",0.05)'), 1e-9, "pH at the stoichiometric point");
    for (let i = 2; i < rows.length; i++) expect(rows[i][1] as number).toBeGreaterThan(rows[i - 1][1] as number);
  });

  test("bad points → #VALUE!", () => {
    expectError('=AQ.CURVE("acetic acid",0.1,"NaOH",0.1,0.025,0.05,1)', "#VALUE!", /number of points/);
  });
});

describe("AQ.PHRANGE", () => {
  test("one tolerance for all amounts: a band around AQ.PH, exhaustive", () => {
    const rows = table(`=AQ.PHRANGE(${PHOSPHATE},"2 %",0.02)`);
    expect(rows[0]).toEqual(["low pH", "high pH", "method"]);
    const [low, high, method] = rows[1];
    const nominal = num(`=AQ.PH(${PHOSPHATE})`);
    expect(low as number).toBeLessThan(nominal);
    expect(high as number).toBeGreaterThan(nominal);
    expect(method).toMatch(/all 32 corners of 5 varied quantities/);
  });

  test("a range of tolerances, blank name rows skipped: the tolerance that is 0 does not widen the band", () => {
    const [sheet] = evaluateSheets({
      S: [
        ["KH2PO4", 0.025, 0.05],
        [null, null, null],
        ["Na2HPO4", 0.025, 0],
        ['=AQ.PHRANGE(A1:A3,B1:B3,C1:C3)'],
        [null],
        [null],
        ['=AQ.PHRANGE(A1:A3,B1:B3,0.05)'],
      ],
    });
    expect(sheet.errors).toEqual([]);
    const one = [sheet.values[4][0], sheet.values[4][1]] as number[];
    expect(sheet.values[3]).toEqual(["low pH", "high pH", "method"]);
    const both = [sheet.values[7][0], sheet.values[7][1]] as number[];
    expect(one[1] - one[0]).toBeGreaterThan(0);
    expect(one[1] - one[0]).toBeLessThan(both[1] - both[0]);
  });

  test.each([
    [`=AQ.PHRANGE(${PHOSPHATE},{0.1;0.1;0.1})`, /amount_tolerance is 3×1 cells but names is 2×1/],
    [`=AQ.PHRANGE(${PHOSPHATE},1.5)`, /tolerance/],
    [`=AQ.PHRANGE(${PHOSPHATE},0.02,-1)`, /pKa uncertainty/],
  ])("%s → #VALUE!", (formula, message) => {
    expectError(formula, "#VALUE!", message);
  });
});
