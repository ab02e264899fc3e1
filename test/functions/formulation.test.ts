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
