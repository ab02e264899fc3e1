/**
 * AQ.CAPACITY: mol/L of strong base (delta > 0) or strong acid (delta < 0) that moves the pH of a
 * mixture by delta, without dilution, as a positive number.
 */
import { capacity as capacityOf } from "../../chem/workflows";
import { plainNumber, type Cell } from "../args";
import { finite, orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { chemOptions } from "./options";

export function capacity(names: Cell, amounts: Cell, deltaPH: Cell, temperature: Cell, activity: Cell): number {
  const { mixture } = readMixtureArgs(names, amounts);
  const delta = plainNumber(deltaPH, "delta_pH");
  return finite(orThrow(capacityOf(mixture, delta, chemOptions(temperature, activity))).value, "capacity");
}
