/**
 * The reference cases (test/reference/*.json) are complete records, cite sections of
 * docs/references.md that exist, and live in one place: a table's distinctive values typed again in
 * test/ or scripts/ fail here (read them with casesOf / referenceCase instead).
 */
import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import { casesOf, evaluate, printedValue, REFERENCE_TABLES } from "../reference";

const root = join(__dirname, "..", "..");
const referencesMd = readFileSync(join(root, "docs", "references.md"), "utf8");

/** GitHub's anchor of a Markdown heading. */
function anchor(heading: string): string {
  return heading
    .trim()
    .toLowerCase()
    .replace(/[^\p{L}\p{N} -]/gu, "")
    .replace(/ /g, "-");
}
const anchors = new Set(referencesMd.split("\n").filter((l) => l.startsWith("#")).map((l) => anchor(l.replace(/^#+/, ""))));

describe("reference tables", () => {
  const tables = [...REFERENCE_TABLES.values()];

  test("there are tables, and every one is a complete record", () => {
    expect(tables.length).toBeGreaterThanOrEqual(10);
    for (const t of tables) {
      const where = { id: t.id };
      expect({ ...where, ok: [t.title, t.source, t.locator, t.verified, t.conditions, t.unit].every((x) => typeof x === "string" && x.length > 1) }).toEqual({ ...where, ok: true });
      expect({ ...where, status: ["V", "X"].includes(t.status) }).toEqual({ ...where, status: true });
      expect({ ...where, quantity: ["pH", "beta", "pKw", "pKw-density", "pK", "molar-mass", "debye-huckel-A", "reagent-molarity", "mean-activity-coefficient", "osmotic-coefficient", "log-conditional-K", "freezing-point-depression"].includes(t.quantity) }).toEqual({ ...where, quantity: true });
      expect({ ...where, tolerance: t.tolerance.value > 0 && t.tolerance.reason.length > 20 }).toEqual({ ...where, tolerance: true });
      expect({ ...where, cases: t.cases.length > 0 }).toEqual({ ...where, cases: true });
    }
  });

  test("every table points at a section of docs/references.md that exists", () => {
    for (const t of REFERENCE_TABLES.values()) {
      const [file, hash] = t.see.split("#");
      expect({ id: t.id, file, known: anchors.has(hash) }).toEqual({ id: t.id, file: "docs/references.md", known: true });
    }
  });

  test("every case has a unique id, a finite expected value and what its quantity needs", () => {
    const ids = new Set<string>();
    for (const t of REFERENCE_TABLES.values()) {
      for (const c of casesOf(t.id)) {
        expect(ids.has(c.id)).toBe(false);
        ids.add(c.id);
        expect({ id: c.id, finite: Number.isFinite(c.expected) }).toEqual({ id: c.id, finite: true });
        expect({ id: c.id, tolerance: c.tolerance.value > 0 && c.tolerance.reason.length > 20 }).toEqual({ id: c.id, tolerance: true });
        const needs =
          t.quantity === "pH" || t.quantity === "beta" || t.quantity === "mean-activity-coefficient" || t.quantity === "osmotic-coefficient" || t.quantity === "freezing-point-depression"
            ? (c.mixture?.length ?? 0) > 0 && c.mixture!.every(([n, a]) => n.length > 0 && a > 0) && c.temperatureC !== undefined
            : t.quantity === "pK"
              ? c.system !== undefined && Number.isInteger(c.step) && c.temperatureC !== undefined
              : t.quantity === "pKw" || t.quantity === "debye-huckel-A"
                ? c.temperatureC !== undefined
                : t.quantity === "pKw-density"
                ? c.temperatureC !== undefined && (c.densityGPerCm3 ?? 0) > 0
                : t.quantity === "reagent-molarity"
                ? c.substance !== undefined && c.source !== undefined
                : t.quantity === "log-conditional-K"
                ? (c.mixture?.length ?? 0) > 0 && c.complex !== undefined && c.ligand !== undefined && c.metalIon !== undefined
                : c.substance !== undefined && (c.factor ?? 0) > 0;
        expect({ id: c.id, needs }).toEqual({ id: c.id, needs: true });
        if (!t.equation && c.printed !== undefined) expect({ id: c.id, printed: Number(c.printed) }).toEqual({ id: c.id, printed: c.expected });
        if (c.status !== undefined) expect({ id: c.id, status: ["V", "X"].includes(c.status) && (c.status === t.status || t.status === "X") }).toEqual({ id: c.id, status: true });
        if (c.knownDeviation) expect({ id: c.id, bound: c.knownDeviation.bound > c.tolerance.value && c.knownDeviation.reason.length > 20 }).toEqual({ id: c.id, bound: true });
      }
    }
  });

  test("an equation as typed gives the printed check values of its source", () => {
    for (const t of REFERENCE_TABLES.values()) {
      if (!t.equation) continue;
      for (const c of t.cases.filter((x) => x.printed !== undefined)) {
        const diff = Math.abs(evaluate(t.equation, c.temperatureC!) - printedValue(c));
        expect({ id: c.id, within: diff <= t.equation.printedTolerance.value }).toEqual({ id: c.id, within: true });
      }
    }
  });
});

describe("one home for reference values", () => {
  function files(dir: string): string[] {
    return readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
      const p = join(dir, d.name);
      if (d.isDirectory()) return d.name === "reference" || d.name === "node_modules" ? [] : files(p);
      return /\.(ts|js|mjs)$/.test(d.name) ? [p] : [];
    });
  }
  const sources = [...files(join(root, "test")), ...files(join(root, "scripts"))]
    .filter((p) => !p.endsWith("reference-cases.test.ts"))
    .map((p) => ({ file: relative(root, p), text: readFileSync(p, "utf8") }));

  // Values that identify a published table: stock volumes, table entries and equation coefficients
  // that no other check would type by chance.
  const distinctive: [string, RegExp][] = [
    ["Sørensen phosphate volumes", /\b(87\.7|81\.5|68\.5)\b/],
    ["KHP–HCl volumes", /\b(42\.2|28\.9|22\.3|15\.7)\b/],
    ["acetate table volumes", /\b176\b.{0,6}\b24\b|\b102\b.{0,6}\b98\b/],
    ["CRC pKw table", /\b(14\.938|14\.727|14\.528|13\.685|12\.613|12\.265)\b/],
    ["Hetzer KHP equation", /\b(2073\.44|3\.4846e-5)\b/],
    ["Bates–Hetzer Tris equation", /\b(2981\.4|3\.5888|0\.005571)\b/],
    ["Bates–Acree phosphate equation", /\b(172\.1033|8814\.715|27\.927)\b/],
    ["pH(S) of the primary standards", /\b(4\.005|10\.012|7\.413|7\.382|0\.03043)\b/],
    ["Ph. Eur. table", /\b(9\.28|10\.12|10\.06|7\.45)\b/],
    ["Freeze & Cherry A table", /\b(0\.4883|0\.5042|0\.5221|0\.5425)\b/],
    ["IAPWS check value", /\b13\.906565\b/],
  ];

  test.each(distinctive)("%s: typed only in test/reference", (_what, pattern) => {
    const copies = sources.filter((s) => pattern.test(s.text)).map((s) => s.file);
    expect(copies).toEqual([]);
  });
});
