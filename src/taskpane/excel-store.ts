/**
 * The workbook layer inside Excel: the library's workbook-settings adapter (ExcelApi 1.4: stored in
 * the file, private to the add-in). After every change the whole workbook is recalculated: Excel
 * does not re-run non-volatile custom functions when hidden state changes (F9 does not either), so
 * without it cells would keep values computed with the old constants.
 */
import { createWorkbookSettingsStorage, type ExcelRun } from "../library";
import type { PaneStore } from "./storage";
import { WHERE } from "./storage";

/** The part of the Excel namespace the pane uses (the real `Excel`, or a test double). */
export interface ExcelApi {
  run<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T>;
  CalculationType: { full: Excel.CalculationType.full | "Full" };
}

/** Recalculate every formula in the workbook. */
export function recalculateWorkbook(excel: ExcelApi): Promise<void> {
  return excel.run((c) => {
    c.workbook.application.calculate(excel.CalculationType.full as Excel.CalculationType);
    return c.sync();
  });
}

/** The workbook store for Excel; null when the settings API is unavailable. */
export function workbookStore(excel: ExcelApi, run?: ExcelRun): PaneStore | null {
  const storage = createWorkbookSettingsStorage({ run: run ?? (excel.run.bind(excel) as unknown as ExcelRun) });
  if (!storage) return null;
  return {
    where: WHERE.workbook,
    storage,
    async afterChange() {
      try {
        await recalculateWorkbook(excel);
        return null;
      } catch (e) {
        return `Saved, but Excel could not recalculate the workbook (${e instanceof Error ? e.message : String(e)}). Press Ctrl+Alt+F9 to recalculate all formulas.`;
      }
    },
  };
}
