/**
 * Nothing replaced silently: taken ids and names are found before a user layer takes an entry,
 * names that look like others (look-alike letters, invisible or bidirectional characters) are
 * refused, and a file with a key written twice is refused instead of read as "last one wins".
 */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { nameClaims, takenBy } from "../../src/library/claims";
import { parseLibraryText } from "../../src/library/io";
import { duplicateKey } from "../../src/library/json-keys";
import { createLibrary } from "../../src/library/layers";
import { validateLibraryDoc } from "../../src/library/validate";
import { nameCharacterProblem } from "../../src/library/validate/name-chars";
import type { SubstanceRecord } from "../../src/library/types";
import { halvorsenLibrary } from "./helpers";

const builtin = createLibrary({ builtin: BUILTIN_LIBRARY });

describe("taken ids", () => {
  test("a built-in id is taken, with the entry that holds it", () => {
    expect(takenBy(builtin, "system", "acetate")).toMatchObject({ id: "acetate", layer: "builtin" });
    expect(takenBy(builtin, "system", "hb-zwitterion")).toBeUndefined();
    expect(takenBy(builtin, "system", "")).toBeUndefined();
  });

  test("an id taken in a user layer names that layer", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: halvorsenLibrary() });
    expect(takenBy(lib, "system", "hb-zwitterion")).toMatchObject({ layer: "workbook" });
    // ids are per kind: a substance id does not take a system id
    expect(takenBy(lib, "system", "hb-buffer-salt")).toBeUndefined();
  });
});

describe("names claimed from other substances", () => {
  const salt = (extra: Partial<SubstanceRecord>): SubstanceRecord => ({
    id: "hb-acetate-salt",
    name: "HB acetate salt",
    nature: "weak-acid-base",
    systems: [{ system: "acetate", stoich: 1, protons: 0 }],
    ions: [{ ion: "na", stoich: 1 }],
    ...extra,
  });

  test("an alias that means the built-in sodium acetate is a claim, located at the alias", () => {
    expect(nameClaims(builtin, salt({ aliases: ["HB salt", "Sodium Acetate"] }))).toEqual([
      { name: "Sodium Acetate", path: "aliases[1]", ownerId: "sodium-acetate", ownerName: "sodium acetate", ownerLayer: "builtin" },
    ]);
  });

  test("a formula that is another substance's lookup name is a claim; a formula marked not-a-name is not", () => {
    expect(nameClaims(builtin, salt({ formula: "CH3COONa" })).map((c) => [c.path, c.ownerId])).toEqual([["formula", "sodium-acetate"]]);
    expect(nameClaims(builtin, salt({ formula: "CH3COONa", formulaAlias: false }))).toEqual([]);
  });

  test("an override under the same id keeps its own names without a claim", () => {
    const own = BUILTIN_LIBRARY.substances!.find((s) => s.id === "sodium-acetate")!;
    expect(nameClaims(builtin, JSON.parse(JSON.stringify(own)))).toEqual([]);
  });

  test("the lookup the claim protects: sodium acetate keeps meaning the built-in entry", () => {
    const r = builtin.resolve("sodium acetate");
    expect(r.ok && r.entry.id).toBe("sodium-acetate");
    expect(builtin.ownerOf("SODIUM ACETATE")?.layer).toBe("builtin");
    expect(builtin.ownerOf("no such thing")).toBeUndefined();
  });
});

describe("characters a name may not hold", () => {
  test.each([
    ["Tris\u200bbase", /invisible character \(zero-width space, U\+200B\)/],
    ["\ufeffHEPES", /zero-width no-break space/],
    ["MES\u00adsalt", /soft hyphen/],
    ["\u202eTris", /bidirectional control character \(U\+202E\)/],
    ["HEPES\u2066", /bidirectional control character \(U\+2066\)/],
    ["Tr\u0456s", /Cyrillic letter 'і' \(U\+0456\)/],
    ["\u0421itrate", /Cyrillic letter 'С' \(U\+0421\)/],
    ["Glycine \u039fH", /Greek letter 'Ο' \(U\+039F\)/],
  ])("%j is refused: %s", (name, why) => {
    expect(nameCharacterProblem(name)).toMatch(why);
  });

  test.each(["β-alanine", "α-ketoglutarate", "Na₂HPO₄·7H₂O", "Tris base", "трис", "N,N-bis(2-hydroxyethyl)glycine"])("%j is a name", (name) => {
    expect(nameCharacterProblem(name)).toBeNull();
  });

  test("the validator refuses such a name in a substance and in a system, at its path", () => {
    const doc = halvorsenLibrary();
    doc.substances![0].aliases = ["HBS-7", "Tr\u0456s"];
    doc.systems![0].name = "HB\u200bzwitterion";
    const v = validateLibraryDoc(doc, [BUILTIN_LIBRARY]);
    expect(v.ok ? [] : v.errors.map((e) => e.path)).toEqual(["systems[0].name", "substances[0].aliases[1]"]);
  });

  test("every built-in name passes", () => {
    expect(validateLibraryDoc(BUILTIN_LIBRARY).ok).toBe(true);
  });
});

describe("a key written twice in a file", () => {
  test("is found, with its line, at any depth", () => {
    expect(duplicateKey('{"a": 1, "b": {"c": 2, "c": 3}}')).toEqual({ key: "c", line: 1 });
    expect(duplicateKey('{\n "systems": [{"id": "x"}, {"id": "y"}],\n "name": "n",\n "name": "m"\n}')).toEqual({ key: "name", line: 4 });
    expect(duplicateKey('{"a\\"b": 1, "a\\u0022b": 2}')).toEqual({ key: 'a"b', line: 1 });
  });

  test("equal keys in different objects, equal values and strings holding braces are not duplicates", () => {
    expect(duplicateKey('[{"id": "a"}, {"id": "b"}]')).toBeNull();
    expect(duplicateKey('{"a": "x", "b": "x"}')).toBeNull();
    expect(duplicateKey('{"a": "{\\"a\\": 1, ", "b": ["a", "a"]}')).toBeNull();
  });

  test("refuses the import instead of reading the last value", () => {
    const text = JSON.stringify(halvorsenLibrary(), null, 2).replace('"value": 7.35,', '"value": 7.35, "value": 9.1,');
    expect(JSON.parse(text).systems[0].steps[0].pKa.value).toBe(9.1); // what "last one wins" would read
    const r = parseLibraryText(text, [BUILTIN_LIBRARY]);
    expect(r).toMatchObject({ ok: false, code: "not-json" });
    expect(!r.ok && r.message).toMatch(/the key 'value' is written twice in one object \(line 24\)/);
  });
});
