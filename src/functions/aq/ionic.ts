/** AQ.IONIC: ionic strength, mol/L, from the solved speciation (Davies activity). */
import type { Cell } from "../args";
import { finite } from "../errors";
import { equilibriumOf } from "./equilibrium-of-args";

export function ionic(names: Cell, amounts: Cell, temperature: Cell): number {
  return finite(equilibriumOf(names, amounts, temperature).ionicStrength, "ionic strength");
}
