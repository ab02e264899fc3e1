/**
 * Concentrated reagents as supplied: a solution sold by mass fraction ("hydrochloric acid 37 %",
 * "sodium hydroxide 50 % w/w", "glacial acetic acid") and measured by volume or weighed.
 *
 * Formula, for a reagent with mass fraction w (g of solute per g of solution) and density ρ(w)
 * (g/mL at 20 °C, from data/reagent-density.json):
 *   c = 1000 · w · ρ(w) / M          mol of solute per litre of reagent (M: the solute's g/mol)
 *   reagent volume = n / c           L of reagent for n mol of solute
 *   reagent mass   = n · M / w       g of reagent for n mol of solute
 *
 * Method: ρ(w) is interpolated linearly between the two nearest points of the handbook table; a
 * mass fraction outside the table is refused (never extrapolated). Between points 2–10 % apart the
 * density curves are smooth and nearly straight: the largest error of linear interpolation, judged
 * from the second differences of the tables, is about 0.1 % of ρ, below the spread between
 * handbooks. The density is that at 20 °C: at another temperature of the reagent its volume differs
 * by its thermal expansion (about 0.05 % per kelvin for 37 % HCl), which is not corrected.
 *
 * Rule: a percentage given with a named reagent is by mass (w/w), as these reagents are sold;
 * "% w/v" stays grams per 100 mL (units.ts), and "% v/v" is refused. For ammonia the percentage is
 * of NH₃ (as sold: "25 % ammonia", also called ammonium hydroxide). "Glacial" acetic acid is taken
 * at the mass fraction the data file gives for it.
 */
import data from "./data/reagent-density.json";
import { fail, fmt } from "./failure";
import type { Result } from "./types";

interface DensityPoint {
  percent: number;
  density: number;
}

interface ReagentData {
  solute: string;
  glacialPercent?: { value: number };
  points: DensityPoint[];
}

const REAGENTS = data.reagents as Record<string, ReagentData>;

/** The temperature of the density tables, °C. */
export const REAGENT_TABLE_TEMPERATURE_C = data.temperatureC;

export interface ReagentStock {
  /** Mass fraction of the solute, per cent. */
  percent: number;
  /** g/mL of the reagent at 20 °C. */
  density: number;
  /** mol of solute per litre of reagent. */
  conc: number;
  /** g of reagent per mol of solute (M / w). */
  gramsPerMol: number;
}

/** Library ids of the substances with a density table. */
export const reagentIds = (): string[] => Object.keys(REAGENTS);

/** The range of mass fractions (per cent) a reagent's table covers, or undefined without a table. */
export function reagentRange(id: string): { min: number; max: number } | undefined {
  const r = REAGENTS[id];
  if (!r) return undefined;
  return { min: r.points[0].percent, max: r.points[r.points.length - 1].percent };
}

/** The mass fraction (per cent) of the "glacial" form, for a reagent that has one. */
export const glacialPercent = (id: string): number | undefined => REAGENTS[id]?.glacialPercent?.value;

/** ρ(w) by linear interpolation in the table (w in per cent, inside the table). */
function densityAt(points: readonly DensityPoint[], percent: number): number {
  let i = 1;
  while (i < points.length - 1 && points[i].percent < percent) i++;
  const a = points[i - 1];
  const b = points[i];
  return a.density + ((b.density - a.density) * (percent - a.percent)) / (b.percent - a.percent);
}

/**
 * A reagent as supplied at `percent` % w/w: its density and molarity. `name` is for messages;
 * `molarMass` is the solute's g/mol (the library's). A substance without a table, or a mass fraction
 * outside its table, is "bad-input" with the reason.
 */
export function reagentStock(id: string, name: string, molarMass: number | undefined, percent: number): Result<ReagentStock> {
  const r = REAGENTS[id];
  if (!r) {
    const known = Object.keys(REAGENTS).map((k) => k.replace(/-/g, " ")).join(", ");
    return fail("bad-input", `'${name}' has no density table, so a percentage by mass cannot be turned into mol/L: give its concentration in mol/L (or "% w/v"); density tables are built in for ${known}.`);
  }
  if (!(Number.isFinite(percent) && percent > 0)) return fail("bad-input", `The mass fraction of '${name}' must be a positive percentage, got ${fmt(percent)} %.`);
  const { min, max } = reagentRange(id) as { min: number; max: number };
  if (percent > max || percent < min) {
    return fail("bad-input", `${fmt(percent)} % w/w is outside the density table of ${name} (${fmt(min)}–${fmt(max)} % ${r.solute} by mass at ${REAGENT_TABLE_TEMPERATURE_C} °C): it is not extrapolated; give the reagent's concentration in mol/L from its certificate instead.`);
  }
  if (!(molarMass !== undefined && Number.isFinite(molarMass) && molarMass > 0)) {
    return fail("bad-input", `'${name}' has no molar mass, so its percentage by mass cannot be turned into mol/L.`);
  }
  const density = densityAt(r.points, percent);
  const w = percent / 100;
  return { ok: true, percent, density, conc: (1000 * w * density) / molarMass, gramsPerMol: molarMass / w };
}
