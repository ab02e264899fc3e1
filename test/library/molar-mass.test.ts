/**
 * Molar masses computed from formulas with the CIAAW atomic weights of the built-in library, against
 * published spot checks (printed to 0.01 g/mol, so the tolerance is 0.01 g/mol).
 */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { molarMassOf, parseFormula } from "../../src/library/formula";
import { createLibrary } from "../../src/library/layers";

const library = createLibrary({ builtin: BUILTIN_LIBRARY });
const mass = (name: string): number => {
  const r = library.resolve(name);
  if (!r.ok) throw new Error(r.message);
  return r.component.molarMass as number;
};
const TOL = 0.01;

describe("spot checks (g/mol)", () => {
  test.each([
    ["Na2HPO4·7H2O", 268.07],
    ["L-histidine monohydrochloride monohydrate", 209.63],
    ["KHP", 204.22],
    ["citric acid monohydrate", 210.14],
    ["trisodium citrate dihydrate", 294.1],
  ])("%s = %d", (name, expected) => {
    expect(Math.abs(mass(name) - expected)).toBeLessThanOrEqual(TOL);
  });

  test("0.1 M citric acid monohydrate is 21.01 g/L, 0.1 M trisodium citrate dihydrate 29.41 g/L", () => {
    expect(Math.abs(0.1 * mass("C6H8O7·H2O") - 21.01)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(0.1 * mass("trisodium citrate dihydrate") - 29.41)).toBeLessThanOrEqual(0.005);
  });

  test("hydrate water adds 18.015 g/mol per H2O", () => {
    const water = 2 * 1.008 + 15.999;
    expect(mass("Na2HPO4·12H2O") - mass("Na2HPO4")).toBeCloseTo(12 * water, 9);
    expect(mass("borax") - mass("sodium tetraborate")).toBeCloseTo(10 * water, 9);
  });
});

describe("formula parser", () => {
  const counts = (f: string) => {
    const r = parseFormula(f);
    if (!r.ok) throw new Error(r.message);
    return Object.fromEntries([...r.counts].sort());
  };
  test("groups, adducts and hydrate water", () => {
    expect(counts("(NH4)2SO4")).toEqual({ H: 8, N: 2, O: 4, S: 1 });
    expect(counts("C6H9N3O2·HCl·H2O")).toEqual({ C: 6, Cl: 1, H: 12, N: 3, O: 3 });
    expect(counts("Na2B4O7.10H2O")).toEqual({ B: 4, H: 20, Na: 2, O: 17 });
    expect(counts("CaCl2*2H2O")).toEqual({ Ca: 1, Cl: 2, H: 4, O: 2 });
  });
  test.each(["", "na2", "Na2(", "Na)2", "H2O··", "Na0Cl", "2", "NaCl!"])("rejects %p", (f) => {
    expect(parseFormula(f).ok).toBe(false);
  });
  test("an element without an atomic weight is an error, not a zero", () => {
    const r = molarMassOf("XeF2", new Map([["F", 18.998]]));
    expect(r).toEqual({ ok: false, code: "unknown-element", message: expect.stringContaining("'Xe'") });
  });
});
