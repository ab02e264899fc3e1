/**
 * AQ.SPECIES: one species' concentration (mol/L), or the whole table with a header row:
 * species, charge, mol/L, fraction of its system.
 */
import type { Species } from "../../chem/types";
import { isBlank, text, type Cell } from "../args";
import { finite, notAvailable } from "../errors";
import { equilibriumOf } from "./equilibrium-of-args";

export const SPECIES_HEADER = ["species", "charge", "mol/L", "fraction"];

/** "HPO4^2-", "hpo4 2-", "HPO₄²⁻" all name the same species. */
export function normalizeSpeciesName(name: string): string {
  const sub = "₀₁₂₃₄₅₆₇₈₉";
  const sup = "⁰¹²³⁴⁵⁶⁷⁸⁹";
  let out = "";
  for (const ch of name) {
    const i = sub.indexOf(ch);
    const j = sup.indexOf(ch);
    if (i >= 0) out += String(i);
    else if (j >= 0) out += String(j);
    else if (ch === "⁺") out += "+";
    else if (ch === "⁻" || ch === "−") out += "-";
    else out += ch;
  }
  return out.toLowerCase().replace(/[\s^()[\]]/g, "");
}

export function species(names: Cell, amounts: Cell, which: Cell, temperature: Cell, activity: Cell): unknown[][] {
  const eq = equilibriumOf(names, amounts, temperature, activity);
  if (!isBlank(which)) {
    const wanted = normalizeSpeciesName(text(which, "species"));
    const found: Species[] = eq.species.filter((s) => normalizeSpeciesName(s.name) === wanted);
    if (found.length === 0) {
      const known = eq.species.map((s) => s.name).join(", ");
      throw notAvailable(`species '${String(which)}' is not in this mixture; it has: ${known}`);
    }
    const total = found.reduce((sum, s) => sum + s.conc, 0);
    return [[finite(total, "concentration")]];
  }
  const rows: unknown[][] = [SPECIES_HEADER];
  for (const s of eq.species) rows.push([s.name, s.charge, finite(s.conc, "concentration"), finite(s.fraction, "fraction")]);
  return rows;
}
