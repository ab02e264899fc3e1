/**
 * The fingerprint of the constants in effect: same data → same id whatever the order; any change
 * of a value that can change a result → another id. SHA-256 is checked against FIPS 180-4 examples
 * and Node's own implementation.
 */
import { createHash } from "node:crypto";
import fc from "fast-check";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { canonicalJson } from "../../src/library/canonical-json";
import { createLibrary } from "../../src/library/layers";
import { sha256Hex } from "../../src/library/sha256";
import type { LibraryDoc } from "../../src/library/types";
import { builtinCopy, halvorsenLibrary } from "./helpers";

const fp = (builtin: LibraryDoc, workbook?: LibraryDoc): string => createLibrary({ builtin, workbook }).fingerprint();
const BASE = fp(BUILTIN_LIBRARY);

describe("sha256Hex", () => {
  test("FIPS 180-4 examples", () => {
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
    expect(sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq")).toBe(
      "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
    );
  });
  test("agrees with node:crypto on arbitrary Unicode text, across block boundaries", () => {
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", maxLength: 300 }), (s) => sha256Hex(s) === createHash("sha256").update(s, "utf8").digest("hex")),
      { numRuns: 300 },
    );
    for (const n of [55, 56, 63, 64, 65, 119, 120]) expect(sha256Hex("x".repeat(n))).toBe(createHash("sha256").update("x".repeat(n)).digest("hex"));
  });
});

describe("canonicalJson", () => {
  test("key order does not matter, array order does", () => {
    expect(canonicalJson({ b: 1, a: [2, { d: 3, c: 4 }] })).toBe('{"a":[2,{"c":4,"d":3}],"b":1}');
    expect(canonicalJson([1, 2])).not.toBe(canonicalJson([2, 1]));
    expect(canonicalJson({ a: undefined, b: null })).toBe('{"b":null}');
    expect(() => canonicalJson({ x: NaN })).toThrow(/non-finite/);
  });
});

describe("fingerprint", () => {
  test("form: PL-<built-in version>-<10 hex>", () => {
    expect(BASE).toMatch(/^PL-1\.3\.4-[0-9a-f]{10}$/);
  });

  test("pinned for built-in 1.3.4: changing built-in constants means bumping BUILTIN_VERSION and this pin", () => {
    expect(BASE).toBe("PL-1.3.4-e1061bf0ea");
  });

  test("identical data gives the identical id, whatever the order of keys and entries", () => {
    const shuffled = builtinCopy();
    shuffled.systems!.reverse();
    shuffled.substances!.reverse();
    shuffled.ions!.reverse();
    shuffled.substances = shuffled.substances!.map((s) => Object.fromEntries(Object.entries(s).reverse()) as typeof s);
    shuffled.atomicWeights = Object.fromEntries(Object.entries(shuffled.atomicWeights!).reverse());
    expect(fp(shuffled)).toBe(BASE);
    expect(fp(builtinCopy())).toBe(BASE);
  });

  test("citations, notes and locators do not enter it", () => {
    const doc = builtinCopy();
    doc.systems![0].steps[0].pKa.note = "reworded note";
    doc.systems![0].steps[0].pKa.locator = "Table 9";
    doc.sources!.goldberg2002.title = "Another title";
    expect(fp(doc)).toBe(BASE);
  });

  type Mutation = [string, (d: LibraryDoc) => void];
  const mutations: Mutation[] = [
    ["a pKa by 0.001", (d) => (d.systems![2].steps[1].pKa.value += 0.001)],
    ["a ΔrH°", (d) => (d.systems![5].steps[0].dH!.value += 0.01)],
    ["a ΔrCp°", (d) => (d.systems![0].steps[0].dCp!.value -= 1)],
    ["a charge of a fully protonated form", (d) => (d.systems![1].topCharge += 1)],
    ["an atomic weight (every molar mass with that element)", (d) => (d.atomicWeights!.K.value += 0.0001)],
    ["a stoichiometry", (d) => (d.substances![4].ions![0].stoich = 3)],
    ["an alias", (d) => d.substances![10].aliases!.push("HB phosphate salt")],
    ["a formula (hydrate water)", (d) => (d.substances![7].formula = "Na2HPO4·8H2O")],
    ["an ion's charge", (d) => (d.ions![3].charge = 3)],
  ];
  test.each(mutations)("changing %s changes it", (_what, mutate) => {
    const doc = builtinCopy();
    mutate(doc);
    expect(fp(doc)).not.toBe(BASE);
  });

  test("any change to any pKa, ΔrH° or ΔrCp° value changes it (property)", () => {
    const refs: [number, number, "pKa" | "dH" | "dCp"][] = [];
    BUILTIN_LIBRARY.systems!.forEach((s, i) =>
      s.steps.forEach((step, j) => (["pKa", "dH", "dCp"] as const).forEach((k) => step[k] && refs.push([i, j, k]))),
    );
    fc.assert(
      fc.property(fc.constantFrom(...refs), fc.double({ min: -1, max: 1, noNaN: true }).filter((d) => Math.abs(d) > 1e-9), ([i, j, k], delta) => {
        const doc = builtinCopy();
        const rec = doc.systems![i].steps[j][k]!;
        const before = rec.value;
        rec.value += delta;
        return rec.value === before || fp(doc) !== BASE;
      }),
      { numRuns: 60 },
    );
  });

  test("a workbook layer that overrides a value changes it; adding and removing the layer restores it", () => {
    const withLayer = fp(BUILTIN_LIBRARY, halvorsenLibrary());
    expect(withLayer).not.toBe(BASE);
    expect(fp(BUILTIN_LIBRARY, halvorsenLibrary())).toBe(withLayer);
    expect(createLibrary({ builtin: BUILTIN_LIBRARY, workbook: null }).fingerprint()).toBe(BASE);
  });
});
