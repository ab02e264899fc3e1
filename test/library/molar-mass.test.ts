/**
 * Molar masses computed from formulas with the CIAAW atomic weights of the built-in library, against
 * published spot checks (test/reference/molar-masses.json, each with its tolerance and reason).
 */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { MAX_MOLAR_MASS, molarMassOf, parseFormula } from "../../src/library/formula";
import schema from "../../src/library/schema/library.schema.json";
import { createLibrary } from "../../src/library/layers";
import { casesOf } from "../reference";

const library = createLibrary({ builtin: BUILTIN_LIBRARY });
const mass = (name: string): number => {
  const r = library.resolve(name);
  if (!r.ok) throw new Error(r.message);
  return r.component.molarMass as number;
};
const TOL = 0.01;

describe("spot checks (test/reference/molar-masses.json; docs/references.md, section 4)", () => {
  test.each(casesOf("molar-masses"))("$id: $label = $printed", (c) => {
    const value = mass(c.substance!) * (c.factor ?? 1);
    if (!(Math.abs(value - c.expected) <= c.tolerance.value)) throw new Error(`${c.id}: ${value} vs ${c.expected} ± ${c.tolerance.value} (${c.tolerance.reason})`);
    expect(Math.abs(value - c.expected)).toBeLessThanOrEqual(c.tolerance.value);
  });

  // 10 × the per-litre spot values of the same file, rounded to 0.01 g/mol as a label prints them
  test.each([
    ["citric acid monohydrate", 210.14],
    ["trisodium citrate dihydrate", 294.1],
  ])("%s = %d", (name, expected) => {
    expect(Math.abs(mass(name) - expected)).toBeLessThanOrEqual(TOL);
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

describe("a formula's molar mass has the same cap as a typed one (issue 14, item 6)", () => {
  const weights = new Map([["C", 12.011], ["H", 1.008], ["O", 15.999]]);
  test("the cap is the JSON Schema's maximum for a typed molarMass", () => {
    expect(schema.$defs.molarMass.properties.value.maximum).toBe(MAX_MOLAR_MASS);
  });
  test("just below the cap is a molar mass, just above it is refused with the value and the cap", () => {
    // 83 000 × 12.011 = 996 913 g/mol; 84 000 × 12.011 = 1 008 924 g/mol
    expect(molarMassOf("C83000", weights)).toEqual({ ok: true, value: 83000 * 12.011 });
    const r = molarMassOf("C84000", weights);
    expect(r).toEqual({ ok: false, code: "too-large", message: expect.stringContaining("gives a molar mass of 1.0089e+6 g/mol, above the 1,000,000 g/mol") });
  });
  test("H999999999999999999999O (1.008e21 g/mol) and counts beyond any number are refused", () => {
    expect(molarMassOf("H999999999999999999999O", weights)).toMatchObject({ ok: false, code: "too-large", message: expect.stringContaining("1.0080e+21 g/mol") });
    expect(molarMassOf(`H${"9".repeat(400)}`, weights)).toMatchObject({ ok: false, code: "too-large", message: expect.stringContaining("more than any number") });
  });
});
