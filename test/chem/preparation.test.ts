/**
 * Preparation tables (mixtures of stocks → measured pH): the Sørensen phosphate, KHP–HCl and
 * acetate tables of test/reference (sources and status: docs/references.md, section 5). Empirical
 * tables measured decades ago with other electrodes and conventions: each table's tolerance (±0.05
 * pH) and its reason are in its file. Davies activity, 25 °C. A case that exceeds the tolerance for a
 * known reason is asserted to deviate as documented, never skipped.
 */
import { solveEquilibrium } from "../../src/chem";
import { casesOf } from "../reference";
import * as f from "./fixtures";

const cases = ["sorensen-phosphate", "khp-hcl", "acetate"].flatMap((table) => casesOf(table).map((c) => ({ ...c, table })));

function pHOf(c: (typeof cases)[number]): number {
  const r = solveEquilibrium(f.referenceMixture(c.mixture), { temperatureC: c.temperatureC ?? 25, activity: "davies" });
  if (!r.ok) throw new Error(`${c.id}: ${r.message}`);
  return r.pH;
}

describe("preparation tables within their tolerance (Davies, 25 °C)", () => {
  test.each(cases.filter((c) => !c.knownDeviation))("$id: $label → pH $printed (±$tolerance.value)", (c) => {
    f.expectReference(pHOf(c), c, `${c.label}, 25 °C, Davies`);
  });
});

describe("known deviations (documented, asserted to deviate as described)", () => {
  test.each(cases.filter((c) => c.knownDeviation))("$id: $label → pH $printed", (c) => {
    f.expectReference(pHOf(c), c, `${c.label}, 25 °C, Davies`);
  });
});
