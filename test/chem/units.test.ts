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
    // Other ways a recipe writes units: SI prefixes and 1 L = 1 dm³ = 1000 cm³ (BIPM, SI Brochure,
    // 9th edition 2019, Tables 7 and 8); 0 °C = 273.15 K; °F = 9/5 °C + 32 (definition).
    { text: "0.1 mol L-1", dim: "concentration", expected: 0.1 },
    { text: "0.1 mol·L⁻¹", dim: "concentration", expected: 0.1 },
    { text: "0.1 mol L^-1", dim: "concentration", expected: 0.1 },
    { text: "0.1 mol/dm3", dim: "concentration", expected: 0.1 },
    { text: "0.1 mol dm-3", dim: "concentration", expected: 0.1 },
    { text: "25 mmol / L", dim: "concentration", expected: 0.025 },
    { text: "250 nM", dim: "concentration", expected: 2.5e-7 },
    { text: "25mM", dim: "concentration", expected: 0.025 },
    { text: "+25 mM", dim: "concentration", expected: 0.025 },
    { text: "2.5e1 mM", dim: "concentration", expected: 0.025 },
    { text: "5 μM", dim: "concentration", expected: 5e-6 },
    { text: "250 cm3", dim: "volume", expected: 0.25 },
    { text: "250 cm³", dim: "volume", expected: 0.25 },
    { text: "2 dm3", dim: "volume", expected: 2 },
    { text: "0.8 m3", dim: "volume", expected: 800 },
    { text: "250 ml", dim: "volume", expected: 0.25 },
    { text: "50 uL", dim: "volume", expected: 5e-5 },
    { text: "2 litres", dim: "volume", expected: 2 },
    { text: "500 millilitres", dim: "volume", expected: 0.5 },
    { text: "5 dL", dim: "volume", expected: 0.5 },
    { text: "98.6 degF", dim: "temperature", expected: 37 },
    { text: "37°C", dim: "temperature", expected: 37 },
    { text: "37 deg C", dim: "temperature", expected: 37 },
    { text: "37 ℃", dim: "temperature", expected: 37 },
    { text: "-4 °C", dim: "temperature", expected: -4 },
    { text: "750 umol", dim: "amount", expected: 7.5e-4 },
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
    { text: "500 ug/mL", dim: "concentration", molarMass: 50, expected: 0.01 },
    { text: "0.5 g/dm3", dim: "concentration", molarMass: 50, expected: 0.01 },
    { text: "1.2 kg", dim: "amount", molarMass: 120, expected: 10 },
    { text: "24 mg", dim: "amount", molarMass: 120, expected: 2e-4 },
    // 1 % w/v = 1 g per 100 mL = 10 g/L (common practice in formulation).
    { text: "0.9 % w/v", dim: "concentration", molarMass: 60, expected: 0.15 },
    { text: "0.9% (w/v)", dim: "concentration", molarMass: 60, expected: 0.15 },
    { text: "1.2 %m/v", dim: "concentration", molarMass: 60, expected: 0.2 },
    ] as const)("$text with molar mass $molarMass g/mol → $expected", ({ text, dim, molarMass, expected }) => {
    const r = parseQuantity(text, dim, { molarMass });
    if (!r.ok) throw new Error(`${text}: ${r.message}`);
    expectRel(r.value, expected, RT, `parseQuantity("${text}", "${dim}", {molarMass: ${molarMass}})`);
  });

  test("every SI prefix on M, mol/L and L scales by its power of ten", () => {
    const prefixes: Array<[string, number]> = [["k", 3], ["d", -1], ["c", -2], ["m", -3], ["u", -6], ["µ", -6], ["n", -9], ["p", -12]];
    for (const [p, power] of prefixes) {
      const conc = parseQuantity(`3 ${p}M`, "concentration");
      const perL = parseQuantity(`3 ${p}mol/L`, "concentration");
      const vol = parseQuantity(`3 ${p}L`, "volume");
      for (const r of [conc, perL, vol]) {
        if (!r.ok) throw new Error(`${p}: ${r.message}`);
        expectRel(r.value, 3 * 10 ** power, RT, `prefix ${p}`);
      }
    }
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
    { text: "25 mm", dim: "concentration", says: /case-sensitive.*"mM"/ },
    { text: "25 MM", dim: "concentration", says: /unknown unit "MM".*"mM"/ },
    { text: "1,5 mM", dim: "concentration", says: /decimal point/ },
    { text: "25 mmol/kg", dim: "concentration", says: /molality.*density/ },
    { text: "37 C", dim: "temperature", says: /"°C" or "degC"/ },
    { text: "25 mol/", dim: "concentration", says: /ends with "\/"/ },
    { text: "25 /L", dim: "concentration", says: /misplaced "\/"/ },
    { text: "25 mol//L", dim: "concentration", says: /misplaced/ },
    { text: "-300 degC", dim: "temperature", says: /absolute zero/ },
    { text: "37 degC", dim: "concentration", says: /not a concentration/ },
    { text: "37 degC/L", dim: "concentration", says: /temperature unit/ },
    { text: "1e999 mM", dim: "concentration", says: /too large/ },
    { text: "25 % mM", dim: "concentration", says: /followed by a unit|not a unit/ },
    { text: "abc", dim: "concentration", says: /does not start with a number/ },
    { text: "0.9 %", dim: "concentration", says: /"%" alone/ },
    { text: "5 % w/w", dim: "concentration", says: /needs a density/ },
    { text: "5 % v/v", dim: "concentration", says: /needs a density/ },
    { text: "0.9 % w/v", dim: "concentration", says: /molar mass/ },
    { text: "0.9 % w/v", dim: "volume", says: /not a volume/ },
    { text: "K", dim: "temperature", says: /no number/ },
    // Units mathjs knows that a recipe does not use, and prefixes above kilo (a mistyped case).
    { text: "5 gal", dim: "volume", says: /"gal" is not one of the units read here \(mol, g, L/ },
    { text: "5 Mmol", dim: "amount", says: /"Mmol" is not one of the units read here.*did you mean "mmol"/ },
    { text: "5 ML", dim: "volume", says: /did you mean "mL"/ },
    { text: "2 osmol/L", dim: "concentration", says: /osmol\/L, which is not a concentration/ },
    { text: "5 µfoo", dim: "concentration", says: /unknown unit "µfoo"/ },
    { text: "-2 mmol", dim: "amount", says: /An amount cannot be negative/ },
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
