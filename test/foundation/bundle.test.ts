/**
 * The production build (`npm run build`, run by `npm test` before jest) as Excel loads it: the
 * generated metadata, the two bundles, no HyperFormula (GPL, command line only) and no eval.
 */
import { existsSync, readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";

const dist = join(__dirname, "..", "..", "dist");
const built = existsSync(join(dist, "functions.js"));

function read(name: string): string {
  return readFileSync(join(dist, name), "utf8");
}

describe("production build", () => {
  beforeAll(() => {
    if (!built) throw new Error("dist/ is missing: run `npm run build` first (npm test does)");
  });

  test("emits the files the manifest points at", () => {
    for (const f of ["functions.js", "functions.json", "taskpane.html", "taskpane.js", "manifest.xml", "assets/icon-32.png"]) {
      expect({ file: f, exists: existsSync(join(dist, f)) }).toEqual({ file: f, exists: true });
    }
  });

  test("functions.json lists the functions and each is associated in functions.js", () => {
    const meta = JSON.parse(read("functions.json")) as { functions: { id: string }[] };
    const js = read("functions.js");
    expect(meta.functions.length).toBeGreaterThanOrEqual(8);
    for (const { id } of meta.functions) expect(js).toContain(`"${id}"`);
    expect(js).toMatch(/associate\(/);
  });

  test("the add-in bundles contain no HyperFormula and no eval", () => {
    for (const file of readdirSync(dist).filter((f) => f.endsWith(".js"))) {
      const js = read(file);
      expect({ file, hyperformula: /hyperformula|HyperFormula/.test(js) }).toEqual({ file, hyperformula: false });
      expect({ file, evalCall: /\beval\(|new Function\(/.test(js) }).toEqual({ file, evalCall: false });
    }
  });

  test("functions.js has mathjs's Unit class but none of the number libraries its typed functions bring (README, Performance (d))", () => {
    const js = read("functions.js");
    expect(js).toContain("Invalid argument in Unit.parse"); // mathjs's Unit class does the units
    // decimal.js, fraction.js, complex.js and typed-function, each by one of its own error messages:
    // about 185 kB that units of plain numbers never use (src/chem/unit-numbers.ts)
    const brought = { decimal: "[DecimalError]", fraction: "Division by Zero", complex: "Invalid Param", typed: "Unexpected type of argument" };
    const found = Object.entries(brought).filter(([, text]) => js.includes(text)).map(([name]) => name);
    expect(found).toEqual([]);
  });

  test("the task pane page loads office.js before the functions and task pane bundles", () => {
    const html = read("taskpane.html");
    const office = html.indexOf("office.js");
    const functions = html.indexOf("functions.js");
    const taskpane = html.indexOf("taskpane.js");
    expect(office).toBeGreaterThan(-1);
    expect(functions).toBeGreaterThan(office);
    expect(taskpane).toBeGreaterThan(functions);
  });
});
