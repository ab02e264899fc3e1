/**
 * The pH band over a temperature range as well (a product stored at 2–8 °C): the worst case of the
 * tolerance box (ph-range.ts) at every temperature of an even grid over [t₁, t₂] (both ends and a
 * point at least every 1 K, at most 11 points), lowest low and highest high. pH(T) of a buffer is
 * smooth and, over a storage range, monotone in practice, so the ends decide; the interior points
 * guard against a turning point between them (a finer one is the stated limit).
 *
 * The statistical band (GUM, as in ph-range.ts) is taken at the middle temperature, with the
 * temperature as one more rectangular quantity over the range: its sensitivity is the slope of the
 * nominal pH between the two ends, u(T)-term² = (∂pH/∂T · (t₂ − t₁)/2)² (the /3 of the rectangle is
 * applied with the others).
 */
import { fail } from "../failure";
import type { Mixture, Result } from "../types";
import { checkTemperature } from "../validate-options";
import { phRange, statisticalBand, type PHRangeOptions, type PHRangeValue } from "./ph-range";

export interface PHRangeOverTemperatureValue extends PHRangeValue {
  temperatureRange: [number, number];
  /** Temperatures (°C) at which the low and the high were found. */
  lowAtTemperature: number;
  highAtTemperature: number;
  /** Temperatures searched. */
  temperatures: number[];
}

/** Most temperatures searched. */
export const PHRANGE_MAX_TEMPERATURES = 11;

function grid(t1: number, t2: number): number[] {
  const n = Math.min(PHRANGE_MAX_TEMPERATURES, Math.max(2, Math.ceil(t2 - t1) + 1));
  return Array.from({ length: n }, (_, i) => (i === n - 1 ? t2 : t1 + ((t2 - t1) * i) / (n - 1)));
}

/** Worst-case band over the tolerance box and a temperature range, with the GUM band at the middle. */
export function phRangeOverTemperature(
  mix: Mixture,
  tolerances: number | readonly number[],
  range: readonly [number, number],
  opts: Omit<PHRangeOptions, "temperatureC"> = {},
): Result<PHRangeOverTemperatureValue> {
  const [a, b] = [Math.min(range[0], range[1]), Math.max(range[0], range[1])];
  const bad = checkTemperature(a) ?? checkTemperature(b);
  if (bad) return bad;
  if (!Number.isFinite(a) || !Number.isFinite(b)) return fail("bad-input", "The temperature range needs two finite temperatures, °C.");
  const temperatures = grid(a, b);
  let worst: { low: PHRangeValue; lowT: number; high: PHRangeValue; highT: number } | undefined;
  const nominalAt = new Map<number, number>();
  for (const t of temperatures) {
    const r = phRange(mix, tolerances, { ...opts, temperatureC: t });
    if (!r.ok) return r;
    nominalAt.set(t, r.nominal);
    if (worst === undefined) worst = { low: r, lowT: t, high: r, highT: t };
    else {
      if (r.low < worst.low.low) worst = { ...worst, low: r, lowT: t };
      if (r.high > worst.high.high) worst = { ...worst, high: r, highT: t };
    }
  }
  if (worst === undefined) return fail("bad-input", "No temperature to search.");
  const mid = (a + b) / 2;
  const atMid = phRange(mix, tolerances, { ...opts, temperatureC: mid });
  if (!atMid.ok) return atMid;
  const slope = b > a ? ((nominalAt.get(b) as number) - (nominalAt.get(a) as number)) / (b - a) : 0;
  const tHalf = (b - a) / 2;
  // Recover Σ(d·half)² of the box from its band (u² = Σ/3), then add the temperature's term.
  const boxSumSq = 3 * atMid.statistical.u * atMid.statistical.u;
  const statistical = statisticalBand(atMid.nominal, boxSumSq + (slope * tHalf) ** 2);
  return {
    ...atMid,
    low: worst.low.low,
    high: worst.high.high,
    lowAt: worst.low.lowAt,
    highAt: worst.high.highAt,
    exhaustive: worst.low.exhaustive && worst.high.exhaustive,
    method: worst.low.method === "local-search" || worst.high.method === "local-search" ? "local-search" : atMid.method,
    statistical,
    temperatureRange: [a, b],
    lowAtTemperature: worst.lowT,
    highAtTemperature: worst.highT,
    temperatures,
  };
}
