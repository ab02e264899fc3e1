/** The full equilibrium of a names/amounts mixture, for functions that need more than the pH. */
import type { Equilibrium } from "../../chem/types";
import type { Cell } from "../args";
import { orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { chemOptions } from "./options";

/** The equilibrium for pH-derived numbers: #N/A beyond the ionic-strength limit. */
export function equilibriumOf(names: Cell, amounts: Cell, temperature: Cell, activity?: Cell): Equilibrium {
  const { prepared } = readMixtureArgs(names, amounts);
  return orThrow(prepared.solve(chemOptions(temperature, activity))) as Equilibrium;
}

/** The equilibrium even beyond the ionic-strength limit: only to report where a mixture stands (AQ.IONIC, AQ.CHECK). */
export function reportOf(names: Cell, amounts: Cell, temperature: Cell, activity?: Cell): Equilibrium {
  const { prepared } = readMixtureArgs(names, amounts);
  return orThrow(prepared.solveBeyondLimit(chemOptions(temperature, activity))) as Equilibrium;
}
