/**
 * The AQ functions as tests call them for one mixture: the functions that give one value return it
 * as a 1×1 table (declared any[][] so that a row-wise table can spill in Excel); this view unwraps
 * a 1×1 result to its value, and passes everything else through unchanged. Row-wise tables are
 * tested on the functions themselves (test/functions/rowwise*.test.ts).
 */
import * as Functions from "../../src/functions/functions";

type Loose = (...args: any[]) => any;

function unwrapped(fn: Loose): Loose {
  return (...args: any[]) => {
    const result = fn(...args);
    return Array.isArray(result) && result.length === 1 && Array.isArray(result[0]) && result[0].length === 1 ? result[0][0] : result;
  };
}

const ONE_VALUE = ["PH", "ADJUST", "BETA", "CAPACITY", "CHECK", "IONIC", "OSMOLARITY", "OSMOLALITY"];

export const AQ: Record<keyof typeof Functions, Loose> = Object.fromEntries(
  Object.entries(Functions).map(([id, fn]) => [id, ONE_VALUE.includes(id) ? unwrapped(fn as Loose) : (fn as Loose)]),
) as Record<keyof typeof Functions, Loose>;
