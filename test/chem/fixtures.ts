/**
 * Test fixtures: acid–base systems, strong ions and components defined inline, with the source of
 * every constant beside it. Independent of src/library on purpose (the engine is tested against
 * published values, not against our own data files).
 *
 * Goldberg 2002 = Goldberg, Kishore & Lennen, "Thermodynamic quantities for the ionization reactions
 * of buffers", J. Phys. Chem. Ref. Data 31, 231 (2002): pK at 25 °C and I = 0, ΔrH° (kJ/mol),
 * ΔrCp° (J/(K·mol)). Status letters from docs/references.md, section 3 (X cross-checked, M from
 * memory, unverified: used as data only, never as a test oracle).
 */
import type { AcidBaseSystem, Component, Mixture, StrongIon } from "../../src/chem";
export type { Component } from "../../src/chem";

// ---- acid–base systems ------------------------------------------------------------------------

/** Goldberg 2002 (X): pK 4.756, ΔrH° −0.41, ΔrCp° −142. */
export const acetate: AcidBaseSystem = {
  id: "acetate",
  name: "acetate",
  topCharge: 0,
  steps: [{ pKa: 4.756, dH: -0.41, dCp: -142 }],
};

/** Goldberg 2002 (X): pK 3.128/4.761/6.396, ΔrH° 4.07/2.23/−3.38, ΔrCp° −131/−178/−254. */
export const citrate: AcidBaseSystem = {
  id: "citrate",
  name: "citrate",
  topCharge: 0,
  steps: [
    { pKa: 3.128, dH: 4.07, dCp: -131 },
    { pKa: 4.761, dH: 2.23, dCp: -178 },
    { pKa: 6.396, dH: -3.38, dCp: -254 },
  ],
};

/** Goldberg 2002 (X): pK 2.148/7.198/12.35, ΔrH° −8.0/3.6/16.0, ΔrCp° −141/−230/−242. */
export const phosphate: AcidBaseSystem = {
  id: "phosphate",
  name: "phosphate",
  topCharge: 0,
  steps: [
    { pKa: 2.148, dH: -8.0, dCp: -141 },
    { pKa: 7.198, dH: 3.6, dCp: -230 },
    { pKa: 12.35, dH: 16.0, dCp: -242 },
  ],
};

/** Goldberg 2002 (X): CO₂(aq) → HCO₃⁻ → CO₃²⁻, pK 6.351/10.329, ΔrH° 9.15/14.70, ΔrCp° −371/−249. */
export const carbonate: AcidBaseSystem = {
  id: "carbonate",
  name: "carbonate",
  topCharge: 0,
  steps: [
    { pKa: 6.351, dH: 9.15, dCp: -371 },
    { pKa: 10.329, dH: 14.7, dCp: -249 },
  ],
};

/** B(OH)₃ → B(OH)₄⁻: pK 9.237, ΔrH° 13.8, ΔrCp° −240 — docs/references.md, section 3 status M (from memory, unverified). */
export const borate: AcidBaseSystem = {
  id: "borate",
  name: "borate",
  topCharge: 0,
  steps: [{ pKa: 9.237, dH: 13.8, dCp: -240 }],
};

/** Phthalate: pK 2.950/5.408 Goldberg 2002 (X); ΔrH° −2.7/−2.2 from memory, unverified (M); ΔrCp° not known (0). */
export const phthalate: AcidBaseSystem = {
  id: "phthalate",
  name: "phthalate",
  topCharge: 0,
  steps: [
    { pKa: 2.95, dH: -2.7 },
    { pKa: 5.408, dH: -2.2 },
  ],
};

/** Goldberg 2002 (X): TrisH⁺ → Tris, pK 8.072, ΔrH° 47.45, ΔrCp° −59. */
export const tris: AcidBaseSystem = {
  id: "tris",
  name: "Tris",
  topCharge: 1,
  steps: [{ pKa: 8.072, dH: 47.45, dCp: -59 }],
};

// ---- strong ions and components -----------------------------------------------------------------

export const Na: StrongIon = { id: "Na+", name: "Na+", charge: 1 };
export const K: StrongIon = { id: "K+", name: "K+", charge: 1 };
export const Cl: StrongIon = { id: "Cl-", name: "Cl-", charge: -1 };

function comp(id: string, systems: [AcidBaseSystem, number][], ions: [StrongIon, number][]): Component {
  return {
    id,
    name: id,
    systems: systems.map(([system, stoich]) => ({ system, stoich })),
    ions: ions.map(([ion, stoich]) => ({ ion, stoich })),
  };
}

export const HCl = comp("HCl", [], [[Cl, 1]]);
export const NaOH = comp("NaOH", [], [[Na, 1]]);
export const NaCl = comp("NaCl", [], [[Na, 1], [Cl, 1]]);
export const KCl = comp("KCl", [], [[K, 1], [Cl, 1]]);
export const citricAcid = comp("citric acid", [[citrate, 1]], []);
export const aceticAcid = comp("acetic acid", [[acetate, 1]], []);
export const sodiumAcetate = comp("sodium acetate", [[acetate, 1]], [[Na, 1]]);
export const KH2citrate = comp("KH2 citrate", [[citrate, 1]], [[K, 1]]);
export const KHphthalate = comp("KH phthalate", [[phthalate, 1]], [[K, 1]]);
export const KH2PO4 = comp("KH2PO4", [[phosphate, 1]], [[K, 1]]);
export const NaH2PO4 = comp("NaH2PO4", [[phosphate, 1]], [[Na, 1]]);
export const Na2HPO4 = comp("Na2HPO4", [[phosphate, 1]], [[Na, 2]]);
export const NaHCO3 = comp("NaHCO3", [[carbonate, 1]], [[Na, 1]]);
export const Na2CO3 = comp("Na2CO3", [[carbonate, 1]], [[Na, 2]]);
/** Na₂B₄O₇ → 2 B(OH)₃ + 2 B(OH)₄⁻ + 2 Na⁺: 4 mol borate system and 2 mol Na⁺ per mol borax. */
export const borax = comp("borax", [[borate, 4]], [[Na, 2]]);
export const trisBase = comp("Tris base", [[tris, 1]], []);

/** Builds a mixture from [component, mol/L] pairs. */
export function mixture(...entries: [Component, number][]): Mixture {
  return entries.map(([component, conc]) => ({ component, conc }));
}

// ---- comparison helpers -----------------------------------------------------------------------

/** Fails with input, actual, expected and tolerance unless |actual − expected| ≤ tol (absolute, e.g. pH units). */
export function expectAbs(actual: number, expected: number, tol: number, context: string): void {
  const ok = Number.isFinite(actual) && Math.abs(actual - expected) <= tol;
  if (!ok) {
    throw new Error(
      `${context}\n  actual ${actual}\n  expected ${expected} ± ${tol} (absolute)\n  difference ${actual - expected}`,
    );
  }
  expect(ok).toBe(true);
}

/** Fails with input, actual, expected and tolerance unless |actual − expected| ≤ rtol·|expected|. */
export function expectRel(actual: number, expected: number, rtol: number, context: string): void {
  const ok = Number.isFinite(actual) && Math.abs(actual - expected) <= rtol * Math.abs(expected);
  if (!ok) {
    throw new Error(
      `${context}\n  actual ${actual}\n  expected ${expected} ± ${rtol} (relative)\n  relative difference ${(actual - expected) / expected}`,
    );
  }
  expect(ok).toBe(true);
}

/** The fixture for each library name the reference tables (test/reference/*.json) use. */
const BY_REFERENCE_NAME: Record<string, Component> = {
  "KH2 citrate": KH2citrate,
  KHP: KHphthalate,
  KH2PO4,
  NaH2PO4,
  Na2HPO4,
  borax,
  NaHCO3,
  Na2CO3,
  HCl,
  NaOH,
  "acetic acid": aceticAcid,
  "sodium acetate": sodiumAcetate,
  "citric acid": citricAcid,
  NaCl,
  KCl,
};

/** A reference case's mixture ([library name, mol/L] pairs) with these fixtures. */
export function referenceMixture(pairs: readonly [string, number][] | undefined): Mixture {
  if (pairs === undefined) throw new Error("the reference case has no mixture");
  return pairs.map(([name, conc]) => {
    const component = BY_REFERENCE_NAME[name];
    if (component === undefined) throw new Error(`no fixture for "${name}" (add it to BY_REFERENCE_NAME)`);
    return { component, conc };
  });
}

/**
 * Checks a computed value against a reference case (test/reference): within its tolerance, or, for
 * a known deviation, off by more than the tolerance and at most its bound (a change that fixes or
 * worsens it is noticed; it is never skipped).
 */
export function expectReference(
  actual: number,
  c: { id: string; expected: number; tolerance: { value: number }; knownDeviation?: { reason: string; bound: number } },
  context: string,
): void {
  if (c.knownDeviation === undefined) {
    expectAbs(actual, c.expected, c.tolerance.value, `${c.id}: ${context}`);
    return;
  }
  const diff = Math.abs(actual - c.expected);
  if (!(diff > c.tolerance.value && diff <= c.knownDeviation.bound)) {
    throw new Error(
      `${c.id}: ${context}: known deviation no longer behaves as documented (${c.knownDeviation.reason})\n  actual ${actual}\n  expected ${c.expected}, deviation between ${c.tolerance.value} and ${c.knownDeviation.bound}`,
    );
  }
  expect(diff).toBeGreaterThan(c.tolerance.value);
}
