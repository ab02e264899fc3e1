/**
 * AQ.CURVE: titration curve as a spilled table with a header row —
 *   titrant volume (L) | pH | marked point | marked volume (L) | marked pH
 * with the volumes in the unit the starting volume was written in ("50 mL" → "titrant volume (mL)").
 * The first two columns are the curve, a clean numeric block: select them (header included) and
 * insert an X-Y scatter chart. A point whose solution is beyond the ionic-strength limit is #N/A in
 * its own pH cell, with the engine's message; the others are still given.
 * The last three columns list, from the first data row down in order of volume, the marked points:
 * each "steepest point k (inflection)" of the computed curve and each "stoichiometric equivalence k"
 * computed from the amounts (strong titrants), with its exact volume and pH — a second chart series
 * (columns 4 and 5) shows them on the curve. The two differ by a few per cent for a dilute weak
 * system, which is why both are given and neither is called the other.
 */
import { curve as curveOf } from "../../chem/workflows";
import { writtenVolumeUnit } from "../../chem";
import { isBlank, plainNumber, quantity, text, type Cell } from "../args";
import { badInput, finite, orThrow, refusedCell } from "../errors";
import { readMixtureArgs } from "../mixture";
import { resolveWithStock } from "./stock-name";
import { chemOptions } from "./options";

export const CURVE_HEADER = ["titrant volume (L)", "pH", "marked point", "marked volume (L)", "marked pH"];

/** The header with the volumes in the unit the starting volume was written in ("50 mL" → mL). */
const headerIn = (symbol: string): string[] => CURVE_HEADER.map((h) => h.replace("(L)", `(${symbol})`));

export function curve(
  names: Cell,
  amounts: Cell,
  titrant: Cell,
  titrantConc: Cell,
  volume: Cell,
  maxTitrantVolume: Cell,
  points: Cell,
  temperature: Cell,
  activity: Cell,
): unknown[][] {
  const { mixture } = readMixtureArgs(names, amounts);
  // the titrant may name its stock, as in ADJUST and RECIPE: "0.1 M NaOH", "HCl 37 % w/w" (volumes are then of the reagent as supplied)
  const titrantName = text(titrant, "titrant");
  const named = resolveWithStock(titrantName, "titrant");
  const component = named.component;
  if (named.stockConc !== undefined && !isBlank(titrantConc)) {
    throw badInput(`the titrant '${titrantName}' already names its stock concentration: leave titrant_conc blank, or name the titrant without one`);
  }
  const stockConc = named.stockConc ?? quantity(titrantConc, "titrant_conc", "concentration", { molarMass: component.molarMass });
  const initial = quantity(volume, "volume", "volume");
  const maxVolume = quantity(maxTitrantVolume, "max_titrant_volume", "volume");
  const n = plainNumber(points, "points", 51);
  const r = orThrow(curveOf(mixture, component, { stockConc, volume: initial, maxVolume, points: n }, chemOptions(temperature, activity)));
  const marks: { label: string; volume: number; pH: unknown }[] = [];
  r.equivalence.forEach((e, i) => marks.push({ label: `steepest point ${i + 1} (inflection)`, volume: e.volume, pH: finite(e.pH, "pH") }));
  r.stoichiometric.forEach((e, i) =>
    marks.push({ label: `stoichiometric equivalence ${i + 1}`, volume: e.volume, pH: e.pH === null ? refusedCell(e.refused) : finite(e.pH, "pH") }),
  );
  marks.sort((a, b) => a.volume - b.volume);
  // volumes in the unit the starting volume was written in ("50 mL" → mL; a number → L): chem/units.ts
  const unit = writtenVolumeUnit(volume);
  const rows: unknown[][] = [headerIn(unit.symbol)];
  const height = Math.max(r.points.length, marks.length);
  for (let i = 0; i < height; i++) {
    const p = r.points[i];
    const m = marks[i];
    rows.push([
      p === undefined ? "" : finite(p.volume / unit.litres, "volume"),
      p === undefined ? "" : p.pH === null ? refusedCell(p.refused) : finite(p.pH, "pH"),
      m === undefined ? "" : m.label,
      m === undefined ? "" : finite(m.volume / unit.litres, "volume"),
      m === undefined ? "" : m.pH,
    ]);
  }
  return rows;
}
