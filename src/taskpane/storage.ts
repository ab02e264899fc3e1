/**
 * Where each user layer is kept. The pane stores the layer as the text of a library file
 * (our own format, which carries its schemaVersion), so what is stored can always be exported
 * as it is, even when it can no longer be read.
 *
 * Browser: the personal layer in localStorage; outside Excel the "workbook" layer is simulated in
 * localStorage under its own key and labelled "browser page (no workbook)".
 * Excel: see excel-store.ts (workbook settings, then a full recalculation).
 */
import type { UserLayer } from "../library";

export interface LayerStore {
  readonly layer: UserLayer;
  /** Where the layer is kept, for people: "this workbook", "browser page (no workbook)". */
  readonly where: string;
  /** The stored text, or null when nothing is stored. */
  load(): Promise<string | null>;
  /** Store the text (null removes it). Rejects with a message a person can act on. */
  save(text: string | null): Promise<void>;
}

export const STORAGE_KEYS = {
  personal: "protolyte.library.personal",
  /** Only outside Excel: stands in for the workbook settings. */
  workbookSimulated: "protolyte.library.workbook-simulated",
} as const;

export interface KeyValueStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

/** A store on localStorage (or anything with the same three methods). */
export class KeyValueLayerStore implements LayerStore {
  constructor(
    readonly layer: UserLayer,
    readonly where: string,
    private readonly storage: KeyValueStorage,
    private readonly key: string,
  ) {}

  async load(): Promise<string | null> {
    return this.storage.getItem(this.key);
  }

  async save(text: string | null): Promise<void> {
    try {
      if (text === null) this.storage.removeItem(this.key);
      else this.storage.setItem(this.key, text);
    } catch (e) {
      const why = e instanceof Error ? e.message : String(e);
      throw new Error(`the ${this.where} library could not be stored (${why}); browser storage may be full or disabled`);
    }
  }
}

/** In memory only: when the browser refuses localStorage (private modes, policies). */
export class MemoryStorage implements KeyValueStorage {
  private readonly map = new Map<string, string>();
  getItem(key: string): string | null {
    return this.map.has(key) ? (this.map.get(key) as string) : null;
  }
  setItem(key: string, value: string): void {
    this.map.set(key, value);
  }
  removeItem(key: string): void {
    this.map.delete(key);
  }
}

/** window.localStorage if it works, else memory (with `persistent: false` so the pane can say so). */
export function browserStorage(g: { localStorage?: KeyValueStorage } = globalThis as { localStorage?: KeyValueStorage }): { storage: KeyValueStorage; persistent: boolean } {
  try {
    const ls = g.localStorage;
    if (ls) {
      const probe = "protolyte.probe";
      ls.setItem(probe, "1");
      ls.removeItem(probe);
      return { storage: ls, persistent: true };
    }
  } catch {
    // fall through to memory
  }
  return { storage: new MemoryStorage(), persistent: false };
}

export const WHERE = {
  workbook: "this workbook",
  workbookSimulated: "browser page (no workbook)",
  personal: "personal (this browser)",
  personalExcel: "personal (this computer)",
} as const;
