/**
 * The equilibrium solver over a wide domain: pH from about −1 to 15 (strong acid or base up to
 * 10 mol/L beyond the buffer), ionic strength up to 3 mol/L and beyond, 0–100 °C, every activity
 * model. Every solve either converges (finite values, charge balance closed, fast path agreeing) or
 * returns a typed failure with a message; it never throws and never gives NaN. A result beyond its
 * activity model's range carries a warning (Equilibrium.warnings).
 *
 * Counts of converged and failed solves per region are printed. Fixed seed for the random part;
 * PROTOLYTE_FUZZ_RUNS multiplies it (see arbitraries.ts).
 */
import fc from "fast-check";
import { beyondIonicLimit, LIMITS, THRESHOLD_ROUNDING, prepare, solveEquilibrium, solvePH, type ActivityModel, type Component, type Mixture } from "../../src/chem";
import { getActiveLibrary, resetActiveLibrary } from "../../src/library";
import { runs, SEED } from "./arbitraries";

resetActiveLibrary();
const lib = getActiveLibrary();
function component(name: string): Component {
  const r = lib.resolve(name);
  if (!r.ok) throw new Error(r.message);
  return r.component;
}

const MODELS: ActivityModel[] = ["davies", "ideal", "debye-huckel"];
/** Where each model's results should start to warn (src/chem/README.md, Validity limits). */
const MODEL_RANGE: Record<ActivityModel, number> = {
  davies: LIMITS.ionicStrengthCaution,
  ideal: LIMITS.ionicStrengthCaution,
  "debye-huckel": LIMITS.debyeHuckelCaution,
  pitzer: LIMITS.pitzerCaution,
};
const BUFFERS = ["acetic acid", "NaH2PO4", "Tris", "citric acid", "glycine", "borax", "ammonia", "HEPES", "histidine", "sodium bicarbonate"].map(component);
const HCl = component("HCl");
const NaOH = component("NaOH");
const NaCl = component("NaCl");
const Na2SO4 = component("sodium sulfate");

interface Case {
  buffer: Component;
  bufferConc: number;
  /** mol/L of strong acid (< 0) or strong base (> 0) added. */
  strong: number;
  salt: Component;
  saltConc: number;
  temperatureC: number;
  activity: ActivityModel;
}

function mixtureOf(c: Case): Mixture {
  const mix: Mixture = [{ component: c.buffer, conc: c.bufferConc }];
  if (c.strong < 0) mix.push({ component: HCl, conc: -c.strong });
  if (c.strong > 0) mix.push({ component: NaOH, conc: c.strong });
  if (c.saltConc > 0) mix.push({ component: c.salt, conc: c.saltConc });
  return mix;
}

/** Region of the input domain, for the printed counts. */
function region(c: Case): string {
  const excess = Math.abs(c.strong) > c.bufferConc * 3 + 1e-3;
  const side = !excess ? "buffer" : c.strong < 0 ? "excess strong acid" : "excess strong base";
  // Nominal ionic strength from what was added (the solved one is printed beside it).
  const nominal = Math.abs(c.strong) + c.saltConc * (c.salt === Na2SO4 ? 3 : 1) + 0.5 * c.bufferConc;
  const I = nominal < 0.1 ? "nominal I < 0.1" : nominal < 0.5 ? "nominal I 0.1–0.5" : nominal <= 3 ? "nominal I 0.5–3" : "nominal I > 3";
  return `${side}, ${I}`;
}

type Tally = { converged: number; failed: Record<string, number>; minPH: number; maxPH: number; maxI: number; warned: number };
const tallies = new Map<string, Tally>();

/** Solves one case and checks the contract; returns a problem description or null. */
function solveAndCheck(c: Case): string | null {
  const mix = mixtureOf(c);
  const opts = { temperatureC: c.temperatureC, activity: c.activity };
  let eq: ReturnType<typeof solveEquilibrium>;
  let fast: ReturnType<typeof solvePH>;
  try {
    eq = solveEquilibrium(mix, opts);
    fast = solvePH(mix, opts);
  } catch (e) {
    return `threw ${(e as Error).message}`;
  }
  const t = tallies.get(region(c)) ?? { converged: 0, failed: {}, minPH: Infinity, maxPH: -Infinity, maxI: 0, warned: 0 };
  tallies.set(region(c), t);
  if (!eq.ok) {
    t.failed[eq.code] = (t.failed[eq.code] ?? 0) + 1;
    if (!["bad-input", "no-convergence", "out-of-range", "beyond-limit"].includes(eq.code)) return `failure code ${eq.code}`;
    if (eq.code === "beyond-limit") {
      // refused only where the solution really is beyond the ionic-strength limit
      const p = prepare(mix);
      const full = p.ok ? p.solveBeyondLimit(opts) : p;
      if (!full.ok || !beyondIonicLimit(full.ionicStrength)) return `refused as beyond the limit at I = ${full.ok ? full.ionicStrength : full.message}`;
    }
    if (typeof eq.message !== "string" || eq.message.trim() === "") return "failure without a message";
    if (fast.ok) return "the fast path converged where the full solve failed";
    return null;
  }
  t.converged++;
  const numbers = [eq.pH, eq.pcH, eq.ionicStrength, eq.gammaH, eq.pKw, eq.beta, eq.residual, ...eq.species.flatMap((s) => [s.conc, s.fraction])];
  if (!numbers.every(Number.isFinite)) return `a non-finite number in ${JSON.stringify(numbers)}`;
  if (eq.species.some((s) => s.conc < 0)) return "a negative concentration";
  if (eq.residual > 1e-9) return `charge balance residual ${eq.residual}`;
  if (!fast.ok) return `the fast path failed (${fast.message}) where the full solve converged`;
  if (Math.abs(fast.pH - eq.pH) > 1e-9) return `fast path pH ${fast.pH} ≠ ${eq.pH}`;
  t.minPH = Math.min(t.minPH, eq.pH);
  t.maxPH = Math.max(t.maxPH, eq.pH);
  t.maxI = Math.max(t.maxI, eq.ionicStrength);
  const warns = eq.warnings.some((w) => /Ionic strength .* mol\/L is above/.test(w));
  if (warns) t.warned++;
  // warnings compare with a relative rounding allowance (THRESHOLD_ROUNDING): at the threshold is not beyond it
  if (eq.ionicStrength > MODEL_RANGE[c.activity] * (1 + THRESHOLD_ROUNDING) && !warns) {
    return `I = ${eq.ionicStrength} mol/L is beyond the ${c.activity} model's range (${MODEL_RANGE[c.activity]}) but no warning: ${JSON.stringify(eq.warnings)}`;
  }
  if (eq.ionicStrength <= MODEL_RANGE[c.activity] * (1 + THRESHOLD_ROUNDING) && warns) return `a warning at I = ${eq.ionicStrength} mol/L, inside the model's range`;
  return null;
}

const describeCase = (c: Case) =>
  `${c.buffer.name} ${c.bufferConc} M, ${c.strong < 0 ? `HCl ${-c.strong}` : `NaOH ${c.strong}`} M, ${c.salt.name} ${c.saltConc} M, ${c.temperatureC} °C, ${c.activity}`;

afterAll(() => {
  const lines = [...tallies.entries()]
    .sort(([a], [b]) => (a < b ? -1 : 1))
    .map(([r, t]) => {
      const failed = Object.entries(t.failed).map(([code, n]) => `${code} ${n}`).join(", ") || "0";
      const range = t.converged ? `, pH ${t.minPH.toFixed(2)}…${t.maxPH.toFixed(2)}, max I ${t.maxI.toFixed(2)}, warned ${t.warned}` : "";
      return `  ${r}: converged ${t.converged}, failed ${failed}${range}`;
    });
  const total = [...tallies.values()].reduce((s, t) => s + t.converged + Object.values(t.failed).reduce((a, b) => a + b, 0), 0);
  console.log(`solver domain (seed ${SEED}): ${total} solves\n${lines.join("\n")}`);
});

test("a grid: strong acid/base from 0 to 10 mol/L beyond the buffer, salt to I ≈ 3, 0–100 °C, every model", () => {
  const problems: string[] = [];
  const strongs = [0, 1e-6, 1e-3, 0.01, 0.1, 0.5, 1, 2, 5, 10].flatMap((x) => (x === 0 ? [0] : [-x, x]));
  for (const buffer of BUFFERS) {
    for (const strong of strongs) {
      for (const saltConc of [0, 0.1, 0.5, 1, 3]) {
        for (const temperatureC of [0, 25, 60, 100]) {
          for (const activity of MODELS) {
            const c: Case = { buffer, bufferConc: 0.05, strong, salt: NaCl, saltConc, temperatureC, activity };
            const p = solveAndCheck(c);
            if (p) problems.push(`${describeCase(c)}: ${p}`);
          }
        }
      }
    }
  }
  expect(problems.slice(0, 5)).toEqual([]);
  // The grid reaches both ends of the pH scale the ionic-strength limit (1 mol/L) leaves: about
  // 1 mol/L of strong acid (pH ≈ 0) and of strong base (pH ≈ 14 at 0 °C, pKw 14.94).
  const all = [...tallies.values()].filter((t) => t.converged > 0);
  expect(Math.min(...all.map((t) => t.minPH))).toBeLessThan(0.1);
  expect(Math.max(...all.map((t) => t.maxPH))).toBeGreaterThan(14.5);
});

test("random mixtures over the same domain and beyond (up to the 20 mol/L limit and past it)", () => {
  const logUniform = (lo: number, hi: number) => fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((e) => 10 ** e);
  const caseArb: fc.Arbitrary<Case> = fc.record({
    buffer: fc.constantFrom(...BUFFERS),
    bufferConc: fc.oneof(logUniform(1e-12, 1), fc.constantFrom(0, 2, 5)),
    strong: fc.oneof(fc.constant(0), logUniform(1e-9, 12).map((x) => -x), logUniform(1e-9, 12), fc.constantFrom(-20, 20, -21, 21)),
    salt: fc.constantFrom(NaCl, Na2SO4),
    saltConc: fc.oneof(fc.constant(0), logUniform(1e-6, 3), fc.constantFrom(6, 12)),
    temperatureC: fc.oneof(fc.double({ min: 0, max: 100, noNaN: true }), fc.constantFrom(0, 100, -1e-9, 100.000001, NaN)),
    activity: fc.constantFrom(...MODELS),
  });
  fc.assert(
    fc.property(caseArb, (c) => {
      const p = solveAndCheck(c);
      if (p) throw new Error(`${describeCase(c)}: ${p}`);
    }),
    { seed: SEED, numRuns: runs(5000) },
  );
});
