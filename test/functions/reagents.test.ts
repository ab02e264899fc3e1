/**
 * Issue 18 item 3 in the embedded spreadsheet engine, typed as a user types it: concentrated
 * reagents as supplied ("HCl 37 % w/w", "NaOH 50 %", "phosphoric acid 85 %", "ammonia 25 %",
 * "glacial acetic acid") in ADJUST, RECIPE and CURVE. Every answer is fed back through AQ.PH.
 * Invented scenario: Halvorsen Biologics' manufacturing floor doses concentrated reagents by volume.
 */
import { evaluateFormula, type CellResult } from "../../src/cli/evaluate";

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

/** mol/L of a reagent as the sheet states it: RECIPE's mol over litres for a strong reagent against Tris. */
const molarity = (reagent: string, base = "Tris"): number => {
  const rows = table(`=AQ.RECIPE("${reagent}","${base}",8,0.05,1)`);
  return (rows[1][1] as number) / (rows[1][3] as number);
};

describe("concentrated reagents in AQ.RECIPE", () => {
  test("Tris pH 8.0 with 37 % HCl: litres and grams of the acid as supplied, the row naming its molarity and density; fed back within 0.001", () => {
    const rows = table('=AQ.RECIPE("HCl 37 % w/w","Tris",8,"50 mM","200 L")');
    expect(rows[1][0]).toMatch(/^hydrochloric acid 37 % w\/w \(12\.0\d mol\/L, 1\.18\d g\/mL at 20 °C\)$/);
    const mol = rows[1][1] as number;
    const grams = rows[1][2] as number;
    const litres = rows[1][3] as number;
    // grams of 37 % acid = mol·M(HCl)/0.37; and litres·density = kg
    expectNear(grams, (mol * num('=AQ.MOLARMASS("HCl")')) / 0.37, 1e-9 * grams, "grams of reagent");
    const density = Number(/(\d\.\d+) g\/mL/.exec(rows[1][0] as string)![1]);
    expectNear(grams / (litres * 1000), density, 0.0005, "grams over millilitres is the density");
    const names = rows.slice(1).map((r) => `"${String(r[0]).replace(/ \d.*$/, "")}"`).join(";");
    const concs = rows.slice(1).map((r) => (r[1] as number) / 200).join(";");
    expectNear(num(`=AQ.PH({${names}},{${concs}})`), 8, 0.001, "Tris + HCl fed back");
  });

  test("phosphate pH 7.0 from 85 % phosphoric acid and 50 % NaOH: both as supplied; fed back within 0.001", () => {
    const rows = table('=AQ.RECIPE("phosphoric acid 85 %","NaOH 50 %",7,"100 mM",50)');
    expect(rows.slice(1).map((r) => String(r[0]).replace(/ \(.*$/, ""))).toEqual(["phosphoric acid 85 % w/w", "sodium hydroxide 50 % w/w"]);
    for (const r of rows.slice(1)) expect(typeof r[2] === "number" && typeof r[3] === "number").toBe(true);
    const pH = num(`=AQ.PH({"phosphoric acid";"NaOH"},{${(rows[1][1] as number) / 50};${(rows[2][1] as number) / 50}})`);
    expectNear(pH, 7, 0.001, "H3PO4 + NaOH fed back");
  });

  test("ammonium buffer pH 9.2 from 25 % ammonia and ammonium chloride; fed back within 0.001", () => {
    const rows = table('=AQ.RECIPE("ammonium chloride","ammonia 25 %",9.2,"100 mM",10)');
    expect(rows[2][0]).toMatch(/^ammonia \(aqueous\) 25 % w\/w/);
    const pH = num(`=AQ.PH({"ammonium chloride";"ammonia"},{${(rows[1][1] as number) / 10};${(rows[2][1] as number) / 10}})`);
    expectNear(pH, 9.2, 0.001, "NH4Cl + NH3 fed back");
  });

  test("acetate pH 4.76 from glacial acetic acid and sodium acetate trihydrate; fed back within 0.001", () => {
    const rows = table('=AQ.RECIPE("glacial acetic acid","sodium acetate trihydrate",4.76,"50 mM",20)');
    expect(rows[1][0]).toMatch(/^acetic acid 100 % w\/w \(17\.4\d mol\/L, 1\.048 g\/mL at 20 °C\)$/);
    const pH = num(`=AQ.PH({"acetic acid";"sodium acetate trihydrate"},{${(rows[1][1] as number) / 20};${(rows[2][1] as number) / 20}})`);
    expectNear(pH, 4.76, 0.001, "acetic acid + acetate fed back");
  });

  test("the spellings agree: 'HCl 37 % w/w', 'hydrochloric acid 37 %', '37 % HCl', 'HCl (37 % m/m)'", () => {
    const c = molarity("HCl 37 % w/w");
    for (const s of ["hydrochloric acid 37 %", "37 % HCl", "HCl (37 % m/m)", "37 % w/w hydrochloric acid"]) expect(molarity(s)).toBe(c);
  });

  test("interpolated between table points: the molarity rises with the mass fraction, and 37 % lies between 36 % and 38 %", () => {
    const at = [30, 33, 36, 37, 38].map((p) => molarity(`HCl ${p} %`));
    for (let i = 1; i < at.length; i++) expect(at[i]).toBeGreaterThan(at[i - 1]);
  });
});

describe("concentrated reagents in AQ.ADJUST and AQ.CURVE", () => {
  test("800 L of 20 mM Tris to pH 7.5 with 37 % HCl: litres of acid as supplied; the diluted batch reads 7.5", () => {
    const v = num('=AQ.ADJUST("Tris","20 mM",7.5,"hydrochloric acid 37 %",,800)');
    const c = molarity("hydrochloric acid 37 %");
    const total = 800 + v;
    expectNear(num(`=AQ.PH({"Tris";"HCl"},{${(0.02 * 800) / total};${(c * v) / total}})`), 7.5, 1e-6, "Tris + 37 % HCl fed back");
  });

  test("50 % NaOH into 100 L of 50 mM acetic acid to pH 5.0; fed back", () => {
    const v = num('=AQ.ADJUST("acetic acid",0.05,5,"NaOH 50 % w/w",,100)');
    const c = molarity("NaOH 50 % w/w", "Tris HCl");
    const total = 100 + v;
    expectNear(num(`=AQ.PH({"acetic acid";"NaOH"},{${(0.05 * 100) / total};${(c * v) / total}})`), 5, 1e-6, "acetic acid + 50 % NaOH fed back");
  });

  test("CURVE with 50 % NaOH: volumes of the reagent as supplied; a point fed back through AQ.PH", () => {
    const rows = table('=AQ.CURVE("acetic acid",0.1,"NaOH 50 %","",1,0.01,5)');
    const c = molarity("NaOH 50 %", "Tris HCl");
    const [v, pH] = rows[2] as [number, number];
    expectNear(num(`=AQ.PH({"acetic acid";"NaOH"},{${0.1 / (1 + v)};${(c * v) / (1 + v)}})`), pH, 1e-6, "curve point fed back");
    // the stoichiometric equivalence: 0.1 mol of acid over the reagent's molarity
    const eq = rows.slice(1).find((r) => r[2] === "stoichiometric equivalence 1")!;
    expectNear(eq[3] as number, 0.1 / c, 1e-9, "equivalence volume of 50 % NaOH");
  });

  test.each([
    ['=AQ.ADJUST("Tris",0.05,8,"HCl 40 %",,100)', /40 % w\/w is outside the density table of hydrochloric acid \(0–38 % HCl by mass at 20 °C\)/],
    ['=AQ.ADJUST("Tris",0.05,8,"HCl 37 % v/v",,100)', /only a percentage by mass/],
    ['=AQ.ADJUST("Tris",0.05,8,"KOH 45 %",,100)', /'potassium hydroxide' has no density table/],
    ['=AQ.ADJUST("Tris",0.05,8,"HCl 37 %",1,100)', /already names its stock concentration/],
    ['=AQ.ADJUST("Tris",0.05,8,"HCl 37 %")', /give the batch volume too/],
    ['=AQ.CURVE("acetic acid",0.1,"NaOH 50 %",1,1,0.01)', /already names its stock concentration/],
    ['=AQ.RECIPE("glacial HCl","Tris",8,0.05,1)', /only acetic acid is sold as "glacial"/],
    ['=AQ.RECIPE("ammonium chloride","ammonia 56.6 %",9.2,0.1,1)', /outside the density table of ammonia \(aqueous\) \(0–30 % NH3/],
  ])("%s is #VALUE!", (formula, message) => expectError(formula, "#VALUE!", message));
});
