/**
 * fast-check generators of random mixtures for the property tests: 1–3 random acid–base systems of
 * 1–3 steps (pKa 0–14 in any order, top charge −1…+2, ΔrH° and ΔrCp° sometimes missing), strong
 * ions of charge ±1 and ±2, every concentration log-uniform in 1e-6–0.5 mol/L, 0–100 °C, all three
 * activity models.
 */
import fc from "fast-check";
import type { AcidBaseSystem, ActivityModel, Component, Mixture, StrongIon } from "../../src/chem";

export interface Case {
  mix: Mixture;
  temperatureC: number;
  activity: ActivityModel;
}

const ION_POOL: StrongIon[] = [
  { id: "Na+", name: "Na+", charge: 1 },
  { id: "Cl-", name: "Cl-", charge: -1 },
  { id: "Ca2+", name: "Ca2+", charge: 2 },
  { id: "SO4 2-", name: "SO4 2-", charge: -2 },
];

/** Log-uniform concentration in [1e-6, 0.5] mol/L. */
export const concArb = fc.double({ min: Math.log(1e-6), max: Math.log(0.5), noNaN: true }).map(Math.exp);

const stepArb = fc.record(
  {
    pKa: fc.double({ min: 0, max: 14, noNaN: true }),
    dH: fc.double({ min: -60, max: 60, noNaN: true }),
    dCp: fc.double({ min: -400, max: 200, noNaN: true }),
  },
  { requiredKeys: ["pKa"] },
);

const systemArb = (i: number): fc.Arbitrary<AcidBaseSystem> =>
  fc.record({ topCharge: fc.integer({ min: -1, max: 2 }), steps: fc.array(stepArb, { minLength: 1, maxLength: 3 }) }).map(
    ({ topCharge, steps }) => ({ id: `sys${i}`, name: `system ${i}`, topCharge, steps }),
  );

const systemsArb = fc.integer({ min: 1, max: 3 }).chain((n) => fc.tuple(...Array.from({ length: n }, (_, i) => systemArb(i))));

export const modelArb = fc.constantFrom<ActivityModel>("davies", "ideal", "debye-huckel");

/** A random mixture: each system as its own component, each strong ion as its own component. */
export const caseArb: fc.Arbitrary<Case> = fc
  .record({
    systems: systemsArb,
    sysConc: fc.array(concArb, { minLength: 3, maxLength: 3 }),
    ionConc: fc.array(fc.option(concArb, { nil: undefined, freq: 2 }), { minLength: 4, maxLength: 4 }),
    temperatureC: fc.double({ min: 0, max: 100, noNaN: true }),
    activity: modelArb,
  })
  .map(({ systems, sysConc, ionConc, temperatureC, activity }) => {
    const mix: Mixture = systems.map((system, i) => ({
      component: { id: system.id, name: system.name, systems: [{ system, stoich: 1 }], ions: [] } as Component,
      conc: sysConc[i],
    }));
    ionConc.forEach((c, i) => {
      if (c !== undefined) {
        const ion = ION_POOL[i];
        mix.push({ component: { id: ion.id, name: ion.name, systems: [], ions: [{ ion, stoich: 1 }] }, conc: c });
      }
    });
    return { mix, temperatureC, activity };
  });

/** NaOH as a component (one Na⁺ per formula; its OH⁻ is found by the charge balance). */
export const NaOHComponent: Component = {
  id: "NaOH",
  name: "NaOH",
  systems: [],
  ions: [{ ion: ION_POOL[0], stoich: 1 }],
};

/** Short description of a case for failure messages. */
export function describeCase(c: Case): string {
  const parts = c.mix.map((e) => {
    const s = e.component.systems[0]?.system;
    const what = s ? `${s.id}(z0=${s.topCharge}; pKa ${s.steps.map((st) => st.pKa.toFixed(3)).join("/")})` : e.component.id;
    return `${what} ${e.conc.toExponential(3)} M`;
  });
  return `${parts.join(" + ")}, ${c.temperatureC.toFixed(2)} °C, ${c.activity}`;
}
