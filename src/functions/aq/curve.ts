/**
 * AQ.CURVE: titration curve as a spilled table with a header row —
 *   titrant volume (L) | pH | equivalence
 * The first two columns are a clean numeric block: select them (header included) and insert an X-Y
 * scatter chart; the header becomes the series name. Equivalence points are marked in a third
 * column, as text on the row nearest each point ("equivalence point 1: 0.02500 L, pH 8.73", the
 * refined volume and pH, not the row's), blank elsewhere. A trailing note row was not chosen: it
 * would put text into the chart's data columns and break a chart over the whole spill.
 */
import { curve as curveOf } from "../../chem/workflows";
import { plainNumber, quantity, text, type Cell } from "../args";
import { finite, orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { resolveComponent } from "../substances";
import { chemOptions } from "./options";

export const CURVE_HEADER = ["titrant volume (L)", "pH", "equivalence"];

export function curve(
  names: Cell,
  amounts: Cell,
  titrant: Cell,
  titrantConc: Cell,
  volume: Cell,
  maxTitrantVolume: Cell,
  points: Cell,
  temperature: Cell,
): unknown[][] {
  const { mixture } = readMixtureArgs(names, amounts);
  const component = resolveComponent(text(titrant, "titrant"));
  const stockConc = quantity(titrantConc, "titrant_conc", "concentration", { molarMass: component.molarMass });
  const initial = quantity(volume, "volume", "volume");
  const maxVolume = quantity(maxTitrantVolume, "max_titrant_volume", "volume");
  const n = plainNumber(points, "points", 51);
  const r = orThrow(curveOf(mixture, component, { stockConc, volume: initial, maxVolume, points: n }, chemOptions(temperature)));
  const marks = new Map<number, string>();
  r.equivalence.forEach((e, i) => {
    const label = `equivalence point ${i + 1}: ${e.volume.toPrecision(4)} L, pH ${e.pH.toFixed(2)}`;
    const previous = marks.get(e.nearestIndex);
    marks.set(e.nearestIndex, previous === undefined ? label : `${previous}; ${label}`);
  });
  const rows: unknown[][] = [CURVE_HEADER];
  r.points.forEach((p, i) => rows.push([finite(p.volume, "volume"), finite(p.pH, "pH"), marks.get(i) ?? ""]));
  return rows;
}
