/**
 * The workbook layer inside Excel: kept in the workbook's settings (ExcelApi 1.4), which travel
 * with the file and are private to the add-in. After every save the whole workbook is recalculated
 * (Excel does not re-run non-volatile custom functions when hidden state changes, and F9 does not
 * either), so no cell keeps a value computed with the old constants.
 */
import type { LayerStore } from "./storage";
import { WHERE } from "./storage";

export const WORKBOOK_SETTING_KEY = "protolyte.library.workbook";

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

export class WorkbookSettingsStore implements LayerStore {
  readonly layer = "workbook" as const;
  readonly where = WHERE.workbook;
  /** Set after a save whose recalculation failed: the pane tells the user to recalculate. */
  lastRecalcError: string | null = null;

  constructor(private readonly excel: ExcelApi) {}

  async load(): Promise<string | null> {
    return this.excel.run(async (c) => {
      const item = c.workbook.settings.getItemOrNullObject(WORKBOOK_SETTING_KEY);
      item.load("value");
      await c.sync();
      if (item.isNullObject) return null;
      const v: unknown = item.value;
      return typeof v === "string" ? v : JSON.stringify(v);
    });
  }

  async save(text: string | null): Promise<void> {
    try {
      await this.excel.run(async (c) => {
        if (text === null) {
          const item = c.workbook.settings.getItemOrNullObject(WORKBOOK_SETTING_KEY);
          item.load("key");
          await c.sync();
          if (!item.isNullObject) item.delete();
        } else {
          c.workbook.settings.add(WORKBOOK_SETTING_KEY, text);
        }
        await c.sync();
      });
    } catch (e) {
      const why = e instanceof Error ? e.message : String(e);
      throw new Error(`the workbook library could not be saved in the workbook (${why})`);
    }
    this.lastRecalcError = null;
    try {
      await recalculateWorkbook(this.excel);
    } catch (e) {
      this.lastRecalcError = e instanceof Error ? e.message : String(e);
    }
  }
}
