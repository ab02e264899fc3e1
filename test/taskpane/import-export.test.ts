/**
 * Import and export through the controller: export → import round trip, preview before applying,
 * nothing changed by a cancelled or failed import, the size limit, replace vs merge.
 */
import { getActiveLibrary, LIBRARY_FORMAT, MAX_LIBRARY_BYTES, SOFTWARE_VERSION } from "../../src/library";
import { baseSubstance, baseSystemByPkb, freshController } from "./helpers";

const file = (doc: unknown) => JSON.stringify(doc);
const read = (text: string) => async () => text;

async function withBase() {
  const env = await freshController();
  await env.ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
  await env.ctl.saveSubstance("workbook", baseSubstance("hb-7-amine"));
  return env;
}

describe("export", () => {
  test("a user layer exports as a library file; an empty layer exports nothing", async () => {
    const { ctl } = await withBase();
    const f = ctl.exportFile("workbook", new Date("2026-12-02T17:45:12.000Z"));
    const fp = ctl.library.fingerprint();
    // the fingerprint, the date and the software version, in the name and in the file
    expect(f?.fileName).toBe(`protolyte-workbook-library_${fp}_2026-12-02T1745Z.json`);
    const doc = JSON.parse(f!.text);
    expect(doc).toMatchObject({ format: LIBRARY_FORMAT, schemaVersion: 1 });
    expect(doc.exported).toEqual({ at: "2026-12-02T17:45:12.000Z", fingerprint: fp, software: `Protolyte ${SOFTWARE_VERSION}`, what: "workbook library" });
    // the change record goes out with it
    expect(doc.changes.map((c: { action: string; entry: { id: string } }) => [c.action, c.entry.id])).toEqual([["add", "hb-7-amine"], ["add", "hb-7-free-base"]]);
    expect(doc.substances.map((s: { id: string }) => s.id)).toEqual(["hb-7-free-base"]);
    expect(ctl.exportFile("personal")).toBeNull();
  });

  test("export then import into a fresh workbook layer gives the same constants fingerprint", async () => {
    const { ctl } = await withBase();
    const fingerprint = ctl.library.fingerprint();
    const text = ctl.exportFile("workbook")!.text;
    const { ctl: other } = await freshController();
    expect(other.library.fingerprint()).not.toBe(fingerprint);
    const p = await other.previewImport("workbook", "lab.json", text.length, read(text));
    expect(p.ok).toBe(true);
    expect(other.library.fingerprint()).not.toBe(fingerprint); // preview applies nothing
    const r = await other.confirmImport();
    expect(r.ok).toBe(true);
    expect(other.library.fingerprint()).toBe(fingerprint);
  });
});

describe("import preview", () => {
  test("lists additions and overrides of built-in entries, and applies only on confirmation", async () => {
    const { ctl, memory } = await freshController();
    const acetate = getActiveLibrary().get("acetate", "system")!.record;
    const text = file({
      format: LIBRARY_FORMAT,
      schemaVersion: 1,
      name: "Halvorsen Biologics QC",
      systems: [{ ...(acetate as object), name: "acetate (Halvorsen QC value)" }],
      ions: [{ id: "hb-cation", name: "Halvorsen test cation", charge: 1 }],
    });
    const p = await ctl.previewImport("workbook", "qc.json", text.length, read(text));
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    expect(p.preview.changes.map((c) => [c.kind, c.id, c.action])).toEqual([
      ["system", "acetate", "override"],
      ["ion", "hb-cation", "add"],
    ]);
    expect(p.preview.changes[0].text).toBe("overrides the built-in acid–base system");
    expect(memory.workbook.peek()).toBeNull();
    expect(getActiveLibrary().get("acetate", "system")?.layer).toBe("builtin");
    ctl.cancelImport();
    expect(ctl.pendingImport).toBeNull();
    expect(getActiveLibrary().get("acetate", "system")?.layer).toBe("builtin");
    await ctl.previewImport("workbook", "qc.json", text.length, read(text));
    expect((await ctl.confirmImport()).ok).toBe(true);
    expect(getActiveLibrary().get("acetate", "system")).toMatchObject({ layer: "workbook", overrides: ["builtin"] });
  });

  test("replace lists what it removes; merge keeps the rest", async () => {
    const { ctl } = await withBase();
    const text = file({ format: LIBRARY_FORMAT, schemaVersion: 1, name: "x", ions: [{ id: "hb-cation", name: "Halvorsen test cation", charge: 1 }] });
    const replace = await ctl.previewImport("workbook", "x.json", text.length, read(text), "replace");
    expect(replace.ok && replace.preview.changes.filter((c) => c.action === "remove").map((c) => c.id).sort()).toEqual(["hb-7-amine", "hb-7-free-base"]);
    const merge = await ctl.previewImport("workbook", "x.json", text.length, read(text), "merge");
    expect(merge.ok && merge.preview.changes.map((c) => c.action)).toEqual(["add"]);
    await ctl.confirmImport();
    expect(getActiveLibrary().get("hb-7-free-base")?.layer).toBe("workbook");
    expect(getActiveLibrary().get("hb-cation", "ion")?.layer).toBe("workbook");
  });
});

describe("a failed import changes nothing", () => {
  async function expectUnchanged(text: string, size: number, why: RegExp) {
    const { ctl, memory } = await withBase();
    const before = { fp: ctl.library.fingerprint(), stored: memory.workbook.peek() };
    let readCalled = false;
    const r = await ctl.previewImport("workbook", "bad.json", size, async () => {
      readCalled = true;
      return text;
    });
    expect(r.ok).toBe(false);
    expect(r.ok ? "" : `${r.message} ${r.errors.join(" ")}`).toMatch(why);
    expect(ctl.pendingImport).toBeNull();
    expect(ctl.library.fingerprint()).toBe(before.fp);
    expect(memory.workbook.peek()).toBe(before.stored);
    return readCalled;
  }

  test("not JSON", async () => {
    await expectUnchanged("{ this is not json", 18, /not valid JSON/);
  });

  test("not a Protolyte library", async () => {
    await expectUnchanged(file({ hello: "world" }), 17, /not a Protolyte library file/);
  });

  test("an invalid value, naming the entry and the field in words", async () => {
    const text = file({ format: LIBRARY_FORMAT, schemaVersion: 1, name: "x", systems: [{ id: "q", name: "q", topCharge: 0, steps: [{ pKa: { value: 4, unit: "kJ/mol", conditions: "25 °C", status: "published", source: "goldberg2002" } }] }] });
    await expectUnchanged(text, text.length, /: q, step 1, pKa, unit: /);
  });

  test("a file's problems are listed in words, naming the entry, each once (issue 17 item 9)", async () => {
    const salt = { id: "hb-9-na", name: "HB-9 sodium salt", nature: "weak-acid-base", formula: "C7H14NNaO5S", systems: [{ system: "hb-9", stoich: 1, protons: 0 }] };
    const text = file({ format: LIBRARY_FORMAT, schemaVersion: 1, name: "x", substances: [salt, { ...salt, id: "hb-9-k", name: "HB-9 potassium salt", formula: "C7H14NKO5S" }] });
    const { ctl } = await withBase();
    const r = await ctl.previewImport("workbook", "paper.json", text.length, read(text));
    if (r.ok) throw new Error("imported");
    expect(r.errors).toEqual([
      expect.stringMatching(/^HB-9 sodium salt uses the system 'hb-9', which no library in effect holds .*, or choose another$/),
      expect.stringMatching(/^HB-9 potassium salt uses the system 'hb-9'/),
    ]);
    // counted in the message, each said once below it (not also in the message)
    expect(r.message).toBe("'paper.json' was not imported (nothing changed): 2 problems, each named below.");
    expect(`${r.message} ${r.errors.join(" ")}`).not.toMatch(/substances\[\d\]|systems\[\d\]/);
  });

  test("an unsafe key", async () => {
    const text = '{"format":"protolyte-library","schemaVersion":1,"name":"x","__proto__":{"polluted":true}}';
    await expectUnchanged(text, text.length, /refused/);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  test("a file over the size limit is refused before it is read", async () => {
    const readCalled = await expectUnchanged("{}", MAX_LIBRARY_BYTES + 1, /limited to 5\.0 MB/);
    expect(readCalled).toBe(false);
  });

  test("a newer schema version", async () => {
    await expectUnchanged(file({ format: LIBRARY_FORMAT, schemaVersion: 9, name: "x" }), 60, /newer/);
  });
});

describe("import preview across layers", () => {
  test("an entry imported into the personal library while the workbook overrides it is said to stay hidden", async () => {
    const { ctl } = await freshController();
    const ion = { id: "hb-cation", name: "Halvorsen test cation", charge: 1 };
    const workbook = file({ format: LIBRARY_FORMAT, schemaVersion: 1, name: "w", ions: [ion] });
    await ctl.previewImport("workbook", "w.json", workbook.length, read(workbook));
    expect((await ctl.confirmImport()).ok).toBe(true);
    const personal = file({ format: LIBRARY_FORMAT, schemaVersion: 1, name: "p", ions: [{ ...ion, name: "personal cation" }] });
    const p = await ctl.previewImport("personal", "p.json", personal.length, read(personal));
    expect(p.ok && p.preview.changes).toEqual([
      expect.objectContaining({ id: "hb-cation", action: "hidden", text: "adds a new strong ion, but your workbook strong ion stays in effect" }),
    ]);
  });

  test("an entry imported into the workbook overrides the personal one (the workbook decides)", async () => {
    const { ctl } = await freshController();
    const ion = { id: "hb-cation", name: "Halvorsen test cation", charge: 1 };
    const personal = file({ format: LIBRARY_FORMAT, schemaVersion: 1, name: "p", ions: [ion] });
    await ctl.previewImport("personal", "p.json", personal.length, read(personal));
    expect((await ctl.confirmImport()).ok).toBe(true);
    const workbook = file({ format: LIBRARY_FORMAT, schemaVersion: 1, name: "w", ions: [{ ...ion, charge: 2 }] });
    const p = await ctl.previewImport("workbook", "w.json", workbook.length, read(workbook));
    expect(p.ok && p.preview.changes).toEqual([expect.objectContaining({ id: "hb-cation", action: "override", text: "overrides the personal strong ion" })]);
    expect((await ctl.confirmImport()).ok).toBe(true);
    expect(ctl.library.ion("hb-cation")?.charge).toBe(2);
  });
});
