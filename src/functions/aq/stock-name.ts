/**
 * A substance name that may carry a stock concentration: "HCl 1 M", "1 M HCl", "NaOH (0.5 mol/L)",
 * or a concentrated reagent as supplied, by mass fraction: "HCl 37 % w/w", "hydrochloric acid 37 %",
 * "37 % HCl", "glacial acetic acid" (chem/reagents.ts: density tables, the rule that a percentage
 * beside a named reagent is by mass). The whole text is tried as a name first, so a library name is
 * never split ("glacial acetic acid" is also an alias of acetic acid: the word "glacial" is read
 * before the name).
 */
import { reagentStock, glacialPercent, REAGENT_TABLE_TEMPERATURE_C, type ReagentStock } from "../../chem/reagents";
import { readDecimal } from "../../chem";
import { quantity, type Cell } from "../args";
import { AqError, badInput, orThrow } from "../errors";
import { resolveComponent } from "../substances";
import { LEADING_CONC, LEADING_PERCENT, TRAILING_CONC, TRAILING_PERCENT } from "../name-strength";
import type { Component } from "../../chem/types";

export interface NamedStock {
  component: Component;
  /** mol/L, when the text gave one. */
  stockConc?: number;
  /** A concentrated reagent given by mass fraction: its density and mass per mol (stockConc is set too). */
  reagent?: ReagentStock;
}

const GLACIAL = /^glacial\s+(.*\S)$/i;

/** One-line description of a reagent as supplied, for tables: "hydrochloric acid 37 % w/w (12.02 mol/L, 1.184 g/mL at 20 °C)". */
export function reagentLabel(component: Component, reagent: ReagentStock): string {
  return `${component.name} ${+reagent.percent.toFixed(3)} % w/w (${reagent.conc.toFixed(2)} mol/L, ${reagent.density.toFixed(3)} g/mL at ${REAGENT_TABLE_TEMPERATURE_C} °C)`;
}

function tryResolve(name: string): Component | undefined {
  try {
    return resolveComponent(name.trim());
  } catch (error) {
    if (!(error instanceof AqError)) throw error;
    return undefined;
  }
}

function asReagent(component: Component, percent: number): NamedStock {
  const reagent = orThrow(reagentStock(component.id, component.name, component.molarMass, percent));
  return { component, stockConc: reagent.conc, reagent };
}

/** "HCl 37 % w/w", "37 % HCl", "glacial acetic acid": a reagent by mass fraction, or undefined when the text is not one. */
function readReagent(name: string, what: string): NamedStock | undefined {
  const g = GLACIAL.exec(name);
  if (g) {
    const component = tryResolve(g[1]);
    const percent = component && glacialPercent(component.id);
    if (component && percent !== undefined) return asReagent(component, percent);
    if (component) throw badInput(`'${name}': only acetic acid is sold as "glacial"; give the mass fraction instead ("${component.name} 37 %")`);
    return undefined;
  }
  const t = TRAILING_PERCENT.exec(name);
  const l = t ? null : LEADING_PERCENT.exec(name);
  const m = t ? { base: t[1], percent: t[2], a: t[3], b: t[4] } : l ? { base: l[4], percent: l[1], a: l[2], b: l[3] } : undefined;
  if (!m) return undefined;
  const component = tryResolve(m.base);
  if (!component) return undefined;
  const basis = m.a === undefined ? "" : `${m.a}/${m.b}`.toLowerCase();
  if (basis === "w/v" || basis === "m/v") {
    const stockConc = quantity(`${m.percent} % w/v` as Cell, `stock concentration of ${what} '${name}'`, "concentration", { molarMass: component.molarMass });
    return { component, stockConc };
  }
  if (basis !== "" && basis !== "w/w" && basis !== "m/m") {
    throw badInput(`'${name}': only a percentage by mass ("% w/w", as concentrated reagents are sold) or "% w/v" is understood beside a name, not "% ${basis}"`);
  }
  return asReagent(component, readDecimal(m.percent) ?? NaN);
}

export function resolveWithStock(name: string, what: string): NamedStock {
  let firstError: unknown;
  const reagent = readReagent(name, what);
  if (reagent) return reagent;
  try {
    return { component: resolveComponent(name) };
  } catch (error) {
    if (!(error instanceof AqError)) throw error;
    firstError = error;
  }
  const splits: [string, string][] = [];
  const t = TRAILING_CONC.exec(name);
  if (t) splits.push([t[1], t[2]]);
  const l = LEADING_CONC.exec(name);
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
