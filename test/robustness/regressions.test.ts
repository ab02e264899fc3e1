/**
 * Defects found by the robustness campaign, each pinned by the smallest case that showed it.
 */
import { spawnSync } from "node:child_process";
import { join } from "node:path";
import { parseQuantity } from "../../src/chem";
import { goldenMax } from "../../src/chem/workflows/golden";
import { finite } from "../../src/functions/errors";
import { AQ } from "../support/aq-values";
import { resetActiveLibrary } from "../../src/library";
import { outcomeOf, outcomeProblem } from "./outcome";

beforeEach(() => resetActiveLibrary());

describe("number text is decimal only", () => {
  // Number("0x10") is 16 in JavaScript: "0x10" in an amount cell silently meant 16 mol/L.
  test.each(["0x10", "0b11", "0o17", "0X1f"])("amount %p is refused, not read as a hexadecimal/binary/octal number", (text) => {
    const o = outcomeOf(AQ.PH, [[["NaCl"]], [[text]]]);
    expect(o).toMatchObject({ kind: "error", code: "#VALUE!" });
    expect(parseQuantity(text, "concentration")).toMatchObject({ ok: false, code: "bad-input" });
  });

  test("a step given as '0x2' is refused; '2' and ' 2 ' are read", () => {
    expect(outcomeOf(AQ.PKA, ["phosphate", "0x2"])).toMatchObject({ kind: "error", code: "#VALUE!", message: expect.stringMatching(/step must be a finite number/) });
    const two = AQ.PKA("phosphate", 2);
    expect(AQ.PKA("phosphate", "2" as never)).toBe(two);
    expect(AQ.PKA("phosphate", " 2 " as never)).toBe(two);
  });

  test("decimal forms users type still work: '.5', '5.', '+5', '1e-3', ' 0.1 '", () => {
    for (const [text, value] of [[".5", 0.5], ["5.", 5], ["+5", 5], ["1e-3", 0.001], [" 0.1 ", 0.1]] as const) {
      expect({ text, r: parseQuantity(text, "concentration") }).toEqual({ text, r: { ok: true, value } });
    }
  });

  test("'1e999' says it is too large (it used to say 'has unit , which is not a concentration')", () => {
    expect(parseQuantity("1e999", "concentration")).toEqual({ ok: false, code: "bad-input", message: '"1e999" is too large to be a concentration.' });
    const o = outcomeOf(AQ.PH, [[["NaCl"]], [["1e999"]]]);
    expect(o).toMatchObject({ kind: "error", code: "#VALUE!", message: expect.stringMatching(/too large/) });
  });
});

test("a whole-column reference (1 048 576 rows, one filled) gives the same pH as the single cell", () => {
  // shapeOf used Math.max(...rows), which overflows the call stack for a whole column:
  // the cell showed "#VALUE! internal error: Maximum call stack size exceeded".
  const rows = 1_048_576;
  const names: unknown[][] = Array.from({ length: rows }, () => [""]);
  const amounts: unknown[][] = Array.from({ length: rows }, () => [""]);
  names[0] = ["acetic acid"];
  amounts[0] = [0.1];
  names[rows - 1] = ["sodium acetate"];
  amounts[rows - 1] = [0.1];
  const o = outcomeOf(AQ.PH, [names, amounts]);
  expect(outcomeProblem(o, "scalar")).toBeNull();
  expect(o).toEqual({ kind: "value", value: AQ.PH([["acetic acid"], ["sodium acetate"]], [[0.1], [0.1]]) });
});

describe("AQ.PKA refuses an ionic strength beyond the engine's limit (1 mol/L)", () => {
  // It returned 6.1e299 for I = 1e300, 66.6 for I = 100 and 17.73 for I = 19.9: numbers nobody should trust.
  test.each([1.01, 19.9, 21, 100, 1e300])("I = %p mol/L → #N/A", (I) => {
    const o = outcomeOf(AQ.PKA, ["phosphate", 2, 25, I]);
    expect(o).toMatchObject({ kind: "error", code: "#N/A", message: expect.stringMatching(/beyond the 1 mol\/L limit/) });
  });

  test("I = 1 mol/L and below still give a number", () => {
    expect(Number.isFinite(AQ.PKA("phosphate", 2, 25, 1))).toBe(true);
    expect(AQ.PKA("phosphate", 2, 25, 0)).toBeCloseTo(7.1965, 4); // Partanen & Minkkinen (1996), the built-in value
  });
});

describe("AQ.PHRANGE with tiny tolerances ends", () => {
  // goldenMax looped forever when the tolerance interval was so narrow (±1e-12 around a pKa of
  // 7.2) that 1e-7 of its width fell below the spacing of doubles: Excel would stay at #BUSY!.
  test("goldenMax on an interval a few ulps wide stops after a bounded number of evaluations", () => {
    let calls = 0;
    const f = (x: number) => {
      if (++calls > 10_000) throw new Error("goldenMax does not stop");
      return { ok: true as const, value: -((x - 7.2) ** 2) };
    };
    const lo = 7.2 - 1e-12;
    const hi = 7.2 + 1e-12;
    const best = goldenMax(f, lo, hi, f(lo).value, f(hi).value, 1e-7 * (hi - lo));
    expect("x" in best && best.x >= lo && best.x <= hi).toBe(true);
    expect(calls).toBeLessThan(200);
  });

  test("the case the fuzzer found returns a band (in a child process, so a hang fails instead of stalling jest)", () => {
    const root = join(__dirname, "..", "..");
    const script = [
      'require("./src/functions/runtime-shim");',
      'const AQ = require("./src/functions/functions");',
      'const r = AQ.PHRANGE([["KH2PO4"],["Tris HCl"]], [[2.0e-7],[3.4e-4]], 1e-12, 1e-12, 25);',
      "process.stdout.write(JSON.stringify(r));",
    ].join("\n");
    const r = spawnSync(join(root, "node_modules", ".bin", "tsx"), ["-e", script], { cwd: root, encoding: "utf8", timeout: 30_000 });
    expect({ signal: r.signal, status: r.status, stderr: r.stderr }).toEqual({ signal: null, status: 0, stderr: "" });
    const table = JSON.parse(r.stdout) as unknown[][];
    expect(table[0]).toEqual(["low pH", "high pH", "method"]);
    const [low, high] = table[1] as number[];
    expect(high - low).toBeGreaterThanOrEqual(0);
    expect(high - low).toBeLessThan(1e-6);
  });
});

describe("an overflow from huge inputs is said so, not reported as an internal error", () => {
  // AQ.RECIPE for a 3e306 L batch showed "#VALUE! internal error: grams is not a finite number".
  // (Volume raised to 3e307 L: with the ionic-strength limit the salt for I = 1 mol/L is found with
  // slightly different amounts, and 3.25e306 L no longer overflows a double.)
  test("AQ.RECIPE with a 3e307 L batch", () => {
    const o = outcomeOf(AQ.RECIPE, ["NaH2PO4", "Na2HPO4", 4.613, 0.0541, 3.253171503736697e307, 0, 1, "NaCl", null]);
    expect(o).toMatchObject({ kind: "error", code: "#VALUE!", message: expect.stringMatching(/^grams is too large to be a number \(it overflows\): check the size of the inputs/) });
    expect(outcomeProblem(o, "matrix")).toBeNull();
  });

  test("a NaN is still an internal error (a defect, not an input problem)", () => {
    expect(() => finite(NaN, "pH")).toThrow(/^internal error: pH is not a finite number$/);
    expect(() => finite(-Infinity, "β")).toThrow(/^β is too large to be a number/);
    expect(finite(-0, "x")).toBe(-0);
  });
});
