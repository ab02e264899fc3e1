/**
 * The pH band over a temperature range, and the statistical (GUM) band beside the worst case.
 * Identities: with one varied quantity the GUM half-width is k/√3 times the linearised half-width
 * (rectangular distribution, JCGM 100:2008 §4.3.7); with several it lies between k/√3 times the
 * largest term and k/√3 times the linear sum; a range of one temperature is the plain band; the
 * band over a range holds the band at each end and every nominal pH fed back through the engine.
 */
import { solvePH } from "../../../src/chem";
import { phRange, phRangeOverTemperature } from "../../../src/chem/workflows";
import * as f from "./fixtures";

const tris = f.mixture([f.trisBase, 0.05], [f.HCl, 0.025]);
const phosphate = f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]);

describe("statistical band (GUM)", () => {
  test("one varied quantity: half-width = (2/√3) × linearised half-width", () => {
    const r = f.ok(phRange(phosphate, [0, 0.03]));
    const linHalf = (r.linear.high - r.linear.low) / 2;
    f.expectRel((r.statistical.high - r.statistical.low) / 2, (2 / Math.sqrt(3)) * linHalf, 1e-9, "GUM vs linear, one quantity");
    expect(r.statistical.k).toBe(2);
    expect(r.statistical.method).toMatch(/GUM.*rectangular.*k = 2/);
  });

  test("several quantities: between the largest term and the linear sum (×2/√3), inside the worst case", () => {
    const r = f.ok(phRange(tris, 0.02, { pKaUncertainty: 0.02 }));
    const half = (r.statistical.high - r.statistical.low) / 2;
    const linHalf = (r.linear.high - r.linear.low) / 2;
    expect(half).toBeLessThan((2 / Math.sqrt(3)) * linHalf);
    expect(half).toBeGreaterThan(0);
    expect(r.statistical.low).toBeGreaterThan(r.low);
    expect(r.statistical.high).toBeLessThan(r.high);
    f.expectAbs((r.statistical.low + r.statistical.high) / 2, r.nominal, 1e-12, "centred on the nominal pH");
  });
});

describe("pH band over a temperature range", () => {
  test("a range of one temperature is the plain band", () => {
    const one = f.ok(phRangeOverTemperature(tris, 0.02, [5, 5]));
    const plain = f.ok(phRange(tris, 0.02, { temperatureC: 5 }));
    expect([one.low, one.high]).toEqual([plain.low, plain.high]);
    f.expectRel(one.statistical.u, plain.statistical.u, 1e-12, "u");
  });

  test.each([
    ["Tris 50 mM half-neutralised, 2–8 °C", tris, [2, 8] as [number, number]],
    ["phosphate 25/25 mM, 2–8 °C", phosphate, [8, 2] as [number, number]],
    ["phosphate 25/25 mM, 20–40 °C", phosphate, [20, 40] as [number, number]],
  ])("%s: holds the band at each end and every nominal pH fed back", (_label, mix, range) => {
    const r = f.ok(phRangeOverTemperature(mix, 0.02, range, { pKaUncertainty: 0.01 }));
    expect(r.temperatureRange).toEqual([Math.min(...range), Math.max(...range)]);
    for (const t of r.temperatures) {
      const band = f.ok(phRange(mix, 0.02, { temperatureC: t, pKaUncertainty: 0.01 }));
      expect(r.low).toBeLessThanOrEqual(band.low);
      expect(r.high).toBeGreaterThanOrEqual(band.high);
      const fed = solvePH(mix, { temperatureC: t });
      if (!fed.ok) throw new Error(fed.message);
      f.expectAbs(band.nominal, fed.pH, 1e-12, `nominal pH at ${t} °C fed back`);
    }
    const atLowT = f.ok(phRange(mix, 0.02, { temperatureC: r.lowAtTemperature, pKaUncertainty: 0.01 }));
    expect(r.low).toBe(atLowT.low);
  });

  test("Tris over 2–8 °C: the band is wider than at either end, and the temperature widens the GUM band", () => {
    const r = f.ok(phRangeOverTemperature(tris, 0.02, [2, 8]));
    const at2 = f.ok(phRange(tris, 0.02, { temperatureC: 2 }));
    const at8 = f.ok(phRange(tris, 0.02, { temperatureC: 8 }));
    expect(r.high - r.low).toBeGreaterThan(Math.max(at2.high - at2.low, at8.high - at8.low) + 0.1);
    const mid = f.ok(phRange(tris, 0.02, { temperatureC: 5 }));
    expect(r.statistical.u).toBeGreaterThan(mid.statistical.u);
  });

  test("a temperature outside 0–100 °C is refused", () => {
    expect(phRangeOverTemperature(tris, 0.02, [-5, 8])).toMatchObject({ ok: false, code: "out-of-range" });
  });
});
