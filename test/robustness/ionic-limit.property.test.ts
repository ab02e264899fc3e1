/**
 * Issue 14, item 2: the ionic-strength limit holds for every function that gives a pH-derived
 * number, over random mixtures with I up to about 5 mol/L (buffers, salts up to 3 mol/L, strong acid
 * or base up to 2 mol/L, 0–60 °C, every activity model). For each mixture AQ.IONIC (which reports
 * beyond the limit too) says where it stands; then, beyond 1 mol/L, AQ.PH, AQ.BETA, AQ.CAPACITY,
 * AQ.SPECIES, AQ.ADJUST, AQ.PHRANGE, AQ.RECIPE (at that ionic strength), AQ.PKA (at that ionic
 * strength) are #N/A naming the limit, AQ.CHECK gives no pH, and every AQ.CURVE point whose own
 * solution is beyond the limit is #N/A in its cell; within it the pH-valued ones are numbers, and an
 * amount ADJUST or CAPACITY gives leads to a solution within the limit (fed back through AQ.IONIC).
 */
import fc from "fast-check";
import { beyondIonicLimit } from "../../src/chem";
import * as AQ from "../../src/functions/functions";
import { outcomeOf, outcomeProblem, type Outcome } from "./outcome";
import { runs, SEED } from "./arbitraries";

const BUFFERS: [string, string][] = [
  ["acetic acid", "sodium acetate"],
  ["KH2PO4", "Na2HPO4"],
  ["Tris HCl", "Tris"],
  ["citric acid", "sodium citrate"],
];

interface Mix {
  names: string[][];
  amounts: number[][];
  temperature: number;
  activity: string;
}

const logUniform = (lo: number, hi: number) => fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((e) => 10 ** e);

const mixArb: fc.Arbitrary<Mix> = fc
  .record({
    buffer: fc.constantFrom(...BUFFERS),
    a: logUniform(1e-4, 0.5),
    b: logUniform(1e-4, 0.5),
    salt: fc.constantFrom("NaCl", "Na2SO4", "KCl"),
    saltConc: fc.oneof(fc.double({ min: 0, max: 3, noNaN: true }), fc.constantFrom(0, 0.9, 0.95, 1, 1.05)),
    strong: fc.constantFrom("HCl", "NaOH"),
    strongConc: fc.oneof(fc.constant(0), logUniform(1e-4, 2)),
    temperature: fc.double({ min: 0, max: 60, noNaN: true }),
    activity: fc.constantFrom("davies", "ideal", "debye-huckel"),
  })
  .map((r) => ({
    names: [[r.buffer[0]], [r.buffer[1]], [r.salt], [r.strong]],
    amounts: [[r.a], [r.b], [r.saltConc], [r.strongConc]],
    temperature: r.temperature,
    activity: r.activity,
  }));

/** The value of a 1×1 table (a row-wise function for one mixture), or the scalar. */
function single(o: Outcome): Outcome {
  if (o.kind === "value" && Array.isArray(o.value) && o.value.length === 1 && Array.isArray(o.value[0]) && o.value[0].length === 1) {
    const v = o.value[0][0];
    if (v instanceof CustomFunctions.Error) return { kind: "error", code: v.code, message: v.message ?? "" };
    return { kind: "value", value: v };
  }
  return o;
}

function ionicOf(names: unknown[][], amounts: unknown[][], m: Mix): number {
  const o = single(outcomeOf(AQ.IONIC, [names, amounts, m.temperature, m.activity]));
  if (o.kind !== "value" || typeof o.value !== "number") throw new Error(`AQ.IONIC gave ${JSON.stringify(o)}`);
  return o.value;
}

/** Within rounding of the limit either answer is right (the engine and this test add the same amounts in different orders). */
const atEdge = (I: number) => Math.abs(I - 1) <= 1e-6;

const LIMIT = /beyond the 1 mol\/L limit|ionic strength reaches the 1 mol\/L limit|exceeds the 1 mol\/L limit/;

function describeMix(m: Mix): string {
  return `${m.names.map((n, i) => `${n[0]} ${m.amounts[i][0]}`).join(" + ")}, ${m.temperature} °C, ${m.activity}`;
}

test("no pH-derived number beyond I = 1 mol/L, from any function (random mixtures, I up to ~5 mol/L)", () => {
  const seen = { beyond: 0, within: 0 };
  fc.assert(
    fc.property(mixArb, (m) => {
      const { names, amounts, temperature: t, activity: act } = m;
      const I = ionicOf(names, amounts, m);
      if (atEdge(I)) return;
      const beyond = beyondIonicLimit(I);
      seen[beyond ? "beyond" : "within"]++;
      const ctx = `${describeMix(m)} (I = ${I})`;
      const calls: [string, Outcome, "column" | "matrix" | "scalar"][] = [
        ["PH", single(outcomeOf(AQ.PH, [names, amounts, t, act])), "scalar"],
        ["BETA", single(outcomeOf(AQ.BETA, [names, amounts, t, act])), "scalar"],
        ["CAPACITY", single(outcomeOf(AQ.CAPACITY, [names, amounts, 0.2, t, act])), "scalar"],
        ["SPECIES", outcomeOf(AQ.SPECIES, [names, amounts, null, t, act]), "matrix"],
        ["ADJUST", single(outcomeOf(AQ.ADJUST, [names, amounts, 7, "NaOH", null, null, t, act])), "scalar"],
        ["PHRANGE", outcomeOf(AQ.PHRANGE, [names, amounts, 0.01, null, t, act]), "matrix"],
        ["RECIPE", outcomeOf(AQ.RECIPE, ["KH2PO4", "Na2HPO4", 7, 0.01, 1, t, I, "NaCl", act]), "matrix"],
        ["PKA", outcomeOf(AQ.PKA, ["phosphate", 2, t, I]), "scalar"],
      ];
      for (const [id, o, shape] of calls) {
        const problem = outcomeProblem(o, shape);
        if (problem) throw new Error(`AQ.${id}: ${problem}\n  ${ctx}`);
        if (beyond) {
          if (o.kind !== "error" || o.code !== "#N/A" || !LIMIT.test(o.message)) throw new Error(`AQ.${id} gave ${JSON.stringify(o)} beyond the limit\n  ${ctx}`);
        } else if (["PH", "BETA", "SPECIES", "PKA"].includes(id) && o.kind !== "value") {
          throw new Error(`AQ.${id} refused within the limit: ${JSON.stringify(o)}\n  ${ctx}`);
        }
      }
      // CHECK: no pH quoted beyond the limit
      const check = single(outcomeOf(AQ.CHECK, [names, amounts, t, act]));
      if (check.kind !== "value" || typeof check.value !== "string") throw new Error(`AQ.CHECK gave ${JSON.stringify(check)}\n  ${ctx}`);
      if (beyond !== check.value.startsWith("CHECK: no pH is given")) throw new Error(`AQ.CHECK: "${check.value}"\n  ${ctx}`);
      // ADJUST and CAPACITY: an amount given leads to a solution within the limit
      const withNaOH = (n: number): number => ionicOf([...names, ["NaOH"]], [...amounts, [n]], m);
      for (const [id, o] of [calls[4], calls[2]] as const) {
        if (o.kind === "value" && typeof o.value === "number") {
          const after = withNaOH(o.value);
          if (beyondIonicLimit(after)) throw new Error(`AQ.${id} gave ${o.value} mol/L, a solution at I = ${after}\n  ${ctx}`);
        } else if (!beyond && o.kind === "error" && o.code !== "#N/A") {
          throw new Error(`AQ.${id}: ${JSON.stringify(o)}\n  ${ctx}`);
        }
      }
      // CURVE: 10 mL titrated with 2 M NaOH up to 4 mL; each point beyond the limit is #N/A in its own cell
      const V = 0.01;
      const c = 2;
      const curve = outcomeOf(AQ.CURVE, [names, amounts, "NaOH", c, V, 0.004, 5, t, act]);
      const problem = outcomeProblem(curve, "matrix");
      if (problem) throw new Error(`AQ.CURVE: ${problem}\n  ${ctx}`);
      const pointIonic = (v: number) => ionicOf([...names, ["NaOH"]], [...amounts.map(([x]) => [(x * V) / (V + v)]), [(c * v) / (V + v)]], m);
      if (curve.kind === "error") {
        // the whole table is refused only when every point is beyond the limit
        const ends = [pointIonic(0), pointIonic(0.004)];
        if (ends.some(atEdge)) return;
        if (curve.code !== "#N/A" || !ends.every(beyondIonicLimit)) throw new Error(`AQ.CURVE: ${JSON.stringify(curve)}\n  ${ctx}`);
      } else {
        const rows = ((curve as { value: unknown }).value as unknown[][]).slice(1);
        for (const row of rows) {
          const v = row[0] as number;
          const cell = row[1];
          const Iv = pointIonic(v);
          if (atEdge(Iv)) continue;
          const out = beyondIonicLimit(Iv);
          const refused = cell instanceof CustomFunctions.Error && cell.code === "#N/A" && LIMIT.test(cell.message ?? "");
          if (out !== refused || (!out && typeof cell !== "number")) throw new Error(`AQ.CURVE at ${v} L: ${String(cell)} (${out ? "beyond" : "within"} the limit)\n  ${ctx}`);
        }
      }
    }),
    { numRuns: runs(30), seed: SEED },
  );
  // both sides of the limit were visited
  expect(seen.beyond).toBeGreaterThan(5);
  expect(seen.within).toBeGreaterThan(5);
});
