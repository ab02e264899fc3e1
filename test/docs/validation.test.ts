/**
 * The validation report for QA (npm run validate), run in-process on the case list: every published
 * check passes (known deviations are documented and asserted to stay within their bounds), every
 * case names its source and the reason for its tolerance, and the report carries the constants
 * fingerprint, every case id and the statement that it supports and does not replace the user's
 * own validation.
 */
import { CASES } from "../../scripts/validation/cases";
import { reportHtml, reportMarkdown, SUPPORT_STATEMENT } from "../../scripts/validation/report";
import { runValidation, type ValidationRun } from "../../scripts/validation/run";

let run: ValidationRun;
let md: string;

beforeAll(() => {
  run = runValidation(CASES);
  md = reportMarkdown(run, { version: "test", node: process.version, platform: process.platform, date: "2000-01-01T00:00:00.000Z" });
}, 120_000);

describe("validation cases", () => {
  test("every case has a source, conditions, something to evaluate and a tolerance with its reason", () => {
    for (const c of CASES) {
      expect({ id: c.id, ok: c.source.length > 10 && c.conditions.length > 3 }).toEqual({ id: c.id, ok: true });
      expect({ id: c.id, evaluates: [c.formula, c.sheet, c.engine].filter((x) => x !== undefined).length }).toEqual({ id: c.id, evaluates: 1 });
      expect({ id: c.id, ok: c.tolerance.value > 0 && c.tolerance.reason.length > 20 }).toEqual({ id: c.id, ok: true });
      if (c.formula !== undefined) expect(c.formula).toMatch(/^=.*AQ\.[A-Z_]+\(/);
    }
  });

  test("ids are unique", () => {
    expect(new Set(CASES.map((c) => c.id)).size).toBe(CASES.length);
  });

  test("covers each group the report promises", () => {
    const groups = new Set(CASES.map((c) => c.group.replace(/^\d+\. /, "")));
    for (const g of ["Primary pH standards at 25 °C", "Primary pH standards at other temperatures", "European Pharmacopoeia reference buffer solutions", "Buffer values of standards", "Ionization constant of water", "pKa at other temperatures (I = 0)", "Molar masses", "Preparation tables (mixtures of stocks)", "Identities (results fed back through AQ.PH)"]) {
      expect(groups.has(g)).toBe(true);
    }
  });
});

describe("validation run", () => {
  test("every case passes or deviates exactly as documented", () => {
    const failed = run.results.filter((r) => r.verdict === "fail").map((r) => `${r.case.id}: computed ${r.computed}, expected ${r.case.expected} ± ${r.case.tolerance.value} (${r.detail})`);
    expect(failed).toEqual([]);
    expect(run.failed).toBe(0);
    expect(run.passed + run.knownDeviations).toBe(CASES.length);
  });

  test("known deviations are the documented ones only", () => {
    const known = run.results.filter((r) => r.verdict === "known deviation").map((r) => r.case.id);
    expect(known).toEqual(CASES.filter((c) => c.knownDeviation !== undefined).map((c) => c.id));
  });

  test("the report carries the fingerprint, every case id, the summary and the support statement", () => {
    expect(run.fingerprint).toMatch(/^PL-\d+\.\d+\.\d+-[0-9a-f]{10}$/);
    expect(md).toContain(run.fingerprint);
    for (const c of CASES) expect(md).toContain(`| ${c.id} |`);
    expect(md).toContain(`${run.passed} passed, ${run.failed} failed`);
    expect(md).toContain(SUPPORT_STATEMENT);
    expect(md).toMatch(/calibrated pH meter/);
    expect(md).toMatch(/corrosive/);
    expect(md).toContain(process.version);
  });

  test("the HTML report holds the same content", () => {
    const html = reportHtml(md);
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain(run.fingerprint);
    for (const c of CASES) expect(html).toContain(c.id);
  });
});
