/** Issue 17 item 9: problems name entries and fields in words, never twice — in the pane's form and in an imported file. */
import { BUILTIN_LIBRARY, fieldWords, issueWords, once, parseLibraryText, type LibraryDoc } from "../../src/library";

const mopsoSalt = (): LibraryDoc => ({
  format: "protolyte-library",
  schemaVersion: 1,
  name: "wb",
  substances: [{ id: "mopso-na", name: "MOPSO sodium salt", nature: "weak-acid-base", formula: "C7H14NNaO5S", systems: [{ system: "mopso-paper", stoich: 1, protons: 0 }] }],
});

test("field paths in words", () => {
  expect(fieldWords("steps[0].pKa.value")).toBe("step 1, pKa");
  expect(fieldWords("steps[1].dH.source")).toBe("step 2, ΔrH°, source");
  expect(fieldWords("steps[0].pKa.measured.temperature")).toBe("step 1, pKa, measured at, temperature");
  expect(fieldWords("systems[0].stoich")).toBe("system 1, units per mole");
  expect(fieldWords("")).toBe("entry");
});

test("a problem elsewhere in the layer names the entry: 'MOPSO sodium salt uses the system 'mopso-paper', which …', once", () => {
  const doc = mopsoSalt();
  const line = issueWords(doc, { path: "substances[0].systems[0].system", message: "unknown acid–base system 'mopso-paper'" }, "workbook library");
  expect(line).toMatch(/^MOPSO sodium salt uses the system 'mopso-paper', which no library in effect holds.*add the system to the workbook library, or choose another$/);
  expect(line).not.toMatch(/substances\[0\]/);
  expect(issueWords(doc, { path: "substances[0].formula", message: "no atomic weight for 'Xx'" }, "workbook library")).toBe("MOPSO sodium salt (workbook library), formula: no atomic weight for 'Xx'");
  expect(once([line, line])).toEqual([line]);
});

describe("an imported file's problems read in words, naming the entry, each line once", () => {
  const paths = /\b(systems|ions|substances|steps)\[\d+\]/;

  test("a substance on a system that no library holds (the issue's example)", () => {
    const r = parseLibraryText(JSON.stringify(mopsoSalt()), [BUILTIN_LIBRARY]);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => e.path)).toEqual(["substances[0].systems[0].system"]);
    expect(r.lines).toEqual([expect.stringMatching(/^MOPSO sodium salt uses the system 'mopso-paper', which no library in effect holds .*add the system to the file, or choose another$/)]);
    expect(r.message).toMatch(/^invalid library: MOPSO sodium salt uses the system 'mopso-paper'/);
    expect(r.message).not.toMatch(paths);
  });

  test("shape problems name the entry and the field; a duplicate id names the other entry", () => {
    const step = { pKa: { value: 7, unit: "1", status: "user", conditions: "25 °C" } };
    const sys = (id: string, name: string) => ({ id, name, topCharge: 0, speciesNames: ["HB", "B-"], steps: [step] });
    const r = parseLibraryText(JSON.stringify({ format: "protolyte-library", schemaVersion: 1, name: "wb", systems: [sys("hb", "HB buffer"), sys("hb", "HB two")] }));
    if (r.ok) throw new Error("accepted");
    expect(r.lines[0]).toMatch(/^HB buffer, step 1, pKa, status: must be one of/);
    expect(r.lines[1]).toMatch(/^HB two, step 1, pKa, status: must be one of/);
    expect(r.message).not.toMatch(paths);

    const fixed = { ...step, pKa: { ...step.pKa, status: "entered" } };
    const dup = parseLibraryText(JSON.stringify({ format: "protolyte-library", schemaVersion: 1, name: "wb", systems: [{ ...sys("hb", "HB buffer"), steps: [fixed] }, { ...sys("hb", "HB two"), steps: [fixed] }] }));
    if (dup.ok) throw new Error("accepted");
    expect(dup.lines).toContain("HB two, id: duplicate id 'hb' (also HB buffer)");
  });

  test("the same problem twice is one line; sources, the file's own fields and unnamed entries in words", () => {
    const doc = mopsoSalt();
    doc.substances!.push({ ...doc.substances![0]!, id: "mopso-na-2" });
    const r = parseLibraryText(JSON.stringify(doc), [BUILTIN_LIBRARY]);
    if (r.ok) throw new Error("accepted");
    expect(r.errors.length).toBeGreaterThan(r.lines.length);
    expect(new Set(r.lines).size).toBe(r.lines.length);
    expect(issueWords({ sources: {} }, { path: "sources.s1.title", message: "expected a string, found 5" })).toBe("the source 's1', title: expected a string, found 5");
    expect(issueWords({}, { path: "format", message: "must be 'protolyte-library'" })).toBe("the file's format: must be 'protolyte-library'");
    expect(issueWords({ systems: [{}] }, { path: "systems[0]", message: "missing required field 'id'" })).toBe("acid–base system 1: missing required field 'id'");
    expect(issueWords({ ions: [{ id: "k2" }] }, { path: "ions[0].charge", message: "expected a number" })).toBe("the strong ion 'k2', charge: expected a number");
    const wrong = parseLibraryText('{"format":"other"}');
    expect(!wrong.ok && wrong.message).toBe("not a Protolyte library file: the file's format: must be 'protolyte-library'");
  });
});
