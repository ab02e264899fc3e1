/**
 * The numerical building blocks of the workflows: Brent's bracketed root finder, the first-crossing
 * scan, golden-section maximisation. Checked on functions with known answers.
 */
import { fail } from "../../../src/chem/failure";
import { brentRoot } from "../../../src/chem/workflows/brent";
import { firstCrossing, geometricGrid } from "../../../src/chem/workflows/crossing";
import { goldenMax } from "../../../src/chem/workflows/golden";
import * as f from "./fixtures";

const value = (g: (x: number) => number) => (x: number) => ({ ok: true as const, value: g(x) });

describe("brentRoot", () => {
  test.each([
    { label: "x³ − 2 on [0, 2]", g: (x: number) => x ** 3 - 2, a: 0, b: 2, root: Math.cbrt(2) },
    { label: "cos x − x on [0, 1]", g: (x: number) => Math.cos(x) - x, a: 0, b: 1, root: 0.7390851332151607 },
    { label: "a step-like tanh(1e4·(x − 0.3)) on [0, 1]", g: (x: number) => Math.tanh(1e4 * (x - 0.3)), a: 0, b: 1, root: 0.3 },
    { label: "10^x − 1e-9 on [−12, 0] (root −9)", g: (x: number) => 10 ** x - 1e-9, a: -12, b: 0, root: -9 },
  ])("$label", ({ label, g, a, b, root }) => {
    const r = f.ok(brentRoot(value(g), a, b, g(a), g(b)));
    f.expectAbs(r.x, root, 1e-12, label);
    expect(r.evaluations).toBeLessThan(120);
  });

  test("no sign change → bad-input; a failing evaluation is passed through, never replaced by a guess", () => {
    const g = (x: number) => x * x + 1;
    expect(brentRoot(value(g), -1, 1, g(-1), g(1)).ok).toBe(false);
    const failing = () => fail("no-convergence", "engine failed here");
    const r = brentRoot(failing, 0, 1, -1, 1);
    expect(r.ok ? "ok" : r.message).toBe("engine failed here");
  });

  test("the evaluation cap gives no-convergence", () => {
    const g = (x: number) => Math.tanh(1e4 * (x - 0.3));
    const r = brentRoot(value(g), 0, 1, g(0), g(1), { xtol: 0, maxEvaluations: 3 });
    expect(r.ok ? "ok" : r.code).toBe("no-convergence");
  });
});

describe("firstCrossing", () => {
  test("finds the first of two crossings", () => {
    // sin has roots at π and 2π on (0, 7): starting from t = 0.5 (positive) the first is π.
    const r = firstCrossing(value((t) => Math.sin(t + 0.5)), [0, 1, 2, 3, 4, 5, 6, 7], 0);
    expect(r.ok && r.found ? r.t : NaN).toBeCloseTo(Math.PI - 0.5, 12);
  });

  test("no crossing: every sample returned for the message", () => {
    const r = firstCrossing(value((t) => 1 + t), [0, 1, 2], 0);
    expect(r.ok && !r.found ? r.samples.map((s) => s.value) : null).toEqual([1, 2, 3]);
  });

  test("geometric grid: 0, then from → to inclusive", () => {
    const g = geometricGrid(1e-3, 10, 2);
    expect(g[0]).toBe(0);
    f.expectRel(g[1], 1e-3, 1e-15, "first point");
    f.expectRel(g[g.length - 1], 10, 1e-15, "last point");
    expect(g.length).toBe(1 + 9);
  });
});

describe("goldenMax", () => {
  test("an interior maximum", () => {
    const g = (x: number) => -((x - 0.3) ** 2);
    const r = goldenMax(value(g), 0, 1, g(0), g(1), 1e-9);
    if ("ok" in r) throw new Error(r.message);
    f.expectAbs(r.x, 0.3, 1e-8, "argmax of −(x − 0.3)²");
  });

  test("a monotone function: the higher end", () => {
    const g = (x: number) => x;
    const r = goldenMax(value(g), 2, 5, g(2), g(5), 1e-9);
    if ("ok" in r) throw new Error(r.message);
    expect(r.x).toBe(5);
  });
});
