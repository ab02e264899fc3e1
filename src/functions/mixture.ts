/**
 * names + amounts ranges → the engine's Mixture, prepared for solving, with a cache.
 *
 * Several functions on one row (PH, BETA, IONIC, SPECIES of the same mixture), or one mixture at
 * several temperatures, ask for the same mixture again: the prepared mixture is cached under a key
 * that encodes every cell's type and value and the layout of both ranges, in the cache of the
 * library object in effect (substances.ts: a change of the constants drops it). A cached entry gives
 * the same results as a fresh one (the engine starts every solve cold).
 *
 * The key is built by hand rather than with JSON.stringify, which is slower here and cannot tell
 * NaN, ±Infinity, undefined and null apart (all "null") nor -0 from 0.
 */
import { EMPTY_MIXTURE_MESSAGE, pairAt, pairShapeProblem, prepare, type PreparedMixture } from "../chem";
import type { Component, Failure, Mixture } from "../chem/types";
import { cellsOf, isBlank, position, quantity, shapeOf, text, type Cell } from "./args";
import { badInput, orThrow } from "./errors";
import { libraryScoped, resolveComponent } from "./substances";

export interface MixtureArgs {
  mixture: Mixture;
  prepared: PreparedMixture;
}

/**
 * Entries kept. Hits come from calls close together (the functions of one row, one mixture at a few
 * temperatures); a long table of distinct rows never hits, and a large cache then only makes the
 * garbage collector keep thousands of prepared mixtures alive (measured: scripts/bench.ts part b).
 */
export const MIXTURE_CACHE_LIMIT = 256;
const mixtureCache = libraryScoped(() => new Map<string, MixtureArgs>());

/**
 * One cell in the key: a type tag, then the value — numbers ended by ";", strings length-prefixed —
 * so that no sequence of cells can spell another's key.
 */
function cellKey(v: unknown): string | null {
  switch (typeof v) {
    case "number":
      return Object.is(v, -0) ? "n-0;" : `n${v};`;
    case "string":
      return `s${v.length}:${v}`;
    case "boolean":
      return v ? "T" : "F";
    case "undefined":
      return "u";
    default:
      return v === null ? "z" : null;
  }
}

/** A range (rows of cells) or a single value → key text, or null for anything else (not cached). */
function rangeKey(value: Cell): string | null {
  if (!Array.isArray(value)) {
    const k = cellKey(value);
    return k === null ? null : `=${k}`;
  }
  let key = `[${value.length}`;
  for (let r = 0; r < value.length; r++) {
    const row: unknown = value[r];
    if (!Array.isArray(row)) return null;
    key += `|${row.length}`;
    for (let c = 0; c < row.length; c++) {
      const k = cellKey(row[c]);
      if (k === null) return null;
      key += k;
    }
  }
  return key;
}

/** The cache key of a names/amounts pair, or null when it should not be cached. */
export function mixtureKey(names: Cell, amounts: Cell): string | null {
  const n = rangeKey(names);
  if (n === null) return null;
  const a = rangeKey(amounts);
  return a === null ? null : `${n}\u0000${a}`;
}

/** True when a range is rows of cells that all have the same length (what a sheet range is). */
function rectangular(value: Cell): value is unknown[][] {
  if (!Array.isArray(value) || value.length === 0) return false;
  const first: unknown = value[0];
  if (!Array.isArray(first)) return false;
  for (let r = 1; r < value.length; r++) {
    const row: unknown = value[r];
    if (!Array.isArray(row) || row.length !== first.length) return false;
  }
  return true;
}

/**
 * One name/amount pair at (row, col) of ranges of the given shape. The position text is built only
 * when a message needs it (no closure per cell: a sheet reads thousands of these).
 */
function readPair(
  entries: { component: Component; conc: number }[],
  nameCell: Cell,
  amount: Cell,
  row: number,
  col: number,
  shape: [number, number],
): void {
  const pair = pairAt(nameCell, amount, row, col, shape);
  if (pair === "skip") return;
  if (pair !== "pair") throw badInput(pair);
  const name = typeof nameCell === "string" ? nameCell.trim() : text(nameCell, `name${position(row, col, shape)}`);
  const component = resolveComponent(name);
  const conc =
    typeof amount === "number" && Number.isFinite(amount) && amount >= 0
      ? amount // what quantity() returns for a plain non-negative number, without building its messages
      : quantity(amount, `amount of '${name}'${position(row, col, shape)}`, "concentration", { molarMass: component.molarMass });
  if (conc < 0) throw badInput(`amount of '${name}'${position(row, col, shape)} is negative (${conc} mol/L)`);
  entries.push({ component, conc });
}

/** Pairs names with amounts cell by cell; blank rows are skipped, half-blank rows are errors. */
export function readEntries(names: Cell, amounts: Cell): { component: Component; conc: number }[] {
  const entries: { component: Component; conc: number }[] = [];
  if (rectangular(names) && rectangular(amounts)) {
    // The usual case, two sheet ranges: read in place, no per-cell objects.
    const rows = names.length;
    const cols = names[0].length;
    const mismatch = pairShapeProblem([rows, cols], [amounts.length, amounts[0].length]);
    if (mismatch !== null) throw badInput(mismatch);
    const shape: [number, number] = [rows, cols];
    for (let r = 0; r < rows; r++) {
      const nRow = names[r];
      const aRow = amounts[r];
      for (let c = 0; c < cols; c++) readPair(entries, nRow[c], aRow[c], r, c, shape);
    }
  } else {
    const nShape = shapeOf(names);
    const aShape = shapeOf(amounts);
    const mismatch = pairShapeProblem(nShape, aShape);
    if (mismatch !== null) throw badInput(mismatch);
    const nameCells = cellsOf(names);
    const amountCells = cellsOf(amounts);
    nameCells.forEach((cell, i) => readPair(entries, cell.value, amountCells[i]?.value, cell.row, cell.col, nShape));
  }
  if (entries.length === 0) throw badInput(EMPTY_MIXTURE_MESSAGE);
  return entries;
}

function read(names: Cell, amounts: Cell): MixtureArgs {
  const mixture = readEntries(names, amounts);
  return { mixture, prepared: orThrow(prepare(mixture)) };
}

/**
 * A row of a table read in place by rowwise.ts (tableRowReader), handed to the row's function: the
 * names and amounts objects it was read from, and its mixture (module variables, not an object per row).
 */
let handedNames: Cell | undefined;
let handedAmounts: Cell | undefined;
let handedValue: MixtureArgs | null = null;

/**
 * Calls fn(...args) while readMixtureArgs(names, amounts), for these very objects, answers `value` (read
 * already by tableRowReader); any other call reads as usual.
 */
export function withRowMixture<A extends unknown[], T>(names: Cell, amounts: Cell, value: MixtureArgs, fn: (...args: A) => T, args: A): T {
  const namesBefore = handedNames;
  const amountsBefore = handedAmounts;
  const valueBefore = handedValue;
  handedNames = names;
  handedAmounts = amounts;
  handedValue = value;
  try {
    return fn(...args);
  } finally {
    handedNames = namesBefore;
    handedAmounts = amountsBefore;
    handedValue = valueBefore;
  }
}

/**
 * The rows of a row-wise table (names one row of k text cells, amounts rows of k cells): the names
 * are resolved once for the table, and a row of k plain finite non-negative numbers becomes its
 * mixture in place: the same entries, in the same order, that readEntries gives, prepared the same
 * way, without the cache key (a table of distinct rows never hits the cache, and the key was a
 * fifth of a row's cost: scripts/bench-tables.ts, f1), and solved by one solver for the table
 * (PreparedMixture.setMixture). A row equal to the one before reuses its mixture. Any other row (a blank, a unit, text, a failure to prepare) gives null: it is read the
 * usual way, with its messages. Null when a name cell is not text.
 */
export function tableRowReader(names: Cell): ((row: unknown) => MixtureArgs | null) | null {
  const nameRow: unknown = Array.isArray(names) && names.length === 1 ? names[0] : null;
  if (!Array.isArray(nameRow) || nameRow.length === 0) return null;
  const components: Component[] = [];
  for (const cell of nameRow) {
    if (typeof cell !== "string" || isBlank(cell)) return null;
    components.push(resolveComponent(cell.trim()));
  }
  const k = components.length;
  let lastRow: number[] | null = null;
  let last: MixtureArgs | null = null;
  return (row) => {
    if (!Array.isArray(row) || row.length !== k) return null;
    for (let c = 0; c < k; c++) {
      const v: unknown = row[c];
      if (typeof v !== "number" || !Number.isFinite(v) || v < 0) return null;
    }
    if (last !== null && lastRow !== null && lastRow.every((v, c) => Object.is(v, row[c]))) return last;
    const mixture = new Array<{ component: Component; conc: number }>(k);
    for (let c = 0; c < k; c++) mixture[c] = { component: components[c], conc: row[c] as number };
    // The previous row's solver takes the new amounts where it can (the same components: always,
    // unless complexes come or go); results are those of a new one (every solve starts cold).
    let prepared: PreparedMixture | Failure;
    if (last !== null && last.prepared.setMixture(mixture)) prepared = last.prepared;
    else {
      prepared = prepare(mixture);
      if (!prepared.ok) return null;
    }
    lastRow = row as number[]; // the caller's row, unchanged while its table is read
    last = { mixture, prepared };
    return last;
  };
}

/** The mixture of a names/amounts pair, validated and prepared for solving (cached). */
export function readMixtureArgs(names: Cell, amounts: Cell): MixtureArgs {
  if (handedValue !== null && amounts === handedAmounts && names === handedNames) return handedValue;
  const key = mixtureKey(names, amounts);
  if (key === null) return read(names, amounts);
  const cache = mixtureCache();
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const value = read(names, amounts);
  if (cache.size >= MIXTURE_CACHE_LIMIT) cache.clear();
  cache.set(key, value);
  return value;
}

/** Empties the cache of the library in effect (tests; a library change needs no call). */
export function clearMixtureCache(): void {
  mixtureCache().clear();
}
