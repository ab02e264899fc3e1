/** src/cli/xlsx-text-limit.ts: the longest cell text of an XML part, counted before loading. */
import { longestText, textPartKind } from "../../src/cli/xlsx-text-limit";

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
