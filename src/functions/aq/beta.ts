/** AQ.BETA: buffer value β, mol/(L·pH), at the mixture's own pH. */
import type { Cell } from "../args";
import { finite } from "../errors";
import { equilibriumOf } from "./equilibrium-of-args";

export function beta(names: Cell, amounts: Cell, temperature: Cell, activity: Cell): number {
  return finite(equilibriumOf(names, amounts, temperature, activity).beta, "buffer value");
}
