/**
 * Storage of a user layer (workbook or personal library) as a versioned blob. Loading never throws
 * data away: anything unreadable comes back as a typed problem with the raw text, so the task pane
 * can offer to export it before resetting.
 */
import type { LibraryDoc } from "../types";

export const BLOB_FORMAT = "protolyte-stored-library";
export const BLOB_VERSION = 1;
/** Above this a save succeeds with a warning (workbook settings are reported to fail around 1–2 MB). */
export const WARN_BLOB_BYTES = 1024 * 1024;

export interface StoredBlob {
  format: typeof BLOB_FORMAT;
  blobVersion: typeof BLOB_VERSION;
  /** ISO 8601 time of the save. */
  savedAt: string;
  library: LibraryDoc;
}

export interface StorageProblem {
  ok: false;
  code: "corrupt" | "newer-version" | "unavailable" | "read-failed";
  message: string;
  /** What was stored, untouched (null when nothing could be read). */
  raw: string | null;
}

export type LoadResult = { ok: true; blob: StoredBlob | null } | StorageProblem;

export type SaveResult =
  | { ok: true; bytes: number; warnings: string[] }
  | { ok: false; code: "too-large" | "write-failed" | "unavailable" | "invalid"; message: string };

export interface LibraryStorage {
  readonly kind: "memory" | "local-storage" | "workbook-settings";
  load(): Promise<LoadResult>;
  save(blob: StoredBlob): Promise<SaveResult>;
  clear(): Promise<void>;
}

/** Where the text lives; adapters only move strings. */
export interface RawStore {
  read(): Promise<string | null>;
  write(text: string): Promise<void>;
  remove(): Promise<void>;
}
