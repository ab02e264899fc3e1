/**
 * Import and export: rejection cases (size, JSON, unsafe keys, duplicates, versions, types) leave the
 * active library exactly as it was; names are kept as inert text; exports import back to the same
 * fingerprint.
 */
import { getActiveLibrary, resetActiveLibrary, setLayer } from "../../src/library/active";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { exportLibraryText, flattenLibrary, importIntoLayer, MAX_LIBRARY_BYTES, parseLibraryText, utf8Length } from "../../src/library/io";
import { createLibrary } from "../../src/library/layers";
import { pKbToPKa, PKW_25C } from "../../src/library/pkb";
import type { LibraryDoc } from "../../src/library/types";
import { halvorsenLibrary } from "./helpers";

const text = (doc: unknown): string => JSON.stringify(doc);
const withHalvorsen = (edit: (d: Record<string, any>) => void): string => {
  const d = halvorsenLibrary() as unknown as Record<string, any>;
  edit(d);
  return text(d);
};

beforeEach(() => resetActiveLibrary());

describe("parseLibraryText", () => {
  test("accepts a valid file (with or without a byte-order mark)", () => {
    expect(parseLibraryText(text(halvorsenLibrary()), [BUILTIN_LIBRARY]).ok).toBe(true);
    expect(parseLibraryText(`\ufeff${text(halvorsenLibrary())}`, [BUILTIN_LIBRARY]).ok).toBe(true);
  });

  test("references into the layers below must be given as context", () => {
    const r = parseLibraryText(text(halvorsenLibrary()));
    expect(r).toMatchObject({ ok: false, code: "invalid" });
    expect(!r.ok && r.errors).toContainEqual({ path: "substances[0].ions[0].ion", message: "unknown strong ion 'na'" });
  });

  test("utf8Length counts bytes", () => {
    expect([utf8Length("a"), utf8Length("°"), utf8Length("·"), utf8Length("₂"), utf8Length("😀")]).toEqual([1, 2, 2, 3, 4]);
  });
});

const rejections: [string, string, string, RegExp][] = [
  ["larger than 5 MB", `{"format":"protolyte-library",${" ".repeat(MAX_LIBRARY_BYTES)}}`, "too-large", /limited to 5\.0 MB/],
  ["not JSON", "{ format: protolyte", "not-json", /not valid JSON/],
  ["__proto__ at the top", '{"format":"protolyte-library","schemaVersion":1,"name":"x","__proto__":{"polluted":true}}', "unsafe-key", /__proto__/],
  ["__proto__ deep inside", withHalvorsen((d) => (d.substances[0].ions[0] = JSON.parse('{"ion":"na","stoich":1,"__proto__":{"polluted":true}}'))), "unsafe-key", /substances\[0\]\.ions\[0\]\.__proto__/],
  ["a 'constructor' source id", withHalvorsen((d) => (d.sources.constructor = { title: "x" })), "unsafe-key", /sources\.constructor/],
  ["a 'prototype' key", withHalvorsen((d) => (d.systems[0].prototype = {})), "unsafe-key", /prototype/],
  ["duplicate substance ids", withHalvorsen((d) => d.substances.push({ ...d.substances[0], name: "other", aliases: [], formula: "C8H17NNaO4S", formulaAlias: false })), "invalid", /substances\[1\]\.id: duplicate id 'hb-buffer-salt' \(also substances\[0\]\)/],
  ["a newer schema version", withHalvorsen((d) => (d.schemaVersion = 2)), "newer-version", /schemaVersion: is 2; this version reads schemaVersion 1/],
  ["a schema version as text", withHalvorsen((d) => (d.schemaVersion = "1")), "wrong-version", /must be 1, found "1"/],
  ["another format", withHalvorsen((d) => (d.format = "buffer-table")), "wrong-format", /not a Protolyte library file/],
  ["a pKa given as text", withHalvorsen((d) => (d.systems[0].steps[0].pKa.value = "7.35")), "invalid", /systems\[0\]\.steps\[0\]\.pKa\.value: expected a number, found "7\.35"/],
  ["a fractional charge", withHalvorsen((d) => (d.systems[0].topCharge = 0.5)), "invalid", /systems\[0\]\.topCharge: expected an integer/],
  ["a negative stoichiometry", withHalvorsen((d) => (d.substances[0].ions[0].stoich = -1)), "invalid", /substances\[0\]\.ions\[0\]\.stoich: must be > 0, found -1/],
  ["an unknown field", withHalvorsen((d) => (d.substances[0].colour = "blue")), "invalid", /substances\[0\]\.colour: unknown field 'colour'/],
  ["a published value without a source", withHalvorsen((d) => delete d.systems[0].steps[0].pKa.source), "invalid", /missing required field 'source' \(a published value names its source\)/],
  ["an unverified value without a note", withHalvorsen((d) => (d.systems[0].steps[0].pKa.status = "unverified")), "invalid", /missing required field 'note'/],
  ["an alias already used by another substance in the file", withHalvorsen((d) => d.substances.push({ ...d.substances[0], id: "hb-2", name: "HB 2", formula: "C8H17NKO4S", aliases: ["hbs 7"] })), "invalid", /substances\[1\]\.aliases\[0\]: duplicate of 'HBS-7' used by hb-buffer-salt/],
  ["charges that do not balance", withHalvorsen((d) => (d.substances[0].ions[0].stoich = 2)), "invalid", /charges do not balance/],
  ["a control character in a name", withHalvorsen((d) => (d.substances[0].name = "HB\u0007salt")), "invalid", /substances\[0\]\.name: .* is not valid \(text of 1 to 200 characters without control characters\)/],
];

describe("rejected imports leave the library exactly as it was", () => {
  test.each(rejections)("%s", (_what, input, code, message) => {
    setLayer("workbook", halvorsenLibrary());
    const before = getActiveLibrary();
    const fingerprint = before.fingerprint();
    const r = importIntoLayer("workbook", input, "replace");
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.code).toBe(code);
    expect(`${r.message} | ${r.errors.map((e) => `${e.path}: ${e.message}`).join(" | ")}`).toMatch(message);
    expect(getActiveLibrary()).toBe(before);
    expect(getActiveLibrary().fingerprint()).toBe(fingerprint);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe("accepted imports", () => {
  test("replace and merge", () => {
    expect(importIntoLayer("personal", text(halvorsenLibrary())).ok).toBe(true);
    const extra: LibraryDoc = {
      format: "protolyte-library",
      schemaVersion: 1,
      name: "HB additions",
      substances: [{ id: "hb-sugar", name: "HB sugar", nature: "non-electrolyte", neutral: 1, molarMass: { value: 504.4, unit: "g/mol", conditions: "anhydrous", status: "unverified", note: "from memory, unverified: supplier sheet" } }],
    };
    expect(importIntoLayer("personal", text(extra), "merge").ok).toBe(true);
    const lib = getActiveLibrary();
    expect(lib.resolve("HBS-7").ok && lib.resolve("hb sugar").ok).toBe(true);
    expect(lib.layers.personal!.name).toBe("Halvorsen Biologics formulation lab");
    expect(importIntoLayer("personal", text(extra), "replace").ok).toBe(true);
    expect(getActiveLibrary().resolve("HBS-7").ok).toBe(false);
  });

  test("names containing HTML are stored and exported as the same inert text", () => {
    const html = '<img src=x onerror="alert(1)">HB salt';
    const r = importIntoLayer("workbook", withHalvorsen((d) => {
      d.substances[0].name = html;
      d.substances[0].aliases.push("<b>bold</b>");
    }));
    expect(r.ok).toBe(true);
    const lib = getActiveLibrary();
    expect(lib.get("hb-buffer-salt")!.record).toMatchObject({ name: html });
    const found = lib.resolve(html);
    expect(found.ok && found.component.name).toBe(html);
    const back = parseLibraryText(exportLibraryText(lib.layers.workbook!), [BUILTIN_LIBRARY]);
    expect(back.ok && back.library.substances![0].name).toBe(html);
  });
});

describe("export → import round trip keeps the fingerprint", () => {
  test("a workbook layer", () => {
    const doc = halvorsenLibrary();
    const original = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: doc });
    const exported = exportLibraryText(doc);
    expect(exported.startsWith('{\n  "format": "protolyte-library",\n  "schemaVersion": 1,')).toBe(true);
    const back = parseLibraryText(exported, [BUILTIN_LIBRARY]);
    if (!back.ok) throw new Error(back.message);
    expect(createLibrary({ builtin: BUILTIN_LIBRARY, workbook: back.library }).fingerprint()).toBe(original.fingerprint());
  });

  test("the built-in library", () => {
    const back = parseLibraryText(exportLibraryText(BUILTIN_LIBRARY));
    if (!back.ok) throw new Error(back.message);
    expect(createLibrary({ builtin: back.library }).fingerprint()).toBe(createLibrary({ builtin: BUILTIN_LIBRARY }).fingerprint());
  });

  test("everything in effect, flattened into one file, with a name hidden by a higher layer", () => {
    const wb = halvorsenLibrary();
    wb.substances![0].aliases!.push("Tris");
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: wb });
    const flat = flattenLibrary(lib);
    const back = parseLibraryText(exportLibraryText(flat));
    if (!back.ok) throw new Error(back.message);
    expect(createLibrary({ builtin: back.library }).fingerprint()).toBe(lib.fingerprint());
    expect(back.library.substances!.find((s) => s.id === "tris-base")!.aliases).not.toContain("Tris");
  });
});

describe("pKb → pKa", () => {
  test("ammonia: pKb 4.75 → pKa 9.245 with pKw 13.995 at 25 °C", () => {
    expect(PKW_25C.value).toBe(13.995);
    const r = pKbToPKa(4.75);
    expect(r.ok && r.pKa).toBe(9.245);
    expect(r.ok && r.note).toMatch(/converted from pKb 4\.75 with pKw 13\.995 at 25 °C/);
  });
  test("another pKw may be given; non-numbers are refused", () => {
    const r = pKbToPKa(5, 14);
    expect(r.ok && r.pKa).toBe(9);
    expect(pKbToPKa(Number.NaN)).toMatchObject({ ok: false, code: "bad-input" });
  });
});
