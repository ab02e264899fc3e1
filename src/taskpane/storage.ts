/**
 * Where each user layer is kept, for the pane: the library's storage adapters (versioned blobs,
 * typed problems for damaged or newer data) plus a label people can read.
 *
 * Browser: the personal layer in localStorage; outside Excel the "workbook" layer is simulated in
 * localStorage under its own key and labelled "browser page (no workbook)". When localStorage is
 * refused, both live in memory for the session and the pane says so.
 * Excel: see excel-store.ts (workbook settings, then a full recalculation).
 */
import { createLocalStorageStorage, createMemoryStorage, PERSONAL_LIBRARY_KEY } from "../library";
import type { LibraryStorage, UserLayer, WebStorageLike } from "../library";

export interface PaneStore {
  /** Where the layer is kept, for people: "this workbook", "browser page (no workbook)". */
  readonly where: string;
  readonly storage: LibraryStorage;
  /** Run after the stored layer changed (Excel: recalculate); returns a warning, or null. */
  afterChange?(): Promise<string | null>;
}

export type PaneStores = Readonly<Record<UserLayer, PaneStore>>;

/** Only outside Excel: stands in for the workbook settings. */
export const BROWSER_WORKBOOK_KEY = "protolyte.workbook-library.browser-page";
export { PERSONAL_LIBRARY_KEY };

export const WHERE = {
  workbook: "this workbook",
  workbookSimulated: "browser page (no workbook)",
  personal: "personal, this browser",
  personalExcel: "personal, this computer",
  memory: "this session only",
} as const;

/** window.localStorage if it can be written, else null. */
export function usableLocalStorage(g: { localStorage?: WebStorageLike } = globalThis as { localStorage?: WebStorageLike }): WebStorageLike | null {
  try {
    const ls = g.localStorage;
    if (!ls) return null;
    const probe = "protolyte.probe";
    ls.setItem(probe, "1");
    ls.removeItem(probe);
    return ls;
  } catch {
    return null;
  }
}

export function personalStore(ls: WebStorageLike | null, inExcel: boolean): PaneStore {
  if (!ls) return { where: `personal, ${WHERE.memory}`, storage: createMemoryStorage() };
  return { where: inExcel ? WHERE.personalExcel : WHERE.personal, storage: createLocalStorageStorage({ storage: ls }) };
}

/** Both layers for a plain browser page. */
export function browserStores(ls: WebStorageLike | null): PaneStores {
  return {
    workbook: ls
      ? { where: WHERE.workbookSimulated, storage: createLocalStorageStorage({ storage: ls, key: BROWSER_WORKBOOK_KEY }) }
      : { where: `${WHERE.workbookSimulated}, ${WHERE.memory}`, storage: createMemoryStorage() },
    personal: personalStore(ls, false),
  };
}
