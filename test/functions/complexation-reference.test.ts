/**
 * Complexation with the built-in library's constants against published values (test/reference:
 * edetate-ph.json, calcium-citrate-k.json, lange-beta.json; sources in docs/references.md, section 10),
 * and what users see of it through the spreadsheet functions.
 */
import { solveEquilibrium, type Equilibrium, type Mixture } from "../../src/chem";
import * as AQ from "../../src/functions/functions";
import { getActiveLibrary } from "../../src/library";
import { casesOf, referenceCase } from "../reference";
import { expectReference } from "../chem/fixtures";

function libraryMixture(pairs: readonly [string, number][] | undefined): Mixture {
  const lib = getActiveLibrary();
  return (pairs ?? []).map(([name, conc]) => {
    const r = lib.resolve(name);
    if (!r.ok) throw new Error(r.message);
    return { component: r.component, conc };
  });
}

function solved(pairs: readonly [string, number][] | undefined, temperatureC = 25): Equilibrium {
  const eq = solveEquilibrium(libraryMixture(pairs), { temperatureC });
  if (!eq.ok) throw new Error(eq.message);
  return eq;
}

describe("published values with the library's complexes", () => {
  test.each(casesOf("edetate-ph"))("$id: $label, pH $printed ± tolerance (USP range)", (c) => {
    expectReference(solved(c.mixture, c.temperatureC).pH, c, `pH ${c.label}`);
  });

  test.each(casesOf("calcium-citrate-k"))("$id: free calcium in citrate, conditional log K $expected", (c) => {
    const eq = solved(c.mixture, c.temperatureC);
    const conc = (name: string | undefined) => {
      const sp = eq.species.find((s) => s.name === name);
      if (!sp) throw new Error(`no species ${name}`);
      return sp.conc;
    };
    // the mixture is made up to the ionic strength the published constant belongs to
    if (c.ionicStrength === undefined) throw new Error(`${c.id}: no ionicStrength`);
    expect(Math.abs(eq.ionicStrength / c.ionicStrength - 1)).toBeLessThan(0.1);
    expectReference(Math.log10(conc(c.complex) / (conc(c.metalIon) * conc(c.ligand))), c, `log K′ ${c.label}`);
  });

  test("borax 0.01 mol/L with polyborates: β moves toward Lange's 0.020 but stays a known deviation", () => {
    const c = referenceCase("lange-beta", "BETA-BORAX");
    const eq = solved(c.mixture, 25);
    expect(eq.species.some((s) => s.name === "B3O3(OH)4-" && s.conc > 0)).toBe(true);
    expectReference(eq.beta, c, "β borax with polyborates, Davies");
    // Closer than the monomer model's 0.0237 (README of lange-beta's reason), not within 5 % of 0.020.
    expect(eq.beta).toBeLessThan(0.0235);
  });

  test("no reading of β = dB/dpH brings borax within 5 % of the printed value (docs/references.md, section 1)", () => {
    const c = referenceCase("lange-beta", "BETA-BORAX");
    const [[name, conc]] = c.mixture!;
    const pH = (names: string[], amounts: number[], activity: string) => Number(AQ.PH([names], [amounts], [[25]], [[activity]])[0][0]);
    const readings: number[] = [];
    for (const activity of ["davies", "debye-huckel", "ideal"]) {
      readings.push(Number(AQ.BETA([[name]], [[conc]], [[25]], [[activity]])[0][0])); // dC(NaOH)/dpH, no volume change
      const p0 = pH([name], [conc], activity);
      const d = 1e-5;
      readings.push(d / (p0 - pH([name, "HCl"], [conc, d], activity))); // against strong acid
      for (const titrant of [0.1, 0.02]) {
        // ±0.1 mmol of base and acid from a stock of this concentration into 1 L: everything is diluted
        const n = 1e-4;
        const v = 1 + n / titrant;
        const up = pH([name, "NaOH"], [conc / v, n / v], activity);
        const down = pH([name, "HCl"], [conc / v, n / v], activity);
        readings.push((2 * n) / v / (up - down));
      }
    }
    for (const b of readings) {
      expect(b).toBeGreaterThan(c.expected * 1.05);
      expect(b).toBeLessThan(c.expected + c.knownDeviation!.bound);
    }
  });

  test("the primary borax standard (0.01 mol/kg) keeps its pH within the standards' tolerance with polyborates", () => {
    const c = casesOf("ph-standards").find((x) => /borax/i.test(x.label ?? "") && x.temperatureC === 25);
    if (!c) throw new Error("no borax case at 25 °C in ph-standards");
    const eq = solveEquilibrium(libraryMixture(c.mixture), { temperatureC: 25 });
    if (!eq.ok) throw new Error(eq.message);
    expectReference(eq.pH, c, "pH(S) borax with polyborates");
  });
});

describe("identities with the library's complexes", () => {
  test("calcium disodium edetate holds almost all its calcium bound (free fraction below 10⁻³)", () => {
    const eq = solved([["calcium disodium edetate", 0.01]]);
    const ca = eq.species.find((s) => s.name === "Ca2+")!;
    expect(ca.fraction).toBeLessThan(1e-3);
    expect(eq.species.find((s) => s.name === "CaEDTA^2-")!.metalFraction).toBeGreaterThan(0.999);
  });

  test("a citrate buffer with calcium has a lower pH than without (CaCit− takes Cit3−)", () => {
    const base: [string, number][] = [["citric acid monohydrate", 0.01], ["trisodium citrate dihydrate", 0.01]];
    const without = solved(base);
    const withCa = solved([...base, ["calcium chloride dihydrate", 0.005]]);
    expect(withCa.pH).toBeLessThan(without.pH - 0.05);
  });
});

describe("what users see: AQ.SPECIES and AQ.CHECK", () => {

  test("AQ.SPECIES lists the free calcium ion and the calcium–citrate complexes, and their sums give the totals back", () => {
    const rows = AQ.SPECIES([["calcium chloride dihydrate", "trisodium citrate dihydrate"]], [[0.001, 0.01]]) as [string, number, number, number][];
    const conc = (name: string) => rows.find((r) => r[0] === name)![2];
    expect(rows.map((r) => r[0])).toEqual(expect.arrayContaining(["Ca2+", "CaCit-", "CaHCit", "Cit^3-"]));
    expect(Math.abs(conc("Ca2+") + conc("CaCit-") + conc("CaHCit") - 0.001)).toBeLessThan(1e-15);
    const citrate = rows.filter((r) => ["H3Cit", "H2Cit-", "HCit^2-", "Cit^3-", "CaCit-", "CaHCit"].includes(r[0])).reduce((s, r) => s + r[2], 0);
    expect(Math.abs(citrate - 0.01)).toBeLessThan(1e-15);
  });

  test("AQ.CHECK warns of calcium citrate supersaturation with the saturation index computed from the free ions", () => {
    const names = [["calcium chloride dihydrate", "trisodium citrate dihydrate"]];
    const eq = solved([["calcium chloride dihydrate", 0.02], ["trisodium citrate dihydrate", 0.02]]);
    const si = eq.saturation!.find((x) => x.name === "calcium citrate tetrahydrate")!.saturationIndex;
    // Identity: SI = 3·log a(Ca2+) + 2·log a(Cit3−) − log Ksp, with log γ(z) = z²·log γH.
    const lg = Math.log10(eq.gammaH);
    const la = (n: string) => {
      const sp = eq.species.find((s) => s.name === n)!;
      return Math.log10(sp.conc) + sp.charge * sp.charge * lg;
    };
    const logKsp = getActiveLibrary().system("citrate")!.solids!.find((x) => x.name === "calcium citrate tetrahydrate")!.logKsp;
    expect(Math.abs(si - (3 * la("Ca2+") + 2 * la("Cit^3-") - logKsp))).toBeLessThan(1e-9);
    expect(si).toBeGreaterThan(0);
    const text = String(AQ.CHECK(names, [[0.02, 0.02]])[0][0]);
    expect(text).toMatch(/^CHECK: /);
    expect(text).toContain(`Supersaturated in calcium citrate tetrahydrate (saturation index +${si.toFixed(2)}`);
  });

  test("a dilute calcium citrate solution is undersaturated and AQ.CHECK says nothing of a solid", () => {
    const eq = solved([["calcium chloride dihydrate", 0.0005], ["trisodium citrate dihydrate", 0.0005]]);
    expect(eq.saturation!.find((x) => x.name === "calcium citrate tetrahydrate")!.saturationIndex).toBeLessThan(0);
    expect(String(AQ.CHECK([["calcium chloride dihydrate", "trisodium citrate dihydrate"]], [[0.0005, 0.0005]])[0][0])).not.toMatch(/Supersaturated/);
  });
});
