/**
 * The report of a solved ComplexingSolver: the species of each complexing system (free forms and
 * complexes), the free metal ions, the buffer value and the warnings that belong to complexes.
 */
import { solveCoupled } from "./ionic-strength-iteration";
import { DEFAULTS, LIMITS } from "./defaults";
import { fmt } from "./failure";
import { LN10 } from "./physical-constants";
import type { ComplexingSolver } from "./complex-solver";
import { speciesName } from "./species-names";
import type { AcidBaseSystem, Species } from "./types";

/** Free concentration of strong ion i of the aggregate, or null when it forms no complex here. */
export function freeMetal(core: ComplexingSolver, ionIndex: number): { conc: number; fraction: number } | null {
  const j = core.setup.metals.indexOf(ionIndex);
  if (j < 0) return null;
  const conc = Math.exp(core.v[j]);
  return { conc, fraction: conc / core.metT[j] };
}

/** The species of system s when it forms complexes here (free forms, then complexes), or null. */
export function complexingSystemSpecies(core: ComplexingSolver, sys: AcidBaseSystem, s: number, metalIds: readonly string[]): Species[] | null {
  const l = core.setup.ligands.indexOf(s);
  if (l < 0) return null;
  const x = core.x;
  const n = core.ligN[l];
  const o = core.ligStep0[l];
  const C = core.ligC[l];
  const out: Species[] = [];
  // Species k has lost k protons, so it carries p = n − k protons over L.
  const lnw: number[] = [0];
  for (let p = 1; p <= n; p++) lnw.push(lnw[p - 1] + x - core.lnKa[o + n - p]);
  for (let k = 0; k <= n; k++) {
    const conc = Math.exp(core.u[l] + lnw[n - k]);
    out.push({ name: speciesName(sys, k), systemId: sys.id, charge: sys.topCharge - k, conc, fraction: conc / C });
  }
  for (let c = 0; c < core.nC; c++) {
    if (core.cLig[c] !== l) continue;
    const conc = Math.exp(core.lnc[c]);
    const sp: Species = { name: core.setup.complexes[c].spec.name, systemId: sys.id, charge: core.cZ[c], conc, fraction: (core.cL[c] * conc) / C };
    const j = core.cMet[c];
    if (j >= 0) {
      sp.metalId = metalIds[j];
      sp.metalFraction = conc / core.metT[j];
    }
    out.push(sp);
  }
  return out;
}

/**
 * β = dC_b/dpH by a Richardson-extrapolated central difference of the solved pH against strong base
 * added (steps of about 10⁻⁴ pH); the solver is solved again without base at the end, so its state
 * is the equilibrium reported. NaN if a shifted solve fails (not expected).
 */
export function complexBufferValue(core: ComplexingSolver): number {
  const model = core.model;
  const d = Math.max(1e-4 * LN10 * core.dF, 1e-15);
  const pHAt = (cb: number): number => {
    core.setAddedBase(cb);
    if (!solveCoupled(core, model)) return NaN;
    return -(core.x + core.lnGamma1) / LN10;
  };
  const p1 = pHAt(d);
  const m1 = pHAt(-d);
  const p2 = pHAt(2 * d);
  const m2 = pHAt(-2 * d);
  core.setAddedBase(0);
  if (!solveCoupled(core, model)) return NaN;
  const d1 = (p1 - m1) / (2 * d);
  const d2 = (p2 - m2) / (4 * d);
  return 3 / (4 * d1 - d2);
}

/** Complexes without ΔrH° used away from 25 °C that hold at least 1 % of their ligand or metal. */
export function complexEnthalpyWarnings(core: ComplexingSolver, species: readonly Species[]): string[] {
  if (Math.abs(core.temperatureC - DEFAULTS.temperatureC) <= LIMITS.missingEnthalpyWarnK) return [];
  const names: string[] = [];
  for (const { spec } of core.setup.complexes) {
    if (spec.dH !== undefined) continue;
    const sp = species.find((x) => x.name === spec.name && x.systemId !== null);
    if (sp && (sp.fraction >= 0.01 || (sp.metalFraction ?? 0) >= 0.01)) names.push(spec.name);
  }
  if (names.length === 0) return [];
  return [`ΔrH° is unknown for ${names.join(", ")}: the formation constant is held at the 25 °C value at ${fmt(core.temperatureC)} °C.`];
}

/** A mass balance that did not converge (not expected): the equilibrium is then refused. */
export function innerFailureMessage(core: ComplexingSolver): string | null {
  return core.innerOk ? null : "The metal and ligand mass balances did not converge; no result is given.";
}
