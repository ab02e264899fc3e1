/**
 * Bases entered by their pKb: the library stores every system through the pKa of the conjugate
 * acid, so pKa = pKw − pKb with pKw at 25 °C (13.995, CRC Handbook table "Ionization constant of
 * normal and heavy water", after Marshall & Franck 1981; data/water.json).
 */
import water from "./data/water.json";
import type { ValueRecord } from "./types";

export const PKW_25C: Readonly<ValueRecord> = Object.freeze(water.pKw25 as ValueRecord);

export type PkbResult = { ok: true; pKa: number; note: string } | { ok: false; code: "bad-input"; message: string };

/** pKa of the conjugate acid from a pKb at 25 °C; `note` records the conversion for the value's record. */
export function pKbToPKa(pKb: number, pKw: number = PKW_25C.value): PkbResult {
  if (typeof pKb !== "number" || !Number.isFinite(pKb)) return { ok: false, code: "bad-input", message: "pKb must be a finite number" };
  if (typeof pKw !== "number" || !Number.isFinite(pKw)) return { ok: false, code: "bad-input", message: "pKw must be a finite number" };
  const pKa = Math.round((pKw - pKb) * 1e9) / 1e9;
  const how = pKw === PKW_25C.value ? `pKw ${pKw} at 25 °C (CRC Handbook, after Marshall & Franck 1981)` : `pKw ${pKw}`;
  return { ok: true, pKa, note: `converted from pKb ${pKb} with ${how}` };
}
