/**
 * Primary pH standards (pH(S), molality scale) against the engine with Davies activity.
 *
 * Molality ≈ molarity at these dilutions (I ≤ 0.1 mol/kg; 1 kg of water is ≈ 1.003 L at 25 °C,
 * a difference below 0.001 pH), so the tabulated mol/kg are used as mol/L.
 * Tolerance ±0.02 pH: REFERENCES §1 ("a model with Davies activity is expected within about ±0.02"):
 * pH(S) rests on the Bates–Guggenheim convention for γ(Cl⁻), the engine on Davies for every ion.
 */
import { solveEquilibrium, type Mixture } from "../../src/chem";
import * as f from "./fixtures";

const TOL = 0.02;

function pHOf(mix: Mixture, temperatureC: number): number {
  const r = solveEquilibrium(mix, { temperatureC, activity: "davies" });
  if (!r.ok) throw new Error(`solve failed: ${r.code} ${r.message}`);
  return r.pH;
}

const KH2cit = f.mixture([f.KH2citrate, 0.05]);
const KHP = f.mixture([f.KHphthalate, 0.05]);
const phos11 = f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]);
const phosBPB = f.mixture([f.KH2PO4, 0.008695], [f.Na2HPO4, 0.03043]);
const boraxStd = f.mixture([f.borax, 0.01]);
const carb = f.mixture([f.NaHCO3, 0.025], [f.Na2CO3, 0.025]);

describe("primary standards at 25 °C (Davies, ±0.02 pH)", () => {
  test.each([
    { label: "KH2 citrate 0.05 mol/kg", mix: KH2cit, expected: 3.776, source: "Staples & Bates, J. Res. NBS 73A, 37 (1969)" },
    { label: "KH phthalate 0.05 mol/kg", mix: KHP, expected: 4.005, source: "Hamer, Pinching & Acree, J. Res. NBS 36, 47 (1946)" },
    { label: "KH2PO4 0.025 + Na2HPO4 0.025 mol/kg", mix: phos11, expected: 6.865, source: "DIN 19266; J. Solution Chem. doi 10.1007/BF02767623" },
    { label: "KH2PO4 0.008695 + Na2HPO4 0.03043 mol/kg", mix: phosBPB, expected: 7.413, source: "Bower, Paabo & Bates, J. Res. NBS 65A (1961)" },
    { label: "borax 0.01 mol/kg", mix: boraxStd, expected: 9.18, source: "Staples & Bates, J. Res. NBS 73A, 37 (1969)" },
    { label: "NaHCO3 0.025 + Na2CO3 0.025 mol/kg", mix: carb, expected: 10.012, source: "Staples & Bates, J. Res. NBS 73A, 37 (1969)" },
  ])("$label: pH(S) $expected ($source)", ({ label, mix, expected }) => {
    f.expectAbs(pHOf(mix, 25), expected, TOL, `${label}, 25 °C, Davies`);
  });
});

describe("standards at other temperatures (Davies, ±0.02 pH)", () => {
  test("phosphate 0.008695/0.03043 mol/kg at 38 °C: 7.382 (Bower, Paabo & Bates, J. Res. NBS 65A (1961))", () => {
    f.expectAbs(pHOf(phosBPB, 38), 7.382, TOL, "phosphate 0.008695/0.03043, 38 °C, Davies");
  });

  // Hetzer, Durst, Robinson & Bates, J. Res. NBS 81A (1977): pH(S) of 0.05 mol/kg KHP,
  // pH(S) = 2073.44/T − 13.3270 + 0.045199·T − 3.4846e-5·T² (T in K).
  const hetzer = (tC: number): number => {
    const T = tC + 273.15;
    return 2073.44 / T - 13.327 + 0.045199 * T - 3.4846e-5 * T * T;
  };
  test.each([15, 37])("KH phthalate 0.05 mol/kg at %s °C vs the Hetzer et al. (1977) equation", (tC) => {
    f.expectAbs(pHOf(KHP, tC), hetzer(tC), TOL, `KHP 0.05, ${tC} °C, Davies`);
  });
  // Tolerance 0.001: the printed values are rounded to 0.001 and the equation's coefficients are
  // themselves rounded (it gives 3.9995 at 15 °C where 3.999 is printed).
  test("the Hetzer equation as typed reproduces its printed check values (REFERENCES §1)", () => {
    f.expectAbs(hetzer(25), 4.006, 0.001, "Hetzer equation at 25 °C");
    f.expectAbs(hetzer(15), 3.999, 0.001, "Hetzer equation at 15 °C");
    f.expectAbs(hetzer(37), 4.025, 0.001, "Hetzer equation at 37 °C");
  });
});

describe("European Pharmacopoeia 2.2.3, Table 2.2.3.-2 reference buffers at 15 and 20 °C (Davies, ±0.02 pH)", () => {
  // Compositions in mol/L as listed there; values printed to two decimals (±0.005 rounding is inside ±0.02).
  const phEurPhosBPB = f.mixture([f.KH2PO4, 0.0087], [f.Na2HPO4, 0.0303]);
  test.each([
    { label: "KH2 citrate 0.05 M", mix: KH2cit, at15: 3.8, at20: 3.79 },
    { label: "KH phthalate 0.05 M", mix: KHP, at15: 4.0, at20: 4.0 },
    { label: "phosphate 0.025/0.025 M", mix: phos11, at15: 6.9, at20: 6.88 },
    { label: "phosphate 0.0087/0.0303 M", mix: phEurPhosBPB, at15: 7.45, at20: 7.43 },
    { label: "borax 0.01 M", mix: boraxStd, at15: 9.28, at20: 9.23 },
    { label: "carbonate 0.025/0.025 M", mix: carb, at15: 10.12, at20: 10.06 },
  ])("$label: $at15 at 15 °C, $at20 at 20 °C", ({ label, mix, at15, at20 }) => {
    f.expectAbs(pHOf(mix, 15), at15, TOL, `${label}, 15 °C, Davies`);
    f.expectAbs(pHOf(mix, 20), at20, TOL, `${label}, 20 °C, Davies`);
  });
});
