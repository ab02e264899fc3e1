/** Apparent pKa, osmolarity, ionic strength, warnings: identities with the solved equilibrium. */
import { apparentPKa, ionicStrength, osmolarity, prepare, solveEquilibrium, type Component } from "../../src/chem";
import * as f from "./fixtures";

describe("apparentPKa", () => {
  // Identity: in any solved mixture, −log10([H⁺][B]/[A]) from the species list equals the apparent
  // pKa at the mixture's own temperature and ionic strength. 1e-9: solver and rounding precision.
  test.each(["davies", "debye-huckel", "ideal"] as const)("matches the speciation of a phosphate buffer (%s, 37 °C)", (model) => {
    const eq = solveEquilibrium(f.mixture([f.KH2PO4, 0.02], [f.Na2HPO4, 0.03], [f.NaCl, 0.1]), { temperatureC: 37, activity: model });
    if (!eq.ok) throw new Error(eq.message);
    const c = (name: string) => eq.species.find((s) => s.name === name)!.conc;
    const fromSpecies = -Math.log10((c("H+") * c("phosphate HL(2-)")) / c("phosphate H2L(1-)"));
    const r = apparentPKa(f.phosphate, 1, 37, eq.ionicStrength, model);
    if (!r.ok) throw new Error(r.message);
    f.expectAbs(r.value, fromSpecies, 1e-9, `apparent pK2 of phosphate, ${model}, I = ${eq.ionicStrength}`);
  });

  test("equals the thermodynamic pKa at I = 0 and for the ideal model", () => {
    const a = apparentPKa(f.tris, 0, 25, 0, "davies");
    const b = apparentPKa(f.tris, 0, 25, 0.2, "ideal");
    expect(a.ok && a.value).toBe(8.072);
    expect(b.ok && b.value).toBe(8.072);
  });

  test("the charge of the acid form sets the sign: Tris (HL⁺ → L) is unchanged by Davies, acetate falls", () => {
    // pK′ − pK = 2·A·f(I)·(zA − 1): zero for zA = 1, negative for zA = 0.
    const trisAt = apparentPKa(f.tris, 0, 25, 0.1, "davies");
    const acAt = apparentPKa(f.acetate, 0, 25, 0.1, "davies");
    expect(trisAt.ok && trisAt.value).toBe(8.072);
    expect(acAt.ok && acAt.value < 4.756).toBe(true);
  });
});

describe("osmolarity and ionic strength", () => {
  test("NaCl 0.154 M (normal saline): 0.308 osmol/L and I = 0.154 mol/L (ideal, 2 particles per NaCl; common practice)", () => {
    const o = osmolarity(f.mixture([f.NaCl, 0.154]));
    const i = ionicStrength(f.mixture([f.NaCl, 0.154]));
    if (!o.ok || !i.ok) throw new Error("solve failed");
    // relative 1e-5: H⁺ and OH⁻ add 2e-7 osmol/L and 1e-7 mol/L.
    f.expectRel(o.value, 0.308, 1e-5, "osmolarity of NaCl 0.154 M");
    f.expectRel(i.value, 0.154, 1e-5, "ionic strength of NaCl 0.154 M");
  });

  test("neutral particles count: sucrose 0.1 M adds 0.1 osmol/L and nothing to I", () => {
    const sucrose: Component = { id: "sucrose", name: "sucrose", systems: [], ions: [], neutral: 1 };
    const base = f.mixture([f.NaCl, 0.1]);
    const withSucrose = [...base, ...f.mixture([sucrose, 0.1])];
    const o0 = osmolarity(base);
    const o1 = osmolarity(withSucrose);
    const i0 = ionicStrength(base);
    const i1 = ionicStrength(withSucrose);
    if (!o0.ok || !o1.ok || !i0.ok || !i1.ok) throw new Error("solve failed");
    f.expectAbs(o1.value - o0.value, 0.1, 1e-12, "osmolarity added by sucrose 0.1 M");
    expect(i1.value).toBe(i0.value);
  });

  test("phosphate 0.025/0.025: osmolarity is the sum of every species (K⁺ 0.025, Na⁺ 0.05, phosphate 0.05)", () => {
    const o = osmolarity(f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]));
    if (!o.ok) throw new Error(o.message);
    // Species sum: 0.025 + 0.05 + 0.05 + H⁺ + OH⁻ (≈ 3e-7): 1e-5 relative.
    f.expectRel(o.value, 0.125, 1e-5, "osmolarity phosphate 0.025/0.025");
  });
});

describe("warnings", () => {
  test("I above 0.3 mol/L: the activity model loses accuracy; above 0.5: strongly", () => {
    const a = solveEquilibrium(f.mixture([f.NaCl, 0.4], [f.aceticAcid, 0.01]));
    const b = solveEquilibrium(f.mixture([f.NaCl, 0.8], [f.aceticAcid, 0.01]));
    const c = solveEquilibrium(f.mixture([f.NaCl, 0.1], [f.aceticAcid, 0.01]));
    if (!a.ok || !b.ok || !c.ok) throw new Error("solve failed");
    expect(a.warnings.join(" ")).toMatch(/loses accuracy/);
    expect(b.warnings.join(" ")).toMatch(/unreliable/);
    expect(c.warnings).toEqual([]);
  });

  test("ΔrH° missing away from 25 °C is reported; within 5 K it is not", () => {
    const noDH = { ...f.acetate, id: "acetate-no-dH", steps: [{ pKa: 4.756 }] };
    const comp: Component = { id: "a", name: "a", systems: [{ system: noDH, stoich: 1 }], ions: [] };
    const at40 = solveEquilibrium(f.mixture([comp, 0.01]), { temperatureC: 40 });
    const at28 = solveEquilibrium(f.mixture([comp, 0.01]), { temperatureC: 28 });
    if (!at40.ok || !at28.ok) throw new Error("solve failed");
    expect(at40.warnings.join(" ")).toMatch(/ΔrH° is unknown for acetate/);
    expect(at28.warnings).toEqual([]);
  });
});

describe("equilibrium record", () => {
  test("lists H⁺, OH⁻, every strong ion and every species with its system", () => {
    const eq = solveEquilibrium(f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]));
    if (!eq.ok) throw new Error(eq.message);
    expect(eq.species.map((s) => s.name)).toEqual([
      "H+", "OH-", "K+", "Na+", "phosphate H3L", "phosphate H2L(1-)", "phosphate HL(2-)", "phosphate L(3-)",
    ]);
    expect(eq.species.filter((s) => s.systemId === "phosphate").map((s) => s.charge)).toEqual([0, -1, -2, -3]);
    // pH and p[H] differ by −log γH.
    f.expectAbs(eq.pH - eq.pcH, -Math.log10(eq.gammaH), 1e-12, "pH − p[H] = −log γH");
  });

  test("a prepared mixture gives the same result as a fresh solve, whatever was solved before", () => {
    const mix = f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]);
    const p = prepare(mix);
    if (!p.ok) throw new Error(p.message);
    const first = p.solve({ temperatureC: 37 });
    p.solve({ temperatureC: 5, activity: "ideal" });
    const again = p.solve({ temperatureC: 37 });
    expect(again).toEqual(first);
    expect(solveEquilibrium(mix, { temperatureC: 37 })).toEqual(first);
  });
});
