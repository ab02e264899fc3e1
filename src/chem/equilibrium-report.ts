/**
 * Turns a solved ChargeBalanceSolver into the Equilibrium record: species, regime, residual,
 * buffer value and warnings.
 */
import type { Aggregate } from "./aggregate";
import { bufferValue } from "./beta";
import { fail } from "./failure";
import { LN10 } from "./physical-constants";
import { classifyRegime } from "./regime";
import type { ChargeBalanceSolver } from "./solver-core";
import { speciesName } from "./species-names";
import type { Equilibrium, Failure, Species } from "./types";
import { ComplexingSolver } from "./complex-solver";
import { saturationIndices, saturationWarnings } from "./saturation";
import { complexBufferValue, complexEnthalpyWarnings, complexingSystemSpecies, freeMetal, innerFailureMessage } from "./complex-report";
import { pKw } from "./water";
import { ionicStrengthWarning, missingEnthalpyWarnings } from "./warnings";

export function buildEquilibrium(core: ChargeBalanceSolver, agg: Aggregate): Equilibrium | Failure {
  const x = core.x;
  const h = Math.exp(x);
  const invH = 1 / h;
  const oh = core.kwc * invH;
  const species: Species[] = [
    { name: "H+", systemId: null, charge: 1, conc: h, fraction: 1 },
    { name: "OH-", systemId: null, charge: -1, conc: oh, fraction: 1 },
  ];
  const cx = core instanceof ComplexingSolver ? core : null;
  if (cx) {
    const bad = innerFailureMessage(cx);
    if (bad) return fail("no-convergence", bad);
  }
  let chargeSum = h - oh;
  let largest = Math.max(h, oh);
  agg.ions.forEach(({ ion, conc: total }, i) => {
    const free = cx ? freeMetal(cx, i) : null;
    const conc = free ? free.conc : total;
    const sp: Species = { name: ion.name, systemId: null, charge: ion.charge, conc, fraction: free ? free.fraction : 1 };
    if (free) sp.metalId = ion.id;
    species.push(sp);
    chargeSum += ion.charge * conc;
    largest = Math.max(largest, Math.abs(ion.charge * conc));
  });
  const metalIds = cx ? cx.setup.metals.map((i) => agg.ions[i].ion.id) : [];
  let hasSystem = false;
  for (let s = 0; s < core.nSys; s++) {
    const sys = agg.systems[s];
    const own = cx ? complexingSystemSpecies(cx, sys, s, metalIds) : null;
    if (own) {
      hasSystem = true;
      for (const sp of own) {
        species.push(sp);
        chargeSum += sp.charge * sp.conc;
        largest = Math.max(largest, Math.abs(sp.charge * sp.conc));
      }
      continue;
    }
    const C = core.total(s);
    if (C > 0) hasSystem = true;
    const n = core.stepCount(s);
    // Relative amounts in log space: robust for any pKa/h combination, run once per report.
    const logT: number[] = [0];
    for (let k = 1; k <= n; k++) logT.push(logT[k - 1] + Math.log(core.conditionalKa(s, k)) - x);
    const top = Math.max(...logT);
    const rel = logT.map((v) => Math.exp(v - top));
    const sum = rel.reduce((a, b) => a + b, 0);
    for (let k = 0; k <= n; k++) {
      const fraction = rel[k] / sum;
      const conc = C * fraction;
      const charge = sys.topCharge - k;
      species.push({ name: speciesName(sys, k), systemId: sys.id, charge, conc, fraction });
      chargeSum += charge * conc;
      largest = Math.max(largest, Math.abs(charge * conc));
    }
  }
  const beta = cx ? complexBufferValue(cx) : bufferValue(core);
  const gammaH = Math.exp(core.lnGamma1);
  const pH = -(x + core.lnGamma1) / LN10;
  const pcH = -x / LN10;
  const I = core.ionicStrength;
  if (![pH, pcH, I, beta, gammaH].every(Number.isFinite) || species.some((sp) => !Number.isFinite(sp.conc))) {
    return fail("no-convergence", "The solver produced a non-finite value for this mixture; no result is given.");
  }
  const S = core.pMax;
  const N = core.pMax - core.pMin;
  const warnings: string[] = [];
  const wI = ionicStrengthWarning(I, core.model);
  if (wI) warnings.push(wI);
  warnings.push(...missingEnthalpyWarnings(agg.systems, agg.totals, core.temperatureC, pH));
  if (cx) warnings.push(...complexEnthalpyWarnings(cx, species));
  const saturation = saturationIndices(agg, species, pH, gammaH);
  warnings.push(...saturationWarnings(saturation, core.temperatureC));
  return {
    ...(saturation.length > 0 ? { saturation } : {}),
    ok: true,
    pH,
    pcH,
    ionicStrength: I,
    gammaH,
    pKw: pKw(core.temperatureC),
    beta,
    species,
    residual: Math.abs(chargeSum) / largest,
    iterations: core.outerIterations,
    regime: classifyRegime(hasSystem, S, N, h, oh),
    warnings,
  };
}
