/**
 * Complexes and solids in library files: the schema and the semantic checks refuse what the engine
 * could not use, and the engine objects carry what the records say.
 */
import { BUILTIN_LIBRARY, createLibrary } from "../../src/library";
import { validateLibraryDoc } from "../../src/library/validate";
import type { LibraryDoc } from "../../src/library/types";

const value = (v: number) => ({ value: v, unit: "1", conditions: "25 °C, I = 0", status: "entered" as const });

function docWith(complexes: unknown[], solids: unknown[] = []): LibraryDoc {
  return {
    format: "protolyte-library",
    schemaVersion: 1,
    name: "Halvorsen Biologics chelators",
    systems: [
      {
        id: "test-ligand",
        name: "test ligand",
        topCharge: 0,
        steps: [{ pKa: value(4) }, { pKa: value(9) }],
        complexes,
        solids,
      },
    ],
  } as unknown as LibraryDoc;
}

function messages(doc: LibraryDoc): string {
  const v = validateLibraryDoc(doc, [BUILTIN_LIBRARY]);
  return v.ok ? "" : JSON.stringify(v);
}

describe("complexes in library files", () => {
  test("a valid complex and solid are accepted and reach the engine's system", () => {
    const doc = docWith([{ name: "CaL", metal: "ca", ligands: 1, protons: 0, logBeta: value(3.5) }], [{ name: "CaL(s)", metal: "ca", metals: 1, ligands: 1, protons: 0, logKsp: value(-6) }]);
    expect(messages(doc)).toBe("");
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: doc });
    const sys = lib.system("test-ligand");
    expect(sys?.complexes).toEqual([{ name: "CaL", metal: "ca", ligands: 1, protons: 0, logBeta: 3.5 }]);
    expect(sys?.solids).toEqual([{ name: "CaL(s)", metal: "ca", metals: 1, ligands: 1, protons: 0, logKsp: -6 }]);
  });

  test("an unknown metal is a problem naming it", () => {
    expect(messages(docWith([{ name: "XL", metal: "unobtainium", ligands: 1, protons: 0, logBeta: value(3) }]))).toMatch(/unknown strong ion 'unobtainium'/);
  });

  test("a fractional ligand count is refused by the schema", () => {
    expect(messages(docWith([{ name: "CaL", metal: "ca", ligands: 1.5, protons: 0, logBeta: value(3) }]))).toMatch(/ligands/);
  });

  test("a species of the ligand alone with one ligand is refused (it would be a pKa step)", () => {
    expect(messages(docWith([{ name: "HL", ligands: 1, protons: 1, logBeta: value(9) }]))).toMatch(/at least 2 ligands/);
  });

  test("a complex named like another species of the system is refused", () => {
    expect(messages(docWith([{ name: "CaL", metal: "ca", ligands: 1, protons: 0, logBeta: value(3) }, { name: "CaL", metal: "ca", ligands: 1, protons: 1, logBeta: value(8) }]))).toMatch(/already the name/);
  });

  test("a complex changes the fingerprint; a library without complexes keeps its own", () => {
    const plain = docWith([]);
    delete (plain.systems![0] as { complexes?: unknown }).complexes;
    delete (plain.systems![0] as { solids?: unknown }).solids;
    const a = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: plain }).fingerprint();
    const b = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: docWith([{ name: "CaL", metal: "ca", ligands: 1, protons: 0, logBeta: value(3.5) }]) }).fingerprint();
    expect(a).not.toBe(b);
  });
});
