/**
 * What README.md states as current fact about the product, checked against the product itself
 * (cheap: no spreadsheet engine), so a reviewer reading it reads what is true today:
 * - the cautions: a calculated pH is an estimate to confirm with a calibrated meter; strong acids
 *   and bases are corrosive; validated procedures, pharmacopoeial methods and local regulations
 *   govern real decisions;
 * - the function table names every function with exactly its parameters, optional ones in [brackets];
 * - the constants fingerprint quoted as an example is the built-in library's now;
 * - the counts of the built-in library (acid–base systems, substances, distinct lookup names).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { SIGNATURES } from "../../src/functions/catalogue-signatures";
import { BUILTIN_LIBRARY, createLibrary } from "../../src/library";
import systems from "../../src/library/data/systems.json";
import substances from "../../src/library/data/substances.json";
import { lookupNames } from "../../src/library/validate/semantics";
import type { SubstanceRecord } from "../../src/library/types";

const readme = readFileSync(join(__dirname, "..", "..", "README.md"), "utf8");
/** One line per paragraph: a sentence may wrap anywhere. */
const flat = readme.replace(/\s+/g, " ");

describe("README.md", () => {
  test("states the three cautions", () => {
    const cautions = flat.slice(flat.indexOf("## Cautions"), flat.indexOf("## Quick start"));
    expect(cautions).toMatch(/calculated pH is an estimate\. Confirm it with a calibrated pH meter/);
    expect(cautions).toMatch(/Strong acids and bases are corrosive/);
    expect(cautions).toMatch(/validated procedures, pharmacopoeial methods and local regulations/);
  });

  test("the function table names every function with exactly its parameters", () => {
    const rows = [...readme.matchAll(/^\| `AQ\.([A-Z_]+)\(([^)]*)\)` \|/gm)].map((m) => [m[1], m[2]] as const);
    const expected = SIGNATURES.map((s) => [s.id, s.params.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ")] as const);
    expect(rows).toEqual(expected);
  });

  test("the fingerprint quoted is the built-in library's now", () => {
    const quoted = [...flat.matchAll(/`(PL-[0-9.]+-[0-9a-f]{10})`/g)].map((m) => m[1]);
    expect(quoted.length).toBeGreaterThan(0);
    const now = createLibrary({ builtin: BUILTIN_LIBRARY }).fingerprint();
    for (const q of quoted) expect(q).toBe(now);
  });

  test("the counts of the built-in library are today's", () => {
    const m = flat.match(/holds (\d+) acid–base systems — (.*?) — .*?: (\d+) substances under (\d+) distinct names/);
    if (!m) throw new Error("README: the sentence with the library's counts is missing");
    const subs = substances.substances as unknown as SubstanceRecord[];
    const keys = new Set<string>();
    subs.forEach((s, i) => {
      for (const n of lookupNames(s, `substances[${i}]`)) if (n.key !== "") keys.add(n.key);
    });
    const listed = m[2].replace(/\(.*?\)/g, (g) => g.replace(/,/g, ";")).split(", ");
    const goods = (m[2].match(/\((.*?)\)/)?.[1] ?? "").split(", ").length;
    expect({
      systems: Number(m[1]),
      named: listed.length - 1 + goods,
      substances: Number(m[3]),
      names: Number(m[4]),
    }).toEqual({ systems: systems.systems.length, named: systems.systems.length, substances: subs.length, names: keys.size });
  });
});
