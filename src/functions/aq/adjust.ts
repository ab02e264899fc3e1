/**
 * AQ.ADJUST: titrant to reach a target pH — mol per litre of mixture, or, with a stock concentration
 * and a batch volume, the volume of stock for the batch (dilution included), in the unit the batch
 * volume was written in ("800 mL" → mL, a number → L). An unreachable target is
 * #N/A with a message saying which way the titrant moves the pH and how far it can go. With
 * measured_pH, the titrant is computed from the batch as measured: the gap between the computed and
 * the measured pH is taken as an unknown excess of strong acid or base (chem/workflows/adjust.ts).
 */
import { adjust as adjustMixture } from "../../chem/workflows";
import { writtenVolumeUnit } from "../../chem";
import { isBlank, plainNumber, quantity, text, type Cell } from "../args";
import { badInput, finite, orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { resolveWithStock } from "./stock-name";
import { chemOptions } from "./options";

export function adjust(
  names: Cell,
  amounts: Cell,
  targetPH: Cell,
  titrant: Cell,
  titrantConc: Cell,
  volume: Cell,
  temperature: Cell,
  activity: Cell,
  measuredPH?: Cell,
): number {
  const { mixture } = readMixtureArgs(names, amounts);
  const target = plainNumber(targetPH, "target_pH");
  // one reader for titrants with their stock in the name ("1 M HCl", "HCl 1 M"), shared with AQ.RECIPE
  const titrantName = text(titrant, "titrant");
  const named = resolveWithStock(titrantName, "titrant");
  const component = named.component;
  if (named.stockConc !== undefined) {
    if (!isBlank(titrantConc)) throw badInput(`the titrant '${titrantName}' already names its stock concentration: leave titrant_conc blank, or name the titrant without one`);
    if (isBlank(volume)) throw badInput(`the titrant '${titrantName}' names a stock: give the batch volume too (the result is then litres of stock), or name the titrant without a concentration for mol per litre`);
  }
  const options = { ...chemOptions(temperature, activity), ...(isBlank(measuredPH) ? {} : { measuredPH: plainNumber(measuredPH, "measured_pH") }) };
  if (named.stockConc === undefined && isBlank(titrantConc) && isBlank(volume)) {
    return finite(orThrow(adjustMixture(mixture, component, target, options)).value, "titrant amount");
  }
  if (named.stockConc === undefined && isBlank(titrantConc)) throw badInput("volume needs titrant_conc: give the stock concentration too, or leave both out for mol per litre");
  if (isBlank(volume)) throw badInput("titrant_conc needs volume: give the batch volume too (the result is then litres of stock), or leave both out for mol per litre");
  const conc = named.stockConc ?? quantity(titrantConc, "titrant_conc", "concentration", { molarMass: component.molarMass });
  const litres = quantity(volume, "volume", "volume");
  const stock = { conc, volume: litres };
  // in the unit the batch volume was written in ("800 mL" → mL; a number → L): chem/units.ts
  const unit = writtenVolumeUnit(volume);
  return finite(orThrow(adjustMixture(mixture, component, target, { ...options, stock })).value / unit.litres, `${unit.symbol} of stock`);
}
