/**
 * The constants a result was computed with, as a QA reviewer reads them: for each acid–base system
 * in the mixture, the entry in effect (its layer and what it overrides), and each step's pKa and
 * ΔrH° with its provenance — the pKa at the result's temperature beside the 25 °C value. Pure.
 */
import { DEFAULTS, thermodynamicPKa } from "../chem";
import type { Mixture } from "../chem";
import { describeProvenance, type Library, type LayerName, type SourceRecord, type SystemRecord, type ValueRecord } from "../library";
import { convertPKa } from "../library";

export interface AppliedValue {
  value: number;
  /** The library's provenance line (citation with locator, or the status and its reason). */
  source: string;
}

export interface AppliedStep {
  pKa: AppliedValue;
  /** pKa at I = 0 and the result's temperature (van 't Hoff), when that is not 25 °C. */
  pKaAtT?: number;
  dH?: AppliedValue;
  dCp?: AppliedValue;
  /** A pKa stored from a measurement at other conditions: the method of its conversion. */
  converted?: string;
}

export interface AppliedSystem {
  id: string;
  name: string;
  layer: LayerName;
  overrides: LayerName[];
  steps: AppliedStep[];
}

/** The systems of a mixture in the order they first appear, with the values in effect. */
export function appliedConstants(library: Library, mix: Mixture, temperatureC: number): AppliedSystem[] {
  const sources = (id: string): SourceRecord | undefined => library.get(id, "source")?.record as SourceRecord | undefined;
  const applied = (v: ValueRecord): AppliedValue => ({ value: v.value, source: describeProvenance(v, sources) });
  const out: AppliedSystem[] = [];
  for (const entry of mix) {
    for (const share of entry.component.systems) {
      const id = share.system.id;
      if (out.some((s) => s.id === id)) continue;
      const found = library.get(id, "system");
      if (!found) continue;
      const r = found.record as SystemRecord;
      out.push({
        id,
        name: r.name,
        layer: found.layer,
        overrides: [...found.overrides],
        steps: r.steps.map((s, k) => {
          const step: AppliedStep = { pKa: applied(s.pKa) };
          if (temperatureC !== DEFAULTS.temperatureC) {
            const t = thermodynamicPKa({ pKa: s.pKa.value, dH: s.dH?.value, dCp: s.dCp?.value }, temperatureC);
            if (t.ok) step.pKaAtT = t.value;
          }
          if (s.dH) step.dH = applied(s.dH);
          if (s.dCp) step.dCp = applied(s.dCp);
          if (s.pKa.measured) {
            const c = convertPKa(s.pKa.measured, s, r.topCharge, k);
            if (c.ok) step.converted = c.method;
          }
          return step;
        }),
      });
    }
  }
  return out;
}

const LAYER_WORD: Record<LayerName, string> = { builtin: "built-in", personal: "personal", workbook: "workbook" };

/** "phosphate — personal library (overrides built-in)" */
export function appliedHeading(s: AppliedSystem): string {
  return `${s.name} — ${LAYER_WORD[s.layer]} library${s.overrides.length ? ` (overrides ${s.overrides.map((l) => LAYER_WORD[l]).join(", ")})` : ""}`;
}

/** "step 2: pKa 7.1965 (at 37 °C: 7.152), ΔrH° 3.6 kJ/mol" with the sources, one line per step. */
export function appliedStepLine(s: AppliedSystem, k: number, temperatureC: number): string {
  const step = s.steps[k];
  const n = s.steps.length > 1 ? `step ${k + 1}: ` : "";
  const atT = step.pKaAtT !== undefined ? ` (at ${temperatureC} °C, I = 0: ${step.pKaAtT.toFixed(3)})` : "";
  const pKa = `pKa ${+step.pKa.value.toFixed(4)}${atT} [${step.pKa.source}]`;
  const dH = step.dH ? `; ΔrH° ${step.dH.value} kJ/mol [${step.dH.source}]` : temperatureC !== DEFAULTS.temperatureC ? "; no ΔrH°: pKa held at its 25 °C value" : "";
  const dCp = step.dCp ? `; ΔrCp° ${step.dCp.value} J/(K·mol) [${step.dCp.source}]` : "";
  const conv = step.converted ? `; ${step.converted}` : "";
  return `${n}${pKa}${dH}${dCp}${conv}`;
}
