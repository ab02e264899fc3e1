/**
 * The function reference (docs/functions) cannot drift from the code:
 * - every function in the generated metadata has a page <id>.md with a summary and every section
 *   (Syntax, Arguments, Result, Formula, Method, Notes, Errors, References, Examples), listed in the
 *   index with a link, and its helpUrl points at that page;
 * - the syntax line and the argument table name exactly the metadata's parameters, in order, with
 *   optional parameters in [brackets]; every AQ.<NAME> mentioned in a page is a real function;
 * - every example's printed result is what the function gives now, within the printed precision
 *   (test/docs/printed-compare.ts).
 * Refresh the printed results after a deliberate change with: npx tsx scripts/docs/update-examples.ts
 *
 * Pages of functions that are documented but may not be registered yet are listed in PENDING with
 * the reason; while unregistered they get the structural checks only, and as soon as they are
 * registered every check applies to them (examples included).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { DOCS_DIR, REQUIRED_SECTIONS, functionsMentioned, pageFiles, readPage, type Page } from "../../scripts/docs/pages";
import { printedLines } from "../../scripts/docs/printed";
import { loadMetadata, type MetaFunction } from "./metadata";
import { comparePrinted } from "./printed-compare";

/** Documented functions that are not registered yet, with the reason (none at present). */
const PENDING: Record<string, string> = {};

let functions: MetaFunction[] = [];
const pages = new Map<string, Page>();

beforeAll(async () => {
  const meta = await loadMetadata();
  expect(meta.errors).toEqual([]);
  functions = meta.functions;
  for (const file of pageFiles()) {
    const page = readPage(file);
    if (page.id !== null) pages.set(page.id, page);
  }
}, 120_000);

const byId = (id: string) => functions.find((f) => f.id === id);

describe("function reference pages", () => {
  test("every page is named after its function and every function has a page", () => {
    for (const file of pageFiles()) {
      const page = readPage(file);
      expect({ file, id: page.id }).toEqual({ file, id: file.replace(/\.md$/, "").toUpperCase() });
    }
    for (const f of functions) expect({ id: f.id, page: pages.has(f.id) }).toEqual({ id: f.id, page: true });
  });

  test("a page for a function not in the metadata is pending, with a reason", () => {
    for (const id of pages.keys()) {
      if (byId(id) === undefined) expect({ id, pending: id in PENDING }).toEqual({ id, pending: true });
    }
  });

  test("helpUrl of every function points at its page", () => {
    for (const f of functions) expect(f.helpUrl).toBe(`https://localhost:3000/help/${f.id.toLowerCase()}.html`);
  });

  test("the index lists every function with a link to its page, and the cautions", () => {
    const index = readFileSync(join(DOCS_DIR, "README.md"), "utf8");
    for (const id of [...pages.keys()]) expect(index).toContain(`[AQ.${id}](./${id.toLowerCase()}.md)`);
    for (const f of functions) expect(index).toContain(`(./${f.id.toLowerCase()}.md)`);
    for (const heading of ["## Common arguments", "## Units", "## Error values", "## Cautions"]) expect(index).toContain(heading);
    expect(index).toMatch(/calibrated pH meter/);
    expect(index).toMatch(/corrosive/);
    expect(index).toMatch(/does not replace/);
    expect(functionsMentioned(index).filter((id) => !pages.has(id))).toEqual([]);
  });
});

describe.each(pageFiles().map((f) => [f]))("%s", (file) => {
  const page = readPage(file);
  const id = page.id as string;

  test("has a summary and every section, each with content", () => {
    expect(page.summary.length).toBeGreaterThan(40);
    for (const s of REQUIRED_SECTIONS) {
      expect({ section: s, present: page.sections.has(s) }).toEqual({ section: s, present: true });
    }
    for (const s of REQUIRED_SECTIONS.filter((x) => x !== "Arguments")) {
      expect({ section: s, length: (page.sections.get(s) ?? "").length > 10 }).toEqual({ section: s, length: true });
    }
  });

  test("notes state the validity range; references name published sources", () => {
    const notes = page.sections.get("Notes") ?? "";
    const refs = page.sections.get("References") ?? "";
    if (!["MOLARMASS", "CONSTANTS_ID"].includes(id)) {
      expect(notes).toMatch(/0\.3 mol\/L|I ≲ 0\.3/);
      expect(notes).toMatch(/0–100 °C/);
      expect(notes).toMatch(/complexation/);
    }
    expect(refs).toMatch(/^- \S/m);
  });

  test("syntax and arguments name exactly the function's parameters", () => {
    expect(page.syntax?.id).toBe(id);
    const meta = byId(id);
    if (meta === undefined) {
      // Pending: the page must at least agree with itself.
      expect(page.argumentNames).toEqual(page.syntax?.params.map((p) => p.name));
      return;
    }
    const expected = meta.parameters.map((p) => ({ name: p.name, optional: p.optional === true }));
    expect(page.syntax?.params).toEqual(expected);
    expect(page.argumentNames).toEqual(expected.map((p) => p.name));
  });

  test("every parameter named in the text (in `backticks`) is one of this function's parameters", () => {
    const meta = byId(id);
    if (meta === undefined) return;
    const all = new Set(functions.flatMap((f) => f.parameters.map((p) => p.name)));
    const own = new Set(meta.parameters.map((p) => p.name));
    const named = [...page.lines.join("\n").matchAll(/`([A-Za-z_]+)`/g)].map((m) => m[1]);
    expect(named.filter((w) => all.has(w) && !own.has(w))).toEqual([]);
  });

  test("every AQ function mentioned exists", () => {
    const unknown = functionsMentioned(page.lines.join("\n")).filter((f) => byId(f) === undefined && !(f in PENDING));
    expect(unknown).toEqual([]);
  });

  test("has at least one example of the function itself", () => {
    expect(page.examples.length).toBeGreaterThan(0);
    expect(page.examples.some((e) => e.formula.includes(`AQ.${id}(`))).toBe(true);
  });

  test("every example prints what the function gives now", () => {
    for (const ex of page.examples) {
      const called = functionsMentioned(ex.formula);
      if (called.some((f) => byId(f) === undefined)) {
        expect(called.every((f) => byId(f) !== undefined || f in PENDING)).toBe(true);
        continue;
      }
      if (ex.output.length === 0) {
        throw new Error(`${file}: the example ${ex.formula} has no printed result: run npx tsx scripts/docs/update-examples.ts`);
      }
      const diff = comparePrinted(ex.output, printedLines(ex.formula));
      if (diff !== null) throw new Error(`${file}: ${ex.formula}\n${diff}\n(after a deliberate change: npx tsx scripts/docs/update-examples.ts)`);
    }
  });
});
