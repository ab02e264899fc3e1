/**
 * The "try it" calculation: names and amounts → pH, through the library in effect and the same
 * engine the spreadsheet functions use (src/chem), so an entry added in the pane is seen at work.
 */
import { assessBuffering, parseQuantity, readTemperature, solveEquilibrium, DEFAULTS } from "../chem";
import type { AcidBaseSystem, ActivityModel, BufferAssessment, BufferVerdict, Mixture, Regime } from "../chem";
import type { Library, LayerName } from "../library";
import { appliedConstants, type AppliedSystem } from "./applied";

export interface TryRow {
  name: string;
  /** mol/L, or text with a unit ("25 mM", "2.1 g/L"). */
  amount: string;
}

export interface TryIssue {
  /** Row index, or -1 for the temperature / the whole mixture. */
  row: number;
  field: "name" | "amount" | "temperature" | "mixture";
  message: string;
}

export type TryResult =
  | {
      ok: true;
      pH: number;
      pcH: number;
      ionicStrength: number;
      regime: Regime;
      temperatureC: number;
      warnings: string[];
      /** Which library entry each row used. */
      used: UsedEntry[];
      /** The acid–base systems and the values applied, with layer and provenance. */
      applied: AppliedSystem[];
      /** AQ.CHECK's buffer rule (src/chem/buffering.ts). */
      buffering: BufferAssessment;
    }
  | { ok: false; issues: TryIssue[] };

export const REGIME_TEXT: Record<Regime, string> = {
  buffer: "buffered",
  "excess-strong-acid": "excess strong acid: no longer a buffer",
  "excess-strong-base": "excess strong base: no longer a buffer",
  "no-buffer": "no buffering system",
};

/** Words for the buffer verdict of AQ.CHECK's rule (a plain weak acid is not "buffered"). */
export function bufferingText(a: BufferAssessment): string {
  const near = a.nearest ? ` (pH within ±1 of pKa′ ${a.nearest.pKa.toFixed(2)} of ${a.nearest.system})` : "";
  const words: Record<BufferVerdict, string> = {
    buffer: `buffered${near}`,
    weak: "weakly buffered (pH 1–2 units from the nearest pKa′)",
    "not-buffered": "not buffered (the free H⁺ or OH⁻ carries most of the buffer value, or the pH is far from every pKa′)",
    "no-system": "no buffering system",
    "excess-strong-acid": REGIME_TEXT["excess-strong-acid"],
    "excess-strong-base": REGIME_TEXT["excess-strong-base"],
  };
  return words[a.verdict];
}

export type UsedEntry = { row: number; id: string; name: string; layer: LayerName; overrides: LayerName[] };

export type PaneMixtureResult = { ok: true; mix: Mixture; temperatureC: number; used: UsedEntry[] } | { ok: false; issues: TryIssue[] };

/** Rows and temperature text → the engine's mixture through the library in effect (no solving). */
export function parsePaneMixture(library: Library, rows: readonly TryRow[], temperatureText: string): PaneMixtureResult {
  const issues: TryIssue[] = [];
  const mix: Mixture = [];
  const used: UsedEntry[] = [];
  let temperatureC: number = DEFAULTS.temperatureC;
  const t = readTemperature(temperatureText);
  if (!t.ok) issues.push({ row: -1, field: "temperature", message: t.message });
  else temperatureC = t.value;
  rows.forEach((row, i) => {
    if (row.name.trim() === "" && row.amount.trim() === "") return;
    const found = library.resolve(row.name);
    if (!found.ok) {
      issues.push({ row: i, field: "name", message: found.message });
      return;
    }
    const q = parseQuantity(row.amount, "concentration", { molarMass: found.component.molarMass });
    if (!q.ok) {
      issues.push({ row: i, field: "amount", message: q.message });
      return;
    }
    mix.push({ component: found.component, conc: q.value });
    used.push({ row: i, id: found.entry.id, name: found.entry.record.name, layer: found.entry.layer, overrides: found.entry.overrides });
  });
  if (issues.length) return { ok: false, issues };
  if (mix.length === 0) return { ok: false, issues: [{ row: -1, field: "mixture", message: "enter at least one substance and its amount" }] };
  return { ok: true, mix, temperatureC, used };
}

export function tryMixture(library: Library, rows: readonly TryRow[], temperatureText: string, activity: ActivityModel = DEFAULTS.activity): TryResult {
  const m = parsePaneMixture(library, rows, temperatureText);
  if (!m.ok) return m;
  const { mix, temperatureC, used } = m;
  const r = solveEquilibrium(mix, { temperatureC, activity });
  if (!r.ok) return { ok: false, issues: [{ row: -1, field: "mixture", message: r.message }] };
  const systems: AcidBaseSystem[] = [];
  for (const e of mix) for (const share of e.component.systems) if (!systems.some((x) => x.id === share.system.id)) systems.push(share.system);
  const buffering = assessBuffering(r, systems, temperatureC, activity);
  return { ok: true, pH: r.pH, pcH: r.pcH, ionicStrength: r.ionicStrength, regime: r.regime, temperatureC, warnings: r.warnings, used, applied: appliedConstants(library, mix, temperatureC), buffering };
}
