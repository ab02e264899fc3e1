/**
 * Task pane entry. Finds out where it runs (Excel, or a plain browser page with office.js missing
 * or outside Office), picks the storage for the workbook and personal layers accordingly, loads
 * them, and starts the views.
 */
import { PaneController } from "./controller";
import { WorkbookSettingsStore, type ExcelApi } from "./excel-store";
import { detectHost } from "./host";
import { browserStorage, KeyValueLayerStore, STORAGE_KEYS, WHERE } from "./storage";
import { startApp } from "./app";

async function boot(): Promise<void> {
  const host = await detectHost();
  const { storage, persistent } = browserStorage();
  const personal = new KeyValueLayerStore("personal", host.kind === "excel" ? WHERE.personalExcel : WHERE.personal, storage, STORAGE_KEYS.personal);
  const workbook =
    host.kind === "excel"
      ? new WorkbookSettingsStore((globalThis as unknown as { Excel: ExcelApi }).Excel)
      : new KeyValueLayerStore("workbook", WHERE.workbookSimulated, storage, STORAGE_KEYS.workbookSimulated);
  const ctl = new PaneController(host, { workbook, personal }, persistent);
  await ctl.init();
  startApp(ctl);
}

function whenDomReady(run: () => void): void {
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", run, { once: true });
  else run();
}

whenDomReady(() => {
  boot().catch((e: unknown) => {
    const status = document.getElementById("status");
    if (status) status.textContent = `The pane could not start: ${e instanceof Error ? e.message : String(e)}`;
  });
});
