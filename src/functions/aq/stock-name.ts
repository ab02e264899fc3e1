/**
 * A substance name that may carry a stock concentration: "HCl 1 M", "1 M HCl", "NaOH (0.5 mol/L)".
 * The whole text is tried as a name first, so a library name is never split.
 */
import { quantity, type Cell } from "../args";
import { AqError } from "../errors";
import { resolveComponent } from "../substances";
import type { Component } from "../../chem/types";

export interface NamedStock {
  component: Component;
  /** mol/L, when the text gave one. */
  stockConc?: number;
}

const TRAILING = /^(.*?\S)[\s,]*\(?\s*(\d[\d.,]*(?:e[-+]?\d+)?\s*[a-zµμ/]+(?:\/[a-z]+)?)\s*\)?$/i;
const LEADING = /^(\d[\d.,]*(?:e[-+]?\d+)?\s*[a-zµμ/]+(?:\/[a-z]+)?)\s+(.*\S)$/i;

export function resolveWithStock(name: string, what: string): NamedStock {
  let firstError: unknown;
  try {
    return { component: resolveComponent(name) };
  } catch (error) {
    if (!(error instanceof AqError)) throw error;
    firstError = error;
  }
  const splits: [string, string][] = [];
  const t = TRAILING.exec(name);
  if (t) splits.push([t[1], t[2]]);
  const l = LEADING.exec(name);
  if (l) splits.push([l[2], l[1]]);
  for (const [base, conc] of splits) {
    let component: Component;
    try {
      component = resolveComponent(base.trim());
    } catch {
      continue;
    }
    const stockConc = quantity(conc as Cell, `stock concentration of ${what} '${name}'`, "concentration", { molarMass: component.molarMass });
    return { component, stockConc };
  }
  throw firstError;
}
