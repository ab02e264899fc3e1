/**
 * A changed value keeps no provenance the user did not renew (reviseValue): the citation and note
 * of the old number go and the status becomes "entered by the user", unless a new source and
 * locator are given or another status is chosen with a new note.
 */
import { describeProvenance, reviseValue } from "../../src/library/provenance";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import type { ValueRecord } from "../../src/library/types";
import { validateLibraryDoc } from "../../src/library/validate";
import { halvorsenLibrary } from "./helpers";

const citric: ValueRecord = { value: 3.128, unit: "1", conditions: "25 °C, I = 0", source: "goldberg2002", locator: "entry: citric acid", status: "published" };

test("an unchanged value keeps everything", () => {
  expect(reviseValue(citric, { ...citric })).toEqual({ record: citric, reset: null });
  expect(reviseValue(undefined, { ...citric, value: 3.2 })).toEqual({ record: { ...citric, value: 3.2 }, reset: null });
});

test("a changed value with the old citation becomes 'entered by the user', and says what it dropped", () => {
  const r = reviseValue(citric, { ...citric, value: 3.2 });
  expect(r.record).toEqual({ value: 3.2, unit: "1", conditions: "25 °C, I = 0", status: "entered" });
  expect(r.reset).toBe("3.128 → 3.2: the old value's source 'goldberg2002' — entry: citric acid no longer applies; now 'entered by the user' (give a source and locator for the new value to cite it)");
  expect(describeProvenance(r.record, () => undefined)).toBe("entered by the user");
});

test("a changed value with a new source and locator keeps the status the user chose", () => {
  const next = { ...citric, value: 3.13, source: "hb-sop-117", locator: "Table 3" };
  expect(reviseValue(citric, next)).toEqual({ record: next, reset: null });
  // a new locator in the same source is a new citation too
  expect(reviseValue(citric, { ...citric, value: 3.13, locator: "Table 9" }).record.status).toBe("published");
});

test("a derived or old note goes with the old value; a new note stays", () => {
  const old: ValueRecord = { value: 9.795, unit: "1", conditions: "25 °C", status: "unverified", note: "HB datasheet" };
  expect(reviseValue(old, { ...old, value: 8 }).record).toEqual({ value: 8, unit: "1", conditions: "25 °C", status: "entered" });
  expect(reviseValue(old, { ...old, value: 8, note: "bench titration 2026-11" }).record).toEqual({ value: 8, unit: "1", conditions: "25 °C", status: "entered", note: "bench titration 2026-11" });
  // another status, chosen with a new note, stays
  expect(reviseValue(citric, { ...citric, value: 3.2, status: "unverified", note: "recalled" }).record).toEqual({ value: 3.2, unit: "1", conditions: "25 °C, I = 0", status: "unverified", note: "recalled" });
});

test("'entered' needs neither source nor note in a user file, and no built-in value uses it", () => {
  const doc = halvorsenLibrary();
  doc.systems![0].steps[0].pKa = { value: 7.4, unit: "1", conditions: "25 °C, I = 0", status: "entered" };
  expect(validateLibraryDoc(doc, [BUILTIN_LIBRARY]).ok).toBe(true);
  expect(JSON.stringify(BUILTIN_LIBRARY)).not.toContain('"entered"');
});
