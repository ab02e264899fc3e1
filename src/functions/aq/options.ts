/** The temperature and activity arguments shared by most AQ functions, read once. */
import type { ChemOptions } from "../../chem/types";
import { activity, temperature, type Cell } from "../args";

/** The last pair of plain values read (a row-wise table reads the same pair on every row). */
let last: { temperatureArg: Cell; activityArg: Cell; temperatureC: number; activity: Required<ChemOptions>["activity"] } | null = null;

const plain = (v: Cell): boolean => v === null || v === undefined || typeof v === "number" || typeof v === "string" || typeof v === "boolean";

export function chemOptions(temperatureArg: Cell, activityArg?: Cell): Required<ChemOptions> {
  if (last !== null && Object.is(last.temperatureArg, temperatureArg) && Object.is(last.activityArg, activityArg)) {
    return { temperatureC: last.temperatureC, activity: last.activity }; // a fresh object: callers may spread or change it
  }
  const options = { temperatureC: temperature(temperatureArg), activity: activity(activityArg) };
  if (plain(temperatureArg) && plain(activityArg)) last = { temperatureArg, activityArg, ...options };
  return options;
}
