/**
 * The unit symbols a recipe uses and the reading of compound units ("mmol/L", "mol L-1", "mg/mL",
 * "mol/dm3") into exponents of amount, mass and volume with a factor to mol, g and L. Used by
 * units.ts, which adds numbers, temperatures, percentages and the conversion to the engine's units.
 */

/** Exponents of amount (mol), mass (g) and volume (L) of a unit, and its factor to mol^a·g^b·L^c. */
export interface Dims {
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

/** Long prefixes for spelled-out litres ("millilitre"): the SI prefix names (SI Brochure, Table 7). */
const LONG_PREFIX: Readonly<Record<string, number>> = { "": 1, kilo: 1e3, deci: 1e-1, centi: 1e-2, milli: 1e-3, micro: 1e-6, nano: 1e-9 };

/** Base symbols that take SI prefixes, with their dimensions. */
const PREFIXABLE: Readonly<Record<string, Dims>> = {
  mol: { amount: 1, mass: 0, volume: 0, factor: 1 },
  g: { amount: 0, mass: 1, volume: 0, factor: 1 },
  L: { amount: 0, mass: 0, volume: 1, factor: 1 },
  l: { amount: 0, mass: 0, volume: 1, factor: 1 },
  M: { amount: 1, mass: 0, volume: -1, factor: 1 }, // molar: 1 mol/L (common practice; not an SI symbol)
};

/**
 * Lengths, only as cubes (m³, dm³, cm³, mm³): 1 L = 1 dm³ (SI Brochure, 9th edition 2019, Table 8),
 * so 1 m³ = 1000 L.
 */
const LENGTH_PREFIX: Readonly<Record<string, number>> = { "": 1, d: 1e-1, c: 1e-2, m: 1e-3 };

/**
 * Temperature units and their conversion to °C: t/°C = T/K − 273.15 (SI Brochure, 9th edition 2019,
 * definition of the Celsius temperature); t/°F = 9/5·t/°C + 32 (definition of the Fahrenheit scale). Only as the whole unit.
 */
export const TEMPERATURE: Readonly<Record<string, { toCelsius: (x: number) => number }>> = {
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

/** The prefixes as a list, made once: unit text is read for every row of a table that uses it. */
const PREFIX_LIST: readonly (readonly [string, number])[] = Object.entries(PREFIX);
const SUPERSCRIPTS = new RegExp(`[${Object.keys(SUPERSCRIPT).join("")}]`, "g");

/** The dimensions of one symbol with its exponent, or null if the symbol is not a known unit. */
function symbolDims(symbol: string): Dims | null {
  const direct = PREFIXABLE[symbol];
  if (direct) return direct;
  for (const [p, f] of PREFIX_LIST) {
    if (symbol.length > p.length && symbol.startsWith(p)) {
      const base = PREFIXABLE[symbol.slice(p.length)];
      if (base) return { ...base, factor: base.factor * f };
    }
  }
  const litre = /^(kilo|deci|centi|milli|micro|nano)?(?:liter|litre)s?$/.exec(symbol);
  if (litre) return { amount: 0, mass: 0, volume: 1, factor: LONG_PREFIX[litre[1] ?? ""] };
  if (symbol === "cc") return { amount: 0, mass: 0, volume: 1, factor: 1e-3 }; // cubic centimetre (common practice)
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

export type UnitRead = { ok: true; dims: Dims } | { ok: false; why: string };

const FACTOR = /^([A-Za-z\u00b5\u03bc]+)(?:\^?([+-]?\d+))?$/;

/** Reads a compound unit ("mmol/L", "mol L-1", "mg/mL") into its dimensions. */
export function readUnit(unit: string): UnitRead {
  const text = unit.replace(SUPERSCRIPTS, (c) => SUPERSCRIPT[c]);
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
  if (symbol === "C" || symbol === "F") return ` (a temperature is written "°${symbol}" or "deg${symbol}")`;
  const lower = symbol.toLowerCase();
  for (const p of ["", ...Object.keys(PREFIX)]) {
    for (const b of Object.keys(PREFIXABLE)) {
      if ((p + b).toLowerCase() === lower && p + b !== symbol) return ` (unit symbols are case-sensitive: did you mean "${p + b}"?)`;
    }
  }
  return "";
}

