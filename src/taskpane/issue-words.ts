/**
 * Problems in words a user reads: a field's path in the entry ("steps[0].pKa.value") becomes
 * "step 1, pKa", and a problem elsewhere in a layer ("substances[0].systems[0].system: unknown
 * acid–base system 'mopso'") names the entry it is in: "MOPSO sodium salt uses the system 'mopso',
 * which no library in effect holds …". Pure.
 */
import type { LibraryDoc } from "../library";

const WORDS: Record<string, string> = {
  pKa: "pKa",
  dH: "ΔrH°",
  dCp: "ΔrCp°",
  value: "",
  topCharge: "charge of the fully protonated form",
  speciesNames: "species names",
  molarMass: "molar mass",
  measured: "measured at",
  temperature: "temperature",
  ionicStrength: "ionic strength",
  stoich: "units per mole",
  protons: "dissociable H⁺ carried",
  freeH: "H⁺ released outright",
  freeOH: "OH⁻ released outright",
  neutral: "neutral particles",
  aliases: "other name",
  locator: "where in the source",
  takeOverNames: "names taken over",
};

const ITEM: Record<string, string> = { steps: "step", systems: "system", ions: "counter-ion", aliases: "other name", speciesNames: "species name" };

/** "steps[0].pKa.value" → "step 1, pKa"; "" → "entry". */
export function fieldWords(path: string): string {
  if (path === "") return "entry";
  const parts: string[] = [];
  for (const seg of path.split(".")) {
    const m = /^([A-Za-z]+)(?:\[(\d+)\])?$/.exec(seg);
    if (!m) {
      parts.push(seg);
      continue;
    }
    const [, key, index] = m;
    if (index !== undefined) parts.push(`${ITEM[key] ?? WORDS[key] ?? key} ${Number(index) + 1}`);
    else {
      const w = WORDS[key] ?? key;
      if (w !== "") parts.push(w);
    }
  }
  return parts.join(", ");
}

/** A problem found in a layer file, naming the entry it is in (the file as it was to be saved). */
export function layerIssueWords(doc: LibraryDoc, layerName: string, path: string, message: string): string {
  const m = /^(systems|ions|substances)\[(\d+)\](?:\.(.*))?$/.exec(path);
  if (!m) return `${layerName}${path ? `, ${path}` : ""}: ${message}`;
  const record = (doc[m[1] as "systems" | "ions" | "substances"] ?? [])[Number(m[2])] as { id: string; name: string } | undefined;
  const who = record ? `${record.name}` : `${m[1].slice(0, -1)} ${Number(m[2]) + 1}`;
  const rest = m[3] ?? "";
  const unknownSystem = /^unknown acid–base system '(.*)'$/.exec(message);
  if (unknownSystem && /^systems\[\d+\]\.system$/.test(rest)) {
    return `${who} uses the system '${unknownSystem[1]}', which no library in effect holds (a workbook or personal entry may refer only to built-in systems and its own layer's): add the system to the ${layerName.toLowerCase()}, or choose another`;
  }
  const unknownIon = /^unknown strong ion '(.*)'$/.exec(message);
  if (unknownIon && /^ions\[\d+\]\.ion$/.test(rest)) return `${who} releases the ion '${unknownIon[1]}', which no library in effect holds`;
  return `${who} (${layerName.toLowerCase()})${rest ? `, ${fieldWords(rest)}` : ""}: ${message}`;
}

/** The same lines once each, in their first order. */
export function once(lines: readonly string[]): string[] {
  return [...new Set(lines)];
}
