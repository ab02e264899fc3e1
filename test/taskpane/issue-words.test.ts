/** Issue 17 item 9: problems name entries and fields in words, never twice. */
import { fieldWords, layerIssueWords, once } from "../../src/taskpane/issue-words";
import type { LibraryDoc } from "../../src/library";

test("field paths in words", () => {
  expect(fieldWords("steps[0].pKa.value")).toBe("step 1, pKa");
  expect(fieldWords("steps[1].dH.source")).toBe("step 2, ΔrH°, source");
  expect(fieldWords("steps[0].pKa.measured.temperature")).toBe("step 1, pKa, measured at, temperature");
  expect(fieldWords("systems[0].stoich")).toBe("system 1, units per mole");
  expect(fieldWords("")).toBe("entry");
});

test("a problem elsewhere in the layer names the entry: 'MOPSO sodium salt uses the system 'mopso', which …', once", () => {
  const doc: LibraryDoc = {
    format: "protolyte-library",
    schemaVersion: 1,
    name: "wb",
    substances: [{ id: "mopso-na", name: "MOPSO sodium salt", nature: "weak-acid-base", systems: [{ system: "mopso", stoich: 1, protons: 0 }] }],
  };
  const line = layerIssueWords(doc, "Workbook library", "substances[0].systems[0].system", "unknown acid–base system 'mopso'");
  expect(line).toMatch(/^MOPSO sodium salt uses the system 'mopso', which no library in effect holds/);
  expect(line).not.toMatch(/substances\[0\]/);
  expect(layerIssueWords(doc, "Workbook library", "substances[0].formula", "no atomic weight for 'Xx'")).toBe("MOPSO sodium salt (workbook library), formula: no atomic weight for 'Xx'");
  expect(once([line, line])).toEqual([line]);
});
