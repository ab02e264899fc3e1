/**
 * Unit text → the engine's units (mol/L, L, °C, mol), converted by mathjs units.
 *
 * Numbers pass through unchanged (they are already in the engine's units). Text is a decimal number
 * followed by a unit: "25 mM", "0.1 M", "100 mmol/L", "0.1 mol L-1", "2.1 g/L", "2.1 mg/mL" (mass
 * concentrations need the molar mass), "500 mL", "1.5 L", "1 dm3", "37 degC" (also "37 °C"),
 * "310.15 K", "2 mmol", "1.5 g" (amount, needs the molar mass), "0.9 % w/v" (grams per 100 mL,
 * needs the molar mass).
 *
 * The units themselves (symbols, SI prefixes, dimensions, factors, temperature offsets, and the
 * trade's M, osmol and % w/v) are defined once on mathjs's Unit class in unit-system.ts. This file
 * reads the number, brings the spellings of degrees and percentages to one form, and says what is
 * refused and why: a molality (needs the solution's density), a bare "%" or "% w/w" (need a
 * density or a basis), "37 C" (coulombs to mathjs), a mistyped case ("25 mm"), a decimal comma.
 * Unit symbols are case-sensitive, as in SI: "mM" is millimolar, "mm" is a length.
 */
import { fail, fmt } from "./failure";
import { leadingDecimal, parseDecimal } from "./number-text";
import { caseHint, convertTo, readUnit, unitSystem } from "./unit-system";
import type { Result } from "./types";
import type { Unit } from "mathjs";

export type QuantityDimension = "concentration" | "volume" | "temperature" | "amount";

export interface ParseOptions {
  /** g/mol, needed to convert a mass or mass concentration to moles. */
  molarMass?: number;
}

/** "a concentration", "an amount". */
const a = (dim: QuantityDimension): string => (dim === "amount" ? "an amount" : `a ${dim}`);
const cap = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);

const EXAMPLES: Record<QuantityDimension, string> = {
  concentration: '"25 mM", "0.1 M", "100 mmol/L" or "2.1 g/L"',
  volume: '"500 mL" or "1.5 L"',
  temperature: '"37 degC" or "310.15 K"',
  amount: '"2 mmol" or "1.5 g"',
};


/** Converts x in a unit read by mathjs to the engine unit of the requested dimension. */
function convert(x: number, u: Unit, unit: string, dim: QuantityDimension, text: string, molarMass: number | undefined): Result<{ value: number }> {
  const REF = unitSystem().ref;
  const perMole = (what: string, ref: Unit): Result<{ value: number }> => {
    if (molarMass === undefined) {
      return fail("bad-input", `"${text}" is a ${what}: give the molar mass of the substance to convert it to moles.`);
    }
    if (!(Number.isFinite(molarMass) && molarMass > 0)) {
      return fail("bad-input", `Molar mass must be a positive number of g/mol, got ${fmt(molarMass)}.`);
    }
    return { ok: true, value: convertTo(x, u, ref) / molarMass };
  };
  if (dim === "concentration") {
    if (u.equalBase(REF.molar)) return { ok: true, value: convertTo(x, u, REF.molar) };
    if (u.equalBase(REF.massConcentration)) return perMole("mass concentration", REF.massConcentration);
    if (u.equalBase(REF.molality)) {
      return fail("bad-input", `"${text}" is a molality (per kilogram of solvent): the functions take mol/L of solution; convert with the solution's density.`);
    }
  } else if (dim === "volume") {
    if (u.equalBase(REF.volume)) return { ok: true, value: convertTo(x, u, REF.volume) };
  } else if (dim === "temperature") {
    if (u.equalBase(REF.temperature)) return { ok: true, value: convertTo(x, u, REF.temperature) };
  } else if (dim === "amount") {
    if (u.equalBase(REF.amount)) return { ok: true, value: convertTo(x, u, REF.amount) };
    if (u.equalBase(REF.mass)) return perMole("mass", REF.mass);
  }
  const hints = unitSymbols(unit).map(caseHint).find((h) => h !== "") ?? "";
  return fail("bad-input", `"${text}" has unit ${unit}, which is not ${a(dim)}${hints}: use for example ${EXAMPLES[dim]}.`);
}

/** The letter runs of unit text, for case hints ("25 mm" → "mM"). */
const unitSymbols = (unit: string): string[] => unit.split(/[^A-Za-z\u00b5\u03bc]+/).filter((w) => w !== "");

/** Concentrations, volumes and amounts cannot be negative; temperatures in °C can. */
function nonNegative(value: number, dim: QuantityDimension, text: string): Result<{ value: number }> {
  if (dim !== "temperature" && value < 0) return fail("bad-input", `${cap(a(dim))} cannot be negative (${text}).`);
  return { ok: true, value };
}

/** "% w/v" (also "% m/v"): grams per 100 mL, the unit `percentwv` defined in unit-system.ts. */
const PERCENT_WV = /^%\s*\(?\s*[wm]\s*\/\s*v\s*\)?$/i;
const PERCENT_WV_UNIT = "percentwv";
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
  if (text === "") return fail("bad-input", `Empty text where ${a(dimension)} was expected.`);
  // Decimal text only (number-text.ts): Number() would also read "0x10", "0b11", "0o17".
  const plain = parseDecimal(text);
  if (plain !== null) {
    if (!Number.isFinite(plain)) return fail("bad-input", `"${text}" is too large to be ${a(dimension)}.`);
    return nonNegative(plain, dimension, text);
  }
  const lead = leadingDecimal(text);
  const unit = normaliseDegrees((lead ? lead.rest : text).trim());
  if (!lead) {
    const known = readUnit(unit).ok;
    return known
      ? fail("bad-input", `"${text}" has no number; write for example ${EXAMPLES[dimension]}.`)
      : fail("bad-input", `Cannot read "${text}" as ${a(dimension)}: it does not start with a number; use for example ${EXAMPLES[dimension]}.`);
  }
  const x = lead.value;
  if (!Number.isFinite(x)) return fail("bad-input", `"${text}" is too large to be ${a(dimension)}.`);
  const rest = lead.rest;
  if (rest.startsWith(",")) {
    return fail("bad-input", `Cannot read "${text}" as ${a(dimension)}: write the number with a decimal point, for example ${EXAMPLES[dimension]}.`);
  }
  if (PERCENT_OTHER.test(unit)) {
    return fail(
      "bad-input",
      `Cannot read "${text}" as ${a(dimension)}: only "% w/v" (grams per 100 mL) is understood; a percentage by mass or by volume needs a density, and "%" alone does not say which it is.`,
    );
  }
  if (!PERCENT_WV.test(unit) && !/^[\s\p{L}°º\u2103\u2109]/u.test(rest)) {
    return fail("bad-input", `Cannot read "${text}" as ${a(dimension)}: a number must be followed by a unit; use for example ${EXAMPLES[dimension]}.`);
  }
  const read = readUnit(PERCENT_WV.test(unit) ? PERCENT_WV_UNIT : unit);
  if (!read.ok) {
    return fail("bad-input", `Cannot read "${text}" as ${a(dimension)} (${read.why}); use for example ${EXAMPLES[dimension]}.`);
  }
  const r = convert(x, read.unit, unit, dimension, text, opts?.molarMass);
  if (!r.ok) return r;
  if (!Number.isFinite(r.value)) return fail("bad-input", `"${text}" does not give a finite ${dimension}.`);
  if (dimension === "temperature" && r.value < -273.15) return fail("bad-input", `"${text}" is below absolute zero.`);
  return nonNegative(r.value, dimension, text);
}

/** The unit a volume was written in, for giving volumes back in it. */
export interface WrittenVolumeUnit {
  /** The unit's symbol for labels: "L", "mL", "µL", or the text written for other volume units ("dm3"). */
  symbol: string;
  /** Litres per one of this unit (mL: 0.001). */
  litres: number;
}

const LITRE: WrittenVolumeUnit = { symbol: "L", litres: 1 };

/**
 * The rule for volumes given back (AQ.ADJUST's litres of stock, AQ.RECIPE's stock column, AQ.CURVE's
 * volumes): they are in the unit the batch volume was written in — "800 mL" gives mL, "1.5 L" gives
 * L; a plain number (litres) or text that is not a volume gives L. Only the unit is read here; the
 * value itself is parsed (and refused if bad) by parseQuantity.
 */
export function writtenVolumeUnit(value: unknown): WrittenVolumeUnit {
  if (typeof value !== "string") return LITRE;
  const lead = leadingDecimal(value.trim());
  if (!lead) return LITRE;
  const unit = lead.rest.trim();
  const read = readUnit(unit);
  const REF = unitSystem().ref;
  if (!read.ok || read.temperature || !read.unit.equalBase(REF.volume)) return LITRE;
  const litres = convertTo(1, read.unit, REF.volume);
  if (!(Number.isFinite(litres) && litres > 0)) return LITRE;
  const f = (read.unit.units as unknown as { unit: { name: string }; prefix: { name: string }; power: number }[])[0];
  const isLitre = read.unit.units.length === 1 && f.power === 1 && ["L", "l", "litre", "liter", "litres", "liters"].includes(f.unit.name);
  const symbol = isLitre ? `${f.prefix.name === "u" ? "µ" : f.prefix.name}L` : unit;
  return { symbol, litres };
}

/** "±", "+/-" or "+-" between a value and its tolerance. */
const PLUS_MINUS = /^(.*?)\s*(?:±|\+\s*\/\s*-|\+-)\s*(.*)$/;

/**
 * A temperature written with a tolerance, "5 ± 3 °C" (also "5 °C ± 3 °C", "5 +/- 3 degC", "278.15 ±
 * 3 K"): the range [centre − tolerance, centre + tolerance] in °C. The unit is written once at the end
 * or on both numbers; the tolerance is a temperature difference in that unit (3 K = 3 °C, 9 °F = 5 °C).
 * Text without "±" is not a tolerance (null): read it with parseQuantity.
 */
export function parseTemperatureTolerance(value: string): Result<{ centre: number; tolerance: number; range: [number, number] }> | null {
  const m = PLUS_MINUS.exec(value.trim());
  if (!m) return null;
  const text = value.trim();
  const a = leadingDecimal(m[1].trim());
  const b = leadingDecimal(m[2].trim());
  if (!a || !b || a.rest.trim().startsWith(",") || b.rest.trim().startsWith(",")) {
    return fail("bad-input", `Cannot read "${text}" as a temperature with a tolerance: write for example "5 ± 3 °C".`);
  }
  const unitA = normaliseDegrees(a.rest.trim());
  const unitB = normaliseDegrees(b.rest.trim());
  if (unitA !== "" && unitB !== "" && unitA !== unitB) {
    return fail("bad-input", `"${text}" gives the temperature and its tolerance in different units: write both in one, for example "5 ± 3 °C".`);
  }
  if (!(b.value >= 0)) return fail("bad-input", `The tolerance in "${text}" must be a number ≥ 0.`);
  const unit = unitB || unitA;
  const at = (x: number) => parseQuantity(unit === "" ? x : `${x} ${unit}`, "temperature");
  const centre = at(a.value);
  if (!centre.ok) return centre;
  const upper = at(a.value + b.value);
  if (!upper.ok) return upper;
  const tolerance = upper.value - centre.value;
  return { ok: true, centre: centre.value, tolerance, range: [centre.value - tolerance, centre.value + tolerance] };
}
