/**
 * Encoding and decoding of stored blobs, and the one storage implementation every adapter shares:
 * adapters differ only in where the text lives (RawStore).
 */
import { MAX_LIBRARY_BYTES, utf8Length } from "../io";
import type { LibraryDoc } from "../types";
import { validateLibraryDoc } from "../validate";
import {
  BLOB_FORMAT,
  BLOB_VERSION,
  WARN_BLOB_BYTES,
  type LibraryStorage,
  type LoadResult,
  type RawStore,
  type SaveResult,
  type StoredBlob,
} from "./types";

/** A blob for a library, stamped with the time of saving. */
export function makeBlob(library: LibraryDoc, now: Date = new Date()): StoredBlob {
  return { format: BLOB_FORMAT, blobVersion: BLOB_VERSION, savedAt: now.toISOString(), library };
}

/** Compact JSON: stored blobs are kept small. */
export function encodeBlob(blob: StoredBlob): string {
  return JSON.stringify(blob);
}

const corrupt = (raw: string, message: string): LoadResult => ({ ok: false, code: "corrupt", message, raw });

/** Stored text → blob, or a problem that keeps the raw text. References are checked later, by the merged library. */
export function decodeBlob(raw: string | null): LoadResult {
  if (raw === null) return { ok: true, blob: null };
  let value: unknown;
  try {
    value = JSON.parse(raw);
  } catch (e) {
    return corrupt(raw, `the stored library is not valid JSON (${(e as Error).message})`);
  }
  if (typeof value !== "object" || value === null || Array.isArray(value) || (value as { format?: unknown }).format !== BLOB_FORMAT) {
    return corrupt(raw, "the stored data is not a Protolyte library");
  }
  const v = value as Partial<StoredBlob> & { blobVersion?: unknown };
  if (typeof v.blobVersion === "number" && Number.isInteger(v.blobVersion) && v.blobVersion > BLOB_VERSION) {
    return { ok: false, code: "newer-version", message: `the stored library was saved by a newer Protolyte (storage version ${v.blobVersion}); update Protolyte to use it`, raw };
  }
  if (v.blobVersion !== BLOB_VERSION) return corrupt(raw, `unknown storage version ${JSON.stringify(v.blobVersion)}`);
  if (typeof v.savedAt !== "string") return corrupt(raw, "the stored library has no save time");
  const checked = validateLibraryDoc(v.library, [], { ignoreReferences: true });
  if (!checked.ok) {
    if (checked.code === "newer-version") return { ok: false, code: "newer-version", message: `the stored library ${checked.message}`, raw };
    return corrupt(raw, `the stored library is damaged: ${checked.lines.slice(0, 3).join("; ")}${checked.lines.length > 3 ? ` (and ${checked.lines.length - 3} more)` : ""}`);
  }
  return { ok: true, blob: { format: BLOB_FORMAT, blobVersion: BLOB_VERSION, savedAt: v.savedAt, library: checked.doc } };
}

const mb = (bytes: number): string => `${(bytes / (1024 * 1024)).toFixed(2)} MB`;

/** A LibraryStorage over a RawStore: size checks on save, typed problems on load, never a throw. */
export function createBlobStorage(kind: LibraryStorage["kind"], raw: RawStore, maxBytes = MAX_LIBRARY_BYTES): LibraryStorage {
  return {
    kind,
    async load(): Promise<LoadResult> {
      let text: string | null;
      try {
        text = await raw.read();
      } catch (e) {
        return { ok: false, code: "read-failed", message: `could not read the stored library: ${(e as Error).message ?? e}`, raw: null };
      }
      return decodeBlob(text);
    },
    async save(blob: StoredBlob): Promise<SaveResult> {
      const text = encodeBlob(blob);
      const bytes = utf8Length(text);
      if (bytes > maxBytes) {
        return { ok: false, code: "too-large", message: `the library is ${mb(bytes)}; this storage holds at most ${mb(maxBytes)}. Remove entries or export it to a file.` };
      }
      try {
        await raw.write(text);
      } catch (e) {
        return { ok: false, code: "write-failed", message: `could not save the library: ${(e as Error).message ?? e}` };
      }
      const warnings = bytes > WARN_BLOB_BYTES ? [`the stored library is ${mb(bytes)}; above about 1 MB saving may fail in some Excel versions`] : [];
      return { ok: true, bytes, warnings };
    },
    async clear(): Promise<void> {
      await raw.remove();
    },
  };
}
