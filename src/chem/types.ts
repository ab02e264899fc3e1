/**
 * The engine's vocabulary. Everything in src/chem works in mol/L, litres, kelvin or °C as named,
 * and kJ/mol or J/(K·mol) for thermodynamic data. Units are converted once, at the boundary
 * (src/chem/units), never inside the solvers.
 *
 * This file is the contract between the engine and its callers (src/library builds these objects
 * from the constants library; src/functions and src/cli call the engine with them).
 */

import type { ActivityModelId } from "./activity/models";

/** Activity-coefficient model used for every charged species (the list: activity/models.ts). */
export type ActivityModel = ActivityModelId;

/** One stepwise dissociation HₙL → H⁺ + Hₙ₋₁L, thermodynamic (I = 0) at 25 °C. */
export interface PkaStep {
  /** pKa at 25 °C and zero ionic strength. */
  pKa: number;
  /** Standard reaction enthalpy ΔrH°, kJ/mol. Missing means unknown: treated as 0 with a warning above 5 K from 25 °C. */
  dH?: number;
  /** Standard reaction heat-capacity change ΔrCp°, J/(K·mol). Missing means 0 (van 't Hoff with constant ΔrH°). */
  dCp?: number;
  /** True when the pKa is not confirmed by a source (the library's status "unverified"): AQ.CHECK names it. */
  unverified?: boolean;
}

/**
 * An acid–base system: the fully protonated species and its stepwise losses of protons.
 * Bases are stored through their conjugate acids (NH₄⁺ → NH₃ with topCharge +1).
 */
export interface AcidBaseSystem {
  /** Stable id, unique in a library (e.g. "phosphate"). */
  id: string;
  /** Display name (e.g. "phosphate"). */
  name: string;
  /** Charge of the fully protonated species (H₃PO₄: 0; NH₄⁺: +1; H₃His²⁺: +2). */
  topCharge: number;
  /** Stepwise dissociations in order of proton loss (pKa ascending in practice, not required). */
  steps: PkaStep[];
  /** Species names from fully protonated to fully deprotonated, length steps.length + 1. */
  speciesNames?: string[];
  /**
   * Species this system's fully deprotonated form (the ligand L) forms with a metal ion and/or
   * protons, or with itself (polyborates). Used when the metal (a strong ion) is in the mixture.
   */
  complexes?: ComplexSpecies[];
  /** Sparingly soluble solids of the ligand, for saturation indices only (never precipitated). */
  solids?: SolidSpecies[];
}

/** A solid M_m L_l H_p (s) ⇌ m·M + l·L + p·H⁺ with its solubility product at 25 °C and I = 0. */
export interface SolidSpecies {
  name: string;
  /** Strong-ion id of the metal. */
  metal: string;
  metals: number;
  ligands: number;
  protons: number;
  /** log10 Ksp at 25 °C and I = 0 (activities). */
  logKsp: number;
}

/** A solid's saturation index SI = log10(IAP/Ksp): above 0 the solution is supersaturated in it. */
export interface Saturation {
  name: string;
  systemId: string;
  saturationIndex: number;
}

/**
 * A species formed from components: M + l·L + p·H⁺ ⇌ M L_l H_p, with the overall formation constant
 * β = [M L_l H_p]/([M][L]^l[H⁺]^p) at 25 °C and I = 0 (activities). L is the fully deprotonated form
 * of the system the complex belongs to; M is a strong ion of the mixture (absent for species of the
 * ligand alone, such as B₃O₃(OH)₄⁻ = 3 B(OH)₄⁻ + 2 H⁺ − 4 H₂O); p may be negative (hydroxo species).
 * Charge: z(M) + l·z(L) + p.
 */
export interface ComplexSpecies {
  /** Display name ("CaCit-", "B3O3(OH)4-"). */
  name: string;
  /** Strong-ion id of the metal ("ca"); absent for species of the ligand alone. One metal ion per species. */
  metal?: string;
  /** Ligands per species, an integer ≥ 1. */
  ligands: number;
  /** Protons per species (an integer, negative for hydroxo species). */
  protons: number;
  /** log10 β at 25 °C and I = 0. */
  logBeta: number;
  /** ΔrH° of the formation reaction, kJ/mol. Missing: β held at its 25 °C value. */
  dH?: number;
}

/** A fully dissociated ion (Na⁺, K⁺, Cl⁻, Ca²⁺, NO₃⁻ …): it never takes or gives protons. */
export interface StrongIon {
  id: string;
  name: string;
  charge: number;
}

/**
 * A substance as the engine sees it: what one mole of it puts into solution.
 * Na₂HPO₄·7H₂O = 1 phosphate system + 2 Na⁺; HCl = 1 Cl⁻ (its proton is found by the charge
 * balance); Tris = 1 Tris system; NaOH = 1 Na⁺; sucrose = 1 neutral particle.
 * The protonation state of the form weighed in does not enter the equilibrium except through
 * its counter-ions: the charge balance over system totals and strong ions fixes [H⁺].
 */
export interface Component {
  id: string;
  name: string;
  /** Acid–base systems released per mole (borax Na₂B₄O₇·10H₂O: 4 mol borate). */
  systems: { system: AcidBaseSystem; stoich: number }[];
  /** Strong ions released per mole. */
  ions: { ion: StrongIon; stoich: number }[];
  /** Uncharged, non-reacting particles per mole (sucrose, mannitol): counted for osmolarity only. */
  neutral?: number;
  /** g/mol of the form weighed (hydrate water included), when known. */
  molarMass?: number;
  /** Protons the weighed form carries on its systems (Na₂HPO₄: 1 of 3), informational. */
  protons?: number;
}

/** One entry of a mixture: a component at its concentration in the final solution. */
export interface MixtureEntry {
  component: Component;
  /** mol/L in the final solution, ≥ 0. */
  conc: number;
}

export type Mixture = MixtureEntry[];

/** Options shared by every engine call. Defaults are defined once in src/chem/defaults.ts. */
export interface ChemOptions {
  /** °C, 0–100. Default 25. */
  temperatureC?: number;
  /** Default "davies". */
  activity?: ActivityModel;
}

/** A species at equilibrium. */
export interface Species {
  name: string;
  /** System id, or null for H⁺, OH⁻ and strong ions. */
  systemId: string | null;
  charge: number;
  /** mol/L. */
  conc: number;
  /**
   * Fraction of its system's total (1 for strong ions, H⁺ and OH⁻); for a complex, the share of its
   * ligand system's total it holds (ligands × conc / total); for a metal ion that forms complexes,
   * the free fraction of that metal.
   */
  fraction: number;
  /** Strong-ion id of the metal, for a complex with a metal and for a metal ion's free form. */
  metalId?: string;
  /** For a complex: the fraction of its metal's total it holds. */
  metalFraction?: number;
}

/** Which root the charge balance landed on. */
export type Regime = "buffer" | "excess-strong-acid" | "excess-strong-base" | "no-buffer";

export interface Equilibrium {
  ok: true;
  /** −log10 a(H⁺): what a calibrated meter reads. */
  pH: number;
  /** −log10 [H⁺] (concentration). */
  pcH: number;
  /** Ionic strength, mol/L, self-consistent with the speciation. */
  ionicStrength: number;
  /** Activity coefficient of H⁺ (and of any singly charged ion). */
  gammaH: number;
  /** Thermodynamic pKw at the temperature. */
  pKw: number;
  /** Buffer value β = dC(strong base)/dpH, mol/(L·pH), analytic at the solved state. */
  beta: number;
  species: Species[];
  /** Charge-balance residual relative to the largest charge term. */
  residual: number;
  /** Ionic-strength iterations of the solve (1 for the ideal model). */
  iterations: number;
  regime: Regime;
  /** Plain-language warnings (ionic strength beyond the activity model's range, missing ΔrH° …). */
  warnings: string[];
  /** Saturation indices of the solids the systems list whose metal is present (25 °C Ksp). */
  saturation?: Saturation[];
}

/** "beyond-limit": the solution's ionic strength is beyond LIMITS.maxIonicStrength (no pH-derived number). */
export type FailureCode = "bad-input" | "no-convergence" | "unreachable" | "out-of-range" | "not-found" | "beyond-limit";

export interface Failure {
  ok: false;
  code: FailureCode;
  message: string;
}

export type Result<T> = ({ ok: true } & T) | Failure;

/** A single number with its meaning given by the function that returns it (units in its doc). */
export type ValueResult = Result<{ value: number }>;

/** The fast path's answer: pH, p[H] and ionic strength only, no species list. */
export type PHResult = Result<{ pH: number; pcH: number; ionicStrength: number }>;
