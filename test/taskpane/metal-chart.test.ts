/**
 * The Picture view's metal distribution without a browser: the curve the pane computes with chem's
 * complexing solver for a metal that forms complexes (calcium in a citrate buffer, the library's
 * constants), and its SVG on the small stand-in DOM.
 */
import { solveEquilibrium } from "../../src/chem";
import { getActiveLibrary, resetActiveLibrary } from "../../src/library";
import { displayName } from "../../src/taskpane/charts/palette";
import { speciation, type SpeciationData } from "../../src/taskpane/charts/speciation";
import { renderMetalDistribution } from "../../src/taskpane/charts/speciation-svg";
import { halfFreePH } from "../../src/taskpane/charts/summary";
import { parsePaneMixture, type TryRow } from "../../src/taskpane/tryit";
import { fake, fakeDocument } from "./support/fake-svg-dom";

const CA_CITRATE: TryRow[] = [
  { name: "trisodium citrate dihydrate", amount: "10 mM" },
  { name: "calcium chloride dihydrate", amount: "4 mM" },
];

function spec(rows: TryRow[]): SpeciationData {
  const m = parsePaneMixture(getActiveLibrary(), rows, "25");
  if (!m.ok) throw new Error(JSON.stringify(m.issues));
  const s = speciation(m.mix, { temperatureC: m.temperatureC });
  if (!s.ok) throw new Error(s.message);
  return s;
}

beforeAll(() => resetActiveLibrary());

describe("metal distribution in the Picture view's data", () => {
  test("calcium in citrate: free Ca²⁺ and each calcium–citrate complex, summing to the total at every pH of the axis", () => {
    const d = spec(CA_CITRATE);
    expect(d.metals.map((m) => m.name)).toEqual(["Ca2+"]);
    const m = d.metals[0];
    expect(m.total).toBeCloseTo(0.004, 12);
    expect(m.forms[0].name).toBe("Ca2+");
    expect(m.forms.map((f) => f.name)).toEqual(expect.arrayContaining(["CaCit-", "CaHCit"]));
    for (const f of m.forms) expect(f.fractions).toHaveLength(d.pH.length);
    for (let i = 0; i < d.pH.length; i++) {
      const sum = m.forms.reduce((s, f) => s + f.fractions[i], 0);
      expect({ pH: d.pH[i], off: Math.abs(sum - 1) < 1e-9 }).toEqual({ pH: d.pH[i], off: true });
    }
  });

  test("at low pH the free ion dominates; at the mixture's pH (about 8) most calcium is bound", () => {
    const d = spec(CA_CITRATE);
    const free = d.metals[0].forms[0];
    expect(free.fractions[0]).toBeGreaterThan(0.999); // pH 0
    expect(free.fractions[d.pH.indexOf(2)]).toBeGreaterThan(0.95);
    expect(free.atMixture).toBeLessThan(0.2);
    const half = halfFreePH(d.metals[0], d.pH);
    expect(half).not.toBeNull();
    expect(half!).toBeGreaterThan(3);
    expect(half!).toBeLessThan(d.mixturePH);
  });

  test("the citrate diagram shows the citrate bound to calcium: its shares sum to 1 at every pH, CaCit⁻ among them", () => {
    const d = spec(CA_CITRATE);
    const cit = d.systems.find((s) => s.id === "citrate")!;
    expect(cit.species.map((s) => s.name)).toEqual(expect.arrayContaining(["Cit^3-", "CaCit-", "CaHCit"]));
    for (let i = 0; i < d.pH.length; i += 10) {
      const sum = cit.species.reduce((s, f) => s + f.fractions[i], 0);
      expect({ pH: d.pH[i], off: Math.abs(sum - 1) < 1e-9 }).toEqual({ pH: d.pH[i], off: true });
    }
    // 4 mM calcium, mostly bound, on 10 mM citrate: CaCit⁻ is about a third of the citrate at the mixture's pH
    const caCit = cit.species.find((s) => s.name === "CaCit-")!;
    expect(caCit.atMixture).toBeGreaterThan(0.3);
    expect(caCit.atMixture).toBeLessThan(0.4);
    expect(caCit.ligands).toBe(1);
  });

  test("borax: the borate diagram shows triborate, counted three borons each (its mol/L is share × total / 3)", () => {
    const d = spec([{ name: "borax", amount: "10 mM" }]);
    const b = d.systems.find((s) => s.id === "borate")!;
    const tri = b.species.find((s) => s.name === "B3O3(OH)4-")!;
    expect(tri.ligands).toBe(3);
    const m = parsePaneMixture(getActiveLibrary(), [{ name: "borax", amount: "10 mM" }], "25");
    if (!m.ok) throw new Error("borax");
    const eq = solveEquilibrium(m.mix, { temperatureC: 25 });
    if (!eq.ok) throw new Error(eq.message);
    const conc = eq.species.find((s) => s.name === "B3O3(OH)4-")!.conc;
    expect(Math.abs((tri.atMixture * b.total) / 3 - conc) / conc).toBeLessThan(1e-9);
    expect(b.total).toBeCloseTo(0.04, 12);
    expect(d.metals).toEqual([]);
  });

  test("a mixture without a complexing metal has no metal picture", () => {
    const d = spec([
      { name: "sodium dihydrogen phosphate", amount: "10 mM" },
      { name: "disodium hydrogen phosphate", amount: "10 mM" },
    ]);
    expect(d.metals).toEqual([]);
  });
});

describe("metal distribution SVG", () => {
  test("one path per form, axes in % of the metal, legend in chemists' writing, title and a summary in words", () => {
    const d = spec(CA_CITRATE);
    const m = d.metals[0];
    const svg = fake(renderMetalDistribution(fakeDocument, m, d));
    expect(svg.getAttribute("role")).toBe("img");
    expect(svg.getAttribute("class")).toMatch(/metal-distribution/);
    expect(svg.getAttribute("data-metal")).toBe("ca");
    expect(svg.byClass("species-line").map((p) => p.getAttribute("data-species"))).toEqual(m.forms.map((f) => f.name));
    expect(svg.byClass("axis-title").map((e) => e.textContent)).toEqual(["pH", "% of Ca²⁺"]);
    expect(svg.byClass("legend-item").map((e) => e.textContent)).toEqual(m.forms.map((f) => displayName(f.name, f.charge)));
    expect(svg.byClass("legend-item")[0].textContent).toBe("Ca²⁺");
    expect(svg.byTag("title")[0].textContent).toBe("Ca2+ free and in complexes from pH 0 to 14");
    const label = svg.getAttribute("aria-label") ?? "";
    expect(label).toMatch(/At the mixture's pH \d\.\d\d: CaCit- \d+ %/);
    expect(label).toMatch(/Half of it is free at pH \d\.\d\d\.$/);
    expect(Number(svg.byClass("mixture-ph")[0].getAttribute("data-ph"))).toBeCloseTo(d.mixturePH, 3);
  });

  test("a charge written after the symbol shows as the charge when it is known: Ca2+ → Ca²⁺, Fe3+ → Fe³⁺; formulas unchanged", () => {
    expect(displayName("Ca2+", 2)).toBe("Ca²⁺");
    expect(displayName("Fe3+", 3)).toBe("Fe³⁺");
    expect(displayName("CaEDTA^2-", -2)).toBe("CaEDTA²⁻");
    expect(displayName("H2PO4-", -1)).toBe("H₂PO₄⁻");
    expect(displayName("Zn(His)2", 0)).toBe("Zn(His)₂");
    expect(displayName("Ca2+")).toBe("Ca₂⁺"); // without the charge the digits read as a count of atoms
  });
});
