/**
 * Colours, dash patterns and display names of the chart series. The colours are dark enough for
 * thin lines on white (contrast ≥ 4.5:1) and differ in lightness as well as hue; every series also
 * has its own dash pattern, so the lines can be told apart without colour (and in a greyscale print).
 */

export interface SeriesStyle {
  stroke: string;
  dash: string | null;
}

export const SERIES: readonly SeriesStyle[] = [
  { stroke: "#0a6560", dash: null },
  { stroke: "#b34a12", dash: "7 3" },
  { stroke: "#3446a8", dash: "2.5 2.5" },
  { stroke: "#8c2d73", dash: "9 3 2 3" },
  { stroke: "#4f6b0e", dash: "4 2" },
  { stroke: "#5a3d99", dash: "1.5 3.5" },
];

export function seriesStyle(i: number): SeriesStyle {
  return SERIES[i % SERIES.length];
}

export const INK = "#17212b";
export const MUTED = "#4a5868";
export const GRID = "#e1e6eb";
export const AXIS = "#6b7785";
export const MARKER = "#b34a12";
export const CURVE = "#0a6560";

const SUB: Record<string, string> = { "0": "₀", "1": "₁", "2": "₂", "3": "₃", "4": "₄", "5": "₅", "6": "₆", "7": "₇", "8": "₈", "9": "₉" };
const SUP: Record<string, string> = { "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "+": "⁺", "-": "⁻" };

/**
 * A species name as a chemist writes it: H2PO4- → H₂PO₄⁻, HPO4^2- → HPO₄²⁻, CO2(aq) → CO₂(aq).
 * Digits after a letter or ")" become subscripts; a charge written "^2-" or a final "+"/"-" after a
 * letter, digit or ")" becomes a superscript. Anything else is left as it is. Given the charge, a name
 * that ends in it without "^" (Ca2+) shows it as the charge: Ca²⁺.
 */
export function displayName(name: string, charge?: number): string {
  // A charge of 2 or more written without "^" after the symbol (Ca2+, Fe3+): the digits are the charge.
  const z = charge === undefined ? "" : `${Math.abs(charge)}${charge > 0 ? "+" : "-"}`;
  if (Math.abs(charge ?? 0) >= 2 && name.endsWith(z) && !name.includes("^")) return displayName(name.slice(0, -z.length)) + [...z].map((c) => SUP[c]).join("");
  let s = name.replace(/\^(\d*)([+-])$/, (_, d: string, sign: string) => [...d, sign].map((c) => SUP[c]).join(""));
  s = s.replace(/([A-Za-z0-9)])([+-])$/, (_, before: string, sign: string) => before + SUP[sign]);
  // a word such as "form 2" or "(1-)" stays; digits glued to a letter or ")" are counts of atoms
  return s.replace(/([A-Za-z)])(\d+)/g, (_, before: string, digits: string) => before + [...digits].map((c) => SUB[c]).join(""));
}
