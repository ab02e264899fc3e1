/**
 * Reading spreadsheet arguments. Excel passes ranges as rows of columns (even one cell), omitted
 * optional arguments as null, and empty cells as "" (or 0 for number ranges). Every problem becomes
 * a #VALUE! error whose message names the argument, the cell and what is wrong.
 */
import { cellPosition, isBlankCell, DEFAULTS, parseDecimal, parseQuantity, readActivityModel, readTemperature } from "../chem";
import type { ActivityModel } from "../chem/types";
import { badInput, orThrow } from "./errors";

export type Cell = unknown;

export const isBlank: (value: Cell) => boolean = isBlankCell;

/** A range or single value as a flat list in reading order (row by row), with cell positions. */
export function cellsOf(value: Cell): { value: Cell; row: number; col: number }[] {
  if (!Array.isArray(value)) return [{ value, row: 0, col: 0 }];
  const out: { value: Cell; row: number; col: number }[] = [];
  value.forEach((row, r) => {
    if (Array.isArray(row)) row.forEach((v, c) => out.push({ value: v, row: r, col: c }));
    else out.push({ value: row, row: r, col: 0 });
  });
  return out;
}

export function shapeOf(value: Cell): [number, number] {
  if (!Array.isArray(value)) return [1, 1];
  // A loop, not Math.max(...rows): a whole-column reference (1 048 576 rows) overflows the call stack.
  let cols = 0;
  for (const r of value) cols = Math.max(cols, Array.isArray(r) ? r.length : 1);
  return [value.length, cols];
}

/** "item 3" for a flat list, "row 2, column 1" for a table (src/chem/name-amount-pairs.ts). */
export const position: (row: number, col: number, shape: [number, number]) => string = cellPosition;

/** A text cell, trimmed; numbers are accepted as text (a substance could be named "2"). */
export function text(value: Cell, what: string): string {
  if (typeof value === "string") return value.trim();
  if (typeof value === "number" || typeof value === "boolean") return String(value);
  throw badInput(`${what} must be text`);
}

function describe(value: Cell): string {
  if (typeof value === "string") return `'${value.length > 40 ? `${value.slice(0, 37)}...` : value}'`;
  return String(value);
}

/**
 * A number or unit text converted to the engine's unit (mol/L, L, °C, mol). Blank or omitted gives
 * the default when there is one.
 */
export function quantity(
  value: Cell,
  what: string,
  dimension: "concentration" | "volume" | "temperature" | "amount",
  options: { fallback?: number; molarMass?: number } = {},
): number {
  if (isBlank(value)) {
    if (options.fallback !== undefined) return options.fallback;
    throw badInput(`${what} is missing`);
  }
  if (typeof value === "boolean") throw badInput(`${what} must be a number, not ${value ? "TRUE" : "FALSE"}`);
  if (typeof value !== "number" && typeof value !== "string") throw badInput(`${what} must be a number or a quantity with a unit`);
  const parsed = parseQuantity(value, dimension, { molarMass: options.molarMass });
  if (!parsed.ok) throw badInput(`${what} ${describe(value)}: ${parsed.message}`);
  return parsed.value;
}

/** A plain number (no units), e.g. a pH or a count. */
export function plainNumber(value: Cell, what: string, fallback?: number): number {
  if (isBlank(value)) {
    if (fallback !== undefined) return fallback;
    throw badInput(`${what} is missing`);
  }
  if (typeof value === "boolean") throw badInput(`${what} must be a number, not ${value ? "TRUE" : "FALSE"}`);
  const trimmed = typeof value === "string" ? value.trim() : "";
  const n = typeof value === "number" ? value : (parseDecimal(trimmed) ?? NaN);
  if (!Number.isFinite(n)) throw badInput(`${what} must be a finite number, got ${describe(value)}`);
  return n;
}

/** Temperature in °C (number or "37 degC", "310 K"); the default and the range: src/chem (readTemperature). */
export function temperature(value: Cell): number {
  const t = quantity(value, "temperature", "temperature", { fallback: DEFAULTS.temperatureC });
  return orThrow(readTemperature(t)).value;
}

/** An activity model by any of its names; blank for the default (the models: src/chem/activity/models.ts). */
export function activity(value: Cell): ActivityModel {
  return orThrow(readActivityModel(isBlank(value) ? "" : text(value, "activity"))).model;
}
