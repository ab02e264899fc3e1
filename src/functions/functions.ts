/**
 * The AQ custom functions as Excel sees them. Each is a thin wrapper: it hands its arguments to the
 * implementation in ./aq and turns any failure into the spreadsheet error Excel shows (./errors).
 *
 * The JSDoc blocks are the metadata: custom-functions-metadata turns them into functions.json at build
 * time. The id after @customfunction is stored in users' workbooks: never change one.
 * Excel passes null for an omitted optional argument, so optional parameters are declared `?` and
 * defaults are applied inside (`??`), never as TypeScript default values.
 *
 * The functions that give one value take a whole table too (./rowwise): names as one row, amounts
 * N×k, any later argument one value or an N×1 column → one result per row. They are declared
 * any[][] (a single result is a 1×1 table, which Excel shows as the value) so that a table spills.
 *
 * The same function objects are registered in HyperFormula for headless use (src/cli/hf-plugin.ts).
 */
// First: outside Excel (a plain browser page) the CustomFunctions global is missing, and the
// associate calls the metadata plugin appends to this file would throw without it.
import "./runtime-shim";
import { guard } from "./errors";
import { rowwise } from "./rowwise";
import { adjust } from "./aq/adjust";
import { capacity } from "./aq/capacity";
import { curve } from "./aq/curve";
import { phRange } from "./aq/ph-range";
import { recipe } from "./aq/recipe";
import { beta } from "./aq/beta";
import { check } from "./aq/check";
import { constantsId } from "./aq/constants-id";
import { ionic } from "./aq/ionic";
import { molarMass } from "./aq/molar-mass";
import { osmolarity } from "./aq/osmolarity";
import { osmolality } from "./aq/osmolality";
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
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns pH (activity scale). Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function PH(names: any[][], amounts: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(ph, names, amounts, temperature, activity);
}

/**
 * Titrant needed to bring a mixture to a target pH: mol per litre of mixture, or, given a stock concentration and batch volume, litres of stock (its dilution included).
 * @customfunction ADJUST
 * @helpurl https://localhost:3000/help/adjust.html
 * @param names Substance names of the mixture as it is now.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param target_pH The pH to reach.
 * @param titrant Name of the titrant (NaOH, HCl, or any library substance), optionally with its stock ("1 M HCl") or as a concentrated reagent by mass fraction ("HCl 37 % w/w", "NaOH 50 %"; density tables at 20 °C).
 * @param [titrant_conc] Stock concentration of the titrant, mol/L. With volume, the result is the volume of stock.
 * @param [volume] Batch volume, L (or unit text such as "800 L"). Needs titrant_conc. The volume of stock comes back in this unit ("800 mL" gives mL).
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @param [measured_pH] The pH read on the batch. The gap to the computed pH is taken as an unknown excess of strong acid or base, and the titrant is computed from the batch as measured.
 * @returns mol of titrant per litre of mixture; or the volume of stock for the batch when titrant_conc and volume are given, in the unit volume is written in (L for a number). Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function ADJUST(
  names: any[][],
  amounts: any[][],
  target_pH: any[][],
  titrant: any[][],
  titrant_conc?: any[][],
  volume?: any[][],
  temperature?: any[][],
  activity?: any[][],
  measured_pH?: any[][],
): any[][] {
  return rowwise(adjust, names, amounts, target_pH, titrant, titrant_conc, volume, temperature, activity, measured_pH);
}

/**
 * Buffer value β of a mixture at its own pH: mol/L of strong base per unit rise in pH, for an infinitesimal addition.
 * @customfunction BETA
 * @helpurl https://localhost:3000/help/beta.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns β, mol/(L·pH). Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function BETA(names: any[][], amounts: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(beta, names, amounts, temperature, activity);
}

/**
 * Strong base (delta > 0) or strong acid (delta < 0) that moves the pH of a mixture by delta, without dilution.
 * @customfunction CAPACITY
 * @helpurl https://localhost:3000/help/capacity.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param delta_pH Change in pH: positive for base, negative for acid.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns mol/L of strong base (delta > 0) or strong acid (delta < 0), as a positive number. Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function CAPACITY(names: any[][], amounts: any[][], delta_pH: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(capacity, names, amounts, delta_pH, temperature, activity);
}

/**
 * Speciation of a mixture: one species' concentration, or a table of every species (name, charge, mol/L, fraction of its system).
 * @customfunction SPECIES
 * @helpurl https://localhost:3000/help/species.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [species] A species name (e.g. "HPO4^2-" or "H+"): returns its concentration, mol/L. Omit for the whole table.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns A species' concentration (mol/L), or a table with a header row: species, charge, mol/L, fraction. Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function SPECIES(names: any[][], amounts: any[][], species?: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(speciesTable, names, amounts, species, temperature, activity);
}

/**
 * What to know about a mixture's result, as text: "OK: buffer, I = … mol/L", or "CHECK: …" with every warning (ionic strength beyond the activity model's range, ΔrH° unknown away from 25 °C, buffer overwhelmed by excess strong acid or base).
 * @customfunction CHECK
 * @helpurl https://localhost:3000/help/check.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns One line of text starting with "OK" or "CHECK". Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function CHECK(names: any[][], amounts: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(check, names, amounts, temperature, activity);
}

/**
 * Ionic strength of a mixture from its solved speciation, I = ½ Σ cᵢ zᵢ².
 * @customfunction IONIC
 * @helpurl https://localhost:3000/help/ionic.html
 * @param names Substance names.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model of the speciation: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns Ionic strength, mol/L (given beyond the 1 mol/L limit too). Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function IONIC(names: any[][], amounts: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(ionic, names, amounts, temperature, activity);
}

/**
 * Ideal osmolarity of a mixture: the sum of all dissolved particle concentrations at equilibrium (no osmotic coefficient).
 * @customfunction OSMOLARITY
 * @helpurl https://localhost:3000/help/osmolarity.html
 * @param names Substance names (non-electrolytes such as sucrose count too).
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model of the speciation: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns Ideal osmolarity, osmol/L. Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function OSMOLARITY(names: any[][], amounts: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(osmolarity, names, amounts, temperature, activity);
}

/**
 * Osmolality of a mixture, osmol per kg of water, as an osmometer reads it: molalities from the solution's density, the ions' osmotic coefficient from the activity model, published osmotic coefficients for sugars and polyols.
 * @customfunction OSMOLALITY
 * @helpurl https://localhost:3000/help/osmolality.html
 * @param names Substance names (non-electrolytes such as sucrose count too).
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns Osmolality, osmol/kg of water. Row-wise: names as one row and amounts with one row per mixture give one result per row (a spilled column).
 */
export function OSMOLALITY(names: any[][], amounts: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return rowwise(osmolality, names, amounts, temperature, activity);
}

/**
 * pKa of one dissociation step at a temperature and ionic strength, on the concentration (default), mixed or thermodynamic scale.
 * @customfunction PKA
 * @helpurl https://localhost:3000/help/pka.html
 * @param substance A substance or acid–base system name (e.g. "phosphate", "Tris").
 * @param [step] Dissociation step, 1 for the first proton lost. Default 1 (required for clarity when the system has several).
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [ionic_strength] Ionic strength, mol/L (0–1). Default 0, where all scales agree.
 * @param [scale] "concentration" (default: [H⁺][B]/[A]), "mixed" (a(H⁺)[B]/[A], for Henderson–Hasselbalch with a meter's pH) or "thermodynamic" (activities; independent of ionic strength).
 * @returns pKa on the scale asked for (Davies activity coefficients).
 */
export function PKA(substance: string, step?: number, temperature?: any, ionic_strength?: any, scale?: string): number {
  return guard(() => pka(substance, step, temperature, ionic_strength, scale));
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
 * Recipe for a buffer batch: what to weigh (or measure) of each component to reach a target pH and total concentration.
 * @customfunction RECIPE
 * @helpurl https://localhost:3000/help/recipe.html
 * @param acid_form The acidic form (e.g. "NaH2PO4·H2O", "L-histidine monohydrochloride monohydrate", "Tris HCl", "phosphoric acid 85 %"), or a strong acid titrant ("HCl", "HCl 1 M", "HCl 37 % w/w") with a basic form.
 * @param base_form The basic form (e.g. "Na2HPO4·7H2O", "L-histidine", "Tris", "ammonia 25 %"), or a strong base titrant ("NaOH", "NaOH 1 M", "NaOH 50 % w/w") with an acidic form.
 * @param target_pH The pH to reach.
 * @param total_conc Total buffer concentration (the acid–base system), mol/L or unit text.
 * @param volume Batch volume, L or unit text. Stock volumes come back in this unit ("800 mL" gives mL).
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [ionic_strength] Target ionic strength, mol/L, made up with the salt. Default: no salt added.
 * @param [salt] Salt for the ionic strength. Default "NaCl".
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @param [other_names] Other components of the batch held at fixed amounts (salts, sugars, surfactants, a second buffer), one per cell.
 * @param [other_amounts] Concentration of each other component in the batch, mol/L or unit text; same shape as other_names.
 * @returns A table with a header row: component, mol, grams (solids) or litres (liquid stocks; a concentrated reagent by mass fraction gives both, as supplied); the other components follow the buffer.
 */
export function RECIPE(
  acid_form: string,
  base_form: string,
  target_pH: any,
  total_conc: any,
  volume: any,
  temperature?: any,
  ionic_strength?: any,
  salt?: string,
  activity?: string,
  other_names?: any[][],
  other_amounts?: any[][],
): any[][] {
  return guard(() => recipe(acid_form, base_form, target_pH, total_conc, volume, temperature, ionic_strength, salt, activity, other_names, other_amounts));
}

/**
 * Titration curve of a mixture with a titrant stock, dilution included: a two-column table (titrant volume, pH) ready to chart.
 * @customfunction CURVE
 * @helpurl https://localhost:3000/help/curve.html
 * @param names Substance names of the mixture.
 * @param amounts Concentrations, mol/L (or unit text), same shape as names.
 * @param titrant Name of the titrant (e.g. "NaOH"), or with its stock ("0.1 M NaOH", "HCl 37 % w/w": volumes are then of the reagent as supplied).
 * @param titrant_conc Stock concentration of the titrant, mol/L or unit text; empty ("") when the titrant names its stock.
 * @param volume Starting volume of the mixture, L or unit text. The table's volumes come back in this unit ("50 mL" gives mL).
 * @param max_titrant_volume Largest titrant volume to add, L or unit text.
 * @param [points] Number of points, 2–1000. Default 51.
 * @param [temperature] Temperature, °C (0–100). Default 25.
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns A table with a header row: titrant volume (in the unit of volume), pH (#N/A beyond the 1 mol/L ionic-strength limit), then the marked points (steepest points and stoichiometric equivalence volumes) with their volume and pH.
 */
export function CURVE(
  names: any[][],
  amounts: any[][],
  titrant: string,
  titrant_conc: any,
  volume: any,
  max_titrant_volume: any,
  points?: number,
  temperature?: any,
  activity?: string,
): any[][] {
  return guard(() => curve(names, amounts, titrant, titrant_conc, volume, max_titrant_volume, points, temperature, activity));
}

/**
 * The lowest and highest pH over stated tolerances on the amounts (and optionally on the pKa values): the band to set a specification against.
 * @customfunction PHRANGE
 * @helpurl https://localhost:3000/help/phrange.html
 * @param names Substance names.
 * @param amounts Nominal concentrations, mol/L (or unit text), same shape as names.
 * @param amount_tolerance Relative tolerance on every amount (0.02 for ±2 %), or a range of tolerances of the same shape as names.
 * @param [pKa_uncertainty] ± uncertainty applied to every pKa, pH units. Default 0.
 * @param [temperature] Temperature, °C (0–100), default 25; or a range searched as part of the worst case: two cells (2 and 8 for storage at 2–8 °C) or a tolerance as text ("5 ± 3 °C").
 * @param [activity] Activity model: "davies" (default), "ideal", "debye-huckel" or "pitzer".
 * @returns A table with a header row: low pH, high pH, method (an exhaustive worst case over all corners, or a flagged bounded search beyond 12 varied quantities); beside it the statistical band pH₀ ± k·u (GUM linear propagation, k = 2) with its method.
 */
export function PHRANGE(names: any[][], amounts: any[][], amount_tolerance: any, pKa_uncertainty?: any, temperature?: any, activity?: string): any[][] {
  return guard(() => phRange(names, amounts, amount_tolerance, pKa_uncertainty, temperature, activity));
}

/**
 * A short fingerprint and version of the constants in effect, to print on a release sheet: two sheets showing the same id used the same data.
 * @customfunction CONSTANTS_ID
 * @helpurl https://localhost:3000/help/constants_id.html
 * @returns Fingerprint text, e.g. "PL-1.0.0-3fa9c21b07" (10 hexadecimal digits of a SHA-256 hash).
 */
export function CONSTANTS_ID(): string {
  return guard(() => constantsId());
}
