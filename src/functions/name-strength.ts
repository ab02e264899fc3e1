/**
 * A strength typed beside a substance name — a stock concentration ("HCl 1 M", "1 M HCl",
 * "NaOH (0.5 mol/L)") or a mass fraction ("HCl 37 % w/w", "37 % HCl", "0.9 % w/v") — as patterns.
 * One home for them: aq/stock-name.ts reads the strength (titrants, RECIPE's forms), and
 * substances.ts says what a name with one is where a strength is not read.
 */
import { UNSIGNED_DECIMAL_SOURCE } from "../chem";

/**
 * A number as the name's concentration starts ("1", "0.5", ".5", "1e-3"; number-text.ts), with a
 * decimal comma or a second point taken in too ("0,5 M", "1..2 M"), so that the concentration's
 * reader says what is wrong with it.
 */
const NUMBER = String.raw`${UNSIGNED_DECIMAL_SOURCE}(?:[.,]\d+)*`;
/** A concentration beside a name: a number and a unit ("1 M", "0.5 mol/L"). */
const CONC = String.raw`${NUMBER}\s*[a-zµμ/]+(?:\/[a-z]+)?`;
/** Groups: 1 the name, 2 the concentration. */
export const TRAILING_CONC = new RegExp(String.raw`^(.*?\S)[\s,]*\(?\s*(${CONC})\s*\)?$`, "i");
/** Groups: 1 the concentration, 2 the name. */
export const LEADING_CONC = new RegExp(String.raw`^(${CONC})\s+(.*\S)$`, "i");
/** A percentage with an optional basis: "37 %", "37 % w/w", "37 %(m/m)", "0.9 % w/v". */
const PERCENT = String.raw`(${UNSIGNED_DECIMAL_SOURCE})\s*%\s*(?:\(?\s*([wmv])\s*\/\s*([wmv])\s*\)?)?`;
/** Groups: 1 the name, 2 the percentage, 3 and 4 the basis. */
export const TRAILING_PERCENT = new RegExp(String.raw`^(.*?\S)[\s,]*\(?\s*${PERCENT}\s*\)?$`, "i");
/** Groups: 1 the percentage, 2 and 3 the basis, 4 the name. */
export const LEADING_PERCENT = new RegExp(String.raw`^${PERCENT}\s+(.*\S)$`, "i");

/** The name without a strength typed beside it, or undefined when it has none. */
export function nameWithoutStrength(name: string): string | undefined {
  const base = TRAILING_PERCENT.exec(name)?.[1] ?? LEADING_PERCENT.exec(name)?.[4] ?? TRAILING_CONC.exec(name)?.[1] ?? LEADING_CONC.exec(name)?.[2];
  return base?.trim();
}
