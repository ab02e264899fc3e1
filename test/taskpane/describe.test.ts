/** What the browser shows for entries: citations, statuses, overrides, search. */
import { createLibrary, BUILTIN_LIBRARY, LIBRARY_FORMAT } from "../../src/library";
import type { LibraryDoc, SourceRecord } from "../../src/library";
import { citation, entryName, filterEntries, overrideText, valuesOf } from "../../src/taskpane/describe";

const workbook: LibraryDoc = {
  format: LIBRARY_FORMAT,
  schemaVersion: 1 as const,
  name: "Halvorsen Biologics",
  systems: [
    {
      ...(BUILTIN_LIBRARY.systems ?? []).find((s) => s.id === "acetate")!,
      steps: [{ pKa: { value: 4.8, unit: "1", conditions: "25 °C, I = 0", status: "common-practice" as const, note: "rounded value used on Halvorsen batch records" } }],
    },
    {
      id: "hb-amine",
      name: "HB amine",
      topCharge: 1,
      steps: [{ pKa: { value: 9.8, unit: "1", conditions: "25 °C, I = 0", status: "unverified" as const, note: "from memory" }, dH: { value: 45, unit: "kJ/mol", conditions: "25 °C", status: "unverified" as const, note: "estimate" } }],
    },
  ],
};
const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook });
const sources = (id: string) => lib.get(id, "source")?.record as SourceRecord | undefined;

test("citations use the library's reference wording and name unknown keys", () => {
  expect(citation(sources("goldberg2002"), "goldberg2002")).toBe(
    "R. N. Goldberg, N. Kishore, R. M. Lennen, Thermodynamic quantities for the ionization reactions of buffers. Journal of Physical and Chemical Reference Data, 31, 231 (2002)",
  );
  expect(citation(undefined, "gone")).toBe("unknown source 'gone'");
});

test("published values show unit, conditions and their source with the locator", () => {
  const acetic = lib.get("phosphate", "system")!;
  const lines = valuesOf(acetic, sources);
  const step2 = lines.find((l) => l.label === "pKa (step 2)")!;
  expect(step2).toMatchObject({ status: "published", flagged: false, conditions: "25 °C, I = 0" });
  // the citation of the source the record names, then the locator after a dash
  const record = (acetic.record as { steps: { pKa: { source: string; locator: string } }[] }).steps[1].pKa;
  expect(step2.provenance.startsWith(citation(sources(record.source), record.source))).toBe(true);
  expect(step2.provenance).toContain(`— ${record.locator}`);
  expect(lines[0]).toMatchObject({ label: "pKa (step 1)", flagged: lines[0].status !== "published" });
  const dH = lines.find((l) => l.label.startsWith("ΔrH°"))!;
  expect(dH.amount).toMatch(/ kJ\/mol$/);
});

test("common-practice and unverified values are flagged and say so", () => {
  const acetate = valuesOf(lib.get("acetate", "system")!, sources);
  expect(acetate).toEqual([expect.objectContaining({ label: "pKa", amount: "4.8", statusText: "common practice", flagged: true, provenance: "rounded value used on Halvorsen batch records" })]);
  const amine = valuesOf(lib.get("hb-amine", "system")!, sources);
  expect(amine.map((v) => [v.label, v.statusText, v.flagged, v.provenance])).toEqual([
    ["pKa", "from memory, unverified", true, "from memory, unverified: from memory"],
    ["ΔrH°", "from memory, unverified", true, "from memory, unverified: estimate"],
  ]);
});

test("an override names the layer it hides", () => {
  expect(overrideText(lib.get("acetate", "system")!)).toBe("overrides the built-in entry");
  expect(overrideText(lib.get("hb-amine", "system")!)).toBe("");
});

test("search matches names, aliases and ids, every word, any case; kind and layer filter", () => {
  const all = lib.list();
  expect(filterEntries(all, "TROMETAMOL", "all").map((e) => e.id)).toContain("tris-base");
  expect(filterEntries(all, "dibasic heptahydrate", "substance").map((e) => e.id)).toEqual(["disodium-hydrogen-phosphate-heptahydrate"]);
  expect(filterEntries(all, "", "system", "workbook").map(entryName)).toEqual(["acetate", "HB amine"]);
  expect(filterEntries(all, "no such thing at all", "all")).toEqual([]);
});

test("search ranks an exact name first, then names that start with the query ('Tris base' before trisodium phosphate)", () => {
  const all = lib.list();
  const tris = filterEntries(all, "Tris base", "all");
  expect(tris[0].id).toBe("tris-base");
  const pre = filterEntries(all, "tris", "substance");
  const firstOther = pre.findIndex((e) => !(e.record as { name: string }).name.toLowerCase().startsWith("tris") && !e.id.startsWith("tris") && !((e.record as { aliases?: string[] }).aliases ?? []).some((a) => a.toLowerCase().startsWith("tris")));
  const lastPrefix = pre.map((e) => e.id).lastIndexOf(pre.filter((e) => e.id.startsWith("tris") || (e.record as { name: string }).name.toLowerCase().startsWith("tris")).slice(-1)[0]?.id ?? "");
  expect(firstOther === -1 || lastPrefix < firstOther).toBe(true);
});
