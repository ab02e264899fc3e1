/**
 * A metal ion's distribution against pH (src/chem/metal-distribution.ts, PreparedMixture.metalDistribution):
 * shares that close the metal's mass balance at every pH, the free ion at low pH, the solved
 * speciation at the mixture's own pH, and at high pH the closed form of one 1:1 complex with its
 * conditional constant. The constants are test data (the identities hold for any constants).
 */
import { daviesLog10Gamma, debyeHuckelA, prepare, type AcidBaseSystem, type Component, type Mixture, type StrongIon } from "../../src/chem";
import { citrate, Cl, Na } from "./fixtures";

const ca: StrongIon = { id: "ca", name: "Ca2+", charge: 2 };
const LOG_BETA = 4.85;
const citrateCa: AcidBaseSystem = {
  ...citrate,
  complexes: [
    { name: "CaCit-", metal: "ca", ligands: 1, protons: 0, logBeta: LOG_BETA },
    { name: "CaHCit", metal: "ca", ligands: 1, protons: 1, logBeta: 9.3 },
  ],
};
const na3cit: Component = { id: "na3cit", name: "trisodium citrate", systems: [{ system: citrateCa, stoich: 1 }], ions: [{ ion: Na, stoich: 3 }] };
const cacl2: Component = { id: "cacl2", name: "calcium chloride", systems: [], ions: [{ ion: ca, stoich: 1 }, { ion: Cl, stoich: 2 }] };
const AXIS = Array.from({ length: 141 }, (_, i) => i / 10);

function solved(mix: Mixture) {
  const p = prepare(mix);
  if (!p.ok) throw new Error(p.message);
  const eq = p.solve({ temperatureC: 25 });
  if (!eq.ok) throw new Error(eq.message);
  return { p, eq };
}

const MIX: Mixture = [
  { component: na3cit, conc: 0.01 },
  { component: cacl2, conc: 0.004 },
];

describe("a metal's distribution against pH", () => {
  test("free + complexes = the metal's total at every pH (calcium in citrate, 0–14)", () => {
    const [m] = solved(MIX).p.metalDistribution(AXIS);
    expect(m.forms.map((f) => f.name)).toEqual(["Ca2+", "CaCit-", "CaHCit"]);
    for (let i = 0; i < AXIS.length; i++) {
      const sum = m.forms.reduce((s, f) => s + f.fractions[i], 0);
      expect({ pH: AXIS[i], sum: Math.abs(sum - 1) < 1e-9 }).toEqual({ pH: AXIS[i], sum: true });
    }
  });

  test("at low pH the free ion holds the metal (citrate is protonated): above 99 % at pH 1", () => {
    const [m] = solved(MIX).p.metalDistribution([0, 1]);
    expect(m.forms[0].fractions[0]).toBeGreaterThan(0.999);
    expect(m.forms[0].fractions[1]).toBeGreaterThan(0.99);
  });

  test("at the mixture's own pH the shares are the solved speciation's", () => {
    const { p, eq } = solved(MIX);
    const [m] = p.metalDistribution([eq.pH]);
    for (const f of m.forms) {
      const sp = eq.species.find((s) => s.name === f.name)!;
      const want = f.name === "Ca2+" ? sp.conc / 0.004 : sp.metalFraction!;
      expect(Math.abs(f.fractions[0] - want)).toBeLessThan(1e-9);
      expect(Math.abs(f.atMixture - want)).toBeLessThan(1e-12);
    }
  });

  test("at pH 12 the free share is the closed form of one 1:1 complex with the conditional constant", () => {
    const { p, eq } = solved(MIX);
    const [m] = p.metalDistribution([12]);
    // K′ = β·γ(Ca²⁺)·γ(Cit³⁻)/γ(CaCit⁻) at the mixture's I (Davies); Cit³⁻ the only free form at pH 12.
    const A = debyeHuckelA(25);
    const lg = (z: number) => daviesLog10Gamma(z, eq.ionicStrength, A);
    const K = Math.pow(10, LOG_BETA + lg(2) + lg(-3) - lg(-1));
    // free Ca f·T: K·(f·T)·(C − (1 − f)·T) = (1 − f)·T
    const T = 0.004;
    const C = 0.01;
    const a = K * T * T;
    const b = K * T * (C - T) + T;
    const f = (-b + Math.sqrt(b * b + 4 * a * T)) / (2 * a);
    expect(Math.abs(m.forms[0].fractions[0] - f)).toBeLessThan(1e-4);
    expect(m.forms[0].fractions[0]).toBeLessThan(0.1);
  });

  test("the ligand's side: citrate free and bound as shares of its total sum to 1 at every pH, and equal the solved fractions at the mixture's pH", () => {
    const { p, eq } = solved(MIX);
    const [l] = p.ligandDistribution([...AXIS, eq.pH]);
    expect(l.systemId).toBe("citrate");
    expect(l.forms.map((f) => f.name).slice(-2)).toEqual(["CaCit-", "CaHCit"]);
    for (let i = 0; i <= AXIS.length; i++) {
      const sum = l.forms.reduce((s, f) => s + f.fractions[i], 0);
      expect({ i, sum: Math.abs(sum - 1) < 1e-9 }).toEqual({ i, sum: true });
    }
    for (const f of l.forms) {
      const sp = eq.species.find((s) => s.systemId === "citrate" && s.name === f.name)!;
      expect(Math.abs(f.fractions[AXIS.length] - sp.fraction)).toBeLessThan(1e-9);
    }
    // bound citrate at the mixture's pH: the calcium bound, out of 10 mmol/L citrate
    const boundCa = p.metalDistribution([eq.pH])[0].forms.slice(1).reduce((s, f) => s + f.fractions[0], 0) * 0.004;
    expect(Math.abs((l.forms[4].atMixture + l.forms[5].atMixture) * 0.01 - boundCa)).toBeLessThan(1e-12);
  });

  test("a mixture whose metal forms no complex here, or without complexes, has no distribution", () => {
    const plain: Mixture = [
      { component: { ...na3cit, systems: [{ system: citrate, stoich: 1 }] }, conc: 0.01 },
      { component: cacl2, conc: 0.004 },
    ];
    expect(solved(plain).p.metalDistribution(AXIS)).toEqual([]);
    expect(solved(plain).p.ligandDistribution(AXIS)).toEqual([]);
  });
});
