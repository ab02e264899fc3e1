/**
 * The pane gives no pH-derived number beyond the ionic-strength limit, and says why in the
 * function's own words (issue 14, item 2: "the pane shows the same refusal as the function"): Try
 * it and the Picture view ask the same engine (src/chem), so 2 M NaOH is refused in both with the
 * message =AQ.PH gives, and a titration curve that crosses the limit draws no point beyond it.
 * The browser suite (charts.browser.test.ts) checks the same on the screen.
 */
import { evaluateFormula } from "../../src/cli/evaluate";
import { getActiveLibrary, resetActiveLibrary } from "../../src/library";
import { pictureOf } from "../../src/taskpane/charts/picture";
import { tryMixture } from "../../src/taskpane/tryit";

beforeAll(() => resetActiveLibrary());

function functionRefusal(formula: string): string {
  const r = evaluateFormula(formula);
  expect(r.error).toBe("#N/A");
  return r.message ?? "";
}

describe("2 M NaOH in the pane: the function's refusal, no pH", () => {
  const rows = [{ name: "NaOH", amount: "2" }];

  test("Try it: no pH, the message of =AQ.PH(\"NaOH\",2)", () => {
    const expected = functionRefusal('=AQ.PH("NaOH",2)');
    expect(expected).toMatch(/^The ionic strength would be 2 mol\/L, beyond the 1 mol\/L limit of the activity models/);
    const r = tryMixture(getActiveLibrary(), rows, "");
    expect(r).toEqual({ ok: false, issues: [{ row: -1, field: "mixture", message: expected }] });
  });

  test("Picture: no speciation diagram and no curve, the same message", () => {
    const r = pictureOf(getActiveLibrary(), { rows, temperature: "" });
    expect(r).toEqual({ ok: false, issues: [functionRefusal('=AQ.PH("NaOH",2)')] });
  });

  test("the same text typed with a unit, and at 37 °C, is refused the same way", () => {
    const r = tryMixture(getActiveLibrary(), [{ name: "sodium hydroxide", amount: "2000 mM" }], "37");
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issues[0].message).toBe(functionRefusal('=AQ.PH("sodium hydroxide","2000 mM",37)'));
  });

  test("1 M NaOH (at the limit, not beyond it) has a pH in the pane, equal to the function's", () => {
    const r = tryMixture(getActiveLibrary(), [{ name: "NaOH", amount: "1" }], "");
    expect(r.ok && r.pH).toBe(evaluateFormula('=AQ.PH("NaOH",1)').value);
  });
});

describe("a titration curve in the Picture that crosses the limit", () => {
  test("0.5 M NaOH titrated with 5 M HCl to 10 mL: points beyond the limit are not drawn, and a note says from where", () => {
    const r = pictureOf(getActiveLibrary(), { rows: [{ name: "NaOH", amount: "0.5" }], temperature: "", titrant: "HCl", stock: "5", sample: "10 mL", maxVolume: "10 mL" });
    expect(r.ok).toBe(true);
    if (!r.ok || !r.titration.ok) throw new Error("expected a curve");
    const data = r.titration.data;
    const note = data.warnings.find((w) => w.startsWith("No pH is drawn from"));
    const m = /^No pH is drawn from ([\d.]+) mL on: The ionic strength would be [\d.]+ mol\/L, beyond the 1 mol\/L limit/.exec(note ?? "");
    expect({ note, matched: m !== null }).toEqual({ note, matched: true });
    const from = Number((m as RegExpExecArray)[1]);
    // the same titration as a formula: AQ.CURVE's cells are the pH drawn, or #N/A where nothing is drawn
    const table = evaluateFormula('=AQ.CURVE("NaOH",0.5,"HCl",5,0.01,0.01,161)').value as unknown[][];
    const cells = table.slice(1).map((row) => ({ mL: (row[0] as number) * 1000, pH: row[1] }));
    const drawn = cells.filter((c) => typeof c.pH === "number");
    const refused = cells.filter((c) => typeof c.pH !== "number");
    expect(drawn.length).toBeGreaterThan(1);
    expect(refused.length).toBeGreaterThan(1);
    expect(data.points.length).toBe(drawn.length);
    data.points.forEach((p, i) => {
      expect(Math.abs(p.mL - drawn[i].mL)).toBeLessThan(1e-9);
      expect(p.pH).toBe(drawn[i].pH);
      expect(p.mL).toBeLessThan(from);
    });
    for (const c of refused) expect(c.pH).toMatchObject({ error: "#N/A", message: expect.stringMatching(/beyond the 1 mol\/L limit/) });
    // the note names the first refused volume (3 digits), where the ionic strength is beyond 1 mol/L
    expect(from).toBe(Number(refused[0].mL.toPrecision(3)));
    const v = refused[0].mL / 1000;
    const I = evaluateFormula(`=AQ.IONIC({"NaOH";"HCl"},{${(0.5 * 0.01) / (0.01 + v)};${(5 * v) / (0.01 + v)}})`).value as number;
    expect(I).toBeGreaterThan(1);
  });
});
