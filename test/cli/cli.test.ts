/**
 * The headless contract: `protolyte eval` and `protolyte sheet` evaluate AQ formulas in the embedded
 * spreadsheet engine as a user types them (ranges, inline arrays, spills, error values with messages).
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { parseCsv } from "../../src/cli/csv";
import { evaluateFormula, evaluateSheets } from "../../src/cli/evaluate";

import { requireBuild, root, run } from "./support/run";
import { referenceCase } from "../reference";

/** 0.05 mol/kg KH phthalate, pH(S) at 25 °C, with its tolerance. */
const KHP_STD = referenceCase("ph-standards", "STD25-KHP");

const tsx = join(root, "node_modules", ".bin", "tsx");
const cli = join(root, "src", "cli", "bin.ts");

beforeAll(requireBuild);

describe("evaluateFormula", () => {
  test("potassium hydrogen phthalate 0.05 mol/L reads its pH(S) within the standard's tolerance", () => {
    // Hamer, Pinching & Acree (1946), pH(S) at 25 °C: test/reference/ph-standards.json.
    // ±0.02: Davies activity against the Bates–Guggenheim convention, molarity ≈ molality at 0.05.
    const r = evaluateFormula('=AQ.PH("potassium hydrogen phthalate", 0.05)');
    expect(r.error).toBeUndefined();
    expect(Math.abs((r.value as number) - KHP_STD.expected)).toBeLessThanOrEqual(KHP_STD.tolerance.value);
  });

  test("inline arrays, unit text and the same value as numbers", () => {
    const a = evaluateFormula('=AQ.PH({"KH2PO4";"Na2HPO4"},{"25 mM";"25 mM"})');
    const b = evaluateFormula('=AQ.PH({"KH2PO4";"Na2HPO4"},{0.025;0.025})');
    expect(a.value).toBe(b.value);
    // DIN 19266 / Buck et al. 2002: 0.025/0.025 mol/kg phosphate, pH(S) 6.865 at 25 °C, ±0.02 as above.
    expect(Math.abs((a.value as number) - 6.865)).toBeLessThanOrEqual(0.02);
  });

  test("a spilled species table keeps phosphate's mass balance", () => {
    const r = evaluateFormula('=AQ.SPECIES({"KH2PO4";"Na2HPO4"},{0.025;0.025})');
    const rows = r.value as (string | number)[][];
    expect(rows[0]).toEqual(["species", "charge", "mol/L", "fraction"]);
    const phosphate = rows.filter((row) => /PO4/.test(String(row[0])));
    expect(phosphate).toHaveLength(4);
    const total = phosphate.reduce((s, row) => s + (row[2] as number), 0);
    expect(Math.abs(total - 0.05) / 0.05).toBeLessThan(1e-9);
    const fractions = phosphate.reduce((s, row) => s + (row[3] as number), 0);
    expect(Math.abs(fractions - 1)).toBeLessThan(1e-12);
  });

  test("an unknown substance is #VALUE! naming the closest known names", () => {
    const r = evaluateFormula('=AQ.PH("sodium acetat", 0.1)');
    expect(r.error).toBe("#VALUE!");
    expect(r.message).toMatch(/Unknown substance 'sodium acetat'.*sodium acetate/);
  });

  test("mismatched ranges are #VALUE! saying both shapes", () => {
    const r = evaluateFormula('=AQ.PH({"KH2PO4";"Na2HPO4"},{0.025})');
    expect(r.error).toBe("#VALUE!");
    expect(r.message).toMatch(/2×1.*1×1/);
  });

  test("a species that is not in the mixture is #N/A with the species it has", () => {
    const r = evaluateFormula('=AQ.SPECIES("acetic acid", 0.1, "NH4+")');
    expect(r.error).toBe("#N/A");
    expect(r.message).toMatch(/not in this mixture/);
  });
});

describe("evaluateSheets", () => {
  test("formulas referring to cell ranges, with an error cell listed by address", () => {
    const [sheet] = evaluateSheets({
      Sheet1: [
        ["substance", "mol/L"],
        ["KH2PO4", 0.025],
        ["Na2HPO4", 0.025],
        ["pH", "=AQ.PH(A2:A3,B2:B3)"],
        ["bad", "=AQ.PH(A2:A3,B2:B2)"],
      ],
    });
    const ph = sheet!.values[3]![1] as number;
    expect(Math.abs(ph - 6.865)).toBeLessThanOrEqual(0.02); // DIN 19266, as above
    expect(sheet!.errors).toEqual([expect.objectContaining({ address: "B5", error: "#VALUE!" })]);
  });
});

test("a table whose arguments are formula cells spills at its real size", () => {
  // HyperFormula sizes a spill before the cells it reads are computed; evaluate.ts re-enters it.
  const [sheet] = evaluateSheets({
    Sheet1: [
      ["KH2PO4", "=0.05/2"],
      ["Na2HPO4", "=B1"],
      ["=AQ.SPECIES(A1:A2,B1:B2)"],
    ],
  });
  expect(sheet!.errors).toEqual([]);
  const rows = sheet!.values.slice(2);
  expect(rows[0]).toEqual(["species", "charge", "mol/L", "fraction"]);
  const names = rows.slice(1).map((r) => r[0]);
  expect(names).toEqual(expect.arrayContaining(["H+", "OH-", "K+", "Na+", "H2PO4-", "HPO4^2-"]));
  // phosphate mass balance through the spilled cells: 0.025 + 0.025 mol/L
  const phosphate = rows.filter((r) => /PO4/.test(String(r[0]))).reduce((s, r) => s + (r[2] as number), 0);
  expect(Math.abs(phosphate - 0.05) / 0.05).toBeLessThan(1e-9);
});

describe("protolyte command", () => {
  test("eval prints a number; --json prints {value}; an error value exits 1 with {error, message}", () => {
    const plain = run(["eval", '=AQ.PH("potassium hydrogen phthalate",0.05)']);
    expect(plain.code).toBe(0);
    expect(plain.out.trim()).toMatch(/^\d+\.\d{3}$/); // a pH prints to 3 decimals
    expect(Math.abs(Number(plain.out.trim()) - KHP_STD.expected)).toBeLessThanOrEqual(KHP_STD.tolerance.value); // Hamer et al. 1946
    const json = run(["eval", "--json", '=AQ.PH("potassium hydrogen phthalate",0.05)']);
    const full = (JSON.parse(json.out) as { value: number }).value;
    expect(Math.abs(full - Number(plain.out.trim()))).toBeLessThanOrEqual(0.0005); // the same value, full precision
    const bad = run(["eval", "--json", '=AQ.PH("xyzzy",0.05)']);
    expect(bad.code).toBe(1);
    const parsed = JSON.parse(bad.out) as { error: string; message: string };
    expect(parsed.error).toBe("#VALUE!");
    expect(parsed.message).toMatch(/xyzzy/);
  });

  test("sheet evaluates a CSV and writes the values with --out", () => {
    const dir = mkdtempSync(join(tmpdir(), "protolyte-"));
    const input = join(dir, "in.csv");
    const output = join(dir, "out.csv");
    writeFileSync(input, 'name,amount\nTris,0.05\n"Tris HCl",0.05\npH,"=AQ.PH(A2:A3,B2:B3)"\n');
    const r = run(["sheet", input, "--out", output]);
    expect(r.code).toBe(0);
    const rows = parseCsv(readFileSync(output, "utf8"));
    const ph = Number(rows[3]![1]);
    // Tris pK 8.072 at 25 °C (Goldberg et al. 2002): an equimolar Tris/Tris·HCl buffer reads near it,
    // raised by the activity correction of the cation (≈ +0.08 at I = 0.05); the window allows for that.
    expect(ph).toBeGreaterThan(8.05);
    expect(ph).toBeLessThan(8.25);
  });

  test("usage problems exit 2 with the usage text", () => {
    const none = run([]);
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/Usage:/);
    const r = run(["sheet"]);
    expect(r.code).toBe(2);
    expect(r.err).toBe("protolyte: sheet takes exactly one input file\n");
    const missing = run(["sheet", "/nonexistent/file.csv"]);
    expect(missing.code).toBe(2);
    expect(missing.err).toBe("protolyte: cannot read '/nonexistent/file.csv': no such file or directory\n");
  });
});

test("the CLI source file is executable through tsx without a build", () => {
  const out = execFileSync(tsx, [cli, "--help"], { cwd: root, encoding: "utf8" });
  expect(out).toMatch(/protolyte eval/);
});

test("CSV output never turns computed text into a live formula", () => {
  const { toCsv } = require("../../src/cli/csv") as typeof import("../../src/cli/csv");
  expect(toCsv([["=1+1", "+SUM(A1)", "@x", "-y", "plain", -0.5]])).toBe("\ufeff'=1+1,'+SUM(A1),'@x,'-y,plain,-0.5\r\n");
});

test("the compiled command line is executable, as the package's bin runs it", () => {
  const { statSync } = require("node:fs") as typeof import("node:fs");
  const { compiled } = require("./support/run") as typeof import("./support/run");
  const pkg = JSON.parse(readFileSync(join(root, "package.json"), "utf8")) as { bin: Record<string, string> };
  expect(join(root, pkg.bin.protolyte!)).toBe(compiled);
  expect(statSync(compiled).mode & 0o111).toBe(0o111);
  expect(readFileSync(compiled, "utf8").startsWith("#!/usr/bin/env node\n")).toBe(true);
});
