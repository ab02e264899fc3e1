/**
 * mathjs's Unit class made with plain number arithmetic (src/chem/unit-numbers.ts) converts exactly
 * as mathjs's own build does, whose typed functions also handle BigNumbers, fractions and complex
 * numbers (the comparison loads that full build here, in the test only; the add-in does not carry
 * it). The Fahrenheit scale is kept exact: mathjs converts it with the fraction 5/9 and the offsets
 * 459.67 and 273.15 in exact arithmetic.
 */
import fc from "fast-check";
import { all, create } from "mathjs";
import { parseQuantity } from "../../src/chem";
import { Ratio } from "../../src/chem/unit-numbers";
import { unitSystem } from "../../src/chem/unit-system";

const full = create(all, { number: "number" });

describe("a ratio read from a number's decimal text", () => {
  test.each([
    [459.67, 45967n, 100n],
    [273.15, 5463n, 20n],
    [0.001, 1n, 1000n],
    [-0.5, -1n, 2n],
    [2.5e21, 2500000000000000000000n, 1n],
    [1.5e-7, 3n, 20000000n],
    [12, 12n, 1n],
  ])("%p is %p / %p in lowest terms", (x, n, d) => {
    const r = Ratio.of(x);
    expect([r.n, r.d]).toEqual([n, d]);
    expect(r.toNumber()).toBe(x);
  });

  test("is refused for a number without decimal text", () => {
    expect(() => Ratio.of(Number.NaN)).toThrow(/not a finite number/);
    expect(() => Ratio.of(Number.POSITIVE_INFINITY)).toThrow(/not a finite number/);
  });
});

describe("conversions equal mathjs's full build", () => {
  const UNITS: ReadonlyArray<[string, string]> = [
    ["mmol/L", "mol/L"],
    ["umol/L", "mol/L"],
    ["mol/m^3", "mol/L"],
    ["mg/mL", "g/L"],
    ["ug/L", "g/L"],
    ["mL", "L"],
    ["uL", "L"],
    ["cm^3", "L"],
    ["dm^3", "L"],
    ["mmol", "mol"],
    ["kg", "g"],
    ["mol/kg", "mol/kg"],
    ["degC", "degC"],
    ["degF", "degC"],
    ["fahrenheit", "degC"],
    ["K", "degC"],
    ["kelvin", "degC"],
    ["degC", "K"],
    ["degF", "K"],
    ["degC", "degF"],
  ];
  /** A value as a user types it: up to 6 significant digits, -1e3 to 1e4. */
  const typed = fc
    .tuple(fc.integer({ min: -999_999, max: 999_999 }), fc.integer({ min: -8, max: -2 }))
    .map(([m, e]) => Number((m * 10 ** e).toPrecision(6)));

  test.each(UNITS)("%s to %s, to the last bit", (from, to) => {
    const { Unit } = unitSystem();
    fc.assert(
      fc.property(typed, (x) => {
        expect(new Unit(x, from).toNumber(to as never)).toBe(full.unit(x, from).toNumber(to));
      }),
      { numRuns: 300 },
    );
  });
});

describe("the Fahrenheit scale (t/°C = (t/°F − 32) × 5/9, the scale's definition: common practice)", () => {
  test.each([
    ["32 °F", 0],
    ["212 °F", 100],
    ["98.6 °F", 37],
    ["-40 °F", -40],
    ["77 degF", 25],
  ])("%s is %p °C exactly", (text, celsius) => {
    expect(parseQuantity(text, "temperature")).toEqual({ ok: true, value: celsius });
  });
});
