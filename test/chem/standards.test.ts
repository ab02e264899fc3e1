/**
 * Primary pH standards (pH(S), molality scale) against the engine with Davies activity.
 *
 * Molality ≈ molarity at these dilutions (I ≤ 0.1 mol/kg; 1 kg of water is ≈ 1.003 L at 25 °C,
 * a difference below 0.001 pH), so the tabulated mol/kg are used as mol/L.
 * The values, sources and tolerances (±0.02 pH: pH(S) rests on the Bates–Guggenheim convention for
 * γ(Cl⁻), the engine on Davies for every ion) are in test/reference; the sources: docs/references.md.
 */
import { solveEquilibrium, type Mixture } from "../../src/chem";
import { casesOf, evaluate, printedValue, referenceTable } from "../reference";
import * as f from "./fixtures";

function pHOf(mix: Mixture, temperatureC: number): number {
  const r = solveEquilibrium(mix, { temperatureC, activity: "davies" });
  if (!r.ok) throw new Error(`solve failed: ${r.code} ${r.message}`);
  return r.pH;
}

describe("primary standards (Davies; test/reference/ph-standards.json)", () => {
  test.each(casesOf("ph-standards"))("$id: $label at $temperatureC °C, pH(S) $printed ($source)", (c) => {
    f.expectReference(pHOf(f.referenceMixture(c.mixture), c.temperatureC ?? 25), c, `${c.label}, ${c.temperatureC} °C, Davies`);
  });
});

describe("KH phthalate 0.05 mol/kg against temperature (test/reference/hetzer-khp.json)", () => {
  const table = referenceTable("hetzer-khp");
  const eq = table.equation!;
  test.each(casesOf("hetzer-khp"))("$id: the engine vs the Hetzer et al. (1977) equation at $temperatureC °C", (c) => {
    f.expectReference(pHOf(f.referenceMixture(c.mixture), c.temperatureC ?? 25), c, `KHP 0.05, ${c.temperatureC} °C, Davies`);
  });
  test.each(casesOf("hetzer-khp"))("$id: the equation as typed gives the printed $printed", (c) => {
    f.expectAbs(evaluate(eq, c.temperatureC ?? 25), printedValue(c), eq.printedTolerance.value, `Hetzer equation at ${c.temperatureC} °C`);
  });
});

describe("European Pharmacopoeia reference buffers (Davies; test/reference/ph-eur-buffers.json)", () => {
  test.each(casesOf("ph-eur-buffers"))("$id: $label at $temperatureC °C: $printed", (c) => {
    f.expectReference(pHOf(f.referenceMixture(c.mixture), c.temperatureC ?? 25), c, `${c.label}, ${c.temperatureC} °C, Davies`);
  });
});
