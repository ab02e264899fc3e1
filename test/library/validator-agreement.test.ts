/**
 * The runtime validator (validate/schema-check.ts, which interprets schema/library.schema.json)
 * must agree with ajv, the reference JSON Schema implementation, on what is valid: on the built-in
 * files, on hand-made invalid samples for every keyword the schema uses, and on a thousand random
 * mutations of valid files.
 */
import fc from "fast-check";
import { BUILTIN_FILES } from "../../src/library/builtin";
import schema from "../../src/library/schema/library.schema.json";
import { checkShape } from "../../src/library/validate";
import { formatIssue } from "../../src/library/validate/paths";
import { keywordsIn, SUPPORTED_KEYWORDS } from "../../src/library/validate/schema-check";
import { validateWithAjv } from "./ajv";
import { halvorsenLibrary } from "./helpers";

const agree = (value: unknown): { ours: boolean; ajv: boolean } => ({ ours: checkShape(value).length === 0, ajv: validateWithAjv(value) as boolean });

test("the schema uses only keywords the runtime validator implements", () => {
  const unknown = [...keywordsIn(schema)].filter((k) => !SUPPORTED_KEYWORDS.has(k));
  expect(unknown).toEqual([]);
});

test.each(Object.keys(BUILTIN_FILES))("both accept built-in %s", (file) => {
  expect(agree(BUILTIN_FILES[file])).toEqual({ ours: true, ajv: true });
});

type Edit = (d: any) => void;
const samples: [string, Edit][] = [
  ["format wrong (const)", (d) => (d.format = "x")],
  ["schemaVersion 2 (const)", (d) => (d.schemaVersion = 2)],
  ["name missing (required)", (d) => delete d.name],
  ["name empty (minLength)", (d) => (d.name = "")],
  ["name too long (maxLength, code points)", (d) => (d.name = "₂".repeat(201))],
  ["name of 200 astral characters, counted as code points (valid)", (d) => (d.name = "😀".repeat(200))],
  ["name with a tab (pattern)", (d) => (d.name = "a\tb")],
  ["description with a line break (allowed)", (d) => (d.description = "line one\nline two")],
  ["version not x.y.z (pattern)", (d) => (d.version = "v1")],
  ["unknown top-level field (additionalProperties)", (d) => (d.extra = 1)],
  ["sources not an object (type)", (d) => (d.sources = [])],
  ["source id upper case (propertyNames)", (d) => (d.sources.HB = { title: "x" })],
  ["source id 'constructor' (not)", (d) => (d.sources = JSON.parse('{"constructor":{"title":"x"}}'))],
  ["source year fractional (integer)", (d) => (d.sources["hb-sop-117"].year = 2024.5)],
  ["source year too early (minimum)", (d) => (d.sources["hb-sop-117"].year = 1500)],
  ["source doi malformed (pattern)", (d) => (d.sources["hb-sop-117"].doi = "doi:10.1/x")],
  ["source url http (pattern)", (d) => (d.sources["hb-sop-117"].url = "http://example.org")],
  ["source kind unknown (enum)", (d) => (d.sources["hb-sop-117"].kind = "blog")],
  ["atomic weight key not a symbol", (d) => (d.atomicWeights = { na: { value: 22.99, unit: "g/mol", conditions: "x", status: "published", source: "hb-sop-117" } })],
  ["atomic weight zero (exclusiveMinimum)", (d) => (d.atomicWeights = { Na: { value: 0, unit: "g/mol", conditions: "x", status: "published", source: "hb-sop-117" } })],
  ["systems not an array (type)", (d) => (d.systems = {})],
  ["system without steps (required)", (d) => delete d.systems[0].steps],
  ["system with no steps (minItems)", (d) => (d.systems[0].steps = [])],
  ["eleven steps (maxItems)", (d) => (d.systems[0].steps = Array(11).fill(d.systems[0].steps[0]))],
  ["topCharge 11 (maximum)", (d) => (d.systems[0].topCharge = 11)],
  ["pKa 31 (maximum via $ref sibling)", (d) => (d.systems[0].steps[0].pKa.value = 31)],
  ["pKa unit pH (const via $ref sibling)", (d) => (d.systems[0].steps[0].pKa.unit = "pH")],
  ["published pKa without source (if/then)", (d) => delete d.systems[0].steps[0].pKa.source],
  ["unverified pKa without note (if/then)", (d) => (d.systems[0].steps[0].pKa.status = "unverified")],
  ["unverified pKa with a note (valid)", (d) => Object.assign(d.systems[0].steps[0].pKa, { status: "unverified", note: "from memory, unverified" })],
  ["status unknown (enum)", (d) => (d.systems[0].steps[0].pKa.status = "measured")],
  ["value record without status (required)", (d) => delete d.systems[0].steps[0].pKa.status],
  ["dH in kcal/mol (const)", (d) => (d.systems[0].steps[0].dH = { value: 5, unit: "kcal/mol", conditions: "x", status: "unverified", note: "n" })],
  ["step with an unknown field", (d) => (d.systems[0].steps[0].pKb = d.systems[0].steps[0].pKa)],
  ["speciesNames with one name (minItems)", (d) => (d.systems[0].speciesNames = ["HL"])],
  ["ion with charge 0 (not const)", (d) => (d.ions = [{ id: "x", name: "x", charge: 0 }])],
  ["ion with charge 5 (maximum)", (d) => (d.ions = [{ id: "x", name: "x", charge: 5 }])],
  ["substance without formula or molar mass (anyOf)", (d) => delete d.substances[0].formula],
  ["substance with a molar mass instead of a formula (valid)", (d) => {
    delete d.substances[0].formula;
    d.substances[0].molarMass = { value: 250.2, unit: "g/mol", conditions: "anhydrous", status: "unverified", note: "n" };
  }],
  ["formula with a space (pattern)", (d) => (d.substances[0].formula = "Na Cl")],
  ["nature unknown (enum)", (d) => (d.substances[0].nature = "buffer")],
  ["state unknown (enum)", (d) => (d.substances[0].state = "plasma")],
  ["stoich 0 (exclusiveMinimum)", (d) => (d.substances[0].systems[0].stoich = 0)],
  ["protons missing (required)", (d) => delete d.substances[0].systems[0].protons],
  ["alias not a string (items type)", (d) => (d.substances[0].aliases = [7])],
  ["101 aliases (maxItems)", (d) => (d.substances[0].aliases = Array.from({ length: 101 }, (_, i) => `a${i}`))],
  ["formulaAlias as text (boolean)", (d) => (d.substances[0].formulaAlias = "no")],
  ["id with a space (pattern)", (d) => (d.substances[0].id = "hb buffer")],
  ["id 'prototype' (not enum)", (d) => (d.substances[0].id = "prototype")],
  ["the file is an array (type)", (d) => Object.keys(d).forEach((k) => delete d[k])],
];

test.each(samples)("same verdict: %s", (what, edit) => {
  const doc = halvorsenLibrary();
  edit(doc);
  const valid = /\((valid|allowed)\)$/.test(what);
  expect(agree(doc)).toEqual({ ours: valid, ajv: valid });
});

test("non-objects and arrays at the top are refused by both", () => {
  for (const v of [null, 1, "x", [], [halvorsenLibrary()]]) expect(agree(v)).toEqual({ ours: false, ajv: false });
});

/** Every path into a JSON tree. */
function paths(v: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  const out = [prefix];
  if (Array.isArray(v)) v.forEach((x, i) => out.push(...paths(x, [...prefix, i])));
  else if (typeof v === "object" && v !== null) for (const [k, x] of Object.entries(v)) out.push(...paths(x, [...prefix, k]));
  return out;
}

const interesting = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }),
  fc.constantFrom("", "A", "a", "x".repeat(201), "hb-x", "Na2HPO4·7H2O", "published", "unverified", "1", "kJ/mol", -11, -1, 0, 0.5, 1, 2, 7.35, 31, 1e7, true, null, [], {}),
);

test("same verdict on 1000 random mutations of valid files", () => {
  const bases = [halvorsenLibrary(), BUILTIN_FILES["systems.json"], BUILTIN_FILES["ions.json"]].map((b) => JSON.parse(JSON.stringify(b)));
  fc.assert(
    fc.property(fc.nat(), fc.nat(), fc.constantFrom("replace", "delete", "add"), interesting, fc.string({ maxLength: 8 }), (b, p, op, value, key) => {
      const doc = JSON.parse(JSON.stringify(bases[b % bases.length]));
      const all = paths(doc);
      const path = all[p % all.length];
      const parent = path.slice(0, -1).reduce((o: any, k) => o[k], doc);
      const last = path[path.length - 1];
      if (op === "add") {
        const target = path.reduce((o: any, k) => o[k], doc);
        if (typeof target === "object" && target !== null && !Array.isArray(target) && key !== "__proto__") target[key] = value;
      } else if (path.length > 0) {
        if (op === "delete" && Array.isArray(parent)) parent.splice(last as number, 1);
        else if (op === "delete") delete parent[last];
        else parent[last] = value;
      }
      const verdict = agree(doc);
      if (verdict.ours !== verdict.ajv) {
        throw new Error(`disagreement at ${path.join(".")} (${op}): ours ${verdict.ours} [${checkShape(doc).map(formatIssue).join("; ")}], ajv ${verdict.ajv} ${JSON.stringify(validateWithAjv.errors)}`);
      }
      return true;
    }),
    { numRuns: 1000, seed: 20250314 },
  );
});

describe("messages a person can act on", () => {
  const messages = (edit: Edit): string[] => {
    const doc = halvorsenLibrary();
    edit(doc);
    return checkShape(doc).map(formatIssue);
  };
  test.each<[string, Edit, string]>([
    ["enum", (d) => (d.substances[0].nature = "buffer"), `substances[0].nature: must be one of "weak-acid-base", "strong-acid", "strong-base", "neutral-salt", "non-electrolyte"; found "buffer"`],
    ["if/then", (d) => delete d.systems[0].steps[0].pKa.source, "systems[0].steps[0].pKa: missing required field 'source' (a published value names its source)"],
    ["anyOf", (d) => delete d.substances[0].formula, "substances[0]: a substance needs a formula (its molar mass is computed) or a molarMass record"],
    ["const", (d) => (d.systems[0].steps[0].pKa.unit = "pH"), `systems[0].steps[0].pKa.unit: must be "1", found "pH" (pKa is dimensionless: unit '1')`],
    ["pattern", (d) => (d.substances[0].id = "HB Salt"), `substances[0].id: "HB Salt" is not valid (an id: lower-case letters, digits, '.', '_' or '-', starting with a letter or digit, at most 64 characters, not 'constructor' or 'prototype')`],
    ["type", (d) => (d.systems[0].topCharge = "1"), `systems[0].topCharge: expected an integer, found "1"`],
    ["required", (d) => delete d.substances[0].nature, "substances[0]: missing required field 'nature'"],
    ["additionalProperties", (d) => (d.substances[0].pH = 7), "substances[0].pH: unknown field 'pH'"],
  ])("%s", (_k, edit, expected) => {
    expect(messages(edit)).toEqual([expected]);
  });
});
