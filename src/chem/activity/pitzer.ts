/**
 * Pitzer's ion-interaction equations: activity coefficients of every ion and the osmotic
 * coefficient of a mixed electrolyte from its molalities.
 *
 * Formula (Pitzer, "Ion interaction approach", in Activity Coefficients in Electrolyte Solutions,
 * 2nd ed., CRC 1991, ch. 3; the mixture form of Harvie, Møller & Weare, Geochim. Cosmochim. Acta 48,
 * 723 (1984), eqs. 1–7), natural logarithms, molalities m, I = ½Σ m z², Z = Σ m |z|:
 *   F = −Aφ[√I/(1 + b√I) + (2/b)·ln(1 + b√I)] + Σ_c Σ_a m_c m_a B′_ca + Σ_{i<j like} m_i m_j Φ′_ij
 *   ln γ_M = z_M² F + Σ_a m_a (2B_Ma + Z C_Ma) + Σ_c m_c (2Φ_Mc + Σ_a m_a ψ_Mca)
 *            + Σ_{a<a'} m_a m_a' ψ_Maa' + |z_M| Σ_c Σ_a m_c m_a C_ca          (anions alike)
 *   Σ m_i (φ − 1) = 2[−Aφ I^{3/2}/(1 + b√I) + Σ_c Σ_a m_c m_a (Bφ_ca + Z C_ca)
 *            + Σ_{i<j like} m_i m_j (Φφ_ij + Σ_k m_k ψ_ijk)]
 * with b = 1.2 (kg/mol)^½, Bφ = β0 + β1 e^{−α1√I} + β2 e^{−α2√I}, B = β0 + β1 g(α1√I) + β2 g(α2√I),
 * B′ = [β1 g′(α1√I) + β2 g′(α2√I)]/I, g(x) = 2[1 − (1 + x)e^{−x}]/x²,
 * g′(x) = −2[1 − (1 + x + x²/2)e^{−x}]/x², C = Cφ/(2√|z_M z_X|), α1 = 2 (1.4 for 2:2 salts), α2 = 12;
 * Φ = θ + Eθ(I), Φ′ = Eθ′(I), Φφ = θ + Eθ + I·Eθ′, Eθ the unsymmetrical-mixing term (Pitzer, J.
 * Solution Chem. 4, 249 (1975)) with J(x) = x/[4 + 4.581 x^{−0.7237} exp(−0.0120 x^{0.528})] (ibid.,
 * eq. 47; from memory, unverified).
 * Debye–Hückel term: Aφ = A·ln10/3 with A the engine's log10 limiting slope (debye-huckel-a.ts, the
 * same permittivity and density), so Aφ(25 °C) = 0.3921 (Pitzer's tables use 0.3915).
 *
 * Notes: neutral species are not in the sums (γ = 1; no λ is used). The caller compiles a model for
 * a fixed list of ions once (PitzerModel) and evaluates it many times; evaluate() allocates nothing.
 */
import { ANALOGUES, BINARY, PSI, THETA } from "../data/pitzer-parameters";
import { LN10 } from "../physical-constants";

export const PITZER_B = 1.2;

/** Aφ, natural-log osmotic Debye–Hückel slope, from the engine's log10 slope A: Aφ = A·ln10/3. */
export function osmoticSlope(A: number): number {
  return (A * LN10) / 3;
}

function g(x: number): number {
  return x < 1e-6 ? 1 - (2 * x) / 3 : (2 * (1 - (1 + x) * Math.exp(-x))) / (x * x);
}

function gPrime(x: number): number {
  return x < 1e-6 ? -x / 3 : (-2 * (1 - (1 + x + 0.5 * x * x) * Math.exp(-x))) / (x * x);
}

const J1 = 4.581;
const J2 = 0.7237;
const J3 = 0.012;
const J4 = 0.528;

/** J(x) and x·J′(x) of the unsymmetrical-mixing integral (Pitzer 1975, eq. 47). */
function jAndXjPrime(x: number, out: number[]): void {
  if (x <= 0) {
    out[0] = 0;
    out[1] = 0;
    return;
  }
  const e = J1 * Math.pow(x, -J2) * Math.exp(-J3 * Math.pow(x, J4));
  const D = 4 + e;
  out[0] = x / D;
  out[1] = (x * (4 + e * (1 + J2 + J3 * J4 * Math.pow(x, J4)))) / (D * D);
}

const jbuf = [0, 0];

/** Parameter key of an unordered set of ion names. */
function setKey(names: readonly string[]): string {
  return [...names].sort().join("|");
}

const BINARY_BY_KEY = new Map(BINARY.map((p) => [setKey([p.cation, p.anion]), p]));
const THETA_BY_KEY = new Map(THETA.map((p) => [setKey(p.ions), p.value]));
const PSI_BY_KEY = new Map(PSI.map((p) => [setKey(p.ions), p.value]));

/** Ions that have at least one published cation–anion parameter set here. */
export const COVERED_IONS: ReadonlySet<string> = new Set(BINARY.flatMap((p) => [p.cation, p.anion]));

/** The analogue whose parameters an ion borrows (data/pitzer-parameters.ts, ANALOGUES), if any. */
export function analogueOf(name: string): string | undefined {
  return ANALOGUES[name];
}

/** The binary parameters of a cation–anion pair, or undefined when none are published here. */
export function binaryParameters(cation: string, anion: string) {
  return BINARY_BY_KEY.get(setKey([cation, anion]));
}

/** The parameters used for a pair: its own, else those with each ion replaced by its analogue. */
function usedParameters(cation: string, anion: string) {
  return binaryParameters(cation, anion) ?? binaryParameters(ANALOGUES[cation] ?? cation, ANALOGUES[anion] ?? anion);
}

/** Pitzer's equations compiled for one list of ions (names as in data/pitzer-parameters.ts). */
export class PitzerModel {
  readonly n: number;
  readonly charges: readonly number[];
  // cation–anion pairs with parameters: i, j, β0, β1, β2, α1, α2, C
  private readonly ca: number[] = [];
  // like-charged pairs (every one with θ ≠ 0 or unequal charges): i, j, θ
  private readonly like: number[] = [];
  // triplets with ψ ≠ 0: i, j (like-charged), k, ψ
  private readonly tri: number[] = [];
  private readonly jv: number[] = [NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN];
  private readonly xj: number[] = [NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN];

  constructor(names: readonly string[], charges: readonly number[]) {
    this.n = names.length;
    this.charges = charges;
    const n = names.length;
    for (let i = 0; i < n; i++) {
      for (let j = i + 1; j < n; j++) {
        const zi = charges[i];
        const zj = charges[j];
        if (zi === 0 || zj === 0) continue;
        if (zi * zj < 0) {
          const [c, a] = zi > 0 ? [i, j] : [j, i];
          const p = usedParameters(names[c], names[a]);
          if (!p) continue;
          const twoTwo = Math.abs(zi) >= 2 && Math.abs(zj) >= 2;
          const C = p.cphi / (2 * Math.sqrt(Math.abs(zi * zj)));
          this.ca.push(c, a, p.beta0, p.beta1, p.beta2 ?? 0, twoTwo ? 1.4 : 2, 12, C);
        } else {
          const theta = THETA_BY_KEY.get(setKey([names[i], names[j]])) ?? 0;
          if (theta !== 0 || zi !== zj) this.like.push(i, j, theta);
          for (let k = 0; k < n; k++) {
            if (charges[k] * zi >= 0) continue;
            const psi = PSI_BY_KEY.get(setKey([names[i], names[j], names[k]])) ?? 0;
            if (psi !== 0) this.tri.push(i, j, k, psi);
          }
        }
      }
    }
  }

  /** J(sx·k), cached for this evaluation (k < 10). */
  private J(k: number, sx: number): number {
    const jv = this.jv;
    if (k >= jv.length) {
      jAndXjPrime(sx * k, jbuf);
      return jbuf[0];
    }
    if (Number.isNaN(jv[k])) {
      jAndXjPrime(sx * k, jbuf);
      jv[k] = jbuf[0];
      this.xj[k] = jbuf[1];
    }
    return jv[k];
  }

  /** x·J′(x) at x = sx·k, cached with J. */
  private XJ(k: number, sx: number): number {
    if (k >= this.jv.length) {
      jAndXjPrime(sx * k, jbuf);
      return jbuf[1];
    }
    this.J(k, sx);
    return this.xj[k];
  }

  /**
   * ln γ of every ion into lnGamma (length n) at molalities m (mol/kg) and osmotic slope Aφ.
   * Returns Σ m_i (φ − 1) over these ions (the osmotic excess, mol/kg); the ionic strength used is
   * written to this.ionicStrength.
   */
  ionicStrength = 0;

  evaluate(m: ArrayLike<number>, Aphi: number, lnGamma: number[]): number {
    const n = this.n;
    const z = this.charges;
    let I = 0;
    let Z = 0;
    for (let i = 0; i < n; i++) {
      const zi = z[i];
      I += m[i] * zi * zi;
      Z += m[i] * (zi < 0 ? -zi : zi);
      lnGamma[i] = 0;
    }
    I *= 0.5;
    this.ionicStrength = I;
    if (!(I > 0)) return 0;
    const sI = Math.sqrt(I);
    const bs = 1 + PITZER_B * sI;
    let F = -Aphi * (sI / bs + (2 / PITZER_B) * Math.log(bs));
    let osm = (-Aphi * I * sI) / bs;
    let cc = 0;
    const ca = this.ca;
    // α1 = 2 for every pair but 2:2 salts: g, g′ and e^{−x} at x = 2√I computed once
    const x2 = 2 * sI;
    const g2 = g(x2);
    const gp2 = gPrime(x2);
    const e2 = Math.exp(-x2);
    for (let p = 0; p < ca.length; p += 8) {
      const c = ca[p];
      const a = ca[p + 1];
      const b0 = ca[p + 2];
      const b1 = ca[p + 3];
      const b2 = ca[p + 4];
      const C = ca[p + 7];
      let B: number;
      let Bp: number;
      let Bphi: number;
      if (ca[p + 5] === 2) {
        B = b0 + b1 * g2;
        Bp = b1 * gp2;
        Bphi = b0 + b1 * e2;
      } else {
        const x1 = ca[p + 5] * sI;
        B = b0 + b1 * g(x1);
        Bp = b1 * gPrime(x1);
        Bphi = b0 + b1 * Math.exp(-x1);
      }
      if (b2 !== 0) {
        const x2 = ca[p + 6] * sI;
        B += b2 * g(x2);
        Bp += b2 * gPrime(x2);
        Bphi += b2 * Math.exp(-x2);
      }
      Bp /= I;
      const mc = m[c];
      const mA = m[a];
      const mm = mc * mA;
      const t = 2 * B + Z * C;
      F += mm * Bp;
      lnGamma[c] += mA * t;
      lnGamma[a] += mc * t;
      cc += mm * C;
      osm += mm * (Bphi + Z * C);
    }
    const like = this.like;
    if (like.length > 0) {
      // J(x) and x·J′(x) at x = 6Aφ√I·k for the charge products k met here (1 … 9 for |z| ≤ 3):
      // each evaluated once per call rather than three times per pair.
      const sx = 6 * Aphi * sI;
      const jv = this.jv;
      for (let k = 0; k < jv.length; k++) jv[k] = NaN;
      for (let p = 0; p < like.length; p += 3) {
        const i = like[p];
        const j = like[p + 1];
        const zi = z[i];
        const zj = z[j];
        let e = 0;
        let ep = 0;
        if (zi !== zj) {
          const zz = zi * zj;
          const ii = zi * zi;
          const jj = zj * zj;
          e = (zz / (4 * I)) * (this.J(zz, sx) - 0.5 * this.J(ii, sx) - 0.5 * this.J(jj, sx));
          ep = -e / I + (zz / (8 * I * I)) * (this.XJ(zz, sx) - 0.5 * this.XJ(ii, sx) - 0.5 * this.XJ(jj, sx));
        }
        const Phi = like[p + 2] + e;
        const mi = m[i];
        const mj = m[j];
        F += mi * mj * ep;
        lnGamma[i] += 2 * mj * Phi;
        lnGamma[j] += 2 * mi * Phi;
        osm += mi * mj * (Phi + I * ep);
      }
    }
    const tri = this.tri;
    for (let p = 0; p < tri.length; p += 4) {
      const i = tri[p];
      const j = tri[p + 1];
      const k = tri[p + 2];
      const psi = tri[p + 3];
      lnGamma[i] += m[j] * m[k] * psi;
      lnGamma[j] += m[i] * m[k] * psi;
      lnGamma[k] += m[i] * m[j] * psi;
      osm += m[i] * m[j] * m[k] * psi;
    }
    for (let i = 0; i < n; i++) {
      const zi = z[i];
      lnGamma[i] += zi * zi * F + (zi < 0 ? -zi : zi) * cc;
    }
    return 2 * osm;
  }
}

/** Models compiled so far, by ion list (at most 256): preparing many mixtures of the same ions compiles once. */
const compiled = new Map<string, PitzerModel>();

/** The PitzerModel for these ions (shared: evaluate() keeps no state between calls that callers rely on). */
export function pitzerModelFor(names: readonly string[], charges: readonly number[]): PitzerModel {
  const key = names.map((n, i) => `${n}:${charges[i]}`).join(",");
  let model = compiled.get(key);
  if (model === undefined) {
    model = new PitzerModel(names, charges);
    if (compiled.size < 256) compiled.set(key, model);
  }
  return model;
}
