/**
 * Exports carry the constants fingerprint, the export time and the software version, in the file
 * (`exported`) and in its name, so that a file on a shared drive says what it holds before it is
 * opened; an import shows them before anything is applied. The stamp describes the file, not a
 * layer: it is dropped when a file is taken into a layer.
 */
import type { ExportStamp, LibraryDoc } from "./types";
import { SOFTWARE_NAME } from "./version";

/** `doc` stamped for export (a copy). */
export function stampExport(doc: LibraryDoc, fingerprint: string, what: string, now: Date = new Date()): LibraryDoc {
  const exported: ExportStamp = { at: now.toISOString(), fingerprint, software: SOFTWARE_NAME, what };
  return { ...doc, exported };
}

/** "protolyte-workbook-library_PL-1.0.0-02e22d0955_2026-12-02T1745Z.json". */
export function exportFileName(base: string, stamp: ExportStamp): string {
  const when = stamp.at.replace(/:\d{2}(\.\d+)?Z$/, "Z").replace(/[-:]/g, (c) => (c === ":" ? "" : "-"));
  return `${base}_${stamp.fingerprint}_${when}.json`;
}

/** A layer's copy of an imported file: without the file's export stamp. */
export function withoutStamp(doc: LibraryDoc): LibraryDoc {
  const copy = { ...doc };
  delete copy.exported;
  return copy;
}

/** The stamp in words: "exported 2026-12-02 17:45 UTC by Protolyte 0.1.0 from constants PL-…". */
export function describeStamp(stamp: ExportStamp | undefined): string {
  if (!stamp) return "The file carries no export stamp (no fingerprint, date or software version): it was not exported by this version of Protolyte.";
  const when = stamp.at.replace("T", " ").replace(/:\d{2}(\.\d+)?Z$/, " UTC");
  return `Exported ${when} by ${stamp.software}${stamp.what ? ` (${stamp.what})` : ""}, constants fingerprint ${stamp.fingerprint}.`;
}
