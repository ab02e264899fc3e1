/**
 * Properties of the unit parser over many generated inputs: every SI-prefixed unit scales by its
 * power of ten (BIPM, SI Brochure, 9th edition 2019, Table 7); the ways of writing a quotient agree;
 * and any text at all gives a typed result (a finite value, or "bad-input" with a message), never an
 * exception.
 */
import fc from "fast-check";
import { parseQuantity, type QuantityDimension } from "../../src/chem";
import { expectRel } from "./fixtures";

const RT = 1e-12; // factors of ten and one division: exact up to rounding
const RUNS = 400;

const PREFIXES: ReadonlyArray<[string, number]> = [
  ["", 0],
  ["k", 3],
  ["d", -1],
  ["c", -2],
  ["m", -3],
  ["u", -6],
  ["µ", -6],
  ["μ", -6],
  ["n", -9],
  ["p", -12],
];

/** A value as a user types it: up to 6 significant digits, 1e-6 to 1e4. */
const typed = fc
  .tuple(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: -11, max: -2 }))
  .map(([m, e]) => Number((m * 10 ** e).toPrecision(6)));

describe("unit parser properties", () => {
  test("x <prefix>M, x <prefix>mol/L and x <prefix>L scale by the prefix's power of ten", () => {
    fc.assert(
      fc.property(typed, fc.constantFrom(...PREFIXES), (x, [p, power]) => {
        const scale = 10 ** power;
        for (const [unit, dim] of [
          [`${p}M`, "concentration"],
          [`${p}mol/L`, "concentration"],
          [`${p}L`, "volume"],
          [`${p}mol`, "amount"],
        ] as const) {
          const r = parseQuantity(`${x} ${unit}`, dim);
          if (!r.ok) throw new Error(`${x} ${unit}: ${r.message}`);
          expectRel(r.value, x * scale, RT, `${x} ${unit}`);
        }
      }),
      { numRuns: RUNS },
    );
  });

  test("a quotient written with /, a negative exponent or a superscript gives the same value", () => {
    fc.assert(
      fc.property(typed, fc.constantFrom("mol", "mmol", "umol"), fc.constantFrom("L", "mL", "dm3"), (x, top, bottom) => {
        const base = bottom === "dm3" ? "dm" : bottom;
        const power = bottom === "dm3" ? 3 : 1;
        const forms = [`${x} ${top}/${bottom}`, `${x} ${top} ${base}-${power}`, `${x} ${top}·${base}⁻${power === 3 ? "³" : "¹"}`, `${x} ${top} ${base}^-${power}`];
        const values = forms.map((f) => {
          const r = parseQuantity(f, "concentration");
          if (!r.ok) throw new Error(`${f}: ${r.message}`);
          return r.value;
        });
        for (const v of values) expectRel(v, values[0], RT, forms.join(" | "));
      }),
      { numRuns: RUNS },
    );
  });

  test("a mass concentration over its molar mass: x g/L = x mg/mL = x/10 % w/v", () => {
    fc.assert(
      fc.property(typed, fc.double({ min: 1, max: 2000, noNaN: true }), (x, molarMass) => {
        const gPerL = parseQuantity(`${x} g/L`, "concentration", { molarMass });
        const mgPerML = parseQuantity(`${x} mg/mL`, "concentration", { molarMass });
        const percent = parseQuantity(`${x / 10} % w/v`, "concentration", { molarMass });
        if (!gPerL.ok || !mgPerML.ok || !percent.ok) throw new Error(`${x} with ${molarMass} g/mol did not parse`);
        expectRel(gPerL.value, x / molarMass, RT, "g/L");
        expectRel(mgPerML.value, gPerL.value, RT, "mg/mL");
        expectRel(percent.value, gPerL.value, 1e-9, "% w/v"); // x/10 printed back to text
      }),
      { numRuns: RUNS },
    );
  });

  test("any text gives a finite value or a bad-input with a message, never an exception", () => {
    const alphabet = [..."0123456789.eE+-/*·^%() mMuµnLlgoKC°dcFwvk⁻¹³℃,"];
    const text = fc.array(fc.constantFrom(...alphabet), { maxLength: 16 }).map((a) => a.join(""));
    const anyText = fc.oneof(text, fc.string({ maxLength: 16 }), typed.chain((x) => text.map((t) => `${x}${t}`)));
    const dims: QuantityDimension[] = ["concentration", "volume", "temperature", "amount"];
    fc.assert(
      fc.property(anyText, fc.constantFrom(...dims), fc.constantFrom(undefined, 58.44), (t, dim, molarMass) => {
        const r = parseQuantity(t, dim, { molarMass });
        if (r.ok) {
          expect(Number.isFinite(r.value)).toBe(true);
          if (dim === "temperature") expect(r.value).toBeGreaterThanOrEqual(-273.15);
          else expect(r.value).toBeGreaterThanOrEqual(0);
        } else {
          expect(r.code).toBe("bad-input");
          expect(r.message.length).toBeGreaterThan(10);
        }
      }),
      { numRuns: 3000 },
    );
  });
});
