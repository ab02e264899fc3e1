/** Shared helpers for the library tests. */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import type { LibraryDoc } from "../../src/library/types";

/** A deep, mutable copy of the built-in library. */
export function builtinCopy(): LibraryDoc {
  return JSON.parse(JSON.stringify(BUILTIN_LIBRARY)) as LibraryDoc;
}

/** A small user library file for Halvorsen Biologics' formulation lab. */
export function halvorsenLibrary(): LibraryDoc {
  return {
    format: "protolyte-library",
    schemaVersion: 1,
    name: "Halvorsen Biologics formulation lab",
    sources: {
      "hb-sop-117": { kind: "other", title: "HB-SOP-117 In-house pKa determination of HB buffer salts", year: 2024 },
    },
    systems: [
      {
        id: "hb-zwitterion",
        name: "HB zwitterion",
        topCharge: 0,
        speciesNames: ["HL", "L-"],
        steps: [{ pKa: { value: 7.35, unit: "1", conditions: "25 °C, I = 0 (extrapolated)", source: "hb-sop-117", locator: "Table 3", status: "published" } }],
      },
    ],
    substances: [
      {
        id: "hb-buffer-salt",
        name: "HB buffer salt",
        aliases: ["HBS-7", "Halvorsen buffer salt"],
        formula: "C8H17NNaO4S",
        nature: "weak-acid-base",
        state: "solid",
        systems: [{ system: "hb-zwitterion", stoich: 1, protons: 0 }],
        ions: [{ ion: "na", stoich: 1 }],
      },
    ],
  };
}
