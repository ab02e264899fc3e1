/** AQ.PH: pH (−log10 a(H⁺)) of a mixture. */
import type { Cell } from "../args";
import { finite, orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { chemOptions } from "./options";

export function ph(names: Cell, amounts: Cell, temperature: Cell, activity: Cell): number {
  const { prepared } = readMixtureArgs(names, amounts);
  const result = orThrow(prepared.solvePH(chemOptions(temperature, activity)));
  return finite(result.pH, "pH");
}
