/**
 * AQ.RECIPE: what to weigh for a buffer batch, as a table with a header row:
 *   component | mol | grams | litres of stock   ("mL of stock" when the batch volume is written in mL)
 * grams = molar mass × mol (hydrate water included) for a solid; for a component named with a
 * stock concentration ("HCl 1 M", "1 M NaOH") the litres of that stock instead; for a concentrated
 * reagent by mass fraction ("HCl 37 % w/w", "glacial acetic acid") the litres and the grams of the
 * reagent as supplied, the row naming its mass fraction, molarity and density. Make up to the batch
 * volume with water. The forms are a conjugate pair of one system (x + y = total_conc solved for the
 * pH), or one form and a strong titrant (the titrant from the adjust workflow); with ionic_strength
 * the salt (default NaCl) is added so that the solved ionic strength equals it. other_names and
 * other_amounts (read like names and amounts) are the rest of the batch, held at their amounts while
 * the recipe is solved and listed after the buffer (and salt) rows.
 */
import type { Mixture } from "../../chem/types";
import { writtenVolumeUnit } from "../../chem";
import { recipe as recipeOf, strongCharge, type RecipeLine, type RecipeRequest } from "../../chem/workflows";
import { isBlank, plainNumber, quantity, text, type Cell } from "../args";
import { AqError, badInput, finite, orThrow } from "../errors";
import { readEntries } from "../mixture";
import { resolveComponent } from "../substances";
import { chemOptions } from "./options";
import { reagentLabel, resolveWithStock, type NamedStock } from "./stock-name";

export const RECIPE_HEADER = ["component", "mol", "grams", "litres of stock"];

export function recipe(
  acidForm: Cell,
  baseForm: Cell,
  targetPH: Cell,
  totalConc: Cell,
  volume: Cell,
  temperature: Cell,
  ionicStrength: Cell,
  salt: Cell,
  activity: Cell,
  otherNames?: Cell,
  otherAmounts?: Cell,
): unknown[][] {
  const acid = resolveWithStock(text(acidForm, "acid_form"), "acid_form");
  const base = resolveWithStock(text(baseForm, "base_form"), "base_form");
  if (acid.component.id === base.component.id) throw badInput(`acid_form and base_form are the same substance ('${acid.component.name}'): give two forms, or a form and a titrant`);
  const stocks: Record<string, number> = {};
  const stockGramsPerMol: Record<string, number> = {};
  const labels = new Map<string, string>();
  for (const named of [acid, base] as NamedStock[]) {
    if (named.stockConc !== undefined) stocks[named.component.id] = named.stockConc;
    if (named.reagent) {
      stockGramsPerMol[named.component.id] = named.reagent.gramsPerMol;
      labels.set(named.component.id, reagentLabel(named.component, named.reagent));
    }
  }
  const req: RecipeRequest = {
    acidForm: acid.component,
    baseForm: base.component,
    targetPH: plainNumber(targetPH, "target_pH"),
    totalConc: quantity(totalConc, "total_conc", "concentration"),
    volume: quantity(volume, "volume", "volume"),
    stocks,
    stockGramsPerMol,
  };
  const background = readBackground(otherNames, otherAmounts);
  if (background.length > 0) req.background = background;
  if (!isBlank(ionicStrength)) {
    req.ionicStrength = quantity(ionicStrength, "ionic_strength", "concentration");
    req.salt = resolveComponent(isBlank(salt) ? "NaCl" : text(salt, "salt"));
  } else if (!isBlank(salt)) {
    throw badInput("salt is used only with ionic_strength: give the target ionic strength too");
  }
  const r = orThrow(recipeOf(req, chemOptions(temperature, activity)));
  // stock volumes in the unit the batch volume was written in ("800 mL" → "mL of stock"): chem/units.ts
  const unit = writtenVolumeUnit(volume);
  const rows: unknown[][] = [unit.litres === 1 && unit.symbol === "L" ? RECIPE_HEADER : [...RECIPE_HEADER.slice(0, 3), `${unit.symbol} of stock`]];
  for (const line of r.lines) {
    rows.push([
      labels.get(line.component.id) ?? rowName(line),
      finite(line.mol, "mol"),
      line.grams === undefined ? "" : finite(line.grams, "grams"),
      line.litres === undefined ? "" : finite(line.litres / unit.litres, `${unit.symbol} of stock`),
    ]);
  }
  return rows;
}

/**
 * A strong acid or base weighed in grams (named without a stock: "HCl", "NaOH") is listed as pure
 * substance — the grams are of HCl or NaOH itself, not of a reagent as supplied — and its row says
 * so, so that nobody weighs 37 % acid for them.
 */
export const PURE_SUBSTANCE = "as 100 %";

function rowName(line: RecipeLine): string {
  const pure = line.grams !== undefined && line.litres === undefined && strongCharge(line.component) !== null;
  return pure ? `${line.name}, ${PURE_SUBSTANCE}` : line.name;
}

/** other_names / other_amounts: both or neither; a range of blank cells is no background. */
function readBackground(otherNames: Cell, otherAmounts: Cell): Mixture {
  if (isBlank(otherNames) && isBlank(otherAmounts)) return [];
  if (isBlank(otherNames)) throw badInput("other_amounts needs other_names: give the names of the other components beside their amounts");
  if (isBlank(otherAmounts)) throw badInput("other_names needs other_amounts: give the amount of each other component");
  try {
    return readEntries(otherNames, otherAmounts);
  } catch (error) {
    if (!(error instanceof AqError)) throw error;
    if (/mixture is empty/.test(error.message)) return [];
    throw new AqError(error.kind, `other components: ${error.message.replace(/^names is/, "other_names is").replace(/but amounts is/, "but other_amounts is")}`);
  }
}
