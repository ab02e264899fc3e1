/**
 * Complexation in the exact solve (src/chem/complex-solver.ts): identities over random mixtures
 * with metal ions, chelators and polyborates (fast-check), and limits the model must reach.
 * The constants here are test data for identities (which hold whatever the constants are); the
 * library's sourced values are checked in test/reference (complexation cases).
 */
import fc from "fast-check";
import { daviesLog10Gamma, debyeHuckelA, prepare, solveEquilibrium, type AcidBaseSystem, type ActivityModel, type Component, type Equilibrium, type Mixture, type StrongIon } from "../../src/chem";
import { borate, carbonate, citrate, phosphate } from "./fixtures";

const SCALE = Number(process.env.CHEM_PROPERTY_RUNS_SCALE ?? "1");

const ca: StrongIon = { id: "ca", name: "Ca2+", charge: 2 };
const mg: StrongIon = { id: "mg", name: "Mg2+", charge: 2 };
const zn: StrongIon = { id: "zn", name: "Zn2+", charge: 2 };
const na: StrongIon = { id: "na", name: "Na+", charge: 1 };
const cl: StrongIon = { id: "cl", name: "Cl-", charge: -1 };

// Test data (identities hold for any constants): magnitudes like those of the library.
const citrateCx: AcidBaseSystem = {
  ...citrate,
  complexes: [
    { name: "CaCit-", metal: "ca", ligands: 1, protons: 0, logBeta: 4.8, dH: 1 },
    { name: "CaHCit", metal: "ca", ligands: 1, protons: 1, logBeta: 9.3 },
    { name: "MgCit-", metal: "mg", ligands: 1, protons: 0, logBeta: 4.8 },
    { name: "ZnCit-", metal: "zn", ligands: 1, protons: 0, logBeta: 6.2 },
    { name: "ZnCit2^4-", metal: "zn", ligands: 2, protons: 0, logBeta: 7.4 },
  ],
};
const phosphateCx: AcidBaseSystem = {
  ...phosphate,
  complexes: [
    { name: "CaHPO4", metal: "ca", ligands: 1, protons: 1, logBeta: 14.7 },
    { name: "CaPO4-", metal: "ca", ligands: 1, protons: 0, logBeta: 6.5 },
    { name: "MgHPO4", metal: "mg", ligands: 1, protons: 1, logBeta: 15.2 },
  ],
};
const carbonateCx: AcidBaseSystem = { ...carbonate, complexes: [{ name: "CaCO3", metal: "ca", ligands: 1, protons: 0, logBeta: 3.2 }] };
const edta: AcidBaseSystem = {
  id: "edta",
  name: "edetate",
  topCharge: 2,
  steps: [{ pKa: 0 }, { pKa: 1.5 }, { pKa: 2.0 }, { pKa: 2.69 }, { pKa: 6.13 }, { pKa: 10.37 }],
  complexes: [
    { name: "CaEDTA^2-", metal: "ca", ligands: 1, protons: 0, logBeta: 12.4 },
    { name: "MgEDTA^2-", metal: "mg", ligands: 1, protons: 0, logBeta: 10.6 },
    { name: "ZnEDTA^2-", metal: "zn", ligands: 1, protons: 0, logBeta: 18.0 },
    { name: "ZnHEDTA-", metal: "zn", ligands: 1, protons: 1, logBeta: 21.4 },
  ],
};
const borateCx: AcidBaseSystem = {
  ...borate,
  complexes: [
    { name: "B2(OH)7-", ligands: 2, protons: 1, logBeta: 9.3 },
    { name: "B3O3(OH)4-", ligands: 3, protons: 2, logBeta: 20.4 },
    { name: "B4O5(OH)4^2-", ligands: 4, protons: 2, logBeta: 20.1 },
  ],
};

const salt = (ion: StrongIon): Component => ({ id: `${ion.id}cl2`, name: `${ion.id} chloride`, systems: [], ions: [{ ion, stoich: 1 }, { ion: cl, stoich: 2 }] });
const sodiumOf = (system: AcidBaseSystem, nNa: number): Component => ({ id: `${system.id}-na${nNa}`, name: `${system.id} Na${nNa}`, systems: [{ system, stoich: 1 }], ions: nNa > 0 ? [{ ion: na, stoich: nNa }] : [] });
const NaOH: Component = { id: "naoh", name: "NaOH", systems: [], ions: [{ ion: na, stoich: 1 }] };
const HCl: Component = { id: "hcl", name: "HCl", systems: [], ions: [{ ion: cl, stoich: 1 }] };

const LIGANDS = [citrateCx, phosphateCx, carbonateCx, edta, borateCx];
const METALS = [ca, mg, zn];
const conc = fc.double({ min: Math.log(1e-5), max: Math.log(0.05), noNaN: true }).map(Math.exp);

interface Case {
  mix: Mixture;
  temperatureC: number;
  activity: ActivityModel;
  text: string;
}

const caseArb: fc.Arbitrary<Case> = fc
  .record({
    ligands: fc.subarray([0, 1, 2, 3, 4], { minLength: 1 }),
    metals: fc.subarray([0, 1, 2], { minLength: 1 }),
    lc: fc.array(conc, { minLength: 5, maxLength: 5 }),
    mc: fc.array(conc, { minLength: 3, maxLength: 3 }),
    nNa: fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 5, maxLength: 5 }),
    acidBase: fc.double({ min: -0.05, max: 0.05, noNaN: true }),
    temperatureC: fc.constantFrom(5, 25, 37, 60),
    activity: fc.constantFrom<ActivityModel>("davies", "ideal", "debye-huckel"),
  })
  .map((r) => {
    const mix: Mixture = [];
    for (const i of r.ligands) mix.push({ component: sodiumOf(LIGANDS[i], r.nNa[i]), conc: r.lc[i] });
    for (const j of r.metals) mix.push({ component: salt(METALS[j]), conc: r.mc[j] });
    if (r.acidBase > 0) mix.push({ component: NaOH, conc: r.acidBase });
    if (r.acidBase < 0) mix.push({ component: HCl, conc: -r.acidBase });
    const text = mix.map((e) => `${e.component.name} ${e.conc.toExponential(3)}`).join(", ") + ` @ ${r.temperatureC} °C ${r.activity}`;
    return { mix, temperatureC: r.temperatureC, activity: r.activity, text };
  });

function solve(c: Case, mix = c.mix): Equilibrium {
  const p = prepare(mix);
  if (!p.ok) throw new Error(`${c.text}: ${p.message}`);
  const eq = p.solveBeyondLimit({ temperatureC: c.temperatureC, activity: c.activity });
  if (!eq.ok) throw new Error(`${c.text}: ${eq.code} ${eq.message}`);
  return eq;
}

function close(actual: number, expected: number, rel: number, abs: number, what: string, c: Case): void {
  if (!(Math.abs(actual - expected) <= rel * Math.abs(expected) + abs)) {
    throw new Error(`${what}: ${actual} vs ${expected} (rel ${rel}, abs ${abs})\n  ${c.text}`);
  }
}

describe("complexation: identities at the solved state (random mixtures with metals)", () => {
  test("charge balance, metal and ligand mass balances, and every formation constant hold", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const eq = solve(c);
        close(eq.residual, 0, 0, 1e-10, "charge-balance residual", c);
        // Mass balances: every metal's and every system's total is found again in its species.
        for (const metal of METALS) {
          const total = c.mix.reduce((s, e) => s + e.conc * (e.component.ions.find((x) => x.ion.id === metal.id)?.stoich ?? 0), 0);
          if (total === 0) continue;
          let found = eq.species.find((sp) => sp.systemId === null && sp.name === metal.name)?.conc ?? NaN;
          for (const sp of eq.species) if (sp.metalId === metal.id && sp.systemId !== null) found += sp.conc;
          close(found, total, 1e-9, 1e-18, `mass balance of ${metal.name}`, c);
        }
        for (const sys of LIGANDS) {
          const total = c.mix.reduce((s, e) => s + e.conc * (e.component.systems.find((x) => x.system.id === sys.id)?.stoich ?? 0), 0);
          if (total === 0) continue;
          let found = 0;
          for (const sp of eq.species) if (sp.systemId === sys.id) found += sp.fraction * total;
          close(found, total, 1e-9, 1e-18, `mass balance of ${sys.id}`, c);
        }
        // Formation constants (at 25 °C, where log β needs no temperature term): activities.
        if (c.temperatureC === 25) {
          const A = debyeHuckelA(25);
          const lg = (z: number) => (c.activity === "ideal" ? 0 : c.activity === "davies" ? daviesLog10Gamma(z, eq.ionicStrength, A) : -A * z * z * Math.sqrt(eq.ionicStrength) / (1 + 1.5 * Math.sqrt(eq.ionicStrength)));
          const la = (name: string, sysId: string | null) => {
            const sp = eq.species.find((s) => s.name === name && s.systemId === sysId);
            return sp ? Math.log10(sp.conc) + lg(sp.charge) : NaN;
          };
          const laH = -eq.pH;
          for (const sys of LIGANDS) {
            for (const cx of sys.complexes ?? []) {
              const lc = la(cx.name, sys.id);
              if (Number.isNaN(lc)) continue;
              const last = sys.steps.length;
              const lL = la(sys.speciesNames?.[last] ?? `${sys.name} L(${Math.abs(sys.topCharge - last)}-)`, sys.id);
              const lM = cx.metal ? la(METALS.find((m) => m.id === cx.metal)!.name, null) : 0;
              close(lc, cx.logBeta + lM + cx.ligands * lL + cx.protons * laH, 0, 1e-7, `log β of ${cx.name}`, c);
            }
          }
        }
      }),
      { numRuns: 600 * SCALE, seed: 2112 },
    );
  });

  test("pH rises with added strong base, and β agrees with the titration curve", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const eq = solve(c);
        const d = 1e-4 * eq.beta;
        const up = solve(c, [...c.mix, { component: NaOH, conc: d }]);
        if (!(up.pH > eq.pH)) throw new Error(`pH did not rise: ${eq.pH} → ${up.pH}\n  ${c.text}`);
        if (!(eq.beta > 0)) throw new Error(`β not positive: ${eq.beta}\n  ${c.text}`);
        close((up.pH - eq.pH) / d, 1 / eq.beta, 2e-3, 0, "dpH/dCb against 1/β", c);
      }),
      { numRuns: 200 * SCALE, seed: 2113 },
    );
  });
});

describe("complexation: limits and the fast path", () => {
  const cit = (system: AcidBaseSystem) => sodiumOf(system, 3);
  test("a complex too weak to form (log β = −40) gives the pH of the mixture without it", () => {
    const weak: AcidBaseSystem = { ...citrate, complexes: [{ name: "CaCit-", metal: "ca", ligands: 1, protons: 0, logBeta: -40 }] };
    const a = solveEquilibrium([{ component: cit(weak), conc: 0.02 }, { component: salt(ca), conc: 0.01 }]);
    const b = solveEquilibrium([{ component: cit(citrate), conc: 0.02 }, { component: salt(ca), conc: 0.01 }]);
    if (!a.ok || !b.ok) throw new Error("solve failed");
    expect(Math.abs(a.pH - b.pH)).toBeLessThan(1e-10);
    expect(Math.abs(a.beta - b.beta) / b.beta).toBeLessThan(1e-6);
  });

  test("a system with complexes but without their metal is solved by the plain solver, bit for bit", () => {
    const a = solveEquilibrium([{ component: cit(citrateCx), conc: 0.02 }, { component: HCl, conc: 0.01 }]);
    const b = solveEquilibrium([{ component: cit(citrate), conc: 0.02 }, { component: HCl, conc: 0.01 }]);
    if (!a.ok || !b.ok) throw new Error("solve failed");
    expect(a.pH).toBe(b.pH);
    expect(a.beta).toBe(b.beta);
  });

  test("a strong chelator in excess leaves almost no free metal (EDTA 10 mM, Ca 5 mM, pH near 10)", () => {
    const eq = solveEquilibrium([{ component: sodiumOf(edta, 4), conc: 0.01 }, { component: salt(ca), conc: 0.005 }]);
    if (!eq.ok) throw new Error(eq.message);
    const free = eq.species.find((s) => s.name === "Ca2+")!;
    expect(free.fraction).toBeLessThan(1e-6);
  });

  test("a prepared mixture with complexes gives the same numbers again (every solve starts cold)", () => {
    const mix: Mixture = [{ component: cit(citrateCx), conc: 0.02 }, { component: salt(ca), conc: 0.01 }, { component: salt(zn), conc: 0.001 }];
    const p = prepare(mix);
    if (!p.ok) throw new Error(p.message);
    const first = p.solve({ temperatureC: 37 });
    p.solve({ temperatureC: 5, activity: "ideal" });
    const again = p.solve({ temperatureC: 37 });
    const fresh = solveEquilibrium(mix, { temperatureC: 37 });
    if (!first.ok || !again.ok || !fresh.ok) throw new Error("solve failed");
    expect(again.pH).toBe(first.pH);
    expect(fresh.pH).toBe(first.pH);
    expect(again.beta).toBe(first.beta);
  });

  test("two components naming one system with different complexes are refused", () => {
    const r = solveEquilibrium([{ component: cit(citrateCx), conc: 0.01 }, { component: cit({ ...citrate, complexes: [] }), conc: 0.01 }]);
    expect(r.ok).toBe(false);
  });

  test("an invalid complex (fractional ligands) is refused with a message", () => {
    const bad: AcidBaseSystem = { ...citrate, complexes: [{ name: "odd", metal: "ca", ligands: 1.5, protons: 0, logBeta: 3 }] };
    const r = solveEquilibrium([{ component: cit(bad), conc: 0.01 }, { component: salt(ca), conc: 0.01 }]);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/whole number of ligands/);
  });
});
