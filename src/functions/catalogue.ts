/**
 * The AQ functions for hosts other than Excel (HyperFormula in src/cli): the same function objects,
 * with the parameter list and result shape that Excel reads from the JSDoc metadata. The list itself
 * is generated from that JSDoc (catalogue-signatures.ts, by scripts/make-catalogue.mjs), so the
 * function list has one source; this file only joins each signature to its function object and says
 * which table results are row-wise columns.
 */
import * as AQ from "./functions";
import { SIGNATURES } from "./catalogue-signatures";

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

/**
 * Functions that give one value per row of a row-wise table (./rowwise): the headless engine sizes
 * their result from the arguments' shapes. Every other table result is sized by computing it.
 */
const ROW_WISE: ReadonlySet<string> = new Set(["PH", "ADJUST", "BETA", "CAPACITY", "CHECK", "IONIC", "OSMOLARITY", "OSMOLALITY"]);

const functionsByName = AQ as unknown as Record<string, ((...args: any[]) => unknown) | undefined>;

export const CATALOGUE: readonly CatalogueEntry[] = SIGNATURES.map((s) => {
  const fn = functionsByName[s.functionName];
  if (typeof fn !== "function") throw new Error(`catalogue: functions.ts exports no function ${s.functionName} for AQ.${s.id}; run \`npm run catalogue\`.`);
  const result = !s.table ? "scalar" : ROW_WISE.has(s.id) ? "column" : "matrix";
  return { id: s.id, fn, params: s.params.map((p) => ({ name: p.name, optional: p.optional })), result };
});
