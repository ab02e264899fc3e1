/**
 * The AQ custom functions as Excel sees them. Each is a thin wrapper: it hands its arguments to the
 * implementation in ./aq and turns any failure into the spreadsheet error Excel shows (./errors).
 *
 * The JSDoc blocks are the metadata: custom-functions-metadata turns them into functions.json at build
 * time. The id after @customfunction is stored in users' workbooks: never change one.
 * Excel passes null for an omitted optional argument, so optional parameters are declared `?` and
 * defaults are applied inside (`??`), never as TypeScript default values.
 *
 * The same function objects are registered in HyperFormula for headless use (src/cli/hf-plugin.ts).
 */
// First: outside Excel (a plain browser page) the CustomFunctions global is missing, and the
// associate calls the metadata plugin appends to this file would throw without it.
import "./runtime-shim";
import { guard } from "./errors";
import { beta } from "./aq/beta";
import { constantsId } from "./aq/constants-id";
import { ionic } from "./aq/ionic";
import { molarMass } from "./aq/molar-mass";
import { osmolarity } from "./aq/osmolarity";
import { ph } from "./aq/ph";
import { pka } from "./aq/pka";
import { species as speciesTable } from "./aq/species";

/**
 * pH of a mixture: the exact charge balance solved with activity and temperature corrections, reported as −log10 a(H⁺) (what a calibrated meter reads).
 * @customfunction PH
 * @helpurl https://localhost:3000/help/ph.html
 * @param names Substance names (any alias in the constants library), one per cell; blank cells are ignored.
 * @param amounts Concentration of each substance in the final solution, mol/L, or text with a unit such as "25 mM" or "2.1 g/L"; same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal" or "debye-huckel".
 * @returns pH (activity scale).
 */
export function PH(names: any[][], amounts: any[][], temperature?: any, activity?: string): number {
  return guard(() => ph(names, amounts, temperature, activity));
}

/**
 * Buffer value β of a mixture at its own pH: mol/L of strong base per unit rise in pH, for an infinitesimal addition.
 * @customfunction BETA
 * @helpurl https://localhost:3000/help/beta.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal" or "debye-huckel".
 * @returns β, mol/(L·pH).
 */
export function BETA(names: any[][], amounts: any[][], temperature?: any, activity?: string): number {
  return guard(() => beta(names, amounts, temperature, activity));
}

/**
 * Speciation of a mixture: one species' concentration, or a table of every species (name, charge, mol/L, fraction of its system).
 * @customfunction SPECIES
 * @helpurl https://localhost:3000/help/species.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [species] A species name (e.g. "HPO4^2-" or "H+"): returns its concentration, mol/L. Omit for the whole table.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal" or "debye-huckel".
 * @returns A species' concentration (mol/L), or a table with a header row: species, charge, mol/L, fraction.
 */
export function SPECIES(names: any[][], amounts: any[][], species?: string, temperature?: any, activity?: string): any[][] {
  return guard(() => speciesTable(names, amounts, species, temperature, activity));
}

/**
 * Ionic strength of a mixture from its solved speciation, I = ½ Σ cᵢ zᵢ².
 * @customfunction IONIC
 * @helpurl https://localhost:3000/help/ionic.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @returns Ionic strength, mol/L.
 */
export function IONIC(names: any[][], amounts: any[][], temperature?: any): number {
  return guard(() => ionic(names, amounts, temperature));
}

/**
 * Ideal osmolarity of a mixture: the sum of all dissolved particle concentrations at equilibrium (no osmotic coefficient).
 * @customfunction OSMOLARITY
 * @helpurl https://localhost:3000/help/osmolarity.html
 * @param names Substance names (non-electrolytes such as sucrose count too).
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @returns Ideal osmolarity, osmol/L.
 */
export function OSMOLARITY(names: any[][], amounts: any[][], temperature?: any): number {
  return guard(() => osmolarity(names, amounts, temperature));
}

/**
 * Apparent (concentration) pKa of one dissociation step at a temperature and ionic strength.
 * @customfunction PKA
 * @helpurl https://localhost:3000/help/pka.html
 * @param substance A substance or acid–base system name (e.g. "phosphate", "Tris").
 * @param [step] Dissociation step, 1 for the first proton lost. Default 1 (required for clarity when the system has several).
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [ionic_strength] Ionic strength, mol/L. Default 0 (thermodynamic pKa).
 * @returns pKa on the concentration scale for the H⁺ activity convention of AQ.PH.
 */
export function PKA(substance: string, step?: number, temperature?: any, ionic_strength?: any): number {
  return guard(() => pka(substance, step, temperature, ionic_strength));
}

/**
 * Molar mass of the form named, hydrate water included, from CIAAW standard atomic weights.
 * @customfunction MOLARMASS
 * @helpurl https://localhost:3000/help/molarmass.html
 * @param substance Substance name (e.g. "Na2HPO4·7H2O").
 * @returns g/mol.
 */
export function MOLARMASS(substance: string): number {
  return guard(() => molarMass(substance));
}

/**
 * A short fingerprint and version of the constants in effect, to print on a release sheet: two sheets showing the same id used the same data.
 * @customfunction CONSTANTS_ID
 * @helpurl https://localhost:3000/help/constants_id.html
 * @returns Fingerprint text, e.g. "PL-1.0.0-3fa9c21b".
 */
export function CONSTANTS_ID(): string {
  return guard(() => constantsId());
}
