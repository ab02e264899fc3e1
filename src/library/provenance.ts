/**
 * One line of provenance for a value, as the task pane and reports show it:
 * "Goldberg, Kishore & Lennen 2002, J. Phys. Chem. Ref. Data 31, 231 — entry: acetic acid (cross-checked …)".
 */
import type { SourceRecord, ValueRecord } from "./types";

/** "R. N. Goldberg, N. Kishore, R. M. Lennen, Thermodynamic quantities … Journal …, 31, 231 (2002)". */
export function formatSource(s: SourceRecord): string {
  const head = [s.authors, s.title].filter(Boolean).join(", ");
  const where = [s.container, s.edition, s.volume, s.pages].filter(Boolean).join(", ");
  const year = s.year !== undefined ? ` (${s.year})` : "";
  const link = s.doi ? `, doi:${s.doi}` : s.url ? `, ${s.url}` : "";
  return `${head}${where ? `. ${where}` : ""}${year}${link}`;
}

/** Provenance of one value in words; `lookup` finds a source by id (in the library in effect). */
export function describeProvenance(v: ValueRecord, lookup: (id: string) => SourceRecord | undefined): string {
  const src = v.source !== undefined ? lookup(v.source) : undefined;
  const cited = v.source === undefined ? "" : src ? formatSource(src) : `unknown source '${v.source}'`;
  const located = cited && v.locator ? `${cited} — ${v.locator}` : cited;
  switch (v.status) {
    case "published":
      return v.note ? `${located} (${v.note})` : located;
    case "entered": {
      const said = v.note ? `entered by the user: ${v.note}` : "entered by the user";
      return located ? `${said} [${located}]` : said;
    }
    case "common-practice":
      return located ? `common practice: ${v.note ?? ""} [${located}]` : v.note ?? "common practice";
    default: {
      const why = v.note ?? "from memory, unverified";
      const marked = /unverified/.test(why) ? why : `from memory, unverified: ${why}`;
      return located ? `${marked} [${located}]` : marked;
    }
  }
}

/**
 * A value record revised by a user. A changed number keeps no part of the old value's provenance
 * that the user did not renew: the citation (source and locator) and the note go, and the status
 * becomes "entered" — unless the user gave a new source and locator (their status stays), or chose
 * another status with a new note. Derived notes (a pKb conversion) are added back by the caller,
 * recomputed. `reset` says what was dropped, for the user to read; null when nothing was.
 */
export function reviseValue(old: ValueRecord | undefined, next: ValueRecord): { record: ValueRecord; reset: string | null } {
  if (!old || next.value === old.value) return { record: next, reset: null };
  const cited = next.source !== undefined && next.locator !== undefined && (next.source !== old.source || next.locator !== old.locator);
  if (cited) return { record: next, reset: null };
  const record: ValueRecord = { value: next.value, unit: next.unit, conditions: next.conditions, status: next.status };
  if (next.measured !== undefined) record.measured = next.measured;
  const newNote = next.note !== undefined && next.note !== old.note ? next.note : undefined;
  const chosen = next.status !== old.status && next.status !== "published" && newNote !== undefined;
  if (!chosen) record.status = "entered";
  if (newNote !== undefined) record.note = newNote;
  if (next.source !== undefined && next.source !== old.source) record.source = next.source;
  const dropped = [old.source !== undefined ? `source '${old.source}'${old.locator ? ` — ${old.locator}` : ""}` : "", old.note && newNote === undefined ? `note '${old.note}'` : ""].filter(Boolean);
  const now = record.status === "entered" ? "entered by the user" : record.status;
  const reset = `${old.value} → ${next.value}: ${dropped.length ? `the old value's ${dropped.join(" and ")} no longer ${dropped.length > 1 ? "apply" : "applies"}; ` : ""}now '${now}' (give a source and locator for the new value to cite it)`;
  return { record, reset };
}
