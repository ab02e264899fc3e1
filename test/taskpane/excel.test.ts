/**
 * Inside Excel: the workbook layer is saved in workbook settings and every change is followed by a
 * full recalculation, so no cell keeps a value computed with the old constants. Excel is a test
 * double here (a hand mock that records calls, and office-addin-mock for the recalculation call).
 */
import { OfficeMockObject } from "office-addin-mock";
// office-addin-mock needs only the OfficeApp names from office-addin-manifest, whose dependency chain
// is ESM-only and does not load under jest's CommonJS runtime; provide the names directly.
jest.mock("office-addin-manifest", () => ({
  OfficeApp: { Excel: "excel", OneNote: "onenote", Outlook: "outlook", PowerPoint: "powerpoint", Project: "project", Word: "word" },
}));
import { getActiveLibrary, resetActiveLibrary, WORKBOOK_LIBRARY_KEY } from "../../src/library";
import { PaneController } from "../../src/taskpane/controller";
import { recalculateWorkbook, workbookStore, type ExcelApi } from "../../src/taskpane/excel-store";
import { personalStore } from "../../src/taskpane/storage";
import { baseSystemByPkb } from "./helpers";

/** A hand mock of the parts of Excel the pane uses, with a log of what happened in order. */
function fakeExcel(opts: { failCalculate?: boolean; stored?: string } = {}) {
  const settings = new Map<string, string>(opts.stored ? [[WORKBOOK_LIBRARY_KEY, opts.stored]] : []);
  const log: string[] = [];
  let pending: (() => void)[] = [];
  const context = {
    workbook: {
      settings: {
        add(key: string, value: string) {
          pending.push(() => {
            settings.set(key, value);
            log.push(`settings.add ${key}`);
          });
        },
        getItemOrNullObject(key: string) {
          const item = {
            isNullObject: true,
            value: undefined as unknown,
            load() {
              pending.push(() => {
                item.isNullObject = !settings.has(key);
                item.value = settings.get(key);
              });
            },
            delete() {
              pending.push(() => {
                settings.delete(key);
                log.push(`settings.delete ${key}`);
              });
            },
          };
          return item;
        },
      },
      application: {
        calculate(type: string) {
          pending.push(() => {
            if (opts.failCalculate) throw new Error("calculation is busy");
            log.push(`calculate ${type}`);
          });
        },
      },
    },
    async sync() {
      const run = pending;
      pending = [];
      run.forEach((f) => f());
      log.push("sync");
    },
  };
  const excel = {
    CalculationType: { full: "Full" as const },
    run: async <T>(batch: (c: Excel.RequestContext) => Promise<T>): Promise<T> => batch(context as unknown as Excel.RequestContext),
  } satisfies ExcelApi;
  return { excel, settings, log };
}

function excelController(excel: ExcelApi): PaneController {
  resetActiveLibrary();
  const workbook = workbookStore(excel);
  if (!workbook) throw new Error("no workbook store");
  return new PaneController({ kind: "excel", platform: "PC" }, { workbook, personal: personalStore(null, true) });
}

describe("workbook settings and recalculation", () => {
  test("a save writes the workbook setting, then recalculates the whole workbook", async () => {
    const { excel, settings, log } = fakeExcel();
    const ctl = excelController(excel);
    await ctl.init();
    const r = await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    expect(r).toMatchObject({ ok: true, warnings: [] });
    const stored = JSON.parse(settings.get(WORKBOOK_LIBRARY_KEY) as string);
    expect(stored.library.systems[0].steps[0].pKa.value).toBeCloseTo(9.795, 9);
    const add = log.indexOf(`settings.add ${WORKBOOK_LIBRARY_KEY}`);
    const calc = log.indexOf("calculate Full");
    expect(add).toBeGreaterThanOrEqual(0);
    expect(calc).toBeGreaterThan(add);
    expect(log[calc + 1]).toBe("sync");
    expect(ctl.stores.workbook.where).toBe("this workbook");
  });

  test("deleting the last entry keeps the change record in the setting and recalculates", async () => {
    const { excel, settings, log } = fakeExcel();
    const ctl = excelController(excel);
    await ctl.init();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    log.length = 0;
    const r = await ctl.deleteEntry("workbook", "system", "hb-7-amine");
    expect(r.ok).toBe(true);
    const stored = JSON.parse(String(settings.get(WORKBOOK_LIBRARY_KEY)));
    expect(stored.library.systems).toBeUndefined();
    expect(stored.library.changes.map((c: { action: string }) => c.action)).toEqual(["add", "delete"]);
    expect(log.indexOf("calculate Full")).toBeGreaterThan(log.indexOf(`settings.add ${WORKBOOK_LIBRARY_KEY}`));
  });

  test("the workbook layer is loaded from the workbook's settings, then the workbook is recalculated with it", async () => {
    const first = fakeExcel();
    const ctl = excelController(first.excel);
    await ctl.init();
    expect(first.log).not.toContain("calculate Full"); // nothing stored: nothing to recalculate
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    const { excel, log } = fakeExcel({ stored: first.settings.get(WORKBOOK_LIBRARY_KEY) });
    const reopened = excelController(excel);
    await reopened.init();
    expect(getActiveLibrary().get("hb-7-amine", "system")?.layer).toBe("workbook");
    expect(log).toEqual(["sync", "calculate Full", "sync"]);
  });

  test("a failed recalculation is reported as a warning with what to do", async () => {
    const { excel, settings } = fakeExcel({ failCalculate: true });
    const ctl = excelController(excel);
    await ctl.init();
    const r = await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    expect(r.ok).toBe(true);
    expect(r.ok && r.warnings.join(" ")).toMatch(/could not recalculate.*Ctrl\+Alt\+F9/);
    expect(settings.has(WORKBOOK_LIBRARY_KEY)).toBe(true);
  });

  test("saves to the personal layer do not touch the workbook", async () => {
    const { excel, log } = fakeExcel();
    const ctl = excelController(excel);
    await ctl.init();
    log.length = 0;
    expect((await ctl.saveSystem("personal", baseSystemByPkb("4.2"))).ok).toBe(true);
    expect(log.filter((l) => l.startsWith("settings.") || l.startsWith("calculate"))).toEqual([]);
  });
});

describe("recalculateWorkbook with office-addin-mock", () => {
  test("asks for a full calculation and syncs", async () => {
    const calls: string[] = [];
    const mock = new OfficeMockObject({
      context: {
        workbook: {
          application: {
            calculate(type: string) {
              calls.push(type);
            },
          },
        },
      },
      run: async function (this: { context: unknown }, callback: (c: unknown) => Promise<unknown>) {
        return callback(this.context);
      },
    }) as unknown as Pick<ExcelApi, "run"> & { context: { sync(): Promise<void> } };
    const sync = jest.spyOn(mock.context, "sync");
    // Excel.CalculationType is a plain enum in office.js, not a proxy object: keep it out of the mock.
    await recalculateWorkbook({ run: mock.run.bind(mock), CalculationType: { full: "Full" } });
    expect(calls).toEqual(["Full"]);
    expect(sync).toHaveBeenCalledTimes(1);
  });
});
