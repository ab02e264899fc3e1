/**
 * Issue 17 item 5 and item 9: with each Try it result, the constants applied — layer, system, each
 * pKa and ΔrH° with its source — so that a personal override of phosphate is seen as such (the
 * substance stays the built-in one; its system does not); the buffer verdict is AQ.CHECK's rule, so
 * plain 0.1 M acetic acid is not "buffered".
 */
import { assessBuffering, solveEquilibrium, thermodynamicPKa } from "../../src/chem";
import { BUILTIN_LIBRARY, createLibrary, type LibraryDoc, type SystemRecord } from "../../src/library";
import { appliedHeading, appliedStepLine } from "../../src/taskpane/applied";
import { bufferingText, tryMixture } from "../../src/taskpane/tryit";

const builtinPhosphate = BUILTIN_LIBRARY.systems!.find((s) => s.id === "phosphate")!;

function personalPhosphate(pK2: number): LibraryDoc {
  const sys = JSON.parse(JSON.stringify(builtinPhosphate)) as SystemRecord;
  sys.steps[1].pKa = { value: pK2, unit: "1", conditions: "25 °C, I = 0", status: "entered" };
  return { format: "protolyte-library", schemaVersion: 1, name: "bench", systems: [sys] };
}

const ROWS = [
  { name: "sodium dihydrogen phosphate monohydrate", amount: "10 mM" },
  { name: "disodium hydrogen phosphate heptahydrate", amount: "10 mM" },
];

test("a personal override of phosphate: the substances are built-in, the system applied is the personal one with its own values and provenance", () => {
  const lib = createLibrary({ builtin: BUILTIN_LIBRARY, personal: personalPhosphate(7.0) });
  const r = tryMixture(lib, ROWS, "25");
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  expect(r.used.map((u) => u.layer)).toEqual(["builtin", "builtin"]);
  expect(r.applied.map((s) => [s.id, s.layer, s.overrides])).toEqual([["phosphate", "personal", ["builtin"]]]);
  expect(appliedHeading(r.applied[0])).toBe("phosphate — personal library (overrides built-in)");
  expect(r.applied[0].steps[1].pKa).toEqual({ value: 7.0, source: "entered by the user" });
  expect(appliedStepLine(r.applied[0], 1, 25)).toMatch(/^step 2: pKa 7 \[entered by the user\]/);
  // step 1 keeps the built-in value and its citation
  expect(r.applied[0].steps[0].pKa.value).toBe(builtinPhosphate.steps[0].pKa.value);
  expect(r.applied[0].steps[0].pKa.source).not.toBe("entered by the user");
  const plain = tryMixture(createLibrary({ builtin: BUILTIN_LIBRARY }), ROWS, "25");
  if (!plain.ok) throw new Error("refused");
  expect(plain.applied[0].layer).toBe("builtin");
  expect(r.pH).toBeLessThan(plain.pH); // a lower pK2 gives a lower pH for the 1:1 pair
});

test("at 37 °C each step shows the pKa applied at that temperature (I = 0) beside its 25 °C value, and its ΔrH° with the source", () => {
  const lib = createLibrary({ builtin: BUILTIN_LIBRARY });
  const r = tryMixture(lib, ROWS, "37");
  if (!r.ok) throw new Error("refused");
  const s2 = builtinPhosphate.steps[1];
  const atT = thermodynamicPKa({ pKa: s2.pKa.value, dH: s2.dH?.value, dCp: s2.dCp?.value }, 37);
  expect(atT.ok && r.applied[0].steps[1].pKaAtT === atT.value).toBe(true);
  const line = appliedStepLine(r.applied[0], 1, 37);
  expect(line).toContain(`(at 37 °C, I = 0: ${(atT as { value: number }).value.toFixed(3)})`);
  if (s2.dH) expect(line).toContain(`ΔrH° ${s2.dH.value} kJ/mol [`);
});

test("plain 0.1 M acetic acid is not labelled buffered; an equimolar acetate pair is (AQ.CHECK's rule)", () => {
  const lib = createLibrary({ builtin: BUILTIN_LIBRARY });
  const acid = tryMixture(lib, [{ name: "acetic acid", amount: "0.1" }], "25");
  if (!acid.ok) throw new Error("refused");
  expect(acid.buffering.verdict).not.toBe("buffer");
  expect(bufferingText(acid.buffering)).not.toMatch(/^buffered/);
  // the same rule as the engine's own assessment of the same equilibrium
  const comp = (lib.resolve("acetic acid") as { ok: true; component: Parameters<typeof solveEquilibrium>[0][number]["component"] }).component;
  const eq = solveEquilibrium([{ component: comp, conc: 0.1 }], { temperatureC: 25 });
  if (!eq.ok) throw new Error(eq.message);
  expect(acid.buffering.verdict).toBe(assessBuffering(eq, comp.systems.map((s) => s.system), 25, "davies").verdict);
  const pair = tryMixture(lib, [{ name: "acetic acid", amount: "0.05" }, { name: "sodium acetate", amount: "0.05" }], "25");
  if (!pair.ok) throw new Error("refused");
  expect(bufferingText(pair.buffering)).toMatch(/^buffered \(pH within ±1 of pKa′ 4\.\d\d of acetate\)/);
});
