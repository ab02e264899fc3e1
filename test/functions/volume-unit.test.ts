/**
 * Issue 18 item 4 through the embedded spreadsheet engine: volumes given back (ADJUST's stock,
 * RECIPE's stock column, CURVE's volumes) are in the unit the batch volume is written in — "800 mL"
 * gives mL, labelled; a number or "L" gives L (chem/units.ts, writtenVolumeUnit; docs/functions/README.md).
 * The same answer in mL and in L is the same amount, and the mL answers fed back through AQ.PH give the target.
 */
import { evaluateFormula, type CellResult } from "../../src/cli/evaluate";
import { writtenVolumeUnit } from "../../src/chem";

function value(formula: string): CellResult | CellResult[][] {
  const r = evaluateFormula(formula);
  if (r.error !== undefined) throw new Error(`${formula}\n  → ${r.error} ${r.message}`);
  return r.value as CellResult | CellResult[][];
}
const num = (f: string): number => value(f) as number;
const table = (f: string): CellResult[][] => value(f) as CellResult[][];

function expectNear(actual: number, expected: number, tol: number, context: string): void {
  if (!(Math.abs(actual - expected) <= tol)) throw new Error(`${context}\n  actual ${actual}\n  expected ${expected} ± ${tol}`);
}

describe("the unit of a volume given back is the unit the batch volume is written in", () => {
  test.each([
    ["800 mL", "mL", 1e-3],
    ["800 ml", "mL", 1e-3],
    ["2 µL", "µL", 1e-6],
    ["1.5 L", "L", 1],
    [1.5, "L", 1],
    ["1.5", "L", 1],
    ["1 dm3", "dm3", 1],
  ])("%p → %s", (written, symbol, litres) => {
    const u = writtenVolumeUnit(written);
    expect(u.symbol).toBe(symbol);
    expect(Math.abs(u.litres - litres)).toBeLessThan(1e-15);
  });

  test("ADJUST: 800 mL gives mL, 0.8 gives L, the same amount; the mL answer fed back reads the target", () => {
    const ml = num('=AQ.ADJUST({"acetic acid";"sodium acetate"},{0.05;0.05},5,"NaOH",1,"800 mL")');
    const l = num('=AQ.ADJUST({"acetic acid";"sodium acetate"},{0.05;0.05},5,"NaOH",1,0.8)');
    expectNear(ml, l * 1000, 1e-9 * ml, "mL = 1000 × L");
    const v = ml / 1000;
    const d = 0.8 / (0.8 + v);
    expectNear(num(`=AQ.PH({"acetic acid";"sodium acetate";"NaOH"},{${0.05 * d};${0.05 * d};${v / (0.8 + v)}})`), 5, 1e-6, "fed back");
  });

  test("RECIPE: '800 mL' labels the stock column 'mL of stock'; 0.8 keeps 'litres of stock'; the mL recipe fed back reads the target", () => {
    const ml = table('=AQ.RECIPE("Tris","HCl 1 M",7.5,"50 mM","800 mL")');
    const l = table('=AQ.RECIPE("Tris","HCl 1 M",7.5,"50 mM",0.8)');
    expect(ml[0]).toEqual(["component", "mol", "grams", "mL of stock"]);
    expect(l[0]).toEqual(["component", "mol", "grams", "litres of stock"]);
    expectNear(ml[2][3] as number, (l[2][3] as number) * 1000, 1e-9, "mL = 1000 × L");
    // HCl 1 M: the mL of stock over the batch's 800 mL is the HCl concentration
    expectNear(num(`=AQ.PH({"Tris";"HCl"},{0.05;${(ml[2][3] as number) / 800}})`), 7.5, 0.001, "fed back");
  });

  test("CURVE: '50 mL' starting volume gives mL columns, labelled; the equivalence at 50 mL of 0.1 M NaOH; a point fed back", () => {
    const rows = table('=AQ.CURVE("acetic acid",0.1,"NaOH",0.1,"50 mL","80 mL",9)');
    expect(rows[0]).toEqual(["titrant volume (mL)", "pH", "marked point", "marked volume (mL)", "marked pH"]);
    const eq = rows.find((r) => r[2] === "stoichiometric equivalence 1")!;
    expectNear(eq[3] as number, 50, 1e-9, "equivalence in mL");
    const [v, pH] = rows[3] as [number, number]; // 20 mL
    expectNear(num(`=AQ.PH({"acetic acid";"NaOH"},{${(0.1 * 50) / (50 + v)};${(0.1 * v) / (50 + v)}})`), pH, 1e-9, "curve point fed back");
  });
});
