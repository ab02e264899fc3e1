/**
 * The Picture view inside Excel, with Excel as a hand mock (support/fake-excel-workbook.ts):
 * reading the selected cell's AQ formula and the ranges it names (same sheet, another sheet, names,
 * spills), following selection changes while the view is open, and stopping when it closes.
 * Real Excel is not involved: what Excel returns for each call is the mock's assumption, modelled on
 * office.js's documented behaviour (load, then sync, then read).
 */
import { readSelectedMixture, watchSelection, type SelectionExcel } from "../../src/taskpane/excel-selection";
import { SelectionFollower } from "../../src/taskpane/selection-follower";
import type { SelectedMixture } from "../../src/taskpane/excel-selection";
import { FakeExcel, type SheetModel, type WorkbookModel } from "./support/fake-excel-workbook";

const RECIPES: SheetModel = {
  name: "Sheet1",
  cells: {
    A2: { value: "sodium dihydrogen phosphate" },
    A3: { value: "disodium hydrogen phosphate" },
    B2: { value: "10 mM" },
    B3: { value: 0.01 },
    C1: { value: 37 },
    D2: { formula: "=AQ.PH(A2:A3,B2:B3,C1)", value: 6.9 },
    D3: { formula: "=ROUND(AQ.BETA($A$2:$A$3,$B$2:$B$3),4)", value: 0.01 },
    D4: { value: 7.2 },
    D5: { formula: "=AQ.PH('Buffer recipes'!A2:A3,'Buffer recipes'!B2:B3,Conditions!B1)", value: 4.7 },
    D6: { formula: "=AQ.PH(Names,Amounts,Temp)", value: 4.7 },
    D7: { formula: "=AQ.PH(Missing!A1:A2,B1:B2)", value: "#VALUE!" },
    D8: { formula: '=AQ.PH({"acetic acid";"sodium acetate"},{0.1;0.1},Conditions!B1,"ideal")', value: 4.7 },
    D9: { formula: "=AQ.PH(A2:A3,B2:B3*2)", value: 7 },
    E2: { formula: "=AQ.SPECIES(A2:A3,B2:B3)", value: "H+" },
    G1: { value: 0.1 },
    G2: { formula: '=AQ.CURVE(A2:A3,B2:B3,"NaOH",$G$1,"25 mL",0.03,61)', value: 0 },
    G3: { formula: '=AQ.CURVE(A2:A3,B2:B3,"NaOH",G1*2,0.025,Nowhere!A1)', value: 0 },
    E3: { value: "OH-" },
  },
  spills: { E3: "E2", F2: "E2" },
};

const OTHER: SheetModel = {
  name: "Buffer recipes",
  cells: { A2: { value: "acetic acid" }, A3: { value: "sodium acetate" }, B2: { value: 0.05 }, B3: { value: "50 mM" } },
};

const CONDITIONS: SheetModel = { name: "Conditions", cells: { B1: { value: 5 } }, names: { Temp: { type: "Double", value: 12 } } };

function workbook(extra: Partial<WorkbookModel> = {}): FakeExcel {
  return new FakeExcel({
    sheets: [structuredClone(RECIPES), structuredClone(OTHER), structuredClone(CONDITIONS)],
    active: { sheet: "Sheet1", cell: "D2" },
    names: { Names: { range: { sheet: "Buffer recipes", address: "A2:A3" } }, Amounts: { range: { sheet: "Buffer recipes", address: "B2:B3" } }, Temp: { type: "Double", value: 25 } },
    ...extra,
  });
}

function excelOf(x: FakeExcel): SelectionExcel {
  return { run: x.run } as unknown as SelectionExcel;
}

async function read(x: FakeExcel, cell: string, sheet = "Sheet1"): Promise<SelectedMixture> {
  x.select(sheet, cell);
  return readSelectedMixture(excelOf(x));
}

describe("the mock behaves as office.js does", () => {
  test("a property read before load and sync throws; after, it has the sheet's values", async () => {
    const x = workbook();
    await x.run(async (ctx: Excel.RequestContext) => {
      const r = ctx.workbook.worksheets.getItem("Sheet1").getRange("A2:B3");
      expect(() => r.values).toThrow(/PropertyNotLoaded|not available/);
      r.load("values");
      expect(() => r.values).toThrow(/not available/);
      await ctx.sync();
      expect(r.values).toEqual([["sodium dihydrogen phosphate", "10 mM"], ["disodium hydrogen phosphate", 0.01]]);
      ctx.workbook.worksheets.getItem("Nope").getRange("A1").load("values");
      await expect(ctx.sync()).rejects.toThrow(/doesn't exist/);
    });
  });
});

describe("readSelectedMixture", () => {
  test("ranges on the formula's own sheet, with the temperature from a cell: two syncs", async () => {
    const x = workbook();
    const r = await read(x, "D2");
    expect(r).toEqual({
      ok: true,
      address: "Sheet1!D2",
      formula: "=AQ.PH(A2:A3,B2:B3,C1)",
      call: expect.objectContaining({ text: "AQ.PH(A2:A3,B2:B3,C1)" }),
      spec: {
        rows: [
          { name: "sodium dihydrogen phosphate", amount: "10 mM" },
          { name: "disodium hydrogen phosphate", amount: "0.01" },
        ],
        temperature: "37",
        activity: "davies",
      },
    });
    expect(x.syncs).toBe(2); // the cell, then every referenced range at once
  });

  test("absolute references inside other functions", async () => {
    const r = await read(workbook(), "D3");
    expect(r.ok && r.call.fn.id).toBe("BETA");
    expect(r.ok && r.spec.rows.map((x) => x.name)).toEqual(["sodium dihydrogen phosphate", "disodium hydrogen phosphate"]);
  });

  test("ranges on another sheet (quoted name with a space) come from that sheet, not the active one", async () => {
    const r = await read(workbook(), "D5");
    expect(r.ok && r.spec).toEqual({
      rows: [
        { name: "acetic acid", amount: "0.05" },
        { name: "sodium acetate", amount: "50 mM" },
      ],
      temperature: "5",
      activity: "davies",
    });
  });

  test("the formula's own sheet is used for unqualified ranges even when it is not the first sheet", async () => {
    const x = workbook();
    x.model.sheets.find((s) => s.name === "Buffer recipes")!.cells.D2 = { formula: "=AQ.PH(A2:A3,B2:B3)", value: 4.7 };
    const r = await read(x, "D2", "Buffer recipes");
    expect(r.ok && r.address).toBe("'Buffer recipes'!D2");
    expect(r.ok && r.spec.rows.map((x) => x.name)).toEqual(["acetic acid", "sodium acetate"]);
  });

  test("workbook names: ranges, and a constant for the temperature", async () => {
    const r = await read(workbook(), "D6");
    expect(r.ok && r.spec).toEqual({ rows: [{ name: "acetic acid", amount: "0.05" }, { name: "sodium acetate", amount: "50 mM" }], temperature: "25", activity: "davies" });
    const x = workbook();
    delete x.model.names!.Amounts;
    expect(await read(x, "D6")).toMatchObject({ ok: false, message: "the amounts argument (Amounts): the workbook has no name 'Amounts'" });
  });

  test("inline arrays with the temperature on another sheet and an activity model", async () => {
    const x = workbook();
    const r = await read(x, "D8");
    expect(r.ok && r.spec).toEqual({ rows: [{ name: "acetic acid", amount: "0.1" }, { name: "sodium acetate", amount: "0.1" }], temperature: "5", activity: "ideal" });
  });

  test("a sheet the workbook does not have, a calculated argument, a plain value, an empty cell", async () => {
    const x = workbook();
    expect(await read(x, "D7")).toEqual({ ok: false, address: "Sheet1!D7", formula: "=AQ.PH(Missing!A1:A2,B1:B2)", message: "the names argument (Missing!A1:A2) names a sheet 'Missing' that the workbook does not have" });
    expect(await read(x, "D9")).toMatchObject({ ok: false, message: "the amounts argument (B2:B3*2) cannot be used: it is a calculation: the pane reads only ranges, inline arrays and values" });
    expect(await read(x, "D4")).toMatchObject({ ok: false, address: "Sheet1!D4", message: "the cell holds a value, not a formula" });
    expect(await read(x, "Z9")).toMatchObject({ ok: false, address: "Sheet1!Z9", message: "the cell is empty" });
  });

  test("an AQ.CURVE cell gives its titration too; a titration argument that cannot be read is left out, the mixture still read", async () => {
    const x = workbook();
    const r = await read(x, "G2");
    expect(r.ok && r.spec.titration).toEqual({ titrant: "NaOH", stock: "0.1 M", sample: "25 mL", maxVolume: "30 mL" });
    const partial = await read(x, "G3");
    expect(partial.ok && partial.spec.titration).toEqual({ titrant: "NaOH", sample: "25 mL" });
    expect(partial.ok && partial.spec.rows.length).toBe(2);
  });

  test("a cell inside a spilled AQ.SPECIES table is read through the spill's anchor", async () => {
    const r = await read(workbook(), "E3");
    expect(r).toMatchObject({ ok: true, address: "Sheet1!E2 (spilling into E3)", formula: "=AQ.SPECIES(A2:A3,B2:B3)" });
    // without ExcelApi 1.12 the cell is taken as it is
    const old = workbook({ spillApi: false });
    expect(await read(old, "E3")).toMatchObject({ ok: false, address: "Sheet1!E3", message: "the cell holds a value, not a formula" });
  });

  test("Excel failing altogether is a message, not an exception", async () => {
    const broken = { run: async () => Promise.reject(new Error("RichApi.Error: The operation failed")) } as unknown as SelectionExcel;
    expect(await readSelectedMixture(broken)).toEqual({ ok: false, address: null, formula: null, message: "Excel could not read the selected cell: RichApi.Error: The operation failed" });
  });
});

describe("watching the selection", () => {
  test("worksheets.onSelectionChanged and onActivated are registered, fire, and are removed by stop", async () => {
    const x = workbook();
    const seen: number[] = [];
    const stop = await watchSelection(excelOf(x), () => seen.push(1));
    expect(x.log).toEqual(["add worksheets.onSelectionChanged", "add worksheets.onActivated"]);
    await x.fireSelectionChanged();
    expect(seen.length).toBe(1);
    await stop();
    expect(x.handlerCount()).toBe(0);
    await x.fireSelectionChanged();
    expect(seen.length).toBe(1);
    await stop(); // twice is harmless
    expect(x.log.filter((l) => l.startsWith("remove")).length).toBe(2);
  });

  test("without the collection's events (before ExcelApi 1.9) the workbook's onSelectionChanged is used", async () => {
    const x = workbook({ collectionEvents: false });
    let n = 0;
    const stop = await watchSelection(excelOf(x), () => n++);
    expect(x.log).toEqual(["add workbook.onSelectionChanged"]);
    await x.fireSelectionChanged();
    expect(n).toBe(1);
    await stop();
    expect(x.handlerCount()).toBe(0);
  });
});

const until = async (cond: () => boolean, ms = 3000): Promise<void> => {
  const end = Date.now() + ms;
  while (!cond()) {
    if (Date.now() > end) throw new Error("timed out");
    await new Promise((r) => setTimeout(r, 5));
  }
};

describe("SelectionFollower (what the Picture view does while it is open)", () => {
  test("start reads the selected cell; a burst of selection changes gives one more read, of the last cell; stop removes the handlers", async () => {
    const x = workbook();
    const reads: SelectedMixture[] = [];
    const f = new SelectionFollower(excelOf(x), (s) => reads.push(s), undefined, 30);
    await f.start();
    await until(() => reads.length === 1);
    expect(f.following).toBe(true);
    expect(reads[0]).toMatchObject({ ok: true, address: "Sheet1!D2" });
    const before = x.activeCellReads;
    for (const cell of ["D3", "D4", "D5", "D6", "D8"]) {
      x.select("Sheet1", cell);
      await x.fireSelectionChanged();
    }
    await until(() => reads.length === 2);
    await new Promise((r) => setTimeout(r, 80));
    await f.settled();
    expect(x.activeCellReads - before).toBe(1);
    expect(reads.length).toBe(2);
    expect(reads[1]).toMatchObject({ ok: true, address: "Sheet1!D8", spec: { activity: "ideal" } });
    await f.stop();
    expect(f.following).toBe(false);
    expect(x.handlerCount()).toBe(0);
    x.select("Sheet1", "D2");
    await x.fireSelectionChanged();
    await new Promise((r) => setTimeout(r, 80));
    expect(reads.length).toBe(2);
  });

  test("a change during a slow read is followed by one more read, so the last selection wins", async () => {
    const x = workbook({ syncDelayMs: 40 });
    const reads: SelectedMixture[] = [];
    const f = new SelectionFollower(excelOf(x), (s) => reads.push(s), undefined, 0);
    await f.start();
    await until(() => x.activeCellReads === 1); // the first read is under way
    x.select("Sheet1", "D5");
    f.schedule(0);
    await until(() => reads.length >= 1);
    await f.settled();
    expect(reads[reads.length - 1]).toMatchObject({ ok: true, address: "Sheet1!D5" });
    expect(x.activeCellReads).toBe(2);
    await f.stop();
  });

  test("stopping while the handlers are still being registered removes them once registered", async () => {
    const x = workbook({ syncDelayMs: 20 });
    const f = new SelectionFollower(excelOf(x), () => undefined, undefined, 0);
    const started = f.start();
    await f.stop();
    await started;
    expect(f.following).toBe(false);
    expect(x.handlerCount()).toBe(0);
  });

  test("a failure to register is reported, and reading still works", async () => {
    const x = workbook();
    const failing = { run: (a: unknown, b?: unknown) => (typeof a === "function" && String(a).includes("onSelectionChanged") ? Promise.reject(new Error("no events here")) : x.run(a, b)) } as unknown as SelectionExcel;
    const problems: string[] = [];
    const reads: SelectedMixture[] = [];
    const f = new SelectionFollower(failing, (s) => reads.push(s), (m) => problems.push(m), 0);
    await f.start();
    await until(() => reads.length === 1);
    expect(problems).toEqual(["no events here"]);
    expect(f.following).toBe(false);
    expect(reads[0].ok).toBe(true);
    await f.stop();
  });
});
