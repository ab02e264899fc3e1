/**
 * AQ.OSMOLALITY: osmol per kg of water, what an osmometer reads — the particles at equilibrium as
 * molalities (water mass from the solutes' partial molar volumes), with the ions' osmotic
 * coefficient from the activity model and published excess terms for sugars and polyols
 * (chem/osmolality.ts).
 */
import { osmolality as osmolalityOf } from "../../chem/osmolality";
import type { Cell } from "../args";
import { finite, orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { chemOptions } from "./options";

export function osmolality(names: Cell, amounts: Cell, temperature: Cell, activity: Cell): number {
  const { mixture } = readMixtureArgs(names, amounts);
  // beyond the ionic-strength limit the engine refuses the solution (#N/A), as for every number that
  // depends on the activity model
  const r = orThrow(osmolalityOf(mixture, chemOptions(temperature, activity)));
  return finite(r.value, "osmolality");
}
