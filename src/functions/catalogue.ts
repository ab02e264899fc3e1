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
  result: "scalar" | "matrix";
}

const req = (name: string) => ({ name, optional: false });
const opt = (name: string) => ({ name, optional: true });

export const CATALOGUE: readonly CatalogueEntry[] = [
  { id: "PH", fn: AQ.PH, params: [req("names"), req("amounts"), opt("temperature"), opt("activity")], result: "scalar" },
  { id: "BETA", fn: AQ.BETA, params: [req("names"), req("amounts"), opt("temperature"), opt("activity")], result: "scalar" },
  { id: "SPECIES", fn: AQ.SPECIES, params: [req("names"), req("amounts"), opt("species"), opt("temperature"), opt("activity")], result: "matrix" },
  { id: "IONIC", fn: AQ.IONIC, params: [req("names"), req("amounts"), opt("temperature")], result: "scalar" },
  { id: "OSMOLARITY", fn: AQ.OSMOLARITY, params: [req("names"), req("amounts"), opt("temperature")], result: "scalar" },
  { id: "PKA", fn: AQ.PKA, params: [req("substance"), opt("step"), opt("temperature"), opt("ionic_strength")], result: "scalar" },
  { id: "MOLARMASS", fn: AQ.MOLARMASS, params: [req("substance")], result: "scalar" },
  { id: "CONSTANTS_ID", fn: AQ.CONSTANTS_ID, params: [], result: "scalar" },
];
