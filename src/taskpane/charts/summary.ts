/** Words for the charts: titles, summaries (aria-label, <desc>) and number formats. Pure. */
import type { MetalDistribution } from "../../chem";
import type { SpeciationData, SystemSpeciation } from "./speciation";
import type { TitrationData } from "./titration";

export function pct(f: number): string {
  const p = f * 100;
  if (p >= 99.95) return "100 %";
  if (p < 0.05) return f > 0 ? "< 0.1 %" : "0 %";
  return `${p < 10 ? p.toFixed(1) : p.toFixed(0)} %`;
}

/** A volume in mL to three significant figures (1.00, 12.3, 0.523), whole mL from 1000 up. */
export function mL(v: number): string {
  return v === 0 ? "0" : v >= 1000 ? v.toFixed(0) : v.toPrecision(3);
}

/** A set volume as the user would write it: 10 mL, 2.5 mL (no trailing zeros). */
export function setVolume(v: number): string {
  return String(Number(v.toPrecision(4)));
}

export function molar(c: number): string {
  return c >= 0.1 ? `${Number(c.toPrecision(3))} M` : `${Number((c * 1000).toPrecision(3))} mM`;
}

function list(items: string[]): string {
  return items.length <= 1 ? items.join("") : `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

export function conditions(d: Pick<SpeciationData, "temperatureC" | "ionicStrength">): string {
  return `${Number(d.temperatureC.toFixed(2))} °C, ionic strength ${d.ionicStrength.toPrecision(2)} mol/L`;
}

export function speciationTitle(sys: SystemSpeciation): string {
  return `Forms of ${sys.name} from pH 0 to 14`;
}

/** One sentence a screen reader can say instead of the picture. */
export function speciationSummary(sys: SystemSpeciation, d: SpeciationData): string {
  const main = sys.species
    .map((s) => ({ s, f: s.atMixture }))
    .filter((x) => x.f >= 0.01)
    .sort((a, b) => b.f - a.f)
    .map((x) => `${x.s.name} ${pct(x.f)}`);
  const cross = sys.crossings.map((c) => c.toFixed(2));
  return (
    `${speciationTitle(sys)} at ${conditions(d)}. ` +
    `At the mixture's pH ${d.mixturePH.toFixed(2)}: ${list(main)}. ` +
    `Neighbouring forms are present in equal amounts at pH ${list(cross)}.`
  );
}

export function metalTitle(m: MetalDistribution): string {
  return `${m.name} free and in complexes from pH 0 to 14`;
}

/** The lowest pH at which the free ion falls to half of the metal's total (interpolated), or null. */
export function halfFreePH(m: MetalDistribution, pH: readonly number[]): number | null {
  const f = m.forms[0].fractions;
  for (let i = 0; i + 1 < f.length; i++) {
    if (f[i] >= 0.5 && f[i + 1] < 0.5) return pH[i] + ((f[i] - 0.5) / (f[i] - f[i + 1])) * (pH[i + 1] - pH[i]);
  }
  return null;
}

/** One sentence a screen reader can say instead of the metal's picture. */
export function metalSummary(m: MetalDistribution, d: SpeciationData): string {
  const main = m.forms
    .filter((f) => f.atMixture >= 0.01)
    .sort((a, b) => b.atMixture - a.atMixture)
    .map((f) => `${f.name} ${pct(f.atMixture)}`);
  const half = halfFreePH(m, d.pH);
  const free = m.forms[0].fractions;
  return (
    `${metalTitle(m)} at ${conditions(d)}, as % of its total. ` +
    `At the mixture's pH ${d.mixturePH.toFixed(2)}: ${list(main)}. ` +
    (half !== null ? `Half of it is free at pH ${half.toFixed(2)}.` : free.every((f) => f >= 0.5) ? "The free ion is more than half of it over the whole range." : free.every((f) => f < 0.5) ? "The free ion is less than half of it over the whole range." : "")
  ).trim();
}

export function titrationTitle(t: TitrationData): string {
  return `Titration of ${setVolume(t.sampleVolumeML)} mL of the mixture with ${molar(t.stockConc)} ${t.titrant}`;
}

export function titrationSummary(t: TitrationData): string {
  const end = t.points[t.points.length - 1];
  const dir = end.pH > t.startPH ? "rises" : "falls";
  const eq = t.equivalence.length
    ? `Equivalence point${t.equivalence.length > 1 ? "s" : ""} at ${list(t.equivalence.map((e) => `${mL(e.mL)} mL (pH ${e.pH.toFixed(2)})`))}.`
    : "No equivalence point in this range.";
  return `${titrationTitle(t)}, 0 to ${mL(t.maxML)} mL: the pH ${dir} from ${t.startPH.toFixed(2)} to ${end.pH.toFixed(2)}. ${eq}`;
}
