/**
 * Pinning: a workbook keeps a snapshot of the constants its formulas use, so that a later built-in
 * library with revised values does not change its results; the drift is shown and the pin is
 * updated only on purpose. Also the change record's diff and the export stamp.
 */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { diffRecords, makeChange } from "../../src/library/change-record";
import { describeStamp, exportFileName, stampExport } from "../../src/library/export-stamp";
import { exportLibraryText, parseLibraryText } from "../../src/library/io";
import { createLibrary } from "../../src/library/layers";
import { dependenciesOf, pinDrift, pinNames, updatePin } from "../../src/library/pin";
import { validateLibraryDoc } from "../../src/library/validate";
import { SOFTWARE_NAME } from "../../src/library/version";
import { builtinCopy } from "./helpers";

const AT = new Date("2026-12-02T17:45:00.000Z");
const pH = (lib: ReturnType<typeof createLibrary>, name: string): number => {
  const r = lib.resolve(name);
  if (!r.ok) throw new Error(r.message);
  return r.component.systems[0].system.steps[0].pKa;
};

describe("pinning", () => {
  const today = createLibrary({ builtin: BUILTIN_LIBRARY });
  const plan = pinNames(today, ["sodium acetate", "no such salt"], AT);

  test("a substance depends on its systems (with their complexes' and solids' metal ions), ions, cited sources and formula elements", () => {
    const acetate = BUILTIN_LIBRARY.systems!.find((s) => s.id === "acetate")!;
    const metals = [...new Set([...(acetate.complexes ?? []).flatMap((c) => (c.metal ? [c.metal] : [])), ...(acetate.solids ?? []).map((x) => x.metal)])];
    expect(metals.length).toBeGreaterThan(0); // acetate forms complexes with Ca, Mg, Zn in the built-in data
    expect(dependenciesOf(today, "sodium-acetate").map((r) => `${r.kind}:${r.id}`)).toEqual([
      "substance:sodium-acetate", "system:acetate", ...metals.map((m) => `ion:${m}`), ...(metals.includes("na") ? [] : ["ion:na"]), "atomicWeight:C", "atomicWeight:H", "atomicWeight:Na", "atomicWeight:O",
      ...[...new Set(dependenciesOf(today, "sodium-acetate").filter((r) => r.kind === "source").map((r) => `source:${r.id}`))],
    ]);
    expect(dependenciesOf(today, "sodium-acetate").filter((r) => r.kind === "source").map((r) => r.id)).toContain("goldberg2002");
  });

  test("the snapshot goes into the workbook library, with the pin record, and is a valid workbook layer", () => {
    expect(plan.unknown).toEqual(["no such salt"]);
    expect(plan.doc.substances!.map((s) => s.id)).toEqual(["sodium-acetate"]);
    expect(plan.doc.systems!.map((s) => s.id)).toEqual(["acetate"]);
    expect(plan.doc.pin).toMatchObject({ at: AT.toISOString(), builtinVersion: BUILTIN_LIBRARY.version, fingerprint: today.fingerprint() });
    expect(validateLibraryDoc(plan.doc, [BUILTIN_LIBRARY]).ok).toBe(true);
  });

  test("a later built-in library with a revised pKa does not change the pinned workbook", () => {
    const revised = builtinCopy();
    revised.systems!.find((s) => s.id === "acetate")!.steps[0].pKa.value = 4.8;
    const unpinned = createLibrary({ builtin: revised });
    const pinned = createLibrary({ builtin: revised, workbook: plan.doc });
    expect(pH(unpinned, "sodium acetate")).toBe(4.8);
    expect(pH(pinned, "sodium acetate")).toBe(4.756);
    // the same constants are in effect as when pinned: the same fingerprint
    expect(pinned.fingerprint()).toBe(today.fingerprint());
    expect(pinDrift(pinned)).toEqual([{ kind: "system", id: "acetate", name: "acetate", diff: [{ path: "steps[0].pKa.value", old: "4.756", new: "4.8" }] }]);
    expect(pinDrift(createLibrary({ builtin: BUILTIN_LIBRARY, workbook: plan.doc }))).toEqual([]);
    const up = updatePin(pinned, AT)!;
    expect(up.updated.map((d) => d.id)).toEqual(["acetate"]);
    expect(pH(createLibrary({ builtin: revised, workbook: up.doc }), "sodium acetate")).toBe(4.8);
  });

  test("a personal entry cannot change a pinned workbook's results: the workbook decides", () => {
    const personal = { format: "protolyte-library" as const, schemaVersion: 1 as const, name: "mine", systems: [{ ...BUILTIN_LIBRARY.systems!.find((s) => s.id === "acetate")!, steps: [{ pKa: { value: 4.5, unit: "1", conditions: "25 °C", status: "entered" as const } }] }] };
    expect(pH(createLibrary({ builtin: BUILTIN_LIBRARY, personal }), "sodium acetate")).toBe(4.5);
    expect(pH(createLibrary({ builtin: BUILTIN_LIBRARY, personal, workbook: plan.doc }), "sodium acetate")).toBe(4.756);
  });
});

describe("change record", () => {
  test("the diff names each changed leaf with old and new values as JSON text", () => {
    expect(diffRecords({ a: 1, b: { c: "x" }, d: [1, 2] }, { a: 1, b: { c: "y" }, d: [1], e: true })).toEqual([
      { path: "b.c", old: '"x"', new: '"y"' },
      { path: "d[1]", old: "2" },
      { path: "e", new: "true" },
    ]);
  });

  test("a change says when, who, what and why, and is valid in a library file", () => {
    const c = makeChange({ action: "edit", who: " K. Halvorsen ", entry: { kind: "system", id: "acetate" }, before: { v: 4.756 }, after: { v: 4.8 }, reason: "CoA of lot 2291" }, AT);
    expect(c).toEqual({ at: AT.toISOString(), who: "K. Halvorsen", action: "edit", entry: { kind: "system", id: "acetate" }, diff: [{ path: "v", old: "4.756", new: "4.8" }], reason: "CoA of lot 2291" });
    expect(makeChange({ action: "delete", who: "" }, AT).who).toBe("unnamed user");
    const doc = { format: "protolyte-library" as const, schemaVersion: 1 as const, name: "w", changes: [c] };
    expect(validateLibraryDoc(doc).ok).toBe(true);
  });
});

describe("export stamp", () => {
  test("the software version is package.json's", () => {
    // eslint-disable-next-line @typescript-eslint/no-require-imports
    expect(SOFTWARE_NAME).toBe(`Protolyte ${(require("../../package.json") as { version: string }).version}`);
  });

  test("the file and its name carry the fingerprint, the date and the software version; an import reads them back", () => {
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY });
    const doc = stampExport({ format: "protolyte-library", schemaVersion: 1, name: "w" }, lib.fingerprint(), "workbook library", AT);
    expect(doc.exported).toEqual({ at: AT.toISOString(), fingerprint: lib.fingerprint(), software: SOFTWARE_NAME, what: "workbook library" });
    expect(exportFileName("protolyte-workbook-library", doc.exported!)).toBe(`protolyte-workbook-library_${lib.fingerprint()}_2026-12-02T1745Z.json`);
    const back = parseLibraryText(exportLibraryText(doc));
    expect(back.ok && describeStamp(back.library.exported)).toBe(`Exported 2026-12-02 17:45 UTC by ${SOFTWARE_NAME} (workbook library), constants fingerprint ${lib.fingerprint()}.`);
    expect(describeStamp(undefined)).toMatch(/carries no export stamp/);
  });
});
