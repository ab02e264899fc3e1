/**
 * Structured conditions of a pKa (src/library/conditions.ts): a value measured at 37 °C and
 * I = 0.15 mol/L (KCl) is converted to 25 °C, I = 0 with the engine's own van 't Hoff and Davies
 * models, so that AQ.PKA at the measured conditions gives the measured value back; where the
 * conversion is impossible (away from 25 °C without ΔrH°) it is refused; the validator holds a file
 * to the conversion; old free-text conditions still load.
 */
import fc from "fast-check";
import { apparentPKa, daviesLog10Gamma, debyeHuckelA, solveEquilibrium } from "../../src/chem";
import { convertPKa, createLibrary, resetActiveLibrary, setLayer, validateLibraryDoc } from "../../src/library";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { toSystem } from "../../src/library/components";
import type { LibraryDoc, MeasuredPKa, StepRecord, SystemRecord } from "../../src/library/types";
import { AQ } from "../support/aq-values";

/** An invented zwitterionic buffer acid of Halvorsen Biologics, its pKa measured at 37 °C in 0.15 M KCl. */
const MEASURED: MeasuredPKa = { value: 6.93, temperature: 37, ionicStrength: 0.15, medium: "KCl", scale: "concentration" };
const DH = { value: 21.1, unit: "kJ/mol", conditions: "25 °C", status: "entered" as const };

function layer(pKa: number, measured: MeasuredPKa | undefined, step: Partial<StepRecord> = { dH: DH }): LibraryDoc {
  const system: SystemRecord = {
    id: "hb-mops-like",
    name: "HB sulfonate buffer",
    topCharge: 0,
    steps: [{ pKa: { value: pKa, unit: "1", conditions: "converted to 25 °C, I = 0", status: "entered", ...(measured ? { measured } : {}) }, ...step }],
  };
  return {
    format: "protolyte-library",
    schemaVersion: 1,
    name: "Halvorsen conditions test",
    systems: [system],
    substances: [
      { id: "hb-acid", name: "HB sulfonate acid", molarMass: { value: 209.3, unit: "g/mol", conditions: "form as weighed", status: "entered" }, nature: "weak-acid-base", systems: [{ system: "hb-mops-like", stoich: 1, protons: 1 }] },
      { id: "hb-na", name: "HB sulfonate sodium salt", molarMass: { value: 231.2, unit: "g/mol", conditions: "form as weighed", status: "entered" }, nature: "weak-acid-base", systems: [{ system: "hb-mops-like", stoich: 1, protons: 0 }], ions: [{ ion: "na", stoich: 1 }] },
    ],
  };
}

afterEach(() => resetActiveLibrary());

describe("converting a measured pKa to 25 °C and I = 0", () => {
  test("the issue's example, 37 °C and I = 0.15 M (KCl): AQ.PKA at those conditions gives the entered value back to 1e-9", () => {
    const c = convertPKa(MEASURED, { dH: DH }, 0, 0);
    if (!c.ok) throw new Error(c.message);
    const doc = layer(c.value, MEASURED);
    expect(setLayer("workbook", doc).ok).toBe(true);
    expect(Math.abs(AQ.PKA("HB sulfonate buffer", 1, 37, 0.15, "concentration") - 6.93)).toBeLessThan(1e-9);
    expect(Math.abs(AQ.PKA("HB sulfonate buffer", 1, 25, 0) - c.value)).toBeLessThan(1e-12);
    expect(c.method).toMatch(/van 't Hoff with ΔrH° 21\.1 kJ\/mol/);
    expect(c.method).toMatch(/Davies activity coefficients for the pair of charges 0\/−1/);
    expect(c.uncertainty).toMatch(/^The conversion adds uncertainty/);
    expect(c.uncertainty).toMatch(/KCl medium is recorded only/);
  });

  test("the two terms are the textbook ones: van 't Hoff (Goldberg et al. 2002, eq. 10, ΔrCp° = 0) and 2·log10 γ(±1) by Davies for a neutral acid", () => {
    const c = convertPKa(MEASURED, { dH: DH }, 0, 0);
    if (!c.ok) throw new Error(c.message);
    const T = 310.15;
    const vantHoff = ((21.1 * 1000) / (8.314462618 * Math.LN10)) * (1 / T - 1 / 298.15);
    expect(c.temperatureTerm).toBeCloseTo(vantHoff, 12);
    // pKc = pK + log γ(H+) + log γ(A−) − log γ(HA), γ(HA) = 1
    expect(c.activityTerm).toBeCloseTo(2 * daviesLog10Gamma(1, 0.15, debyeHuckelA(37)), 12);
    expect(c.value).toBeCloseTo(6.93 - vantHoff - 2 * daviesLog10Gamma(1, 0.15, debyeHuckelA(37)), 12);
  });

  test("the conversion depends on the charges of the pair: for BH+ → B the concentration-scale activity term vanishes, for H2PO4− → HPO4^2− it doubles", () => {
    const at25 = { ...MEASURED, temperature: 25 };
    const cation = convertPKa(at25, {}, 1, 0);
    const anion = convertPKa(at25, {}, 0, 1);
    const neutral = convertPKa(at25, {}, 0, 0);
    if (!cation.ok || !anion.ok || !neutral.ok) throw new Error("conversion refused");
    expect(cation.value).toBeCloseTo(6.93, 12);
    expect(anion.activityTerm).toBeCloseTo(2 * neutral.activityTerm, 12);
    expect(anion.activityTerm).toBeLessThan(0);
  });

  test("round trip through the engine's apparentPKa for random conditions, charges, ΔrH°, ΔrCp° and both scales", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: -2, max: 3 }),
        fc.integer({ min: 0, max: 2 }),
        fc.double({ min: -80, max: 80, noNaN: true }),
        fc.double({ min: -400, max: 400, noNaN: true }),
        fc.constantFrom("concentration" as const, "mixed" as const),
        fc.double({ min: 1, max: 12, noNaN: true }),
        (t, I, top, k, dH, dCp, scale, value) => {
          const step = { dH: { ...DH, value: dH }, dCp: { value: dCp, unit: "J/(K·mol)", conditions: "25 °C", status: "entered" as const } };
          const c = convertPKa({ value, temperature: t, ionicStrength: I, scale }, step, top, k);
          if (!c.ok) throw new Error(c.message);
          const steps = Array.from({ length: k + 1 }, () => ({ pKa: c.value, dH, dCp }));
          const back = apparentPKa({ id: "x", name: "x", topCharge: top, steps }, k, t, I, "davies", scale);
          if (!back.ok) throw new Error(back.message);
          expect(Math.abs(back.value - value)).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 500 },
    );
  });

  test("refused where it cannot convert: 37 °C without ΔrH°, beyond the ionic-strength limit, outside 0–100 °C; at 25 °C the ionic strength alone needs no ΔrH°", () => {
    const noDH = convertPKa(MEASURED, {}, 0, 0);
    expect(noDH.ok).toBe(false);
    if (!noDH.ok) expect(noDH.message).toMatch(/measured at 37 °C, but the step has no ΔrH°.*cannot be converted to 25 °C/);
    const beyond = convertPKa({ ...MEASURED, ionicStrength: 1.5 }, { dH: DH }, 0, 0);
    expect(beyond.ok).toBe(false);
    const hot = convertPKa({ ...MEASURED, temperature: 120 }, { dH: DH }, 0, 0);
    expect(hot.ok).toBe(false);
    expect(convertPKa({ ...MEASURED, temperature: 25 }, {}, 0, 0).ok).toBe(true);
    const nothing = convertPKa({ value: 7, temperature: 25, ionicStrength: 0 }, {}, 0, 0);
    expect(nothing.ok && nothing.value === 7 && nothing.uncertainty === "").toBe(true);
  });
});

describe("the converted value in the engine", () => {
  test("a 10/10 mM pair in 0.14 M NaCl at 37 °C: pH equals the mixed-scale pKa measured there (to 0.002), not the measured value taken as 25 °C, I = 0", () => {
    const mixed: MeasuredPKa = { ...MEASURED, medium: "NaCl", scale: "mixed", ionicStrength: 0.15 };
    const c = convertPKa(mixed, { dH: DH }, 0, 0);
    if (!c.ok) throw new Error(c.message);
    const lib = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: layer(c.value, mixed) });
    const get = (name: string) => {
      const r = lib.resolve(name);
      if (!r.ok) throw new Error(r.message);
      return r.component;
    };
    const mix = [
      { component: get("HB sulfonate acid"), conc: 0.01 },
      { component: get("HB sulfonate sodium salt"), conc: 0.01 },
      { component: get("sodium chloride"), conc: 0.14 },
    ];
    const eq = solveEquilibrium(mix, { temperatureC: 37 });
    if (!eq.ok) throw new Error(eq.message);
    expect(eq.ionicStrength).toBeCloseTo(0.15, 3);
    expect(Math.abs(eq.pH - 6.93)).toBeLessThan(0.002);
    const naive = createLibrary({ builtin: BUILTIN_LIBRARY, workbook: layer(6.93, undefined) });
    const naiveMix = mix.map((m) => ({ ...m, component: (naive.resolve(m.component.name) as { component: typeof m.component }).component }));
    const wrong = solveEquilibrium(naiveMix, { temperatureC: 37 });
    if (!wrong.ok) throw new Error(wrong.message);
    expect(Math.abs(wrong.pH - 6.93)).toBeGreaterThan(0.1);
    expect(toSystem(lib.get("hb-mops-like", "system")!.record as SystemRecord).steps[0].pKa).toBe(c.value);
  });
});

describe("the file format", () => {
  test("a converted pKa validates; one whose value is not the conversion, one at 37 °C without ΔrH° and a measured ΔrH° are refused at their paths", () => {
    const c = convertPKa(MEASURED, { dH: DH }, 0, 0);
    if (!c.ok) throw new Error(c.message);
    const ctx = [BUILTIN_LIBRARY];
    expect(validateLibraryDoc(layer(c.value, MEASURED), ctx).ok).toBe(true);
    const stale = validateLibraryDoc(layer(6.93, MEASURED), ctx);
    expect(stale.ok ? [] : stale.errors.map((e) => e.path)).toEqual(["systems[0].steps[0].pKa.value"]);
    const noDH = validateLibraryDoc(layer(c.value, MEASURED, {}), ctx);
    expect(noDH.ok ? "" : noDH.errors[0].message).toMatch(/no ΔrH°/);
    const onDH = validateLibraryDoc(layer(c.value, MEASURED, { dH: { ...DH, measured: MEASURED } }), ctx);
    expect(onDH.ok ? [] : onDH.errors.map((e) => e.path)).toContain("systems[0].steps[0].dH.measured");
    // refused with the reason, for each kind of value that is not converted
    expect(onDH.ok ? "" : onDH.errors.find((e) => e.path.endsWith("dH.measured"))?.message).toMatch(/^measured conditions cannot be converted here: a ΔrH° is used as entered, for 25 °C and I = 0; .*ΔrCp°.*Enter the value for 25 °C, I = 0/);
    const onDCp = validateLibraryDoc(layer(c.value, MEASURED, { dH: DH, dCp: { value: -40, unit: "J/(K·mol)", conditions: "25 °C", status: "entered", measured: MEASURED } }), ctx);
    expect(onDCp.ok ? "" : onDCp.errors.find((e) => e.path.endsWith("dCp.measured"))?.message).toMatch(/ΔrCp° is used as entered and taken as constant/);
    const badScale = layer(c.value, { ...MEASURED, scale: "activity" as "mixed" });
    expect(validateLibraryDoc(badScale, ctx).ok).toBe(false);
  });

  test("old free-text conditions keep working: no built-in value carries measured conditions, and a '37 °C' text alone is taken as written (25 °C, I = 0)", () => {
    const measuredBuiltins = (BUILTIN_LIBRARY.systems ?? []).flatMap((s) => s.steps.filter((st) => st.pKa.measured !== undefined));
    expect(measuredBuiltins).toEqual([]);
    const text = layer(6.93, undefined);
    text.systems![0].steps[0].pKa.conditions = "37 °C, I = 0.15 M (KCl)";
    expect(validateLibraryDoc(text, [BUILTIN_LIBRARY]).ok).toBe(true);
  });
});
