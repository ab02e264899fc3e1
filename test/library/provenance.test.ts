/** Provenance lines shown beside each value. */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { describeProvenance } from "../../src/library/provenance";

const sources = BUILTIN_LIBRARY.sources!;
const lookup = (id: string) => sources[id];
const step = (id: string, i: number) => BUILTIN_LIBRARY.systems!.find((s) => s.id === id)!.steps[i];

test("a published value names authors, journal, year and the entry", () => {
  expect(describeProvenance(step("acetate", 0).pKa, lookup)).toBe(
    "R. N. Goldberg, N. Kishore, R. M. Lennen, Thermodynamic quantities for the ionization reactions of buffers. Journal of Physical and Chemical Reference Data, 31, 231 (2002) — entry: acetic acid (cross-checked against an independent compilation; not read in the original paper)",
  );
});

test("unverified and common-practice values say so", () => {
  expect(describeProvenance(step("lysine", 0).pKa, lookup)).toMatch(/^from memory, unverified/);
  expect(describeProvenance(step("sulfate", 0).pKa, lookup)).toMatch(/^common practice: the first step is treated as fully dissociated/);
  expect(describeProvenance({ value: 1, unit: "1", conditions: "x", status: "unverified", note: "supplier sheet" }, lookup)).toBe(
    "from memory, unverified: supplier sheet",
  );
});

test("a dangling source id is shown, not hidden", () => {
  expect(describeProvenance({ value: 1, unit: "1", conditions: "x", status: "published", source: "gone", locator: "Table 1" }, lookup)).toBe(
    "unknown source 'gone' — Table 1",
  );
});
