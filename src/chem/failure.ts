/** Constructors for the engine's typed failures. */
import type { Failure, FailureCode } from "./types";

export function fail(code: FailureCode, message: string): Failure {
  return { ok: false, code, message };
}

/** Formats a number for a message: up to 6 significant digits, exponent form when tiny or huge. */
export function fmt(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return "0";
  const a = Math.abs(x);
  return a >= 1e-3 && a < 1e6 ? String(Number(x.toPrecision(6))) : x.toExponential(4);
}
