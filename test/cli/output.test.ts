/**
 * Output is never lost, cut or written over the input: a real pipe receives every line; --out is
 * checked before any work (same file under any name, a directory, an unwritable place, a bad
 * extension: one line, exit 2, nothing written); a workbook with several sheets is written whole
 * or refused; error cells keep their messages on stderr when values go to a file.
 */
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, symlinkSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import ExcelJS from "exceljs";
import { parseCsv } from "../../src/cli/csv";
import { requireBuild, run, runPiped } from "./support/run";
import { workbookBuffer } from "./support/workbook-with-library";

let dir = "";
beforeAll(() => {
  // the temporary directory first: files are written there even when the build is missing
  dir = mkdtempSync(join(tmpdir(), "protolyte-out-"));
  requireBuild();
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

test("5000 rows through a real pipe arrive whole: every line, the last one complete", () => {
  const file = join(dir, "rows.csv");
  const lines = ["x,y"];
  for (let i = 1; i < 5000; i++) lines.push(`${i},=A${i + 1}*1.000001+0.123456789`);
  writeFileSync(file, `${lines.join("\n")}\n`);
  const counted = runPiped(["sheet", file], "wc -l");
  expect(counted.code).toBe(0);
  expect(Number(counted.out.trim())).toBe(5000);
  const tail = runPiped(["sheet", file], "tail -n 1");
  const [x, y] = tail.out.trim().split("\t").map(Number);
  expect(x).toBe(4999);
  expect(Math.abs((y as number) - (4999 * 1.000001 + 0.123456789)) / (y as number)).toBeLessThan(1e-5); // 6 significant figures
});

test("a reader that closes the pipe early ends the run quietly", () => {
  const file = join(dir, "rows-head.csv");
  writeFileSync(file, Array.from({ length: 20000 }, (_, i) => `${i},${i * 2}`).join("\n"));
  const r = runPiped(["sheet", file], "head -n 3");
  expect(r.out.split("\n").filter(Boolean)).toHaveLength(3);
  expect(r.err).not.toMatch(/EPIPE|at .*\.js/);
});

describe("--out is checked before any work", () => {
  const input = (): string => {
    const f = join(dir, "in.csv");
    writeFileSync(f, 'a,1\nb,"=B1*2"\n');
    return f;
  };

  test("the input itself, by the same name or another path to it: refused, file untouched", () => {
    const f = input();
    const before = readFileSync(f, "utf8");
    const link = join(dir, "link-to-in.csv");
    rmSync(link, { force: true });
    symlinkSync(f, link);
    for (const out of [f, link, join(dir, ".", "in.csv"), join(dir, "..", dir.split("/").pop()!, "in.csv")]) {
      const r = run(["sheet", f, "--out", out]);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/^protolyte: refusing to write '.*': it is the input file/);
      expect(r.err.trim().split("\n")).toHaveLength(1);
    }
    expect(readFileSync(f, "utf8")).toBe(before);
  });

  test("the same for an XLSX written over itself", async () => {
    const f = join(dir, "same.xlsx");
    writeFileSync(f, await workbookBuffer({ S: [[1, "=A1+1"]] }));
    const before = readFileSync(f);
    const r = run(["sheet", f, "--out", f]);
    expect(r.code).toBe(2);
    expect(readFileSync(f).equals(before)).toBe(true);
  });

  test.each([
    ["a directory", () => dir, /it is a directory|must end in/],
    ["a directory named like a CSV", () => (mkdirSync(join(dir, "d.csv"), { recursive: true }), join(dir, "d.csv")), /it is a directory/],
    ["a bad extension", () => join(dir, "out.txt"), /the output must end in \.csv or \.xlsx/],
    ["a missing folder", () => join(dir, "no", "such", "out.csv"), /folder '.*': no such file or directory/],
  ])("%s: one line, exit 2, before reading the input", (_what, out, message) => {
    // The input does not exist: the --out problem is found first, so it was checked before the work.
    const r = run(["sheet", join(dir, "missing-input.csv"), "--out", out()]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
    expect(r.err.trim().split("\n")).toHaveLength(1);
  });

  const asRoot = process.getuid?.() === 0;
  (asRoot ? test.skip : test)("an unwritable folder: one line, exit 2 (skipped when run as root, whom permission bits do not stop)", () => {
    const locked = join(dir, "locked");
    mkdirSync(locked, { recursive: true });
    chmodSync(locked, 0o500);
    const r = run(["sheet", input(), "--out", join(locked, "out.csv")]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/permission denied/);
  });
});

describe("several sheets", () => {
  let book = "";
  beforeAll(async () => {
    book = join(dir, "two.xlsx");
    writeFileSync(book, await workbookBuffer({ First: [[2, "=A1*3"]], Second: [[5, "=A1*7", "=NA()"]] }));
  });

  test("CSV output without --sheet is refused, naming the sheets; nothing written", () => {
    const out = join(dir, "two.csv");
    const r = run(["sheet", book, "--out", out]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/2 sheets \('First', 'Second'\).*--sheet NAME.*\.xlsx/);
    expect(existsSync(out)).toBe(false);
  });

  test("--sheet NAME writes that sheet, and the summary counts only its errors", () => {
    const out = join(dir, "second.csv");
    const r = run(["sheet", book, "--sheet", "Second", "--out", out]);
    expect(r.code).toBe(0);
    expect(parseCsv(readFileSync(out, "utf8"))).toEqual([["5", "35", "#N/A"]]);
    expect(r.err).toMatch(/Second!C1: #N\/A/);
    expect(r.err).toMatch(/sheet 'Second', 1 error cell;/);
    const first = run(["sheet", book, "--sheet", "First", "--out", join(dir, "first.csv")]);
    expect(first.err).toMatch(/sheet 'First', 0 error cells;/);
    const none = run(["sheet", book, "--sheet", "Third"]);
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/no sheet 'Third'/);
  });

  test("XLSX output keeps every sheet", async () => {
    const out = join(dir, "two-values.xlsx");
    const r = run(["sheet", book, "--out", out]);
    expect(r.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    expect(wb.worksheets.map((w) => w.name)).toEqual(["First", "Second"]);
    expect(wb.getWorksheet("First")!.getCell("B1").value).toBe(6);
    expect(wb.getWorksheet("Second")!.getCell("B1").value).toBe(35);
  });
});

test("with --out, every error cell and its message is on stderr; --json keeps them in the JSON", () => {
  const f = join(dir, "errors.csv");
  writeFileSync(f, 'name,amount\nsodium acetat,0.1\npH,"=AQ.PH(A2,B2)"\n');
  const out = join(dir, "errors-out.csv");
  const r = run(["sheet", f, "--out", out]);
  expect(r.code).toBe(0);
  expect(parseCsv(readFileSync(out, "utf8"))[2]).toEqual(["pH", "#VALUE!"]);
  expect(r.err).toMatch(/Sheet1!B3: #VALUE! Unknown substance 'sodium acetat'/);
  expect(r.err).toMatch(/wrote .*errors-out\.csv: sheet 'Sheet1', 1 error cell; constants PL-/);
  expect(statSync(out).size).toBeGreaterThan(0);
  const json = run(["sheet", f, "--json"]);
  const [sheet] = JSON.parse(json.out) as { errors: { address: string; message: string }[] }[];
  expect(sheet!.errors).toEqual([expect.objectContaining({ address: "B3", message: expect.stringMatching(/Unknown substance/) })]);
});
