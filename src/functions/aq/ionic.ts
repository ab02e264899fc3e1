/**
 * AQ.IONIC: ionic strength, mol/L, from the solved speciation with the activity model asked for
 * (Davies by default). Reported beyond the ionic-strength limit too, so a user can see where a
 * mixture stands when its pH is refused.
 */
import type { Cell } from "../args";
import { finite } from "../errors";
import { reportOf } from "./equilibrium-of-args";

export function ionic(names: Cell, amounts: Cell, temperature: Cell, activity: Cell): number {
  return finite(reportOf(names, amounts, temperature, activity).ionicStrength, "ionic strength");
}
