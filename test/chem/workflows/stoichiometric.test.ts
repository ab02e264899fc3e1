/**
 * stoichiometricVolumes: the titrant volumes at which every proton of the first k dissociation steps
 * has been removed (a base) or put back (an acid). Checks by counting protons (an identity): a buffer
 * made of two forms of one system has the equivalences of that system once, not once per form.
 */
import fc from "fast-check";
import { stoichiometricVolumes } from "../../../src/chem/workflows";
import * as f from "./fixtures";

describe("stoichiometricVolumes: two forms of one system count each step once", () => {
  // 10 mM L-histidine (HL) + 10 mM histidine HCl (H2L+) in 1 L, 1 M NaOH. Protons to remove: the
  // imidazole step of H2L+ (10 mmol → 0.010 L), then the amine step of all 20 mmol of histidine
  // (→ 0.030 L). Nothing in between: 0.020 L is the middle of the amine step, not an equivalence.
  // 25 mM NaH2PO4 + 25 mM Na2HPO4 in 50 mL, 0.1 M HCl: HPO4²⁻ → H2PO4⁻ takes 25 mM × 50 mL =
  // 1.25 mmol (12.5 mL); then H2PO4⁻ → H3PO4 for all 50 mM, 2.5 mmol more (37.5 mL).
  test.each([
    { label: "histidine + histidine HCl with NaOH: 0.010 L and 0.030 L only", mix: () => f.mixture([f.histidineBase, 0.01], [f.histidineHCl, 0.01]), titrant: () => f.NaOH, stock: 1, volume: 1, max: 0.05, expected: [0.01, 0.03] },
    { label: "NaH2PO4 + Na2HPO4 with HCl: 12.5 mL and 37.5 mL only", mix: () => f.mixture([f.NaH2PO4, 0.025], [f.Na2HPO4, 0.025]), titrant: () => f.HCl, stock: 0.1, volume: 0.05, max: 0.05, expected: [0.0125, 0.0375] },
  ])("$label", ({ mix, titrant, stock, volume, max, expected }) => {
    const v = stoichiometricVolumes(mix(), titrant(), stock, volume, max);
    expect(v.length).toBe(expected.length);
    expected.forEach((e, i) => f.expectRel(v[i], e, 1e-12, `equivalence ${i + 1}`));
  });

  // Property: splitting one form's amount over two entries of the same form changes nothing.
  test("splitting a form over two entries gives the same volumes", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.1, noNaN: true }), fc.double({ min: 0.05, max: 0.95, noNaN: true }), (c, share) => {
        const one = stoichiometricVolumes(f.mixture([f.Na2HPO4, c]), f.HCl, 0.1, 0.05, 1);
        const two = stoichiometricVolumes(f.mixture([f.Na2HPO4, c * share], [f.Na2HPO4, c * (1 - share)]), f.HCl, 0.1, 0.05, 1);
        expect(two.length).toBe(one.length);
        two.forEach((v, i) => f.expectRel(v, one[i], 1e-9, `equivalence ${i + 1}`));
      }),
    );
  });
});
