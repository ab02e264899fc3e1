/**
 * The AQ function of a mixture inside a formula, and where its names, amounts, temperature and
 * activity arguments come from. Pure: the Excel side (excel-selection.ts) loads the references.
 *
 * The argument positions mirror the functions' parameter lists (src/functions/catalogue.ts; the
 * pane does not import src/functions, and test/taskpane/formula.test.ts checks the two agree).
 */
import { calls, parseFormula, FormulaSyntaxError, type ArrayValue, type FormulaNode } from "./parse";

/** A cell value as Excel gives it (Range.values) or as an inline array holds it. */
export type CellValue = number | string | boolean | null | { error: string };

/** Where an argument's value comes from. */
export type ArgSource =
  | { kind: "missing" }
  | { kind: "values"; values: CellValue[][] }
  | { kind: "ref"; sheet: string | null; address: string; text: string }
  | { kind: "name"; sheet: string | null; name: string; text: string }
  | { kind: "unsupported"; text: string; why: string };

export interface MixtureFunction {
  /** Upper-case function name without the namespace: PH, ADJUST, … */
  id: string;
  /** Parameter names in order (as in the function's metadata). */
  params: string[];
  /** Index of the temperature and activity parameters, or -1. */
  temperature: number;
  activity: number;
  /** Index of the titrant, its stock concentration, the volume and the largest titrant volume, or -1 (ADJUST, CURVE). */
  titrant: number;
  titrantConc: number;
  volume: number;
  maxVolume: number;
}

const fn = (id: string, params: string[]): MixtureFunction => ({
  id,
  params,
  temperature: params.indexOf("temperature"),
  activity: params.indexOf("activity"),
  titrant: params.indexOf("titrant"),
  titrantConc: params.indexOf("titrant_conc"),
  volume: params.indexOf("volume"),
  maxVolume: params.indexOf("max_titrant_volume"),
});

/** The AQ functions whose first two arguments are a mixture's names and amounts. */
export const MIXTURE_FUNCTIONS: readonly MixtureFunction[] = [
  fn("PH", ["names", "amounts", "temperature", "activity"]),
  fn("ADJUST", ["names", "amounts", "target_pH", "titrant", "titrant_conc", "volume", "temperature", "activity", "measured_pH"]),
  fn("BETA", ["names", "amounts", "temperature", "activity"]),
  fn("CAPACITY", ["names", "amounts", "delta_pH", "temperature", "activity"]),
  fn("SPECIES", ["names", "amounts", "species", "temperature", "activity"]),
  fn("CHECK", ["names", "amounts", "temperature", "activity"]),
  fn("IONIC", ["names", "amounts", "temperature", "activity"]),
  fn("OSMOLARITY", ["names", "amounts", "temperature", "activity"]),
  fn("OSMOLALITY", ["names", "amounts", "temperature", "activity"]),
  fn("CURVE", ["names", "amounts", "titrant", "titrant_conc", "volume", "max_titrant_volume", "points", "temperature", "activity"]),
  fn("PHRANGE", ["names", "amounts", "amount_tolerance", "pKa_uncertainty", "temperature", "activity"]),
];

/**
 * "AQ.PH" → "PH". Also the forms Excel shows before the add-in has loaded (_xldudf_AQ_PH) and with
 * the namespace in any case. Null for any other function.
 */
export function aqFunctionId(name: string): string | null {
  const m = /^(?:_xldudf_)?AQ[._]([A-Z_]+)$/i.exec(name);
  return m ? m[1].toUpperCase() : null;
}

export interface AqCall {
  fn: MixtureFunction;
  /** The call's source text, e.g. AQ.PH(A2:A4,B2:B4,37). */
  text: string;
  names: ArgSource;
  amounts: ArgSource;
  temperature: ArgSource;
  activity: ArgSource;
  /** ADJUST and CURVE: how they titrate (missing for the other functions). */
  titrant: ArgSource;
  titrantConc: ArgSource;
  volume: ArgSource;
  maxVolume: ArgSource;
}

/** The arguments of an AqCall that carry values. */
export const CALL_ARGS = ["names", "amounts", "temperature", "activity", "titrant", "titrantConc", "volume", "maxVolume"] as const;
export type CallArg = (typeof CALL_ARGS)[number];

export type FindResult =
  | { ok: true; call: AqCall }
  | { ok: false; reason: "empty" | "no-formula" | "syntax" | "no-aq-call"; message: string };

function arrayCell(v: ArrayValue): CellValue {
  return v;
}

/** A constant folded from the argument (-5, 50%, "25 mM"), or undefined. */
function constant(node: FormulaNode): CellValue | undefined {
  switch (node.kind) {
    case "number":
    case "string":
    case "bool":
      return node.value;
    case "error":
      return { error: node.value };
    case "unary": {
      const v = constant(node.operand);
      return typeof v === "number" ? (node.op === "-" ? -v : v) : undefined;
    }
    case "percent": {
      const v = constant(node.operand);
      return typeof v === "number" ? v / 100 : undefined;
    }
    default:
      return undefined;
  }
}

/** What an argument is, as a source of values. */
export function argSource(node: FormulaNode | undefined, formula: string): ArgSource {
  if (!node || node.kind === "empty") return { kind: "missing" };
  const text = formula.slice(node.start, node.end);
  if (node.kind === "array") return { kind: "values", values: node.rows.map((r) => r.map(arrayCell)) };
  const c = constant(node);
  if (c !== undefined) return { kind: "values", values: [[c]] };
  if (node.kind === "ref") {
    if (node.unsupported) return { kind: "unsupported", text, why: `${node.unsupported} cannot be read from the pane` };
    if (/^[A-Z]+:[A-Z]+$|^\d+:\d+$/.test(node.address)) {
      return { kind: "unsupported", text, why: "whole columns or rows are not read: give a range such as A2:A20" };
    }
    return { kind: "ref", sheet: node.sheet, address: node.address, text };
  }
  if (node.kind === "name") {
    if (node.unsupported) return { kind: "unsupported", text, why: `${node.unsupported} cannot be read from the pane` };
    return { kind: "name", sheet: node.sheet, name: node.name, text };
  }
  if (node.kind === "call") return { kind: "unsupported", text, why: `it is calculated by ${node.name}: the pane reads only ranges, inline arrays and values` };
  return { kind: "unsupported", text, why: "it is a calculation: the pane reads only ranges, inline arrays and values" };
}

/**
 * The first AQ function of a mixture in a formula (outermost first, left to right), with the
 * sources of its arguments. `formula` is as Range.formulas gives it; a constant cell is not a formula.
 */
export function findAqCall(formula: unknown): FindResult {
  if (formula === null || formula === undefined || formula === "") return { ok: false, reason: "empty", message: "the cell is empty" };
  if (typeof formula !== "string" || !formula.startsWith("=")) return { ok: false, reason: "no-formula", message: "the cell holds a value, not a formula" };
  let tree: FormulaNode;
  try {
    tree = parseFormula(formula);
  } catch (e) {
    if (e instanceof FormulaSyntaxError) return { ok: false, reason: "syntax", message: `the formula could not be read (${e.message}, at character ${e.at + 1})` };
    throw e;
  }
  for (const c of calls(tree)) {
    const id = aqFunctionId(c.name);
    const f = id ? MIXTURE_FUNCTIONS.find((m) => m.id === id) : undefined;
    if (!f) continue;
    const at = (i: number): ArgSource => (i >= 0 ? argSource(c.args[i], formula) : { kind: "missing" });
    return {
      ok: true,
      call: {
        fn: f,
        text: formula.slice(c.start, c.end),
        names: at(0),
        amounts: at(1),
        temperature: at(f.temperature),
        activity: at(f.activity),
        titrant: at(f.titrant),
        titrantConc: at(f.titrantConc),
        volume: at(f.volume),
        maxVolume: at(f.maxVolume),
      },
    };
  }
  const names = MIXTURE_FUNCTIONS.map((m) => `AQ.${m.id}`).join(", ");
  return { ok: false, reason: "no-aq-call", message: `the formula has no AQ function of a mixture (${names})` };
}
