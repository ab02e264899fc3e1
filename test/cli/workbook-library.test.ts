/**
 * The workbook's own constants: `protolyte sheet FILE.xlsx` computes with the library the add-in
 * stored in the file (read only from Protolyte's web-extension part), refuses a damaged or newer
 * one, layers --library files as the pane layers them, and prints the fingerprint in effect.
 * Fixtures are written by the add-in's own storage code (support/workbook-with-library.ts).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { BUILTIN_LIBRARY, createLibrary, exportLibraryText } from "../../src/library";
import type { LibraryDoc } from "../../src/library/types";
import { halvorsenLibrary } from "../library/helpers";
import { requireBuild, root, run } from "./support/run";
import { ADDIN_ID, addWebExtensions, storedSettingText, webExtensionPart, workbookBuffer } from "./support/workbook-with-library";

let dir = "";
beforeAll(() => {
  // the temporary directory first: files are written there even when the build is missing
  dir = mkdtempSync(join(tmpdir(), "protolyte-wblib-"));
  requireBuild();
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** HB buffer salt's pKa set to `pKa` (the value of the fictional in-house source, Table 3, is 7.35). */
function withPKa(pKa: number): LibraryDoc {
  const doc = halvorsenLibrary();
  doc.systems![0]!.steps[0]!.pKa.value = pKa;
  return doc;
}

const SHEET = { Lab: [["=AQ.PKA(\"HB buffer salt\")", "=AQ.CONSTANTS_ID()"]] };

async function xlsxWith(name: string, parts: string[]): Promise<string> {
  const file = join(dir, name);
  writeFileSync(file, await addWebExtensions(await workbookBuffer(SHEET), parts));
  return file;
}

async function protolytePart(doc: LibraryDoc): Promise<string> {
  const { key, text } = await storedSettingText(doc);
  return webExtensionPart(ADDIN_ID, { [key]: text });
}

const jsonValues = (out: string): unknown[][] => (JSON.parse(out) as { values: unknown[][] }[])[0]!.values;

test("ADDIN_ID is manifest.xml's <Id>", () => {
  const id = /<Id>([^<]+)<\/Id>/.exec(readFileSync(join(root, "manifest.xml"), "utf8"))?.[1];
  expect(ADDIN_ID).toBe(id);
});

test("the workbook's library is used, its fingerprint printed; without it the substance is unknown", async () => {
  const file = await xlsxWith("with-library.xlsx", [await protolytePart(withPKa(7.35))]);
  const r = run(["sheet", file, "--json"]);
  expect(r.code).toBe(0);
  const [pKa, id] = jsonValues(r.out)[0]!;
  expect(pKa).toBe(7.35); // the value stored in the workbook (I = 0, 25 °C: returned as stored)
  const expected = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: withPKa(7.35) }).fingerprint();
  expect(id).toBe(expected);
  expect(r.err).toContain(`constants ${expected} (built-in + workbook)`);

  const plain = run(["sheet", file, "--no-workbook-library", "--json"]);
  expect(jsonValues(plain.out)[0]![0]).toMatchObject({ error: "#VALUE!" });
  expect(plain.err).toContain("(built-in)");
});

test("another add-in's part is never read", async () => {
  const other = webExtensionPart("0a1b2c3d-0000-4000-8000-000000000001", { "protolyte.workbook-library": (await storedSettingText(withPKa(9.9))).text });
  const file = await xlsxWith("other-addin.xlsx", [other, await protolytePart(withPKa(7.35))]);
  const r = run(["sheet", file, "--json"]);
  expect(jsonValues(r.out)[0]![0]).toBe(7.35);
  const only = await xlsxWith("only-other.xlsx", [other]);
  const r2 = run(["sheet", only, "--json"]);
  expect(jsonValues(r2.out)[0]![0]).toMatchObject({ error: "#VALUE!" }); // built-in only: HB buffer salt is unknown
  expect(r2.err).toContain("(built-in)");
});

test("a damaged workbook library is reported and not used: exit 2, one line", async () => {
  const { key, text } = await storedSettingText(withPKa(7.35));
  const file = await xlsxWith("damaged.xlsx", [webExtensionPart(ADDIN_ID, { [key]: text.slice(0, text.length - 40) })]);
  const r = run(["sheet", file]);
  expect(r.code).toBe(2);
  expect(r.out).toBe("");
  expect(r.err).toMatch(/^protolyte: the workbook's own constants library cannot be used \(corrupt\): .*--no-workbook-library/);
  expect(r.err.trim().split("\n")).toHaveLength(1);
});

test("a workbook library saved by a newer Protolyte is reported and not used", async () => {
  const { key, text } = await storedSettingText(withPKa(7.35));
  const newer = JSON.stringify({ ...JSON.parse(text), blobVersion: 99 });
  const file = await xlsxWith("newer.xlsx", [webExtensionPart(ADDIN_ID, { [key]: newer })]);
  const r = run(["sheet", file]);
  expect(r.code).toBe(2);
  expect(r.err).toMatch(/\(newer-version\).*newer Protolyte/);
});

describe("--library FILE.json", () => {
  test("one file: its constants are used; two files: the later one's entries replace the earlier's", () => {
    const a = join(dir, "a.json");
    const b = join(dir, "b.json");
    writeFileSync(a, exportLibraryText(withPKa(7.35)));
    writeFileSync(b, exportLibraryText(withPKa(7.41)));
    const one = run(["eval", "--json", "--library", a, '=AQ.PKA("HB buffer salt")']);
    expect(JSON.parse(one.out)).toEqual({ value: 7.35 });
    expect(one.err).toContain("(built-in + --library file)");
    const two = run(["eval", "--json", "--library", a, "--library", b, '=AQ.PKA("HB buffer salt")']);
    expect(JSON.parse(two.out)).toEqual({ value: 7.41 });
    expect(two.err).toContain("(built-in + 2 --library files)");
  });

  test("with a workbook library, the layers are ordered by the library itself (createLibrary)", async () => {
    const file = await xlsxWith("both.xlsx", [await protolytePart(withPKa(7.35))]);
    const b = join(dir, "personal.json");
    writeFileSync(b, exportLibraryText(withPKa(7.41)));
    const r = run(["sheet", file, "--library", b, "--json"]);
    const expected = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: withPKa(7.35), personal: withPKa(7.41) });
    expect(jsonValues(r.out)[0]).toEqual([expected.system("hb-zwitterion")!.steps[0]!.pKa, expected.fingerprint()]);
    expect(r.err).toContain(`constants ${expected.fingerprint()} (built-in + workbook + --library file)`);
  });

  test("a missing or invalid file is one line naming it, exit 2", () => {
    const missing = run(["eval", "--library", join(dir, "nope.json"), "=1"]);
    expect(missing.code).toBe(2);
    expect(missing.err).toBe(`protolyte: cannot read library file '${join(dir, "nope.json")}': no such file\n`);
    const bad = join(dir, "bad.json");
    writeFileSync(bad, '{"format":"protolyte-library","schemaVersion":1,"name":"x","substances":[{"id":"q"}]}');
    const invalid = run(["eval", "--library", bad, "=1"]);
    expect(invalid.code).toBe(2);
    expect(invalid.err).toMatch(new RegExp(`^protolyte: library file '${bad.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&")}' is not usable: .+\\n$`));
    // named in words, not by path (issue 17 item 9)
    const salt = join(dir, "salt.json");
    writeFileSync(salt, JSON.stringify({ format: "protolyte-library", schemaVersion: 1, name: "x", substances: [{ id: "hb-9-na", name: "HB-9 sodium salt", nature: "weak-acid-base", formula: "C7H14NNaO5S", systems: [{ system: "hb-9", stoich: 1, protons: 0 }] }] }));
    const words = run(["eval", "--library", salt, "=1"]);
    expect(words.code).toBe(2);
    expect(words.err).toMatch(/is not usable: invalid library: HB-9 sodium salt uses the system 'hb-9', which no library in effect holds .*, or choose another\n$/);
    expect(words.err).not.toMatch(/substances\[0\]/);
  });
});
