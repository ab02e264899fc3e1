/** The names a user may type for each activity model (case-insensitive), defined once. */
import type { ActivityModel } from "../types";

const ACTIVITY_NAMES: Readonly<Record<string, ActivityModel>> = {
  davies: "davies",
  ideal: "ideal",
  none: "ideal",
  "debye-huckel": "debye-huckel",
  "debye-hückel": "debye-huckel",
  "debye huckel": "debye-huckel",
  "extended debye-huckel": "debye-huckel",
};

/** The model a typed name means, or undefined when the name is not known. */
export function activityModelNamed(name: string): ActivityModel | undefined {
  const key = name.trim().toLowerCase();
  return Object.prototype.hasOwnProperty.call(ACTIVITY_NAMES, key) ? ACTIVITY_NAMES[key] : undefined;
}
