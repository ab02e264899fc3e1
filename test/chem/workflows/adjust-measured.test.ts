/**
 * adjust from a measured pH: the gap between the computed and the measured pH is an unknown excess of
 * strong base or acid (one monovalent counter-ion per mole), and the titrant is computed from the
 * measured state. Identities: a batch that really holds that excess (as NaOH or HCl: monovalent
 * counter-ions like the assumed one) gives the same titrant as adjust on the true composition; the
 * measured state plus the titrant, fed back, reads the target; no gap means no excess.
 */
import { solvePH } from "../../../src/chem";
import { adjust, STRONG_ACID, STRONG_BASE } from "../../../src/chem/workflows";
import * as f from "./fixtures";

const phosphate = f.mixture([f.NaH2PO4, 0.018375], [f.Na2HPO4, 0.031625]);

function pHOf(mix: Parameters<typeof solvePH>[0], temperatureC = 25): number {
  const r = solvePH(mix, { temperatureC });
  if (!r.ok) throw new Error(r.message);
  return r.pH;
}

describe("adjust from a measured pH", () => {
  test.each([
    { label: "phosphate 50 mM, 0.006 M NaOH too much, back to 7.10 with 1 M HCl into 500 L", excess: f.NaOH, e: 0.006, titrant: f.HCl, target: 7.1, stock: { conc: 1, volume: 500 }, t: 25 },
    { label: "phosphate 50 mM, 0.004 M HCl too much, back up with NaOH per litre at 5 °C", excess: f.HCl, e: 0.004, titrant: f.NaOH, target: 7.1, stock: undefined, t: 5 },
    { label: "acetate 0.1 M, 0.01 M NaOH too much, down to 4.8 with HCl", excess: f.NaOH, e: 0.01, titrant: f.HCl, target: 4.8, stock: undefined, t: 25, mix: f.mixture([f.aceticAcid, 0.05], [f.sodiumAcetate, 0.05]) },
  ])("$label: same titrant as on the true composition; excess recovered", ({ excess, e, titrant, target, stock, t, mix }) => {
    const nominal = mix ?? phosphate;
    const truth = [...nominal, { component: excess, conc: e }];
    const measured = pHOf(truth, t);
    const fromMeasured = f.ok(adjust(nominal, titrant, target, { temperatureC: t, stock, measuredPH: measured }));
    const onTruth = f.ok(adjust(truth, titrant, target, { temperatureC: t, stock }));
    f.expectRel(fromMeasured.value, onTruth.value, 1e-8, "titrant from the measured pH vs on the true batch");
    f.expectRel(fromMeasured.excess?.conc ?? NaN, e, 1e-8, "excess recovered");
    expect(fromMeasured.excess?.reagent).toBe(excess === f.NaOH ? "strong base" : "strong acid");
    f.expectAbs(fromMeasured.excess?.computedPH ?? NaN, pHOf(nominal, t), 1e-12, "computed pH of the nominal batch");
  });

  test("fed back: the measured state plus the titrant (per litre) reads the target", () => {
    const r = f.ok(adjust(phosphate, f.HCl, 7.1, { measuredPH: 7.35 }));
    const reagent = r.excess?.reagent === "strong base" ? STRONG_BASE : STRONG_ACID;
    const state = [...phosphate, { component: reagent, conc: r.excess?.conc ?? NaN }];
    f.expectAbs(pHOf(state), 7.35, 1e-9, "measured state");
    f.expectAbs(pHOf([...state, { component: f.HCl, conc: r.value }]), 7.1, 1e-9, "after the titrant");
  });

  test("a measured pH equal to the computed one adds no excess and changes nothing", () => {
    const plain = f.ok(adjust(phosphate, f.HCl, 7.0));
    const same = f.ok(adjust(phosphate, f.HCl, 7.0, { measuredPH: pHOf(phosphate) }));
    expect(same.excess?.conc ?? NaN).toBeLessThan(1e-12);
    f.expectRel(same.value, plain.value, 1e-9, "titrant");
  });

  // 50 mM acetic acid: strong base up to the 1 mol/L ionic-strength limit reaches pH ≈ 13.9, so a
  // reading of 14.5 is explained by no excess. The message says so, and does not call the reading
  // "the target" (the target is 5).
  test("a measured pH that no excess explains is refused with that reason", () => {
    const r = adjust(f.mixture([f.aceticAcid, 0.05]), f.NaOH, 5, { measuredPH: 14.5 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.message).toMatch(/measured pH 14\.50 differs from the computed .*no excess of strong base explains it/);
    expect(r.message).not.toMatch(/target 14\.50/);
  });

  test.each([NaN, 20, -3])("measured pH %p is refused", (m) => {
    expect(adjust(phosphate, f.HCl, 7, { measuredPH: m })).toMatchObject({ ok: false, code: "bad-input", message: expect.stringMatching(/measured pH/) });
  });
});
