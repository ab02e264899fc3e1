/**
 * Problems in words a person reads, not paths: a field's place in an entry ("steps[0].pKa.value")
 * reads "step 1, pKa", and a problem anywhere in a library file names the entry it is in
 * ("substances[0].systems[0].system: unknown acid–base system 'mopso'" reads "MOPSO sodium salt
 * uses the system 'mopso', which no library in effect holds …"). The paths stay in the issues
 * themselves (for programs and tests); these are the lines shown. Pure.
 */

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
  logBeta: "log β",
  logKsp: "log Ksp",
};

const ITEM: Record<string, string> = {
  steps: "step",
  systems: "system",
  ions: "counter-ion",
  aliases: "other name",
  speciesNames: "species name",
  complexes: "complex",
  solids: "solid",
  changes: "change record, line",
};

/** The file's own fields, when a problem sits at its top level. */
const TOP: Record<string, string> = {
  format: "the file's format",
  schemaVersion: "the file's schema version",
  name: "the library's name",
  version: "the library's version",
  description: "the library's description",
  exported: "the export stamp",
  pin: "the pin",
};

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

type Section = "systems" | "ions" | "substances";
const KIND: Record<Section, string> = { systems: "acid–base system", ions: "strong ion", substances: "substance" };

const asRecord = (x: unknown): Record<string, unknown> | null => (typeof x === "object" && x !== null && !Array.isArray(x) ? (x as Record<string, unknown>) : null);

/** An entry of a section named as its reader knows it: its name, else its id, else "substance 3". */
function entryName(doc: unknown, section: Section, index: number): string {
  const list = asRecord(doc)?.[section];
  const rec = Array.isArray(list) ? asRecord(list[index]) : null;
  const name = rec?.name;
  if (typeof name === "string" && name.trim() !== "") return name;
  if (typeof rec?.id === "string" && rec.id !== "") return `the ${KIND[section]} '${rec.id}'`;
  return `${KIND[section]} ${index + 1}`;
}

/** Other entries a message points to by path ("duplicate id 'hb' (also systems[0])") named too. */
function namedReferences(doc: unknown, message: string): string {
  return message.replace(/\b(systems|ions|substances)\[(\d+)\]/g, (_, s: Section, i: string) => entryName(doc, s, Number(i)));
}

/**
 * One problem of a library file in words. `doc`: the file (or layer) the path points into, as read
 * (it may be invalid); `place`: where it sits, for example "workbook library" (empty for a file on
 * its own).
 */
export function issueWords(doc: unknown, issue: { path: string; message: string }, place = ""): string {
  const { path } = issue;
  const message = namedReferences(doc, issue.message);
  const where = place ? ` (${place})` : "";
  const entry = /^(systems|ions|substances)\[(\d+)\](?:\.(.*))?$/.exec(path);
  if (entry) {
    const who = entryName(doc, entry[1] as Section, Number(entry[2]));
    const rest = entry[3] ?? "";
    const unknownSystem = /^unknown acid–base system '(.*)'$/.exec(message);
    if (unknownSystem && /^systems\[\d+\]\.system$/.test(rest)) {
      const fix = place ? `add the system to the ${place}` : "add the system to the file";
      return `${who} uses the system '${unknownSystem[1]}', which no library in effect holds (a workbook or personal entry may refer only to built-in systems and its own layer's): ${fix}, or choose another`;
    }
    const unknownIon = /^unknown strong ion '(.*)'$/.exec(message);
    if (unknownIon && /^ions\[\d+\]\.ion$/.test(rest)) return `${who} releases the ion '${unknownIon[1]}', which no library in effect holds`;
    return `${who}${where}${rest ? `, ${fieldWords(rest)}` : ""}: ${message}`;
  }
  const source = /^sources(?:\.([^.[\]]+)|\["((?:[^"\\]|\\.)*)"\])(?:\.(.*))?$/.exec(path);
  if (source) {
    const rest = source[3] ?? "";
    return `the source '${source[1] ?? source[2]}'${where}${rest ? `, ${fieldWords(rest)}` : ""}: ${message}`;
  }
  const weight = /^atomicWeights(?:\.([^.[\]]+)|\["((?:[^"\\]|\\.)*)"\])/.exec(path);
  if (weight) return `the atomic weight of ${weight[1] ?? weight[2]}${where}: ${message}`;
  if (path === "") return `${place ? `the ${place}` : "the file"}: ${message}`;
  const top = /^([A-Za-z]+)(.*)$/.exec(path);
  if (top && TOP[top[1]] !== undefined && top[2] === "") return `${TOP[top[1]]}${where}: ${message}`;
  return `${fieldWords(path)}${where}: ${message}`;
}

/** The same lines once each, in their first order. */
export function once(lines: readonly string[]): string[] {
  return [...new Set(lines)];
}

/** Every problem of `doc` in words, each line once. */
export function issueLines(doc: unknown, issues: readonly { path: string; message: string }[], place = ""): string[] {
  return once(issues.map((i) => issueWords(doc, i, place)));
}
