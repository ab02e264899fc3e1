/**
 * A mixture prepared once and solved many times (different temperatures or activity models).
 * Preparation validates and aggregates the mixture and allocates the solver's arrays; each solve
 * then allocates only its result. Results do not depend on earlier solves (every solve starts cold),
 * so a cached preparation gives the same numbers as a fresh one.
 */
import { aggregate, type Aggregate } from "./aggregate";
import { buildEquilibrium } from "./equilibrium-report";
import { fail, fmt } from "./failure";
import { LN10 } from "./physical-constants";
import { ChargeBalanceSolver } from "./solver-core";
import { solveCoupled } from "./ionic-strength-iteration";
import type { ChemOptions, Equilibrium, Failure, Mixture, PHResult } from "./types";
import { resolveOptions } from "./validate-options";
import { SOLVER } from "./defaults";
import { ionicLimitFailure } from "./ionic-limit";
import { complexSetup } from "./complexation";
import { ComplexingSolver } from "./complex-solver";
import { ACTIVITY_MODELS } from "./activity/models";
import { PitzerState, pitzerBufferValue, solvePitzer } from "./pitzer-iteration";
import { bufferValue } from "./beta";
import { ligandDistributionOf, metalDistributionOf, type LigandDistribution, type MetalDistribution } from "./metal-distribution";

/** Σ z·c, ½ Σ z²·c and Σ |z|·c of the strong ions. */
function strongSums(agg: Aggregate): [number, number, number] {
  let q = 0;
  let zz = 0;
  let abs = 0;
  for (const { ion, conc } of agg.ions) {
    q += ion.charge * conc;
    zz += ion.charge * ion.charge * conc;
    abs += Math.abs(ion.charge) * conc;
  }
  return [q, 0.5 * zz, abs];
}

/** The same systems (the very objects) and strong ions (ids and charges), in the same order. */
function sameStructure(a: Aggregate, b: Aggregate): boolean {
  if (a.systems.length !== b.systems.length || a.ions.length !== b.ions.length) return false;
  for (let s = 0; s < a.systems.length; s++) if (a.systems[s] !== b.systems[s]) return false;
  for (let i = 0; i < a.ions.length; i++) if (a.ions[i].ion.id !== b.ions[i].ion.id || a.ions[i].ion.charge !== b.ions[i].ion.charge) return false;
  return true;
}

export class PreparedMixture {
  readonly ok = true as const;
  aggregate: Aggregate;
  private readonly core: ChargeBalanceSolver;
  /** The Pitzer ions of this mixture, compiled on the first "pitzer" solve. */
  private pitzerState: PitzerState | null = null;
  /** True when the last solve applied the ion-specific (Pitzer) iteration. */
  private pitzerApplied = false;

  private pitzer(): PitzerState {
    if (this.pitzerState === null) this.pitzerState = new PitzerState(this.aggregate);
    return this.pitzerState;
  }

  constructor(agg: Aggregate) {
    this.aggregate = agg;
    // Complexes (metal ions with chelators, polyborates): their own solver; otherwise the plain one.
    const setup = complexSetup(agg);
    if (setup !== null) {
      this.core = new ComplexingSolver(agg, setup);
      return;
    }
    const [q, half, abs] = strongSums(agg);
    this.core = new ChargeBalanceSolver(agg.systems, agg.totals, q, half, abs);
  }

  /**
   * The same components with other amounts (the next row of a what-if table, functions/mixture.ts):
   * validated and aggregated as prepare() does, then solved by this object's solver with the new
   * totals instead of a new solver (a 10 000-row table made 10 000 of them). True when done. False,
   * with nothing changed, when the new amounts fail (prepare() gives the message) or the mixture
   * would need another solver: other systems or ions, or complexes in either.
   */
  setMixture(mix: Mixture): boolean {
    if (this.core instanceof ComplexingSolver) return false;
    const agg = aggregate(mix);
    if (!agg.ok || !sameStructure(agg, this.aggregate) || complexSetup(agg) !== null) return false;
    const [q, half, abs] = strongSums(agg);
    this.core.setTotals(agg.totals, q, half, abs);
    this.aggregate = agg;
    this.pitzerState = null;
    this.pitzerApplied = false;
    return true;
  }

  private run(opts?: ChemOptions): Failure | null {
    const o = resolveOptions(opts);
    if (!o.ok) return o;
    this.core.setTemperature(o.temperatureC);
    this.pitzerApplied = ACTIVITY_MODELS[o.activity].ionSpecific && !(this.core instanceof ComplexingSolver);
    const solved = this.pitzerApplied
      ? solvePitzer(this.core, this.pitzer(), o.activity)
      : solveCoupled(this.core, o.activity) && !(this.core instanceof ComplexingSolver && !this.core.innerOk);
    if (!solved) {
      return fail(
        "no-convergence",
        `The ionic strength did not converge in ${SOLVER.maxIonicStrengthIterations} iterations (last I = ${fmt(this.core.ionicStrength)} mol/L); no result is given.`,
      );
    }
    return null;
  }

  /**
   * Full equilibrium: pH, speciation, ionic strength, β, regime, warnings; the failure
   * "beyond-limit" when the ionic strength is beyond LIMITS.maxIonicStrength (ionic-limit.ts).
   */
  solve(opts?: ChemOptions): Equilibrium | Failure {
    const bad = this.run(opts) ?? ionicLimitFailure(this.core.ionicStrength);
    if (bad) return bad;
    return this.report();
  }

  /** The Equilibrium record of the solved state; under "pitzer" with β by difference and the fallback warnings. */
  private report(): Equilibrium | Failure {
    const eq = buildEquilibrium(this.core, this.aggregate);
    if (!eq.ok) return eq;
    if (!this.pitzerApplied) {
      if (ACTIVITY_MODELS[this.core.model].ionSpecific) {
        eq.warnings.push("The Pitzer model does not cover complexes yet: this mixture is solved with the Davies equation for every ion.");
      }
      return eq;
    }
    const st = this.pitzer();
    eq.warnings.push(...st.warnings(this.core.temperatureC));
    eq.beta = pitzerBufferValue(this.core, st, bufferValue(this.core));
    if (!Number.isFinite(eq.beta)) return fail("no-convergence", "The buffer value did not converge under the Pitzer model; no result is given.");
    return eq;
  }

  /**
   * The ions' osmotic excess Σ m_i(φ − 1), osmol/kg, from Pitzer's equations at the last solve's
   * speciation with the molalities c/w (w kg of water per litre), or null when the last solve did
   * not apply the Pitzer model.
   */
  pitzerOsmoticExcess(waterPerLitre: number): number | null {
    return this.pitzerApplied && this.pitzerState ? this.pitzerState.osmoticExcessScaled(1 / waterPerLitre, this.core.debyeA) : null;
  }

  /**
   * The same equilibrium without the ionic-strength limit: only for reporting where a mixture
   * stands (its ionic strength, ideal osmolarity, AQ.CHECK's reasons), never for a pH-derived number.
   */
  solveBeyondLimit(opts?: ChemOptions): Equilibrium | Failure {
    const bad = this.run(opts);
    if (bad) return bad;
    return this.report();
  }

  /**
   * After a solve: each metal ion that forms complexes here, free and in each complex, over the meter
   * pH values given at the solve's temperature and ionic strength (metal-distribution.ts); [] when no
   * metal forms a complex in this mixture.
   */
  metalDistribution(pH: readonly number[]): MetalDistribution[] {
    return this.core instanceof ComplexingSolver ? metalDistributionOf(this.core, this.aggregate, pH) : [];
  }

  /** After a solve: each system that forms complexes here, free forms and complexes as shares of its total, over those pH values; [] without one. */
  ligandDistribution(pH: readonly number[]): LigandDistribution[] {
    return this.core instanceof ComplexingSolver ? ligandDistributionOf(this.core, this.aggregate, pH) : [];
  }

  /** Fast path: pH, p[H] and ionic strength only ("beyond-limit" as solve). */
  solvePH(opts?: ChemOptions): PHResult {
    const bad = this.run(opts) ?? ionicLimitFailure(this.core.ionicStrength);
    if (bad) return bad;
    const x = this.core.x;
    const pH = -(x + this.core.lnGamma1) / LN10;
    const pcH = -x / LN10;
    const ionicStrength = this.core.ionicStrength;
    if (!Number.isFinite(pH) || !Number.isFinite(ionicStrength)) {
      return fail("no-convergence", "The solver produced a non-finite value for this mixture; no result is given.");
    }
    return { ok: true, pH, pcH, ionicStrength };
  }
}

/** Validates and aggregates a mixture for repeated solving. */
export function prepare(mix: Mixture): PreparedMixture | Failure {
  const agg = aggregate(mix);
  if (!agg.ok) return agg;
  return new PreparedMixture(agg);
}
