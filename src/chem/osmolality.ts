/**
 * Osmolality, osmol per kg of water: what a freezing-point or vapour-pressure osmometer reads.
 *
 * Formula:
 *   w     = ρw(T) · (1 − Σ_j c_j·V_j)               kg of water per litre of solution
 *   m_i   = c_i / w                                  molality of each particle at equilibrium
 *   Osm   = Σ_i m_i  +  Δ_el(I_m)  +  Σ_n k_n·m_n²
 * where c_j are the components as weighed (mol/L) with V_j their partial molar volumes at infinite
 * dilution (L/mol; data/osmotic.json, a default specific volume for a component without one), the
 * sum over i runs over every particle at equilibrium (ions, H⁺, OH⁻, every species of every system,
 * non-electrolytes), I_m = I/w is the molal ionic strength, and
 *   Δ_el(I) = −2·ln10·A(T)·[ I·f(I) − ∫₀^I f(t) dt ]
 * is the electrostatic osmotic term of the activity model log10 γ(z) = −A z² f(I) (Davies, extended
 * Debye–Hückel; 0 for ideal). Under "pitzer" the ions' term is Pitzer's instead,
 *   Δ_el = Σ_i m_i (φ − 1) = 2[−Aφ I^{3/2}/(1 + 1.2√I) + Σ_c Σ_a m_c m_a (Bφ + Z C) + mixing terms]
 * (activity/pitzer.ts) at the molalities m_i = c_i/w of every ion at equilibrium; an ion without
 * parameters enters through I and Z only (its own pair terms are zero). k_n is the slope of the osmotic coefficient of a non-electrolyte,
 * φ_n = 1 + k_n·m_n (data/osmotic.json).
 *
 * Method: Δ_el follows from the Gibbs–Duhem relation for an excess Gibbs energy that depends on I
 * only (G^ex/(RT·kg water) = F(I) with ln γ_i = (z_i²/2)·F′(I)): Σ m_i (φ − 1) = I·F′(I) − F(I).
 * So the ions' osmotic coefficient is the one consistent with the activity coefficients the pH was
 * solved with; to first order it is the Debye–Hückel limiting law φ − 1 = −(ln10·A/3)·|z₊z₋|·√I.
 * The integral is by 16-point Gauss–Legendre in s = √t (smooth in s). Rule for mixtures: the
 * electrostatic term depends on the total ionic strength only (every ion alike), and each
 * non-electrolyte adds its own excess k_n·m_n², with no cross terms between solutes.
 *
 * Notes (accuracy): Davies is ion-blind. Against published osmotic coefficients of NaCl (Pitzer
 * equation with the NaCl parameters of Carroll, Craig & Wolery, Geochem. Trans. 6, 19 (2005),
 * Table I), φ is 0.3 % high at 0.1 mol/kg and 2.4 % high at 0.3 mol/kg; for KCl about twice that.
 * Above I ≈ 0.3 mol/kg the electrolyte term is an estimate only. The partial molar volumes matter
 * for sugars (250 mM sucrose: 5 % of the volume) and little for dilute salts.
 */
import data from "./data/osmotic.json";
import { activityShape } from "./activity/model";
import { debyeHuckelA } from "./activity/debye-huckel-a";
import { prepare } from "./prepared";
import { ACTIVITY_MODELS, ION_SPECIFIC_START } from "./activity/models";
import { fail, fmt } from "./failure";
import type { ChemOptions, Component, Mixture, Result } from "./types";
import { resolveOptions } from "./validate-options";
import { waterDensity } from "./water-density";

interface SoluteData {
  volume?: { value: number };
  phiSlope?: { value: number };
}

const SUBSTANCES = data.substances as Record<string, SoluteData>;
/** cm³/g for a component without a tabulated partial molar volume. */
export const DEFAULT_SPECIFIC_VOLUME = data.defaultSpecificVolume.value;

export interface OsmolalityValue {
  /** osmol/kg of water. */
  value: number;
  /** kg of water per litre of solution. */
  waterPerLitre: number;
  /** Molal ionic strength, mol/kg. */
  ionicStrength: number;
  /** The model the ions' term comes from ("pitzer": Pitzer's osmotic coefficient; otherwise Δ_el of that model). */
  model: string;
  /** Ideal part Σ m_i, the electrostatic term Δ_el and the non-electrolyte excess Σ k·m², osmol/kg. */
  ideal: number;
  electrostatic: number;
  nonElectrolyte: number;
  /** Components whose volume was estimated from DEFAULT_SPECIFIC_VOLUME. */
  estimatedVolume: string[];
  warnings: string[];
}

/** Partial molar volume, L/mol: the table, else the default specific volume × molar mass, else 0. */
function molarVolume(c: Component): { litres: number; estimated: boolean } {
  const v = SUBSTANCES[c.id]?.volume?.value;
  if (v !== undefined) return { litres: v / 1000, estimated: false };
  if (c.molarMass !== undefined) return { litres: (DEFAULT_SPECIFIC_VOLUME * c.molarMass) / 1000, estimated: true };
  return { litres: 0, estimated: true };
}

// 16-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun, Table 25.4).
const GL_X = [0.0950125098376374, 0.2816035507792589, 0.4580167776572274, 0.6178762444026438, 0.755404408355003, 0.8656312023878318, 0.9445750230732326, 0.9894009349916499];
const GL_W = [0.1894506104550685, 0.1826034150449236, 0.1691565193950025, 0.1495959888165767, 0.1246289712555339, 0.0951585116824928, 0.0622535239386479, 0.0271524594117541];

/** ∫₀^I f(t) dt = ∫₀^√I f(s²)·2s ds. */
function integralOfShape(model: ChemOptions["activity"] & string, I: number): number {
  const S = Math.sqrt(I);
  let sum = 0;
  for (let k = 0; k < GL_X.length; k++) {
    for (const sign of [-1, 1]) {
      const s = 0.5 * S * (1 + sign * GL_X[k]);
      sum += GL_W[k] * activityShape(model, s * s) * 2 * s;
    }
  }
  return 0.5 * S * sum;
}

/** Δ_el(I), osmol/kg: the electrostatic osmotic term of the activity model. */
export function electrostaticOsmoticTerm(model: ChemOptions["activity"] & string, I: number, temperatureC: number): number {
  if (I <= 0) return 0;
  return -2 * Math.LN10 * debyeHuckelA(temperatureC) * (I * activityShape(model, I) - integralOfShape(model, I));
}

/** Osmolality of a mixture, osmol/kg of water (see the header for the model and its accuracy). */
export function osmolality(mix: Mixture, opts: ChemOptions = {}): Result<OsmolalityValue> {
  const o = resolveOptions(opts);
  if (!o.ok) return o;
  const prepared = prepare(mix);
  if (!prepared.ok) return prepared;
  const eq = prepared.solve({ temperatureC: o.temperatureC, activity: o.activity });
  if (!eq.ok) return eq;
  let volume = 0;
  const estimatedVolume: string[] = [];
  for (const e of mix) {
    const v = molarVolume(e.component);
    volume += e.conc * v.litres;
    if (v.estimated && e.conc > 0 && !estimatedVolume.includes(e.component.name)) estimatedVolume.push(e.component.name);
  }
  if (!(volume < 0.9)) {
    return fail("out-of-range", `The solutes take about ${fmt(volume * 100)} % of the volume: this is not a dilute solution, and its osmolality cannot be estimated here.`);
  }
  const w = waterDensity(o.temperatureC + 273.15) * (1 - volume);
  let particles = 0;
  for (const sp of eq.species) particles += sp.conc;
  let nonElectrolyte = 0;
  for (const e of mix) {
    const n = e.conc * (e.component.neutral ?? 0);
    particles += n;
    const k = SUBSTANCES[e.component.id]?.phiSlope?.value ?? 0;
    nonElectrolyte += k * (n / w) * (n / w);
  }
  const Im = eq.ionicStrength / w;
  const ideal = particles / w;
  const pitzer = prepared.pitzerOsmoticExcess(w);
  const electrostatic = pitzer ?? electrostaticOsmoticTerm(o.activity, Im, o.temperatureC);
  return {
    ok: true,
    value: ideal + electrostatic + nonElectrolyte,
    // an ion-specific model not applied (a mixture with complexes) falls back to its start model's shape
    model: pitzer === null && ACTIVITY_MODELS[o.activity].ionSpecific ? ION_SPECIFIC_START : o.activity,
    waterPerLitre: w,
    ionicStrength: Im,
    ideal,
    electrostatic,
    nonElectrolyte,
    estimatedVolume,
    warnings: eq.warnings,
  };
}
