/**
 * The arithmetic mathjs's Unit class is made with here: numbers only.
 *
 * mathjs's factories take their dependencies injected. Its own typed scalar functions (addScalar,
 * multiplyScalar…) accept numbers, BigNumbers, fractions and complex numbers, and would bring those
 * three number libraries and the typed-function dispatcher into the add-in (about 185 kB of the
 * functions bundle, README Performance (d)). Unit text here only ever carries numbers, so the Unit
 * class (unit-system.ts) is given these plain functions instead, with mathjs's own rules for numbers:
 *
 * - `pow` is mathjs's number power (its plain/number powNumber: a base of magnitude below one to the
 *   power ∞ is 0, above one to the power −∞ is 0);
 * - `equal` is mathjs's equality of numbers with its default tolerances (relTol 1e-12, absTol 1e-15);
 * - mathjs writes the degree Fahrenheit (and Rankine) as the fraction 5/9 of a kelvin, and converts
 *   between °F and °C with that fraction and the scales' offsets (459.67, 273.15) in exact
 *   arithmetic. `Ratio` keeps that: an exact ratio of integers standing in for mathjs's Fraction, so
 *   98.6 °F is 37 °C exactly, as with mathjs's full build. A number enters a ratio by its decimal
 *   text (459.67 = 45967/100); mathjs's Fraction reads those offsets to the same ratios.
 *
 * `format` is only reached by Unit.toString, which nothing here calls; BigNumber and complex values
 * are never made (the configuration says numbers).
 */

const gcd = (a: bigint, b: bigint): bigint => {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
};

/** The decimal text of a number: sign, digits, optional fraction digits, optional exponent. */
const DECIMAL = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/;

/** An exact ratio n/d of integers (d > 0, in lowest terms): mathjs's Fraction, for its Unit class. */
export class Ratio {
  readonly n: bigint;
  readonly d: bigint;
  constructor(n: number | bigint, d: number | bigint = 1n) {
    let nn = BigInt(n);
    let dd = BigInt(d);
    if (dd === 0n) throw new RangeError("a ratio with denominator 0");
    if (dd < 0n) [nn, dd] = [-nn, -dd];
    const g = gcd(nn, dd) || 1n;
    this.n = nn / g;
    this.d = dd / g;
  }

  /** A number as an exact ratio, read from its decimal text (459.67 → 45967/100). */
  static of(x: number | Ratio): Ratio {
    if (x instanceof Ratio) return x;
    const m = DECIMAL.exec(String(x));
    if (!m) throw new RangeError(`${x} is not a finite number`);
    const [, sign, whole, fraction = "", exponent = "0"] = m;
    const shift = Number(exponent) - fraction.length;
    const digits = BigInt(sign + whole + fraction);
    return shift >= 0 ? new Ratio(digits * 10n ** BigInt(shift)) : new Ratio(digits, 10n ** BigInt(-shift));
  }

  toNumber(): number {
    return Number(this.n) / Number(this.d);
  }
}
/** mathjs tells a fraction by this flag on its prototype (and converts it with `number`). */
(Ratio.prototype as unknown as { isFraction: boolean }).isFraction = true;

type Value = number | Ratio;
const num = (x: Value): number => (x instanceof Ratio ? x.toNumber() : x);
/** Exact when either side is a ratio (as mathjs's typed functions turn the number into a fraction). */
function exactOr(a: Value, b: Value, exact: (x: Ratio, y: Ratio) => Ratio, plain: (x: number, y: number) => number): Value {
  if (a instanceof Ratio || b instanceof Ratio) return exact(Ratio.of(a), Ratio.of(b));
  return plain(a, b);
}

/** Dependencies for mathjs's `createUnitClass`: numbers only. */
export const NUMBER_ONLY_UNIT_DEPENDENCIES = {
  config: { number: "number", predictable: false, relTol: 1e-12, absTol: 1e-15 },
  addScalar: (a: Value, b: Value) => exactOr(a, b, (x, y) => new Ratio(x.n * y.d + y.n * x.d, x.d * y.d), (x, y) => x + y),
  subtractScalar: (a: Value, b: Value) => exactOr(a, b, (x, y) => new Ratio(x.n * y.d - y.n * x.d, x.d * y.d), (x, y) => x - y),
  multiplyScalar: (a: Value, b: Value) => exactOr(a, b, (x, y) => new Ratio(x.n * y.n, x.d * y.d), (x, y) => x * y),
  divideScalar: (a: Value, b: Value) => exactOr(a, b, (x, y) => new Ratio(x.n * y.d, x.d * y.n), (x, y) => x / y),
  pow: (a: Value, b: Value) => {
    const [x, y] = [num(a), num(b)];
    return (x * x < 1 && y === Infinity) || (x * x > 1 && y === -Infinity) ? 0 : Math.pow(x, y);
  },
  abs: (x: Value) => Math.abs(num(x)),
  fix: (x: Value) => Math.trunc(num(x)),
  round: (x: Value) => Math.sign(num(x)) * Math.round(Math.abs(num(x))), // halves away from zero, as mathjs
  equal: (a: Value, b: Value) => {
    const [x, y] = [num(a), num(b)];
    return x === y || Math.abs(x - y) <= Math.max(1e-12 * Math.max(Math.abs(x), Math.abs(y)), 1e-15);
  },
  isNumeric: (x: unknown) => typeof x === "number" || x instanceof Ratio,
  format: (x: unknown) => String(x instanceof Ratio ? x.toNumber() : x),
  number: (x: Value) => num(x),
  Fraction: Ratio,
  Complex: { I: NaN }, // only the value of "VAR" (reactive power), a unit never read here
  BigNumber: () => {
    throw new Error("BigNumber is not used by the unit reading here (numbers only)");
  },
};
