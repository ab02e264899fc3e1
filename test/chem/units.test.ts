/**
 * parseQuantity: unit text → mol/L, L, °C, mol. Expected values follow from the unit definitions
 * (SI prefixes; molar M = 1 mol/L, common practice; 0 °C = 273.15 K), so the tolerance is
 * floating-point only.
 */
import { parseQuantity } from "../../src/chem";
import { expectRel } from "./fixtures";

const RT = 1e-12; // relative: unit conversion by factors of 10 and a division, exact up to rounding

describe("parseQuantity converts to the engine's units", () => {
  test.each([
    { text: "25 mM", dim: "concentration", expected: 0.025 },
    { text: "0.1 M", dim: "concentration", expected: 0.1 },
    { text: "100 mmol/L", dim: "concentration", expected: 0.1 },
    { text: "5 uM", dim: "concentration", expected: 5e-6 },
    { text: "5 µM", dim: "concentration", expected: 5e-6 },
    { text: "500 mL", dim: "volume", expected: 0.5 },
    { text: "1.5 L", dim: "volume", expected: 1.5 },
    { text: "37 degC", dim: "temperature", expected: 37 },
    { text: "37 °C", dim: "temperature", expected: 37 },
    { text: "310.15 K", dim: "temperature", expected: 37 },
    { text: "2 mmol", dim: "amount", expected: 0.002 },
    { text: "0.25", dim: "concentration", expected: 0.25 },
  ] as const)("$text as $dim → $expected", ({ text, dim, expected }) => {
    const r = parseQuantity(text, dim);
    if (!r.ok) throw new Error(`${text}: ${r.message}`);
    expectRel(r.value, expected, RT, `parseQuantity("${text}", "${dim}")`);
  });

  test.each([
    // 2.1 g/L of a substance of 210 g/mol is 0.01 mol/L; the same in mg/mL.
    { text: "2.1 g/L", dim: "concentration", molarMass: 210, expected: 0.01 },
    { text: "2.1 mg/mL", dim: "concentration", molarMass: 210, expected: 0.01 },
    { text: "1.5 g", dim: "amount", molarMass: 150, expected: 0.01 },
  ] as const)("$text with molar mass $molarMass g/mol → $expected", ({ text, dim, molarMass, expected }) => {
    const r = parseQuantity(text, dim, { molarMass });
    if (!r.ok) throw new Error(`${text}: ${r.message}`);
    expectRel(r.value, expected, RT, `parseQuantity("${text}", "${dim}", {molarMass: ${molarMass}})`);
  });

  test("numbers pass through unchanged", () => {
    expect(parseQuantity(0.037, "concentration")).toEqual({ ok: true, value: 0.037 });
    expect(parseQuantity(-4, "temperature")).toEqual({ ok: true, value: -4 });
  });
});

describe("parseQuantity explains what is wrong", () => {
  test.each([
    { text: "5 foo", dim: "concentration", says: /foo/ },
    { text: "5 mL", dim: "concentration", says: /not a concentration/ },
    { text: "25 mM", dim: "volume", says: /not a volume/ },
    { text: "2.1 g/L", dim: "concentration", says: /molar mass/ },
    { text: "1 g", dim: "amount", says: /molar mass/ },
    { text: "mM", dim: "concentration", says: /no number/ },
    { text: "-5 mM", dim: "concentration", says: /negative/ },
    { text: "", dim: "volume", says: /Empty/ },
  ] as const)("$text as $dim", ({ text, dim, says }) => {
    const r = parseQuantity(text, dim);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.code).toBe("bad-input");
      expect(r.message).toMatch(says);
    }
  });

  test("a non-positive molar mass is rejected", () => {
    const r = parseQuantity("2 g/L", "concentration", { molarMass: 0 });
    expect(r).toMatchObject({ ok: false, code: "bad-input" });
  });

  test("NaN and Infinity are rejected", () => {
    expect(parseQuantity(NaN, "volume")).toMatchObject({ ok: false, code: "bad-input" });
    expect(parseQuantity(Infinity, "concentration")).toMatchObject({ ok: false, code: "bad-input" });
  });
});
