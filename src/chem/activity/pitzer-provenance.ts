/**
 * What the "pitzer" activity model holds for one library system or strong ion, for display (the
 * pane's Browse shows it beside the entry's own values): every parameter set that involves one of
 * its species, with its values, source and status (data/pitzer-parameters.ts), and the rule that
 * applies to a species without parameters of its own (the analogue rule or the Davies fallback,
 * both warned in a result and so by AQ.CHECK).
 *
 * Ion names come out in the library's formula notation ("HPO4^2-", "Na+"), which the pane writes
 * with subscripts and superscripts.
 */
import { ANALOGUES, BINARY, PSI, THETA, type ParameterStatus } from "../data/pitzer-parameters";
import { COVERED_IONS } from "./pitzer";
import { STRONG_ION_NAMES, SYSTEM_SPECIES_NAMES } from "./pitzer-ions";

export interface PitzerParameterLine {
  kind: "binary" | "theta" | "psi";
  /** The ions, formula notation: cation and anion (binary), a like-charged pair (θ), a triplet (ψ). */
  ions: string[];
  /** The values in words: "β0 = −0.0533, β1 = 0.0396, Cφ = 0.00795". */
  values: string;
  source: string;
  status: ParameterStatus;
  /** The status in words (PITZER_STATUS_TEXT) and the record's note, if any. */
  statusText: string;
  /** True for a value from memory, unverified: shown flagged, like the library's own such values. */
  flagged: boolean;
}

export interface PitzerCoverage {
  /** The charged species the model names for this entry, formula notation (empty: none). */
  species: string[];
  lines: PitzerParameterLine[];
  /** One per species without parameters of its own: the rule that applies (pitzerRuleText words it). */
  rules: PitzerRule[];
}

/** A species without parameters of its own: it borrows its analogue's, or (no analogue) takes the Davies γ. */
export interface PitzerRule {
  /** Formula notation; absent when the entry names no species for the model. */
  ion?: string;
  analogue?: string;
}

/** A rule in words; name writes a formula ("HPO4^2-") for display (the pane: subscripts, superscripts). */
export function pitzerRuleText(rule: PitzerRule, name: (formula: string) => string = (f) => f): string {
  if (rule.ion === undefined) return "The charged species of this entry have no Pitzer parameters here: the Davies γ is used for them (the fallback rule).";
  return rule.analogue !== undefined
    ? `${name(rule.ion)} has no published Pitzer parameters here: the parameters of ${name(rule.analogue)} are used (a stated rule of this engine, not published values).`
    : `${name(rule.ion)} has no Pitzer parameters here: the Davies γ is used (the fallback rule).`;
}

export const PITZER_STATUS_TEXT: Readonly<Record<ParameterStatus, string>> = {
  published: "seen in the publication",
  memory: "from memory, unverified",
};

/** "HPO4-2" → "HPO4^2-", "Na+" → "Na+", "Ca+2" → "Ca^2+". */
export function pitzerFormula(name: string): string {
  const m = /^(.*?)([+-])(\d*)$/.exec(name);
  if (!m) return name;
  return m[3] && m[3] !== "1" ? `${m[1]}^${m[3]}${m[2]}` : `${m[1]}${m[2]}`;
}

function num(v: number): string {
  return String(Number(v.toPrecision(4))).replace("-", "−");
}

function status(s: ParameterStatus, note: string | undefined): Pick<PitzerParameterLine, "status" | "statusText" | "flagged"> {
  const text = PITZER_STATUS_TEXT[s];
  const statusText = !note || note === text ? text : note.startsWith(text) ? note : `${text} (${note})`;
  return { status: s, statusText, flagged: s === "memory" };
}

/** The parameter sets and rules for a set of Pitzer ion names. */
function coverageOf(names: readonly string[]): PitzerCoverage {
  const own = new Set(names);
  const has = (ions: readonly string[]) => ions.some((n) => own.has(n));
  const lines: PitzerParameterLine[] = [];
  for (const p of BINARY) {
    if (!has([p.cation, p.anion])) continue;
    const values = [`β0 = ${num(p.beta0)}`, `β1 = ${num(p.beta1)}`, ...(p.beta2 !== undefined ? [`β2 = ${num(p.beta2)}`] : []), `Cφ = ${num(p.cphi)}`].join(", ");
    lines.push({ kind: "binary", ions: [p.cation, p.anion].map(pitzerFormula), values, source: p.source, ...status(p.status, p.note) });
  }
  for (const [kind, list] of [["theta", THETA], ["psi", PSI]] as const) {
    for (const p of list) {
      if (!has(p.ions)) continue;
      lines.push({ kind, ions: p.ions.map(pitzerFormula), values: `${kind === "theta" ? "θ" : "ψ"} = ${num(p.value)}`, source: p.source, ...status(p.status, p.note) });
    }
  }
  const rules: PitzerRule[] = [];
  for (const n of names) {
    const analogue = ANALOGUES[n];
    if (analogue) rules.push({ ion: pitzerFormula(n), analogue: pitzerFormula(analogue) });
    else if (!COVERED_IONS.has(n)) rules.push({ ion: pitzerFormula(n) });
  }
  return { species: names.map(pitzerFormula), lines, rules };
}

/** What the Pitzer model holds for a library system (by id) or strong ion (by id). */
export function pitzerCoverage(kind: "system" | "ion", id: string): PitzerCoverage {
  const names = kind === "ion" ? (STRONG_ION_NAMES[id] ? [STRONG_ION_NAMES[id]] : []) : (SYSTEM_SPECIES_NAMES[id] ?? []).filter((n): n is string => n !== null);
  if (names.length > 0) return coverageOf(names);
  return { species: [], lines: [], rules: [{}] };
}

/**
 * The parameter sets from memory, unverified, that act among these ions (Pitzer names, "HPO4-2"):
 * each as "Na⁺–acetate"-style text in formula notation, for a result's warnings (AQ.CHECK).
 * An ion that borrows an analogue's parameters is matched through its analogue.
 */
export function unverifiedParametersAmong(names: readonly string[]): string[] {
  const present = new Set(names.map((n) => ANALOGUES[n] ?? n));
  const out: string[] = [];
  for (const p of BINARY) if (p.status === "memory" && present.has(p.cation) && present.has(p.anion)) out.push(`${pitzerFormula(p.cation)}–${pitzerFormula(p.anion)}`);
  for (const [symbol, list] of [["θ", THETA], ["ψ", PSI]] as const) {
    for (const p of list) if (p.status === "memory" && p.ions.every((n) => present.has(n))) out.push(`${symbol}(${p.ions.map(pitzerFormula).join(", ")})`);
  }
  return out;
}
