/**
 * adjust: titrant to a target pH, per litre (no dilution) and from a stock (dilution included).
 * Checks: analytic identities of the charge balance (ideal activity), a published preparation
 * (Bates & Bower 1956), feeding the answer back, the "unreachable" messages, bad input, and a
 * fast-check property (adjust inverts the forward titration).
 */
import fc from "fast-check";
import { kw, solvePH, type Component, type Mixture } from "../../../src/chem";
import { adjust } from "../../../src/chem/workflows";
import { mixedWithStock, withAdded } from "../../../src/chem/workflows/mixing";
import { casesOf } from "../../reference";
import * as f from "./fixtures";

const acetateBuffer = f.mixture([f.aceticAcid, 0.05], [f.sodiumAcetate, 0.05]);
const phosphateBuffer = f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]);

describe("adjust: identities of the charge balance (ideal activity)", () => {
  // Water with a spectator salt, ideal activity: the charge balance is n + [H⁺] = [OH⁻] for NaOH,
  // so n = Kw/h − h exactly (h = 10^−pH).
  test.each([9, 10, 11, 12])("NaOH to pH %s in 0.1 M NaCl: n = Kw/h − h", (target) => {
    const mix = f.mixture([f.NaCl, 0.1]);
    const r = f.ok(adjust(mix, f.NaOH, target, { activity: "ideal" }));
    const h = 10 ** -target;
    f.expectRel(r.value, kw(25) / h - h, 1e-9, `NaOH into 0.1 M NaCl to pH ${target}, ideal`);
    expect(r.mode).toBe("per-litre");
  });

  // HCl stock c into V of water: c·f = h − Kw/h with f = v/(V + v), so v = V·f/(1 − f).
  test.each([2, 3, 4])("0.1 M HCl stock into 2 L of water to pH %s: v = V·f/(1 − f)", (target) => {
    const h = 10 ** -target;
    const fr = (h - kw(25) / h) / 0.1;
    const expected = (2 * fr) / (1 - fr);
    const r = f.ok(adjust([], f.HCl, target, { activity: "ideal", stock: { conc: 0.1, volume: 2 } }));
    f.expectRel(r.value, expected, 1e-9, `0.1 M HCl into 2 L water to pH ${target}, ideal`);
    expect(r.mode).toBe("stock");
  });
});

describe("adjust: published preparation", () => {
  // KHP + HCl (test/reference/khp-hcl.json; docs/references.md, section 5): 50 mL 0.1 M KHP + x mL
  // 0.1 M HCl diluted to 100 mL, 25 °C. In the final solution: KHP 0.05 M and HCl x/1000 M. The
  // table's x must lie between the amounts adjust finds for target ∓ the table's tolerance.
  test.each(casesOf("khp-hcl"))("$id: KHP 0.05 M + HCl to pH $printed: table x = $stock.titrant_mL mL", (c) => {
    const x = c.stock!.titrant_mL;
    const tol = c.tolerance.value;
    const mix = f.mixture([f.KHphthalate, 0.05]);
    const upper = f.ok(adjust(mix, f.HCl, c.expected - tol)).value * 1000;
    const lower = f.ok(adjust(mix, f.HCl, c.expected + tol)).value * 1000;
    const inside = x >= lower && x <= upper;
    if (!inside) throw new Error(`${c.id}: table x ${x} mL outside [${lower}, ${upper}] mL (±${tol} pH)`);
    expect(inside).toBe(true);
  });
});

describe("adjust: the answer fed back reproduces the target", () => {
  const cases: { label: string; mix: Mixture; titrant: Component; target: number; stock?: { conc: number; volume: number } }[] = [
    { label: "acetate + NaOH to 5.0", mix: acetateBuffer, titrant: f.NaOH, target: 5.0 },
    { label: "acetate + 1 M NaOH stock to 5.0 in 800 L", mix: acetateBuffer, titrant: f.NaOH, target: 5.0, stock: { conc: 1, volume: 800 } },
    { label: "phosphate + HCl to 6.5", mix: phosphateBuffer, titrant: f.HCl, target: 6.5 },
    { label: "phosphate + 0.5 M HCl stock to 6.0 in 10 L", mix: phosphateBuffer, titrant: f.HCl, target: 6.0, stock: { conc: 0.5, volume: 10 } },
    { label: "acetate + sodium acetate (weak titrant) to 5.2", mix: acetateBuffer, titrant: f.sodiumAcetate, target: 5.2 },
    { label: "phosphate + 0.2 M acetate buffer stock to 6.0", mix: phosphateBuffer, titrant: f.aceticAcid, target: 6.0, stock: { conc: 0.2, volume: 1 } },
    { label: "Tris 0.05 M + HCl to 7.4 at 37 °C", mix: f.mixture([f.trisBase, 0.05]), titrant: f.HCl, target: 7.4 },
  ];
  test.each(cases)("$label", ({ label, mix, titrant, target, stock }) => {
    const temperatureC = label.includes("37 °C") ? 37 : 25;
    const r = f.ok(adjust(mix, titrant, target, { stock, temperatureC }));
    const final = stock === undefined ? withAdded(mix, titrant, r.value) : mixedWithStock(mix, titrant, stock.conc, r.value / (stock.volume + r.value));
    f.expectAbs(f.pH(final, { temperatureC }), target, 1e-8, `${label}: pH of the mixture with the answer ${r.value}`);
    f.expectAbs(r.pH, target, 1e-8, `${label}: pH reported`);
    expect(r.value).toBeGreaterThan(0);
  });

  test("a mixture typed with the same substance in several entries gives the same answer as merged", () => {
    const split = f.mixture([f.aceticAcid, 0.02], [f.sodiumAcetate, 0.05], [f.aceticAcid, 0.03]);
    const a = f.ok(adjust(split, f.NaOH, 5.0, { stock: { conc: 1, volume: 800 } })).value;
    const b = f.ok(adjust(acetateBuffer, f.NaOH, 5.0, { stock: { conc: 1, volume: 800 } })).value;
    f.expectRel(a, b, 1e-12, "split vs merged acetate batch");
  });

  test("a target equal to the current pH gives exactly 0", () => {
    const now = f.pH(acetateBuffer);
    expect(f.ok(adjust(acetateBuffer, f.NaOH, now)).value).toBe(0);
    expect(f.ok(adjust(acetateBuffer, f.HCl, now, { stock: { conc: 1, volume: 5 } })).value).toBe(0);
  });
});

describe("adjust: unreachable targets say which way and how far", () => {
  test("NaOH cannot lower the pH", () => {
    const r = adjust(phosphateBuffer, f.NaOH, 6.5);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.code).toBe("unreachable");
    expect(r.message).toContain("NaOH raises the pH");
    expect(r.message).toContain(`at pH ${f.pH(phosphateBuffer).toFixed(2)}, already above the target 6.50`);
  });

  test("HCl cannot raise the pH", () => {
    const r = adjust(acetateBuffer, f.HCl, 6);
    expect(r.ok ? "ok" : r.code).toBe("unreachable");
    if (!r.ok) expect(r.message).toContain("HCl lowers the pH");
  });

  test("a weak titrant stock cannot pass its own pH (the limit as v → ∞)", () => {
    const stockPH = f.pH(f.mixture([f.sodiumAcetate, 0.1]));
    const r = adjust(acetateBuffer, f.sodiumAcetate, 9.5, { stock: { conc: 0.1, volume: 1 } });
    expect(r.ok ? "ok" : r.code).toBe("unreachable");
    if (r.ok) return;
    expect(r.message).toContain("cannot pass its own pH");
    expect(r.message).toContain(`at most ${stockPH.toFixed(2)}`);
  });

  test("a strong titrant stock stops at its own pH too", () => {
    const stockPH = f.pH(f.mixture([f.NaOH, 0.01]));
    const r = adjust(acetateBuffer, f.NaOH, 12.5, { stock: { conc: 0.01, volume: 1 } });
    expect(r.ok ? "ok" : r.code).toBe("unreachable");
    if (!r.ok) expect(r.message).toContain(`at most ${stockPH.toFixed(2)}`);
  });

  test("without dilution a weak titrant is limited by the ionic-strength limit, and the message quotes the pH there", () => {
    const r = adjust(acetateBuffer, f.sodiumAcetate, 12);
    expect(r.ok ? "ok" : r.code).toBe("beyond-limit");
    if (r.ok) return;
    // 0.05 + 0.05 acetate buffer (I = 0.05 from Na⁺ and acetate): sodium acetate adds 1 mol/L of
    // ionic strength per mol/L, so the limit is reached at about 0.95 mol/L added.
    expect(r.message).toMatch(/weak titrant cannot pass its own pH.*at most 5\.\d\d \(at 0\.9\d+ mol\/L, where the ionic strength reaches the 1 mol\/L limit/);
    const added = Number(/at (0\.9\d+) mol\/L/.exec(r.message)![1]);
    const there = f.ok(solvePH(withAdded(acetateBuffer, f.sodiumAcetate, added * (1 - 1e-6))));
    expect(there.ionicStrength).toBeLessThanOrEqual(1);
    expect(there.ionicStrength).toBeGreaterThan(0.999);
    expect(r.message).toContain(`at most ${there.pH.toFixed(2)} `);
  });
});

describe("adjust: bad input", () => {
  test.each([
    { label: "target NaN", run: () => adjust(acetateBuffer, f.NaOH, NaN), code: "bad-input", text: "target pH" },
    { label: "target 20", run: () => adjust(acetateBuffer, f.NaOH, 20), code: "bad-input", text: "outside" },
    { label: "neutral titrant", run: () => adjust(acetateBuffer, f.sucrose, 5), code: "bad-input", text: "cannot change the pH" },
    { label: "stock concentration 0", run: () => adjust(acetateBuffer, f.NaOH, 5, { stock: { conc: 0, volume: 1 } }), code: "bad-input", text: "stock concentration" },
    { label: "batch volume −1", run: () => adjust(acetateBuffer, f.NaOH, 5, { stock: { conc: 1, volume: -1 } }), code: "bad-input", text: "batch volume" },
    { label: "stock above the engine's limit", run: () => adjust(acetateBuffer, f.NaOH, 5, { stock: { conc: 50, volume: 1 } }), code: "out-of-range", text: "mol/L" },
    { label: "negative amount in the mixture", run: () => adjust(f.mixture([f.aceticAcid, -1]), f.NaOH, 5), code: "bad-input", text: "negative" },
    { label: "temperature 150 °C", run: () => adjust(acetateBuffer, f.NaOH, 5, { temperatureC: 150 }), code: "out-of-range", text: "Temperature" },
    { label: "unknown activity model", run: () => adjust(acetateBuffer, f.NaOH, 5, { activity: "bromley" as never }), code: "bad-input", text: "activity" },
  ])("$label → $code", ({ run, code, text }) => {
    const r = run();
    expect(r.ok ? "ok" : r.code).toBe(code);
    if (!r.ok) expect(r.message).toContain(text);
  });
});

describe("adjust: properties", () => {
  // Random buffers of one system; the forward titration with a strong titrant gives a target that
  // is reachable by construction, and pH is strictly monotone in a strong titrant's amount, so
  // adjust must recover the amount that produced it.
  const buffers: [Component, Component][] = [
    [f.aceticAcid, f.sodiumAcetate],
    [f.KH2PO4, f.Na2HPO4],
    [f.trisBase, f.trisBase],
    [f.KH2citrate, f.KH2citrate],
  ];
  const logUniform = (lo: number, hi: number) => fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map(Math.exp);
  const arb = fc.record({
    buffer: fc.constantFrom(...buffers),
    c1: logUniform(1e-3, 0.1),
    c2: logUniform(1e-3, 0.1),
    base: fc.boolean(),
    n: logUniform(1e-5, 0.05),
    // Stock volume fraction f = v/(V + v) kept ≤ 0.5: near f = 1 the volume v = V·f/(1 − f) is
    // ill-conditioned in f (the pH barely changes while v grows without bound).
    frac: logUniform(1e-5, 0.5),
    // Stocks up to 1 mol/L: the solution reached stays within the ionic-strength limit (1 mol/L).
    stock: fc.option(fc.record({ conc: logUniform(0.05, 1), volume: logUniform(0.01, 1000) }), { nil: undefined }),
    temperatureC: fc.double({ min: 5, max: 45, noNaN: true }),
    activity: fc.constantFrom("davies" as const, "ideal" as const, "debye-huckel" as const),
  });
  test("adjust inverts the forward titration with NaOH or HCl (per litre and from a stock)", () => {
    fc.assert(
      fc.property(arb, ({ buffer, c1, c2, base, n, frac, stock, temperatureC, activity }) => {
        const mix = f.mixture([buffer[0], c1], [buffer[1], c2]);
        const titrant = base ? f.NaOH : f.HCl;
        const opts = { temperatureC, activity };
        const final = stock === undefined ? withAdded(mix, titrant, n) : mixedWithStock(mix, titrant, stock.conc, frac);
        const target = f.pH(final, opts);
        const r = f.ok(adjust(mix, titrant, target, { ...opts, stock }));
        const expected = stock === undefined ? n : (stock.volume * frac) / (1 - frac);
        const ctx = `${mix.map((e) => `${e.component.name} ${e.conc}`).join(" + ")}, ${titrant.name} ${stock === undefined ? `${n} mol/L` : `stock ${JSON.stringify(stock)}, fraction ${frac}`}, ${temperatureC} °C, ${activity}`;
        f.expectRel(r.value, expected, 1e-6, ctx);
      }),
      { numRuns: 150 },
    );
  });

  test("more base for a higher target (monotone in the target)", () => {
    fc.assert(
      fc.property(fc.double({ min: 4.7, max: 5.9, noNaN: true }), fc.double({ min: 0.01, max: 0.5, noNaN: true }), (t, d) => {
        const lo = f.ok(adjust(acetateBuffer, f.NaOH, t)).value;
        const hi = f.ok(adjust(acetateBuffer, f.NaOH, t + d)).value;
        if (!(hi > lo)) throw new Error(`target ${t} → ${lo} mol/L, target ${t + d} → ${hi} mol/L: not increasing`);
      }),
      { numRuns: 60 },
    );
  });
});
