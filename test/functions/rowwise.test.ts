/**
 * Row-wise tables (src/functions/rowwise.ts): names as one row, amounts one row per mixture, later
 * arguments one value or a column → one result per row, in one formula. Property checked for every
 * function that gives one value: each row of the table equals the same function called for that row
 * alone (identity: the table is the per-row formulas, side by side), within 1e-12; a blank row is a
 * blank cell; a bad row is its own error value with its own message, and the rows around it are
 * untouched; the whole table in the embedded spreadsheet engine spills the same column.
 */
import { evaluateSheets } from "../../src/cli/evaluate";
import { CATALOGUE } from "../../src/functions/catalogue";
import * as Functions from "../../src/functions/functions";
import { tableRows } from "../../src/functions/rowwise";

type Fn = (...args: unknown[]) => unknown[][];
const fn = (id: string): Fn => (Functions as unknown as Record<string, Fn>)[id]!;

const NAMES = [["acetic acid", "sodium acetate"]];
/** Five mixtures: three ordinary rows, a blank row (4th) and a bad row (5th, negative amount). */
const AMOUNTS = [
  [0.1, 0.1],
  [0.05, 0.1],
  [0.02, 0.01],
  ["", ""],
  [-0.01, 0.1],
];
const GOOD = [0, 1, 2];

interface Case {
  id: string;
  /** Arguments after amounts: a value, or a column of one value per row (5 rows). */
  rest: unknown[];
  /** The same arguments in A1 notation for the sheet (column G holds the per-row column). */
  restA1: string;
  column: unknown[];
}

const col = (xs: unknown[]) => xs.map((x) => [x]);
const TEMPS = [25, 37, 5, 25, 25];

const CASES: Case[] = [
  { id: "PH", rest: [col(TEMPS), "davies"], restA1: 'G2:G6,"davies"', column: TEMPS },
  { id: "BETA", rest: [col(TEMPS)], restA1: "G2:G6", column: TEMPS },
  { id: "CHECK", rest: [col(TEMPS)], restA1: "G2:G6", column: TEMPS },
  { id: "IONIC", rest: [col(TEMPS)], restA1: "G2:G6", column: TEMPS },
  { id: "OSMOLARITY", rest: [col(TEMPS)], restA1: "G2:G6", column: TEMPS },
  { id: "OSMOLALITY", rest: [col(TEMPS), "davies"], restA1: 'G2:G6,"davies"', column: TEMPS },
  { id: "CAPACITY", rest: [col([0.5, -0.3, 0.2, 0.1, 0.1]), 25], restA1: "G2:G6,25", column: [0.5, -0.3, 0.2, 0.1, 0.1] },
  { id: "ADJUST", rest: [col([5, 5.5, 5, 5, 5]), "NaOH", 1, 2], restA1: 'G2:G6,"NaOH",1,2', column: [5, 5.5, 5, 5, 5] },
  { id: "SPECIES", rest: ["CH3COO-", col(TEMPS)], restA1: '"CH3COO-",G2:G6', column: TEMPS },
];

const ROW_WISE = CATALOGUE.filter((e) => e.result === "column").map((e) => e.id);

test("every function that gives one value has a row-wise case here", () => {
  for (const id of ROW_WISE) expect({ id, covered: CASES.some((c) => c.id === id) }).toEqual({ id, covered: true });
});

/** The rest arguments of row r, as a per-row formula would have them. */
function restOfRow(c: Case, r: number): unknown[] {
  return c.rest.map((v) => (Array.isArray(v) && v.length === AMOUNTS.length ? v[r] : v));
}

function close(a: unknown, b: unknown): boolean {
  if (typeof a === "number" && typeof b === "number") return Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(b));
  return JSON.stringify(a) === JSON.stringify(b);
}

describe.each(CASES)("AQ.$id as a row-wise table", (c) => {
  const table = fn(c.id)(NAMES, AMOUNTS, ...c.rest);

  test("one result per row, each equal to the same call for that row alone (within 1e-12)", () => {
    expect(table.length).toBe(AMOUNTS.length);
    for (const r of GOOD) {
      const alone = fn(c.id)(NAMES, [AMOUNTS[r]], ...restOfRow(c, r))[0]![0];
      expect({ row: r, ok: close(table[r]![0], alone), got: table[r]![0], alone }).toMatchObject({ row: r, ok: true });
    }
  });

  test("a blank row is a blank cell; a bad row is its own #VALUE! with its message", () => {
    expect(table[3]).toEqual([""]);
    const bad = table[4]![0] as CustomFunctions.Error;
    expect(bad).toBeInstanceOf(CustomFunctions.Error);
    expect(bad.code).toBe("#VALUE!");
    expect(bad.message).toMatch(/negative/);
  });

  test("the spreadsheet engine spills the same column from one formula as the per-row formulas give", () => {
    const sheet: (string | number | null)[][] = [["acid", "salt", "per row", "table", "acetic acid", "sodium acetate", "arg"]];
    AMOUNTS.forEach((row, i) => {
      const r = i + 2;
      sheet.push([row[0] === "" ? null : (row[0] as number), row[1] === "" ? null : (row[1] as number), `=AQ.${c.id}($E$1:$F$1,A${r}:B${r},${c.restA1.replace("G2:G6", `G${r}`)})`, i === 0 ? `=AQ.${c.id}(E1:F1,A2:B6,${c.restA1})` : null, null, null, c.column[i] as number]);
    });
    const [result] = evaluateSheets({ Sheet1: sheet });
    const values = result!.values;
    for (const r of GOOD) expect({ row: r, ok: close(values[r + 1]![3], values[r + 1]![2]) }).toEqual({ row: r, ok: true });
    expect(values[4]![3]).toBe(""); // the blank row: an empty cell (empty text, as Excel shows a "" result)
    const errors = result!.errors.filter((e) => e.address === "D6");
    expect(errors).toEqual([{ address: "D6", error: "#VALUE!", message: expect.stringMatching(/negative/) }]);
  });
});

describe("shapes", () => {
  test("tableRows: names one row and amounts N×k; or one mixture with a column argument; else one value", () => {
    expect(tableRows([[1, 2], [5, 2]])).toBe(5);
    expect(tableRows([[1, 2], [1, 2], [4, 1]])).toBe(4);
    expect(tableRows([[2, 1], [2, 1], [3, 1]])).toBe(3); // a fixed mixture in a column, a column of temperatures
    expect(tableRows([[2, 1], [2, 1]])).toBe(0); // the usual one-mixture layout
    expect(tableRows([[1, 2], [5, 3]])).toBe(0); // widths differ: the function says so
    expect(tableRows([[1, 2], [5, 2], [4, 1]])).toBe(0); // a column of another length
  });

  test("a fixed mixture over a column of temperatures equals the per-temperature calls", () => {
    const names = [["KH2PO4"], ["Na2HPO4"]];
    const amounts = [[0.025], [0.025]];
    const table = fn("PH")(names, amounts, col([5, 25, 37, ""]));
    [5, 25, 37].forEach((t, r) => expect(table[r]![0]).toBe(fn("PH")(names, amounts, t)[0]![0]));
    expect(table[3]).toEqual([""]); // a blank row
  });

  test("one mixture gives a 1×1 table holding the value (Excel shows it as the value)", () => {
    const one = fn("PH")(NAMES, [[0.1, 0.1]]);
    expect(one).toHaveLength(1);
    expect(one[0]).toHaveLength(1);
    expect(typeof one[0]![0]).toBe("number");
  });

  test("a column of the wrong length, or a block, is an error of the whole formula", () => {
    expect(() => fn("PH")(NAMES, AMOUNTS, col([25, 37]))).toThrow(/3rd argument is 2×1 cells but the table has 5 rows/);
    expect(() => fn("PH")(NAMES, [[0.1, 0.1]], [[25, 37], [5, 10]])).toThrow(/3rd argument is 2×2 cells/);
  });

  test("an unknown name fails the whole table once, with the closest names", () => {
    expect(() => fn("PH")([["acetic acid", "sodium acetat"]], AMOUNTS)).toThrow(/Unknown substance 'sodium acetat'.*sodium acetate/);
  });

  test("AQ.SPECIES without a species gives its full table for one mixture, and an error per row for a table", () => {
    expect(fn("SPECIES")(NAMES, [[0.1, 0.1]])[0]).toEqual(["species", "charge", "mol/L", "fraction"]);
    const rows = fn("SPECIES")(NAMES, AMOUNTS.slice(0, 2));
    expect((rows[0]![0] as CustomFunctions.Error).message).toMatch(/name the species/);
  });
});
