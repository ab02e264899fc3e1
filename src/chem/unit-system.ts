/**
 * The trade's units, defined once on mathjs's Unit class, and the reading of unit text with it.
 *
 * mathjs's Unit class (made by its factory `createUnitClass` with number-only arithmetic,
 * unit-numbers.ts, so that no BigNumber, fraction or complex library comes along) knows the SI units, their
 * prefixes, dimensions, conversion factors and the offsets of the temperature scales. On top of it
 * this file defines what a solution recipe adds:
 *
 * - `M`, molar: 1 M = 1 mol/L (common practice; not an SI symbol), with the prefixes below;
 * - `osmol`, osmole: an amount of osmotically active particles, its own dimension (common practice);
 * - `percentwv`, "% w/v": grams per 100 mL, 1 % w/v = 10 g/L (common practice in formulation);
 *   units.ts brings the spellings "% w/v", "%(w/v)", "% m/v" to this name.
 *
 * The prefixes read are those from femto to kilo (mathjs's SI prefix table, with the values of the
 * SI Brochure, 9th edition 2019, Table 7): "MM" or "Mmol" are far more likely a mistyped "mM" or
 * "mmol" than mega-molar, so they are refused with that hint. Only the units of amount, mass,
 * volume, molar concentration, osmoles and temperature are read; mathjs knows many more (inches,
 * gallons, coulombs…), which are refused with a reason: "37 C" is 37 coulombs to mathjs, and here
 * "a temperature is written °C or degC".
 */
import { createUnitClass, type Unit } from "mathjs";
import { NUMBER_ONLY_UNIT_DEPENDENCIES } from "./unit-numbers";

declare module "mathjs" {
  /** mathjs's factory of its Unit class (exported by mathjs, absent from its published types). */
  export function createUnitClass(dependencies: Record<string, unknown>): UnitClass;
}

/** The static side of mathjs's Unit class, as used here. */
interface UnitClass {
  new (value: number, unit: Unit | string): Unit;
  parse(text: string): Unit;
  isValuelessUnit(name: string): boolean;
  createUnitSingle(name: string, definition: object): Unit;
  readonly PREFIXES: Record<string, PrefixTable>;
}

/** mathjs's runtime shape of one factor of a unit (its published types say less). */
interface Factor {
  readonly unit: { readonly name: string; readonly dimensions: readonly number[] };
  readonly prefix: { readonly name: string; readonly value: number };
  readonly power: number;
}
/** The factors of a mathjs unit. */
const factorsOf = (u: Unit): readonly Factor[] => u.units as unknown as Factor[];

type PrefixTable = Record<string, { name: string; value: number; scientific: boolean }>;

/** The smallest and largest prefix read: femto (1e-15) to kilo (1e3). */
const prefixRead = (value: number): boolean => value >= 1e-15 * (1 - 1e-9) && value <= 1e3 * (1 + 1e-9);

/** The units read (mathjs's names), with any prefix from femto to kilo. */
const TRADE_UNITS: ReadonlySet<string> = new Set([
  "mol", "mole", "moles", "g", "gram", "grams", "L", "l", "litre", "liter", "litres", "liters", "cc",
  "m", // lengths, for cubes: dm3, cm3, m3 (1 L = 1 dm³, SI Brochure, 9th edition 2019, Table 8)
  "M", "osmol", "percentwv",
  "K", "kelvin", "degC", "celsius", "degF", "fahrenheit",
]);

/** The units read, for messages. */
const UNITS_READ = "mol, g, L, m³, M, osmol, % w/v, K, °C, °F, with prefixes from f to k";

/**
 * mathjs's Unit class with the trade's units. Made on first use, not when the add-in loads: making
 * it builds mathjs's table of units and prefixes, which a workbook of plain numbers never needs.
 */
function makeUnitSystem() {
  const Unit = createUnitClass(NUMBER_ONLY_UNIT_DEPENDENCIES);
  const prefixTables = Unit.PREFIXES;
  // The short SI prefixes from femto to kilo, taken from mathjs's table (a unit names its prefix set).
  prefixTables.RECIPE = Object.fromEntries(Object.entries(prefixTables.SHORT).filter(([, p]) => prefixRead(p.value)));
  Unit.createUnitSingle("M", { definition: "1 mol/L", prefixes: "recipe" });
  Unit.createUnitSingle("osmol", { prefixes: "recipe", baseName: "OSMOTIC_AMOUNT" });
  Unit.createUnitSingle("percentwv", { definition: "10 g/L" });
  /** Reference units the read ones are compared with (by dimension) and converted to. */
  const ref = {
    molar: Unit.parse("mol/L"),
    massConcentration: Unit.parse("g/L"),
    molality: Unit.parse("mol/kg"),
    volume: Unit.parse("L"),
    amount: Unit.parse("mol"),
    mass: Unit.parse("g"),
    temperature: Unit.parse("degC"),
  } as const;
  return { Unit, ref, prefixes: Object.keys(prefixTables.RECIPE) };
}

export type UnitSystem = ReturnType<typeof makeUnitSystem>;
let made: UnitSystem | undefined;

/** mathjs's Unit class with the trade's units (made once, on first use). */
export function unitSystem(): UnitSystem {
  made ??= makeUnitSystem();
  return made;
}

/** A case hint for symbols that differ from a unit of the trade only in case ("mm" → "mM"). */
export function caseHint(symbol: string): string {
  if (symbol === "C" || symbol === "F") return ` (a temperature is written "°${symbol}" or "deg${symbol}")`;
  const lower = symbol.toLowerCase();
  for (const p of ["", ...unitSystem().prefixes]) {
    for (const b of ["mol", "g", "L", "M"]) {
      if ((p + b).toLowerCase() === lower && p + b !== symbol) return ` (unit symbols are case-sensitive: did you mean "${p + b}"?)`;
    }
  }
  return "";
}

/** A factor on a temperature scale (K, °C, °F: mathjs gives them the temperature dimension). */
const isTemperature = (f: Factor): boolean => unitSystem().ref.temperature.dimensions.every((d, i) => (f.unit.dimensions[i] ?? 0) === d);

export type UnitRead = { ok: true; unit: Unit; temperature: boolean } | { ok: false; why: string };

const SUPERSCRIPT: Readonly<Record<string, string>> = { "\u207b": "-", "\u00b9": "1", "\u00b2": "2", "\u00b3": "3" };
const SUPERSCRIPTS = new RegExp(`[${Object.keys(SUPERSCRIPT).join("")}]`, "g");
/** One factor as written: a symbol and an optional integer exponent ("L-1", "dm3", "L^-1"). */
const FACTOR = /^([A-Za-z\u00b5\u03bc]+)(?:\^?([+-]?\d+))?$/;
/** The micro sign and Greek mu, which mathjs does not read, as its "u". */
const MICRO = /[\u00b5\u03bc]/g;

/**
 * Reads unit text ("mmol/L", "mol L-1", "mol·L⁻¹", "mg/mL", "dm3", "degC") with mathjs. Our part is
 * only the spelling mathjs does not read itself: superscripts, exponents written without "^", "·"
 * or "." between factors, "µ"/"μ" for micro, and a "/" that divides by the one factor after it.
 * Symbols, prefixes, dimensions and factors are mathjs's.
 */
function readUnitUncached(unit: string): UnitRead {
  const { Unit: UnitClass } = unitSystem();
  const text = unit.replace(SUPERSCRIPTS, (c) => SUPERSCRIPT[c]);
  const pieces = text
    .replace(/\s*\/\s*/g, " / ")
    .split(/[\s*·.]+|(?=\/)|(?<=\/)/)
    .filter((p) => p !== "");
  const terms: string[] = [];
  let divide = false;
  for (const piece of pieces) {
    if (piece === "/") {
      if (divide || terms.length === 0) return { ok: false, why: `misplaced "/" in "${unit}"` };
      divide = true;
      continue;
    }
    const m = FACTOR.exec(piece);
    if (!m) return { ok: false, why: `"${piece}" is not a unit` };
    const written = m[1];
    const symbol = written.replace(MICRO, "u");
    const exponent = (m[2] === undefined ? 1 : Number(m[2])) * (divide ? -1 : 1);
    divide = false;
    if (!UnitClass.isValuelessUnit(symbol)) return { ok: false, why: `unknown unit "${written}"${caseHint(symbol)}` };
    const [f] = factorsOf(UnitClass.parse(symbol));
    if (!TRADE_UNITS.has(f.unit.name) || !prefixRead(f.prefix.value)) {
      return { ok: false, why: `"${written}" is not one of the units read here${caseHint(symbol) || ` (${UNITS_READ})`}` };
    }
    terms.push(exponent === 1 ? symbol : `${symbol}^${exponent}`);
  }
  if (divide) return { ok: false, why: `"${unit}" ends with "/"` };
  if (terms.length === 0) return { ok: false, why: "no unit" };
  const read = UnitClass.parse(terms.join(" "));
  const factors = factorsOf(read);
  const t = factors.find(isTemperature);
  if (t && factors.length > 1) {
    return { ok: false, why: `a temperature unit ("${t.prefix.name}${t.unit.name}") cannot be part of a compound unit` };
  }
  const temperature = t !== undefined;
  return { ok: true, unit: read, temperature };
}

/** Unit text read before (a table repeats the same few units on every row); bounded. */
const cache = new Map<string, UnitRead>();
const CACHE_SIZE = 256;

/** Reads unit text with mathjs (cached); never throws. */
export function readUnit(unit: string): UnitRead {
  const hit = cache.get(unit);
  if (hit) return hit;
  let read: UnitRead;
  try {
    read = readUnitUncached(unit);
  } catch (e) {
    read = { ok: false, why: `"${unit}" is not a unit (${e instanceof Error ? e.message : String(e)})` };
  }
  if (cache.size >= CACHE_SIZE) cache.clear();
  cache.set(unit, read);
  return read;
}

/** mathjs's factor from a linear unit to a reference unit, asked once per pair. */
const linearFactors = new WeakMap<Unit, Map<Unit, number>>();

/**
 * x in the read unit, as a number in the reference unit. mathjs converts: a temperature (offset
 * scales) on every call; a linear unit by mathjs's factor for that pair, asked once, since a table
 * repeats the same unit on every row.
 */
export function convertTo(x: number, from: Unit, to: Unit): number {
  const UnitClass = unitSystem().Unit;
  if (factorsOf(from).some(isTemperature)) return new UnitClass(x, from).toNumber(to as never);
  let byRef = linearFactors.get(from);
  if (!byRef) linearFactors.set(from, (byRef = new Map()));
  let factor = byRef.get(to);
  if (factor === undefined) {
    factor = new UnitClass(1, from).toNumber(to as never);
    byRef.set(to, factor);
  }
  return x * factor;
}
