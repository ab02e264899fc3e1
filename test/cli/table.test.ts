/**
 * `protolyte table`: a streamed what-if table (src/cli/table.ts), run as a user runs the compiled
 * command line. Each row's result must equal the same function called for that row alone (the
 * identity the row-wise functions keep), a bad row is its own error value with its message and
 * never stops the rows after it, and the worker threads give the same bytes as one thread.
 */
import { mkdtempSync, readFileSync, writeFileSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import * as Functions from "../../src/functions/functions";
import { requireBuild, run } from "./support/run";

beforeAll(() => requireBuild());

const dir = mkdtempSync(join(tmpdir(), "protolyte-table-"));
function file(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

const PH = (amounts: unknown[][], t?: unknown): number => (Functions.PH([["acetic acid", "sodium acetate"]], amounts, t as never) as number[][])[0]![0]!;

/** Output CSV → rows of fields (no quoted commas in these outputs). */
function rowsOf(text: string): string[][] {
  return text.replace(/^\ufeff/, "").split(/\r?\n/).filter((l) => l !== "").map((l) => l.split(","));
}

describe("protolyte table", () => {
  test("a bad row in the middle is its own #VALUE! with its message; the rows around it equal the per-row function", () => {
    const input = file("bad.csv", "acetic acid,sodium acetate,temperature\n0.1,0.1,25\n0.05,0.1,37\n-0.01,0.1,25\n,,\n0.02,0.01,5\n");
    const r = run(["table", "AQ.PH", input]);
    expect(r.code).toBe(0);
    const rows = rowsOf(r.out);
    expect(rows[0]).toEqual(["acetic acid", "sodium acetate", "temperature", "AQ.PH", "message"]);
    const expected = [
      [[0.1, 0.1], 25],
      [[0.05, 0.1], 37],
    ] as const;
    expected.forEach(([amounts, t], i) => expect(Math.abs(Number(rows[i + 1]![3]) - PH([[...amounts]], t))).toBeLessThanOrEqual(1e-12));
    expect(rows[3]![3]).toBe("#VALUE!");
    expect(rows[3]!.slice(4).join(",")).toMatch(/negative/);
    expect(rows[4]!.slice(3)).toEqual(["", ""]); // a blank row: a blank result
    expect(Math.abs(Number(rows[5]![3]) - PH([[0.02, 0.01]], 5))).toBeLessThanOrEqual(1e-12);
    expect(r.err).toMatch(/row 3: #VALUE!/);
    expect(r.err).toMatch(/5 rows of AQ\.PH, 1 error row, 1 blank/);
  });

  test("a file with a header and no rows writes the header and says 0 rows; a file with no header is refused", () => {
    const r = run(["table", "AQ.BETA", file("none.csv", "KH2PO4,Na2HPO4\n")]);
    expect(r.code).toBe(0);
    expect(rowsOf(r.out)).toEqual([["KH2PO4", "Na2HPO4", "AQ.BETA", "message"]]);
    expect(r.err).toMatch(/0 rows of AQ\.BETA/);
    const empty = run(["table", "AQ.PH", file("empty.csv", "")]);
    expect(empty.code).toBe(2);
    expect(empty.err).toMatch(/no header row/);
  });

  test("the function and fixed arguments on the file's first line; a per-row argument from a column named like it", () => {
    const input = file("adjust.csv", "#AQ.ADJUST,titrant=NaOH\nacetic acid,sodium acetate,target_pH\n0.05,0.05,5\n0.05,0.05,5.5\n");
    const r = run(["table", input]);
    expect(r.code).toBe(0);
    const rows = rowsOf(r.out);
    [5, 5.5].forEach((target, i) => {
      const alone = (Functions.ADJUST([["acetic acid", "sodium acetate"]], [[0.05, 0.05]], target as never, "NaOH" as never) as number[][])[0]![0]!;
      expect(Math.abs(Number(rows[i + 1]![3]) - alone)).toBeLessThanOrEqual(1e-12 * Math.abs(alone));
    });
  });

  test("an unknown substance in the header stops the run before any row, naming the closest names; nothing is written", () => {
    const out = join(dir, "never.csv");
    const r = run(["table", "AQ.PH", file("unknown.csv", "acetic acid,sodium acetat\n0.1,0.1\n"), "--out", out]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/Unknown substance 'sodium acetat'.*sodium acetate/);
    expect(existsSync(out)).toBe(false);
  });

  test("a missing required argument, an unknown argument and a function that gives a table are usage errors", () => {
    const input = file("acetate.csv", "acetic acid,sodium acetate\n0.1,0.1\n");
    expect(run(["table", "AQ.CAPACITY", input]).err).toMatch(/needs 'delta_pH'/);
    expect(run(["table", "AQ.PH", input, "colour=blue"]).err).toMatch(/no argument 'colour'/);
    expect(run(["table", "AQ.RECIPE", input]).err).toMatch(/not a function a table can run/);
  });

  test("--workers 2 writes the same bytes as one thread, in input order, across several batches", () => {
    let text = "KH2PO4,Na2HPO4,temperature\n";
    for (let i = 0; i < 4500; i++) text += `${(0.01 + (i % 50) * 0.001).toFixed(3)},${(0.01 + (i % 37) * 0.001).toFixed(3)},${5 + (i % 60)}\n`;
    text += "-1,0.1,25\n";
    const input = file("many.csv", text);
    const one = join(dir, "one.csv");
    const two = join(dir, "two.csv");
    expect(run(["table", "AQ.PH", input, "--out", one]).code).toBe(0);
    const r = run(["table", "AQ.PH", input, "--out", two, "--workers", "2"]);
    expect(r.code).toBe(0);
    expect(r.err).toMatch(/4501 rows of AQ\.PH, 1 error row/);
    expect(readFileSync(two)).toEqual(readFileSync(one));
  });
});
