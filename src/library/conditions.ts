/**
 * Structured conditions of a pKa: a value measured at a temperature and ionic strength other than
 * 25 °C and I = 0 (`ValueRecord.measured`), converted to the 25 °C, I = 0 value the engine stores,
 * with the engine's own models and nothing else:
 *
 *   measured = apparentPKa(system with pKa25 = p, step k, T, I, Davies, scale)
 *            = p + c(T, I),  c = the temperature term (van 't Hoff with the step's ΔrH° and, when
 *              given, ΔrCp°) + the activity term (2·A(T)·f(I)·(zA − 1), plus A(T)·f(I) on the mixed
 *              scale; zA = topCharge − k, the charge of the step's acid form).
 *
 * c does not depend on p, so p = measured − c, and feeding p back through apparentPKa (AQ.PKA) at
 * the measured conditions gives the measured value again (to rounding). The activity model is the
 * engine's default (Davies): the medium (KCl, NaCl) is recorded but the model does not tell media
 * apart. A temperature away from 25 °C needs the step's ΔrH°: without it there is no conversion.
 */
import { apparentPKa } from "../chem/derived";
import { DEFAULTS } from "../chem/defaults";
import { LN10, R, THETA_K, ZERO_CELSIUS_K } from "../chem/physical-constants";
import { thermodynamicPKa } from "../chem/temperature";
import type { MeasuredPKa, StepRecord } from "./types";

/** °C within which a temperature counts as 25 °C (needs no ΔrH°). */
export const AT_25C_WITHIN = 1e-9;

export type PKaConversion =
  | {
      ok: true;
      /** pKa at 25 °C, I = 0. */
      value: number;
      /** The temperature term (measured − converted, from T alone) and the activity term. */
      temperatureTerm: number;
      activityTerm: number;
      /** How it was converted, in words. */
      method: string;
      /** Why the converted value is less certain than the measured one, in words. */
      uncertainty: string;
    }
  | { ok: false; message: string };

const r3 = (x: number): string => (Math.abs(x) < 5e-4 ? "0.000" : `${x > 0 ? "+" : "−"}${Math.abs(x).toFixed(3)}`);
const num = (x: number): string => String(+x.toFixed(4));

/** "37 °C, I = 0.15 mol/L (KCl), concentration scale". */
export function measuredConditionsText(m: MeasuredPKa): string {
  const medium = m.medium ? ` (${m.medium})` : "";
  const scale = m.ionicStrength > 0 ? `, ${m.scale ?? "concentration"} scale` : "";
  return `${num(m.temperature)} °C, I = ${num(m.ionicStrength)} mol/L${medium}${scale}`;
}

/**
 * The 25 °C, I = 0 pKa of step `stepIndex` (0-based) of a system whose fully protonated form has
 * charge `topCharge`, from a value measured at other conditions, with the step's ΔrH°/ΔrCp°.
 */
export function convertPKa(m: MeasuredPKa, step: Pick<StepRecord, "dH" | "dCp">, topCharge: number, stepIndex: number): PKaConversion {
  if (!Number.isFinite(m.value)) return { ok: false, message: "the measured pKa is not a number" };
  const away = Math.abs(m.temperature - DEFAULTS.temperatureC) > AT_25C_WITHIN;
  if (away && step.dH === undefined) {
    return {
      ok: false,
      message: `measured at ${num(m.temperature)} °C, but the step has no ΔrH°: without it the value cannot be converted to 25 °C — give ΔrH° (and ΔrCp° if known) for this step, or enter a value measured at 25 °C`,
    };
  }
  const dH = step.dH?.value ?? 0;
  const dCp = step.dCp?.value ?? 0;
  const zero = { id: "conversion", name: "conversion", topCharge, steps: [] as { pKa: number; dH?: number; dCp?: number }[] };
  for (let k = 0; k <= stepIndex; k++) zero.steps.push({ pKa: 0, dH, dCp });
  const scale = m.scale ?? "concentration";
  const total = apparentPKa(zero, stepIndex, m.temperature, m.ionicStrength, DEFAULTS.activity, scale);
  if (!total.ok) return { ok: false, message: total.message.replace(/\.$/, "") };
  const thermo = thermodynamicPKa({ pKa: 0, dH, dCp }, m.temperature);
  if (!thermo.ok) return { ok: false, message: thermo.message.replace(/\.$/, "") };
  const temperatureTerm = thermo.value;
  const activityTerm = total.value - thermo.value;
  const value = m.value - total.value;
  const zA = topCharge - stepIndex;
  const parts: string[] = [];
  if (away) parts.push(`van 't Hoff with ΔrH° ${num(dH)} kJ/mol${step.dCp ? ` and ΔrCp° ${num(dCp)} J/(K·mol)` : ""} (${r3(-temperatureTerm)})`);
  if (m.ionicStrength > 0) parts.push(`Davies activity coefficients for the pair of charges ${signed(zA)}/${signed(zA - 1)} on the ${scale} scale (${r3(-activityTerm)})`);
  const method = parts.length ? `converted from ${num(m.value)} at ${measuredConditionsText(m)} to 25 °C, I = 0: ${parts.join("; ")}` : "measured at 25 °C, I = 0: nothing to convert";
  const why: string[] = [];
  if (away) {
    const T = m.temperature + ZERO_CELSIUS_K;
    const perKJ = Math.abs((1000 / (R * LN10)) * (1 / T - 1 / THETA_K));
    why.push(`the temperature term is only as good as ΔrH°: 1 kJ/mol more or less in ΔrH° moves the converted value by ${perKJ.toFixed(3)}${step.dCp ? "" : "; ΔrCp° is taken as 0 where none is given"}`);
  }
  if (m.ionicStrength > 0) why.push(`the activity term is the Davies model's estimate, which does not tell media apart${m.medium ? ` (the ${m.medium} medium is recorded only)` : ""} and loses accuracy above I ≈ 0.1–0.3 mol/L`);
  const uncertainty = why.length ? `The conversion adds uncertainty: ${why.join("; ")}.` : "";
  return { ok: true, value, temperatureTerm, activityTerm, method, uncertainty };
}

const signed = (z: number): string => (z === 0 ? "0" : z > 0 ? `+${z}` : `−${-z}`);
