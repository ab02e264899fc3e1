/**
 * The solver fails loudly instead of returning a guess: with the ionic-strength iteration capped at
 * one step (far below what a 0.1 mol/L buffer needs to reach 1e-12 self-consistency), the result is
 * the typed failure "no-convergence" with a message. The cap is lowered by mocking defaults.ts.
 */
jest.mock("../../src/chem/defaults", () => {
  const actual = jest.requireActual("../../src/chem/defaults");
  return { ...actual, SOLVER: { ...actual.SOLVER, maxIonicStrengthIterations: 1 } };
});

import { solveEquilibrium, solvePH } from "../../src/chem";
import * as f from "./fixtures";

const buffer = f.mixture([f.KH2PO4, 0.025], [f.Na2HPO4, 0.025]);

test("Davies with a one-step cap → no-convergence, with a message naming the ionic strength", () => {
  for (const r of [solveEquilibrium(buffer), solvePH(buffer)]) {
    expect(r).toMatchObject({ ok: false, code: "no-convergence" });
    if (!r.ok) expect(r.message).toMatch(/ionic strength did not converge/);
  }
});

test("the ideal model needs no ionic-strength iteration and still solves", () => {
  expect(solvePH(buffer, { activity: "ideal" }).ok).toBe(true);
});
