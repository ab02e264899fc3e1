/**
 * Issue 18 in the embedded spreadsheet engine, typed as a user types it: RECIPE with the rest of the
 * batch held fixed. Every answer is fed back through AQ.PH in the same engine.
 * Invented scenario: Halvorsen Biologics' 20 mM histidine, 150 mM NaCl, 5 % sucrose drug-product buffer.
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

/** A RECIPE table fed back through AQ.PH: every row's mol over the batch volume. */
function fedBack(rows: CellResult[][], litres: number, temperature: number): number {
  const names = rows.slice(1).map((r) => `"${r[0]}"`).join(";");
  const concs = rows.slice(1).map((r) => (r[1] as number) / litres).join(";");
  return num(`=AQ.PH({${names}},{${concs}},${temperature})`);
}

describe("AQ.RECIPE other_names / other_amounts", () => {
  test("histidine pH 6.0 at 5 °C with 150 mM NaCl and 5 % w/v sucrose: listed, and fed back within 0.001", () => {
    const rows = table('=AQ.RECIPE("histidine HCl monohydrate","L-histidine",6,"20 mM","50 L",5,,,,{"NaCl";"sucrose"},{"150 mM";"5 % w/v"})');
    expect(rows.map((r) => r[0])).toEqual(["component", "L-histidine monohydrochloride monohydrate", "L-histidine", "sodium chloride", "sucrose"]);
    expectNear(rows[3][1] as number, 0.15 * 50, 1e-12, "NaCl mol for 50 L");
    expectNear(rows[4][2] as number, 50 * 50, 1e-9, "sucrose grams: 5 % w/v is 50 g/L");
    expectNear(fedBack(rows, 50, 5), 6.0, 0.001, "whole batch fed back at 5 °C");
  });

  test("the same histidine recipe made without the NaCl misses pH 6.0 once the NaCl is in", () => {
    const rows = table('=AQ.RECIPE("histidine HCl monohydrate","L-histidine",6,"20 mM",1,5)');
    const names = rows.slice(1).map((r) => `"${r[0]}"`).join(";");
    const concs = rows.slice(1).map((r) => r[1] as number).join(";");
    const pH = num(`=AQ.PH({${names};"NaCl"},{${concs};0.15},5)`);
    expect(Math.abs(pH - 6.0)).toBeGreaterThan(0.01);
  });

  test("other components in a row, with an ionic-strength target on top", () => {
    const rows = table('=AQ.RECIPE("NaH2PO4·H2O","Na2HPO4·7H2O",7.2,"10 mM",2,25,0.2,"KCl",,{"NaCl","L-arginine monohydrochloride"},{0.05,"25 mM"})');
    expect(rows.map((r) => r[0])).toEqual(["component", "sodium dihydrogen phosphate monohydrate", "disodium hydrogen phosphate heptahydrate", "potassium chloride", "sodium chloride", "L-arginine monohydrochloride"]);
    expectNear(fedBack(rows, 2, 25), 7.2, 0.001, "phosphate + KCl + NaCl + arginine HCl fed back");
  });

  test.each([
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,,,,{"NaCl"})', /other_names needs other_amounts/],
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,,,,,{0.1})', /other_amounts needs other_names/],
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,,,,{"NaCl";"sucrose"},{0.1})', /other components: other_names is 2×1 cells but other_amounts is 1×1/],
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,,,,{"Na2HPO4·7H2O"},{0.01})', /buffer's own system/],
    ['=AQ.RECIPE("KH2PO4","Na2HPO4",7,0.05,1,25,,,,{"NaCl"},{-0.1})', /other components: .*negative/],
  ])("%s is #VALUE!", (formula, message) => expectError(formula, "#VALUE!", message));
});

describe("AQ.ADJUST measured_pH", () => {
  const PHOS = '{"NaH2PO4·H2O";"Na2HPO4·7H2O"},{0.018375;0.031625}';

  test("500 L of 50 mM phosphate reads 7.35, must be 7.10: litres of 1 M HCl; the batch as measured plus that HCl reads 7.10", () => {
    const litres = num(`=AQ.ADJUST(${PHOS},7.1,"HCl",1,"500 L",25,,7.35)`);
    // The batch as it really is: the nominal composition plus the NaOH excess that reads 7.35.
    const e = num(`=AQ.ADJUST(${PHOS},7.35,"NaOH")`);
    expectNear(num(`=AQ.PH({"NaH2PO4·H2O";"Na2HPO4·7H2O";"NaOH"},{0.018375;0.031625;${e}})`), 7.35, 1e-9, "true batch reads 7.35");
    const d = 500 / (500 + litres);
    const after = num(`=AQ.PH({"NaH2PO4·H2O";"Na2HPO4·7H2O";"NaOH";"HCl"},{${0.018375 * d};${0.031625 * d};${e * d};${litres / (500 + litres)}})`);
    expectNear(after, 7.1, 1e-6, `pH after ${litres} L of 1 M HCl`);
  });

  test("the figures on the ADJUST page: right when the excess is strong base, off when the buffer total is wrong", () => {
    const model = num(`=AQ.ADJUST(${PHOS},7.1,"HCl",1,500,25,,7.35)`);
    expectNear(model, 3.07, 0.005, "from the measured pH");
    // Too much Na2HPO4·7H2O: the extra that reads 7.35, then the HCl the real batch needs.
    const extra = num(`=AQ.ADJUST(${PHOS},7.35,"Na2HPO4·7H2O")`);
    expectNear(extra * 1000, 31.8, 0.05, "mM of Na2HPO4·7H2O too much");
    expectNear(num(`=AQ.ADJUST({"NaH2PO4·H2O";"Na2HPO4·7H2O"},{0.018375;${0.031625 + extra}},7.1,"HCl",1,500)`), 4.81, 0.005, "real need, too much Na2HPO4");
    // NaH2PO4·H2O short by 7.9 mM (10.457 mM instead of 18.375): reads 7.35 too.
    const short = '{"NaH2PO4·H2O";"Na2HPO4·7H2O"},{0.010457;0.031625}';
    expectNear(num(`=AQ.PH(${short})`), 7.35, 0.0005, "NaH2PO4 short reads 7.35");
    expectNear(num(`=AQ.ADJUST(${short},7.1,"HCl",1,500)`), 2.62, 0.005, "real need, NaH2PO4 short");
  });

  test("without measured_pH, the same call starts from the computed pH and gives less HCl", () => {
    const fromMeasured = num(`=AQ.ADJUST(${PHOS},7.0,"HCl",1,500,25,,7.35)`);
    const fromComputed = num(`=AQ.ADJUST(${PHOS},7.0,"HCl",1,500)`);
    expect(fromComputed).toBeLessThan(fromMeasured);
  });

  test.each([
    [`=AQ.ADJUST(${PHOS},7.1,"HCl",,,25,,"seven")`, /measured_pH must be a finite number/],
    [`=AQ.ADJUST(${PHOS},7.1,"HCl",,,25,,16)`, /measured pH 16 is outside/],
  ])("%s is #VALUE!", (formula, message) => expectError(formula, "#VALUE!", message));
});

describe("AQ.OSMOLALITY", () => {
  test("0.9 % saline: about 286 mOsm/kg (common practice) within 1.5 %, below the ideal AQ.OSMOLARITY", () => {
    const osm = num('=AQ.OSMOLALITY("NaCl","0.9 % w/v")');
    expectNear(osm * 1000, 286, 286 * 0.015, "0.9 % saline");
    expect(osm).toBeLessThan(num('=AQ.OSMOLARITY("NaCl","0.9 % w/v")'));
  });

  test("250 mM sucrose reads above the ideal 250 mOsm/L; ideal activity gives osmolarity per kg of water", () => {
    expect(num('=AQ.OSMOLALITY("sucrose",0.25)')).toBeGreaterThan(num('=AQ.OSMOLARITY("sucrose",0.25)'));
    const ideal = num('=AQ.OSMOLALITY({"NaCl";"KH2PO4"},{0.1;0.02},25,"ideal")');
    expect(ideal).toBeGreaterThan(num('=AQ.OSMOLARITY({"NaCl";"KH2PO4"},{0.1;0.02})'));
  });

  test.each([
    ['=AQ.OSMOLALITY("NaCl",-0.1)', "#VALUE!", /negative/],
    ['=AQ.OSMOLALITY("NaCl",0.1,25,"bromley")', "#VALUE!", /"bromley" is not known/],
    ['=AQ.OSMOLALITY("NaCl",3)', "#N/A", /ionic strength/],
  ])("%s is %s", (formula, error, message) => expectError(formula, error, message));
});

describe("AQ.PHRANGE over a temperature range", () => {
  test("Tris stored at 2–8 °C: the band holds the band at 2 °C and at 8 °C, and the pH at each end fed back", () => {
    const over = table('=AQ.PHRANGE({"Tris";"HCl"},{0.05;0.025},0.02,0.01,{2,8})');
    const at2 = table('=AQ.PHRANGE({"Tris";"HCl"},{0.05;0.025},0.02,0.01,2)');
    const at8 = table('=AQ.PHRANGE({"Tris";"HCl"},{0.05;0.025},0.02,0.01,8)');
    expect(over[1][0] as number).toBeLessThanOrEqual(Math.min(at2[1][0] as number, at8[1][0] as number));
    expect(over[1][1] as number).toBeGreaterThanOrEqual(Math.max(at2[1][1] as number, at8[1][1] as number));
    expect(over[1][2]).toMatch(/temperatures from 2 to 8 °C/);
    for (const t of [2, 8]) {
      const pH = num(`=AQ.PH({"Tris";"HCl"},{0.05;0.025},${t})`);
      expect(pH).toBeGreaterThan(over[1][0] as number);
      expect(pH).toBeLessThan(over[1][1] as number);
    }
  });

  test("three temperature cells are #VALUE!", () => {
    expectError('=AQ.PHRANGE({"Tris";"HCl"},{0.05;0.025},0.02,0,{2,5,8})', "#VALUE!", /give one temperature, or two for a range/);
  });
});
