/**
 * Hostile and unusual files end in one clear line (exit 2) before the work, or, for one bad cell,
 * in an error value for that cell only; nothing is evaluated that Excel would show as text.
 * The limits are those of src/cli/limits.ts, quoted in the README.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import ExcelJS from "exceljs";
import { LIMITS } from "../../src/cli/limits";
import { listZip } from "../../src/cli/zip";
import { requireBuild, run } from "./support/run";
import { workbookBuffer } from "./support/workbook-with-library";

let dir = "";
beforeAll(() => {
  // the temporary directory first: files are written there even when the build is missing
  dir = mkdtempSync(join(tmpdir(), "protolyte-hostile-"));
  requireBuild();
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, content: string | Buffer): string {
  const f = join(dir, name);
  writeFileSync(f, content);
  return f;
}

/** One line on stderr, exit 2, nothing on stdout, no stack trace. */
function expectOneLine(r: { code: number | null; out: string; err: string }, message: RegExp): void {
  expect(r.code).toBe(2);
  expect(r.out).toBe("");
  expect(r.err).toMatch(message);
  expect(r.err.trim().split("\n")).toHaveLength(1);
  expect(r.err).not.toMatch(/\n\s+at /);
}

describe("limits, checked before the work", () => {
  test("a small CSV spanning row 200 000 and column 1 000 is refused by its cell count", () => {
    const f = file("sparse.csv", `x${"\n".repeat(199_999)}${",".repeat(999)}y\n`);
    expectOneLine(run(["sheet", f]), new RegExp(`span 200000000 cells .* at most ${LIMITS.cells}`));
  });

  test("more columns than the limit: one line, not the engine's 'Sheet size limit exceeded' trace", () => {
    const f = file("wide.csv", `${Array.from({ length: LIMITS.columns + 1 }, (_, i) => i).join(",")}\n`);
    expectOneLine(run(["sheet", f]), /has 1001 columns; at most 1000/);
  });

  test("a cell longer than Excel's 32 767 characters", () => {
    const f = file("long-cell.csv", `a,${"x".repeat(LIMITS.cellChars + 1)}\n`);
    expectOneLine(run(["sheet", f]), /row 1 column 2 holds 32768 characters/);
  });

  test("an XLSX cell longer than 32 767 characters is refused from the package, before the workbook is loaded", async () => {
    const long = await workbookBuffer({ S: [["x".repeat(LIMITS.cellChars + 1)]] });
    expectOneLine(run(["sheet", file("long-cell.xlsx", long)]), /holds a text of at least 32768 characters \(xl\/sharedStrings\.xml\); a cell holds at most 32767/);
    // At the limit, written with entities (each '&' is '&amp;' in the XML): read, not refused.
    const full = await workbookBuffer({ S: [["&".repeat(LIMITS.cellChars)]] });
    const r = run(["sheet", file("full-cell.xlsx", full), "--json"]);
    expect(r.code).toBe(0);
    expect((JSON.parse(r.out) as { values: string[][] }[])[0]!.values[0]![0]).toHaveLength(LIMITS.cellChars);
  });

  test("a file larger than the byte limit is refused by its size, before it is read", () => {
    const f = join(dir, "huge.csv");
    writeFileSync(f, Buffer.alloc(LIMITS.fileBytes + 1, 0x61));
    expectOneLine(run(["sheet", f]), /is 64\.0 MB; at most 64 MB are read/);
    rmSync(f);
  });

  test("an XLSX declaring more unpacked bytes than the limit, and one lying about its sizes", async () => {
    const xlsx = await workbookBuffer({ S: [[1, "=A1+1"]] });
    const entries = listZip(xlsx);
    const sheet = entries.find((e) => e.name === "xl/worksheets/sheet1.xml")!;
    // The part's central-directory record: its name is the last occurrence (after the local header
    // and the data), 46 bytes into the record; the declared uncompressed size sits 24 bytes into it.
    const centralOf = (buf: Buffer): number => buf.lastIndexOf(Buffer.from("xl/worksheets/sheet1.xml")) - 46;
    expect(xlsx.readUInt32LE(centralOf(xlsx))).toBe(0x02014b50);
    expect(xlsx.readUInt32LE(centralOf(xlsx) + 24)).toBe(sheet.uncompressedSize);
    const bomb = Buffer.from(xlsx);
    bomb.writeUInt32LE(0xf0000000, centralOf(bomb) + 24);
    expectOneLine(run(["sheet", file("bomb.xlsx", bomb)]), /unpacks to \d+ MB; at most 256 MB are read/);
    const liar = Buffer.from(xlsx);
    liar.writeUInt32LE(Math.max(1, Math.floor(sheet.uncompressedSize / 4)), centralOf(liar) + 24);
    expectOneLine(run(["sheet", file("liar.xlsx", liar)]), /is not a readable XLSX workbook: part xl\/worksheets\/sheet1\.xml/);
  });

  test("the 150 000-row table is within the limits and evaluates", () => {
    const rows = ["n,amount,total"];
    for (let i = 1; i <= 150_000; i++) rows.push(i === 1 ? `${i},0.001,=SUM(B2:B150001)` : `${i},0.001`);
    const r = run(["sheet", file("tall.csv", `${rows.join("\n")}\n`), "--json"]);
    expect(r.code).toBe(0);
    const [sheet] = JSON.parse(r.out) as { values: unknown[][] }[];
    expect(sheet!.values).toHaveLength(150_001);
    expect(Math.abs((sheet!.values[1]![2] as number) - 150)).toBeLessThan(1e-9);
  });
});

describe("formulas beyond the engine's limits: that cell an error with a message, every other cell computed", () => {
  test("1 500 terms, 70 levels of nesting, and a normal cell beside them", () => {
    const terms = `=${Array(1500).fill("A1").join("+")}`;
    const nested = `=${"ABS(".repeat(70)}1${")".repeat(70)}`;
    const f = file("deep.csv", `2,"${terms}","${nested}",=A1*21\n`);
    const r = run(["sheet", f, "--json"]);
    expect(r.code).toBe(0);
    const [sheet] = JSON.parse(r.out) as { values: unknown[][]; errors: { address: string; message: string }[] }[];
    expect(sheet!.values[0]![3]).toBe(42);
    expect(sheet!.errors).toEqual([
      { address: "B1", error: "#VALUE!", message: expect.stringMatching(/1499 operators.*at most 500/) },
      { address: "C1", error: "#VALUE!", message: expect.stringMatching(/nests 70 levels deep; Excel accepts at most 64/) },
    ]);
  });
});

describe("files the shell or a colleague may hand over", () => {
  test("missing, a directory: one line each", () => {
    expectOneLine(run(["sheet", join(dir, "nope.csv")]), /no such file or directory/);
    expectOneLine(run(["sheet", dir]), /it is a directory/);
  });

  test("a sheet named __proto__ is an ordinary sheet", async () => {
    const wb = new ExcelJS.Workbook();
    const proto = wb.addWorksheet("__proto__");
    proto.getCell("A1").value = 3;
    proto.getCell("B1").value = { formula: "A1*2" } as ExcelJS.CellFormulaValue;
    wb.addWorksheet("constructor").getCell("A1").value = { formula: "__proto__!B1+1" } as ExcelJS.CellFormulaValue;
    const f = file("proto.xlsx", Buffer.from(await wb.xlsx.writeBuffer()));
    const r = run(["sheet", f, "--json"]);
    expect(r.code).toBe(0);
    expect((JSON.parse(r.out) as { name: string; values: unknown[][] }[]).map((s) => [s.name, s.values])).toEqual([
      ["__proto__", [[3, 6]]],
      ["constructor", [[7]]],
    ]);
  });

  test("an XLSX text cell reading =HYPERLINK(…) or 0.05 stays text, as in Excel", async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet("S");
    ws.getCell("A1").value = '=HYPERLINK("http://example.invalid","x")';
    ws.getCell("A2").value = "0.05";
    ws.getCell("B2").value = { formula: "ISTEXT(A2)" } as ExcelJS.CellFormulaValue;
    const f = file("text-cells.xlsx", Buffer.from(await wb.xlsx.writeBuffer()));
    const [sheet] = JSON.parse(run(["sheet", f, "--json"]).out) as { values: unknown[][] }[];
    expect(sheet!.values).toEqual([['=HYPERLINK("http://example.invalid","x")'], ["0.05", true]]);
  });

  test('a CSV field is a formula only when its first character is "="', () => {
    const f = file("spaces.csv", '" =1+1","\t=1+1",=1+1\n');
    const [sheet] = JSON.parse(run(["sheet", f, "--json"]).out) as { values: unknown[][] }[];
    expect(sheet!.values).toEqual([[" =1+1", "\t=1+1", 2]]);
  });

  test("an XLSX renamed .csv is read as a workbook (and said so); binary data is refused", async () => {
    const f = file("renamed.csv", await workbookBuffer({ S: [[4, "=A1*A1"]] }));
    const r = run(["sheet", f, "--json"]);
    expect(r.code).toBe(0);
    expect((JSON.parse(r.out) as { values: unknown[][] }[])[0]!.values).toEqual([[4, 16]]);
    expect(r.err).toMatch(/is an XLSX workbook by its content: read as one/);
    expectOneLine(run(["sheet", file("binary.csv", Buffer.from([1, 2, 0, 3, 0, 0, 255]))]), /is not a text file/);
    expectOneLine(run(["sheet", file("fake.xlsx", "a,b\n")]), /is not an XLSX workbook/);
  });
});

describe("what is written and printed is inert", () => {
  test("CSV output quotes , ; tab CR LF and neutralises a formula start, also after a separator inside the text", () => {
    const f = file("inject.csv", '"Lot 7;=cmd|\' /C calc\'!A0","=""+SUM(1)""","a,b","tab\there"\n');
    const out = join(dir, "inject-out.csv");
    expect(run(["sheet", f, "--out", out]).code).toBe(0);
    const text = require("node:fs").readFileSync(out, "utf8") as string;
    expect(text).toBe("\ufeff\"Lot 7;'=cmd|' /C calc'!A0\",'+SUM(1),\"a,b\",\"tab\there\"\r\n");
  });

  test("terminal escape sequences in cell text are shown, not obeyed", () => {
    const f = file("escape.csv", "\u001b]0;owned\u0007title,\u001b[31mred\n");
    const r = run(["sheet", f]);
    expect(r.out).toBe("\\u{1B}]0;owned\\u{7}title\t\\u{1B}[31mred\n");
    expect(r.out).not.toContain("\u001b");
  });
});
