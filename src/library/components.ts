/**
 * Library records → the engine's objects (src/chem/types.ts): systems with their 25 °C pKa, ΔrH°
 * and ΔrCp°, strong ions, and Components carrying the molar mass computed from the formula.
 */
import type { AcidBaseSystem, ComplexSpecies, Component, PkaStep, SolidSpecies, StrongIon } from "../chem/types";
import { molarMassOf } from "./formula";
import type { IonRecord, SubstanceRecord, SystemRecord } from "./types";

export function toSystem(r: SystemRecord): AcidBaseSystem {
  const steps: PkaStep[] = r.steps.map((s) => {
    const step: PkaStep = { pKa: s.pKa.value };
    if (s.dH) step.dH = s.dH.value;
    if (s.dCp) step.dCp = s.dCp.value;
    if (s.pKa.status === "unverified") step.unverified = true;
    return Object.freeze(step);
  });
  const sys: AcidBaseSystem = { id: r.id, name: r.name, topCharge: r.topCharge, steps: Object.freeze(steps) as PkaStep[] };
  if (r.speciesNames) sys.speciesNames = Object.freeze([...r.speciesNames]) as string[];
  if (r.complexes && r.complexes.length > 0) {
    sys.complexes = Object.freeze(
      r.complexes.map((c) => {
        const spec: ComplexSpecies = { name: c.name, ligands: c.ligands, protons: c.protons, logBeta: c.logBeta.value };
        if (c.metal !== undefined) spec.metal = c.metal;
        if (c.dH) spec.dH = c.dH.value;
        return Object.freeze(spec);
      }),
    ) as ComplexSpecies[];
  }
  if (r.solids && r.solids.length > 0) {
    sys.solids = Object.freeze(
      r.solids.map((x) => Object.freeze({ name: x.name, metal: x.metal, metals: x.metals, ligands: x.ligands, protons: x.protons, logKsp: x.logKsp.value })),
    ) as SolidSpecies[];
  }
  return Object.freeze(sys);
}

/** Strong ions are named by formula ("Na+", "Cl-"), like the other species in a speciation table. */
export function toIon(r: IonRecord): StrongIon {
  return Object.freeze({ id: r.id, name: r.formula ?? r.name, charge: r.charge });
}

export type ComponentResult = { ok: true; component: Component } | { ok: false; code: "unusable"; message: string };

/** Build a Component; every reference must already be known to exist. */
export function toComponent(
  r: SubstanceRecord,
  systems: ReadonlyMap<string, AcidBaseSystem>,
  ions: ReadonlyMap<string, StrongIon>,
  atomicWeights: ReadonlyMap<string, number>,
): ComponentResult {
  let molarMass: number | undefined;
  if (r.formula !== undefined) {
    const m = molarMassOf(r.formula, atomicWeights);
    if (!m.ok) return { ok: false, code: "unusable", message: m.message };
    molarMass = m.value;
  } else {
    molarMass = r.molarMass?.value;
  }
  const sysShares: Component["systems"] = [];
  let protons = 0;
  for (const share of r.systems ?? []) {
    const system = systems.get(share.system);
    if (!system) return { ok: false, code: "unusable", message: `unknown acid–base system '${share.system}'` };
    sysShares.push(Object.freeze({ system, stoich: share.stoich }));
    protons += share.protons;
  }
  const ionShares: Component["ions"] = [];
  for (const share of r.ions ?? []) {
    const ion = ions.get(share.ion);
    if (!ion) return { ok: false, code: "unusable", message: `unknown strong ion '${share.ion}'` };
    ionShares.push(Object.freeze({ ion, stoich: share.stoich }));
  }
  const component: Component = {
    id: r.id,
    name: r.name,
    systems: Object.freeze(sysShares) as Component["systems"],
    ions: Object.freeze(ionShares) as Component["ions"],
  };
  if (r.neutral !== undefined) component.neutral = r.neutral;
  if (molarMass !== undefined) component.molarMass = molarMass;
  if (sysShares.length) component.protons = protons;
  return { ok: true, component: Object.freeze(component) };
}
