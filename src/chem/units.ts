/**
 * Unit text → the engine's units (mol/L, L, °C, mol), with mathjs units imported selectively.
 *
 * Numbers pass through unchanged (they are already in the engine's units). Text is parsed by mathjs
 * Unit.parse: "25 mM", "0.1 M", "100 mmol/L", "2.1 g/L", "2.1 mg/mL" (mass concentrations need the
 * molar mass), "500 mL", "1.5 L", "37 degC" (also "37 °C"), "310.15 K", "2 mmol", "1.5 g" (amount,
 * needs the molar mass). Molar (M, with SI prefixes: mM, uM, nM) is defined here once, as 1 mol/L.
 */
import { create, createUnitDependencies, unitDependencies, type Unit } from "mathjs";
import { fail, fmt } from "./failure";
import type { Result } from "./types";

export type QuantityDimension = "concentration" | "volume" | "temperature" | "amount";

export interface ParseOptions {
  /** g/mol, needed to convert a mass or mass concentration to moles. */
  molarMass?: number;
}

const math = create({ unitDependencies, createUnitDependencies });
math.createUnit("M", { definition: "1 mol/L", prefixes: "short" });

type MathUnit = Unit;

const REF = {
  molar: math.unit("1 mol/L"),
  massConc: math.unit("1 g/L"),
  volume: math.unit("1 L"),
  temperature: math.unit("1 K"),
  amount: math.unit("1 mol"),
  mass: math.unit("1 g"),
};

const EXAMPLES: Record<QuantityDimension, string> = {
  concentration: '"25 mM", "0.1 M", "100 mmol/L" or "2.1 g/L"',
  volume: '"500 mL" or "1.5 L"',
  temperature: '"37 degC" or "310.15 K"',
  amount: '"2 mmol" or "1.5 g"',
};

function unitOnly(u: MathUnit): string {
  return u.formatUnits();
}

/** Converts a parsed unit to the dimension's engine unit, or explains why it cannot. */
function convert(u: MathUnit, dim: QuantityDimension, text: string, molarMass: number | undefined): Result<{ value: number }> {
  const needMass = (what: string): Result<{ value: number }> => {
    if (molarMass === undefined) {
      return fail("bad-input", `"${text}" is a ${what}: give the molar mass of the substance to convert it to moles.`);
    }
    if (!(Number.isFinite(molarMass) && molarMass > 0)) {
      return fail("bad-input", `Molar mass must be a positive number of g/mol, got ${fmt(molarMass)}.`);
    }
    return { ok: true, value: NaN };
  };
  switch (dim) {
    case "concentration":
      if (u.equalBase(REF.molar)) return { ok: true, value: u.toNumber("mol/L") };
      if (u.equalBase(REF.massConc)) {
        const m = needMass("mass concentration");
        return m.ok ? { ok: true, value: u.toNumber("g/L") / (molarMass as number) } : m;
      }
      break;
    case "volume":
      if (u.equalBase(REF.volume)) return { ok: true, value: u.toNumber("L") };
      break;
    case "temperature":
      if (u.equalBase(REF.temperature)) return { ok: true, value: u.toNumber("degC") };
      break;
    case "amount":
      if (u.equalBase(REF.amount)) return { ok: true, value: u.toNumber("mol") };
      if (u.equalBase(REF.mass)) {
        const m = needMass("mass");
        return m.ok ? { ok: true, value: u.toNumber("g") / (molarMass as number) } : m;
      }
      break;
  }
  return fail("bad-input", `"${text}" has unit ${unitOnly(u)}, which is not a ${dim}: use for example ${EXAMPLES[dim]}.`);
}

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** Concentrations, volumes and amounts cannot be negative; temperatures in °C can. */
function nonNegative(value: number, dim: QuantityDimension, text: string): Result<{ value: number }> {
  if (dim !== "temperature" && value < 0) return fail("bad-input", `A ${dim} cannot be negative (${text}).`);
  return { ok: true, value };
}

/**
 * Parses a number or unit text into the engine's unit for the dimension: concentration → mol/L,
 * volume → L, temperature → °C, amount → mol. Numbers, and text without a unit, are taken as
 * already in that unit. Negative concentrations, volumes and amounts are rejected. Failures ("bad-input") name the problem: unknown unit, wrong dimension,
 * mass without molar mass, not a number.
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
  const normalised = text.replace(/\s*(°|º|deg\s+)C\b/g, " degC").replace(/℃/g, " degC").replace(/µ/g, "u");
  let u: MathUnit;
  try {
    u = math.unit(normalised);
  } catch (e) {
    const why = e instanceof Error ? e.message : String(e);
    return fail("bad-input", `Cannot read "${text}" as a ${dimension} (${why}); use for example ${EXAMPLES[dimension]}.`);
  }
  if (u.value === null || u.value === undefined) {
    return fail("bad-input", `"${text}" has no number; write for example ${EXAMPLES[dimension]}.`);
  }
  const r = convert(u, dimension, text, opts?.molarMass);
  if (!r.ok) return r;
  if (!Number.isFinite(r.value)) return fail("bad-input", `"${text}" does not give a finite ${dimension}.`);
  return nonNegative(r.value, dimension, text);
}
