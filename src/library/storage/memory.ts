/** In-memory storage: tests, and a session without any persistent store. */
import { createBlobStorage } from "./blob";
import type { LibraryStorage } from "./types";

export interface MemoryStorage extends LibraryStorage {
  /** The stored text as it is (for tests and diagnostics). */
  peek(): string | null;
}

export function createMemoryStorage(initialText: string | null = null, maxBytes?: number): MemoryStorage {
  let text = initialText;
  const storage = createBlobStorage(
    "memory",
    {
      read: async () => text,
      write: async (t) => {
        text = t;
      },
      remove: async () => {
        text = null;
      },
    },
    maxBytes,
  );
  return { ...storage, peek: () => text };
}
