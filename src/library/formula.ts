/**
 * Chemical formulas of weighed forms ("Na2HPO4·7H2O", "C6H9N3O2·HCl·H2O", "(NH4)2SO4") parsed to
 * element counts, and molar masses computed from atomic weights. Adducts and hydrate water follow
 * '·', '.' or '*', each with an optional leading multiplier.
 */

export type ElementCounts = Map<string, number>;

export type FormulaResult = { ok: true; counts: ElementCounts } | { ok: false; code: "bad-formula"; message: string };

export type MolarMassResult =
  | { ok: true; value: number }
  | { ok: false; code: "bad-formula" | "unknown-element" | "too-large"; message: string };

/**
 * The largest molar mass an entry may have, g/mol, computed from a formula or typed: the same limit
 * as the JSON Schema's maximum for a typed molarMass (library.schema.json; a test holds them equal).
 * Large proteins and polymers are below 1e6 g/mol; a formula beyond it is a typing error.
 */
export const MAX_MOLAR_MASS = 1e6;

const SEPARATORS = new Set(["·", ".", "*"]);

class Cursor {
  i = 0;
  constructor(readonly s: string) {}
  peek(): string {
    return this.s[this.i] ?? "";
  }
  done(): boolean {
    return this.i >= this.s.length;
  }
  number(): number | null {
    const m = /^[0-9]+/.exec(this.s.slice(this.i));
    if (!m) return null;
    this.i += m[0].length;
    return Number(m[0]);
  }
}

function addInto(into: ElementCounts, from: ElementCounts, times: number): void {
  for (const [el, n] of from) into.set(el, (into.get(el) ?? 0) + n * times);
}

/** group+ until ')' or a separator or the end. */
function groups(c: Cursor, depth: number): ElementCounts | string {
  const counts: ElementCounts = new Map();
  let any = false;
  while (!c.done() && c.peek() !== ")" && !SEPARATORS.has(c.peek())) {
    const ch = c.peek();
    if (ch === "(") {
      if (depth > 4) return "parentheses nested too deeply";
      c.i++;
      const inner = groups(c, depth + 1);
      if (typeof inner === "string") return inner;
      if (c.peek() !== ")") return "missing ')'";
      c.i++;
      addInto(counts, inner, c.number() ?? 1);
    } else if (/[A-Z]/.test(ch)) {
      const m = /^[A-Z][a-z]?/.exec(c.s.slice(c.i)) as RegExpExecArray;
      c.i += m[0].length;
      const n = c.number() ?? 1;
      if (n === 0) return `zero count after ${m[0]}`;
      counts.set(m[0], (counts.get(m[0]) ?? 0) + n);
    } else {
      return `unexpected '${ch}' at position ${c.i + 1}`;
    }
    any = true;
  }
  return any ? counts : "empty group";
}

/** Parse a formula into element counts. */
export function parseFormula(formula: string): FormulaResult {
  const c = new Cursor(formula.trim());
  const total: ElementCounts = new Map();
  if (c.done()) return { ok: false, code: "bad-formula", message: "empty formula" };
  for (;;) {
    const times = c.number() ?? 1;
    if (times === 0) return { ok: false, code: "bad-formula", message: "zero multiplier" };
    const part = groups(c, 0);
    if (typeof part === "string") return { ok: false, code: "bad-formula", message: `formula '${formula}': ${part}` };
    addInto(total, part, times);
    if (c.done()) break;
    if (c.peek() === ")") return { ok: false, code: "bad-formula", message: `formula '${formula}': unmatched ')'` };
    c.i++; // separator
  }
  return { ok: true, counts: total };
}

/** g/mol from a formula and atomic weights (symbol → g/mol). */
export function molarMassOf(formula: string, weights: ReadonlyMap<string, number>): MolarMassResult {
  const parsed = parseFormula(formula);
  if (!parsed.ok) return parsed;
  let sum = 0;
  for (const [el, n] of parsed.counts) {
    const w = weights.get(el);
    if (w === undefined) return { ok: false, code: "unknown-element", message: `no atomic weight for element '${el}' in formula '${formula}'` };
    sum += n * w;
  }
  if (!(sum <= MAX_MOLAR_MASS)) {
    const shown = Number.isFinite(sum) ? `${sum.toExponential(4)} g/mol` : "more than any number";
    return { ok: false, code: "too-large", message: `formula '${formula}' gives a molar mass of ${shown}, above the ${MAX_MOLAR_MASS.toLocaleString("en-US")} g/mol an entry may have (the same limit as a typed molar mass): check the counts in the formula` };
  }
  return { ok: true, value: sum };
}
