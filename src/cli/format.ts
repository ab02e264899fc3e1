/**
 * Numbers and text as a person reads them on a terminal. Plain output rounds numbers to significant
 * figures with mathjs `format` (imported selectively: only `format` and what it needs), drops float
 * noise such as 36.458000000000006, and neutralises control characters, so a cell's text can never
 * move the cursor, recolour or retitle the terminal. `--json` and `--out` keep full precision.
 */
import { create, formatDependencies } from "mathjs";
import type { CellResult } from "./evaluate";

const { format } = create({ formatDependencies });

/** How a number is rounded for reading: significant figures, or fixed decimals (pH). */
export type Rounding = { significant: number } | { decimals: number };

/** Default rounding of plain output: 6 significant figures (--digits N changes it). */
export const DEFAULT_ROUNDING: Rounding = { significant: 6 };

/**
 * The rounding a formula's result reads best in when --digits is not given: a pH to 3 decimals
 * (the resolution of a calibrated meter, common practice), a molar mass as the atomic-weight table
 * gives it (noise of the floating-point sum removed), a recipe's amounts to 4 significant figures
 * (a balance's usual resolution at gram scale, common practice), anything else to 6.
 */
export function roundingFor(formula: string): Rounding {
  const call = /^\s*=?\s*AQ\.([A-Z_]+)\s*\(/i.exec(formula);
  // Only a formula that is that one call: AQ.PH(…)/1000 is not a pH.
  const head = call && isWholeCall(formula, call[0].length) ? call[1].toUpperCase() : undefined;
  if (head === "PH") return { decimals: 3 };
  if (head === "MOLARMASS") return { significant: 12 };
  if (head === "RECIPE") return { significant: 4 };
  return DEFAULT_ROUNDING;
}

/** True when the parenthesis opened just before `start` closes at the end of the formula (strings skipped). */
function isWholeCall(formula: string, start: number): boolean {
  let depth = 1;
  let inString = false;
  for (let i = start; i < formula.length; i++) {
    const ch = formula[i];
    if (inString) {
      if (ch === '"') inString = false; // a doubled "" reopens at the next character
    } else if (ch === '"') inString = true;
    else if (ch === "(") depth++;
    else if (ch === ")" && --depth === 0) return formula.slice(i + 1).trim() === "";
  }
  return false;
}

export function formatNumber(value: number, rounding: Rounding = DEFAULT_ROUNDING): string {
  if (!Number.isFinite(value)) return String(value);
  if ("decimals" in rounding) return format(value, { notation: "fixed", precision: rounding.decimals }) as string;
  return format(value, { notation: "auto", precision: rounding.significant }) as string;
}

const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/**
 * Text safe for a terminal: tab, newline and carriage return shown as \t \n \r (they would break
 * the tab-separated layout), every other control character (ESC starts terminal sequences) and
 * bidirectional override as \u{…}.
 */
export function inertText(text: string): string {
  return text.replace(CONTROL, (ch) => {
    if (ch === "\t") return "\\t";
    if (ch === "\n") return "\\n";
    if (ch === "\r") return "\\r";
    return `\\u{${ch.codePointAt(0)!.toString(16).toUpperCase()}}`;
  });
}

/** A cell as printed in plain output: rounded number, safe text, error value. */
export function readableCell(cell: CellResult, rounding: Rounding = DEFAULT_ROUNDING): string {
  if (cell === null) return "";
  if (typeof cell === "number") return formatNumber(cell, rounding);
  if (typeof cell === "object") return cell.error;
  return inertText(String(cell));
}
