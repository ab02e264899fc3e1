/**
 * recipe with other components held fixed (the rest of the batch: salt, sucrose, a second buffer).
 * Rule (issue 18): the listed components plus the background, fed back through the engine at the
 * recipe's temperature, give the target pH within 0.001 (here far tighter: the solve stops at 1e-11).
 * Identities: the background is listed at exactly its amounts; the buffer total is still C; made
 * without the background and then given it, the batch misses the target (why the argument exists).
 */
import { recipe, type RecipeRequest } from "../../../src/chem/workflows";
import * as f from "./fixtures";

const saline: RecipeRequest["background"] = [{ component: f.NaClM, conc: 0.15 }];

describe("recipe with a background held fixed", () => {
  test.each([
    { label: "histidine pair pH 6.0, 20 mM, with 150 mM NaCl, 5 °C", req: { acidForm: f.histidineHCl, baseForm: f.histidineBase, targetPH: 6.0, totalConc: 0.02, volume: 1, background: saline }, t: 5 },
    { label: "phosphate pair pH 7.1, 10 mM, NaCl + 250 mM sucrose", req: { acidForm: f.NaH2PO4H2O, baseForm: f.Na2HPO47H2O, targetPH: 7.1, totalConc: 0.01, volume: 2, background: [{ component: f.NaClM, conc: 0.05 }, { component: f.sucrose, conc: 0.25 }] }, t: 25 },
    { label: "Tris + HCl pH 7.4 with a second buffer (10 mM acetate pair) at 37 °C", req: { acidForm: f.trisBaseM, baseForm: f.HClM, targetPH: 7.4, totalConc: 0.02, volume: 1, background: [{ component: f.sodiumAcetate, conc: 0.01 }] }, t: 37 },
    { label: "phosphate pH 7.0 with NaCl background and an ionic-strength target made up with KCl", req: { acidForm: f.NaH2PO4H2O, baseForm: f.Na2HPO47H2O, targetPH: 7.0, totalConc: 0.02, volume: 1, background: saline, ionicStrength: 0.2, salt: { id: "KCl", name: "KCl", systems: [], ions: [{ ion: f.K, stoich: 1 }, { ion: f.Cl, stoich: 1 }] } } as RecipeRequest, t: 25 },
  ])("$label: fed back, pH within 0.001; background listed at its amounts", ({ label, req, t }) => {
    const r = f.ok(recipe(req, { temperatureC: t }));
    f.expectAbs(f.pH(r.mixture, { temperatureC: t }), req.targetPH, 0.001, `${label}: pH of the whole batch`);
    const bg = r.lines.filter((l) => l.role === "background");
    expect(bg.map((l) => [l.name, l.conc])).toEqual((req.background ?? []).map((e) => [e.component.name, e.conc]));
    let total = 0;
    for (const line of r.lines.filter((l) => l.role !== "background")) for (const s of line.component.systems) total += line.conc * s.stoich;
    f.expectRel(total, req.totalConc, 1e-12, `${label}: total buffer concentration`);
    if (req.ionicStrength !== undefined) f.expectRel(r.ionicStrength, req.ionicStrength, 1e-9, `${label}: ionic strength`);
  });

  test("made without the salt and given it afterwards, a histidine batch misses pH 6.0 by more than 0.01", () => {
    const plain = f.ok(recipe({ acidForm: f.histidineHCl, baseForm: f.histidineBase, targetPH: 6.0, totalConc: 0.02, volume: 1 }));
    const off = f.pH([...plain.mixture, { component: f.NaClM, conc: 0.15 }]) - 6.0;
    expect(Math.abs(off)).toBeGreaterThan(0.01);
  });

  test("a background that carries the buffer's own system is refused", () => {
    const r = recipe({ acidForm: f.NaH2PO4H2O, baseForm: f.Na2HPO47H2O, targetPH: 7, totalConc: 0.02, volume: 1, background: [{ component: f.KH2PO4m, conc: 0.01 }] });
    expect(r).toMatchObject({ ok: false, code: "bad-input", message: expect.stringMatching(/buffer's own system \(phosphate\)/) });
  });

  test("a negative background amount is refused", () => {
    const r = recipe({ acidForm: f.NaH2PO4H2O, baseForm: f.Na2HPO47H2O, targetPH: 7, totalConc: 0.02, volume: 1, background: [{ component: f.NaClM, conc: -0.1 }] });
    expect(r).toMatchObject({ ok: false, code: "bad-input" });
  });

  test("a background above the target ionic strength says so", () => {
    const r = recipe({ acidForm: f.NaH2PO4H2O, baseForm: f.Na2HPO47H2O, targetPH: 7, totalConc: 0.02, volume: 1, background: saline, ionicStrength: 0.1, salt: f.NaClM });
    expect(r).toMatchObject({ ok: false, code: "unreachable", message: expect.stringMatching(/with the other components/) });
  });
});
