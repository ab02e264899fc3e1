/**
 * Preparation tables (mixtures of stocks → measured pH), REFERENCES §5. These are empirical tables
 * measured decades ago with other electrodes and conventions: ±0.05 pH at ionic strengths up to
 * ≈ 0.3 mol/L (REFERENCES §5). Davies activity, 25 °C. Cases that exceed the tolerance for a known
 * reason are listed as known failures: the test asserts that they still deviate as documented (so
 * a change that fixes or worsens them is noticed), never skips them.
 */
import { solveEquilibrium, type Mixture } from "../../src/chem";
import * as f from "./fixtures";

const TOL = 0.05;

interface Case {
  label: string;
  mix: Mixture;
  pH: number;
  /** A documented reason why this case exceeds ±TOL, and the bound it is expected to stay within. */
  knownFailure?: { reason: string; bound: number };
}

function run(c: Case): void {
  const r = solveEquilibrium(c.mix, { temperatureC: 25, activity: "davies" });
  if (!r.ok) throw new Error(`${c.label}: ${r.message}`);
  if (!c.knownFailure) {
    f.expectAbs(r.pH, c.pH, TOL, `${c.label}, 25 °C, Davies`);
    return;
  }
  const diff = Math.abs(r.pH - c.pH);
  if (!(diff > TOL && diff <= c.knownFailure.bound)) {
    throw new Error(
      `${c.label}: known failure no longer behaves as documented (${c.knownFailure.reason})\n  actual ${r.pH}\n  expected ${c.pH}, deviation between ${TOL} and ${c.knownFailure.bound}`,
    );
  }
  expect(diff).toBeGreaterThan(TOL);
}

// Sørensen phosphate 0.1 M (Gomori, Methods Enzymol. 1, 138 (1955), after Sørensen 1909; V):
// x mL 0.2 M NaH2PO4 + y mL 0.2 M Na2HPO4, then an equal volume of water → x/1000 and y/1000 mol/L.
const SORENSEN: [number, number, number][] = [
  [5.8, 92.0, 8.0], [6.0, 87.7, 12.3], [6.2, 81.5, 18.5], [6.5, 68.5, 31.5], [6.8, 51.0, 49.0],
  [7.0, 39.0, 61.0], [7.2, 28.0, 72.0], [7.4, 19.0, 81.0], [7.8, 8.5, 91.5], [8.0, 5.3, 94.7],
];

// KHP–HCl, 25 °C (Bates & Bower, Anal. Chem. 28, 1322 (1956); Lange's Handbook Table 8.16; V):
// 50 mL 0.1 M KHP + x mL 0.1 M HCl to 100 mL → KHP 0.05 mol/L, HCl x/1000 mol/L.
const KHP_HCL: [number, number][] = [[2.4, 42.2], [2.8, 28.9], [3.0, 22.3], [3.2, 15.7]];

// Acetate (Walpole type, as quoted by Pearse 1980; V): x mL 0.1 N acetic acid + y mL 0.1 N sodium
// acetate, 200 mL in all → 0.1·x/200 and 0.1·y/200 mol/L.
const ACETATE: [number, number, number][] = [[3.8, 176, 24], [4.2, 147, 53], [4.6, 102, 98], [5.0, 59, 141], [5.4, 29, 171]];
const ACETATE_KNOWN: Record<number, Case["knownFailure"]> = {
  4.6: {
    reason:
      "the table sits 0.02–0.05 pH below the model over its whole range (a systematic offset, as from an older pH scale or a lower acetic acid pKa than Goldberg's 4.756); at 4.6 the model gives 4.654",
    bound: 0.06,
  },
};

const cases: Case[] = [
  ...SORENSEN.map(([pH, x, y]) => ({
    label: `Sørensen phosphate ${x}/${y} → pH ${pH}`,
    mix: f.mixture([f.NaH2PO4, x / 1000], [f.Na2HPO4, y / 1000]),
    pH,
  })),
  ...KHP_HCL.map(([pH, x]) => ({
    label: `KHP 0.05 M + HCl ${x / 1000} M → pH ${pH}`,
    mix: f.mixture([f.KHphthalate, 0.05], [f.HCl, x / 1000]),
    pH,
  })),
  ...ACETATE.map(([pH, x, y]) => ({
    label: `acetate ${x}/${y} mL → pH ${pH}`,
    mix: f.mixture([f.aceticAcid, (0.1 * x) / 200], [f.sodiumAcetate, (0.1 * y) / 200]),
    pH,
    knownFailure: ACETATE_KNOWN[pH],
  })),
];

describe("preparation tables within ±0.05 pH (Davies, 25 °C)", () => {
  test.each(cases.filter((c) => !c.knownFailure))("$label", (c) => run(c));
});

describe("known failures (documented, asserted to deviate as described)", () => {
  test.each(cases.filter((c) => c.knownFailure))("$label", (c) => run(c));
});
