/**
 * A recipe's liquid stocks must leave room in the batch: when the litres of stock listed (components
 * named with a stock concentration) reach or exceed the batch volume, the stock is too dilute for
 * that total concentration, and the recipe is "unreachable" with the largest total concentration the
 * stock allows.
 *
 * That largest total C* solves L(C) = V, where L(C) is the litres of stock listed by the recipe at
 * total concentration C (everything else as requested). L(0) = 0 < V ≤ L(C) at the requested C, so
 * [0, C] brackets C*; L grows with C (more buffer system needs more of each form and of the titrant),
 * so bisection keeps lo where the recipe is found with L(lo) < V and hi where it is not (a trial
 * whose recipe fails counts as not allowed), down to (hi − lo) ≤ 1e-9·hi. The quoted limit is lo
 * rounded down to 4 significant digits, so the number quoted itself gives a recipe that fits.
 */
import { fail, fmt } from "../failure";
import type { Result } from "../types";
import type { RecipeRequest, RecipeResult, RecipeValue } from "./recipe";

/** Litres of all stocks listed by a recipe. */
export function stockLitres(value: Pick<RecipeValue, "lines">): number {
  return value.lines.reduce((sum, line) => sum + (line.litres ?? 0), 0);
}

/** Relative width of the bisection bracket on the total concentration. */
const ROOM_TOLERANCE = 1e-9;
const ROOM_MAX_STEPS = 80;

/** x rounded down to 4 significant digits. */
function floor4(x: number): number {
  const unit = 10 ** (Math.floor(Math.log10(x)) - 3);
  let q = Math.floor(x / unit) * unit;
  q = Number(q.toPrecision(4));
  return q > x ? Number((q - unit).toPrecision(4)) : q;
}

/** The largest total concentration whose recipe leaves room in the batch (0 when none was found). */
export function largestTotalForStock(req: RecipeRequest, recipeAt: (totalConc: number) => RecipeResult): number {
  let lo = 0;
  let hi = req.totalConc;
  for (let k = 0; k < ROOM_MAX_STEPS && hi - lo > ROOM_TOLERANCE * hi; k++) {
    const mid = 0.5 * (lo + hi);
    const r = recipeAt(mid);
    if (r.ok && stockLitres(r) < req.volume) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** The recipe as found, or "unreachable" when its stocks fill the batch. */
export function checkStockRoom(req: RecipeRequest, value: RecipeValue, recipeAt: (totalConc: number) => RecipeResult): Result<RecipeValue> {
  const litres = stockLitres(value);
  if (litres < req.volume) return { ok: true, ...value };
  const liquids = value.lines
    .filter((line) => line.litres !== undefined)
    .map((line) => `${fmt(line.litres as number)} L of ${line.name} ${fmt(req.stocks?.[line.component.id] as number)} mol/L`)
    .join(" + ");
  const most = largestTotalForStock(req, recipeAt);
  const allows = most > 0 ? `it allows a total concentration of at most ${fmt(floor4(most))} mol/L` : "no total concentration was found for which it fits";
  return fail("unreachable", `The stock is too dilute: ${liquids} for a ${fmt(req.volume)} L batch; ${allows}. Use a stronger stock or a lower total concentration.`);
}
