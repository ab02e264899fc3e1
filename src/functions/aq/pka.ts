/**
 * AQ.PKA: pKa of one step at a temperature and ionic strength, with Davies activity coefficients,
 * on the scale asked for (chem/derived.ts apparentPKa states each definition):
 * - "concentration" (default): [H⁺][B]/[A], the constant AQ.SPECIES's concentrations obey. The
 *   default because it is what AQ.PKA gave before the argument existed, so a released sheet keeps
 *   its numbers.
 * - "mixed": a(H⁺)[B]/[A], the pKa′ for Henderson–Hasselbalch with a meter's pH.
 * - "thermodynamic": activities throughout, independent of the ionic strength.
 * An ionic strength beyond the engine's limit is #N/A, as for every pH-derived number.
 */
import { apparentPKa, DEFAULTS, PKA_SCALES, type PKaScale } from "../../chem";
import { isBlank, plainNumber, quantity, temperature as readTemperature, text, type Cell } from "../args";
import { badInput, finite, orThrow } from "../errors";
import { resolveSystem } from "../substances";

function scaleOf(value: Cell): PKaScale {
  if (isBlank(value)) return "concentration";
  const s = text(value, "scale").toLowerCase();
  const found = PKA_SCALES.find((x) => x === s);
  if (found === undefined) throw badInput(`scale '${s}' is not known: use ${PKA_SCALES.map((x) => `"${x}"`).join(", ")}`);
  return found;
}

export function pka(substance: Cell, step: Cell, temperature: Cell, ionicStrength: Cell, scale: Cell): number {
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
  return finite(orThrow(apparentPKa(system, k - 1, t, I, DEFAULTS.activity, scaleOf(scale))).value, "pKa");
}
