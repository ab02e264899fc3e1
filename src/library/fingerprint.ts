/**
 * The fingerprint of the constants in effect: "PL-<built-in version>-<10 hex of SHA-256>".
 *
 * It covers what can change a result: every system's charge and step values (pKa, ΔrH°, ΔrCp°),
 * its complexes (metal, stoichiometry, log β, ΔrH°) and solids (stoichiometry, log Ksp),
 * every ion's charge, and for every substance the names that resolve to it, what it releases and
 * its molar mass. Citations, notes and display names of systems do not enter it, and neither does
 * key or entry order. Identical constants give the same id; any value change gives another.
 */
import type { AcidBaseSystem, Component, StrongIon } from "../chem/types";
import { canonicalJson } from "./canonical-json";
import { sha256Hex } from "./sha256";

export const FINGERPRINT_PREFIX = "PL";
const HEX_LENGTH = 10;

export interface FingerprintInput {
  version: string;
  systems: Iterable<AcidBaseSystem>;
  ions: Iterable<StrongIon>;
  /** Usable substances with the lookup keys that resolve to them. */
  components: Iterable<{ component: Component; keys: readonly string[] }>;
  /** Ids of substances that cannot be used (broken references), which still mark the state. */
  unusable: Iterable<string>;
}

const byId = <T extends { id: string }>(items: Iterable<T>): T[] => [...items].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));

export function canonicalConstants(input: FingerprintInput): string {
  return canonicalJson({
    systems: byId(input.systems).map((s) => ({
      id: s.id,
      topCharge: s.topCharge,
      steps: s.steps.map((t) => ({ pKa: t.pKa, dH: t.dH, dCp: t.dCp })),
      // Only when present, so that a library without complexes keeps its fingerprint.
      ...(s.complexes ? { complexes: s.complexes.map((c) => ({ metal: c.metal, ligands: c.ligands, protons: c.protons, logBeta: c.logBeta, dH: c.dH })) } : {}),
      ...(s.solids ? { solids: s.solids.map((x) => ({ metal: x.metal, metals: x.metals, ligands: x.ligands, protons: x.protons, logKsp: x.logKsp })) } : {}),
    })),
    ions: byId(input.ions).map((i) => ({ id: i.id, charge: i.charge })),
    substances: byId([...input.components].map((c) => ({ id: c.component.id, c }))).map(({ c }) => ({
      id: c.component.id,
      keys: [...c.keys].sort(),
      systems: c.component.systems.map((s) => ({ system: s.system.id, stoich: s.stoich })),
      protons: c.component.protons,
      ions: c.component.ions.map((s) => ({ ion: s.ion.id, stoich: s.stoich })),
      neutral: c.component.neutral,
      molarMass: c.component.molarMass,
    })),
    unusable: [...input.unusable].sort(),
  });
}

export function computeFingerprint(input: FingerprintInput): string {
  return `${FINGERPRINT_PREFIX}-${input.version}-${sha256Hex(canonicalConstants(input)).slice(0, HEX_LENGTH)}`;
}
