/**
 * The AQ functions for hosts other than Excel (HyperFormula in src/cli): the same function objects,
 * with the parameter list and result shape that Excel reads from the JSDoc metadata. A test checks
 * that this list and the generated functions.json agree.
 */
import * as AQ from "./functions";

export interface CatalogueEntry {
  /** Id after the namespace: AQ.<id>. */
  id: string;
  fn: (...args: any[]) => unknown;
  params: { name: string; optional: boolean }[];
  /**
   * "column": one value, or one value per row of a row-wise table (./rowwise): declared any[][] for
   * Excel, sized from its arguments' shapes (tableRows) by the headless engine. AQ.SPECIES is row-wise
   * too but stays "matrix": without a species it gives its full table, sized by computing it.
   */
  result: "scalar" | "matrix" | "column";
}

const req = (name: string) => ({ name, optional: false });
const opt = (name: string) => ({ name, optional: true });

export const CATALOGUE: readonly CatalogueEntry[] = [
  { id: "PH", fn: AQ.PH, params: [req("names"), req("amounts"), opt("temperature"), opt("activity")], result: "column" },
  {
    id: "ADJUST",
    fn: AQ.ADJUST,
    params: [req("names"), req("amounts"), req("target_pH"), req("titrant"), opt("titrant_conc"), opt("volume"), opt("temperature"), opt("activity"), opt("measured_pH")],
    result: "column",
  },
  { id: "BETA", fn: AQ.BETA, params: [req("names"), req("amounts"), opt("temperature"), opt("activity")], result: "column" },
  { id: "CAPACITY", fn: AQ.CAPACITY, params: [req("names"), req("amounts"), req("delta_pH"), opt("temperature"), opt("activity")], result: "column" },
  { id: "SPECIES", fn: AQ.SPECIES, params: [req("names"), req("amounts"), opt("species"), opt("temperature"), opt("activity")], result: "matrix" },
  { id: "CHECK", fn: AQ.CHECK, params: [req("names"), req("amounts"), opt("temperature"), opt("activity")], result: "column" },
  { id: "IONIC", fn: AQ.IONIC, params: [req("names"), req("amounts"), opt("temperature")], result: "column" },
  { id: "OSMOLARITY", fn: AQ.OSMOLARITY, params: [req("names"), req("amounts"), opt("temperature")], result: "column" },
  { id: "PKA", fn: AQ.PKA, params: [req("substance"), opt("step"), opt("temperature"), opt("ionic_strength")], result: "scalar" },
  { id: "MOLARMASS", fn: AQ.MOLARMASS, params: [req("substance")], result: "scalar" },
  {
    id: "RECIPE",
    fn: AQ.RECIPE,
    params: [req("acid_form"), req("base_form"), req("target_pH"), req("total_conc"), req("volume"), opt("temperature"), opt("ionic_strength"), opt("salt"), opt("activity"), opt("other_names"), opt("other_amounts")],
    result: "matrix",
  },
  {
    id: "CURVE",
    fn: AQ.CURVE,
    params: [req("names"), req("amounts"), req("titrant"), req("titrant_conc"), req("volume"), req("max_titrant_volume"), opt("points"), opt("temperature")],
    result: "matrix",
  },
  {
    id: "PHRANGE",
    fn: AQ.PHRANGE,
    params: [req("names"), req("amounts"), req("amount_tolerance"), opt("pKa_uncertainty"), opt("temperature")],
    result: "matrix",
  },
  { id: "CONSTANTS_ID", fn: AQ.CONSTANTS_ID, params: [], result: "scalar" },
];
