/** The full equilibrium of a names/amounts mixture, for functions that need more than the pH. */
import type { Equilibrium } from "../../chem/types";
import type { Cell } from "../args";
import { orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { chemOptions } from "./options";

export function equilibriumOf(names: Cell, amounts: Cell, temperature: Cell, activity?: Cell): Equilibrium {
  const { prepared } = readMixtureArgs(names, amounts);
  return orThrow(prepared.solve(chemOptions(temperature, activity))) as Equilibrium;
}
