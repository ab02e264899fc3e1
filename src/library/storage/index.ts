/** Storage adapters for user layers. */
export * from "./types";
export { makeBlob, encodeBlob, decodeBlob, createBlobStorage } from "./blob";
export { createMemoryStorage, type MemoryStorage } from "./memory";
export { createLocalStorageStorage, PERSONAL_LIBRARY_KEY, type WebStorageLike } from "./local-storage";
export { createWorkbookSettingsStorage, findExcelRun, WORKBOOK_LIBRARY_KEY, WORKBOOK_MAX_BYTES } from "./workbook-settings";
export type { ExcelRun, SettingsContextLike, SettingLike } from "./workbook-settings";
export { loadLayer, saveLayer, type SaveLayerResult } from "./layer-storage";
