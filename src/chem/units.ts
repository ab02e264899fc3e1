/**
 * Unit text → the engine's units (mol/L, L, °C, mol).
 *
 * Numbers pass through unchanged (they are already in the engine's units). Text is a decimal number
 * followed by a unit: "25 mM", "0.1 M", "100 mmol/L", "0.1 mol L-1", "2.1 g/L", "2.1 mg/mL" (mass
 * concentrations need the molar mass), "500 mL", "1.5 L", "1 dm3", "37 degC" (also "37 °C"),
 * "310.15 K", "2 mmol", "1.5 g" (amount, needs the molar mass), "0.9 % w/v" (grams per 100 mL,
 * needs the molar mass).
 *
 * The parser is our own and knows only the units a solution recipe uses: amount (mol), mass (g),
 * volume (L, m³ and their SI prefixes), molar (M = 1 mol/L, common practice) and temperature (K, °C,
 * °F). A general unit library (mathjs) did this at first; it cost 230 kB of the 300 kB budget of the
 * functions bundle (README, Performance), and nothing else used it.
 *
 * Grammar: NUMBER UNIT, where UNIT is a product of factors SYMBOL[EXPONENT] joined by a space, "*",
 * "·" or ".", and a "/" divides by the factor that follows it ("mol/L", "mg/mL", "mol·L⁻¹",
 * "g L^-1"). Unit symbols are case-sensitive, as in SI: "mM" is millimolar, "mm" is not a unit here.
 */
import { fail, fmt } from "./failure";
import type { Result } from "./types";

export type QuantityDimension = "concentration" | "volume" | "temperature" | "amount";

export interface ParseOptions {
  /** g/mol, needed to convert a mass or mass concentration to moles. */
  molarMass?: number;
}

const EXAMPLES: Record<QuantityDimension, string> = {
  concentration: '"25 mM", "0.1 M", "100 mmol/L" or "2.1 g/L"',
  volume: '"500 mL" or "1.5 L"',
  temperature: '"37 degC" or "310.15 K"',
  amount: '"2 mmol" or "1.5 g"',
};

/** Exponents of amount (mol), mass (g) and volume (L) of a unit, and its factor to mol^a·g^b·L^c. */
interface Dims {
  readonly amount: number;
  readonly mass: number;
  readonly volume: number;
  readonly factor: number;
}

/** SI prefixes (BIPM, The International System of Units, 9th edition 2019, Table 7), as used here. */
const PREFIX: Readonly<Record<string, number>> = {
  k: 1e3,
  h: 1e2,
  da: 1e1,
  d: 1e-1,
  c: 1e-2,
  m: 1e-3,
  u: 1e-6,
  "\u00b5": 1e-6, // micro sign
  "\u03bc": 1e-6, // Greek small mu
  n: 1e-9,
  p: 1e-12,
  f: 1e-15,
};

/** Long prefixes for spelled-out litres ("millilitre"). */
const LONG_PREFIX: Readonly<Record<string, number>> = { "": 1, kilo: 1e3, deci: 1e-1, centi: 1e-2, milli: 1e-3, micro: 1e-6, nano: 1e-9 };

/** Base symbols that take SI prefixes, with their dimensions. */
const PREFIXABLE: Readonly<Record<string, Dims>> = {
  mol: { amount: 1, mass: 0, volume: 0, factor: 1 },
  g: { amount: 0, mass: 1, volume: 0, factor: 1 },
  L: { amount: 0, mass: 0, volume: 1, factor: 1 },
  l: { amount: 0, mass: 0, volume: 1, factor: 1 },
  M: { amount: 1, mass: 0, volume: -1, factor: 1 }, // molar: 1 mol/L (common practice; IUPAC Green Book 3rd ed. §2.10)
};

/** Lengths, only as cubes (m³, dm³, cm³, mm³): 1 m³ = 1000 L, so 1 m = 10 L^(1/3). */
const LENGTH_PREFIX: Readonly<Record<string, number>> = { "": 1, d: 1e-1, c: 1e-2, m: 1e-3 };

/** Temperature units and their conversion to °C (0 °C = 273.15 K; °F by its definition). Only as the whole unit. */
const TEMPERATURE: Readonly<Record<string, { toCelsius: (x: number) => number }>> = {
  K: { toCelsius: (x) => x - 273.15 },
  degC: { toCelsius: (x) => x },
  celsius: { toCelsius: (x) => x },
  degF: { toCelsius: (x) => ((x - 32) * 5) / 9 },
  fahrenheit: { toCelsius: (x) => ((x - 32) * 5) / 9 },
};

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  "\u207b": "-",
  "\u00b9": "1",
  "\u00b2": "2",
  "\u00b3": "3",
};

/** The dimensions of one symbol with its exponent, or null if the symbol is not a known unit. */
function symbolDims(symbol: string): Dims | null {
  const direct = PREFIXABLE[symbol];
  if (direct) return direct;
  for (const [p, f] of Object.entries(PREFIX)) {
    if (symbol.length > p.length && symbol.startsWith(p)) {
      const base = PREFIXABLE[symbol.slice(p.length)];
      if (base) return { ...base, factor: base.factor * f };
    }
  }
  const litre = /^(kilo|deci|centi|milli|micro|nano)?(?:liter|litre)s?$/.exec(symbol);
  if (litre) return { amount: 0, mass: 0, volume: 1, factor: LONG_PREFIX[litre[1] ?? ""] };
  if (symbol === "cc") return { amount: 0, mass: 0, volume: 1, factor: 1e-3 };
  return null;
}

/** A cubed length (m3, dm3, cm3, mm3) as a volume, or null. */
function cubedLength(symbol: string, exponent: number): Dims | null {
  if (!symbol.endsWith("m") || Math.abs(exponent) % 3 !== 0 || exponent === 0) return null;
  const p = LENGTH_PREFIX[symbol.slice(0, -1)];
  if (p === undefined) return null;
  const litresPerCube = 1000 * p * p * p;
  const cubes = exponent / 3;
  return { amount: 0, mass: 0, volume: cubes, factor: litresPerCube ** cubes };
}

type UnitRead = { ok: true; dims: Dims } | { ok: false; why: string };

const FACTOR = /^([A-Za-z\u00b5\u03bc]+)(?:\^?([+-]?\d+))?$/;

/** Reads a compound unit ("mmol/L", "mol L-1", "mg/mL") into its dimensions. */
function readUnit(unit: string): UnitRead {
  let text = unit;
  for (const [sup, plain] of Object.entries(SUPERSCRIPT)) text = text.split(sup).join(plain);
  // Split into factors, remembering which follow a "/".
  const pieces = text
    .replace(/\s*\/\s*/g, " / ")
    .split(/[\s*·.]+|(?=\/)|(?<=\/)/)
    .filter((p) => p !== "");
  let amount = 0;
  let mass = 0;
  let volume = 0;
  let factor = 1;
  let divide = false;
  let factors = 0;
  for (const piece of pieces) {
    if (piece === "/") {
      if (divide || factors === 0) return { ok: false, why: `misplaced "/" in "${unit}"` };
      divide = true;
      continue;
    }
    const m = FACTOR.exec(piece);
    if (!m) return { ok: false, why: `"${piece}" is not a unit` };
    const symbol = m[1];
    let exponent = m[2] === undefined ? 1 : Number(m[2]);
    if (divide) exponent = -exponent;
    divide = false;
    factors += 1;
    const named = symbolDims(symbol);
    const d = named ?? cubedLength(symbol, exponent);
    if (!d) {
      return {
        ok: false,
        why: Object.prototype.hasOwnProperty.call(TEMPERATURE, symbol)
          ? `a temperature unit ("${symbol}") cannot be part of a compound unit`
          : `unknown unit "${symbol}"${suggestion(symbol)}`,
      };
    }
    // A cubed length already carries its exponent; a named unit is raised to it.
    const e = named ? exponent : 1;
    amount += d.amount * e;
    mass += d.mass * e;
    volume += d.volume * e;
    factor *= d.factor ** e;
  }
  if (divide) return { ok: false, why: `"${unit}" ends with "/"` };
  if (factors === 0) return { ok: false, why: "no unit" };
  return { ok: true, dims: { amount, mass, volume, factor } };
}

/** A case hint for symbols that differ from a known one only in case ("mm" → "mM"). */
function suggestion(symbol: string): string {
  const lower = symbol.toLowerCase();
  for (const p of ["", ...Object.keys(PREFIX)]) {
    for (const b of Object.keys(PREFIXABLE)) {
      if ((p + b).toLowerCase() === lower && p + b !== symbol) return ` (unit symbols are case-sensitive: did you mean "${p + b}"?)`;
    }
  }
  return "";
}

const same = (d: Dims, amount: number, mass: number, volume: number): boolean =>
  d.amount === amount && d.mass === mass && d.volume === volume;

/** Converts a number with read dimensions to the engine unit of the requested dimension. */
function convert(x: number, d: Dims, unit: string, dim: QuantityDimension, text: string, molarMass: number | undefined): Result<{ value: number }> {
  const perMole = (what: string): Result<{ value: number }> => {
    if (molarMass === undefined) {
      return fail("bad-input", `"${text}" is a ${what}: give the molar mass of the substance to convert it to moles.`);
    }
    if (!(Number.isFinite(molarMass) && molarMass > 0)) {
      return fail("bad-input", `Molar mass must be a positive number of g/mol, got ${fmt(molarMass)}.`);
    }
    return { ok: true, value: (x * d.factor) / molarMass };
  };
  if (dim === "concentration") {
    if (same(d, 1, 0, -1)) return { ok: true, value: x * d.factor };
    if (same(d, 0, 1, -1)) return perMole("mass concentration");
  } else if (dim === "volume") {
    if (same(d, 0, 0, 1)) return { ok: true, value: x * d.factor };
  } else if (dim === "amount") {
    if (same(d, 1, 0, 0)) return { ok: true, value: x * d.factor };
    if (same(d, 0, 1, 0)) return perMole("mass");
  }
  return fail("bad-input", `"${text}" has unit ${unit}, which is not a ${dim}: use for example ${EXAMPLES[dim]}.`);
}

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const LEADING_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?/i;

/** Concentrations, volumes and amounts cannot be negative; temperatures in °C can. */
function nonNegative(value: number, dim: QuantityDimension, text: string): Result<{ value: number }> {
  if (dim !== "temperature" && value < 0) return fail("bad-input", `A ${dim} cannot be negative (${text}).`);
  return { ok: true, value };
}

/** "% w/v" (also "% m/v"): grams per 100 mL (common practice in formulation), i.e. g/dL. */
const PERCENT_WV = /^%\s*\(?\s*[wm]\s*\/\s*v\s*\)?$/i;
/** Other percentages: by mass or by volume (need a density), or with no basis at all. */
const PERCENT_OTHER = /^%(\s*\(?\s*([wm]\s*\/\s*[wm]|v\s*\/\s*v)\s*\)?)?$/i;

/** The unit text with degree spellings brought to one form: "°C", "º C", "deg C", "℃" → "degC". */
function normaliseDegrees(unit: string): string {
  return unit
    .replace(/^(°|º|deg\s*)\s*C$/, "degC")
    .replace(/^\u2103$/, "degC")
    .replace(/^(°|º|deg\s*)\s*F$/, "degF")
    .replace(/^\u2109$/, "degF");
}

/**
 * Parses a number or unit text into the engine's unit for the dimension: concentration → mol/L,
 * volume → L, temperature → °C, amount → mol. Numbers, and text without a unit, are taken as
 * already in that unit. Negative concentrations, volumes and amounts are rejected, and so are
 * temperatures below absolute zero. Failures ("bad-input") name the problem: unknown unit, wrong
 * dimension, mass without molar mass, not a number.
 */
export function parseQuantity(
  value: number | string,
  dimension: QuantityDimension,
  opts?: ParseOptions,
): Result<{ value: number }> {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) return fail("bad-input", `Expected a finite ${dimension}, got ${String(value)}.`);
    return nonNegative(value, dimension, String(value));
  }
  if (typeof value !== "string") return fail("bad-input", `Expected a number or unit text for the ${dimension}.`);
  const text = value.trim();
  if (text === "") return fail("bad-input", `Empty text where a ${dimension} was expected.`);
  // Decimal text only: Number() would also read "0x10", "0b11", "0o17" (16, 3, 15).
  if (DECIMAL.test(text)) {
    const plain = Number(text);
    if (!Number.isFinite(plain)) return fail("bad-input", `"${text}" is too large to be a ${dimension}.`);
    return nonNegative(plain, dimension, text);
  }
  const lead = LEADING_NUMBER.exec(text);
  const unit = normaliseDegrees((lead ? text.slice(lead[0].length) : text).trim());
  if (!lead) {
    const known = Object.prototype.hasOwnProperty.call(TEMPERATURE, unit) || readUnit(unit).ok;
    return known
      ? fail("bad-input", `"${text}" has no number; write for example ${EXAMPLES[dimension]}.`)
      : fail("bad-input", `Cannot read "${text}" as a ${dimension}: it does not start with a number; use for example ${EXAMPLES[dimension]}.`);
  }
  const x = Number(lead[0]);
  if (!Number.isFinite(x)) return fail("bad-input", `"${text}" is too large to be a ${dimension}.`);
  const rest = text.slice(lead[0].length);
  if (rest.startsWith(",")) {
    return fail("bad-input", `Cannot read "${text}" as a ${dimension}: write the number with a decimal point, for example ${EXAMPLES[dimension]}.`);
  }
  if (PERCENT_WV.test(unit)) {
    // 1 % w/v = 1 g per 100 mL = 10 g/L: a mass concentration, converted with the molar mass.
    const read: Dims = { amount: 0, mass: 1, volume: -1, factor: 10 };
    const r = convert(x, read, unit, dimension, text, opts?.molarMass);
    return r.ok ? nonNegative(r.value, dimension, text) : r;
  }
  if (PERCENT_OTHER.test(unit)) {
    return fail(
      "bad-input",
      `Cannot read "${text}" as a ${dimension}: only "% w/v" (grams per 100 mL) is understood; a percentage by mass or by volume needs a density, and "%" alone does not say which it is.`,
    );
  }
  if (!/^[\s\p{L}°º\u2103\u2109]/u.test(rest)) {
    return fail("bad-input", `Cannot read "${text}" as a ${dimension}: a number must be followed by a unit; use for example ${EXAMPLES[dimension]}.`);
  }

  if (Object.prototype.hasOwnProperty.call(TEMPERATURE, unit)) {
    if (dimension !== "temperature") {
      return fail("bad-input", `"${text}" has unit ${unit}, which is not a ${dimension}: use for example ${EXAMPLES[dimension]}.`);
    }
    const celsius = TEMPERATURE[unit].toCelsius(x);
    if (celsius < -273.15) return fail("bad-input", `"${text}" is below absolute zero.`);
    return { ok: true, value: celsius };
  }
  const read = readUnit(unit);
  if (!read.ok) {
    return fail("bad-input", `Cannot read "${text}" as a ${dimension} (${read.why}); use for example ${EXAMPLES[dimension]}.`);
  }
  const r = convert(x, read.dims, unit, dimension, text, opts?.molarMass);
  if (!r.ok) return r;
  if (!Number.isFinite(r.value)) return fail("bad-input", `"${text}" does not give a finite ${dimension}.`);
  return nonNegative(r.value, dimension, text);
}
