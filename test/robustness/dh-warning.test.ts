/**
 * Activity-model range warnings: extended Debye–Hückel is meant for I ≤ 0.1 mol/L (src/chem/README.md,
 * Validity limits), so its results warn from there, not only beyond Davies' 0.3 mol/L.
 */
import { solveEquilibrium } from "../../src/chem";
import type { Component } from "../../src/chem/types";
import { getActiveLibrary, resetActiveLibrary } from "../../src/library";

beforeEach(() => resetActiveLibrary());

function component(name: string): Component {
  const r = getActiveLibrary().resolve(name);
  if (!r.ok) throw new Error(r.message);
  return r.component;
}

describe("extended Debye–Hückel warns beyond its own range (I ≤ 0.1 mol/L), not only beyond Davies' (0.3)", () => {
  const mix = (nacl: number) => [
    { component: component("NaCl"), conc: nacl },
    { component: component("acetic acid"), conc: 0.01 },
  ];

  test("I ≈ 0.2 mol/L: a warning with debye-huckel, none with davies", () => {
    const dh = solveEquilibrium(mix(0.2), { activity: "debye-huckel" });
    const dv = solveEquilibrium(mix(0.2), { activity: "davies" });
    if (!dh.ok || !dv.ok) throw new Error("solve failed");
    expect(dh.warnings).toEqual([expect.stringMatching(/above 0\.1 mol\/L: the debye-huckel activity model loses accuracy/)]);
    expect(dv.warnings).toEqual([]);
  });

  test("I ≈ 0.05 mol/L: no warning with debye-huckel", () => {
    const dh = solveEquilibrium(mix(0.05), { activity: "debye-huckel" });
    if (!dh.ok) throw new Error(dh.message);
    expect(dh.warnings).toEqual([]);
  });
});
