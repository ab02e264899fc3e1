/**
 * Names typed in cells → the engine's objects, through the constants library in effect (built-in ←
 * workbook ← personal, managed by the task pane). The library's fingerprint keys every cache in the
 * functions layer, so a change to the constants is never answered from stale data.
 */
import type { AcidBaseSystem, Component } from "../chem/types";
import { getActiveLibrary } from "../library";
import { badInput } from "./errors";

/** The fingerprint of the constants in effect ("PL-1.0.0-3fa9c21b07"). */
export function libraryKey(): string {
  return getActiveLibrary().fingerprint();
}

/** A substance by any alias, or #VALUE! naming the closest known substances. */
export function resolveComponent(name: string): Component {
  const found = getActiveLibrary().resolve(name);
  if (!found.ok) throw badInput(found.message);
  return found.component;
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
