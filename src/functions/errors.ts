/**
 * The one place where failures become spreadsheet errors.
 *
 * Excel shows a custom message only on #VALUE! and #N/A, so:
 * - bad input (unknown substance, mismatched ranges, negative amounts, temperature out of range) → #VALUE!
 * - a target that cannot be reached, a species not in the mixture, a solution beyond the
 *   ionic-strength limit (no pH-derived number there) → #N/A
 * Anything unexpected becomes #VALUE! with "internal error" so a cell never shows a number we do not trust.
 */
import type { Failure } from "../chem/types";

export type ErrorKind = "value" | "na";

/** A failure the user can act on, with the message the cell shows. */
export class AqError extends Error {
  readonly kind: ErrorKind;
  constructor(kind: ErrorKind, message: string) {
    super(message);
    this.kind = kind;
    this.name = "AqError";
  }
}

export function badInput(message: string): AqError {
  return new AqError("value", message);
}

export function notAvailable(message: string): AqError {
  return new AqError("na", message);
}

/** Engine failure codes: an unreachable target, a missing species or the ionic-strength limit is #N/A, everything else #VALUE!. */
export function fromFailure(failure: Failure): AqError {
  const na = failure.code === "unreachable" || failure.code === "not-found" || failure.code === "beyond-limit";
  const kind: ErrorKind = na ? "na" : "value";
  return new AqError(kind, failure.message);
}

/** Unwraps an engine result or throws the matching AqError. */
export function orThrow<T extends { ok: boolean }>(result: T | Failure): Exclude<T, Failure> {
  if (!result.ok) throw fromFailure(result as Failure);
  return result as Exclude<T, Failure>;
}

/**
 * A finite number or a #VALUE! error: a cell never shows NaN or Infinity. An infinity is an overflow
 * from inputs too large (grams for a 1e306 L batch), said so; a NaN is a defect ("internal error").
 */
export function finite(value: number, what: string): number {
  if (value === Infinity || value === -Infinity) {
    throw new AqError("value", `${what} is too large to be a number (it overflows): check the size of the inputs, such as volumes and concentrations`);
  }
  if (!Number.isFinite(value)) throw new AqError("value", `internal error: ${what} is not a finite number`);
  return value;
}

/**
 * An error value for one cell of a spilled table (a curve point beyond the ionic-strength limit):
 * the rest of the table is still given. Excel shows it as that cell's #N/A with the message.
 */
export function refusedCell(failure: Failure | undefined): CustomFunctions.Error {
  const error = fromFailure(failure ?? { ok: false, code: "beyond-limit", message: "no value is given here" });
  return toCustomFunctionsError(error);
}

/** Messages show in a tooltip: keep them one line and reasonably short. */
function tidy(message: string): string {
  const oneLine = message.replace(/\s+/g, " ").trim();
  return oneLine.length > 250 ? `${oneLine.slice(0, 247)}...` : oneLine;
}

/** Converts anything thrown inside a function into the `CustomFunctions.Error` Excel displays. */
export function toCustomFunctionsError(error: unknown): CustomFunctions.Error {
  if (error instanceof CustomFunctions.Error) return error;
  if (error instanceof AqError) {
    const code = error.kind === "na" ? CustomFunctions.ErrorCode.notAvailable : CustomFunctions.ErrorCode.invalidValue;
    return new CustomFunctions.Error(code, tidy(error.message));
  }
  const detail = error instanceof Error ? error.message : String(error);
  return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, tidy(`internal error: ${detail}`));
}

/** Runs a function body and rethrows any failure as the spreadsheet error to display. */
export function guard<T>(body: () => T): T {
  try {
    return body();
  } catch (error) {
    throw toCustomFunctionsError(error);
  }
}
