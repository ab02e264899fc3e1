/** src/cli/xlsx-text-limit.ts: the longest cell text of an XML part, counted before loading. */
import { longestText, textPartKind, XmlPartScanner } from "../../src/cli/xlsx-text-limit";

const xml = (s: string): Buffer => Buffer.from(s, "utf8");

test("a shared string is the sum of its rich-text runs; entities and multi-byte characters count one", () => {
  const sst = '<sst count="2"><si><t>abc</t></si><si><r><rPr><b/></rPr><t>12345</t></r><r><t xml:space="preserve"> 678</t></r></si></sst>';
  expect(longestText(xml(sst), true)).toBe(9);
  expect(longestText(xml("<sst><si><t>&amp;&lt;&#233;µ°x</t></si></sst>"), true)).toBe(6);
  // <sis> is not <si>: its text adds to the count the last <si> tag started.
  expect(longestText(xml("<sst><si><t>ab</t><sis><t>zzzzzzzz</t></sis></si></sst>"), true)).toBe(10);
});

test("in a worksheet each text node counts alone", () => {
  const sheet = '<worksheet><sheetData><row r="1"><c r="A1" t="inlineStr"><is><t>hello</t></is></c><c r="B1"><f>SUM(A1:A3)</f><v>6</v></c></row></sheetData></worksheet>';
  expect(longestText(xml(sheet), false)).toBe(10);
  expect(longestText(xml(`<x>${"é".repeat(40_000)}</x>`), false)).toBe(40_000);
});

test("the parts that hold cell text", () => {
  expect(textPartKind("xl/sharedStrings.xml")).toBe("shared");
  expect(textPartKind("xl/worksheets/sheet12.xml")).toBe("sheet");
  expect(textPartKind("xl/worksheets/_rels/sheet1.xml.rels")).toBeNull();
  // Names exceljs also loads as worksheets (its pattern is not anchored).
  expect(textPartKind("a/xl/worksheets/sheet1.xml")).toBe("sheet");
  expect(textPartKind("xl/worksheets/sheet2.xml.bak")).toBe("sheet");
  expect(textPartKind("xl/styles.xml")).toBeNull();
});

/** Rows and cells that lack their `r` attribute, counted while the bytes pass (in any split). */
function unnumbered(sheet: string, split = 0): [number, number] {
  const scanner = new XmlPartScanner(false);
  const bytes = xml(sheet);
  if (split > 0) for (let at = 0; at < bytes.length; at += split) scanner.write(bytes.subarray(at, at + split));
  else scanner.write(bytes);
  return [scanner.rowsWithoutNumber, scanner.cellsWithoutAddress];
}

test("rows and cells without their r attribute are counted, in chunks of any size", () => {
  const numbered = '<sheetData><row r="1" spans="1:2" x14ac:dyDescent="0.25"><c r="A1" s="1"><v>1</v></c><c s="2" r="B1"/></row><row\tr = \'2\'><c\nr="A2"><v>3</v></c></row></sheetData>';
  // Look-alikes that are not the r attribute: a namespaced x:r, a value holding ' r=', an attribute named "ref".
  const lookAlikes = '<sheetData><row x:r="1" ht=" r=1"><c ref="A1" t="s"><v>0</v></c><c><v>1</v></c></row><row/><x:row><x:c/></x:row></sheetData>';
  for (const split of [0, 1, 2, 3, 7]) {
    expect(unnumbered(numbered, split)).toEqual([0, 0]);
    expect(unnumbered(lookAlikes, split)).toEqual([3, 3]);
  }
  // Closing tags, other elements (<col>, <cols>, <rowBreaks>) and shared strings are not rows or cells.
  expect(unnumbered('<cols><col min="1"/></cols><sheetData><row r="1"><c r="A1"/></row></sheetData><rowBreaks/>')).toEqual([0, 0]);
  const shared = new XmlPartScanner(true);
  shared.write(xml("<sst><si><r><t>a</t></r></si></sst>"));
  expect([shared.rowsWithoutNumber, shared.cellsWithoutAddress]).toEqual([0, 0]);
});
