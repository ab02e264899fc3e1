/**
 * AQ.PKA: apparent (concentration) pKa of one step at a temperature and ionic strength, with the
 * Davies model — the constant that, with [H⁺] as a concentration, gives the species ratio.
 */
import { apparentPKa, DEFAULTS } from "../../chem";
import { isBlank, plainNumber, quantity, temperature as readTemperature, text, type Cell } from "../args";
import { badInput, finite, orThrow } from "../errors";
import { resolveSystem } from "../substances";

export function pka(substance: Cell, step: Cell, temperature: Cell, ionicStrength: Cell): number {
  const system = resolveSystem(text(substance, "substance"));
  const n = system.steps.length;
  if (isBlank(step) && n > 1) {
    throw badInput(`${system.name} has ${n} dissociation steps: give step 1 to ${n}`);
  }
  const k = plainNumber(step, "step", 1);
  if (!Number.isInteger(k) || k < 1 || k > n) throw badInput(`step ${k} does not exist: ${system.name} has ${n === 1 ? "1 step" : `steps 1 to ${n}`}`);
  const t = readTemperature(temperature);
  const I = quantity(ionicStrength, "ionic strength", "concentration", { fallback: 0 });
  if (I < 0) throw badInput(`ionic strength must be ≥ 0 mol/L, got ${I}`);
  // The activity models give meaningless (even astronomically large) corrections far beyond their
  // range; above the engine's concentration limit no mixture it solves could have this ionic strength.
  if (I > DEFAULTS.maxConcentration) {
    throw badInput(`ionic strength ${I} mol/L is above ${DEFAULTS.maxConcentration} mol/L, far beyond the range of the activity models`);
  }
  return finite(orThrow(apparentPKa(system, k - 1, t, I, DEFAULTS.activity)).value, "pKa");
}
