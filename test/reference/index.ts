/**
 * The published reference cases, read from the JSON files beside this one (one file per published
 * table or equation; the format: test/reference/README.md). The jest tests, `npm run validate`
 * (scripts/validation/cases.ts) and through it docs/validation-report-sample.md all read them here,
 * so a value, its source and its tolerance are written once. The sources, in our words, with each
 * value's status: docs/references.md.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

export interface Tolerance {
  /** Absolute, in the unit of the table (or of the case). */
  value: number;
  reason: string;
}

/** A case that exceeds its tolerance for a stated reason; checked to deviate by more than the tolerance and at most `bound`. */
export interface KnownDeviation {
  reason: string;
  bound: number;
}

/** An equation the source gives, in one of the forms evaluate() knows; T in kelvin. */
export interface Equation {
  text: string;
  form: "a/T + b + c·T + d·T²" | "−(a + b/T + c·ln T)/ln 10" | "−(a + b·T + c/T + d·log T + e/T²)";
  coefficients: Record<string, number>;
  /** How closely the equation as typed must give the printed check values, and why. */
  printedTolerance: Tolerance;
}

export interface ReferenceCase {
  id: string;
  /** The composition or conditions as the source states them. */
  label?: string;
  /** The case's own source when it differs from the table's (a compilation of several papers). */
  source?: string;
  /** The case's own status when the table mixes rows seen in their source (V) with cross-checked ones (X). */
  status?: "V" | "X";
  temperatureC?: number;
  /** Library names (as a user types them) with mol/L in the final solution. */
  mixture?: [string, number][];
  /** The stock volumes the source prints, mL (preparation tables). */
  stock?: Record<string, number>;
  /** pK cases: the acid–base system and its step (counted from 1). */
  system?: string;
  step?: number;
  /** Molar-mass cases: the form named, and the factor (reagent-molarity cases: the reagent as a user names it, "HCl 37 % w/w") the printed value is per (0.1 for g/L of a 0.1 M solution). */
  substance?: string;
  factor?: number;
  unit?: string;
  /** The expected value; for a table with an equation, the equation's value (filled in on loading). */
  expected: number;
  /** The value as the source prints it (trailing zeros kept). */
  printed?: string;
  /** Overrides the table's tolerance, with its own reason. */
  tolerance?: Tolerance;
  knownDeviation?: KnownDeviation;
  /** pKw-density cases: the density the formulation is evaluated at, g/cm³. */
  densityGPerCm3?: number;
  /** Ph. Eur. only: which buffer of the table. */
  key?: string;
  /** log-conditional-K cases: the species names of the complex, its free ligand form and its free metal ion. */
  complex?: string;
  ligand?: string;
  metalIon?: string;
  /** log-conditional-K cases: the ionic strength (mol/L) the constant belongs to; the mixture must come within 10 % of it. */
  ionicStrength?: number;
}

export interface ReferenceTable {
  id: string;
  title: string;
  quantity: "pH" | "beta" | "pKw" | "pKw-density" | "pK" | "molar-mass" | "debye-huckel-A" | "reagent-molarity" | "mean-activity-coefficient" | "osmotic-coefficient" | "log-conditional-K" | "freezing-point-depression";
  unit: string;
  source: string;
  locator: string;
  /** docs/references.md: V seen in the source, X cross-checked independently (M is never an oracle). */
  status: "V" | "X";
  /** How the value was verified. */
  verified: string;
  /** Where docs/references.md describes the source. */
  see: string;
  conditions: string;
  tolerance: Tolerance;
  equation?: Equation;
  note?: string;
  /** Ph. Eur.: ΔpH/Δt per buffer key. */
  slopes?: { unit: string; reason: string; values: Record<string, number> };
  cases: ReferenceCase[];
}

/** The equation's value at a temperature in °C. */
export function evaluate(eq: Equation, temperatureC: number): number {
  const T = temperatureC + 273.15;
  const k = eq.coefficients;
  switch (eq.form) {
    case "a/T + b + c·T + d·T²":
      return k.a / T + k.b + k.c * T + k.d * T * T;
    case "−(a + b/T + c·ln T)/ln 10":
      return -(k.a + k.b / T + k.c * Math.log(T)) / Math.LN10;
    case "−(a + b·T + c/T + d·log T + e/T²)":
      return -(k.a + k.b * T + k.c / T + k.d * Math.log10(T) + k.e / (T * T));
    default:
      throw new Error(`unknown equation form ${String(eq.form)}`);
  }
}

const dir = __dirname;

function load(file: string): ReferenceTable {
  const t = JSON.parse(readFileSync(join(dir, file), "utf8")) as ReferenceTable;
  if (t.equation) {
    for (const c of t.cases) {
      if (c.temperatureC === undefined) throw new Error(`${t.id}/${c.id}: an equation case needs a temperature`);
      c.expected = evaluate(t.equation, c.temperatureC);
    }
  }
  return t;
}

/** Every table, by id (the file name without .json). */
export const REFERENCE_TABLES: ReadonlyMap<string, ReferenceTable> = new Map(
  readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => {
      const t = load(f);
      if (`${t.id}.json` !== f) throw new Error(`${f}: id "${t.id}" does not match the file name`);
      return [t.id, t] as const;
    }),
);

/** One table by id; throws for an unknown id (a typo must not give an empty test). */
export function referenceTable(id: string): ReferenceTable {
  const t = REFERENCE_TABLES.get(id);
  if (t === undefined) throw new Error(`no reference table "${id}" in test/reference (have ${[...REFERENCE_TABLES.keys()].join(", ")})`);
  return t;
}

/** The cases of a table with the tolerance that applies to each (the case's own, else the table's). */
export function casesOf(id: string): (ReferenceCase & { tolerance: Tolerance })[] {
  const t = referenceTable(id);
  return t.cases.map((c) => ({ ...c, tolerance: c.tolerance ?? t.tolerance }));
}

/** One case by id within a table. */
export function referenceCase(tableId: string, caseId: string): ReferenceCase & { tolerance: Tolerance } {
  const c = casesOf(tableId).find((x) => x.id === caseId);
  if (c === undefined) throw new Error(`no case "${caseId}" in reference table "${tableId}"`);
  return c;
}

/** The printed check value as a number (an equation table's printed values). */
export function printedValue(c: ReferenceCase): number {
  if (c.printed === undefined) throw new Error(`${c.id} has no printed value`);
  return Number(c.printed);
}
