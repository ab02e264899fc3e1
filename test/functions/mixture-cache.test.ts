/**
 * The functions layer's caches (src/functions/mixture.ts: prepared mixtures; substances.ts: resolved
 * names): a cached answer is the answer computed afresh, bit for bit; a change of the constants
 * library is never answered from a cache; the key tells apart inputs that JSON text would not.
 */
import { prepare, solveEquilibrium } from "../../src/chem";
import { AQ } from "../support/aq-values";
import { clearMixtureCache, MIXTURE_CACHE_LIMIT, mixtureKey, readEntries, readMixtureArgs } from "../../src/functions/mixture";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { resetActiveLibrary, setLayer } from "../../src/library";
import type { LibraryDoc, SystemRecord } from "../../src/library/types";

function errorOf(call: () => unknown): { code: string; message: string } {
  try {
    call();
  } catch (e) {
    const err = e as { code?: string; message?: string };
    return { code: err.code ?? "?", message: err.message ?? "" };
  }
  throw new Error("expected the call to fail");
}

/** The built-in acetate system with another pKa, as a workbook layer would carry it. */
function acetateLayer(pKa: number): LibraryDoc {
  const acetate = JSON.parse(JSON.stringify(BUILTIN_LIBRARY.systems!.find((s) => s.id === "acetate"))) as SystemRecord;
  acetate.steps[0].pKa = { value: pKa, unit: "1", conditions: "25 °C, I = 0", status: "unverified", note: "from memory, unverified: cache test" };
  return { format: "protolyte-library", schemaVersion: 1, name: "cache test", systems: [acetate] };
}

const ACETATE = [["acetic acid", "sodium acetate"]];

beforeEach(() => {
  resetActiveLibrary();
  clearMixtureCache();
});

afterAll(() => resetActiveLibrary());

describe("cached and uncached results are identical", () => {
  const mixtures: [unknown[][], unknown[][]][] = [
    [ACETATE, [[0.05, 0.05]]],
    [[["NaH2PO4"], ["NaCl"], ["NaOH"]], [[0.05], [0.1], [0.02]]],
    [[["citric acid", "Na2HPO4"]], [["10 mM", "30 mM"]]],
    [[["Tris base", ""], ["Tris HCl", "NaCl"]], [[0.02, ""], [0.03, 0.15]]],
  ];

  test.each(mixtures)("%j %j: PH, BETA, IONIC, SPECIES at 5, 25, 37 °C, every activity model", (names, amounts) => {
    for (const t of [5, 25, 37]) {
      for (const model of ["davies", "ideal", "debye-huckel"]) {
        clearMixtureCache();
        const first = [AQ.PH(names, amounts, t, model), AQ.BETA(names, amounts, t, model), AQ.IONIC(names, amounts, t)];
        const table = AQ.SPECIES(names, amounts, null as unknown as string, t, model);
        // The second round is served from the cache (the same prepared mixture).
        const again = [AQ.PH(names, amounts, t, model), AQ.BETA(names, amounts, t, model), AQ.IONIC(names, amounts, t)];
        expect(again).toEqual(first);
        expect(AQ.SPECIES(names, amounts, null as unknown as string, t, model)).toEqual(table);
        // And both equal the engine's answer for a mixture read and prepared afresh.
        const fresh = solveEquilibrium(readEntries(names, amounts), { temperatureC: t, activity: model as "davies" });
        if (!fresh.ok) throw new Error(fresh.message);
        expect(first[0]).toBe(fresh.pH);
        expect(first[1]).toBe(fresh.beta);
      }
    }
  });

  test("a hit returns the very same prepared mixture; a different amount does not", () => {
    const a = readMixtureArgs(ACETATE, [[0.05, 0.05]]);
    expect(readMixtureArgs(ACETATE, [[0.05, 0.05]])).toBe(a);
    expect(readMixtureArgs([["acetic acid", "sodium acetate"]], [[0.05, 0.05]])).toBe(a); // equal content, new arrays
    expect(readMixtureArgs(ACETATE, [[0.05, 0.050000000000000010]])).not.toBe(a);
  });

  test("more distinct mixtures than the cache holds: every answer still equals a fresh solve", () => {
    for (let i = 0; i < MIXTURE_CACHE_LIMIT + 50; i++) {
      const amounts = [[0.01 + i * 1e-4, 0.02]];
      const fresh = prepare(readEntries(ACETATE, amounts));
      if (!fresh.ok) throw new Error(fresh.message);
      const expected = fresh.solvePH({});
      if (!expected.ok) throw new Error(expected.message);
      expect(AQ.PH(ACETATE, amounts, null, null as unknown as string)).toBe(expected.pH);
    }
  });
});

describe("a library change invalidates the caches", () => {
  test("a workbook layer overriding acetate's pKa changes AQ.PH at once, and removing it restores it", () => {
    const builtin = AQ.PH(ACETATE, [[0.05, 0.05]], 25, "ideal");
    expect(setLayer("workbook", acetateLayer(5.2)).ok).toBe(true);
    const overridden = AQ.PH(ACETATE, [[0.05, 0.05]], 25, "ideal");
    expect(Math.abs(overridden - builtin - (5.2 - 4.756))).toBeLessThan(1e-3);
    expect(setLayer("workbook", null).ok).toBe(true);
    expect(AQ.PH(ACETATE, [[0.05, 0.05]], 25, "ideal")).toBe(builtin);
  });

  test("a name unknown before a layer adds it resolves after, and is unknown again once the layer is gone", () => {
    const doc: LibraryDoc = {
      format: "protolyte-library",
      schemaVersion: 1,
      name: "cache test",
      substances: [
        { id: "my-acetic", name: "my acetic acid", formula: "C2H4O2", nature: "weak-acid-base", systems: [{ system: "acetate", stoich: 1, protons: 1 }] },
      ],
    };
    expect(errorOf(() => AQ.PH([["my acetic acid"]], [[0.1]], null, null as unknown as string)).code).toBe("#VALUE!");
    const r = setLayer("personal", doc);
    expect(r.ok ? [] : r.errors).toEqual([]);
    const value = AQ.PH([["my acetic acid"]], [[0.1]], null, null as unknown as string);
    expect(value).toBe(AQ.PH([["acetic acid"]], [[0.1]], null, null as unknown as string));
    setLayer("personal", null);
    expect(errorOf(() => AQ.PH([["my acetic acid"]], [[0.1]], null, null as unknown as string)).message).toMatch(/Unknown substance/);
  });
});

describe("the cache key", () => {
  test("tells apart values that JSON text writes alike", () => {
    const keys = [null, undefined, "", 0, -0, Number.NaN, Infinity, "0", false].map((v) => mixtureKey([["acetic acid", ""]], [[0.1, v]]));
    expect(new Set(keys).size).toBe(keys.length);
  });

  test("a blank name with NaN beside it is an error even after the same row with a blank amount was cached", () => {
    // JSON.stringify writes NaN as null, so a text key would serve the first (valid) mixture here.
    expect(AQ.PH([["acetic acid", ""]], [[0.1, null]], null, null as unknown as string)).toBeGreaterThan(0);
    expect(errorOf(() => AQ.PH([["acetic acid", ""]], [[0.1, Number.NaN]], null, null as unknown as string)).message).toMatch(/no substance name beside it/);
  });

  test("layout is part of the key: a row and a column of the same cells are different keys", () => {
    expect(mixtureKey([["a", "b"]], [[1, 2]])).not.toBe(mixtureKey([["a"], ["b"]], [[1], [2]]));
    expect(mixtureKey([["a", "b"]], [[1, 2]])).not.toBe(mixtureKey([["a", "b"]], [[1], [2]]));
    // Strings are length-prefixed, so no cell can spell two cells.
    expect(mixtureKey([["ab"]], [[1]])).not.toBe(mixtureKey([["a", "b"]], [[1]]));
    expect(mixtureKey([["a;n1"]], [[1]])).not.toBe(mixtureKey([["a", 1]], [[1]]));
  });

  test("mismatched shapes stay an error whatever was cached before", () => {
    AQ.PH(ACETATE, [[0.05, 0.05]], null, null as unknown as string);
    expect(errorOf(() => AQ.PH(ACETATE, [[0.05], [0.05]], null, null as unknown as string)).message).toMatch(/names is 1×2 cells but amounts is 2×1/);
  });

  test("anything but cells (an object) is read without the cache and still checked", () => {
    expect(mixtureKey([[{}]], [[1]])).toBeNull();
    expect(errorOf(() => AQ.PH([[{} as unknown as string]], [[0.1]], null, null as unknown as string)).code).toBe("#VALUE!");
  });
});

describe("the fast reading path gives the general path's messages", () => {
  test.each([
    [[["acetic acid", "sodium acetate"]], [[0.05, -0.01]], /amount of 'sodium acetate' \(item 2\)/],
    [[["acetic acid", ""]], [[0.05, 0.01]], /amount 0.01 \(item 2\) has no substance name beside it/],
    [[["acetic acid"], ["sodium acetate"]], [[0.05], [""]], /no amount for 'sodium acetate' \(item 2\)/],
    [[["acetic acid", "x"], ["y", "z"]], [[0.05, 1], [1, "abc"]], /Unknown substance 'x'/],
    [[["acetic acid", "NaCl"], ["NaOH", "sodium acetate"]], [[0.05, 1], [1, "abc"]], /amount of 'sodium acetate' \(row 2, column 2\) 'abc'/],
    [[["", ""]], [["", 0]], /the mixture is empty/],
  ])("%j %j", (names, amounts, message) => {
    expect(() => readEntries(names, amounts)).toThrow(message);
  });
});
