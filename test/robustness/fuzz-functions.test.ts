/**
 * Fuzzing every AQ function as Excel calls it: the exported function objects (through the catalogue,
 * so functions added to it are fuzzed too) with random and hostile arguments. Property: each call
 * returns a finite number, a string, or a well-formed matrix of those, or throws a
 * CustomFunctions.Error #VALUE!/#N/A with a one-line message of at most 250 characters; it never
 * mutates its arguments, and a value is the same when asked again (the mixture cache).
 *
 * Fixed seed (arbitraries.ts); a longer campaign: PROTOLYTE_FUZZ_RUNS=50 npx jest test/robustness
 */
import fc from "fast-check";
import { CATALOGUE, type CatalogueEntry } from "../../src/functions/catalogue";
import { clearMixtureCache } from "../../src/functions/mixture";
import { resetActiveLibrary } from "../../src/library";
import { argsFor as entryArgs, cellFor, largeMixtureArgs, runs, SEED } from "./arbitraries";
import { outcomeOf, outcomeProblem, show, type Outcome } from "./outcome";

beforeAll(() => {
  resetActiveLibrary();
  clearMixtureCache();
});

/** Arguments for one entry; hostile optionals are sometimes omitted, as Excel passes them. */
function argsFor(entry: CatalogueEntry, mode: "hostile" | "plausible"): fc.Arbitrary<unknown[]> {
  return entryArgs(entry.params, mode, { blankOptionals: true });
}

function sameOutcome(a: Outcome, b: Outcome): boolean {
  if (a.kind !== b.kind) return false;
  if (a.kind === "error" && b.kind === "error") return a.code === b.code && a.message === b.message;
  if (a.kind === "value" && b.kind === "value") return JSON.stringify(a.value) === JSON.stringify(b.value);
  return true;
}

const counts: Record<string, { cases: number; value: number; "#VALUE!": number; "#N/A": number }> = {};

function check(entry: CatalogueEntry, args: unknown[]): void {
  const before = structuredClone(args);
  const first = outcomeOf(entry.fn, args);
  const problem = outcomeProblem(first, entry.result);
  if (problem) throw new Error(`AQ.${entry.id}${show(args)}: ${problem}`);
  expect(args).toEqual(before);
  // A value may come from the mixture cache the second time: it must be the same value.
  const again = first.kind === "value" ? outcomeOf(entry.fn, args) : first;
  if (!sameOutcome(first, again)) throw new Error(`AQ.${entry.id}${show(args)}: a second call gave another outcome`);
  const c = (counts[entry.id] ??= { cases: 0, value: 0, "#VALUE!": 0, "#N/A": 0 });
  c.cases++;
  if (first.kind === "value") c.value++;
  else if (first.kind === "error") c[first.code as "#VALUE!" | "#N/A"]++;
}

afterAll(() => {
  const total = Object.values(counts).reduce((s, c) => s + c.cases, 0);
  const lines = Object.entries(counts).map(([id, c]) => `AQ.${id}: ${c.cases} (value ${c.value}, #VALUE! ${c["#VALUE!"]}, #N/A ${c["#N/A"]})`);
  console.log(`fuzz (direct calls, seed ${SEED}): ${total} cases over ${Object.keys(counts).length} functions — ${lines.join("; ")}`);
});

/** Functions that solve many equilibria per call (a curve of points, a search over a tolerance box). */
const HEAVY = ["CURVE", "PHRANGE"];

describe("every AQ function, random and hostile arguments", () => {
  test.each(CATALOGUE.map((e) => [e.id, e] as const))("AQ.%s", (_id, entry) => {
    const numRuns = runs(entry.params.length === 0 ? 50 : HEAVY.includes(entry.id) ? 120 : 300);
    const args = fc.oneof(argsFor(entry, "hostile"), argsFor(entry, "plausible"));
    fc.assert(
      fc.property(args, (a) => check(entry, a)),
      { seed: SEED, numRuns },
    );
  });
});

describe("functions over mixtures: thousands of components", () => {
  const withMixture = CATALOGUE.filter((e) => e.params[0]?.name === "names" && e.params[1]?.name === "amounts");

  test.each(withMixture.map((e) => [e.id, e] as const))("AQ.%s", (_id, entry) => {
    const rest = entry.params.slice(2).map((p) => (p.optional ? fc.constant(null) : cellFor(p.name)));
    fc.assert(
      fc.property(largeMixtureArgs, fc.tuple(...rest), ([names, amounts], more) => check(entry, [names, amounts, ...more])),
      { seed: SEED, numRuns: runs(3) },
    );
  });
});

describe("one argument at an extreme, the others sensible", () => {
  // Random cases rarely combine sensible arguments with one extreme value; this sweep does, for
  // every parameter of every function (it found the RECIPE overflow for a 3e306 L batch).
  const EXTREMES: unknown[] = [0, -0, -1, 5e-324, 1e-300, 1e-12, 20, 1e6, 1e300, 1.7e308, -1.7e308, NaN, Infinity, "1e308", "1e-320", " ", "0x10", true, [[]], [[1, 2]]];

  test.each(CATALOGUE.filter((e) => e.params.length > 0).map((e) => [e.id, e] as const))("AQ.%s", (_id, entry) => {
    // Bases that give a value, so that each extreme is the only thing wrong with the call.
    const bases = fc
      .sample(argsFor(entry, "plausible"), { seed: SEED, numRuns: 200 })
      .filter((a) => outcomeOf(entry.fn, a).kind === "value")
      .slice(0, runs(3));
    expect(bases.length).toBeGreaterThan(0);
    for (const base of bases) {
      for (let i = 0; i < base.length; i++) {
        for (const extreme of EXTREMES) {
          const args = [...base];
          args[i] = extreme;
          check(entry, args);
        }
      }
    }
  });
});
