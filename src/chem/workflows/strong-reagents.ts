/**
 * The generic strong base and strong acid of the workflows: one monovalent counter-ion per mole,
 * with ids of their own so they never merge with an ion of the mixture. Used for the buffer
 * capacity (capacity.ts) and for the unknown excess behind a measured pH (adjust.ts).
 */
import type { Component, StrongIon } from "../types";

const BASE_CATION: StrongIon = { id: "strong-base cation (+1)", name: "M+", charge: 1 };
const ACID_ANION: StrongIon = { id: "strong-acid anion (−1)", name: "X-", charge: -1 };

/** One monovalent cation per mole, its OH⁻ found by the charge balance (as NaOH). */
export const STRONG_BASE: Component = { id: "strong base", name: "strong base", systems: [], ions: [{ ion: BASE_CATION, stoich: 1 }] };
/** One monovalent anion per mole, its H⁺ found by the charge balance (as HCl). */
export const STRONG_ACID: Component = { id: "strong acid", name: "strong acid", systems: [], ions: [{ ion: ACID_ANION, stoich: 1 }] };
