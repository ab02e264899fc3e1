/**
 * Everything the Picture view draws, computed without the DOM: a mixture (rows as the try-it panel
 * or a formula gives them) → its speciation over pH 0–14 and its titration curve, through the
 * library in effect. Pure.
 */
import { parseQuantity, STRONG_ACID, STRONG_BASE } from "../../chem";
import type { ActivityModel, Component } from "../../chem";
import type { Library } from "../../library";
import { parsePaneMixture, type TryRow, type UsedEntry } from "../tryit";
import { speciation, type SpeciationData } from "./speciation";
import { titration, TITRATION_DEFAULTS, type TitrantName, type TitrationData } from "./titration";

export interface PictureRequest {
  rows: readonly TryRow[];
  /** °C as text, "" for 25 °C. */
  temperature: string;
  activity?: ActivityModel;
  titrant?: TitrantName | "auto";
  /** Stock concentration as text ("0.1", "100 mM"); "" for 0.1 mol/L. */
  stock?: string;
  /** Sample volume as text ("10 mL"); "" for 10 mL. */
  sample?: string;
  /** Largest titrant volume as text ("30 mL"), as an AQ.CURVE formula sets it; absent: found from the mixture. */
  maxVolume?: string;
}

export type Picture =
  | {
      ok: true;
      speciation: SpeciationData;
      titration: { ok: true; data: TitrationData } | { ok: false; message: string };
      used: UsedEntry[];
    }
  | { ok: false; issues: string[] };

/** NaOH and HCl as the library in effect has them (their Na⁺ and Cl⁻ then merge with the mixture's). */
export function titrants(library: Library): Record<TitrantName, Component> {
  const base = library.resolve("sodium hydroxide");
  const acid = library.resolve("hydrochloric acid");
  return { NaOH: base.ok ? base.component : STRONG_BASE, HCl: acid.ok ? acid.component : STRONG_ACID };
}

/** "NaOH", "caustic soda", "HCl" … → which of the two titrants the name is in the library, or null. */
export function titrantOf(library: Library, name: string): TitrantName | null {
  const found = library.resolve(name);
  if (!found.ok) return null;
  for (const [t, canonical] of [["NaOH", "sodium hydroxide"], ["HCl", "hydrochloric acid"]] as const) {
    const c = library.resolve(canonical);
    if (c.ok && c.entry.id === found.entry.id) return t;
  }
  return null;
}

function positive(text: string | undefined, fallback: number, what: string, dimension: "concentration" | "volume"): { ok: true; value: number } | { ok: false; message: string } {
  if (text === undefined || text.trim() === "") return { ok: true, value: fallback };
  const q = parseQuantity(text, dimension);
  if (!q.ok) return { ok: false, message: `${what}: ${q.message}` };
  if (!(q.value > 0)) return { ok: false, message: `${what} must be more than 0` };
  return { ok: true, value: q.value };
}

export function pictureOf(library: Library, req: PictureRequest): Picture {
  const m = parsePaneMixture(library, req.rows, req.temperature);
  if (!m.ok) return { ok: false, issues: m.issues.map((i) => (i.row >= 0 ? `row ${i.row + 1} (${i.field}): ${i.message}` : i.message)) };
  const sp = speciation(m.mix, { temperatureC: m.temperatureC, activity: req.activity });
  if (!sp.ok) return { ok: false, issues: [sp.message] };
  const stock = positive(req.stock, TITRATION_DEFAULTS.stockConc, "titrant stock", "concentration");
  const sample = positive(req.sample, TITRATION_DEFAULTS.sampleVolume, "sample volume", "volume");
  const max = req.maxVolume === undefined ? ({ ok: true, value: undefined } as const) : positive(req.maxVolume, NaN, "largest titrant volume", "volume");
  let t: Extract<Picture, { ok: true }>["titration"];
  if (!stock.ok) t = stock;
  else if (!sample.ok) t = sample;
  else if (!max.ok) t = max;
  else {
    const r = titration(m.mix, titrants(library), sp, { titrant: req.titrant ?? "auto", stockConc: stock.value, sampleVolume: sample.value, maxVolume: max.value });
    t = r.ok ? { ok: true, data: r } : { ok: false, message: r.message };
  }
  return { ok: true, speciation: sp, titration: t, used: m.used };
}
