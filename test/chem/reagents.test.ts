/**
 * Concentrated reagents (chem/reagents.ts, data/reagent-density.json): the molarity of each reagent
 * as supplied against published values (test/reference/concentrated-reagents.json; sources in
 * docs/references.md, section 8), the data file's provenance, interpolation and refusals.
 */
import data from "../../src/chem/data/reagent-density.json";
import { reagentRange, reagentStock } from "../../src/chem/reagents";
import { waterDensity } from "../../src/chem/water-density";
import { casesOf, referenceTable } from "../reference";
import { evaluateFormula } from "../../src/cli/evaluate";

/** mol/L of a reagent as the spreadsheet reads it: RECIPE's mol over its litres of stock. */
function molarityInSheet(reagent: string): number {
  // one of the reagent's own systems against a strong titrant, or the strong reagent against Tris
  const formula = /acetic/i.test(reagent)
    ? `=AQ.RECIPE("${reagent}","NaOH",4.8,0.1,1)`
    : /phosphoric/i.test(reagent)
      ? `=AQ.RECIPE("${reagent}","NaOH",7,0.1,1)`
      : /ammonia/i.test(reagent)
        ? `=AQ.RECIPE("HCl","${reagent}",9.2,0.1,1)`
        : /NaOH|sodium hydroxide/i.test(reagent)
          ? `=AQ.RECIPE("Tris HCl","${reagent}",8,0.1,1)`
          : `=AQ.RECIPE("${reagent}","Tris",8,0.1,1)`;
  const r = evaluateFormula(formula);
  if (r.error !== undefined || !Array.isArray(r.value)) throw new Error(`${formula} → ${r.error} ${r.message}`);
  const row = r.value.slice(1).find((x) => typeof x[3] === "number");
  if (!row) throw new Error(`${formula}: no row with litres of stock`);
  return (row[1] as number) / (row[3] as number);
}

describe("molarity of concentrated reagents against published tables", () => {
  const t = referenceTable("concentrated-reagents");
  test.each(casesOf(t.id).map((c) => [c.id, c] as const))("%s", (_id, c) => {
    const actual = molarityInSheet(c.substance!);
    if (!(Math.abs(actual - c.expected) <= c.tolerance.value)) {
      throw new Error(`${c.label} (${c.source}): ${actual} mol/L, published ${c.printed} ± ${c.tolerance.value} (${c.tolerance.reason})`);
    }
  });
});

describe("data/reagent-density.json", () => {
  const reagents = data.reagents as Record<string, { points: { percent: number; density: number; status: string; source?: string; note?: string }[] }>;

  test("every point has a known source or says from memory, unverified; mass fractions rise", () => {
    for (const [id, r] of Object.entries(reagents)) {
      r.points.forEach((p, i) => {
        const where = { id, percent: p.percent };
        const sourced = (p.status === "published" || p.status === "common-practice") && p.source !== undefined && p.source in data.sources;
        const unverified = p.status === "unverified" && /from memory, unverified/.test(p.note ?? "");
        expect({ ...where, provenance: sourced || unverified }).toEqual({ ...where, provenance: true });
        if (i > 0) expect({ ...where, rising: p.percent > r.points[i - 1].percent }).toEqual({ ...where, rising: true });
      });
    }
  });

  test("the 0 % point of each table is pure water at 20 °C as the engine computes it", () => {
    for (const r of Object.values(reagents)) expect(Math.abs(r.points[0].density - waterDensity(293.15))).toBeLessThan(5e-5);
  });

  test("at a table point the density is the point's; between two points it lies between them", () => {
    const a = reagentStock("hydrochloric-acid", "hydrochloric acid", 36.46, 36);
    expect(a.ok && a.density).toBe(1.179);
    const b = reagentStock("hydrochloric-acid", "hydrochloric acid", 36.46, 37);
    expect(b.ok && b.density > 1.179 && b.density < 1.189).toBe(true);
    // c = 1000·w·ρ/M and g per mol = M/w: a litre weighs ρ kg
    if (b.ok) expect(Math.abs(b.conc * b.gramsPerMol - 1000 * b.density)).toBeLessThan(1e-9);
  });

  test.each([
    ["hydrochloric-acid", 40, /outside the density table of hydrochloric acid \(0–38 % HCl by mass at 20 °C\)/],
    ["sodium-hydroxide", 52, /outside the density table.*0–50 %/],
    ["ammonia", 35, /outside the density table.*0–30 % NH3/],
    ["potassium-hydroxide", 45, /has no density table/],
    ["hydrochloric-acid", 0, /positive percentage/],
  ])("%s at %s %% is refused", (id, percent, message) => {
    const r = reagentStock(id as string, (id as string).replace(/-/g, " "), 40, percent as number);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message as RegExp);
  });

  test("ranges as the data gives them", () => {
    expect(reagentRange("phosphoric-acid")).toEqual({ min: 0, max: 85 });
    expect(reagentRange("sodium-chloride")).toBeUndefined();
  });
});
