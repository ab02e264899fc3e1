/**
 * A what-if grid as users build one: concentrations down the rows, temperatures across the columns,
 * one AQ.PH per cell referring to its row and column headers — evaluated in the embedded spreadsheet
 * engine. Checked against single-formula evaluation and the published temperature behaviour.
 */
import { evaluateFormula, evaluateSheets } from "../../src/cli/evaluate";
import { columnName } from "../../src/cli/evaluate";

const TEMPERATURES = [5, 15, 25, 37, 50];
const CONCENTRATIONS = [0.005, 0.01, 0.025, 0.05, 0.1]; // mol/L of each phosphate form (equimolar)

function buildGrid(): (string | number | null)[][] {
  const rows: (string | number | null)[][] = [["KH2PO4"], ["Na2HPO4"], [null, ...TEMPERATURES]];
  CONCENTRATIONS.forEach((c, i) => {
    const r = i + 4; // 1-based sheet row of this concentration
    const row: (string | number | null)[] = [c];
    TEMPERATURES.forEach((_, j) => {
      const col = columnName(j + 1);
      row.push(`=AQ.PH($A$1:$A$2,{1;1}*$A${r},${col}$3)`);
    });
    rows.push(row);
  });
  return rows;
}

describe("what-if grid of pH over concentration × temperature", () => {
  const [sheet] = evaluateSheets({ Grid: buildGrid() });
  const cell = (i: number, j: number) => sheet!.values[3 + i]![1 + j] as number;

  test("every cell evaluates, and equals the same formula typed alone", () => {
    expect(sheet!.errors).toEqual([]);
    CONCENTRATIONS.forEach((c, i) =>
      TEMPERATURES.forEach((t, j) => {
        const alone = evaluateFormula(`=AQ.PH({"KH2PO4";"Na2HPO4"},{${c};${c}},${t})`).value;
        expect({ c, t, pH: cell(i, j) }).toEqual({ c, t, pH: alone });
      }),
    );
  });

  test("pH falls as temperature rises, at every concentration (Ph. Eur. 2.2.3: ΔpH/Δt = −0.0028 K⁻¹ for the 0.025/0.025 phosphate)", () => {
    CONCENTRATIONS.forEach((_, i) => {
      for (let j = 1; j < TEMPERATURES.length; j++) expect(cell(i, j)).toBeLessThan(cell(i, j - 1));
    });
    // Ph. Eur. Table 2.2.3.-2 lists 6.90 at 15 °C and 6.87 at 25 °C for the 0.025 M standard: the
    // 15 → 25 °C change is −0.03 ± 0.01 (two-decimal printing).
    const i = CONCENTRATIONS.indexOf(0.025);
    const change = cell(i, 2) - cell(i, 1);
    expect(Math.abs(change - -0.03)).toBeLessThanOrEqual(0.012);
  });

  test("pH falls as the phosphate buffer gets more concentrated (ionic strength lowers the HPO4²⁻ activity)", () => {
    TEMPERATURES.forEach((_, j) => {
      for (let i = 1; i < CONCENTRATIONS.length; i++) expect(cell(i, j)).toBeLessThan(cell(i - 1, j));
    });
  });
});
