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
    case "common-practice":
      return located ? `common practice: ${v.note ?? ""} [${located}]` : v.note ?? "common practice";
    default: {
      const why = v.note ?? "from memory, unverified";
      const marked = /unverified/.test(why) ? why : `from memory, unverified: ${why}`;
      return located ? `${marked} [${located}]` : marked;
    }
  }
}
