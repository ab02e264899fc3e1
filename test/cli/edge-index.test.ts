/**
 * src/cli/hf-edge-index.ts: the Set index beside HyperFormula's adjacency arrays must change no
 * result and must match the arrays exactly, through additions and removals of edges.
 * (Its speed is measured by scripts/bench.ts part b, not here.)
 */
import { HyperFormula, type RawCellContent } from "hyperformula";
import { edgeIndexInstalled, edgeIndexOf, INDEX_FROM, installEdgeIndex, uninstallEdgeIndex } from "../../src/cli/hf-edge-index";
import { registerAqFunctions } from "../../src/cli/hf-plugin";

const CONFIG = { licenseKey: "gpl-v3", smartRounding: false, useArrayArithmetic: true } as const;
const ROWS = 120; // well above INDEX_FROM, so the shared cells' arrays are indexed

/** A what-if table: names in E1:F1 and a temperature in H1 shared by every row; sums and lookups too. */
function table(): RawCellContent[][] {
  const rows: RawCellContent[][] = [["acid", "salt", "pH", "", "acetic acid", "sodium acetate", "", 25]];
  for (let i = 0; i < ROWS; i++) {
    const r = i + 2;
    rows.push([
      0.01 + (i % 7) * 0.003,
      0.01 + (i % 5) * 0.004,
      `=AQ.PH($E$1:$F$1,A${r}:B${r},$H$1)`,
      `=SUM($A$2:A${r})+$H$1`,
      `=IF(C${r}>4.7,"above","below")`,
    ]);
  }
  return rows;
}

/** Edits that add and remove edges: formulas replaced by values and back, rows inserted and removed. */
const EDITS: ((hf: HyperFormula) => void)[] = [
  (hf) => hf.setCellContents({ sheet: 0, row: 0, col: 7 }, 37),
  (hf) => hf.setCellContents({ sheet: 0, row: 10, col: 2 }, 5),
  (hf) => hf.setCellContents({ sheet: 0, row: 10, col: 2 }, "=AQ.PH($E$1:$F$1,A11:B11,$H$1)"),
  (hf) => hf.removeRows(0, [20, 15]),
  (hf) => hf.addRows(0, [5, 3]),
  (hf) => hf.setCellContents({ sheet: 0, row: 6, col: 2 }, "=AQ.PH($E$1:$F$1,A7:B7,$H$1)"),
  (hf) => hf.setCellContents({ sheet: 0, row: 0, col: 4 }, "formic acid"),
  (hf) => hf.moveCells({ start: { sheet: 0, row: 0, col: 7 }, end: { sheet: 0, row: 0, col: 7 } }, { sheet: 0, row: 0, col: 8 }),
  (hf) => hf.setCellContents({ sheet: 0, row: 0, col: 8 }, null),
];

/** Values after building the sheet and after each edit. */
function history(): unknown[] {
  const hf = HyperFormula.buildFromSheets({ S: table() }, CONFIG);
  try {
    const out: unknown[] = [hf.getSheetValues(0)];
    for (const edit of EDITS) {
      edit(hf);
      out.push(hf.getSheetValues(0));
    }
    return out;
  } finally {
    hf.destroy();
  }
}

type Graph = { edgesSparseArray: (number | undefined)[][] };

/** Every indexed adjacency array of an engine's graph: its index must hold exactly its ids. */
function checkIndexes(hf: HyperFormula): number {
  const graph = (hf as unknown as { dependencyGraph: { graph: Graph } }).dependencyGraph.graph;
  let indexed = 0;
  graph.edgesSparseArray.forEach((edges) => {
    if (edges === undefined) return;
    const set = edgeIndexOf(edges);
    if (set === undefined) return;
    indexed += 1;
    const ids = new Set(edges.filter((id): id is number => id !== undefined));
    expect([...set].sort((a, b) => a - b)).toEqual([...ids].sort((a, b) => a - b));
    expect(edges.filter((id) => id !== undefined).length).toBe(ids.size); // no id stored twice
  });
  return indexed;
}

beforeAll(() => registerAqFunctions());
afterAll(() => installEdgeIndex({ reenable: true }));

describe("HyperFormula edge index", () => {
  test("installs on the pinned HyperFormula (if this fails, the graph changed shape: see hf-edge-index.ts)", () => {
    uninstallEdgeIndex();
    expect(edgeIndexInstalled()).toBeNull();
    expect(installEdgeIndex()).toBe(false); // stays out until re-enabled
    expect(installEdgeIndex({ reenable: true })).toBe(true);
    expect(edgeIndexInstalled()).toBe(true);
  });

  test("a sheet and every edit give the same values with and without the index", () => {
    uninstallEdgeIndex();
    const plain = history();
    expect(installEdgeIndex({ reenable: true })).toBe(true);
    const indexed = history();
    expect(indexed).toEqual(plain);
    // The table really computes: pH in C, the shared temperature in D.
    const first = plain[0] as unknown[][];
    expect(typeof first[1][2]).toBe("number");
    expect(first[1][2] as number).toBeGreaterThan(3.5);
    expect(first[1][2] as number).toBeLessThan(6);
  });

  test("each index holds exactly the ids of its array, after building and after every edit", () => {
    expect(installEdgeIndex({ reenable: true })).toBe(true);
    const hf = HyperFormula.buildFromSheets({ S: table() }, CONFIG);
    try {
      // The shared cells (E1, F1, H1 and the range E1:F1) each have more than INDEX_FROM dependents.
      expect(ROWS).toBeGreaterThan(INDEX_FROM);
      expect(checkIndexes(hf)).toBeGreaterThan(0);
      for (const edit of EDITS) {
        edit(hf);
        hf.getSheetValues(0);
        checkIndexes(hf);
      }
    } finally {
      hf.destroy();
    }
  });

  test("removing an edge that is not there still throws, as HyperFormula does", () => {
    expect(installEdgeIndex({ reenable: true })).toBe(true);
    const hf = HyperFormula.buildFromSheets({ S: table() }, CONFIG);
    try {
      const graph = (hf as unknown as { dependencyGraph: { graph: Graph & { removeEdge(a: number, b: number): void } } }).dependencyGraph.graph;
      const from = graph.edgesSparseArray.findIndex((edges) => edges !== undefined && edges.length > INDEX_FROM);
      expect(from).toBeGreaterThanOrEqual(0);
      expect(() => graph.removeEdge(from, from)).toThrow(/does not exist/);
      const to = graph.edgesSparseArray[from].find((id) => id !== undefined) as number;
      graph.removeEdge(from, to);
      expect(edgeIndexOf(graph.edgesSparseArray[from])?.has(to)).toBe(false);
      expect(() => graph.removeEdge(from, to)).toThrow(/does not exist/);
    } finally {
      hf.destroy();
    }
  });
});
