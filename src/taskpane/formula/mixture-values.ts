/**
 * The values of a formula's names, amounts, temperature and activity arguments (inline or loaded
 * from the sheet) → the rows, temperature and activity model the pane's mixture reader takes
 * (tryit.ts). Pairing is the AQ functions' rule (src/chem/name-amount-pairs.ts). Pure.
 */
import { cellPosition, EMPTY_MIXTURE_MESSAGE, pairAt, pairShapeProblem, readActivityModel, type ActivityModel } from "../../chem";
import type { TryRow } from "../tryit";
import type { CellValue } from "./aq-call";

/** How an AQ.CURVE or AQ.ADJUST formula titrates, as text the Picture view's fields take. */
export interface TitrationSpec {
  /** The titrant's name as written ("NaOH", "sodium hydroxide" …). */
  titrant: string;
  /** Stock concentration ("0.1 M", "100 mM"), when given. */
  stock?: string;
  /** Sample volume ("25 mL"), AQ.CURVE only (AQ.ADJUST's volume is a batch). */
  sample?: string;
  /** Largest titrant volume ("30 mL"), AQ.CURVE only. */
  maxVolume?: string;
}

export interface MixtureSpec {
  rows: TryRow[];
  /** °C as text ("" for the default 25 °C), as the try-it panel holds it. */
  temperature: string;
  activity: ActivityModel;
  titration?: TitrationSpec;
}

export type SpecResult = { ok: true; spec: MixtureSpec } | { ok: false; message: string };

function blank(v: CellValue | undefined): boolean {
  return v === null || v === undefined || (typeof v === "string" && v.trim() === "");
}

function isError(v: CellValue | undefined): v is { error: string } {
  return typeof v === "object" && v !== null;
}

/** Excel's Range.values gives error cells as text such as "#N/A": treat those as errors too. */
function errorText(v: CellValue | undefined): string | null {
  if (isError(v)) return v.error;
  if (typeof v === "string" && /^#(NULL!|DIV\/0!|VALUE!|REF!|NAME\?|NUM!|N\/A|SPILL!|CALC!|BUSY!|GETTING_DATA)$/.test(v.trim())) return v.trim();
  return null;
}

function shape(v: CellValue[][]): string {
  return `${v.length}×${v[0]?.length ?? 0}`;
}

function single(v: CellValue[][] | null, what: string): { ok: true; value: CellValue } | { ok: false; message: string } {
  if (v === null) return { ok: true, value: null };
  if (v.length !== 1 || v[0].length !== 1) return { ok: false, message: `the ${what} must be one cell, not ${shape(v)} cells` };
  const e = errorText(v[0][0]);
  if (e) return { ok: false, message: `the ${what} cell shows ${e}` };
  return { ok: true, value: v[0][0] };
}

export function mixtureFromValues(names: CellValue[][], amounts: CellValue[][], temperature: CellValue[][] | null = null, activity: CellValue[][] | null = null): SpecResult {
  const rowsN = names.length;
  const colsN = names[0]?.length ?? 0;
  const grid: [number, number] = [rowsN, colsN];
  const mismatch = pairShapeProblem(grid, [amounts.length, amounts[0]?.length ?? 0]);
  if (mismatch !== null) return { ok: false, message: mismatch };
  // Excel's values are rectangular; anything else is refused rather than read in part
  if (amounts.some((r) => r.length !== colsN) || names.some((r) => r.length !== colsN)) return { ok: false, message: "the names or the amounts are not a rectangular range" };
  const rows: TryRow[] = [];
  for (let r = 0; r < rowsN; r++) {
    for (let c = 0; c < colsN; c++) {
      const n = names[r][c];
      const a = amounts[r][c];
      const where = cellPosition(r, c, grid);
      const bad = errorText(n) ?? errorText(a);
      if (bad) return { ok: false, message: `a name or amount cell${where} shows ${bad}` };
      if (typeof n === "boolean" || typeof a === "boolean") return { ok: false, message: `a name or amount${where} is TRUE/FALSE` };
      const pair = pairAt(n, a, r, c, grid);
      if (pair === "skip") continue;
      if (pair !== "pair") return { ok: false, message: pair };
      rows.push({ name: String(n).trim(), amount: String(a).trim() });
    }
  }
  if (rows.length === 0) return { ok: false, message: EMPTY_MIXTURE_MESSAGE };
  const t = single(temperature, "temperature");
  if (!t.ok) return t;
  if (typeof t.value === "boolean") return { ok: false, message: "the temperature is TRUE/FALSE" };
  const m = single(activity, "activity");
  if (!m.ok) return m;
  const model = readActivityModel(blank(m.value) ? "" : String(m.value));
  if (!model.ok) return { ok: false, message: model.message };
  return { ok: true, spec: { rows, temperature: blank(t.value) ? "" : String(t.value).trim(), activity: model.model } };
}

/** A number in the unit the functions take (mol/L, L) as text with that unit; text stays as written. */
function withUnit(v: CellValue, unit: "M" | "mL"): string | undefined {
  if (typeof v === "number" && Number.isFinite(v) && v > 0) return unit === "M" ? `${Number(v.toPrecision(6))} M` : `${Number((v * 1000).toPrecision(6))} mL`;
  if (typeof v === "string" && v.trim() !== "" && !errorText(v)) return v.trim();
  return undefined;
}

/**
 * The titration of an AQ.CURVE (titrant, stock, sample volume, largest volume) or AQ.ADJUST
 * (titrant and stock) formula; undefined when the titrant is not a single text. Values that are not
 * usable are left out (the view keeps its own).
 */
export function titrationFromValues(fnId: string, titrant: CellValue[][] | null, conc: CellValue[][] | null, volume: CellValue[][] | null, maxVolume: CellValue[][] | null): TitrationSpec | undefined {
  const one = (v: CellValue[][] | null): CellValue => (v && v.length === 1 && v[0].length === 1 ? v[0][0] : null);
  const name = one(titrant);
  if (typeof name !== "string" || name.trim() === "" || errorText(name)) return undefined;
  const out: TitrationSpec = { titrant: name.trim() };
  const stock = withUnit(one(conc), "M");
  if (stock) out.stock = stock;
  if (fnId === "CURVE") {
    const sample = withUnit(one(volume), "mL");
    const max = withUnit(one(maxVolume), "mL");
    if (sample) out.sample = sample;
    if (max) out.maxVolume = max;
  }
  return out;
}
