/**
 * Issue 14 ("every verdict, limit and message tells the truth"): each case of the issue as a formula
 * typed by a user, evaluated through the headless spreadsheet engine (HyperFormula), asserting the
 * value or message against an identity of the engine itself (the same quantity computed another way)
 * or the rule the docs state. Items whose cases are already tested elsewhere say where.
 */
import { evaluateFormula, type CellResult } from "../../src/cli/evaluate";
import { resetActiveLibrary, setLayer } from "../../src/library";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { halvorsenLibrary } from "../library/helpers";

function num(formula: string): number {
  const r = evaluateFormula(formula);
  expect({ formula, error: r.error, message: r.message }).toEqual({ formula, error: undefined, message: undefined });
  expect(typeof r.value).toBe("number");
  return r.value as number;
}

function table(formula: string): CellResult[][] {
  const r = evaluateFormula(formula);
  expect({ formula, error: r.error, message: r.message }).toEqual({ formula, error: undefined, message: undefined });
  return r.value as CellResult[][];
}

function refusal(formula: string): { error?: string; message: string } {
  const r = evaluateFormula(formula);
  return { error: r.error, message: r.message ?? "" };
}

/** Litres of stock listed by a RECIPE table (column 4), summed. */
function stockLitres(rows: CellResult[][]): number {
  return rows.slice(1).reduce((sum: number, row) => sum + (typeof row[3] === "number" ? row[3] : 0), 0);
}

describe("item 4: AQ.RECIPE refuses a stock too dilute for the batch, with the largest total it allows", () => {
  const cases = [
    // formula parts: acid, base stock (mol/L), target, total, volume, tail; per-litre NaOH from AQ.ADJUST for the same batch
    { formula: '=AQ.RECIPE("acetic acid","NaOH 0.01 M",5,0.1,1)', stock: 0.01, volume: 1, at: (c: number) => `=AQ.RECIPE("acetic acid","NaOH 0.01 M",5,${c},1)`, perLitre: '=AQ.ADJUST("acetic acid",0.1,5,"NaOH")' },
    { formula: '=AQ.RECIPE("citric acid monohydrate","NaOH 0.02 M",6,0.05,2)', stock: 0.02, volume: 2, at: (c: number) => `=AQ.RECIPE("citric acid monohydrate","NaOH 0.02 M",6,${c},2)`, perLitre: '=AQ.ADJUST("citric acid monohydrate",0.05,6,"NaOH")' },
    { formula: '=AQ.RECIPE("acetic acid","NaOH 0.05 M",5,0.1,1,25,0.2)', stock: 0.05, volume: 1, at: (c: number) => `=AQ.RECIPE("acetic acid","NaOH 0.05 M",5,${c},1,25,0.2)`, perLitre: null },
  ];

  test.each(cases)("$formula → #N/A: too dilute, the litres it would need, the largest total concentration", ({ formula, stock, volume, at, perLitre }) => {
    const r = refusal(formula);
    expect(r.error).toBe("#N/A");
    const m = /The stock is too dilute: ([\d.]+) L of sodium hydroxide ([\d.]+) mol\/L for a ([\d.]+) L batch; it allows a total concentration of at most ([\d.]+) mol\/L\./.exec(r.message);
    expect({ formula, message: r.message, matched: m !== null }).toEqual({ formula, message: r.message, matched: true });
    const [, litresText, stockText, volumeText, mostText] = m as RegExpExecArray;
    expect(Number(stockText)).toBe(stock);
    expect(Number(volumeText)).toBe(volume);
    const litres = Number(litresText);
    expect(litres).toBeGreaterThanOrEqual(volume);
    // the litres quoted are the titrant the batch needs per litre (AQ.ADJUST, no stock: no dilution,
    // as in a batch made up to volume) × volume ÷ stock concentration, to the 6 digits quoted
    if (perLitre !== null) expect(Math.abs(litres - (num(perLitre) * volume) / stock)).toBeLessThanOrEqual(5e-6 * litres);
    // the largest total concentration, to its 4 digits: at it the stock fits, one step in the 4th digit above it does not
    const most = Number(mostText);
    expect(mostText.replace(/^0\.0*/, "").replace(".", "").length).toBeLessThanOrEqual(4);
    const fits = table(at(most));
    expect(stockLitres(fits)).toBeLessThan(volume);
    expect(stockLitres(fits)).toBeGreaterThan(0.999 * volume);
    const step = 10 ** (Math.floor(Math.log10(most)) - 3);
    const above = refusal(at(Number((most + step).toPrecision(4))));
    expect(above.error).toBe("#N/A");
    expect(above.message).toMatch(new RegExp(`The stock is too dilute: .* at most ${mostText.replace(".", "\\.")} mol/L`));
  });

  test("a stock that fits is listed as before (1 M NaOH: 68.6 mL for the 1 L acetate batch)", () => {
    const rows = table('=AQ.RECIPE("acetic acid","NaOH 1 M",5,0.1,1)');
    expect(Math.abs(stockLitres(rows) - num('=AQ.ADJUST("acetic acid",0.1,5,"NaOH")'))).toBeLessThan(1e-12);
  });

  test("two stocks count together (together 1.25 L for 1 L; exactly 1 L at 0.2 mol/L, which reaches the batch volume)", () => {
    const r = refusal('=AQ.RECIPE("acetic acid 0.2 M","sodium acetate 0.2 M",5,0.25,1)');
    expect(r.error).toBe("#N/A");
    expect(r.message).toMatch(/L of acetic acid 0\.2 mol\/L \+ [\d.]+ L of sodium acetate 0\.2 mol\/L for a 1 L batch; it allows a total concentration of at most 0\.1999 mol\/L/);
  });
});

describe("item 5: a strong acid or base without a stock is listed as pure substance, and says so", () => {
  test('=AQ.RECIPE("sodium tetraborate decahydrate","HCl",8.5,0.04,1): "hydrochloric acid, as 100 %", grams of HCl itself', () => {
    const rows = table('=AQ.RECIPE("sodium tetraborate decahydrate","HCl",8.5,0.04,1)');
    expect(rows.map((r) => r[0])).toEqual(["component", "sodium tetraborate decahydrate", "hydrochloric acid, as 100 %"]);
    const [, mol, grams, litres] = rows[2] as [string, number, number, string];
    expect(litres).toBe("");
    expect(Math.abs(grams - mol * num('=AQ.MOLARMASS("HCl")'))).toBeLessThan(1e-12 * grams);
    // the same batch with the acid named as supplied: the grams of 37 % acid are the pure grams / 0.37
    const supplied = table('=AQ.RECIPE("sodium tetraborate decahydrate","HCl 37 %",8.5,0.04,1)');
    expect(supplied[2][0]).toMatch(/^hydrochloric acid 37 % w\/w /);
    expect(Math.abs((supplied[2][2] as number) * 0.37 - grams)).toBeLessThan(1e-9 * grams);
  });

  test("NaOH in grams is labelled too; a named stock, the buffer forms and a neutral salt are not", () => {
    expect(table('=AQ.RECIPE("acetic acid","NaOH",5,0.1,1,25,0.2)').map((r) => r[0])).toEqual(["component", "acetic acid", "sodium hydroxide, as 100 %", "sodium chloride"]);
    expect(table('=AQ.RECIPE("acetic acid","1 M NaOH",5,0.1,1)').map((r) => r[0])).toEqual(["component", "acetic acid", "sodium hydroxide"]);
    // a strong acid among the other components is weighed the same way, and labelled the same way
    expect(table('=AQ.RECIPE("acetic acid","sodium acetate",5,0.1,1,,,,,"HCl",0.001)').map((r) => r[0])).toEqual(["component", "acetic acid", "sodium acetate", "hydrochloric acid, as 100 %"]);
  });
});

describe("item 6: a formula-derived molar mass has the cap of a typed one (1e6 g/mol)", () => {
  afterEach(() => resetActiveLibrary());
  const heavy = () => {
    const doc = halvorsenLibrary();
    (doc.substances ?? [])[0].formula = "H999999999999999999999O";
    return doc;
  };
  const CAP = /formula 'H999999999999999999999O' gives a molar mass of 1\.0080e\+21 g\/mol, above the 1,000,000 g\/mol an entry may have \(the same limit as a typed molar mass\)/;

  test("importing or saving such an entry is refused, saying why; the library stays as it was", () => {
    const r = setLayer("workbook", heavy());
    expect(r.ok).toBe(false);
    expect(r.ok ? "" : r.message).toMatch(CAP);
    expect(evaluateFormula('=AQ.MOLARMASS("HBS-7")').error).toBe("#VALUE!");
  });

  test("a stored workbook library carrying it keeps its other entries; =AQ.MOLARMASS and =AQ.RECIPE on it are #VALUE! with the reason", () => {
    expect(setLayer("workbook", heavy(), { ignoreReferences: true }).ok).toBe(true);
    for (const formula of ['=AQ.MOLARMASS("HBS-7")', '=AQ.RECIPE("HBS-7","HCl",7,0.05,1)']) {
      const r = refusal(formula);
      expect(r.error).toBe("#VALUE!");
      expect(r.message).toMatch(/'HBS-7' \(workbook library\) cannot be used: /);
      expect(r.message).toMatch(CAP);
    }
  });

  test("a typed molar mass above the cap is refused by the same number", () => {
    const doc = halvorsenLibrary();
    const entry = (doc.substances ?? [])[0];
    delete entry.formula;
    entry.molarMass = { value: 1.2e6, unit: "g/mol", status: "entered" } as never;
    const r = setLayer("workbook", doc);
    expect(r.ok).toBe(false);
    expect(r.ok ? "" : r.message).toMatch(/molarMass\.value: .*1000000/);
  });

  test("the same entry with its true formula is a molar mass", () => {
    expect(setLayer("workbook", halvorsenLibrary()).ok).toBe(true);
    // C8H17NNaO4S summed from the built-in library's atomic weights (CIAAW, read from the data)
    const w = (el: string) => (BUILTIN_LIBRARY.atomicWeights ?? {})[el].value;
    const expected = 8 * w("C") + 17 * w("H") + w("N") + w("Na") + 4 * w("O") + w("S");
    expect(Math.abs(num('=AQ.MOLARMASS("HBS-7")') - expected)).toBeLessThan(1e-9 * expected);
  });
});
