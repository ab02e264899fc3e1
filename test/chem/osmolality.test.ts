/**
 * Osmolality (src/chem/osmolality.ts). Published checks, each with its source beside it, and
 * identities of the model:
 * - the electrostatic term's integral against the closed form for Davies, and its dilute limit, the
 *   Debye–Hückel limiting law φ − 1 = −(ln10·A/3)·√I for a 1:1 salt (Robinson & Stokes, Electrolyte
 *   Solutions, 2nd ed. (1959), ch. 9);
 * - NaCl and KCl osmotic coefficients against the Pitzer equation with the parameters of Carroll,
 *   Craig & Wolery, Geochem. Trans. 6, 19 (2005), Table I (a1 at 298.15 K: Na–Cl β0 0.0746, β1
 *   0.275, Cφ 0.00154; K–Cl β0 0.0478, β1 0.216, Cφ −0.000749; standard Pitzer b = 1.2, α = 2,
 *   Aφ = 0.3915 — these three from memory, unverified, as used by that table's model);
 * - 0.9 % w/v saline reads about 286 mOsm/kg (common practice);
 * - sucrose and glucose near physiological strength: φ = 1.02 and 1.01 (University of British
 *   Columbia zoology tutorial table "Osmotic coefficients of physiological solutes", 37 °C);
 * - ideal activity and no non-electrolyte excess: osmolality = ideal osmolarity / kg water per litre.
 */
import { osmolarity } from "../../src/chem";
import data from "../../src/chem/data/osmotic.json";
import { electrostaticOsmoticTerm, osmolality } from "../../src/chem/osmolality";
import { debyeHuckelA } from "../../src/chem/activity/debye-huckel-a";
import type { Component } from "../../src/chem/types";
import * as f from "./fixtures";

const NaCl: Component = { ...f.NaCl, id: "sodium-chloride", name: "sodium chloride", molarMass: 58.443 };
const KCl: Component = { id: "potassium-chloride", name: "potassium chloride", systems: [], ions: [{ ion: f.K, stoich: 1 }, { ion: f.Cl, stoich: 1 }], molarMass: 74.551 };
const sucrose: Component = { id: "sucrose", name: "sucrose", systems: [], ions: [], neutral: 1, molarMass: 342.297 };
const glucose: Component = { id: "glucose", name: "D-glucose", systems: [], ions: [], neutral: 1, molarMass: 180.156 };

function ok<T extends { ok: boolean }>(r: T | { ok: false; message: string }): Extract<T, { ok: true }> {
  if (!r.ok) throw new Error((r as { message: string }).message);
  return r as Extract<T, { ok: true }>;
}

/** Pitzer osmotic coefficient of a 1:1 salt at molality m. */
function pitzer(m: number, b0: number, b1: number, cphi: number): number {
  const s = Math.sqrt(m);
  return 1 - (0.3915 * s) / (1 + 1.2 * s) + m * (b0 + b1 * Math.exp(-2 * s)) + m * m * cphi;
}

/** φ of a 1:1 salt from the model's electrostatic term alone. */
const phiModel = (m: number, model: "davies" | "debye-huckel" = "davies", t = 25) => 1 + electrostaticOsmoticTerm(model, m, t) / (2 * m);

describe("the electrostatic osmotic term", () => {
  test.each([1e-4, 0.01, 0.1, 0.5, 1])("Davies, I = %p: the quadrature equals the closed form", (I) => {
    const s = Math.sqrt(I);
    const closed = I ** 1.5 / (1 + s) - I + 2 * s - 2 * Math.log1p(s) - 0.15 * I * I;
    const expected = -2 * Math.LN10 * debyeHuckelA(25) * closed;
    f.expectRel(electrostaticOsmoticTerm("davies", I, 25), expected, 1e-9, `Δ_el at I = ${I}`);
  });

  test.each(["davies", "debye-huckel"] as const)("%s: the dilute limit is the Debye–Hückel limiting law", (model) => {
    for (const t of [0, 25, 60]) {
      const m = 1e-8;
      const limiting = -(Math.LN10 * debyeHuckelA(t)) / 3 * Math.sqrt(m);
      f.expectRel(phiModel(m, model, t) - 1, limiting, 1e-3, `${model}, ${t} °C`);
    }
  });

  test("ideal: no electrostatic term", () => {
    expect(Math.abs(electrostaticOsmoticTerm("ideal", 0.2, 25))).toBe(0);
  });
});

describe("osmotic coefficients of NaCl and KCl against the Pitzer equation (Carroll et al. 2005, Table I)", () => {
  // Davies is ion-blind: within 0.5 % to 0.1 mol/kg, 1.5 % at 0.2 and 2.5 % at 0.3 for NaCl; KCl
  // lies lower, so its tolerances are about twice as wide. The tolerances say what the model can do.
  test.each([
    [0.05, 0.003, 0.005],
    [0.1, 0.005, 0.012],
    [0.154, 0.01, 0.02],
    [0.2, 0.015, 0.025],
    [0.3, 0.025, 0.045],
  ])("m = %p mol/kg: NaCl within %p, KCl within %p (relative)", (m, tolNa, tolK) => {
    f.expectRel(phiModel(m), pitzer(m, 0.0746, 0.275, 0.00154), tolNa, `NaCl φ at ${m}`);
    f.expectRel(phiModel(m), pitzer(m, 0.0478, 0.216, -0.000749), tolK, `KCl φ at ${m}`);
  });
});

describe("osmolality of formulations", () => {
  test("0.9 % w/v saline (9 g/L NaCl) reads about 286 mOsm/kg (common practice), within 1.5 %", () => {
    const r = ok(osmolality([{ component: NaCl, conc: 9 / 58.443 }]));
    f.expectRel(r.value * 1000, 286, 0.015, "0.9 % saline, 25 °C");
    expect(r.value).toBeLessThan(ok(osmolarity([{ component: NaCl, conc: 9 / 58.443 }])).value);
  });

  test("250 mM sucrose reads above its ideal 250 mOsm/L (more particles per kg of water, φ > 1)", () => {
    const r = ok(osmolality([{ component: sucrose, conc: 0.25 }]));
    expect(r.value).toBeGreaterThan(0.25);
    // Water at 25 °C, 0.99705 kg/L (CRC Handbook, density of water; the engine uses the saturated liquid, 0.005 % apart).
    f.expectRel(r.waterPerLitre, 0.99705 * (1 - 0.25 * 0.2113), 1e-4, "kg of water per litre");
  });

  test.each([
    ["sucrose", sucrose, 1.02],
    ["glucose", glucose, 1.01],
  ] as const)("%s at about 0.29 mol/kg: φ as printed (UBC table, two decimals: ±0.005)", (_n, c, phi) => {
    // Find the concentration giving 0.29 mol/kg, then φ = osmolality / molality.
    const r = ok(osmolality([{ component: c, conc: 0.28 }]));
    const m = 0.28 / r.waterPerLitre;
    f.expectAbs(r.value / m, phi, 0.005, `φ of ${c.name} at ${m.toFixed(3)} mol/kg`);
  });

  test("ideal activity and no non-electrolyte excess: osmolality = ideal osmolarity / kg of water per litre", () => {
    const mix = f.mixture([f.KH2PO4, 0.02], [f.Na2HPO4, 0.03], [NaCl, 0.1]);
    const r = ok(osmolality(mix, { activity: "ideal" }));
    f.expectRel(r.value, ok(osmolarity(mix, { activity: "ideal" })).value / r.waterPerLitre, 1e-12, "ideal identity");
    expect(Math.abs(r.electrostatic)).toBe(0);
    expect(r.estimatedVolume.sort()).toEqual(["KH2PO4", "Na2HPO4"].sort());
  });

  test("a solution that is mostly solute is refused", () => {
    expect(osmolality([{ component: sucrose, conc: 5 }])).toMatchObject({ ok: false, code: "out-of-range" });
  });
});

describe("data/osmotic.json provenance", () => {
  const records: [string, { value: number; unit: string; status: string; source?: string; note?: string }][] = [["defaultSpecificVolume", data.defaultSpecificVolume]];
  for (const [id, d] of Object.entries(data.substances as Record<string, Record<string, { value: number; unit: string; status: string; source?: string; note?: string }>>)) {
    for (const [k, rec] of Object.entries(d)) records.push([`${id}.${k}`, rec]);
  }
  test.each(records)("%s has a unit and a source, or says it is from memory, unverified", (_path, rec) => {
    expect(Number.isFinite(rec.value)).toBe(true);
    expect(rec.unit).toMatch(/^(cm3\/mol|cm3\/g|kg\/mol)$/);
    if (rec.status === "published") expect(rec.source ?? "").toMatch(/\S{10,}/);
    else expect({ status: rec.status, note: rec.note ?? "" }).toEqual({ status: "unverified", note: expect.stringMatching(/from memory, unverified/) });
  });
});
