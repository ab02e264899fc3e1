/**
 * Issue 18 item 6 through the embedded spreadsheet engine: AQ.PHRANGE's temperature as "5 ± 3 °C"
 * (the same search as two cells, 2 and 8 °C), and the statistical band beside the worst case —
 * pH₀ ± k·u, k = 2, GUM linear propagation of rectangular standard uncertainties, the method named.
 * Every number is checked against AQ.PH in the same engine.
 * Invented scenario: Halvorsen Biologics' Tris–HCl diluent, stored at 5 ± 3 °C.
 */
import { evaluateFormula, type CellResult } from "../../src/cli/evaluate";

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

const MIX = '{"Tris";"HCl"},{0.05;0.025}';

describe("AQ.PHRANGE temperature with a tolerance", () => {
  test.each(['"5 ± 3 °C"', '"5 +/- 3 degC"', '"5 °C ± 3 °C"', '"278.15 ± 3 K"', '"41 ± 5.4 °F"'])("%s searches 2–8 °C exactly as the two cells {2,8}", (t) => {
    const cells = table(`=AQ.PHRANGE(${MIX},0.02,0.01,{2,8})`);
    const tol = table(`=AQ.PHRANGE(${MIX},0.02,0.01,${t})`);
    expectNear(tol[1][0] as number, cells[1][0] as number, 1e-9, "low");
    expectNear(tol[1][1] as number, cells[1][1] as number, 1e-9, "high");
    expect(tol[1][2]).toMatch(/at each of \d+ temperatures from 2 to 8 °C/);
  });

  test("the band over 5 ± 3 °C holds AQ.PH of the nominal batch at 2, 5 and 8 °C", () => {
    const rows = table(`=AQ.PHRANGE(${MIX},0.02,0.01,"5 ± 3 °C")`);
    for (const t of [2, 5, 8]) {
      const pH = num(`=AQ.PH(${MIX},${t})`);
      expect(pH).toBeGreaterThan(rows[1][0] as number);
      expect(pH).toBeLessThan(rows[1][1] as number);
    }
  });

  test.each([
    ['"5 ± 98 °C"', /outside 0–100 °C/],
    ['"5 ± -3 °C"', /tolerance .* must be a number ≥ 0/],
    ['"5 °C ± 3 K"', /different units/],
    ['"x ± 3"', /write for example "5 ± 3 °C"/],
  ])("temperature %s is #VALUE!", (t, message) => {
    const r = evaluateFormula(`=AQ.PHRANGE(${MIX},0.02,0.01,${t})`);
    expect(r.error).toBe("#VALUE!");
    expect(r.message ?? "").toMatch(message);
  });
});

/** The worst-case row and the statistical row of a PHRANGE table, as [low, high, method, sLow, sHigh, sMethod]. */
function band(formula: string): [number, number, string, number, number, string] {
  const rows = table(formula);
  expect(rows[0]).toEqual(["low pH", "high pH", "method"]);
  expect(rows).toHaveLength(3);
  return [...rows[1], ...rows[2]] as [number, number, string, number, number, string];
}

describe("AQ.PHRANGE statistical band beside the worst case", () => {
  test("a row below the worst case: pH₀ ± k·u with k = 2, GUM linear propagation named, inside the worst case", () => {
    const [low, high, , sLow, sHigh, sMethod] = band(`=AQ.PHRANGE(${MIX},0.02,0.01,5)`);
    expect(sMethod).toMatch(/^GUM linear propagation: \d\.\d{3} ± 2 × [\d.e-]+, k = 2$/);
    // pH₀ is AQ.PH of the nominal batch; the band is symmetric about it
    const nominal = num(`=AQ.PH(${MIX},5)`);
    expectNear((sLow + sHigh) / 2, nominal, 1e-12, "centre of the statistical band is AQ.PH");
    // with these three varied quantities the statistical band lies inside the worst case (checked here, not assumed in general)
    expect(sLow).toBeGreaterThan(low);
    expect(sHigh).toBeLessThan(high);
  });

  test("one varied quantity: k·u = 2·|ΔpH|/√3, with ΔpH the half-difference of AQ.PH at the two ends", () => {
    // only HCl varies (Tris tolerance 0, no pKa uncertainty): u = |∂pH/∂c|·h/√3
    const sheetRow = band(`=AQ.PHRANGE(${MIX},{0;0.01},0,25)`);
    const up = num('=AQ.PH({"Tris";"HCl"},{0.05;0.02525})');
    const down = num('=AQ.PH({"Tris";"HCl"},{0.05;0.02475})');
    const ku = (sheetRow[4] - sheetRow[3]) / 2;
    expectNear(ku, (2 * Math.abs(up - down)) / 2 / Math.sqrt(3), 1e-6, "k·u from AQ.PH at the tolerance ends");
    // and the worst case with one monotone quantity is exactly those two ends
    expectNear(sheetRow[0], Math.min(up, down), 1e-9, "worst-case low");
    expectNear(sheetRow[1], Math.max(up, down), 1e-9, "worst-case high");
  });

  test("over 2–8 °C the temperature is one more quantity: the band centres on AQ.PH at 5 °C and is wider than at 5 °C alone", () => {
    const over = band(`=AQ.PHRANGE(${MIX},0.02,0.01,"5 ± 3 °C")`);
    const at5 = band(`=AQ.PHRANGE(${MIX},0.02,0.01,5)`);
    expectNear((over[3] + over[4]) / 2, num(`=AQ.PH(${MIX},5)`), 1e-12, "centre at the middle temperature");
    expect(over[4] - over[3]).toBeGreaterThan(at5[4] - at5[3]);
    expect(over[5]).toMatch(/^GUM linear propagation \(T included\): /);
    // the temperature term alone: (pH(8) − pH(2))/2 over √3, times k = 2, adds in quadrature
    const tTerm = (num(`=AQ.PH(${MIX},8)`) - num(`=AQ.PH(${MIX},2)`)) / 2 / Math.sqrt(3);
    const uOver = (over[4] - over[3]) / 4;
    const uAt5 = (at5[4] - at5[3]) / 4;
    expectNear(uOver, Math.sqrt(uAt5 ** 2 + tTerm ** 2), 1e-9, "u over the range = √(u(5 °C)² + u(T)²)");
  });

  test("no tolerance: both bands are the nominal pH and u = 0", () => {
    const row = band(`=AQ.PHRANGE(${MIX},0,0,25)`);
    const nominal = num(`=AQ.PH(${MIX})`);
    for (const i of [0, 1, 3, 4]) expectNear(row[i] as number, nominal, 1e-12, `cell ${i + 1}`);
    expect(row[5]).toMatch(/± 2 × 0, k = 2$/);
  });
});
