/**
 * names + amounts ranges → the engine's Mixture, prepared for solving, with a cache.
 *
 * What-if tables call the same function thousands of times with the same or similar mixtures; the
 * resolved names and prepared mixtures are cached by their text and the fingerprint of the constants
 * in effect, so a change to the library never serves a stale entry.
 */
import { prepare, type PreparedMixture } from "../chem";
import type { Component, Mixture } from "../chem/types";
import { cellsOf, isBlank, position, quantity, shapeOf, text, type Cell } from "./args";
import { badInput, orThrow } from "./errors";
import { libraryKey, resolveComponent } from "./substances";

export interface ReadMixture {
  mixture: Mixture;
  prepared: PreparedMixture;
}

const CACHE_LIMIT = 4096;
const cache = new Map<string, ReadMixture>();

function remember(key: string, value: ReadMixture): void {
  if (cache.size >= CACHE_LIMIT) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  cache.set(key, value);
}

function cacheKey(names: Cell, amounts: Cell): string {
  return `${libraryKey()}\u0000${JSON.stringify(names)}\u0000${JSON.stringify(amounts)}`;
}

/** Pairs names with amounts cell by cell; blank rows are skipped, half-blank rows are errors. */
export function readEntries(names: Cell, amounts: Cell): { component: Component; conc: number }[] {
  const nShape = shapeOf(names);
  const aShape = shapeOf(amounts);
  if (nShape[0] !== aShape[0] || nShape[1] !== aShape[1]) {
    throw badInput(`names is ${nShape[0]}×${nShape[1]} cells but amounts is ${aShape[0]}×${aShape[1]}: give one amount per name`);
  }
  const nameCells = cellsOf(names);
  const amountCells = cellsOf(amounts);
  const entries: { component: Component; conc: number }[] = [];
  nameCells.forEach((cell, i) => {
    const amount = amountCells[i]?.value;
    const where = position(cell.row, cell.col, nShape);
    if (isBlank(cell.value)) {
      if (!isBlank(amount) && amount !== 0) throw badInput(`amount ${String(amount)}${where} has no substance name beside it`);
      return;
    }
    const name = text(cell.value, `name${where}`);
    const component = resolveComponent(name);
    if (isBlank(amount)) throw badInput(`no amount for '${name}'${where}`);
    const conc = quantity(amount, `amount of '${name}'${where}`, "concentration", { molarMass: component.molarMass });
    if (conc < 0) throw badInput(`amount of '${name}'${where} is negative (${conc} mol/L)`);
    entries.push({ component, conc });
  });
  if (entries.length === 0) throw badInput("the mixture is empty: give at least one substance name with its amount");
  return entries;
}

/** The mixture of a names/amounts pair, validated and prepared for solving (cached). */
export function readMixture(names: Cell, amounts: Cell): ReadMixture {
  const key = cacheKey(names, amounts);
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const mixture = readEntries(names, amounts);
  const prepared = orThrow(prepare(mixture));
  const value = { mixture, prepared };
  remember(key, value);
  return value;
}

/** For tests and the task pane after a library change. */
export function clearMixtureCache(): void {
  cache.clear();
}
