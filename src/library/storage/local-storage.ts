/**
 * The personal library in browser storage (window.localStorage): per user and machine, it does not
 * travel with workbooks. Where localStorage is missing or blocked, every call reports "unavailable".
 */
import { createBlobStorage } from "./blob";
import type { LibraryStorage, RawStore } from "./types";

export const PERSONAL_LIBRARY_KEY = "protolyte.personal-library";

/** The parts of the Web Storage API used here. */
export interface WebStorageLike {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

function defaultStorage(): WebStorageLike | null {
  try {
    const ls = (globalThis as { localStorage?: WebStorageLike }).localStorage;
    return ls ?? null;
  } catch {
    return null; // access itself can throw (SecurityError) when storage is blocked
  }
}

export function createLocalStorageStorage(options: { key?: string; storage?: WebStorageLike | null } = {}): LibraryStorage {
  const key = options.key ?? PERSONAL_LIBRARY_KEY;
  const store = options.storage === undefined ? defaultStorage() : options.storage;
  const unavailable = "browser storage is not available here";
  const raw: RawStore = {
    read: async () => {
      if (!store) throw new Error(unavailable);
      return store.getItem(key);
    },
    write: async (text) => {
      if (!store) throw new Error(unavailable);
      store.setItem(key, text);
    },
    remove: async () => {
      store?.removeItem(key);
    },
  };
  const inner = createBlobStorage("local-storage", raw);
  if (store) return inner;
  return {
    kind: "local-storage",
    load: async () => ({ ok: false, code: "unavailable", message: unavailable, raw: null }),
    save: async () => ({ ok: false, code: "unavailable", message: unavailable }),
    clear: async () => undefined,
  };
}
