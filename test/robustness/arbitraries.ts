/**
 * fast-check generators of spreadsheet arguments, plausible and hostile: ranges of every shape
 * (0×0, ragged, mismatched), text in number cells, NaN-like text, booleans, null/undefined, amounts
 * from 1e-12 to far beyond 10 mol/L, temperatures out of range and as unit text, unknown and
 * near-miss names, HTML/script names, very long strings, duplicated substances.
 *
 * Campaign size: PROTOLYTE_FUZZ_RUNS multiplies every run count (default 1), PROTOLYTE_FUZZ_SEED
 * replaces the fixed seed. A longer campaign: `PROTOLYTE_FUZZ_RUNS=50 npx jest test/robustness`.
 */
import fc from "fast-check";
import { getActiveLibrary } from "../../src/library";
import type { SubstanceRecord } from "../../src/library/types";

export const SEED = process.env.PROTOLYTE_FUZZ_SEED ? Number(process.env.PROTOLYTE_FUZZ_SEED) : 20250314;
const FACTOR = process.env.PROTOLYTE_FUZZ_RUNS ? Math.max(0.01, Number(process.env.PROTOLYTE_FUZZ_RUNS)) : 1;

/** Runs for a suite: the default times PROTOLYTE_FUZZ_RUNS. */
export function runs(base: number): number {
  return Math.max(1, Math.round(base * FACTOR));
}

const lib = getActiveLibrary();
const substances = lib.list("substance").map((e) => e.record as SubstanceRecord);

/** Every lookup name of the built-in substances (names, ids, aliases, formulas). */
export const KNOWN_NAMES: string[] = [
  ...new Set(substances.flatMap((s) => [s.name, s.id, ...(s.aliases ?? []), ...(s.formula && s.formulaAlias !== false ? [s.formula] : [])])),
];
/** Acid–base system names and ids. */
export const SYSTEM_NAMES: string[] = lib.list("system").flatMap((e) => [e.id, (e.record as { name: string }).name]);
/** Substances that are buffers, strong acids and bases, salts, non-electrolytes: the common cases. */
export const COMMON = ["acetic acid", "sodium acetate", "NaH2PO4", "Na2HPO4", "KH2PO4", "Tris", "Tris HCl", "citric acid", "NaCl", "KCl", "HCl", "NaOH", "sucrose", "ammonia", "glycine", "histidine", "MES", "HEPES", "borax", "sodium bicarbonate"].filter(
  (n) => lib.resolve(n).ok,
);

export const NAN_LIKE = ["NaN", "nan", "Infinity", "-Infinity", "inf", "1e999", "-1e999", "-0", "0x10", "0b11", "0o17", "1,5", "1.5.2", "  ", "", "\t", "e5", "1e", "--1", "+-1", "1_000", "١٢", "½", "1/2", "Ⅻ"];
export const UNIT_TEXT = ["25 mM", "0.1 M", "100 mmol/L", "2.1 g/L", "5 mg/mL", "1e-12 M", "10 M", "19.9 M", "25 M", "1e300 M", "500 mL", "1 L", "37 degC", "37 °C", "310.15 K", "400 K", "-5 degC", "2 mmol", "1.5 g", "5 kg/L", "0.1 m", "1 cup", "5 M M", "1 M^2", "sqrt(4) M", "2 + 3", "1 (mol/L)"];
export const HOSTILE_NAMES = [
  "<script>alert(1)</script>",
  "<img src=x onerror=alert(1)>",
  '"><svg/onload=alert(1)>',
  "javascript:alert(1)",
  "${process.exit(1)}",
  "{{constructor.constructor('return 1')()}}",
  "__proto__",
  "constructor",
  "prototype",
  "toString",
  "hasOwnProperty",
  "valueOf",
  "=cmd|' /C calc'!A0",
  "NaCl\u0000",
  "Na\u202eCl",
  "\ud800",
  "😀",
  "Ｎａｃｌ",
  "NaCl\nHCl",
  "' OR 1=1 --",
  "../../etc/passwd",
];

/** Near misses of known names: a dropped, doubled or swapped character, case and space changes. */
const nearMiss: fc.Arbitrary<string> = fc
  .tuple(fc.constantFrom(...KNOWN_NAMES), fc.nat(), fc.constantFrom("drop", "double", "swap", "upper", "space", "suffix"))
  .map(([name, k, how]) => {
    const i = name.length === 0 ? 0 : k % name.length;
    switch (how) {
      case "drop":
        return name.slice(0, i) + name.slice(i + 1);
      case "double":
        return name.slice(0, i) + name[i] + name.slice(i);
      case "swap":
        return i + 1 < name.length ? name.slice(0, i) + name[i + 1] + name[i] + name.slice(i + 2) : name;
      case "upper":
        return name.toUpperCase();
      case "space":
        return `  ${name.split("").join(i % 2 ? " " : "")}  `;
      default:
        return `${name} solution`;
    }
  });

const longString = fc.constantFrom(200, 5000, 32_767, 200_000).chain((n) => fc.constantFrom("x", "Na", "<b>", "é", " ").map((s) => s.repeat(Math.ceil(n / s.length)).slice(0, n)));

/** A substance-name cell. */
export const nameCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(...COMMON) },
  { weight: 4, arbitrary: fc.constantFrom(...KNOWN_NAMES) },
  { weight: 2, arbitrary: nearMiss },
  { weight: 2, arbitrary: fc.constantFrom(...HOSTILE_NAMES) },
  { weight: 1, arbitrary: fc.string({ maxLength: 30 }) },
  { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 20 }) },
  { weight: 1, arbitrary: longString },
  { weight: 1, arbitrary: fc.constantFrom("", "  ", null, undefined, true, false, 0, 1, -1, NaN, Infinity) },
  { weight: 1, arbitrary: fc.constantFrom(...SYSTEM_NAMES) },
);

/** A number an amount cell might hold, from 1e-12 to far beyond 10 mol/L. */
const amountNumber: fc.Arbitrary<number> = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: 1e-12, max: 10, noNaN: true }).map((x) => (x < 1e-3 ? x : Number(x.toPrecision(4)))) },
  { weight: 3, arbitrary: fc.integer({ min: -12, max: 1 }).map((e) => 10 ** e) },
  { weight: 1, arbitrary: fc.constantFrom(0, -0, -1e-9, -1, 19.999, 20, 20.001, 25, 1e6, 1e300, Number.MAX_VALUE, Number.MIN_VALUE, 5e-324, NaN, Infinity, -Infinity) },
  { weight: 1, arbitrary: fc.double() },
);

/** An amount cell: a number, unit text, NaN-like text, or anything else a cell can hold. */
export const amountCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 8, arbitrary: amountNumber },
  { weight: 2, arbitrary: fc.constantFrom(...UNIT_TEXT) },
  { weight: 2, arbitrary: fc.constantFrom(...NAN_LIKE) },
  { weight: 1, arbitrary: amountNumber.map((x) => String(x)) },
  { weight: 1, arbitrary: fc.constantFrom(null, undefined, true, false, "", "  ") },
  { weight: 1, arbitrary: fc.string({ maxLength: 12 }) },
);

/** A temperature cell: mostly 0–100 °C, also out of range and as unit text. */
export const temperatureCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: 0, max: 100, noNaN: true }) },
  { weight: 2, arbitrary: fc.constantFrom(null, undefined, "", 0, 100, 25, -0, -1e-9, 100.0000001, -5, 150, -273.15, 1e300, NaN, Infinity) },
  { weight: 2, arbitrary: fc.constantFrom("400 K", "-5 degC", "37 degC", "298.15 K", "37 °C", "25", "0x19", "NaN", "1e999", "hot", "37 M", true) },
  { weight: 1, arbitrary: fc.double() },
);

export const activityCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(null, undefined, "", "davies", "ideal", "debye-huckel", "Debye-Hückel", "NONE") },
  { weight: 1, arbitrary: fc.constantFrom("bromley", "<b>davies</b>", "davies ", 0, 1, true, NaN, "__proto__", "constructor", "toString") },
  { weight: 1, arbitrary: fc.string({ maxLength: 20 }) },
);

export const speciesCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(null, undefined, "") },
  { weight: 4, arbitrary: fc.constantFrom("H+", "OH-", "HPO4^2-", "H2PO4-", "CH3COO-", "CH3COOH", "TrisH+", "Na+", "sodium", "HPO₄²⁻", "hpo4 2-", "h+") },
  { weight: 1, arbitrary: fc.constantFrom(...HOSTILE_NAMES) },
  { weight: 1, arbitrary: fc.oneof(fc.string({ maxLength: 20 }), longString, fc.constantFrom(0, 1, true, NaN)) },
);

export const stepCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(null, undefined, 1, 2, 3, "1", "2") },
  { weight: 2, arbitrary: fc.constantFrom(0, -1, 4, 1.5, 1e300, NaN, Infinity, "0x2", "two", "", true, "1e0", " 2 ") },
  { weight: 1, arbitrary: fc.oneof(fc.integer(), fc.double()) },
);

/** A plain number argument (pH target, delta, tolerance, count): plausible and hostile. */
export const numberCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: -2, max: 16, noNaN: true }) },
  { weight: 2, arbitrary: fc.constantFrom(null, undefined, "", 0, -0, 1, 7, 0.5, -0.5, 1e-12, 1e300, -1e300, NaN, Infinity, -Infinity) },
  { weight: 2, arbitrary: fc.constantFrom(...NAN_LIKE, "7", "7.0", "pH 7", true, false) },
  { weight: 1, arbitrary: fc.double() },
);

/** A volume argument: litres or unit text. */
export const volumeCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: 1e-6, max: 1e4, noNaN: true }) },
  { weight: 2, arbitrary: fc.constantFrom("500 mL", "1 L", "800 L", "1 m^3", "5 M", "5 kg", null, "", 0, -1, 1e300, NaN, Infinity, "1e999", true) },
  { weight: 1, arbitrary: fc.double() },
);

/** Anything at all, for parameters without a specific generator. */
export const anyCell: fc.Arbitrary<unknown> = fc.oneof(amountCell, nameCell, numberCell, fc.constantFrom([], [[]], [[1, 2], [3]], {}, [["a"]]));

/** A rectangular range (rows × cols) of cells from `cell`. */
function grid(rows: number, cols: number, cell: fc.Arbitrary<unknown>): fc.Arbitrary<unknown[][]> {
  return fc.array(fc.array(cell, { minLength: cols, maxLength: cols }), { minLength: rows, maxLength: rows });
}

/**
 * names and amounts, as Excel passes them: usually matching shapes (column, row or block), sometimes
 * 0×0, ragged, mismatched, scalar, or a mixture with duplicated substances or thousands of rows.
 */
export const mixtureArgs: fc.Arbitrary<[unknown, unknown]> = fc.oneof(
  {
    weight: 12,
    arbitrary: fc
      .tuple(fc.integer({ min: 1, max: 5 }), fc.integer({ min: 1, max: 2 }), fc.boolean())
      .chain(([n, w, column]) => {
        const [r, c] = w === 1 ? (column ? [n, 1] : [1, n]) : [Math.ceil(n / 2), 2];
        return fc.tuple(grid(r, c, nameCell), grid(r, c, amountCell));
      }),
  },
  {
    // Plausible mixtures only (known names, sensible amounts): these reach the solver.
    weight: 8,
    arbitrary: fc.integer({ min: 1, max: 6 }).chain((n) =>
      fc.tuple(grid(n, 1, fc.constantFrom(...COMMON)), grid(n, 1, amountNumber.filter((x) => x >= 0 && x <= 10))),
    ),
  },
  {
    weight: 2,
    arbitrary: fc.tuple(
      fc.oneof(fc.constant([]), fc.constant([[]]), grid(2, 1, nameCell), fc.constant([["NaCl"], ["HCl", "NaOH"]]), nameCell),
      fc.oneof(fc.constant([]), fc.constant([[]]), grid(1, 2, amountCell), fc.constant([[0.1], [0.1, 0.2]]), amountCell),
    ),
  },
  {
    // Duplicates: the same substance many times.
    weight: 1,
    arbitrary: fc
      .tuple(fc.constantFrom(...COMMON), fc.integer({ min: 2, max: 50 }), amountNumber)
      .map(([name, n, x]): [unknown, unknown] => [Array.from({ length: n }, () => [name]), Array.from({ length: n }, () => [x])]),
  },
);

/** Thousands of components (a what-if table, a whole column): few runs, each heavy. */
export const largeMixtureArgs: fc.Arbitrary<[unknown, unknown]> = fc
  .tuple(fc.integer({ min: 1000, max: 5000 }), fc.subarray(COMMON, { minLength: 1 }), fc.double({ min: 1e-9, max: 1e-3, noNaN: true }), fc.nat(4))
  .map(([n, names, x, blankEvery]) => {
    const blank = (i: number) => blankEvery > 0 && i % (blankEvery + 1) === 0;
    return [Array.from({ length: n }, (_, i) => [blank(i) ? "" : names[i % names.length]]), Array.from({ length: n }, (_, i) => [blank(i) ? "" : x])];
  });

/** Mostly `plausible`, sometimes `hostile`: the workflow functions need sensible inputs to reach their solvers. */
const mostly = (plausible: fc.Arbitrary<unknown>, hostile: fc.Arbitrary<unknown>): fc.Arbitrary<unknown> =>
  fc.oneof({ weight: 7, arbitrary: plausible }, { weight: 3, arbitrary: hostile });

const known = (names: string[]): string[] => names.filter((n) => lib.resolve(n).ok);
const TITRANTS = known(["NaOH", "HCl", "KOH", "sodium hydroxide", "hydrochloric acid", "acetic acid", "Tris"]);
const round = (digits: number) => (x: number) => Number(x.toPrecision(digits));

/** Acid and base forms of one system, as AQ.RECIPE takes them, and some mismatched or hostile pairs. */
const RECIPE_PAIRS: [string, string][] = (
  [
    ["NaH2PO4", "Na2HPO4"],
    ["KH2PO4", "Na2HPO4"],
    ["acetic acid", "sodium acetate"],
    ["Tris HCl", "Tris"],
    ["Tris", "HCl"],
    ["MES", "NaOH"],
    ["HEPES", "NaOH"],
    ["citric acid", "NaOH"],
    ["histidine", "HCl"],
    ["glycine", "NaOH"],
    ["NaH2PO4", "sodium acetate"],
    ["NaCl", "NaOH"],
  ] as [string, string][]
).filter(([a, b]) => lib.resolve(a).ok && lib.resolve(b).ok);
export const plausibleRecipePairArgs: fc.Arbitrary<[unknown, unknown]> = fc.constantFrom(...RECIPE_PAIRS);
export const recipePairArgs: fc.Arbitrary<[unknown, unknown]> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...RECIPE_PAIRS) },
  { weight: 1, arbitrary: fc.tuple(nameCell, nameCell) },
);

/** Only sensible values for a parameter (null where omitting it is the sensible choice). */
export function plausibleFor(param: string): fc.Arbitrary<unknown> {
  switch (param) {
    case "temperature":
      return fc.oneof(fc.constant(null), fc.integer({ min: 0, max: 100 }), fc.constantFrom("37 degC", "298.15 K"));
    case "activity":
      return fc.constantFrom(null, "davies", "ideal", "debye-huckel");
    case "species":
      return fc.constantFrom(null, "H+", "OH-", "HPO4^2-", "CH3COO-");
    case "substance":
      return fc.oneof(fc.constantFrom(...COMMON), fc.constantFrom(...SYSTEM_NAMES));
    case "titrant":
      return fc.constantFrom(...TITRANTS);
    case "salt":
      return fc.constant(null); // the default salt (NaCl); a salt without ionic_strength is an input error
    case "step":
      return fc.constantFrom(null, 1, 2, 3);
    case "points":
      return fc.oneof(fc.constant(null), fc.integer({ min: 2, max: 120 }));
    case "ionic_strength":
      return fc.oneof(fc.constant(null), fc.double({ min: 0.15, max: 0.5, noNaN: true }).map(round(3)));
    case "titrant_conc":
    case "total_conc":
      return fc.oneof(fc.double({ min: 1e-3, max: 1, noNaN: true }).map(round(3)), fc.constantFrom("25 mM", "1 M"));
    case "volume":
    case "max_titrant_volume":
      return fc.oneof(fc.double({ min: 1e-3, max: 100, noNaN: true }).map(round(3)), fc.constantFrom("500 mL", "800 L"));
    case "target_pH":
      return fc.double({ min: 2, max: 12, noNaN: true }).map(round(4));
    case "delta_pH":
      return fc.double({ min: -1, max: 1, noNaN: true }).map(round(3));
    case "amount_tolerance":
      return fc.double({ min: 0, max: 0.05, noNaN: true }).map(round(3));
    case "pKa_uncertainty":
      return fc.oneof(fc.constant(null), fc.double({ min: 0, max: 0.1, noNaN: true }).map(round(3)));
    default:
      return cellFor(param);
  }
}

/** Plausible mixtures only (known names, sensible amounts): these reach the solver. */
export const plausibleMixtureArgs: fc.Arbitrary<[unknown, unknown]> = fc
  .integer({ min: 1, max: 5 })
  .chain((n) => fc.tuple(grid(n, 1, fc.constantFrom(...COMMON)), grid(n, 1, fc.double({ min: 1e-6, max: 0.5, noNaN: true }).map(round(3)))));

/** The generator for one parameter of an AQ function, by its name in the catalogue. */
export function cellFor(param: string): fc.Arbitrary<unknown> {
  switch (param) {
    case "temperature":
      return temperatureCell;
    case "activity":
      return activityCell;
    case "species":
      return speciesCell;
    case "substance":
    case "acid_form":
    case "base_form":
      return nameCell;
    case "titrant":
      return mostly(fc.constantFrom(...TITRANTS), nameCell);
    case "salt":
      return mostly(fc.constantFrom("NaCl", "KCl", null), nameCell);
    case "step":
      return stepCell;
    case "points":
      return mostly(fc.integer({ min: 2, max: 200 }), fc.oneof(stepCell, fc.constantFrom(1, 1000, 1001, 1e9, "51", 2.5)));
    case "ionic_strength":
      return mostly(fc.double({ min: 0, max: 1, noNaN: true }).map(round(3)), amountCell);
    case "titrant_conc":
    case "total_conc":
      return mostly(fc.double({ min: 1e-3, max: 2, noNaN: true }).map(round(3)), amountCell);
    case "volume":
    case "max_titrant_volume":
      return volumeCell;
    case "target_pH":
      return mostly(fc.double({ min: 1, max: 13, noNaN: true }).map(round(4)), numberCell);
    case "delta_pH":
      return mostly(fc.double({ min: -3, max: 3, noNaN: true }).map(round(3)), numberCell);
    case "amount_tolerance":
      return mostly(
        fc.double({ min: 0, max: 0.1, noNaN: true }).map(round(3)),
        fc.oneof(numberCell, fc.integer({ min: 1, max: 3 }).chain((n) => grid(n, 1, fc.oneof(numberCell, fc.constant(0.02))))),
      );
    case "pKa_uncertainty":
      return mostly(fc.double({ min: 0, max: 0.2, noNaN: true }).map(round(3)), numberCell);
    default:
      return anyCell;
  }
}

/**
 * Arguments for one catalogue entry: names/amounts together (and acid/base forms together), every
 * other parameter from its generator. "hostile" draws anything a cell can hold, "plausible" sensible
 * values everywhere, so the solvers behind every function are reached too. With `blankOptionals`, a
 * hostile optional argument is sometimes omitted (null or undefined, as Excel passes it).
 */
export function argsFor(
  params: readonly { name: string; optional: boolean }[],
  mode: "hostile" | "plausible",
  opts: { blankOptionals?: boolean } = {},
): fc.Arbitrary<unknown[]> {
  const parts: fc.Arbitrary<unknown[]>[] = [];
  const hostile = mode === "hostile";
  for (let i = 0; i < params.length; i++) {
    const p = params[i];
    const next = params[i + 1]?.name;
    if (p.name === "names" && next === "amounts") {
      parts.push(hostile ? mixtureArgs : plausibleMixtureArgs);
      i++;
    } else if (p.name === "acid_form" && next === "base_form") {
      parts.push(hostile ? recipePairArgs : plausibleRecipePairArgs);
      i++;
    } else if (!hostile) {
      parts.push(plausibleFor(p.name).map((v) => [v]));
    } else {
      const cell = cellFor(p.name);
      const blankable = opts.blankOptionals && p.optional;
      parts.push((blankable ? fc.oneof({ weight: 3, arbitrary: cell }, { weight: 1, arbitrary: fc.constantFrom(null, undefined) }) : cell).map((v) => [v]));
    }
  }
  return fc.tuple(...parts).map((chunks) => chunks.flat());
}
