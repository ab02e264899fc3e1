/**
 * The built-in data files: every file is a valid library file (checked with ajv against
 * schema/library.schema.json), the assembled built-in library passes the semantic checks, and every
 * number carries its provenance.
 */
import { BUILTIN_FILES, BUILTIN_LIBRARY } from "../../src/library/builtin";
import water from "../../src/library/data/water.json";
import type { ValueRecord } from "../../src/library/types";
import { validateLibraryDoc } from "../../src/library/validate";
import { ajvDef, validateWithAjv } from "./ajv";

describe("built-in data files against the JSON Schema (ajv)", () => {
  test.each(Object.keys(BUILTIN_FILES))("%s is a valid library file", (file) => {
    const ok = validateWithAjv(BUILTIN_FILES[file]);
    expect(validateWithAjv.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  test("the assembled built-in library is valid for ajv and for the runtime validator", () => {
    expect(validateWithAjv(BUILTIN_LIBRARY)).toBe(true);
    const r = validateLibraryDoc(BUILTIN_LIBRARY);
    expect(r.ok ? [] : r.errors).toEqual([]);
  });

  test("water.json: pKw at 25 °C is a sourced value record", () => {
    const v = ajvDef("value");
    expect(v(water.pKw25)).toBe(true);
    expect(water.pKw25.value).toBe(13.995);
    expect(water.pKw25.source).toBe("crc-water");
  });
});

/** Every value record in the built-in library with the path where it sits. */
function valueRecords(): { path: string; rec: ValueRecord }[] {
  const out: { path: string; rec: ValueRecord }[] = [];
  for (const [el, rec] of Object.entries(BUILTIN_LIBRARY.atomicWeights ?? {})) out.push({ path: `atomicWeights.${el}`, rec });
  for (const s of BUILTIN_LIBRARY.systems ?? []) {
    s.steps.forEach((step, i) => {
      for (const k of ["pKa", "dH", "dCp"] as const) {
        const rec = step[k];
        if (rec) out.push({ path: `systems[${s.id}].steps[${i}].${k}`, rec });
      }
    });
  }
  for (const s of BUILTIN_LIBRARY.substances ?? []) if (s.molarMass) out.push({ path: `substances[${s.id}].molarMass`, rec: s.molarMass });
  out.push({ path: "water.pKw25", rec: water.pKw25 as ValueRecord });
  return out;
}

describe("provenance of every built-in number", () => {
  const records = valueRecords();
  const sources = BUILTIN_LIBRARY.sources ?? {};

  test("there are value records to check", () => {
    expect(records.length).toBeGreaterThan(100);
  });

  test.each(records.map((r) => [r.path, r.rec] as const))("%s names a known source, or says why not", (_path, rec) => {
    expect(rec.unit.length).toBeGreaterThan(0);
    expect(rec.conditions.length).toBeGreaterThan(0);
    if (rec.status === "published") {
      expect(rec.source).toBeDefined();
      expect(Object.keys(sources)).toContain(rec.source);
      expect(rec.locator).toBeDefined();
    } else {
      expect(["common-practice", "unverified"]).toContain(rec.status);
      expect(rec.note ?? "").toMatch(rec.status === "unverified" ? /from memory, unverified/ : /common practice/);
    }
    if (rec.source !== undefined) expect(Object.keys(sources)).toContain(rec.source);
  });

  test("every source is cited by at least one value", () => {
    const cited = new Set(records.map((r) => r.rec.source).filter(Boolean));
    expect(Object.keys(sources).filter((id) => !cited.has(id))).toEqual([]);
  });

  test("units are the ones the engine expects", () => {
    for (const s of BUILTIN_LIBRARY.systems ?? []) {
      for (const step of s.steps) {
        expect(step.pKa.unit).toBe("1");
        if (step.dH) expect(step.dH.unit).toBe("kJ/mol");
        if (step.dCp) expect(step.dCp.unit).toBe("J/(K·mol)");
      }
    }
  });

  test("built-in molar masses are computed from formulas, never typed", () => {
    for (const s of BUILTIN_LIBRARY.substances ?? []) {
      expect({ id: s.id, formula: typeof s.formula, molarMass: s.molarMass }).toEqual({ id: s.id, formula: "string", molarMass: undefined });
    }
  });

  test("every system names its species, one more than its steps", () => {
    for (const s of BUILTIN_LIBRARY.systems ?? []) expect({ id: s.id, n: s.speciesNames?.length }).toEqual({ id: s.id, n: s.steps.length + 1 });
  });
});

describe("values cross-checked in the project's reference list (Goldberg, Kishore & Lennen 2002)", () => {
  const sys = (id: string) => (BUILTIN_LIBRARY.systems ?? []).find((s) => s.id === id)!;
  test.each([
    ["acetate", 0, 4.756, -0.41, -142],
    ["phosphate", 1, 7.198, 3.6, -230],
    ["citrate", 2, 6.396, -3.38, -254],
    ["tris", 0, 8.072, 47.45, -59],
    ["hepes", 0, 7.564, 20.4, 47],
    ["ammonia", 0, 9.245, 51.95, 8],
    ["glycine", 1, 9.78, 44.2, -57],
  ])("%s step %i: pK %d, ΔrH° %d kJ/mol, ΔrCp° %d J/(K·mol)", (id, i, pKa, dH, dCp) => {
    const step = sys(id).steps[i];
    expect([step.pKa.value, step.dH?.value, step.dCp?.value]).toEqual([pKa, dH, dCp]);
    expect(step.pKa.source).toBe("goldberg2002");
  });

  test("charges of the fully protonated forms", () => {
    expect(["phosphate", "ammonia", "tris", "histidine", "pipes", "sulfate"].map((id) => sys(id).topCharge)).toEqual([0, 1, 1, 2, -1, 0]);
  });

  test("sulfate: first step treated as fully dissociated (common practice), second ≈ 1.99 (unverified)", () => {
    const [s1, s2] = sys("sulfate").steps;
    expect(s1.pKa.status).toBe("common-practice");
    expect(s1.pKa.value).toBeLessThanOrEqual(-2);
    expect(s2.pKa.value).toBe(1.99);
    expect(s2.pKa.status).toBe("unverified");
  });
});
