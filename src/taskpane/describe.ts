/**
 * Words for what the browser shows: layers, statuses, citations, value lines. Pure functions,
 * tested without a DOM; the views put the results into text nodes.
 */
import { convertPKa, describeProvenance, formatSource, LAYER_ORDER } from "../library";
import type { EntryKind, LayerName, MergedEntry, SourceRecord, SubstanceRecord, SystemRecord, IonRecord, ValueRecord } from "../library";
import { STATUS_LABEL } from "./forms";

export const LAYER_LABEL: Record<LayerName, string> = { builtin: "built-in", workbook: "workbook", personal: "personal" };

export const KIND_LABEL: Record<EntryKind, string> = {
  substance: "substance",
  system: "acid–base system",
  ion: "strong ion",
  source: "source",
  atomicWeight: "atomic weight",
};

/** A source as a reference (the library's wording, shared with reports), or the unknown key. */
export function citation(source: SourceRecord | undefined, id: string): string {
  return source ? formatSource(source) : `unknown source '${id}'`;
}

export interface ValueLine {
  /** "pKa", "ΔrH°", … */
  label: string;
  /** "7.5 kJ/mol" (dimensionless values without unit text). */
  amount: string;
  conditions: string;
  status: ValueRecord["status"];
  statusText: string;
  /** True for values a QA reviewer must not take as published. */
  flagged: boolean;
  /** The library's provenance line: citation with locator, or the reason for common practice / unverified. */
  provenance: string;
  /** A pKa converted from measured conditions: how, and that the conversion adds uncertainty. */
  conversion?: string;
}

export function valueLine(label: string, v: ValueRecord, sources: (id: string) => SourceRecord | undefined): ValueLine {
  const amount = v.unit === "1" ? String(v.value) : `${v.value} ${v.unit}`;
  return {
    label,
    amount,
    conditions: v.conditions,
    status: v.status,
    statusText: STATUS_LABEL[v.status],
    flagged: v.status !== "published",
    provenance: describeProvenance(v, sources),
  };
}

/**
 * A pKa line: one measured at other conditions shows its value at 25 °C, I = 0 (rounded; the
 * engine uses the full value), the conversion's method and why it adds uncertainty.
 */
export function pKaLine(label: string, system: SystemRecord, k: number, sources: (id: string) => SourceRecord | undefined): ValueLine {
  const step = system.steps[k];
  const line = valueLine(label, step.pKa, sources);
  const m = step.pKa.measured;
  if (m === undefined) return line;
  const c = convertPKa(m, step, system.topCharge, k);
  line.amount = String(+step.pKa.value.toFixed(4));
  line.conversion = c.ok ? `${c.method}. ${c.uncertainty}`.trim() : `cannot be converted: ${c.message}`;
  return line;
}

/** Every value of an entry, in reading order. */
export function valuesOf(entry: MergedEntry, sources: (id: string) => SourceRecord | undefined): ValueLine[] {
  switch (entry.kind) {
    case "system": {
      const r = entry.record as SystemRecord;
      return r.steps.flatMap((s, i) => {
        const n = r.steps.length > 1 ? ` (step ${i + 1})` : "";
        return [
          pKaLine(`pKa${n}`, r, i, sources),
          ...(s.dH ? [valueLine(`ΔrH°${n}`, s.dH, sources)] : []),
          ...(s.dCp ? [valueLine(`ΔrCp°${n}`, s.dCp, sources)] : []),
        ];
      });
    }
    case "substance": {
      const r = entry.record as SubstanceRecord;
      return r.molarMass ? [valueLine("molar mass", r.molarMass, sources)] : [];
    }
    case "atomicWeight":
      return [valueLine("atomic weight", entry.record as ValueRecord, sources)];
    default:
      return [];
  }
}

/** Display name of any entry. */
export function entryName(entry: MergedEntry): string {
  switch (entry.kind) {
    case "source":
      return (entry.record as SourceRecord).title;
    case "atomicWeight":
      return entry.id;
    default:
      return (entry.record as SystemRecord | SubstanceRecord | IonRecord).name;
  }
}

/** One short line under the name. */
export function entrySummary(entry: MergedEntry): string {
  switch (entry.kind) {
    case "system": {
      const r = entry.record as SystemRecord;
      return `pKa ${r.steps.map((s) => +s.pKa.value.toFixed(4)).join(", ")}; top charge ${r.topCharge > 0 ? "+" : ""}${r.topCharge}`;
    }
    case "substance": {
      const r = entry.record as SubstanceRecord;
      return [r.formula, r.nature.replace(/-/g, " "), r.state].filter(Boolean).join(" · ");
    }
    case "ion": {
      const r = entry.record as IonRecord;
      return `${r.formula ?? r.id}, charge ${r.charge > 0 ? "+" : ""}${r.charge}`;
    }
    case "source": {
      const r = entry.record as SourceRecord;
      return [r.authors, r.year].filter(Boolean).join(", ");
    }
    case "atomicWeight":
      return `${(entry.record as ValueRecord).value} g/mol`;
  }
}

/** "overrides the built-in entry", or "" */
export function overrideText(entry: MergedEntry): string {
  if (entry.overrides.length === 0) return "";
  return `overrides the ${entry.overrides.map((l) => LAYER_LABEL[l]).join(" and ")} entry`;
}

/** Lower-cased text a search matches against. */
export function searchText(entry: MergedEntry): string {
  const parts = [entry.id, entryName(entry), entrySummary(entry)];
  if (entry.kind === "substance") parts.push(...((entry.record as SubstanceRecord).aliases ?? []));
  if (entry.kind === "system") parts.push(...((entry.record as SystemRecord).speciesNames ?? []));
  if (entry.kind === "source") parts.push((entry.record as SourceRecord).container ?? "");
  return parts.join(" \u0001 ").toLowerCase();
}

const KIND_ORDER: readonly EntryKind[] = ["substance", "system", "ion", "source", "atomicWeight"];
const LAYER_FIRST: readonly LayerName[] = [...LAYER_ORDER].reverse();

/**
 * Entries whose text contains every word of the query (case-insensitive): exact names first, then
 * names that start with the query, then the rest; within each, substances, systems, ions, sources
 * and atomic weights, and the user's own entries before built-in ones.
 */
export function filterEntries(entries: readonly MergedEntry[], query: string, kind: EntryKind | "all", layer: LayerName | "all" = "all"): MergedEntry[] {
  const words = query.toLowerCase().split(/\s+/).filter((w) => w !== "");
  const q = words.join(" ");
  // 0: the query is a name (id, name or alias) exactly; 1: a name starts with it; 2: it is found elsewhere
  const rankOf = (e: MergedEntry): number => {
    if (q === "") return 2;
    const names = [e.id, entryName(e), ...(e.kind === "substance" ? ((e.record as SubstanceRecord).aliases ?? []) : [])].map((n) => n.toLowerCase());
    return names.includes(q) ? 0 : names.some((n) => n.startsWith(q)) ? 1 : 2;
  };
  return entries
    .filter((e) => (kind === "all" || e.kind === kind) && (layer === "all" || e.layer === layer) && words.every((w) => searchText(e).includes(w)))
    .map((e, i) => ({ e, i, r: rankOf(e) }))
    .sort((a, b) => a.r - b.r || KIND_ORDER.indexOf(a.e.kind) - KIND_ORDER.indexOf(b.e.kind) || LAYER_FIRST.indexOf(a.e.layer) - LAYER_FIRST.indexOf(b.e.layer) || a.i - b.i)
    .map((x) => x.e);
}
