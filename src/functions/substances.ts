/**
 * Names typed in cells → the engine's objects, through the constants library in effect (built-in ←
 * personal ← workbook, managed by the task pane).
 *
 * Caches in the functions layer belong to the library object in effect (libraryScoped): a library is
 * immutable, and every change of the constants publishes a new library object, so a change is never
 * answered from stale data — and checking which library is in effect costs one comparison, not a
 * fingerprint.
 */
import type { AcidBaseSystem, Component } from "../chem/types";
import { getActiveLibrary, type Library } from "../library";
import { badInput } from "./errors";
import { nameWithoutStrength } from "./name-strength";

/** The fingerprint of the constants in effect ("PL-1.0.0-3fa9c21b07"). */
export function libraryKey(): string {
  return getActiveLibrary().fingerprint();
}

/**
 * A value derived from the library in effect: `make()` runs again the first time it is asked for
 * after the active library object has changed.
 */
export function libraryScoped<T>(make: () => T): () => T {
  let owner: Library | null = null;
  let value: T | undefined;
  return () => {
    const library = getActiveLibrary();
    if (library !== owner || value === undefined) {
      value = make();
      owner = library;
    }
    return value;
  };
}

/** Resolved names (the component, or the failure message with its suggestions) per library. */
const NAME_CACHE_LIMIT = 2048;
const nameCache = libraryScoped(() => new Map<string, Component | string>());

/**
 * An unknown name that is a known substance with a concentration typed beside it ("HCl 37 % w/w",
 * "1 M NaOH"): the message for it, which says where the amount goes; null otherwise. (Where a stock
 * beside a name is meant — a titrant, a RECIPE form — aq/stock-name.ts reads it before this is asked.)
 */
function concentrationInName(library: Library, name: string): string | null {
  const base = nameWithoutStrength(name);
  if (base === undefined) return null;
  const r = library.resolve(base);
  if (!r.ok) return null;
  const n = r.component.name;
  return `'${name}' is ${n} with a concentration: give the name alone ('${n}') and any amount where the function asks for one; a strength beside a name is read only for titrants and RECIPE's two forms.`;
}

/** A substance by any alias, or #VALUE! naming the closest known substances. Cached per library. */
export function resolveComponent(name: string): Component {
  const cache = nameCache();
  let found = cache.get(name);
  if (found === undefined) {
    const library = getActiveLibrary();
    const r = library.resolve(name);
    found = r.ok ? r.component : (concentrationInName(library, name) ?? r.message);
    if (cache.size >= NAME_CACHE_LIMIT) cache.clear();
    cache.set(name, found);
  }
  if (typeof found === "string") throw badInput(found);
  return found;
}

/**
 * An acid–base system by its own name ("phosphate") or through any substance that carries exactly
 * one system ("Na2HPO4", "Tris HCl").
 */
export function resolveSystem(name: string): AcidBaseSystem {
  const library = getActiveLibrary();
  const trimmed = name.trim();
  const direct = library.system(trimmed) ?? library.system(trimmed.toLowerCase());
  if (direct !== undefined) return direct;
  const found = library.resolve(trimmed);
  if (!found.ok) throw badInput(found.message);
  const systems = found.component.systems;
  if (systems.length === 0) throw badInput(`'${trimmed}' has no acid–base system (it is a strong electrolyte or a non-electrolyte): it has no pKa`);
  if (systems.length > 1) {
    const ids = systems.map((s) => s.system.name).join(", ");
    throw badInput(`'${trimmed}' carries several acid–base systems (${ids}): name the system instead`);
  }
  return (systems[0] as { system: AcidBaseSystem }).system;
}
