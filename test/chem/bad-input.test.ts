/** Invalid input gives typed failures with a message naming the problem, never a number. */
import { apparentPKa, ionicStrength, osmolarity, prepare, solveEquilibrium, solvePH, type Mixture } from "../../src/chem";
import * as f from "./fixtures";

const good = f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]);

describe("mixture validation", () => {
  test.each([
    { what: "negative concentration", mix: f.mixture([f.KH2PO4, -0.01]), code: "bad-input", says: /negative/ },
    { what: "NaN concentration", mix: f.mixture([f.KH2PO4, NaN]), code: "bad-input", says: /not a number/ },
    { what: "concentration above 20 mol/L", mix: f.mixture([f.NaCl, 25]), code: "out-of-range", says: /above 20/ },
    { what: "infinite concentration", mix: f.mixture([f.NaCl, Infinity]), code: "out-of-range", says: /above/ },
    {
      what: "a system without steps",
      mix: [{ component: { id: "x", name: "odd acid", systems: [{ system: { id: "x", name: "x", topCharge: 0, steps: [] }, stoich: 1 }], ions: [] }, conc: 0.1 }],
      code: "bad-input",
      says: /no pKa steps/,
    },
    {
      what: "a NaN pKa",
      mix: [{ component: { id: "x", name: "odd acid", systems: [{ system: { id: "x", name: "x", topCharge: 0, steps: [{ pKa: NaN }] }, stoich: 1 }], ions: [] }, conc: 0.1 }],
      code: "bad-input",
      says: /pKa/,
    },
    {
      what: "one system id with two sets of constants",
      mix: [
        ...f.mixture([f.aceticAcid, 0.1]),
        { component: { id: "y", name: "fake acetate", systems: [{ system: { ...f.acetate, steps: [{ pKa: 4.0 }] }, stoich: 1 }], ions: [] }, conc: 0.1 },
      ],
      code: "bad-input",
      says: /two different sets/,
    },
    {
      what: "a non-integer ion charge",
      mix: [{ component: { id: "z", name: "odd salt", systems: [], ions: [{ ion: { id: "q", name: "q", charge: 0.5 }, stoich: 1 }] }, conc: 0.1 }],
      code: "bad-input",
      says: /integer charge/,
    },
  ] as { what: string; mix: Mixture; code: string; says: RegExp }[])("$what → $code", ({ mix, code, says }) => {
    for (const r of [solveEquilibrium(mix), solvePH(mix), prepare(mix)]) {
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.code).toBe(code);
        expect(r.message).toMatch(says);
      }
    }
  });

  test("a mixture that is not a list", () => {
    expect(solveEquilibrium(null as unknown as Mixture)).toMatchObject({ ok: false, code: "bad-input" });
  });
});

describe("option validation", () => {
  test.each([
    { opts: { temperatureC: 120 }, code: "out-of-range", says: /120 °C is outside 0–100/ },
    { opts: { temperatureC: -5 }, code: "out-of-range", says: /outside/ },
    { opts: { temperatureC: NaN }, code: "bad-input", says: /Temperature/ },
    { opts: { activity: "bromley" as never }, code: "bad-input", says: /bromley/ },
  ])("$opts → $code", ({ opts, code, says }) => {
    for (const r of [solveEquilibrium(good, opts), solvePH(good, opts), osmolarity(good, opts), ionicStrength(good, opts)]) {
      expect(r).toMatchObject({ ok: false, code });
      if (!r.ok) expect(r.message).toMatch(says);
    }
  });

  test("0 °C and 100 °C are inside the range (0 is not replaced by the default)", () => {
    const at0 = solveEquilibrium(good, { temperatureC: 0 });
    const at25 = solveEquilibrium(good, { temperatureC: 25 });
    expect(at0.ok && at25.ok && at0.pKw !== at25.pKw).toBe(true);
    expect(solveEquilibrium(good, { temperatureC: 100 }).ok).toBe(true);
  });
});

describe("apparentPKa validation", () => {
  test("unknown step → not-found", () => {
    expect(apparentPKa(f.phosphate, 3, 25, 0.1, "davies")).toMatchObject({ ok: false, code: "not-found" });
  });
  test("negative ionic strength → bad-input", () => {
    expect(apparentPKa(f.phosphate, 1, 25, -0.1, "davies")).toMatchObject({ ok: false, code: "bad-input" });
  });
  test("temperature out of range → out-of-range", () => {
    expect(apparentPKa(f.phosphate, 1, 130, 0.1, "davies")).toMatchObject({ ok: false, code: "out-of-range" });
  });
});
