/**
 * AQ.CHECK: what a reviewer should know about a mixture's result, as one line of text.
 *
 * "OK: buffer …" only for a real buffer by the rule of src/chem/buffering.ts (the weak systems give
 * at least half of β, and the pH is within 1 of the nearest pKa′ of the system that buffers), with
 * no warning; otherwise "CHECK: …" with every reason: not a buffer (and why), weakly buffered,
 * overwhelmed by strong acid or base, the engine's warnings (ionic strength beyond the activity
 * model's range, ΔrH° unknown away from 25 °C), a pKa from memory, unverified, within 2 of the pH
 * (src/chem/buffering.ts, unverifiedStepsNear), or the ionic-strength limit beyond which no pH is
 * given (then no pH and no verdict that depends on it is quoted). Numbers are printed with enough
 * digits to be true against the thresholds they are compared with.
 */
import { ACTIVITY_MODELS, assessBuffering, beyondIonicLimit, BUFFERING, fmtAgainst, IONIC_LIMIT_TEXT, LIMITS, sideOf, unverifiedStepsNear, type BufferAssessment, type UnverifiedStep } from "../../chem";
import type { Cell } from "../args";
import { readMixtureArgs } from "../mixture";
import { orThrow } from "../errors";
import { chemOptions } from "./options";
import type { ActivityModel, Equilibrium } from "../../chem/types";

function ionicText(I: number, model: ActivityModel): string {
  const caution = ACTIVITY_MODELS[model].cautionAbove;
  return `I = ${fmtAgainst(I, [caution, LIMITS.ionicStrengthStrong, LIMITS.maxIonicStrength])} mol/L`;
}

function pct(x: number): string {
  return `${Number((100 * x).toPrecision(2))} %`;
}

/** Two decimals, more when two decimals would put the distance on the other side of a threshold. */
function distanceText(d: number): string {
  for (let k = 2; k <= 12; k++) {
    const s = d.toFixed(k);
    if ([BUFFERING.bufferDistance, BUFFERING.weakDistance].every((t) => sideOf(Number(s), t, 0) === sideOf(d, t, 0))) return s;
  }
  return String(d);
}

function verdictText(a: BufferAssessment, eq: Equilibrium): string {
  const pH = eq.pH.toFixed(2);
  const near = a.nearest;
  const where = near ? `pH ${pH} is ${distanceText(near.distance)} from pKa′ ${near.pKa.toFixed(2)} of ${near.system}` : "";
  switch (a.verdict) {
    case "buffer":
      return near ? `buffer, ${distanceText(near.distance)} from pKa′ ${near.pKa.toFixed(2)} (${near.system})` : "buffer";
    case "no-system":
      return `not buffered: no weak acid or base present (pH ${pH})`;
    case "excess-strong-acid":
      return `overwhelmed by strong acid: pH ${pH} follows the excess acid, not the buffer`;
    case "excess-strong-base":
      return `overwhelmed by strong base: pH ${pH} follows the excess base, not the buffer`;
    case "weak":
      return `weakly buffered: ${where}, beyond ±${BUFFERING.bufferDistance} (common practice)`;
    default:
      if (near && near.distance <= BUFFERING.weakDistance) {
        const free = eq.pH < eq.pKw / 2 ? "free H⁺" : "free OH⁻";
        return `not buffered: at pH ${pH} the weak acids and bases give only ${pct(a.weakShare)} of the buffer value, ${free} the rest`;
      }
      return `not buffered: ${where}: under 1 % of that system is in its minor form`;
  }
}

function unverifiedText(steps: readonly UnverifiedStep[]): string {
  if (steps.length === 0) return "";
  const list = steps.map((s) => `${s.system} step ${s.step} (pKa′ ${s.pKa.toFixed(2)})`).join(", ");
  const verb = steps.length === 1 ? "is" : "are";
  return `The pKa of ${list} ${verb} from memory, unverified (no source seen): confirm ${steps.length === 1 ? "it" : "them"} before relying on this result.`;
}

export function check(names: Cell, amounts: Cell, temperature: Cell, activity: Cell): string {
  const { prepared } = readMixtureArgs(names, amounts);
  const options = chemOptions(temperature, activity);
  const eq = orThrow(prepared.solveBeyondLimit(options)) as Equilibrium;
  if (beyondIonicLimit(eq.ionicStrength)) {
    return `CHECK: no pH is given: ${ionicText(eq.ionicStrength, options.activity)}, beyond the ${IONIC_LIMIT_TEXT} limit of the activity models.`;
  }
  const a = assessBuffering(eq, prepared.aggregate.systems, options.temperatureC, options.activity);
  const state = `${verdictText(a, eq)}, ${ionicText(eq.ionicStrength, options.activity)}`;
  const unverified = unverifiedText(unverifiedStepsNear(eq, prepared.aggregate.systems, options.temperatureC, options.activity));
  if (a.verdict === "buffer" && eq.warnings.length === 0 && unverified === "") return `OK: ${state}`;
  return `CHECK: ${state}. ${[...eq.warnings, unverified].filter((w) => w !== "").join(" ")}`.trim();
}
