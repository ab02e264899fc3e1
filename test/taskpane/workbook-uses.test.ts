/**
 * Issue 17 item 5: the entries a workbook's AQ formulas use, read from the formulas in each sheet's
 * used range (Office.js, here a hand mock that runs requests at sync and refuses reads of properties
 * not loaded, as office.js does), listed with layer and status, and exported as exactly those
 * entries.
 */
import { BUILTIN_LIBRARY, createLibrary, dependenciesOf, parseLibraryText, type LibraryDoc, type SystemRecord } from "../../src/library";
import { nameSources } from "../../src/taskpane/formula/names-in-formula";
import { readWorkbookNames } from "../../src/taskpane/excel-workbook-uses";
import { entriesUsed, nameCandidates } from "../../src/taskpane/workbook-uses";
import { freshController } from "./helpers";

describe("names in a formula", () => {
  test("every AQ call's name arguments: a mixture's names and titrant, PKA's substance, RECIPE's forms and other names; nothing else", () => {
    const f = '=IF(AQ.PH(A2:A3,B2:B3)>7,AQ.ADJUST({"acetic acid";"sodium acetate"},C2:C3,4.8,"NaOH 1 M","",1),AQ.PKA("phosphate",2))&AQ.RECIPE("NaH2PO4·H2O","Na2HPO4·7H2O",7,0.05,1,25,,,,Other!D2:D3)';
    const s = nameSources(f).sources;
    expect(s.map((x) => (x.kind === "values" ? x.values.flat().join("|") : x.kind === "ref" ? `${x.sheet ?? ""}!${x.address}` : x.kind))).toEqual([
      "!A2:A3",
      "acetic acid|sodium acetate",
      "NaOH 1 M",
      "phosphate",
      "NaH2PO4·H2O",
      "Na2HPO4·7H2O",
      "Other!D2:D3",
    ]);
    expect(nameSources("=SUM(A1:A3)").sources).toEqual([]);
    expect(nameSources(42).sources).toEqual([]);
    expect(nameSources("=AQ.PH(").error).toMatch(/could not be read/);
  });

  test("a stock written with the name still finds the reagent", () => {
    expect(nameCandidates("NaOH 1 M")).toEqual(["NaOH 1 M", "NaOH"]);
    expect(nameCandidates("0.1 M HCl")).toEqual(["0.1 M HCl", "HCl"]);
    expect(nameCandidates("Tris base")).toEqual(["Tris base"]);
    expect(nameCandidates("hydrochloric acid 37 % w/w")).toEqual(["hydrochloric acid 37 % w/w", "hydrochloric acid"]);
  });
});

/** A hand mock of the few Excel objects the reader uses. */
function fakeExcel(sheets: Record<string, { origin: string; formulas: unknown[][]; cells?: Record<string, unknown[][]> }>, names: Record<string, unknown[][]> = {}) {
  let syncs = 0;
  const loaded = new Set<object>();
  const guard = <T extends object>(obj: T, props: string[]): T =>
    new Proxy(obj, { get: (t, p) => (props.includes(String(p)) && !loaded.has(t) ? (() => { throw new Error(`PropertyNotLoaded: ${String(p)}`); })() : (t as Record<string | symbol, unknown>)[p]) });
  const queue: (() => void)[] = [];
  const range = (values: unknown[][] | null) => {
    const r: Record<string, unknown> = { isNullObject: values === null, values: values ?? [], load: () => queue.push(() => loaded.add(r)) };
    return guard(r, ["values"]);
  };
  const items = Object.entries(sheets).map(([name, s]) => {
    const sheet: Record<string, unknown> = {
      name,
      getUsedRangeOrNullObject: () => {
        const r: Record<string, unknown> = { isNullObject: false, formulas: s.formulas, address: `${name}!${s.origin}`, load: () => queue.push(() => loaded.add(r)) };
        return guard(r, ["formulas", "address"]);
      },
      getRange: (address: string) => range(s.cells?.[address] ?? [[null]]),
    };
    return sheet;
  });
  const worksheets: Record<string, unknown> = { items, load: () => queue.push(() => loaded.add(worksheets)) };
  const ctx = {
    workbook: { worksheets: guard(worksheets, ["items"]), names: { getItemOrNullObject: (n: string) => ({ getRangeOrNullObject: () => range(names[n] ?? null) }) } },
    sync: async () => {
      syncs++;
      queue.splice(0).forEach((f) => f());
    },
  };
  return { excel: { run: (batch: (c: unknown) => Promise<unknown>) => batch(ctx) } as never, syncs: () => syncs };
}

describe("reading a workbook (hand mock of Excel)", () => {
  test("names from inline arrays, same-sheet and other-sheet ranges and workbook names, in three syncs; what cannot be read is said", async () => {
    const { excel, syncs } = fakeExcel(
      {
        Batch: {
          origin: "B2:C4",
          formulas: [
            ["sodium acetate", '=AQ.PH({"acetic acid";"sodium acetate"},{0.05;0.05})'],
            ["acetic acid", "=AQ.PH(B2:B3,{0.1;0.1})"],
            [1, "=AQ.CHECK(Stocks!A1:A2,{0.01;0.01})&AQ.PH(Buffers,{1})&AQ.PH(INDIRECT(\"A1\"),1)"],
          ],
          cells: { B2_B3: [], "B2:B3": [["sodium acetate"], ["acetic acid"]] },
        },
        Stocks: { origin: "A1:A2", formulas: [["Tris base"], ["Tris hydrochloride"]], cells: { "A1:A2": [["Tris base"], ["Tris hydrochloride"]] } },
      },
      { Buffers: [["HEPES"]] },
    );
    const found = await readWorkbookNames(excel);
    expect(found.names.sort()).toEqual(["HEPES", "Tris base", "Tris hydrochloride", "acetic acid", "sodium acetate"]);
    expect(found.formulas).toBe(3);
    expect(found.unread).toEqual([expect.stringMatching(/^Batch!C4: INDIRECT\("A1"\) is not read \(it is calculated by INDIRECT/)]);
    expect(syncs()).toBe(3);
  });
});

describe("the entries they use, with layer and status, and their export", () => {
  const overridden = (): LibraryDoc => {
    const acetate = JSON.parse(JSON.stringify(BUILTIN_LIBRARY.systems!.find((s) => s.id === "acetate"))) as SystemRecord;
    acetate.steps[0].pKa = { value: 4.8, unit: "1", conditions: "25 °C, I = 0", status: "entered" };
    return { format: "protolyte-library", schemaVersion: 1, name: "wb", systems: [acetate] };
  };

  test("each substance with what its results depend on, once; the workbook's acetate shown as the workbook's; unknown names listed", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: overridden() });
    const used = entriesUsed(lib, ["sodium acetate", "acetic acid", "NaOH 1 M", "no such buffer"]);
    expect(entriesUsed(lib, ["phosphate"]).rows[0]).toMatchObject({ kind: "system", id: "phosphate", layerText: "built-in" }); // AQ.PKA("phosphate", 2)
    const expected = [...new Map([...dependenciesOf(lib, lib.ownerOf("sodium acetate")!.id), ...dependenciesOf(lib, lib.ownerOf("acetic acid")!.id), ...dependenciesOf(lib, lib.ownerOf("NaOH")!.id)].map((r) => [`${r.kind}:${r.id}`, r])).values()];
    expect(used.refs).toEqual(expected);
    const acetate = used.rows.find((r) => r.kind === "system" && r.id === "acetate")!;
    expect(acetate.layerText).toBe("workbook (overrides built-in)");
    expect(acetate.status).toContain("entered by the user");
    expect(used.unknown).toEqual(["no such buffer"]);
  });

  test("the export holds exactly those entries, stamped 'entries the workbook uses', and imports back", async () => {
    const { ctl } = await freshController();
    const used = entriesUsed(ctl.library, ["sodium acetate"]);
    const file = ctl.exportEntries(used.refs, new Date("2026-12-03T01:00:00Z"))!;
    expect(file.fileName).toMatch(/^protolyte-entries-the-workbook-uses_PL-[\d.]+-[0-9a-f]{10}_2026-12-03T0100Z\.json$/);
    const parsed = parseLibraryText(file.text); // complete on its own: complexes' metal ions and sources included
    if (!parsed.ok) throw new Error(`${parsed.message} ${JSON.stringify((parsed as { errors?: unknown }).errors ?? "").slice(0, 300)}`);
    expect(parsed.library.exported?.what).toBe("entries the workbook uses");
    const inFile = [
      ...(parsed.library.substances ?? []).map((s) => `substance:${s.id}`),
      ...(parsed.library.systems ?? []).map((s) => `system:${s.id}`),
      ...(parsed.library.ions ?? []).map((s) => `ion:${s.id}`),
      ...Object.keys(parsed.library.sources ?? {}).map((k) => `source:${k}`),
      ...Object.keys(parsed.library.atomicWeights ?? {}).map((k) => `atomicWeight:${k}`),
    ].sort();
    expect(inFile).toEqual(used.refs.map((r) => `${r.kind}:${r.id}`).sort());
    expect(ctl.exportEntries([])).toBeNull();
  });
});
