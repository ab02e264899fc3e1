/**
 * Names → substances: normalization, unambiguous aliases, resolution to engine Components and
 * suggestions for near misses.
 */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { createLibrary } from "../../src/library/layers";
import { normalizeName } from "../../src/library/normalize";
import { editDistance } from "../../src/library/suggest";

const library = createLibrary({ builtin: BUILTIN_LIBRARY });
const idOf = (name: string): string => {
  const r = library.resolve(name);
  if (!r.ok) throw new Error(r.message);
  return r.component.id;
};

describe("normalizeName", () => {
  test.each([
    ["Na₂HPO₄·7H₂O", "na2hpo47h2o"],
    ["Na2HPO4 . 7 H2O", "na2hpo47h2o"],
    ["NA2HPO4*7H2O", "na2hpo47h2o"],
    ["Tris‐HCl", "trishcl"],
    ["  Tris   HCl ", "trishcl"],
    ["sodium phosphate, dibasic, heptahydrate", "sodiumphosphatedibasicheptahydrate"],
    ["ＨＥＰＥＳ", "hepes"],
  ])("%p → %p", (input, key) => {
    expect(normalizeName(input)).toBe(key);
  });
});

describe("no alias is ambiguous", () => {
  test("every lookup name of the built-in library means exactly one substance", () => {
    const owners = new Map<string, Set<string>>();
    for (const s of BUILTIN_LIBRARY.substances ?? []) {
      const names = [s.id, s.name, ...(s.aliases ?? []), ...(s.formulaAlias === false ? [] : [s.formula ?? ""])].filter(Boolean);
      for (const n of names) {
        const key = normalizeName(n);
        expect(key).not.toBe("");
        owners.set(key, new Set([...(owners.get(key) ?? []), s.id]));
      }
    }
    const ambiguous = [...owners].filter(([, ids]) => ids.size > 1).map(([k, ids]) => `${k}: ${[...ids].join(", ")}`);
    expect(ambiguous).toEqual([]);
    expect(library.problems).toEqual([]);
  });

  test("formulas shared by two substances are not lookup names", () => {
    expect(library.resolve("C12H22O11")).toMatchObject({ ok: false, code: "not-found" });
    expect(library.resolve("C6H14O6")).toMatchObject({ ok: false, code: "not-found" });
    expect(library.resolve("C7H8O")).toMatchObject({ ok: false, code: "not-found" }); // benzyl alcohol and m-cresol
  });
});

describe("resolution examples", () => {
  test.each([
    ["sodium phosphate dibasic heptahydrate", "disodium-hydrogen-phosphate-heptahydrate"],
    ["disodium hydrogen phosphate heptahydrate", "disodium-hydrogen-phosphate-heptahydrate"],
    ["Na2HPO4·7H2O", "disodium-hydrogen-phosphate-heptahydrate"],
    ["Na2HPO4.7H2O", "disodium-hydrogen-phosphate-heptahydrate"],
    ["Na2HPO4*7H2O", "disodium-hydrogen-phosphate-heptahydrate"],
    ["Na2HPO47H2O", "disodium-hydrogen-phosphate-heptahydrate"],
    ["Na₂HPO₄·7H₂O", "disodium-hydrogen-phosphate-heptahydrate"],
    ["Na2HPO4", "disodium-hydrogen-phosphate"],
    ["NaH2PO4·H2O", "sodium-dihydrogen-phosphate-monohydrate"],
    ["Tris base", "tris-base"],
    ["TRIS", "tris-base"],
    ["tromethamine", "tris-base"],
    ["THAM", "tris-base"],
    ["Tris-HCl", "tris-hcl"],
    ["tris hydrochloride", "tris-hcl"],
    ["sodium hydroxide", "sodium-hydroxide"],
    ["NaOH", "sodium-hydroxide"],
    ["hydrochloric acid", "hydrochloric-acid"],
    ["HCl", "hydrochloric-acid"],
    ["borax", "borax"],
    ["KHP", "potassium-hydrogen-phthalate"],
    ["histidine HCl·H2O", "l-histidine-hcl-monohydrate"],
    ["Bis-Tris", "bis-tris"],
    ["bistris", "bis-tris"],
    ["HEPES", "hepes"],
    ["hepes-na", "hepes-sodium"],
    ["aqueous ammonia", "ammonia"],
    ["NH4Cl", "ammonium-chloride"],
    ["(NH4)2SO4", "ammonium-sulfate"],
    ["trehalose dihydrate", "trehalose-dihydrate"],
    ["glycerin", "glycerol"],
    // Names pharmacopoeias and suppliers print for a hydrate (European Pharmacopoeia monographs "Sodium citrate",
    // "Histidine hydrochloride monohydrate"); see the notes on these entries.
    ["sodium citrate", "trisodium-citrate-dihydrate"],
    ["trisodium citrate", "trisodium-citrate"],
    ["histidine hydrochloride", "l-histidine-hcl-monohydrate"],
    ["His-HCl", "l-histidine-hcl-monohydrate"],
    ["histidine HCl", "l-histidine-hcl-monohydrate"],
    ["histidine hydrochloride anhydrous", "l-histidine-hcl"],
    ["C6H9N3O2·HCl", "l-histidine-hcl"],
    ["MSG", "monosodium-glutamate-monohydrate"],
    ["monosodium glutamate", "monosodium-glutamate"],
    ["Na2CO3·10H2O", "sodium-carbonate-decahydrate"],
    ["NH4HCO3", "ammonium-bicarbonate"],
    ["dextrose monohydrate", "glucose-monohydrate"],
    ["trolamine", "triethanolamine"],
    ["N-methylglucamine", "meglumine"],
    ["Tween 80", "polysorbate-80"],
    ["metacresol", "m-cresol"],
    ["ACES", "aces"],
    ["MOPSO", "mopso"],
    ["bis-tris propane", "bis-tris-propane"],
  ])("%p → %s", (name, id) => {
    expect(idOf(name)).toBe(id);
  });

  test("Na2HPO4·7H2O as the engine sees it: 1 phosphate + 2 Na⁺, 268.06 g/mol, 1 proton left", () => {
    const r = library.resolve("Na2HPO4·7H2O");
    if (!r.ok) throw new Error(r.message);
    const c = r.component;
    expect(c.systems.map((s) => [s.system.id, s.stoich, s.system.topCharge, s.system.steps.map((t) => t.pKa)])).toEqual([
      ["phosphate", 1, 0, [2.148, 7.1965, 12.325]],
    ]);
    expect(c.ions.map((i) => [i.ion.id, i.stoich, i.ion.charge])).toEqual([["na", 2, 1]]);
    expect(c.protons).toBe(1);
    expect(c.molarMass).toBeCloseTo(268.0623, 3);
    expect(r.entry.layer).toBe("builtin");
  });

  test("borax releases 4 borate and 2 Na⁺; NaCl releases ions only; sucrose one neutral particle", () => {
    const borax = library.resolve("borax");
    const nacl = library.resolve("NaCl");
    const sucrose = library.resolve("sucrose");
    if (!borax.ok || !nacl.ok || !sucrose.ok) throw new Error("not resolved");
    expect(borax.component.systems.map((s) => [s.system.id, s.stoich])).toEqual([["borate", 4]]);
    expect(borax.component.ions.map((s) => [s.ion.id, s.stoich])).toEqual([["na", 2]]);
    expect(nacl.component.systems).toEqual([]);
    expect(nacl.component.ions.map((s) => s.ion.id).sort()).toEqual(["cl", "na"]);
    expect([sucrose.component.neutral, sucrose.component.systems.length, sucrose.component.ions.length]).toEqual([1, 0, 0]);
  });

  test("the same Component object is returned every time (cached)", () => {
    const a = library.resolve("Tris");
    const b = library.resolve("tris base");
    expect(a.ok && b.ok && a.component === b.component).toBe(true);
  });

  test("components are frozen", () => {
    const r = library.resolve("NaCl");
    expect(r.ok && Object.isFrozen(r.component)).toBe(true);
  });

  test("blank names and non-strings are 'empty', not a crash", () => {
    expect(library.resolve("   ")).toMatchObject({ ok: false, code: "empty" });
    expect(library.resolve(undefined as unknown as string)).toMatchObject({ ok: false, code: "empty" });
  });
});

describe("suggestions for near misses", () => {
  test.each([
    ["Tirs", "tris-base"],
    ["sodium acetat", "sodium-acetate"],
    ["hepse", "hepes"],
    ["Na2HPO4 7H20", "disodium-hydrogen-phosphate-heptahydrate"],
    ["histidine HCl monohydrat", "l-histidine-hcl-monohydrate"],
    ["imidazol", "imidazole"],
  ])("%p suggests %s", (typed, id) => {
    const r = library.resolve(typed);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.code).toBe("not-found");
    expect(r.suggestions.length).toBeGreaterThan(0);
    expect(r.suggestions.length).toBeLessThanOrEqual(3);
    expect(r.suggestions.map((s) => s.id)).toContain(id);
    expect(r.message).toMatch(/^Unknown substance '.+'\. Did you mean '/);
  });

  test("suggestions are distinct substances, best first", () => {
    const s = library.suggest("sodium citrate");
    expect(new Set(s.map((x) => x.id)).size).toBe(s.length);
    expect(s.map((x) => x.distance)).toEqual([...s.map((x) => x.distance)].sort((a, b) => a - b));
    expect(s.map((x) => x.id)).toEqual(expect.arrayContaining(["trisodium-citrate-dihydrate"]));
  });

  test("nonsense gets no suggestions and a plain message", () => {
    const r = library.resolve("qqqqzzzz");
    expect(r).toMatchObject({ ok: false, code: "not-found", suggestions: [], message: "Unknown substance 'qqqqzzzz'." });
  });

  test("edit distance counts an adjacent transposition as one edit", () => {
    expect(editDistance("tris", "tirs")).toBe(1);
    expect(editDistance("kitten", "sitting")).toBe(3);
    expect(editDistance("", "abc")).toBe(3);
    expect(editDistance("abcdef", "uvwxyz", 2)).toBe(3);
  });
});
