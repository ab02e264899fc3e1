/**
 * AQ.OSMOLARITY: ideal osmolarity, osmol/L — every dissolved particle at equilibrium (all species of
 * every system, strong ions, H⁺, OH⁻, non-electrolytes), with an osmotic coefficient of 1. The
 * activity model enters only through the speciation (H⁺ and OH⁻).
 */
import { osmolarity as idealOsmolarity } from "../../chem";
import type { Cell } from "../args";
import { finite, orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { chemOptions } from "./options";

export function osmolarity(names: Cell, amounts: Cell, temperature: Cell, activity: Cell): number {
  const { mixture } = readMixtureArgs(names, amounts);
  return finite(orThrow(idealOsmolarity(mixture, chemOptions(temperature, activity))).value, "osmolarity");
}
