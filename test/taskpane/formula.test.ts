/**
 * Reading a mixture out of a cell's formula: the tokenizer and parser (strings with commas and
 * doubled quotes, absolute and sheet-qualified references, inline arrays with both separators,
 * nesting), the AQ call and its argument sources, and the values → rows step. The parameter
 * positions are checked against the functions' own catalogue.
 */
import { CATALOGUE } from "../../src/functions/catalogue";
import { activityModelChoices } from "../../src/chem/activity/models";
import { getActiveLibrary, resetActiveLibrary } from "../../src/library";
import { pictureOf } from "../../src/taskpane/charts/picture";
import { aqFunctionId, findAqCall, MIXTURE_FUNCTIONS, type AqCall, type ArgSource } from "../../src/taskpane/formula/aq-call";
import { mixtureFromValues, titrationFromValues } from "../../src/taskpane/formula/mixture-values";
import { calls, parseFormula, FormulaSyntaxError } from "../../src/taskpane/formula/parse";
import { tokenize } from "../../src/taskpane/formula/tokens";

function call(formula: string): AqCall {
  const r = findAqCall(formula);
  if (!r.ok) throw new Error(`${formula}: ${r.message}`);
  return r.call;
}

const ref = (address: string, sheet: string | null = null, text?: string): Partial<ArgSource> => ({ kind: "ref", address, sheet, ...(text ? { text } : {}) });
const values = (...rows: unknown[][]): ArgSource => ({ kind: "values", values: rows } as ArgSource);

describe("tokens", () => {
  test("strings keep commas, semicolons and parentheses; doubled quotes are one quote", () => {
    const t = tokenize('="say ""hi"", then (1;2)"&"x"');
    expect(t.map((x) => [x.kind, x.value])).toEqual([
      ["string", 'say "hi", then (1;2)'],
      ["op", "&"],
      ["string", "x"],
    ]);
  });

  test("references: relative, absolute, mixed, columns, rows, and on quoted or plain sheets", () => {
    const t = tokenize("=A1+$B$2:$C$9+D$4:$E5+F:G+3:5+'My Sheet'!A1:A3+'Bob''s data'!$B$2+Data_2024!C3+Q1!B2");
    expect(t.filter((x) => x.kind === "ref").map((x) => [x.sheet, x.value])).toEqual([
      [null, "A1"],
      [null, "B2:C9"],
      [null, "D4:E5"],
      [null, "F:G"],
      [null, "3:5"],
      ["My Sheet", "A1:A3"],
      ["Bob's data", "B2"],
      ["Data_2024", "C3"],
      ["Q1", "B2"],
    ]);
  });

  test("a name followed by ( is a function even when it looks like a cell (LOG10)", () => {
    expect(tokenize("=LOG10(A1)").map((x) => x.kind)).toEqual(["func", "(", "ref", ")"]);
    expect(tokenize("=AQ.PH(x,y)")[0]).toMatchObject({ kind: "func", text: "AQ.PH" });
  });

  test("references the pane cannot follow are recognised as such", () => {
    const [book, threeD, table] = [tokenize("=[Book2]Sheet1!A1:A3")[0], tokenize("=Jan:Mar!B2")[0], tokenize("=Table1[Name]")[0]];
    expect(book).toMatchObject({ kind: "ref", unsupported: "a reference to another workbook" });
    expect(threeD).toMatchObject({ kind: "ref", unsupported: "a 3-D reference over several sheets" });
    expect(table).toMatchObject({ kind: "name", value: "Table1[Name]", unsupported: "a table (structured) reference" });
  });

  test("syntax errors say where", () => {
    expect(() => tokenize('=AQ.PH("open')).toThrow(FormulaSyntaxError);
    expect(() => tokenize("='no end!A1")).toThrow(/quoted sheet name/);
    expect(() => parseFormula("=AQ.PH(A1:A2")).toThrow(/not closed|ends too early/);
    expect(() => parseFormula("={1,2;3}")).toThrow(/different lengths/);
    expect(() => parseFormula("={A1}")).toThrow(/inline array holds only/);
  });
});

describe("parse", () => {
  test("inline arrays: ',' separates columns and ';' rows; signs and all constant kinds", () => {
    const n = parseFormula('={1,-2.5;"a",TRUE;#N/A,1E-3}');
    expect(n).toMatchObject({ kind: "array", rows: [[1, -2.5], ["a", true], [{ error: "#N/A" }, 0.001]] });
  });

  test("nested calls are found outermost first, left to right", () => {
    const tree = parseFormula('=ROUND(IFERROR(AQ.PH(A1:A2,B1:B2,37),""),2)+LOG10(AQ.BETA(C1,D1))');
    expect(calls(tree).map((c) => c.name)).toEqual(["ROUND", "IFERROR", "AQ.PH", "LOG10", "AQ.BETA"]);
  });

  test("operators: precedence as Excel (unary minus before ^, ^ before *, & last but comparison)", () => {
    expect(parseFormula("=-2^2")).toMatchObject({ kind: "binary", op: "^", left: { kind: "unary", op: "-" } });
    expect(parseFormula("=1+2*3")).toMatchObject({ kind: "binary", op: "+", right: { kind: "binary", op: "*" } });
    expect(parseFormula('=1&2=3')).toMatchObject({ kind: "binary", op: "=", left: { kind: "binary", op: "&" } });
    expect(parseFormula("=50%")).toMatchObject({ kind: "percent", operand: { kind: "number", value: 50 } });
  });
});

describe("the AQ call of a formula", () => {
  test("ranges, absolute and relative", () => {
    const c = call("=AQ.PH($A$2:$A$4,B2:B4,$C$1)");
    expect(c.fn.id).toBe("PH");
    expect(c.names).toMatchObject(ref("A2:A4", null, "$A$2:$A$4"));
    expect(c.amounts).toMatchObject(ref("B2:B4"));
    expect(c.temperature).toMatchObject(ref("C1", null, "$C$1"));
    expect(c.activity).toEqual({ kind: "missing" });
    expect(c.text).toBe("AQ.PH($A$2:$A$4,B2:B4,$C$1)");
  });

  test("sheet-qualified ranges, quoted with spaces and apostrophes", () => {
    const c = call("=AQ.BETA('My Sheet'!A1:A3,'Bob''s data'!$B$1:$B$3,Data!C1)");
    expect(c.names).toMatchObject(ref("A1:A3", "My Sheet", "'My Sheet'!A1:A3"));
    expect(c.amounts).toMatchObject(ref("B1:B3", "Bob's data"));
    expect(c.temperature).toMatchObject(ref("C1", "Data"));
  });

  test("inline arrays of names with commas and doubled quotes, column or row", () => {
    const c = call('=AQ.PH({"sodium acetate, anhydrous";"acid ""A""";"acetic acid"},{"25 mM";0.01;0.1},37,"ideal")');
    expect(c.names).toEqual(values(["sodium acetate, anhydrous"], ['acid "A"'], ["acetic acid"]));
    expect(c.amounts).toEqual(values(["25 mM"], [0.01], [0.1]));
    expect(c.temperature).toEqual(values([37]));
    expect(c.activity).toEqual(values(["ideal"]));
    expect(call('=AQ.PH({"a","b"},{1,2})').names).toEqual(values(["a", "b"]));
  });

  test("inside other functions, with ';' between arguments (local form), and the @ of implicit intersection", () => {
    expect(call('=IFERROR(ROUND(AQ.PH(A1:A2,B1:B2,37),2),"")').temperature).toEqual(values([37]));
    expect(call("=AQ.PH(A1:A2;B1:B2;25)").temperature).toEqual(values([25]));
    expect(call("=@AQ.PH(A1:A2,B1:B2)").names).toMatchObject(ref("A1:A2"));
  });

  test("empty and omitted arguments; a single value; signs and percentages folded", () => {
    const c = call('=AQ.PH(A1:A2,B1:B2,,"ideal")');
    expect(c.temperature).toEqual({ kind: "missing" });
    expect(c.activity).toEqual(values(["ideal"]));
    expect(call('=AQ.PH("acetic acid",0.1)').names).toEqual(values(["acetic acid"]));
    expect(call('=AQ.PH("x",-5)').amounts).toEqual(values([-5]));
    expect(call('=AQ.PH("x",10%)').amounts).toEqual(values([0.1]));
  });

  test("the temperature and activity positions of every function", () => {
    expect(call("=AQ.IONIC(A1,B1,C1)").temperature).toMatchObject(ref("C1"));
    expect(call("=AQ.OSMOLARITY(A1,B1,C1)").temperature).toMatchObject(ref("C1"));
    expect(call("=AQ.CAPACITY(A1,B1,0.5,C1,D1)")).toMatchObject({ temperature: ref("C1"), activity: ref("D1") });
    expect(call("=AQ.SPECIES(A1,B1,,C1,D1)")).toMatchObject({ temperature: ref("C1"), activity: ref("D1") });
    expect(call('=AQ.ADJUST(A1,B1,7,"NaOH",1,800,C1,D1)')).toMatchObject({ temperature: ref("C1"), activity: ref("D1") });
    expect(call('=AQ.CURVE(A2:A3,B2:B3,"NaOH",0.1,0.01,0.02,51,Sheet2!$D$1)').temperature).toMatchObject(ref("D1", "Sheet2"));
    expect(call("=AQ.PHRANGE(A1,B1,0.05,0.02,C1)").temperature).toMatchObject(ref("C1"));
    expect(call("=AQ.CHECK(A1,B1,C1,D1)")).toMatchObject({ temperature: ref("C1"), activity: ref("D1") });
  });

  test("how AQ.CURVE and AQ.ADJUST titrate; the other functions have no titration", () => {
    expect(call('=AQ.CURVE(A2:A3,B2:B3,"NaOH",0.1,E1,"30 mL",61,25)')).toMatchObject({
      titrant: values(["NaOH"]),
      titrantConc: values([0.1]),
      volume: ref("E1"),
      maxVolume: values(["30 mL"]),
      temperature: values([25]),
    });
    expect(call('=AQ.ADJUST(A1:A2,B1:B2,7,"HCl",1,800)')).toMatchObject({ titrant: values(["HCl"]), titrantConc: values([1]), volume: values([800]), maxVolume: { kind: "missing" } });
    expect(call("=AQ.PH(A1:A2,B1:B2)")).toMatchObject({ titrant: { kind: "missing" }, titrantConc: { kind: "missing" }, volume: { kind: "missing" } });
  });

  test("the function's name in the forms Excel shows", () => {
    expect(["AQ.PH", "aq.ph", "_xldudf_AQ_PH", "AQ_BETA", "SUM", "XAQ.PH"].map(aqFunctionId)).toEqual(["PH", "PH", "PH", "BETA", null, null]);
    expect(call("=_xldudf_AQ_PH(A1:A2,B1:B2)").fn.id).toBe("PH");
  });

  test("names, and what cannot be read: calculations, whole columns, other workbooks, 3-D and table references", () => {
    const named = call("=AQ.PH(Names,Data!Amounts,Temp)");
    expect(named.names).toEqual({ kind: "name", sheet: null, name: "Names", text: "Names" });
    expect(named.amounts).toEqual({ kind: "name", sheet: "Data", name: "Amounts", text: "Data!Amounts" });
    const why = (f: string, arg: "names" | "amounts" = "amounts") => {
      const s = call(f)[arg];
      return s.kind === "unsupported" ? `${s.text}: ${s.why}` : `not refused: ${JSON.stringify(s)}`;
    };
    expect(why("=AQ.PH(A1:A2,B1:B2*2)")).toBe("B1:B2*2: it is a calculation: the pane reads only ranges, inline arrays and values");
    expect(why("=AQ.PH(A1:A2,INDEX(B:B,1))")).toMatch(/^INDEX\(B:B,1\): it is calculated by INDEX/);
    expect(why("=AQ.PH(A:A,B:B)", "names")).toMatch(/whole columns or rows are not read/);
    expect(why("=AQ.PH([Book2]Sheet1!A1:A3,B1:B3)", "names")).toMatch(/another workbook cannot be read/);
    expect(why("=AQ.PH(Jan:Mar!A1:A3,B1:B3)", "names")).toMatch(/3-D reference/);
    expect(why("=AQ.PH(Table1[Name],B1:B3)", "names")).toMatch(/table \(structured\) reference/);
  });

  test("cells without a usable AQ call say why", () => {
    expect(findAqCall(7.2)).toMatchObject({ ok: false, reason: "no-formula" });
    expect(findAqCall("")).toMatchObject({ ok: false, reason: "empty" });
    expect(findAqCall(null)).toMatchObject({ ok: false, reason: "empty" });
    expect(findAqCall("=SUM(A1:A3)")).toMatchObject({ ok: false, reason: "no-aq-call", message: expect.stringMatching(/AQ\.PH, AQ\.ADJUST/) });
    expect(findAqCall('=AQ.PKA("acetic acid")')).toMatchObject({ ok: false, reason: "no-aq-call" });
    expect(findAqCall("=AQ.PH(A1:A2")).toMatchObject({ ok: false, reason: "syntax", message: expect.stringMatching(/could not be read/) });
  });

  test("the parameter lists agree with the functions' catalogue", () => {
    for (const f of MIXTURE_FUNCTIONS) {
      const entry = CATALOGUE.find((e) => e.id === f.id);
      expect({ id: f.id, params: entry?.params.map((p) => p.name) }).toEqual({ id: f.id, params: f.params });
    }
    // and every catalogue function that takes names and amounts is known here
    const mixtureIds = CATALOGUE.filter((e) => e.params[0]?.name === "names" && e.params[1]?.name === "amounts").map((e) => e.id);
    expect(MIXTURE_FUNCTIONS.map((f) => f.id).sort()).toEqual(mixtureIds.sort());
  });
});

describe("values → the pane's rows", () => {
  test("pairs cell by cell, skips blank pairs, keeps numbers exactly, reads temperature and activity", () => {
    const r = mixtureFromValues([["sodium acetate"], [""], ["acetic acid"]], [["25 mM"], [""], [0.1]], [[37]], [["IDEAL"]]);
    expect(r).toEqual({ ok: true, spec: { rows: [{ name: "sodium acetate", amount: "25 mM" }, { name: "acetic acid", amount: "0.1" }], temperature: "37", activity: "ideal" } });
    expect(mixtureFromValues([["a", "b"]], [[1e-3, 2]])).toMatchObject({ ok: true, spec: { rows: [{ amount: "0.001" }, { amount: "2" }], temperature: "", activity: "davies" } });
  });

  test("problems are messages", () => {
    expect(mixtureFromValues([["a"], ["b"]], [[1, 2]])).toEqual({ ok: false, message: "names is 2×1 cells but amounts is 1×2: give one amount per name, paired cell by cell" });
    expect(mixtureFromValues([["a"]], [["#N/A"]])).toEqual({ ok: false, message: "a name or amount cell shows #N/A" });
    expect(mixtureFromValues([["a"], ["b"]], [[1], [{ error: "#REF!" }]])).toEqual({ ok: false, message: "a name or amount cell (item 2) shows #REF!" });
    expect(mixtureFromValues([[""]], [[""]])).toEqual({ ok: false, message: "the mixture is empty: give at least one substance name with its amount" });
    expect(mixtureFromValues([["a"]], [[1]], [[25, 30]])).toEqual({ ok: false, message: "the temperature must be one cell, not 1×2 cells" });
    expect(mixtureFromValues([["a"]], [[1]], null, [["fancy"]])).toEqual({ ok: false, message: `The activity model "fancy" is not known: use ${activityModelChoices()}.` });
    expect(mixtureFromValues([["a"]], [[true]])).toEqual({ ok: false, message: "a name or amount is TRUE/FALSE" });
  });

  test("a titration's values → the Picture view's fields (numbers in mol/L and L get their units)", () => {
    expect(titrationFromValues("CURVE", [["NaOH"]], [[0.1]], [[0.025]], [["30 mL"]])).toEqual({ titrant: "NaOH", stock: "0.1 M", sample: "25 mL", maxVolume: "30 mL" });
    expect(titrationFromValues("CURVE", [["HCl"]], [["100 mM"]], [["#N/A"]], null)).toEqual({ titrant: "HCl", stock: "100 mM" });
    // ADJUST's volume is a batch (800 L), not a sample: only the titrant and its stock are taken
    expect(titrationFromValues("ADJUST", [["NaOH"]], [[1]], [[800]], null)).toEqual({ titrant: "NaOH", stock: "1 M" });
    expect(titrationFromValues("ADJUST", [["NaOH"]], null, null, null)).toEqual({ titrant: "NaOH" });
    expect(titrationFromValues("CURVE", [[0.1]], [[0.1]], [[0.01]], [[0.02]])).toBeUndefined();
    expect(titrationFromValues("CURVE", null, null, null, null)).toBeUndefined();
  });

  test("a formula with inline arrays draws the same picture as the Try it rows", () => {
    resetActiveLibrary();
    const c = call('=ROUND(AQ.PH({"sodium dihydrogen phosphate";"disodium hydrogen phosphate"},{"10 mM";0.01},25),2)');
    if (c.names.kind !== "values" || c.amounts.kind !== "values" || c.temperature.kind !== "values") throw new Error("inline");
    const spec = mixtureFromValues(c.names.values, c.amounts.values, c.temperature.values, null);
    if (!spec.ok) throw new Error(spec.message);
    const fromFormula = pictureOf(getActiveLibrary(), spec.spec);
    const fromRows = pictureOf(getActiveLibrary(), { rows: [{ name: "sodium dihydrogen phosphate", amount: "10 mM" }, { name: "disodium hydrogen phosphate", amount: "10 mM" }], temperature: "25" });
    if (!fromFormula.ok || !fromRows.ok) throw new Error("no picture");
    expect(fromFormula.speciation.mixturePH).toBeCloseTo(fromRows.speciation.mixturePH, 12);
    expect(fromFormula.speciation.systems[0].crossings).toEqual(fromRows.speciation.systems[0].crossings);
  });
});
