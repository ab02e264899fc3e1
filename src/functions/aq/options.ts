/** The temperature and activity arguments shared by most AQ functions, read once. */
import type { ChemOptions } from "../../chem/types";
import { activity, temperature, type Cell } from "../args";

export function chemOptions(temperatureArg: Cell, activityArg?: Cell): Required<ChemOptions> {
  return { temperatureC: temperature(temperatureArg), activity: activity(activityArg) };
}
