/**
 * The one place the engine's defaults and numerical settings live. Every other file imports them
 * from here; the README quotes the same values.
 */
import type { ActivityModel } from "./types";

export const DEFAULTS = {
  /** °C: the reference temperature of every tabulated pKa (θ = 298.15 K). */
  temperatureC: 25,
  /** Activity model used when a caller gives none. */
  activity: "davies" as ActivityModel,
  /** Validity range of the water and activity formulas, °C (inclusive). */
  minTemperatureC: 0,
  maxTemperatureC: 100,
  /** Largest total concentration of any one system, ion or neutral species accepted, mol/L (water itself is 55.5 mol/L). */
  maxConcentration: 20,
} as const;

/** Numerical settings of the solvers. */
export const SOLVER = {
  /** Charge balance: stop when the Newton/bisection step in ln[H⁺] is below this (absolute, ln units). */
  lnHTolerance: 1e-14,
  /** Charge balance: iteration cap of the safeguarded Newton on ln[H⁺] (bisection alone needs < 110). */
  maxChargeBalanceIterations: 200,
  /** Ionic strength: stop when |I_new − I| ≤ this × I_new (self-consistency). */
  ionicStrengthRelTolerance: 1e-12,
  /** Ionic strength: iteration cap of the safeguarded fixed point (bisection alone needs < 100). */
  maxIonicStrengthIterations: 150,
} as const;

/** Warning thresholds and the one hard limit. */
export const LIMITS = {
  /**
   * mol/L: the ionic-strength limit. Beyond it no pH or pH-derived number is given by any function
   * or view (ionic-limit.ts enforces it): none of the activity models here describes such a
   * solution — Davies is meant for I ≲ 0.3–0.5 mol/L (Davies, Ion Association, 1962), extended
   * Debye–Hückel for I ≤ 0.1 mol/L. 1 mol/L keeps a 1 mol/L strong acid or base stock answerable
   * (with the warnings below). Common practice, the design's choice.
   */
  maxIonicStrength: 1,
  /** Relative rounding allowance on that limit: 1 mol/L NaOH solves to I = 1 + [H⁺] + solver rounding. */
  maxIonicStrengthRounding: 1e-9,
  /** mol/L: above this the activity models lose accuracy (Davies 1962; docs/references.md, section 2 gives 0.3–0.5). */
  ionicStrengthCaution: 0.3,
  /** mol/L: extended Debye–Hückel (one ion-size parameter for every ion) is meant for I ≤ 0.1 (README, Validity limits). */
  debyeHuckelCaution: 0.1,
  /** mol/L: above this the activity models are unreliable. */
  ionicStrengthStrong: 0.5,
  /**
   * mol/L: the "pitzer" model's caution and unreliable thresholds. Its binary parameters hold to
   * several mol/kg for the salts fitted (Pitzer & Mayorga 1973); the checks here reach I ≈ 1 for
   * NaCl and KCl (test/reference/pitzer-nacl-kcl.json) and I ≈ 0.6 for phosphate and citrate–
   * phosphate buffers (README, Validity limits). The hard limit maxIonicStrength stays 1 mol/L.
   */
  pitzerCaution: 0.6,
  pitzerUnreliable: 1,
  /** K: a pKa without ΔrH° is held at its 25 °C value; warn when |T − 25 °C| exceeds this. */
  missingEnthalpyWarnK: 5,
  /**
   * pH units: a step whose pKa lies further than this from the solved pH holds under 0.1 % of its
   * system on the minor side; an unknown ΔrH° there cannot move the result measurably, so no warning.
   */
  missingEnthalpyRelevance: 3,
} as const;
