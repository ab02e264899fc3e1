/**
 * Layering: built-in ← personal ← workbook. Higher layers override lower ones by id, the merged
 * view says where each entry comes from and what it hides, and names claimed by a higher layer win.
 */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { createLibrary } from "../../src/library/layers";
import type { LibraryDoc, SystemRecord } from "../../src/library/types";
import { builtinCopy, halvorsenLibrary } from "./helpers";

const acetateWith = (pKa: number, note: string): SystemRecord => {
  const base = builtinCopy().systems!.find((s) => s.id === "acetate")!;
  base.steps[0].pKa = { value: pKa, unit: "1", conditions: "25 °C, I = 0", status: "unverified", note };
  return base;
};
const layer = (name: string, extra: Partial<LibraryDoc>): LibraryDoc => ({ format: "protolyte-library", schemaVersion: 1, name, ...extra });
const acetatePka = (lib: ReturnType<typeof createLibrary>): number => {
  const r = lib.resolve("sodium acetate");
  if (!r.ok) throw new Error(r.message);
  return r.component.systems[0].system.steps[0].pKa;
};

describe("overrides by id", () => {
  const workbook = layer("HB release sheet constants", { systems: [acetateWith(4.76, "from memory, unverified: HB lab value")] });
  const personal = layer("my bench values", { systems: [acetateWith(4.70, "from memory, unverified: my bench value")] });

  test("built-in only", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY });
    expect(acetatePka(lib)).toBe(4.756);
    expect(lib.get("acetate", "system")).toMatchObject({ layer: "builtin", overrides: [] });
  });

  test("a workbook entry overrides the built-in one and says so", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook });
    expect(acetatePka(lib)).toBe(4.76);
    expect(lib.get("acetate", "system")).toMatchObject({ kind: "system", layer: "workbook", overrides: ["builtin"] });
    expect(lib.get("phosphate", "system")).toMatchObject({ layer: "builtin", overrides: [] });
  });

  test("a personal entry overrides the built-in one when the workbook says nothing", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, personal });
    expect(acetatePka(lib)).toBe(4.7);
    expect(lib.get("acetate", "system")).toMatchObject({ layer: "personal", overrides: ["builtin"] });
  });

  test("the workbook decides: its entry overrides a personal one, nearest layer first", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook, personal });
    expect(acetatePka(lib)).toBe(4.76);
    expect(lib.get("acetate", "system")).toMatchObject({ layer: "workbook", overrides: ["personal", "builtin"] });
  });

  test("list() shows each id once, with its layer", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook, personal });
    const systems = lib.list("system");
    expect(systems.filter((e) => e.id === "acetate").map((e) => e.layer)).toEqual(["workbook"]);
    expect(systems.length).toBe(BUILTIN_LIBRARY.systems!.length);
    expect(lib.list().length).toBe(
      Object.keys(BUILTIN_LIBRARY.sources!).length + Object.keys(BUILTIN_LIBRARY.atomicWeights!).length +
        BUILTIN_LIBRARY.systems!.length + BUILTIN_LIBRARY.ions!.length + BUILTIN_LIBRARY.substances!.length,
    );
  });

  test("the input documents are copied: later edits by the caller change nothing", () => {
    const doc = layer("editable", { systems: [acetateWith(4.8, "from memory, unverified: test")] });
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: doc });
    doc.systems![0].steps[0].pKa.value = 9;
    expect(acetatePka(lib)).toBe(4.8);
    expect(Object.isFrozen(lib.layers.workbook!.systems![0].steps[0].pKa)).toBe(true);
  });
});

describe("new entries in user layers", () => {
  test("a workbook substance may use its own system and a built-in ion", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: halvorsenLibrary() });
    const r = lib.resolve("hbs-7");
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.entry).toMatchObject({ layer: "workbook", overrides: [], id: "hb-buffer-salt" });
    expect(r.component.systems[0].system).toMatchObject({ id: "hb-zwitterion", topCharge: 0, steps: [{ pKa: 7.35 }] });
    expect(r.component.ions[0].ion).toMatchObject({ id: "na", charge: 1 });
    expect(r.component.molarMass).toBeCloseTo(12.011 * 8 + 1.008 * 17 + 14.007 + 22.98976928 + 15.999 * 4 + 32.06, 9);
    expect(lib.problems).toEqual([]);
  });

  test("a name claimed by a higher layer means the higher layer's substance, and the pane is told", () => {
    const doc = halvorsenLibrary();
    doc.substances![0].aliases = ["Tris"];
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: doc });
    const tris = lib.resolve("tris");
    expect(tris.ok && tris.component.id).toBe("hb-buffer-salt");
    const base = lib.resolve("Tris base");
    expect(base.ok && base.component.id).toBe("tris-base");
    expect(lib.problems).toEqual([
      { layer: "workbook", severity: "warning", path: "substances[0].aliases[0]", message: "'Tris' now means hb-buffer-salt (workbook), hiding tris-base (builtin)" },
    ]);
  });

  test("a broken reference makes that substance unusable with a reason, and nothing else", () => {
    const doc = halvorsenLibrary();
    doc.substances![0].systems![0].system = "hb-missing";
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: doc });
    const r = lib.resolve("HBS-7");
    expect(r).toMatchObject({ ok: false, code: "unusable" });
    expect(!r.ok && r.message).toMatch(/unknown acid–base system 'hb-missing'/);
    expect(lib.problems).toContainEqual({ layer: "workbook", severity: "error", path: "substances[0].systems[0].system", message: "unknown acid–base system 'hb-missing'" });
    expect(lib.resolve("Tris").ok).toBe(true);
  });
});

describe("system lookup", () => {
  const lib = createLibrary({ builtin: BUILTIN_LIBRARY });
  test.each([["phosphate", "phosphate"], ["Bis Tris", "bis-tris"], ["PHOSPHATE", "phosphate"], ["HEPES", "hepes"]])("%p → %s", (name, id) => {
    expect(lib.system(name)?.id).toBe(id);
  });
  test("unknown systems and ions are undefined", () => {
    expect(lib.system("nope")).toBeUndefined();
    expect(lib.ion("na")).toEqual({ id: "na", name: "Na+", charge: 1 });
    expect(lib.ion("nh4")).toBeUndefined();
  });
});
