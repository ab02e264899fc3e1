/**
 * Fixtures for the workflow tests: the engine fixtures (test/chem/fixtures.ts, Goldberg 2002
 * constants with their sources) plus what the recipes need — histidine, molar masses — and a few
 * helpers. Every constant names its source.
 *
 * Molar masses: computed from the CIAAW conventional standard atomic weights listed in
 * docs/references.md, section 4 (H 1.008, C 12.011, N 14.007, O 15.999, Na 22.98976928,
 * P 30.973761998, K 39.0983, Cl 35.45); spot checks there (V): Na₂HPO₄·7H₂O 268.07,
 * L-histidine HCl·H₂O 209.63.
 */
import type { AcidBaseSystem, ChemOptions, Component, Mixture } from "../../../src/chem";
import { solvePH } from "../../../src/chem";
import * as base from "../fixtures";

export * from "../fixtures";

/**
 * Histidine H₃L²⁺ → H₂L⁺ → HL → L⁻. Imidazole step pK 6.07, ΔrH° 29.5, ΔrCp° 176: Goldberg 2002
 * (docs/references.md, section 3, status X). pK1 ≈ 1.54 and pK3 ≈ 9.34 (ΔrH° 43.8): status M, from memory,
 * unverified — used as data only, never as an oracle.
 */
export const histidine: AcidBaseSystem = {
  id: "histidine",
  name: "histidine",
  topCharge: 2,
  steps: [{ pKa: 1.54 }, { pKa: 6.07, dH: 29.5, dCp: 176 }, { pKa: 9.34, dH: 43.8 }],
};

function withMass(c: Component, name: string, molarMass: number): Component {
  return { ...c, id: name, name, molarMass };
}

/** C₆H₉N₃O₂, 155.157 g/mol (CIAAW, docs/references.md, section 4). */
export const histidineBase: Component = {
  id: "L-histidine",
  name: "L-histidine",
  systems: [{ system: histidine, stoich: 1 }],
  ions: [],
  molarMass: 155.157,
};
/** C₆H₉N₃O₂·HCl·H₂O, 209.63 g/mol (CIAAW; docs/references.md, section 4 spot check 209.63, V). */
export const histidineHCl: Component = {
  id: "L-histidine HCl·H2O",
  name: "L-histidine HCl·H2O",
  systems: [{ system: histidine, stoich: 1 }],
  ions: [{ ion: base.Cl, stoich: 1 }],
  molarMass: 209.63,
};

/** 137.991 g/mol (CIAAW). */
export const NaH2PO4H2O = withMass(base.NaH2PO4, "NaH2PO4·H2O", 137.991);
/** 268.062 g/mol (CIAAW; docs/references.md, section 4 spot check 268.07, V — the difference is the atomic weights' rounding). */
export const Na2HPO47H2O = withMass(base.Na2HPO4, "Na2HPO4·7H2O", 268.062);
/** 136.084 g/mol (CIAAW). */
export const KH2PO4m = withMass(base.KH2PO4, "KH2PO4", 136.084);
/** 141.957 g/mol (CIAAW). */
export const Na2HPO4m = withMass(base.Na2HPO4, "Na2HPO4", 141.957);
/** C₄H₁₁NO₃, 121.136 g/mol (CIAAW). */
export const trisBaseM = withMass(base.trisBase, "Tris base", 121.136);
/** C₆H₈O₇, 192.123 g/mol (CIAAW). */
export const citricAcid: Component = { id: "citric acid", name: "citric acid", systems: [{ system: base.citrate, stoich: 1 }], ions: [], molarMass: 192.123 };
/** 58.440 g/mol (CIAAW). */
export const NaClM = withMass(base.NaCl, "NaCl", 58.44);
/** 39.997 g/mol (CIAAW). */
export const NaOHM = withMass(base.NaOH, "NaOH", 39.997);
/** 36.458 g/mol (CIAAW). */
export const HClM = withMass(base.HCl, "HCl", 36.458);
/** 204.222 g/mol (CIAAW; docs/references.md, section 4 spot check 204.22, V). */
export const KHPm = withMass(base.KHphthalate, "KH phthalate", 204.222);
/** A non-electrolyte (sucrose-like): moves no pH. */
export const sucrose: Component = { id: "sucrose", name: "sucrose", systems: [], ions: [], neutral: 1 };

/** pH of a mixture or a thrown error with the engine's message (tests only). */
export function pH(mix: Mixture, opts: ChemOptions = {}): number {
  const r = solvePH(mix, opts);
  if (!r.ok) throw new Error(`solvePH failed: ${r.code} ${r.message}`);
  return r.pH;
}

/** Unwraps a workflow result in a test, failing with its message. */
export function ok<T extends { ok: boolean }>(r: T | { ok: false; code: string; message: string }): Extract<T, { ok: true }> {
  if (!r.ok) {
    const f = r as { code: string; message: string };
    throw new Error(`expected ok, got ${f.code}: ${f.message}`);
  }
  return r as Extract<T, { ok: true }>;
}
