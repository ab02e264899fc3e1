/**
 * The row-wise fast path (src/functions/mixture.ts, tableRowReader; used by rowwise.ts): rows of
 * plain numbers are read in place with the names resolved once. Identity checked: every row of a
 * table equals, bit for bit, the same function called on that row alone (the usual path, with its
 * cache key and per-cell checks), for rows the fast path takes and rows it hands back (units, blanks,
 * negative amounts, a concentration beyond the engine's range, repeated rows).
 */
import * as Functions from "../../src/functions/functions";
import { readMixtureArgs, tableRowReader, withRowMixture } from "../../src/functions/mixture";

type Fn = (...args: unknown[]) => unknown[][];
const fn = (id: string): Fn => (Functions as unknown as Record<string, Fn>)[id]!;

const NAMES = [[" Acetic acid", "sodium acetate "]];
const AMOUNTS: unknown[][] = [
  [0.1, 0.1],
  [0.1, 0.1], // repeated: reuses the row before
  [0.05, 0.1],
  ["25 mM", 0.01], // a unit: read the usual way
  [0, 0.02],
  ["", ""], // blank row
  [-0.01, 0.1], // negative: its own error
  [25, 0.1], // beyond the engine's 20 mol/L: its own error, same message
  [0.02, 0.01],
  [0.02, 0.01],
];

const cellText = (v: unknown): unknown => (v instanceof Error ? `${(v as { code?: string }).code} ${v.message}` : v);

describe.each(["PH", "BETA", "IONIC", "OSMOLARITY", "CHECK"])("AQ.%s: a table equals its rows alone, bit for bit", (id) => {
  test("every row", () => {
    const table = fn(id)(NAMES, AMOUNTS, null, null).map((r) => cellText(r[0]));
    const alone = AMOUNTS.map((row) => {
      if (row.every((c) => c === "")) return "";
      try {
        return cellText(fn(id)(NAMES, [row], null, null)[0]![0]);
      } catch (error) {
        return cellText(error); // one mixture: its error is the formula's
      }
    });
    expect(table).toEqual(alone);
    expect(typeof table[0]).toBe(id === "CHECK" ? "string" : "number");
    expect(String(table[6])).toMatch(/negative/);
    expect(String(table[7])).toMatch(/20 mol\/L/);
  });
});

test("the reader takes rows of plain non-negative numbers only, and text names only", () => {
  const read = tableRowReader(NAMES)!;
  expect(read([0.1, 0.2])?.mixture.map((e) => [e.component.name.length > 0, e.conc])).toEqual([
    [true, 0.1],
    [true, 0.2],
  ]);
  expect(read([0.1, 0.2])).toBe(read([0.1, 0.2])); // the row before, reused
  expect(read(["25 mM", 0.1])).toBeNull();
  expect(read([0.1, ""])).toBeNull();
  expect(read([-0.1, 0.1])).toBeNull();
  expect(read([0.1])).toBeNull();
  expect(read([Infinity, 0.1])).toBeNull();
  expect(read([25, 0.1])).toBeNull(); // prepare refuses: the usual path gives the message
  expect(tableRowReader([["acetic acid", ""]])).toBeNull();
  expect(tableRowReader([["acetic acid", 2]])).toBeNull();
});

test("a handed row answers only its own objects, and only during the call", () => {
  const row = [[0.1, 0.1]];
  const handed = tableRowReader(NAMES)!([0.05, 0.05])!;
  const inside = withRowMixture(NAMES, row, handed, (n: unknown, a: unknown) => readMixtureArgs(n, a), [NAMES, row]);
  expect(inside).toBe(handed);
  const other = withRowMixture(NAMES, row, handed, (n: unknown, a: unknown) => readMixtureArgs(n, a), [NAMES, [[0.1, 0.1]]]);
  expect(other.mixture.map((e) => e.conc)).toEqual([0.1, 0.1]);
  expect(() => withRowMixture(NAMES, row, handed, () => {
    throw new Error("row failed");
  }, [])).toThrow("row failed");
  expect(readMixtureArgs(NAMES, row).mixture.map((e) => e.conc)).toEqual([0.1, 0.1]);
});

test("the temperature and activity read once per pair of values: fresh objects, each pair its own", () => {
  const { chemOptions } = require("../../src/functions/aq/options") as typeof import("../../src/functions/aq/options");
  const a = chemOptions(37, "ideal");
  const b = chemOptions(37, "ideal");
  expect(b).toEqual({ temperatureC: 37, activity: "ideal" });
  expect(b).not.toBe(a);
  b.temperatureC = 99;
  expect(chemOptions(37, "ideal").temperatureC).toBe(37);
  expect(chemOptions("310.15 K", null)).toEqual({ temperatureC: expect.closeTo(37, 9), activity: "davies" });
  expect(chemOptions(null, null)).toEqual({ temperatureC: 25, activity: "davies" });
  expect(() => chemOptions(150, null)).toThrow(/temperature/i);
  expect(chemOptions(null, null)).toEqual({ temperatureC: 25, activity: "davies" });
});
