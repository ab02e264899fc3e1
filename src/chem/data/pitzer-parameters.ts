/**
 * Pitzer interaction parameters at 25 °C, molality basis, every value with its source and status.
 *
 * Why a typed module here and not the constants library: the library's schema and the pane's
 * provenance view are another helper's work in this round; these numbers have the same shape of
 * provenance (source, locator, status) so that moving them into src/library later is mechanical.
 *
 * Status words (as in docs/references.md): "published" — seen in the publication named (for the
 * phosphate–chloride mixing terms, its abstract; for θ, ψ of K⁺ with Na⁺, the table of a later paper);
 * "memory" — from memory, unverified:
 * the primary publication is named, its table was not seen here (flagged in the pane and by AQ.CHECK).
 * No value here rests on an existing program or its parameter files.
 *
 * Conventions (Pitzer, Activity Coefficients in Electrolyte Solutions, 2nd ed., CRC 1991, ch. 3):
 * binary parameters β0, β1 (α1 = 2.0 (kg/mol)^½), β2 (α2 = 12, used by no pair here), and Cφ; Pitzer
 * & Mayorga print 2:1 and 3:1 salts with factors (4/3)β, (2^{5/2}/3)Cφ and (3/2)β, (3^{3/2}/2)Cφ:
 * the values below are the parameters themselves, the printed numbers divided by those factors.
 * θ (like-charged pairs) and ψ (triplets): a pair or triplet not listed has θ = 0 or ψ = 0 (as in
 * Harvie, Møller & Weare's model: unknown mixing terms are set to zero); the unsymmetrical-mixing term Eθ is always computed.
 */

export type ParameterStatus = "published" | "memory";

export interface Provenance {
  source: string;
  status: ParameterStatus;
  note?: string;
}

export interface BinaryParameters extends Provenance {
  cation: string;
  anion: string;
  beta0: number;
  beta1: number;
  beta2?: number;
  cphi: number;
}

export interface MixingParameter extends Provenance {
  /** Two like-charged ions (θ) or two like-charged ions and one of the other sign (ψ). */
  ions: readonly string[];
  value: number;
}

const PM73_I = "Pitzer & Mayorga, J. Phys. Chem. 77, 2300 (1973), Table I (1:1 electrolytes)";
const PM73_VI = "Pitzer & Mayorga, J. Phys. Chem. 77, 2300 (1973), Table VI (2:1 and 1:2), printed (4/3)β and (2^{5/2}/3)Cφ converted";
const PM73_VIII = "Pitzer & Mayorga, J. Phys. Chem. 77, 2300 (1973), Table VIII (3:1 and 1:3), printed (3/2)β and (3^{3/2}/2)Cφ converted";
const HMW84 = "Harvie, Møller & Weare, Geochim. Cosmochim. Acta 48, 723 (1984), Tables 1–2";
const NOT_SEEN = "from memory, unverified (the primary table was not seen here)";
const GT05 =
  "Geochem. Trans. 6, 19 (2005) (deliquescence of NaCl–NaNO3, KNO3–NaNO3 and NaCl–KNO3 mixtures), Table I, coefficient a1 of the 25 °C-centred temperature equation, after its ref. 10; that reference itself not seen";
const HFM89 =
  "Hershey, Fernandez & Millero, \"The dissociation of phosphoric acid in NaCl and NaMgCl solutions at 25 °C\", J. Solution Chem. 18, 875 (1989), abstract (fitted to pK1*, pK2*, pK3* measured in 0.5–6 m NaCl)";

const t = (cation: string, anion: string, beta0: number, beta1: number, cphi: number, source: string): BinaryParameters => ({
  cation,
  anion,
  beta0,
  beta1,
  cphi,
  source,
  status: "memory",
  note: NOT_SEEN,
});

/** Cation–anion parameters. Printed values of Tables VI and VIII are converted here, with the printed number beside. */
export const BINARY: readonly BinaryParameters[] = [
  // 1:1, Pitzer & Mayorga Table I
  t("Na+", "Cl-", 0.0765, 0.2664, 0.00127, PM73_I),
  t("K+", "Cl-", 0.04835, 0.2122, -0.00084, PM73_I),
  t("H+", "Cl-", 0.1775, 0.2945, 0.0008, PM73_I),
  t("Na+", "OH-", 0.0864, 0.253, 0.0044, PM73_I),
  t("K+", "OH-", 0.1298, 0.32, 0.0041, PM73_I),
  t("Na+", "H2PO4-", -0.0533, 0.0396, 0.00795, PM73_I),
  t("K+", "H2PO4-", -0.0678, -0.1042, 0, PM73_I),
  t("Na+", "NO3-", 0.0068, 0.1783, -0.00072, PM73_I),
  t("K+", "NO3-", -0.0816, 0.0494, 0.0066, PM73_I),
  t("H+", "NO3-", 0.1119, 0.3206, 0.001, PM73_I),
  t("Li+", "Cl-", 0.1494, 0.3074, 0.00359, PM73_I),
  t("Li+", "OH-", 0.015, 0.14, 0, PM73_I),
  t("Li+", "NO3-", 0.142, 0.278, -0.00551, PM73_I),
  t("NH4+", "Cl-", 0.0522, 0.1918, -0.00301, PM73_I),
  // 1:2, Pitzer & Mayorga Table VI: printed (4/3)β0, (4/3)β1, (2^{5/2}/3)Cφ
  t("Na+", "HPO4-2", (-0.0777 * 3) / 4, (1.954 * 3) / 4, (0.0554 * 3) / 2 ** 2.5, PM73_VI),
  t("K+", "HPO4-2", (0.033 * 3) / 4, (1.699 * 3) / 4, (0.0309 * 3) / 2 ** 2.5, PM73_VI),
  t("Li+", "SO4-2", (0.1817 * 3) / 4, (1.694 * 3) / 4, (-0.00753 * 3) / 2 ** 2.5, PM73_VI),
  t("NH4+", "SO4-2", (0.0545 * 3) / 4, (0.878 * 3) / 4, (-0.00219 * 3) / 2 ** 2.5, PM73_VI),
  // 1:3, Pitzer & Mayorga Table VIII: printed (3/2)β0, (3/2)β1, (3^{3/2}/2)Cφ
  t("Na+", "PO4-3", (0.2672 * 2) / 3, (5.777 * 2) / 3, (-0.1339 * 2) / 3 ** 1.5, PM73_VIII),
  t("K+", "PO4-3", (0.5594 * 2) / 3, (5.958 * 2) / 3, (-0.2255 * 2) / 3 ** 1.5, PM73_VIII),
  // Harvie, Møller & Weare 1984, Table 1
  t("Na+", "SO4-2", 0.01958, 1.113, 0.00497, HMW84),
  t("K+", "SO4-2", 0.04995, 0.7793, 0, HMW84),
  t("Na+", "HSO4-", 0.0454, 0.398, 0, HMW84),
  t("K+", "HSO4-", -0.0003, 0.1735, 0, HMW84),
  t("H+", "SO4-2", 0.0298, 0, 0.0438, HMW84),
  t("H+", "HSO4-", 0.2065, 0.5556, 0, HMW84),
  t("Na+", "HCO3-", 0.0277, 0.0411, 0, HMW84),
  t("K+", "HCO3-", 0.0296, -0.013, -0.008, HMW84),
  t("Na+", "CO3-2", 0.0399, 1.389, 0.0044, HMW84),
  t("K+", "CO3-2", 0.1488, 1.43, -0.0015, HMW84),
  // Acetate: Pitzer & Mayorga Table I
  t("Na+", "CH3COO-", 0.1426, 0.3237, -0.00629, PM73_I),
  t("K+", "CH3COO-", 0.1587, 0.3251, -0.0066, PM73_I),
];

const th = (a: string, b: string, value: number, source: string, status: ParameterStatus = "memory"): MixingParameter => ({
  ions: [a, b],
  value,
  source,
  status,
  ...(status === "memory" ? { note: NOT_SEEN } : {}),
});
const ps = (a: string, b: string, c: string, value: number, source: string, status: ParameterStatus = "memory"): MixingParameter => ({
  ions: [a, b, c],
  value,
  source,
  status,
  ...(status === "memory" ? { note: NOT_SEEN } : {}),
});

/** θ of like-charged pairs (Harvie, Møller & Weare 1984, Table 2). Absent pairs: θ = 0. */
export const THETA: readonly MixingParameter[] = [
  th("H+", "Na+", 0.036, HMW84),
  // Harvie, Møller & Weare's own θ(K, Na) is recalled as −0.012 (not seen); the value of a table that was seen is used.
  th("K+", "Na+", -0.0032, GT05, "published"),
  th("H+", "K+", 0.005, HMW84),
  th("Cl-", "OH-", -0.05, HMW84),
  th("Cl-", "SO4-2", 0.02, HMW84),
  th("Cl-", "HSO4-", -0.006, HMW84),
  th("Cl-", "HCO3-", 0.03, HMW84),
  th("Cl-", "CO3-2", -0.02, HMW84),
  th("OH-", "SO4-2", -0.013, HMW84),
  th("HCO3-", "SO4-2", 0.01, HMW84),
  th("CO3-2", "SO4-2", 0.02, HMW84),
  th("CO3-2", "OH-", 0.1, HMW84),
  th("CO3-2", "HCO3-", -0.04, HMW84),
  th("Cl-", "HPO4-2", 0.105, HFM89, "published"),
  th("Cl-", "PO4-3", -0.59, HFM89, "published"),
];

/** ψ of triplets (Harvie, Møller & Weare 1984, Table 2). Absent triplets: ψ = 0. */
export const PSI: readonly MixingParameter[] = [
  ps("H+", "Na+", "Cl-", -0.004, HMW84),
  ps("H+", "Na+", "HSO4-", -0.0129, HMW84),
  // recalled from Harvie, Møller & Weare as −0.0018 (not seen); the seen table's value is used.
  ps("K+", "Na+", "Cl-", -0.00369, GT05, "published"),
  ps("H+", "K+", "Cl-", -0.011, HMW84),
  ps("Na+", "Cl-", "OH-", -0.006, HMW84),
  ps("K+", "Cl-", "OH-", -0.006, HMW84),
  ps("Na+", "Cl-", "SO4-2", 0.0014, HMW84),
  ps("Na+", "Cl-", "HSO4-", -0.006, HMW84),
  ps("H+", "Cl-", "HSO4-", 0.013, HMW84),
  ps("Na+", "Cl-", "HCO3-", -0.15, HMW84),
  ps("Na+", "CO3-2", "Cl-", 0.0085, HMW84),
  ps("K+", "CO3-2", "Cl-", 0.004, HMW84),
  ps("Na+", "HSO4-", "SO4-2", -0.0094, HMW84),
  ps("K+", "HSO4-", "SO4-2", -0.0677, HMW84),
  ps("Na+", "OH-", "SO4-2", -0.009, HMW84),
  ps("K+", "OH-", "SO4-2", -0.05, HMW84),
  ps("Na+", "HCO3-", "SO4-2", -0.005, HMW84),
  ps("Na+", "CO3-2", "SO4-2", -0.005, HMW84),
  ps("K+", "CO3-2", "SO4-2", -0.009, HMW84),
  ps("Na+", "CO3-2", "OH-", -0.017, HMW84),
  ps("K+", "CO3-2", "OH-", -0.01, HMW84),
  ps("Na+", "CO3-2", "HCO3-", 0.002, HMW84),
  ps("K+", "CO3-2", "HCO3-", 0.012, HMW84),
  // Hershey et al. (1989) also give ψ = 0.110 labelled "PO4NaClH", whose ions the abstract leaves unclear: not used.
  ps("Na+", "Cl-", "H2PO4-", -0.028, HFM89, "published"),
  ps("Na+", "Cl-", "HPO4-2", -0.003, HFM89, "published"),
];

/**
 * The fallback rule for ions without published parameters here: an ion listed below takes the
 * cation–anion parameters of its analogue, a phosphate anion of the same charge (not published for
 * these ions; a stated rule of this engine, reported as a warning). Analogue chosen for charge and
 * size class: citrate's anions are polyprotic oxyanions like phosphate's. Any other ion without
 * parameters takes the Davies γ (pitzer-iteration.ts).
 */
export const ANALOGUES: Readonly<Record<string, string>> = {
  "H2Cit-": "H2PO4-",
  "HCit-2": "HPO4-2",
  "Cit-3": "PO4-3",
};
