/**
 * The AQ functions never modify their arguments. The headless evaluator (src/cli/hf-plugin.ts)
 * relies on it: ranges of plain cells are passed as the spreadsheet engine's own arrays, without a
 * copy. Every function is called here with deeply frozen ranges (modules are strict mode, so any
 * write would throw a TypeError), with inputs that succeed and inputs that fail.
 */
import { AQ } from "../support/aq-values";

function frozen<T>(value: T): T {
  if (Array.isArray(value)) {
    value.forEach(frozen);
    Object.freeze(value);
  }
  return value;
}

const names = () => frozen([["NaH2PO4"], ["Na2HPO4"], ["NaCl"]]);
const amounts = () => frozen([["20 mM"], [0.03], ["0.9 % w/v"]]);
const bad = () => frozen([["NaH2PO4"], ["no such thing"], [""]]);

/** [label, call]: each call gets fresh frozen ranges. */
const CALLS: [string, () => unknown][] = [
  ["PH", () => AQ.PH(names(), amounts(), 25, null as never)],
  ["ADJUST", () => AQ.ADJUST(names(), amounts(), 7.4, "NaOH", 1, 2)],
  ["BETA", () => AQ.BETA(names(), amounts())],
  ["CAPACITY", () => AQ.CAPACITY(names(), amounts(), 0.5)],
  ["SPECIES", () => AQ.SPECIES(names(), amounts())],
  ["CHECK", () => AQ.CHECK(names(), amounts())],
  ["IONIC", () => AQ.IONIC(names(), amounts())],
  ["OSMOLARITY", () => AQ.OSMOLARITY(names(), amounts())],
  ["OSMOLALITY", () => AQ.OSMOLALITY(names(), amounts())],
  ["CURVE", () => AQ.CURVE(names(), amounts(), "NaOH", 1, 0.05, 0.002, 11)],
  ["PHRANGE", () => AQ.PHRANGE(names(), amounts(), frozen([[0.02], [0.02], [0.05]]) as never)],
  ["PH, unknown name", () => AQ.PH(bad(), amounts())],
  ["SPECIES, unknown species", () => AQ.SPECIES(names(), amounts(), "nothing")],
  ["PHRANGE, mismatched tolerance", () => AQ.PHRANGE(names(), amounts(), frozen([[0.02, 0.01]]) as never)],
];

describe("the AQ functions leave their range arguments as they are", () => {
  test.each(CALLS)("%s", (_label, call) => {
    let outcome: unknown;
    try {
      outcome = call();
    } catch (e) {
      // A spreadsheet error is a result; a TypeError from writing to a frozen array is the failure
      // looked for, and the error module reports anything unexpected as an "internal error".
      expect(e).toBeInstanceOf(CustomFunctions.Error);
      expect((e as CustomFunctions.Error).message).not.toMatch(/internal error|read.only|frozen|Cannot assign/i);
      return;
    }
    expect(outcome).toBeDefined();
  });

  test("the successful calls do succeed (the test above would pass vacuously on errors only)", () => {
    const succeeded = CALLS.slice(0, 10).filter(([, call]) => {
      try {
        call();
        return true;
      } catch {
        return false;
      }
    });
    expect(succeeded.map(([label]) => label)).toEqual(CALLS.slice(0, 10).map(([label]) => label));
  });
});
