/**
 * The constants library a workbook carries. The add-in keeps it in the workbook's settings
 * (src/library/storage/workbook-settings.ts), which Excel saves inside the .xlsx as a web-extension
 * part: `xl/webextensions/webextension<N>.xml`, one per add-in, naming the add-in in
 * `<we:reference id="…">` (the manifest's Id) and holding each setting as
 * `<we:property name="KEY" value="JSON text, XML-escaped"/>` ([MS-OWEXML] 2.2.2, 2.2.5, 2.2.7).
 * Only the part whose reference is Protolyte's is read, never another add-in's. The layout was
 * checked against the published schema and against files written by our own storage code, not
 * against a file saved by Excel (none was available).
 */
import { createBlobStorage, WORKBOOK_LIBRARY_KEY, WORKBOOK_MAX_BYTES } from "../library";
import { listZip, readZipEntry, type ZipEntry } from "./zip";

/** Protolyte's manifest Id (manifest.xml <Id>; a test checks they agree). */
export const ADDIN_ID = "6d82ec34-bc18-479a-a689-1b7e89affad1";

const PART = /^xl\/webextensions\/webextension\d*\.xml$/i;

function unescapeXml(text: string): string {
  return text.replace(/&(?:#x([0-9a-f]+)|#(\d+)|(quot|amp|lt|gt|apos));/gi, (m, hex?: string, dec?: string, named?: string) => {
    if (hex !== undefined) return String.fromCodePoint(parseInt(hex, 16));
    if (dec !== undefined) return String.fromCodePoint(parseInt(dec, 10));
    return ({ quot: '"', amp: "&", lt: "<", gt: ">", apos: "'" } as Record<string, string>)[named!.toLowerCase()] ?? m;
  });
}

function attributes(tag: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const m of tag.matchAll(/([\w:.-]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g)) out.set(m[1] as string, unescapeXml(m[2] ?? m[3] ?? ""));
  return out;
}

const normaliseId = (id: string): string => id.replace(/[{}]/g, "").trim().toLowerCase();

/** The settings of Protolyte's web-extension part (name → stored JSON text), or null when the workbook has none. */
export function readAddinSettings(buffer: Buffer, entries: readonly ZipEntry[] = listZip(buffer)): Map<string, string> | null {
  for (const entry of entries) {
    if (!PART.test(entry.name) || entry.uncompressedSize > 4 * WORKBOOK_MAX_BYTES) continue;
    const xml = readZipEntry(buffer, entry).toString("utf8");
    const reference = /<(?:[\w.-]+:)?reference\b([^>]*)>/.exec(xml);
    const id = reference ? attributes(reference[1] as string).get("id") : undefined;
    if (id === undefined || normaliseId(id) !== ADDIN_ID) continue;
    const settings = new Map<string, string>();
    for (const m of xml.matchAll(/<(?:[\w.-]+:)?property\b([^>]*?)\/?>/g)) {
      const attrs = attributes(m[1] as string);
      const name = attrs.get("name");
      const value = attrs.get("value");
      if (name !== undefined && value !== undefined) settings.set(name, value);
    }
    return settings;
  }
  return null;
}

/**
 * The stored text of the workbook library as the add-in's storage wrote it: a setting's value is
 * the JSON serialisation of what the add-in passed to settings.add (a string of JSON).
 */
export function workbookLibraryText(settings: Map<string, string> | null): string | null {
  const value = settings?.get(WORKBOOK_LIBRARY_KEY);
  if (value === undefined) return null;
  try {
    const parsed: unknown = JSON.parse(value);
    return typeof parsed === "string" ? parsed : JSON.stringify(parsed);
  } catch {
    return value; // not JSON: handed on as it is, and the storage's decoder reports it damaged
  }
}

/** The library storage over a workbook's stored text: the very decoder the task pane uses. */
export function workbookStorage(text: string | null) {
  return createBlobStorage("workbook-settings", {
    read: async () => text,
    write: async () => {
      throw new Error("the command line never writes into a workbook");
    },
    remove: async () => undefined,
  }, WORKBOOK_MAX_BYTES);
}
