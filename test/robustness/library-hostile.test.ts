/**
 * Hostile library files and damaged storage, judged where a user feels them: in the AQ functions.
 * (test/library/io.test.ts and storage.test.ts cover the library's own API case by case; this adds
 * the systematic sweeps — a wrong type at every path, an unsafe key at every object, 20 MB files,
 * deep nesting, HTML/script names — and checks AQ.CONSTANTS_ID, AQ.PH and friends after each.)
 *
 * A rejected import leaves the library in use exactly as it was (same object, same fingerprint,
 * same function results) with a message naming the problem; prototypes stay clean. A stored layer
 * that cannot be read leaves the functions on the layers below, reports the problem, and keeps the
 * stored text.
 */
import { AQ } from "../support/aq-values";
import {
  BUILTIN_LIBRARY,
  createLibrary,
  createMemoryStorage,
  encodeBlob,
  exportLibraryText,
  getActiveLibrary,
  getLayerProblems,
  importIntoLayer,
  loadLayer,
  makeBlob,
  parseLibraryText,
  resetActiveLibrary,
  setLayer,
} from "../../src/library";
import type { LibraryDoc } from "../../src/library/types";
import { halvorsenLibrary } from "../library/helpers";
import { outcomeOf } from "./outcome";

const BUILTIN_FP = createLibrary({ builtin: BUILTIN_LIBRARY }).fingerprint();
const PROTO_NAMES = Object.getOwnPropertyNames(Object.prototype).sort();
const ARRAY_PROTO_NAMES = Object.getOwnPropertyNames(Array.prototype).sort();

/** What the functions say now: fingerprint, a few results (values or error texts). */
function functionsSnapshot(): Record<string, unknown> {
  const show = (fn: (...a: any[]) => unknown, args: unknown[]) => {
    const o = outcomeOf(fn, args);
    return o.kind === "value" ? o.value : o.kind === "error" ? `${o.code} ${o.message}` : "escaped";
  };
  return {
    id: show(AQ.CONSTANTS_ID, []),
    acetate: show(AQ.PH, [[["acetic acid"], ["sodium acetate"]], [[0.1], [0.1]]]),
    phosphate37: show(AQ.PH, [[["KH2PO4"], ["Na2HPO4"]], [[0.025], [0.025]], 37, "debye-huckel"]),
    hbs: show(AQ.PH, [[["HBS-7"]], [[0.05]]]),
    hbsMass: show(AQ.MOLARMASS, ["HBS-7"]),
    pka: show(AQ.PKA, ["phosphate", 2, 25, 0.1]),
  };
}

function expectPrototypesClean(): void {
  expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(PROTO_NAMES);
  expect(Object.getOwnPropertyNames(Array.prototype).sort()).toEqual(ARRAY_PROTO_NAMES);
  expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  expect(Object.getPrototypeOf({})).toBe(Object.prototype);
}

/** Every path (as keys) in a JSON value, parents before children, the root excluded. */
function pathsOf(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (typeof value !== "object" || value === null) return [];
  const keys: (string | number)[] = Array.isArray(value) ? value.map((_, i) => i) : Object.keys(value);
  return keys.flatMap((k) => [[...prefix, k], ...pathsOf((value as Record<string | number, unknown>)[k], [...prefix, k])]);
}

function at(doc: unknown, path: (string | number)[]): unknown {
  return path.reduce<unknown>((v, k) => (v as Record<string | number, unknown>)[k], doc);
}

const copy = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

let before: Record<string, unknown>;
let library: ReturnType<typeof getActiveLibrary>;

beforeEach(() => {
  resetActiveLibrary();
  expect(setLayer("workbook", halvorsenLibrary()).ok).toBe(true);
  library = getActiveLibrary();
  before = functionsSnapshot();
  expect(typeof before.hbs).toBe("number"); // the workbook layer is in use
});

/** Imports `text`; if it was refused, checks that nothing changed. Returns the result. */
function importAndCheck(text: string, layer: "workbook" | "personal" = "workbook", mode: "replace" | "merge" = "replace") {
  const r = importIntoLayer(layer, text, mode);
  if (!r.ok) {
    expect(typeof r.message === "string" && r.message.trim().length > 0).toBe(true);
    expect(getActiveLibrary()).toBe(library);
  }
  expectPrototypesClean();
  return r;
}

describe("a wrong type at every path of a library file", () => {
  const WRONG: unknown[] = [null, "text", "", 42, -1, 0.5, 1e308, true, [], {}, ["x"], { value: 1 }];

  test("each import is refused with the path named, or accepted; a refusal changes nothing the functions show", () => {
    const doc = halvorsenLibrary();
    const paths = pathsOf(doc);
    let refused = 0;
    let accepted = 0;
    const problems: string[] = [];
    for (const path of paths) {
      for (const wrong of WRONG) {
        const d = copy(doc) as unknown as Record<string, unknown>;
        const parent = at(d, path.slice(0, -1)) as Record<string | number, unknown>;
        const key = path[path.length - 1];
        if (JSON.stringify(parent[key]) === JSON.stringify(wrong)) continue;
        parent[key] = wrong;
        const r = importAndCheck(JSON.stringify(d));
        if (r.ok) {
          accepted++; // a value of another type that is still valid there (a note "text" for a note)
          expect(setLayer("workbook", halvorsenLibrary()).ok).toBe(true);
          library = getActiveLibrary();
          continue;
        }
        refused++;
        const where = path.map((k) => (typeof k === "number" ? `[${k}]` : `.${k}`)).join("").replace(/^\./, "");
        // The error may sit where the value is used (a changed id breaks the references to it).
        if (r.errors.length === 0 || r.errors.some((e) => typeof e.path !== "string" || e.message.trim() === "")) {
          problems.push(`${where} = ${JSON.stringify(wrong)}: errors ${JSON.stringify(r.errors.slice(0, 2))}`);
        }
      }
    }
    console.log(`library wrong-type sweep: ${paths.length} paths × ${WRONG.length} values → ${refused} refused, ${accepted} accepted`);
    expect(problems.slice(0, 5)).toEqual([]);
    expect(refused).toBeGreaterThan(paths.length * 6);
    expect(functionsSnapshot()).toEqual(before);
  });
});

describe("prototype-pollution keys at every level", () => {
  test("__proto__, constructor and prototype in every object of a file are refused, prototypes stay clean", () => {
    const doc = halvorsenLibrary();
    const objects: (string | number)[][] = [[], ...pathsOf(doc).filter((p) => { const v = at(doc, p); return typeof v === "object" && v !== null && !Array.isArray(v); })];
    let cases = 0;
    for (const path of objects) {
      for (const key of ["__proto__", "constructor", "prototype"]) {
        for (const payload of [{ polluted: true }, "polluted", [{ polluted: true }]]) {
          const d = copy(doc) as unknown as Record<string, unknown>;
          const target = at(d, path) as Record<string, unknown>;
          // defineProperty: an own "__proto__" key, which JSON.stringify writes out like any other.
          Object.defineProperty(target, key, { value: payload, enumerable: true, configurable: true, writable: true });
          const text = JSON.stringify(d);
          expect(text).toContain(`"${key}":`);
          const r = importAndCheck(text);
          cases++;
          expect(r).toMatchObject({ ok: false, code: "unsafe-key" });
          if (!r.ok) expect(r.message).toContain(key);
          // merge mode and the personal layer take the same road
          expect(importAndCheck(text, "personal", "merge")).toMatchObject({ ok: false, code: "unsafe-key" });
        }
      }
    }
    console.log(`prototype-pollution sweep: ${cases} files refused (${objects.length} objects × 3 keys × 3 payloads)`);
    expect(functionsSnapshot()).toEqual(before);
  });

  test("the same keys inside the text of a 'valid' value are inert (an alias '__proto__' is just a name)", () => {
    const d = halvorsenLibrary();
    d.substances![0].aliases = ["__proto__", "constructor-salt", "toString", "hasOwnProperty"];
    const r = importAndCheck(JSON.stringify(d));
    expect(r.ok).toBe(true);
    for (const alias of ["__proto__", "toString", "hasOwnProperty"]) {
      expect(AQ.MOLARMASS(alias)).toBe(AQ.MOLARMASS("HB buffer salt"));
    }
    expect(outcomeOf(AQ.MOLARMASS, ["valueOf"])).toMatchObject({ kind: "error", code: "#VALUE!" });
    expectPrototypesClean();
  });
});

describe("files no library is made of", () => {
  const big = (n: number, unit = "x") => `{"format":"protolyte-library","schemaVersion":1,"name":"x","description":"${unit.repeat(n)}"}`;
  const deep = (n: number) => `{"format":"protolyte-library","schemaVersion":1,"name":"x","description":${"[".repeat(n)}${"]".repeat(n)}}`;
  const deepObject = (n: number) => `{"format":"protolyte-library","schemaVersion":1,"name":"x","sources":${'{"a":'.repeat(n)}1${"}".repeat(n)}}`;
  const cases: [string, () => string, string, RegExp][] = [
    ["a 20 MB file", () => big(20 * 1024 * 1024), "too-large", /20\.0 MB; library files are limited to 5\.0 MB/],
    ["5.4 MB of two-byte characters (2.8 M characters)", () => big(2.7 * 1024 * 1024, "é"), "too-large", /5\.4 MB/],
    ["arrays nested a million deep", () => deep(1_000_000), "unsafe-key", /nested deeper than 32 levels/],
    ["objects nested 300 000 deep", () => deepObject(300_000), "unsafe-key", /nested deeper than 32 levels/],
    ["empty text", () => "", "not-json", /not valid JSON/],
    ["whitespace", () => "  \n\t ", "not-json", /not valid JSON/],
    ["a byte-order mark only", () => "\ufeff", "not-json", /not valid JSON/],
    ["truncated", () => JSON.stringify(halvorsenLibrary()).slice(0, 200), "not-json", /not valid JSON/],
    ["a trailing comma", () => JSON.stringify(halvorsenLibrary()).replace(/}$/, ",}"), "not-json", /not valid JSON/],
    ["NaN as a value", () => JSON.stringify(halvorsenLibrary()).replace('"value":7.35', '"value":NaN'), "not-json", /not valid JSON/],
    ["single quotes", () => "{'format':'protolyte-library'}", "not-json", /not valid JSON/],
    ["binary garbage", () => "\u0000\u0001\u00ff\ud800PK\u0003\u0004", "not-json", /not valid JSON/],
    ["null", () => "null", "wrong-format", /not a Protolyte library file/],
    ["an array", () => "[]", "wrong-format", /not a Protolyte library file/],
    ["a number", () => "42", "wrong-format", /not a Protolyte library file/],
    ["a string", () => '"protolyte-library"', "wrong-format", /not a Protolyte library file/],
    ["a stored blob imported as a file", () => encodeBlob(makeBlob(halvorsenLibrary())), "wrong-format", /not a Protolyte library file/],
    ["schemaVersion missing", () => JSON.stringify({ ...halvorsenLibrary(), schemaVersion: undefined }), "wrong-version", /must be 1, found undefined/],
    ["schemaVersion 0", () => JSON.stringify({ ...halvorsenLibrary(), schemaVersion: 0 }), "wrong-version", /must be 1, found 0/],
    ["schemaVersion 1.5", () => JSON.stringify({ ...halvorsenLibrary(), schemaVersion: 1.5 }), "wrong-version", /must be 1, found 1\.5/],
    ["schemaVersion 1e308", () => JSON.stringify(halvorsenLibrary()).replace('"schemaVersion":1', '"schemaVersion":1e308'), "newer-version", /newer Protolyte/],
    ["schemaVersion null", () => JSON.stringify({ ...halvorsenLibrary(), schemaVersion: null }), "wrong-version", /must be 1, found null/],
    ["duplicate system ids", () => JSON.stringify({ ...halvorsenLibrary(), systems: [...halvorsenLibrary().systems!, ...halvorsenLibrary().systems!] }), "invalid", /duplicate id 'hb-zwitterion'/],
    ["duplicate ion ids", () => JSON.stringify({ ...halvorsenLibrary(), ions: [{ id: "hb-x", name: "x", formula: "X+", charge: 1 }, { id: "hb-x", name: "y", formula: "Y+", charge: 1 }] }), "invalid", /duplicate id 'hb-x'/],
    ["an id that differs only by case", () => JSON.stringify({ ...halvorsenLibrary(), systems: [{ ...halvorsenLibrary().systems![0], id: "HB-Zwitterion" }] }), "invalid", /id/],
  ];

  test.each(cases)("%s: refused with a clear message, nothing changes", (_what, make, code, message) => {
    const text = make();
    const t0 = Date.now();
    const r = importAndCheck(text);
    const ms = Date.now() - t0;
    expect(r).toMatchObject({ ok: false, code });
    if (!r.ok) expect(r.message).toMatch(message);
    expect(ms).toBeLessThan(15_000);
    expect(functionsSnapshot()).toEqual(before);
  });

  test("parseLibraryText never throws on non-text", () => {
    for (const v of [null, undefined, 42, {}, [], Symbol("x")]) {
      expect(parseLibraryText(v as unknown as string)).toMatchObject({ ok: false, code: "not-json" });
    }
  });
});

describe("names containing HTML and script", () => {
  const PAYLOADS = ["<img src=x onerror=alert(1)>", "<script>alert(1)</script>", '"><svg onload=alert(1)>', "javascript:alert(1)", "{{7*7}} ${7*7}"];

  test("are stored and exported as the same text, and the functions treat them as plain names", () => {
    const d = halvorsenLibrary();
    d.substances![0].name = PAYLOADS[0];
    d.substances![0].aliases = PAYLOADS.slice(1);
    d.systems![0].name = PAYLOADS[1];
    d.sources!["hb-sop-117"].title = PAYLOADS[2];
    const r = importAndCheck(JSON.stringify(d));
    expect(r.ok).toBe(true);
    const exported = exportLibraryText(getActiveLibrary().layers.workbook as LibraryDoc);
    for (const p of PAYLOADS) expect(exported).toContain(JSON.stringify(p).slice(1, -1));
    expect(parseLibraryText(exported, [BUILTIN_LIBRARY]).ok).toBe(true);
    for (const p of PAYLOADS) expect(AQ.MOLARMASS(p)).toBe(AQ.MOLARMASS("hb-buffer-salt"));
    const table = AQ.SPECIES([[PAYLOADS[0]]], [[0.05]]);
    expect(table.flat()).toContain("HL"); // species names as data, untouched
    // An unknown name echoes what was typed as text, one line, within the message limit.
    const o = outcomeOf(AQ.PH, [[["<img src=y onerror=alert(2)>"]], [[0.1]]]);
    expect(o).toMatchObject({ kind: "error", code: "#VALUE!", message: expect.stringContaining("<img src=y onerror=alert(2)>") });
  });
});

describe("stored libraries that cannot be used", () => {
  const good = () => encodeBlob(makeBlob(halvorsenLibrary(), new Date("2025-03-14T09:30:00.000Z")));
  const damaged: [string, () => string, string][] = [
    ["truncated", () => good().slice(0, 150), "corrupt"],
    ["binary garbage", () => "\u0000\u00ff\ud800garbage", "corrupt"],
    ["empty text", () => "", "corrupt"],
    ["JSON null", () => "null", "corrupt"],
    ["a blob of a newer storage version", () => good().replace('"blobVersion":1', '"blobVersion":9'), "newer-version"],
    ["a library of a newer schema", () => good().replace('"schemaVersion":1', '"schemaVersion":2'), "newer-version"],
    ["a library with a wrong type", () => good().replace('"topCharge":0', '"topCharge":[]'), "corrupt"],
    ["a library with __proto__", () => good().replace('"name":"HB zwitterion"', '"name":"HB zwitterion","__proto__":{"polluted":true}'), "corrupt"],
    ["a blob with no library", () => '{"format":"protolyte-stored-library","blobVersion":1,"savedAt":"2025-03-14T09:30:00.000Z"}', "corrupt"],
    ["a library nested a million deep", () => good().replace(/"library":.*}$/, `"library":${"[".repeat(1_000_000)}${"]".repeat(1_000_000)}}`), "corrupt"],
    ["20 MB in a name", () => good().replace('"name":"HB buffer salt"', `"name":"${"x".repeat(20 * 1024 * 1024)}"`), "corrupt"],
  ];

  test.each(damaged)("%s: the functions keep working on the built-in data, the problem is reported, the stored text is kept", async (_what, make, code) => {
    const raw = make();
    const storage = createMemoryStorage(raw);
    const r = await loadLayer("workbook", storage);
    expect(r).toMatchObject({ ok: false, code });
    if (!r.ok) expect(r.raw === raw || (r.raw !== null && r.raw.length > 0)).toBe(true);
    expect(storage.peek()).toBe(raw); // nothing discarded
    expect(getLayerProblems()).toEqual([{ layer: "workbook", code, message: expect.any(String) }]);
    expect(getLayerProblems()[0].message.length).toBeGreaterThan(0);
    expectPrototypesClean();
    const now = functionsSnapshot();
    expect(now.id).toBe(BUILTIN_FP);
    expect(now.acetate).toBe(before.acetate);
    expect(now.phosphate37).toBe(before.phosphate37);
    expect(now.pka).toBe(before.pka);
    expect(now.hbs).toMatch(/^#VALUE! Unknown substance 'HBS-7'/); // the workbook's own entry is not in effect
  });

  test("a blob with __proto__ beside the library: the wrapper key is inert, the library loads, prototypes stay clean", async () => {
    const raw = good().replace('{"format"', '{"__proto__":{"polluted":true},"format"');
    expect(raw.startsWith('{"__proto__"')).toBe(true);
    const r = await loadLayer("workbook", createMemoryStorage(raw));
    expect(r.ok).toBe(true);
    expectPrototypesClean();
    expect(functionsSnapshot()).toEqual(before);
  });

  test("after a damaged personal layer, a good workbook layer stays in effect", async () => {
    const r = await loadLayer("personal", createMemoryStorage("{oops"));
    expect(r.ok).toBe(false);
    expect(functionsSnapshot()).toEqual(before);
    expect(getLayerProblems().map((p) => p.layer)).toEqual(["personal"]);
  });
});
