/**
 * Task pane entry. Finds out where it runs (Excel, or a plain browser page with office.js missing
 * or outside Office), picks the storage for the workbook and personal layers accordingly, loads
 * them, and starts the views.
 */
import { findExcelRun } from "../library";
import { startApp } from "./app";
import { PaneController } from "./controller";
import { workbookStore, type ExcelApi } from "./excel-store";
import type { SelectionExcel } from "./excel-selection";
import { detectHost, type HostInfo } from "./host";
import { browserStores, personalStore, usableLocalStorage, type PaneStores } from "./storage";

function storesFor(host: HostInfo): { host: HostInfo; stores: PaneStores } {
  const ls = usableLocalStorage();
  if (host.kind === "excel") {
    const excel = (globalThis as unknown as { Excel: ExcelApi }).Excel;
    const run = findExcelRun();
    const workbook = run ? workbookStore(excel, run) : null;
    if (workbook) return { host, stores: { workbook, personal: personalStore(ls, true) } };
    return {
      host: { kind: "browser", reason: "other-host", detail: "This Excel has no workbook settings (ExcelApi 1.4): the workbook library is kept in browser storage instead" },
      stores: browserStores(ls),
    };
  }
  return { host, stores: browserStores(ls) };
}

async function boot(): Promise<void> {
  const detected = await detectHost();
  const { host, stores } = storesFor(detected);
  const ctl = new PaneController(host, stores, usableLocalStorage() !== null);
  await ctl.init();
  const excel = detected.kind === "excel" ? (globalThis as unknown as { Excel: SelectionExcel }).Excel : null;
  startApp(ctl, { excel });
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
