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
import { leadingDecimal, parseDecimal } from "./number-text";
import { readUnit, TEMPERATURE, type Dims } from "./unit-symbols";
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
    if (same(d, 1, -1, 0)) {
      return fail("bad-input", `"${text}" is a molality (per kilogram of solvent): the functions take mol/L of solution; convert with the solution's density.`);
    }
  } else if (dim === "volume") {
    if (same(d, 0, 0, 1)) return { ok: true, value: x * d.factor };
  } else if (dim === "amount") {
    if (same(d, 1, 0, 0)) return { ok: true, value: x * d.factor };
    if (same(d, 0, 1, 0)) return perMole("mass");
  }
  return fail("bad-input", `"${text}" has unit ${unit}, which is not a ${dim}: use for example ${EXAMPLES[dim]}.`);
}

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
  // Decimal text only (number-text.ts): Number() would also read "0x10", "0b11", "0o17".
  const plain = parseDecimal(text);
  if (plain !== null) {
    if (!Number.isFinite(plain)) return fail("bad-input", `"${text}" is too large to be a ${dimension}.`);
    return nonNegative(plain, dimension, text);
  }
  const lead = leadingDecimal(text);
  const unit = normaliseDegrees((lead ? lead.rest : text).trim());
  if (!lead) {
    const known = Object.prototype.hasOwnProperty.call(TEMPERATURE, unit) || readUnit(unit).ok;
    return known
      ? fail("bad-input", `"${text}" has no number; write for example ${EXAMPLES[dimension]}.`)
      : fail("bad-input", `Cannot read "${text}" as a ${dimension}: it does not start with a number; use for example ${EXAMPLES[dimension]}.`);
  }
  const x = lead.value;
  if (!Number.isFinite(x)) return fail("bad-input", `"${text}" is too large to be a ${dimension}.`);
  const rest = lead.rest;
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
