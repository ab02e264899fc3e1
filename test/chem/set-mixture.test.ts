/**
 * PreparedMixture.setMixture (src/chem/prepared.ts): the solver of one mixture takes other amounts of
 * the same components (the rows of a what-if table). Identity checked: after any sequence of amounts,
 * temperatures and activity models, every result equals, bit for bit, that of a mixture prepared
 * afresh; what it refuses leaves the mixture as it was.
 */
import fc from "fast-check";
import { prepare, type ActivityModel, type Component, type Mixture, type PreparedMixture, type StrongIon } from "../../src/chem";
import { citrate, mixture, Na2HPO4, NaCl, NaH2PO4, NaOH } from "./fixtures";

const SCALE = Number(process.env.CHEM_PROPERTY_RUNS_SCALE ?? "1");

const COMPONENTS: Component[] = [NaH2PO4, Na2HPO4, NaCl, NaOH];
const of = (amounts: number[]): Mixture => mixture(...amounts.map((c, i) => [COMPONENTS[i]!, c] as [Component, number]));

function prepared(mix: Mixture): PreparedMixture {
  const p = prepare(mix);
  if (!p.ok) throw new Error(p.message);
  return p;
}

const amount = fc.oneof(fc.constant(0), fc.double({ min: 1e-6, max: 0.3, noNaN: true }));
const row = fc.record({
  amounts: fc.tuple(amount, amount, amount, amount).filter((a) => a[0] + a[1] > 0),
  temperatureC: fc.constantFrom(5, 25, 37, 60),
  activity: fc.constantFrom<ActivityModel>("ideal", "davies", "pitzer"),
});

describe("setMixture: the same results as a fresh preparation", () => {
  test("any sequence of rows, temperatures and models: every equilibrium equal bit for bit", () => {
    fc.assert(
      fc.property(fc.array(row, { minLength: 2, maxLength: 6 }), (rows) => {
        const reused = prepared(of([0.01, 0.01, 0, 0]));
        for (const r of rows) {
          const mix = of(r.amounts);
          expect(reused.setMixture(mix)).toBe(true);
          const options = { temperatureC: r.temperatureC, activity: r.activity };
          expect(reused.solve(options)).toEqual(prepared(mix).solve(options));
          expect(reused.solvePH(options)).toEqual(prepared(mix).solvePH(options));
          expect(reused.aggregate).toEqual(prepared(mix).aggregate);
        }
      }),
      { numRuns: Math.round(60 * SCALE) },
    );
  });

  test("amounts prepare() refuses: false, and the mixture keeps its amounts", () => {
    const p = prepared(of([0.02, 0.03, 0.1, 0]));
    const before = p.solve({ temperatureC: 25 });
    expect(p.setMixture(of([0.02, -0.01, 0, 0]))).toBe(false);
    expect(p.setMixture(of([25, 0.01, 0, 0]))).toBe(false);
    expect(p.solve({ temperatureC: 25 })).toEqual(before);
  });

  test("other components, or complexes that can form: false (another solver is needed)", () => {
    const p = prepared(of([0.02, 0.03, 0.1, 0]));
    expect(p.setMixture(mixture([NaH2PO4, 0.02], [Na2HPO4, 0.03]))).toBe(false);
    const ca: StrongIon = { id: "ca", name: "Ca2+", charge: 2 };
    const cl: StrongIon = { id: "cl", name: "Cl-", charge: -1 };
    const citrateCx = { ...citrate, complexes: [{ name: "CaCit-", metal: "ca", ligands: 1, protons: 0, logBeta: 4.8 }] };
    const cit: Component = { id: "citric acid", name: "citric acid", systems: [{ system: citrateCx, stoich: 1 }], ions: [] };
    const cacl2: Component = { id: "CaCl2", name: "CaCl2", systems: [], ions: [{ ion: ca, stoich: 1 }, { ion: cl, stoich: 2 }] };
    // No calcium: the plain solver; calcium added: a complex can form, so not in place.
    const plain = prepared(mixture([cit, 0.01], [cacl2, 0]));
    expect(plain.setMixture(mixture([cit, 0.02], [cacl2, 0]))).toBe(true);
    expect(plain.setMixture(mixture([cit, 0.02], [cacl2, 0.005]))).toBe(false);
    const complexing = prepared(mixture([cit, 0.01], [cacl2, 0.005]));
    expect(complexing.setMixture(mixture([cit, 0.01], [cacl2, 0.002]))).toBe(false);
  });
});
