/**
 * The built-in library, assembled from the data files in data/. Each data file is itself a valid
 * library file holding one section; together they form the read-only bottom layer.
 *
 * BUILTIN_VERSION goes into the fingerprint ("PL-1.3.4-…"). Any change to the built-in constants
 * must bump it; a test pins the built-in fingerprint so that a change cannot slip through unnoticed.
 */
import atomicWeights from "./data/atomic-weights.json";
import ions from "./data/ions.json";
import sources from "./data/sources.json";
import substances from "./data/substances.json";
import systems from "./data/systems.json";
import type { LibraryDoc } from "./types";
import { LIBRARY_FORMAT, SCHEMA_VERSION } from "./types";

export const BUILTIN_VERSION = "1.3.4";

/** The data files as loaded, for tests that validate each one. */
export const BUILTIN_FILES: Readonly<Record<string, unknown>> = {
  "sources.json": sources,
  "atomic-weights.json": atomicWeights,
  "systems.json": systems,
  "ions.json": ions,
  "substances.json": substances,
};

export const BUILTIN_LIBRARY: LibraryDoc = {
  format: LIBRARY_FORMAT,
  schemaVersion: SCHEMA_VERSION,
  name: "Protolyte built-in",
  version: BUILTIN_VERSION,
  description: "Constants shipped with Protolyte: read-only; override them in the workbook or personal library.",
  sources: (sources as unknown as LibraryDoc).sources,
  atomicWeights: (atomicWeights as unknown as LibraryDoc).atomicWeights,
  systems: (systems as unknown as LibraryDoc).systems,
  ions: (ions as unknown as LibraryDoc).ions,
  substances: (substances as unknown as LibraryDoc).substances,
};
