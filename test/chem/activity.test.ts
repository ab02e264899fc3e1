/**
 * Activity models: Davies (Davies, Ion Association, 1962, coefficient 0.3), extended Debye–Hückel
 * with the Bates–Guggenheim B·å = 1.5 (Buck et al., Pure Appl. Chem. 74, 2169 (2002)), ideal.
 * Checked against the defining formulas at hand-computed points and against limiting behaviour.
 */
import { daviesLog10Gamma, debyeHuckelLog10Gamma, idealLog10Gamma, log10Gamma } from "../../src/chem";
import { expectAbs, expectRel } from "./fixtures";

describe("defining formulas (hand-computed, A = 0.5)", () => {
  // I = 0.09: √I = 0.3, √I/(1+√I) = 0.230769…; Davies: −0.5·(0.230769 − 0.027) = −0.101885;
  // Bates–Guggenheim: −0.5·0.3/1.45 = −0.103448…  Tolerance 1e-6 (values typed to 6 decimals).
  test("Davies, z = 1, I = 0.09", () => expectAbs(daviesLog10Gamma(1, 0.09, 0.5), -0.101885, 1e-6, "Davies log γ"));
  test("Davies scales with z²", () => expectRel(daviesLog10Gamma(-2, 0.09, 0.5), 4 * daviesLog10Gamma(1, 0.09, 0.5), 1e-15, "z = −2"));
  test("Bates–Guggenheim, z = 1, I = 0.09", () => expectAbs(debyeHuckelLog10Gamma(1, 0.09, 0.5), -0.103448, 1e-6, "EDH log γ"));
  test("ideal is 0", () => expect(idealLog10Gamma(3, 0.5, 0.5)).toBe(0));
  test("neutral species have γ = 1 in every model", () => {
    for (const m of ["davies", "debye-huckel", "ideal"] as const) expect(Math.abs(log10Gamma(m, 0, 0.3, 0.51))).toBe(0);
  });
});

describe("limiting law as I → 0 (Debye–Hückel): log γ / (−A z² √I) → 1", () => {
  test.each(["davies", "debye-huckel"] as const)("%s at I = 1e-8 within 1e-3", (m) => {
    const I = 1e-8;
    // The next term is O(√I) = 1e-4 relative.
    expectRel(log10Gamma(m, 2, I, 0.51) / (-0.51 * 4 * Math.sqrt(I)), 1, 1e-3, `${m} limiting slope`);
  });
});
