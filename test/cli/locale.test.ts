/**
 * Files as they come from Excel in other locales and on Windows: ";"-separated with decimal commas,
 * Windows-1252 text, dates and times as serial numbers; tables reading tables settle; numbers print
 * as a person reads them. CSV written for Excel: UTF-8 with a byte-order mark, CRLF.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import ExcelJS from "exceljs";
import { DEFAULT_ROUNDING, roundingFor } from "../../src/cli/format";
import { requireBuild, run } from "./support/run";

let dir = "";
beforeAll(() => {
  // the temporary directory first: files are written there even when the build is missing
  dir = mkdtempSync(join(tmpdir(), "protolyte-locale-"));
  requireBuild();
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, content: string | Buffer): string {
  const f = join(dir, name);
  writeFileSync(f, content);
  return f;
}

const values = (out: string): unknown[][] => (JSON.parse(out) as { values: unknown[][] }[])[0]!.values;

test("a ;-separated CSV with decimal commas reads as the same sheet written with , and points", () => {
  const point = run(["sheet", file("point.csv", 'name,amount\nacetic acid,0.05\nsodium acetate,1.5E-2\npH,"=AQ.PH(A2:A3,B2:B3)"\n'), "--json"]);
  const comma = run(["sheet", file("comma.csv", "name;amount\r\nacetic acid;0,05\r\nsodium acetate;1,5E-2\r\npH;=AQ.PH(A2:A3,B2:B3)\r\n"), "--json"]);
  expect(comma.code).toBe(0);
  expect(values(comma.out)).toEqual(values(point.out));
  expect(values(comma.out)[1]![1]).toBe(0.05);
  expect(comma.err).toMatch(/read as ';'-separated, numbers with a decimal comma/);
  // --separator chooses; a file whose fields hold commas is then not split at them.
  const forced = run(["sheet", file("forced.csv", "a;b,c\n"), "--separator", ";", "--json"]);
  expect(values(forced.out)).toEqual([["a", "b,c"]]);
});

test("Windows-1252 text keeps ° and µ, and says how it was read", () => {
  const bytes = Buffer.from([...Buffer.from("temperature "), 0xb0, ...Buffer.from("C,5 "), 0xb5, ...Buffer.from("mol\n")]);
  const r = run(["sheet", file("cp1252.csv", bytes), "--json"]);
  expect(values(r.out)).toEqual([["temperature °C", "5 µmol"]]);
  expect(r.err).toMatch(/not valid UTF-8: read as Windows-1252/);
  // UTF-8 with a byte-order mark: read as UTF-8, no note.
  const bom = run(["sheet", file("bom.csv", `\ufefftemperature °C,5 µmol\n`), "--json"]);
  expect(values(bom.out)).toEqual([["temperature °C", "5 µmol"]]);
  expect(bom.err).not.toMatch(/Windows-1252/);
});

test("CSV output is UTF-8 with a byte-order mark and CRLF line ends", () => {
  const out = join(dir, "out.csv");
  expect(run(["sheet", file("deg.csv", "°C,=1+1\nµ,3\n"), "--out", out]).code).toBe(0);
  expect(readFileSync(out).subarray(0, 3)).toEqual(Buffer.from([0xef, 0xbb, 0xbf]));
  expect(readFileSync(out, "utf8")).toBe("\ufeff°C,2\r\nµ,3\r\n");
});

test("dates and times are Excel's serial numbers: =A1+30 and a time in a formula compute", async () => {
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet("S");
  ws.getCell("A1").value = new Date(Date.UTC(2000, 0, 1));
  ws.getCell("A1").numFmt = "yyyy-mm-dd";
  ws.getCell("B1").value = { formula: "A1+30" } as ExcelJS.CellFormulaValue;
  ws.getCell("A2").value = new Date(Date.UTC(1899, 11, 30, 18, 0));
  ws.getCell("A2").numFmt = "h:mm";
  ws.getCell("B2").value = { formula: "A2*24" } as ExcelJS.CellFormulaValue;
  const r = run(["sheet", file("dates.xlsx", Buffer.from(await wb.xlsx.writeBuffer())), "--json"]);
  // 2000-01-01 is serial 36526 in Excel's 1900 date system (common practice: Excel's DATEVALUE("2000-01-01")).
  expect(values(r.out)).toEqual([
    [36526, 36556],
    [0.75, 18],
  ]);
});

test("RECIPE → RECIPE → RECIPE → RECIPE → SPECIES in one row: every table at its real size", () => {
  const row = [
    '"=AQ.RECIPE(""acetic acid"",""sodium acetate"",4.76,0.1,1)"',
    "",
    "",
    "",
    '"=AQ.RECIPE(A2,A3,4.8,B2+B3,1)"',
    "",
    "",
    "",
    '"=AQ.RECIPE(E2,E3,4.9,F2+F3,1)"',
    "",
    "",
    "",
    '"=AQ.RECIPE(I2,I3,5.0,J2+J3,1)"',
    "",
    "",
    "",
    '"=AQ.SPECIES(M2:M3,N2:N3)"',
  ].join(",");
  const r = run(["sheet", file("chain.csv", `${row}\n`), "--json"]);
  const [sheet] = JSON.parse(r.out) as { values: unknown[][]; errors: unknown[] }[];
  expect(sheet!.errors).toEqual([]);
  // Each recipe makes 1 L at the total of the one before: acetate stays 0.1 mol/L down the chain,
  // so the species table's acetic acid + acetate is 0.1 mol/L (mass balance).
  const species = sheet!.values.map((r) => [r[16], r[18]]).filter(([name]) => name === "CH3COOH" || name === "CH3COO-");
  expect(species).toHaveLength(2);
  const total = species.reduce((s, [, c]) => s + (c as number), 0);
  expect(Math.abs(total - 0.1) / 0.1).toBeLessThan(1e-9);
});

describe("readable output", () => {
  test("a molar mass as the atomic-weight table gives it; a pH to 3 decimals; --digits; --json in full", () => {
    // HCl from the built-in standard atomic weights: H 1.008 + Cl 35.45 = 36.458 (sum of the table's values).
    expect(run(["eval", '=AQ.MOLARMASS("HCl")']).out).toBe("36.458\n");
    const json = JSON.parse(run(["eval", "--json", '=AQ.MOLARMASS("HCl")']).out) as { value: number };
    expect(Math.abs(json.value - 36.458)).toBeLessThan(1e-9);
    const ph = run(["eval", '=AQ.PH("acetic acid",0.1)']).out.trim();
    expect(ph).toMatch(/^2\.\d{3}$/);
    // Acetic acid 0.1 mol/L: pH ≈ ½(pKa − log c) = ½(4.756 + 1) ≈ 2.88 (pKa: Goldberg et al. 2002), ±0.03 for activity.
    expect(Math.abs(Number(ph) - 2.878)).toBeLessThan(0.03);
    expect(run(["eval", "--digits", "2", '=AQ.PH("acetic acid",0.1)']).out).toBe(`${Number(ph).toPrecision(2)}\n`);
  });

  // The pH, molar-mass and recipe roundings are for a formula that is one call of that function: a
  // number computed from it is not a pH (AQ.PH(…)/1000 = 0.002881 must not print as 0.003).
  test("a function's own rounding only for a formula that is one call of it", () => {
    expect(roundingFor('=AQ.PH("acetic acid",0.1)')).toEqual({ decimals: 3 });
    expect(roundingFor(' = aq.ph("acetic acid", 0.1) ')).toEqual({ decimals: 3 });
    expect(roundingFor('=AQ.PH("a)b",0.1)')).toEqual({ decimals: 3 });
    expect(roundingFor('=AQ.PH("acetic acid",0.1)/1000')).toEqual(DEFAULT_ROUNDING);
    expect(roundingFor('=AQ.PH("acetic acid",0.1)-AQ.PH("acetic acid",0.1,37)')).toEqual(DEFAULT_ROUNDING);
    expect(roundingFor('=AQ.MOLARMASS("HCl")*2')).toEqual(DEFAULT_ROUNDING);
    expect(roundingFor('=AQ.RECIPE("acetic acid","sodium acetate",4.76,0.1,1)*1000')).toEqual(DEFAULT_ROUNDING);
    expect(roundingFor('=AQ.RECIPE("acetic acid","sodium acetate",4.76,0.1,1)')).toEqual({ significant: 4 });
  });

  test("a RECIPE table: grams to 4 significant figures", () => {
    const r = run(["eval", '=AQ.RECIPE("acetic acid","sodium acetate",4.76,0.1,1)']);
    const rows = r.out.trim().split("\n").map((l) => l.split("\t"));
    expect(rows[0]).toEqual(["component", "mol", "grams", "litres of stock"]);
    for (const row of rows.slice(1)) expect(row[2]).toMatch(/^\d\.\d{3}$/);
  });
});
