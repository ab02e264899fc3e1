/** Provenance lines shown beside each value. */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { describeProvenance } from "../../src/library/provenance";

const sources = BUILTIN_LIBRARY.sources!;
const lookup = (id: string) => sources[id];
const step = (id: string, i: number) => BUILTIN_LIBRARY.systems!.find((s) => s.id === id)!.steps[i];

test("a published value names authors, title, journal, year, DOI and the place in the source", () => {
  expect(describeProvenance(step("bis-tris", 0).pKa, lookup)).toBe(
    "R. N. Roy, L. N. Roy, K. Hundley, J. Dinga, M. Medcalf, L. Tebbe, R. Parmar, J. Veliz, Acid dissociation constants and related thermodynamic functions of protonated 2,2-bis(hydroxymethyl)-2,2',2''-nitrilotriethanol (BIS-TRIS) from (278.15 to 328.15) K. Journal of Biophysical Chemistry, 5, 118–124 (2014), doi:10.4236/jbpc.2014.53013 — abstract: values at 298.15 K, pKa = 6.4828",
  );
});

test("an unverified value that names the source it was recalled from says both", () => {
  expect(describeProvenance(step("acetate", 0).dH!, lookup)).toBe(
    "from memory, unverified: as recalled from Goldberg et al. (2002), whose entry could not be read here [R. N. Goldberg, N. Kishore, R. M. Lennen, Thermodynamic quantities for the ionization reactions of buffers. Journal of Physical and Chemical Reference Data, 31, 231 (2002) — entry: acetic acid]",
  );
});

test("unverified and common-practice values say so", () => {
  expect(describeProvenance(step("meglumine", 0).pKa, lookup)).toMatch(/^from memory, unverified/);
  expect(describeProvenance(step("sulfate", 0).pKa, lookup)).toMatch(/^common practice: the first step is treated as fully dissociated/);
  expect(describeProvenance({ value: 1, unit: "1", conditions: "x", status: "unverified", note: "supplier sheet" }, lookup)).toBe(
    "from memory, unverified: supplier sheet",
  );
});

test("an unverified value seen in an unattributed web copy stays unverified and names the copy and the line read", () => {
  expect(describeProvenance(step("sorbate", 0).pKa, lookup)).toMatch(
    /^from memory, unverified: .*not counted as published \[Sorbic Acid \(drug-encyclopedia monograph\) — Properties: pK \(25°\) = 4\.76\]$/,
  );
});

test("a dangling source id is shown, not hidden", () => {
  expect(describeProvenance({ value: 1, unit: "1", conditions: "x", status: "published", source: "gone", locator: "Table 1" }, lookup)).toBe(
    "unknown source 'gone' — Table 1",
  );
});
