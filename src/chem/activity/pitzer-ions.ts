/**
 * Which Pitzer ion each engine species is: strong ions by their library id, system species by
 * system id and the number of protons lost (0 = fully protonated). A species that maps to no name
 * here, or to a name with no published cation–anion parameters (COVERED_IONS), takes the fallback
 * rule of pitzer-state.ts (Davies for that ion).
 *
 * Neutral species (H₃PO₄, CO₂(aq), Tris, zwitterions…) have γ = 1: no λ (ion–neutral) parameter
 * is used.
 */

/** Library strong-ion id → Pitzer ion name. */
export const STRONG_ION_NAMES: Readonly<Record<string, string>> = {
  na: "Na+",
  k: "K+",
  li: "Li+",
  cl: "Cl-",
  no3: "NO3-",
  ca: "Ca+2",
  mg: "Mg+2",
};

/** System id → Pitzer name of each species, fully protonated first (null: neutral or not named). */
export const SYSTEM_SPECIES_NAMES: Readonly<Record<string, readonly (string | null)[]>> = {
  phosphate: [null, "H2PO4-", "HPO4-2", "PO4-3"],
  sulfate: [null, "HSO4-", "SO4-2"],
  carbonate: [null, "HCO3-", "CO3-2"],
  acetate: [null, "CH3COO-"],
  citrate: [null, "H2Cit-", "HCit-2", "Cit-3"],
  tris: ["TrisH+", null],
  histidine: ["H3His+2", "H2His+", null, "His-"],
  ammonia: ["NH4+", null],
};

/** The Pitzer name of species k (protons lost) of a system, or a private name when none is listed. */
export function systemSpeciesName(systemId: string, k: number): string {
  return SYSTEM_SPECIES_NAMES[systemId]?.[k] ?? `${systemId}[${k}]`;
}

const PITZER_STRONG_NAMES = new Set(Object.values(STRONG_ION_NAMES));

/** The Pitzer name of a strong ion (by library id, or an id that is already a Pitzer name such as "Na+"), or a private name. */
export function strongIonName(ionId: string): string {
  return STRONG_ION_NAMES[ionId] ?? (PITZER_STRONG_NAMES.has(ionId) ? ionId : `ion:${ionId}`);
}
