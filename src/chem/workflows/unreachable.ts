/**
 * The "unreachable" failure of a titration path: which way the titrant moves the pH and how far it
 * can take it, in words a formulation scientist can act on.
 */
import { fail, fmt } from "../failure";
import type { Component, Failure } from "../types";
import type { Sample } from "./crossing";
import { fmtPH } from "./validate";
import { IONIC_LIMIT_TEXT } from "../ionic-limit";

export interface PathDescription {
  titrant: Component;
  target: number;
  /** pH at every point the scan evaluated, in path order (first = the mixture as it is). */
  samples: Sample[];
  /** "stock": mixing a stock (its own pH is the limit); "per-litre": adding without dilution up to `limit` mol/L. */
  mode: "stock" | "per-litre";
  /** Stock concentration (mode "stock") or the largest amount searched (mode "per-litre"), mol/L. */
  limit: number;
  /** Why the scan stopped early, when it did (an engine failure part-way). */
  stoppedBy?: Failure;
}

/** 6 significant digits rounded towards zero: an amount quoted at a limit stays on the near side of it. */
function fmtDown(x: number): string {
  if (!(x > 0) || !Number.isFinite(x)) return fmt(x);
  const step = Math.pow(10, Math.floor(Math.log10(x)) - 5);
  const down = Number((Math.floor(x / step) * step).toPrecision(6));
  return fmt(down > x ? Number((down - step).toPrecision(6)) : down);
}

/**
 * The failure is "beyond-limit" when the path was cut by the ionic-strength limit (the target may
 * lie beyond it, where no pH is given), "unreachable" otherwise.
 */
export function unreachable(d: PathDescription): Failure {
  const pHs = d.samples.map((s) => s.value + d.target);
  const start = pHs[0];
  const end = pHs[pHs.length - 1];
  const name = d.titrant.name;
  const raises = end > start;
  const verb = raises ? "raises" : "lowers";
  if (Math.abs(end - start) < 1e-9) {
    return fail("unreachable", `${name} does not move the pH of this mixture (pH ${fmtPH(start)}): the target ${fmtPH(d.target, start)} cannot be reached with it.`);
  }
  const wrongSide = raises ? d.target < start : d.target > start;
  if (wrongSide) {
    const side = raises ? "above" : "below";
    return fail("unreachable", `${name} ${verb} the pH: this mixture is at pH ${fmtPH(start, d.target)}, already ${side} the target ${fmtPH(d.target, start)}.`);
  }
  const extreme = raises ? Math.max(...pHs) : Math.min(...pHs);
  const most = raises ? "at most" : "at least";
  const atLimit = d.stoppedBy?.code === "beyond-limit";
  const stopped = d.stoppedBy && !atLimit ? ` (the engine has no result beyond that point: ${d.stoppedBy.message})` : "";
  const limitNote = atLimit ? `, where the ionic strength reaches the ${IONIC_LIMIT_TEXT} limit beyond which no pH is given` : "";
  if (d.mode === "stock") {
    if (atLimit) {
      const f = d.samples[d.samples.length - 1].t;
      return fail(
        "beyond-limit",
        `With ${name} at ${fmt(d.limit)} mol/L the pH reaches ${most} ${fmtPH(extreme, d.target)} (at ${fmtDown(f / (1 - f))} L of stock per litre of batch${limitNote}), short of the target ${fmtPH(d.target, extreme)}.`,
      );
    }
    const weak = d.titrant.systems.length > 0 ? "A weak titrant" : "A titrant";
    return fail(
      "unreachable",
      `${weak} cannot pass its own pH: with ${name} at ${fmt(d.limit)} mol/L the pH approaches ${most} ${fmtPH(extreme, d.target)} as the stock volume grows (the stock's own pH), so the target ${fmtPH(d.target, extreme)} is out of reach${stopped}.`,
    );
  }
  const searched = d.samples[d.samples.length - 1].t;
  const kind = d.titrant.systems.length > 0 ? "A weak titrant cannot pass its own pH: with" : "With";
  const where = atLimit
    ? `at ${fmtDown(searched)} mol/L${limitNote}`
    : searched >= d.limit * (1 - 1e-6)
      ? `at ${fmt(d.limit)} mol/L, the most the engine accepts`
      : `at ${fmt(searched)} mol/L`;
  return fail(
    atLimit ? "beyond-limit" : "unreachable",
    `${kind} ${name} added without dilution the pH reaches ${most} ${fmtPH(extreme, d.target)} (${where}), short of the target ${fmtPH(d.target, extreme)}${stopped}.`,
  );
}
