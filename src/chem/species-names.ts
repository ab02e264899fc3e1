/** Default species names for systems without speciesNames: "phosphate H2L(1-)", "Tris HL(1+)", "acetate L(1-)". */
import type { AcidBaseSystem } from "./types";

function chargeLabel(z: number): string {
  if (z === 0) return "";
  return `(${Math.abs(z)}${z > 0 ? "+" : "-"})`;
}

/** Name of the species of `sys` that has lost k protons. */
export function speciesName(sys: AcidBaseSystem, k: number): string {
  const given = sys.speciesNames?.[k];
  if (given !== undefined) return given;
  const left = sys.steps.length - k;
  const h = left === 0 ? "" : left === 1 ? "H" : `H${left}`;
  return `${sys.name} ${h}L${chargeLabel(sys.topCharge - k)}`;
}
