/** Editor fields ↔ library records: numbers, pKb conversion, provenance rules, ids, round trips. */
import { BUILTIN_LIBRARY, validateLibraryDoc, LIBRARY_FORMAT } from "../../src/library";
import { emptySystem, readNumber, type FieldIssue } from "../../src/taskpane/forms";
import { buildSource, buildSubstance, buildSystem, buildValue, describePkbConversion } from "../../src/taskpane/form-to-record";
import { sourceToInput, substanceToInput, systemToInput } from "../../src/taskpane/record-to-form";
import { makeId } from "../../src/taskpane/entry-id";

describe("readNumber", () => {
  test.each([
    ["4.75", 4.75],
    [" -1 ", -1],
    ["\u22121.5", -1.5],
    ["1e-3", 0.001],
    [".5", 0.5],
  ])("%j → %p", (text, value) => expect(readNumber(text)).toBe(value));

  test.each(["", "abc", "1,5", "4.7.5", "Infinity", "NaN", "0x10"])("%j is not a number", (text) => expect(readNumber(text)).toBeNull());
});

describe("pKb entry", () => {
  test("the conversion is shown with pKw at 25 °C and its source", () => {
    expect(describePkbConversion("4.75")).toBe("pKa = pKw − pKb = 13.995 − 4.75 = 9.245 (pKw at 25 °C: CRC Handbook, after Marshall & Franck 1981)");
    expect(describePkbConversion("x")).toBeNull();
  });

  test("a step entered by pKb stores pKa = 13.995 − pKb and records the conversion in the note", () => {
    const s = emptySystem();
    s.name = "Halvorsen base";
    s.topCharge = "1";
    s.steps[0].enteredAsPkb = true;
    s.steps[0].pKa = { value: "3.3", conditions: "25 °C, I = 0", status: "common-practice", source: "", locator: "", note: "lab handbook value" };
    const r = buildSystem(s);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.record.steps[0].pKa.value).toBeCloseTo(10.695, 12);
    expect(r.record.steps[0].pKa.note).toBe("lab handbook value; converted from pKb 3.3 with pKw 13.995 at 25 °C (CRC Handbook, after Marshall & Franck 1981)");
    expect(r.notes[0]).toContain("13.995 − 3.3 = 10.695");
  });
});

describe("provenance rules at the field", () => {
  const v = { value: "7", conditions: "25 °C", status: "published" as const, source: "", locator: "", note: "" };
  test("a published value needs a source", () => {
    const issues: FieldIssue[] = [];
    buildValue(v, "1", "steps[0].pKa", issues, false);
    expect(issues).toEqual([{ path: "steps[0].pKa.source", message: expect.stringContaining("names its source") }]);
  });
  test("an unverified value needs a note", () => {
    const issues: FieldIssue[] = [];
    buildValue({ ...v, status: "unverified" }, "1", "p", issues, false);
    expect(issues).toEqual([{ path: "p.note", message: "a 'from memory, unverified' value says why in a note" }]);
  });
  test("an optional empty value is left out, a required one is reported", () => {
    const issues: FieldIssue[] = [];
    expect(buildValue({ ...v, value: "" }, "kJ/mol", "dH", issues, true)).toBeUndefined();
    expect(issues).toEqual([]);
    buildValue({ ...v, value: "" }, "1", "pKa", issues, false);
    expect(issues).toEqual([{ path: "pKa.value", message: "a number is needed" }]);
  });
});

describe("round trips of every built-in record through the editor's fields", () => {
  test.each((BUILTIN_LIBRARY.systems ?? []).map((s) => [s.id, s] as const))("system %s", (_id, record) => {
    const r = buildSystem(systemToInput(record));
    expect(r).toEqual({ ok: true, record, notes: [] });
  });

  test.each((BUILTIN_LIBRARY.substances ?? []).map((s) => [s.id, s] as const))("substance %s", (_id, record) => {
    const r = buildSubstance(substanceToInput(record));
    expect(r).toEqual({ ok: true, record, notes: [] });
  });

  test.each(Object.entries(BUILTIN_LIBRARY.sources ?? {}))("source %s", (id, record) => {
    expect(buildSource(sourceToInput(id, record))).toEqual({ ok: true, record, notes: [] });
  });
});

describe("makeId", () => {
  test("lower-case, schema-valid, unique", () => {
    const taken = new Set(["tris-base"]);
    const id = makeId("Tris base", (x) => taken.has(x));
    expect(id).toBe("tris-base-2");
    expect(makeId("  Ünïcode Büffer <img src=x onerror=alert(1)>", () => false)).toBe("unicode-buffer-img-src-x-onerror-alert-1");
    expect(makeId("constructor", () => false)).toBe("entry-constructor");
    expect(makeId("!!!", () => false)).toBe("entry");
    for (const name of ["HB-7 amine", "Ωmega 3", "a".repeat(100), "(S)-2-amino"]) {
      const made = makeId(name, () => false);
      const doc = { format: LIBRARY_FORMAT, schemaVersion: 1, name: "t", ions: [{ id: made, name: "x", charge: 1 }] };
      expect({ name, made, ok: validateLibraryDoc(doc).ok }).toEqual({ name, made, ok: true });
    }
  });
});
