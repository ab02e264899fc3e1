/**
 * functions.json is generated from the JSDoc in src/functions/functions.ts. The bare CLI of
 * custom-functions-metadata exits 0 even when it finds errors, so the Node API is called here and
 * its error list must be empty; the ids, parameters and result shapes must match what HyperFormula
 * is given (src/functions/catalogue.ts), so Excel and the headless engine see the same functions.
 */
import { join } from "node:path";
import { generateCustomFunctionsMetadata } from "custom-functions-metadata";
import { CATALOGUE } from "../../src/functions/catalogue";

interface Param { name: string; type?: string; dimensionality?: string; optional?: boolean; description?: string }
interface Fn { id: string; name: string; description?: string; helpUrl?: string; parameters: Param[]; result: { dimensionality?: string; type?: string } }

const EXPECTED_IDS = [
  "PH", "ADJUST", "BETA", "CAPACITY", "SPECIES", "IONIC", "OSMOLARITY", "PKA", "MOLARMASS", "RECIPE", "CURVE", "PHRANGE", "CONSTANTS_ID", "CHECK", "OSMOLALITY",
];

let functions: Fn[] = [];
let errors: string[] = [];

beforeAll(async () => {
  const result = await generateCustomFunctionsMetadata([join(__dirname, "..", "..", "src", "functions", "functions.ts")]);
  errors = result.errors;
  functions = (JSON.parse(result.metadataJson) as { functions: Fn[] }).functions ?? [];
});

describe("custom functions metadata", () => {
  test("generates without errors", () => {
    expect(errors).toEqual([]);
  });

  test("declares exactly the AQ catalogue", () => {
    expect(functions.map((f) => f.id).sort()).toEqual([...EXPECTED_IDS].sort());
    expect(CATALOGUE.map((c) => c.id).sort()).toEqual([...EXPECTED_IDS].sort());
  });

  test.each(EXPECTED_IDS)("%s has a description, a help page and described parameters", (id) => {
    const fn = functions.find((f) => f.id === id) as Fn;
    expect(fn.description?.length ?? 0).toBeGreaterThan(30);
    expect(fn.helpUrl).toBe(`https://localhost:3000/help/${id.toLowerCase()}.html`);
    for (const p of fn.parameters) expect(p.description?.length ?? 0).toBeGreaterThan(5);
  });

  test.each(EXPECTED_IDS)("%s has the same parameters and result shape in Excel and in the headless engine", (id) => {
    const fn = functions.find((f) => f.id === id) as Fn;
    const entry = CATALOGUE.find((c) => c.id === id)!;
    expect(fn.parameters.map((p) => ({ name: p.name, optional: p.optional === true }))).toEqual(entry.params);
    expect(fn.result.dimensionality === "matrix" ? "matrix" : "scalar").toBe(entry.result === "column" ? "matrix" : entry.result);
    expect(entry.fn.length).toBe(entry.params.length);
  });

  test("names/amounts parameters are ranges (matrices) wherever they appear", () => {
    for (const fn of functions) {
      for (const p of fn.parameters.filter((q) => q.name === "names" || q.name === "amounts")) {
        expect({ fn: fn.id, p: p.name, dim: p.dimensionality }).toEqual({ fn: fn.id, p: p.name, dim: "matrix" });
      }
    }
  });
});
