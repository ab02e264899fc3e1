/**
 * The workbook library in the workbook's own settings (Excel `context.workbook.settings`,
 * ExcelApi 1.4): saved inside the file, private to the add-in, travels with the workbook.
 *
 * This is the only file of src/library that touches Office. It reads the `Excel` and `Office`
 * globals only when the factory is called, after checking they exist and that ExcelApi 1.4 is
 * supported, so importing it outside Excel (Node, a plain browser page) does nothing and the
 * factory returns null there.
 */
import { createBlobStorage } from "./blob";
import type { LibraryStorage, RawStore } from "./types";

export const WORKBOOK_LIBRARY_KEY = "protolyte.workbook-library";
/** Workbook settings are reported to fail around 1–2 MB: refuse above 2 MB. */
export const WORKBOOK_MAX_BYTES = 2 * 1024 * 1024;

/** The parts of the Excel API used here (structural, so tests can provide a fake). */
export interface SettingLike {
  readonly isNullObject: boolean;
  readonly value: unknown;
  load(propertyNames: string): unknown;
  delete(): void;
}
export interface SettingsContextLike {
  workbook: { settings: { getItemOrNullObject(key: string): SettingLike; add(key: string, value: string): unknown } };
  sync(): Promise<unknown>;
}
export type ExcelRun = <T>(batch: (context: SettingsContextLike) => Promise<T>) => Promise<T>;

interface OfficeGlobals {
  Excel?: { run?: (batch: (context: unknown) => Promise<unknown>) => Promise<unknown> };
  Office?: { context?: { requirements?: { isSetSupported(name: string, version: string): boolean } } };
}

/** Excel.run when running inside Excel with ExcelApi 1.4, else null. */
export function findExcelRun(globals: OfficeGlobals = globalThis as OfficeGlobals): ExcelRun | null {
  const excel = globals.Excel;
  if (typeof excel?.run !== "function") return null;
  try {
    const req = globals.Office?.context?.requirements;
    if (req && !req.isSetSupported("ExcelApi", "1.4")) return null;
  } catch {
    return null; // outside Office, isSetSupported throws
  }
  return excel.run.bind(excel) as unknown as ExcelRun;
}

/** Storage in workbook settings, or null when not running in Excel. */
export function createWorkbookSettingsStorage(options: { key?: string; run?: ExcelRun } = {}): LibraryStorage | null {
  const run = options.run ?? findExcelRun();
  if (!run) return null;
  const key = options.key ?? WORKBOOK_LIBRARY_KEY;
  const raw: RawStore = {
    read: () =>
      run(async (context) => {
        const item = context.workbook.settings.getItemOrNullObject(key);
        item.load("value");
        await context.sync();
        if (item.isNullObject) return null;
        return typeof item.value === "string" ? item.value : JSON.stringify(item.value);
      }),
    write: (text) =>
      run(async (context) => {
        context.workbook.settings.add(key, text);
        await context.sync();
      }),
    remove: () =>
      run(async (context) => {
        const item = context.workbook.settings.getItemOrNullObject(key);
        item.load("key");
        await context.sync();
        if (!item.isNullObject) {
          item.delete();
          await context.sync();
        }
      }),
  };
  return createBlobStorage("workbook-settings", raw, WORKBOOK_MAX_BYTES);
}
