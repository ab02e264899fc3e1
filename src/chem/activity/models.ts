/**
 * The activity models, defined once: the id the engine uses, the names a user may type for it
 * (case-insensitive), the label the pane shows, the ionic strengths above which it loses accuracy
 * and becomes unreliable, and its shape f(I) in log10 γ(z) = −A z² f(I). Adding a model is one entry here (plus its file);
 * the functions, the pane and the command line read the list, the names and the message from here.
 */
import { DEFAULTS, LIMITS } from "../defaults";
import { fail } from "../failure";
import type { Failure } from "../types";
import { daviesShape, daviesShapeDerivative } from "./davies";
import { debyeHuckelShape, debyeHuckelShapeDerivative } from "./debye-huckel";

export interface ActivityModelEntry {
  /** Names a user may type, lower case, the id first. */
  names: readonly string[];
  /** How the pane describes the model in a sentence ("… with Davies activity"). */
  label: string;
  /** False when γ = 1 at every ionic strength (no self-consistency loop needed). */
  dependsOnIonicStrength: boolean;
  /** mol/L: above this ionic strength the model loses accuracy (a warning, not a refusal). */
  cautionAbove: number;
  /** mol/L: above this the model is unreliable (a stronger warning). */
  unreliableAbove: number;
  /**
   * True when each ion has its own γ from the composition (Pitzer): the solve then iterates the
   * speciation with pitzer-iteration.ts, and shape/shapeDerivative (Davies) serve only callers that
   * know no more than I (apparent pKa, the speciation chart, the first guess of the solve).
   */
  ionSpecific: boolean;
  /** f(I), I in mol/L. */
  shape(ionicStrength: number): number;
  /** df/dI. */
  shapeDerivative(ionicStrength: number): number;
}

const zero = (_ionicStrength: number): number => 0;

export const ACTIVITY_MODELS = {
  davies: {
    names: ["davies"],
    label: "Davies activity",
    dependsOnIonicStrength: true,
    cautionAbove: LIMITS.ionicStrengthCaution,
    unreliableAbove: LIMITS.ionicStrengthStrong,
    ionSpecific: false,
    shape: daviesShape,
    shapeDerivative: daviesShapeDerivative,
  },
  ideal: {
    names: ["ideal", "none"],
    label: "ideal (no activity correction)",
    dependsOnIonicStrength: false,
    cautionAbove: LIMITS.ionicStrengthCaution,
    unreliableAbove: LIMITS.ionicStrengthStrong,
    ionSpecific: false,
    shape: zero,
    shapeDerivative: zero,
  },
  "debye-huckel": {
    names: ["debye-huckel", "debye-hückel", "debye huckel", "extended debye-huckel"],
    label: "extended Debye–Hückel activity",
    dependsOnIonicStrength: true,
    cautionAbove: LIMITS.debyeHuckelCaution,
    unreliableAbove: LIMITS.ionicStrengthStrong,
    ionSpecific: false,
    shape: debyeHuckelShape,
    shapeDerivative: debyeHuckelShapeDerivative,
  },
  pitzer: {
    names: ["pitzer"],
    label: "Pitzer activity (ion-specific)",
    dependsOnIonicStrength: true,
    cautionAbove: LIMITS.pitzerCaution,
    unreliableAbove: LIMITS.pitzerUnreliable,
    ionSpecific: true,
    shape: daviesShape,
    shapeDerivative: daviesShapeDerivative,
  },
} as const satisfies Record<string, ActivityModelEntry>;

export type ActivityModelId = keyof typeof ACTIVITY_MODELS;

/** The model an ion-specific solve starts from (its first guess of the speciation), and the fallback for an ion without parameters. */
export const ION_SPECIFIC_START: ActivityModelId = "davies";

/** The model ids in the order the messages and the docs list them. */
export const ACTIVITY_MODEL_IDS = Object.keys(ACTIVITY_MODELS) as ActivityModelId[];

const BY_NAME = new Map<string, ActivityModelId>();
for (const id of ACTIVITY_MODEL_IDS) for (const name of ACTIVITY_MODELS[id].names) BY_NAME.set(name, id);

/** True when the value is a model id (what the engine's options take). */
export function isActivityModel(value: unknown): value is ActivityModelId {
  return typeof value === "string" && Object.prototype.hasOwnProperty.call(ACTIVITY_MODELS, value);
}

/** The model a typed name means, or undefined when the name is not known. */
export function activityModelNamed(name: string): ActivityModelId | undefined {
  return BY_NAME.get(name.trim().toLowerCase());
}

/** '"davies", "ideal" or "debye-huckel"': the choices as the messages and the docs list them. */
export function activityModelChoices(): string {
  const quoted = ACTIVITY_MODEL_IDS.map((id) => `"${id}"`);
  return quoted.length === 1 ? quoted[0] : `${quoted.slice(0, -1).join(", ")} or ${quoted[quoted.length - 1]}`;
}

/** The message for a name that is no model. */
export function unknownActivityModelMessage(name: string): string {
  return `The activity model "${name.trim()}" is not known: use ${activityModelChoices()}.`;
}

/** A typed model name → the model; blank text → the default (DEFAULTS.activity). */
export function readActivityModel(text: string): { ok: true; model: ActivityModelId } | Failure {
  if (text.trim() === "") return { ok: true, model: DEFAULTS.activity };
  const model = activityModelNamed(text);
  return model === undefined ? fail("bad-input", unknownActivityModelMessage(text)) : { ok: true, model };
}
