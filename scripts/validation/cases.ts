/**
 * The validation cases: the published reference cases of test/reference/*.json (one home for each
 * value, its source, locator and tolerance with its reason), each turned into the formula a user
 * would type, and the identity sheets below. Read by scripts/validate.ts (the report for QA) and
 * test/docs/validation.test.ts.
 *
 * Sources: docs/references.md (status V or X only; values marked M there are never oracles). Compositions tabulated in mol/kg are typed as mol/L: at these
 * dilutions the two scales differ by less than 0.3 %, below 0.001 pH.
 *
 * A case that exceeds its tolerance for a documented reason carries `knownDeviation`: it is listed
 * in the report with the reason and checked to stay within `bound` (a change that fixes or worsens
 * it is noticed); it is never skipped silently.
 */

import { casesOf, referenceTable, type ReferenceCase, type ReferenceTable, type Tolerance } from "../../test/reference";

export type { Tolerance };

export interface SheetCheck {
  /** Rows of cells as typed (numbers, text, formulas starting with "="). */
  rows: (string | number | null)[][];
  /** A1 address of the cell whose value is checked. */
  cell: string;
}

export interface ValidationCase {
  id: string;
  group: string;
  /** Published source, with its locator (table, equation, entry). */
  source: string;
  conditions: string;
  /** What is evaluated: an AQ formula, a small sheet (identities), or an engine value (pKw only). */
  formula?: string;
  sheet?: SheetCheck;
  engine?: { fn: "pKw"; temperatureC: number };
  expected: number;
  /** The expected value as the source prints it (trailing zeros kept), when it differs from String(expected). */
  printed?: string;
  /** The equation the expected value was computed from, when the source gives an equation. */
  expectedFrom?: string;
  /**
   * docs/references.md status of the value: "V" seen in the published source (or a faithful copy), "X"
   * cross-checked against an independent measurement or compilation. Values marked "M" (from
   * memory) are never used here. "identity": a relation that must hold by definition.
   */
  status: "V" | "X" | "identity";
  unit: string;
  tolerance: Tolerance;
  knownDeviation?: { reason: string; bound: number };
}

// ---- published reference cases: test/reference/*.json (one home; docs/references.md) --------------

const T_IDENTITY: Tolerance = {
  value: 1e-9,
  reason: "ADJUST refines the amount until |pH − target| ≤ 1e-11; 1e-9 leaves room for rounding as the amount passes through the cells",
};
const T_IDENTITY_RECIPE: Tolerance = {
  value: 1e-9,
  reason: "RECIPE refines the composition until |pH − target| ≤ 1e-11 (and the salt until |I − I*| ≤ 1e-12·I*); 1e-9 leaves room for rounding as the amount passes through the cells",
};

/** Each reference table, in the report's order, with its group heading. */
const GROUPS: [string, string][] = [
  ["1. Primary pH standards at 25 °C", "ph-standards@25"],
  ["2. Primary pH standards at other temperatures", "ph-standards@other"],
  ["2. Primary pH standards at other temperatures", "hetzer-khp"],
  ["2. Primary pH standards at other temperatures", "jis-ph-standards"],
  ["3. European Pharmacopoeia reference buffer solutions", "ph-eur-buffers"],
  ["4. Buffer values of standards", "lange-beta"],
  ["5. Ionization constant of water", "crc-pkw"],
  ["6. pKa at other temperatures (I = 0)", "tris-pk"],
  ["6. pKa at other temperatures (I = 0)", "phosphate-pk2"],
  ["6. pKa at other temperatures (I = 0)", "bistris-pk"],
  ["6. pKa at other temperatures (I = 0)", "aces-pk"],
  ["6. pKa at other temperatures (I = 0)", "ches-pk"],
  ["6. pKa at other temperatures (I = 0)", "mopso-pk"],
  ["6. pKa at other temperatures (I = 0)", "caps-pk"],
  ["6. pKa at other temperatures (I = 0)", "carbonate-pk1"],
  ["6. pKa at other temperatures (I = 0)", "carbonate-pk2"],
  ["6. pKa at other temperatures (I = 0)", "goods-buffers-37"],
  ["6. pKa at other temperatures (I = 0)", "roy-1997-mes-tes"],
  ["6. pKa at other temperatures (I = 0)", "new-systems-pk"],
  ["7. Molar masses", "molar-masses"],
  ["8. Preparation tables (mixtures of stocks)", "sorensen-phosphate"],
  ["8. Preparation tables (mixtures of stocks)", "khp-hcl"],
  ["8. Preparation tables (mixtures of stocks)", "lange-table-8-16-beta"],
  ["8. Preparation tables (mixtures of stocks)", "acetate"],
];

function formulaOf(t: ReferenceTable, c: ReferenceCase): Pick<ValidationCase, "formula" | "engine"> {
  const names = (c.mixture ?? []).map(([n]) => `"${n}"`);
  const amounts = (c.mixture ?? []).map(([, a]) => a);
  switch (t.quantity) {
    case "pH":
      return { formula: `=AQ.PH(${arrayOf(names)},${arrayOf(amounts)}${c.temperatureC === 25 && !t.equation && t.id !== "ph-eur-buffers" ? "" : `,${c.temperatureC}`})` };
    case "beta":
      return { formula: `=AQ.BETA(${arrayOf(names)},${arrayOf(amounts)})` };
    case "pKw":
      return { engine: { fn: "pKw", temperatureC: c.temperatureC ?? 25 } };
    case "pK":
      return { formula: `=AQ.PKA("${c.system}",${c.step},${c.temperatureC},0)` };
    case "molar-mass":
      return { formula: `=AQ.MOLARMASS("${c.substance}")${c.factor === 1 ? "" : `*${c.factor}`}` };
    default:
      throw new Error(`${t.id}: the validation report has no formula for a ${t.quantity} case (add one here, or leave the table out of GROUPS)`);
  }
}

function conditionsOf(t: ReferenceTable, c: ReferenceCase): string {
  switch (t.quantity) {
    case "pH": {
      const conc = t.id === "sorensen-phosphate" || t.id === "khp-hcl" || t.id === "acetate" ? ` → ${(c.mixture ?? []).map(([, a]) => a).join(" + ")} mol/L` : "";
      return `${c.label}${conc}, ${c.temperatureC} °C, Davies`;
    }
    case "beta":
      return `${c.label}, ${c.temperatureC} °C, Davies, β = dC(NaOH)/dpH`;
    case "pKw":
      return `pure water, ${c.temperatureC} °C, saturated vapour pressure, molality scale`;
    case "pK":
      return `${t.conditions.replace(/, I = 0$/, "")}, ${c.temperatureC} °C, I = 0`;
    case "molar-mass":
      return c.label ?? c.substance ?? "";
    default:
      return c.label ?? "";
  }
}

function casesOfGroup(group: string, key: string): ValidationCase[] {
  const [id, part] = key.split("@");
  const t = referenceTable(id);
  return casesOf(id)
    .filter((c) => part === undefined || (part === "25" ? c.temperatureC === 25 : c.temperatureC !== 25))
    .map((c) => ({
      id: c.id,
      group,
      source: `${c.source ?? t.source}, ${t.locator}`,
      conditions: conditionsOf(t, c),
      ...formulaOf(t, c),
      expected: c.expected,
      printed: t.equation ? undefined : c.printed,
      expectedFrom: t.equation ? `${t.equation.text}${printedNote(t)}` : undefined,
      status: c.status ?? t.status,
      unit: c.unit ?? t.unit,
      tolerance: c.tolerance,
      knownDeviation: c.knownDeviation,
    }));
}

function printedNote(t: ReferenceTable): string {
  const printed = t.cases.filter((c) => c.printed !== undefined).map((c) => `${c.printed} at ${c.temperatureC} °C`);
  return printed.length > 0 ? ` (printed check values ${printed.join(", ")})` : "";
}

// ---- 8. identities: the workflow functions fed back through AQ.PH ------------------------------------

/** Identity checks, as small sheets a user could type: a workflow function's result fed back through AQ.PH or AQ.IONIC. */
export const IDENTITY_CASES: ValidationCase[] = [
  {
    id: "ID-ADJUST-PER-LITRE",
    group: "9. Identities (results fed back through AQ.PH)",
    source: "definition of AQ.ADJUST: the titrant it returns, added to the mixture, gives the target pH",
    conditions: "acetic acid 0.05 + sodium acetate 0.05 mol/L, target pH 5.00, NaOH per litre, 25 °C",
    sheet: {
      rows: [
        ["acetic acid", 0.05, '=AQ.ADJUST(A1:A2,B1:B2,5,"NaOH")'],
        ["sodium acetate", 0.05, "=AQ.PH(A1:A3,B1:B3)"],
        ["NaOH", "=C1", null],
      ],
      cell: "C2",
    },
    expected: 5,
    status: "identity",
    unit: "pH",
    tolerance: T_IDENTITY,
  },
  {
    id: "ID-ADJUST-STOCK",
    group: "9. Identities (results fed back through AQ.PH)",
    source: "definition of AQ.ADJUST with a stock: the litres it returns, mixed into the batch, give the target pH (dilution included)",
    conditions: "acetic acid 0.05 + sodium acetate 0.05 mol/L, 800 L batch, 1 M NaOH stock, target pH 5.00, 25 °C",
    sheet: {
      rows: [
        ["acetic acid", 0.05, '=AQ.ADJUST(A1:A2,B1:B2,5,"NaOH",1,800)', "=B1*800/(800+C1)"],
        ["sodium acetate", 0.05, "=AQ.PH(A1:A3,D1:D3)", "=B2*800/(800+C1)"],
        ["NaOH", 1, null, "=B3*C1/(800+C1)"],
      ],
      cell: "C2",
    },
    expected: 5,
    status: "identity",
    unit: "pH",
    tolerance: T_IDENTITY,
  },
];

const RECIPE_SALT_SHEET: SheetCheck["rows"] = [
  ['=AQ.RECIPE("NaH2PO4·2H2O","Na2HPO4·7H2O",7,0.02,500,25,0.15)', null, null, null, "mol/L"],
  [null, null, null, null, "=B2/500"],
  [null, null, null, null, "=B3/500"],
  [null, null, null, null, "=B4/500"],
  ["pH", "=AQ.PH(A2:A4,E2:E4,25)", "ionic strength", "=AQ.IONIC(A2:A4,E2:E4,25)", null],
];

IDENTITY_CASES.push(
  {
    id: "ID-RECIPE-PAIR",
    group: "9. Identities (results fed back through AQ.PH)",
    source: "definition of AQ.RECIPE: the amounts it lists, made up to the batch volume, give the target pH at the stated temperature",
    conditions: "histidine HCl monohydrate + L-histidine, 20 mM total, 1 L, target pH 6.00 at 5 °C",
    sheet: {
      rows: [
        ['=AQ.RECIPE("histidine HCl monohydrate","L-histidine",6,0.02,1,5)', null, null, null, "mol/L"],
        [null, null, null, null, "=B2/1"],
        [null, null, null, null, "=B3/1"],
        ["pH at 5 °C", "=AQ.PH(A2:A3,E2:E3,5)", null, null, null],
      ],
      cell: "B4",
    },
    expected: 6,
    status: "identity",
    unit: "pH",
    tolerance: T_IDENTITY_RECIPE,
  },
  {
    id: "ID-RECIPE-SALT-PH",
    group: "9. Identities (results fed back through AQ.PH)",
    source: "definition of AQ.RECIPE with a target ionic strength: the amounts it lists give the target pH",
    conditions: "NaH₂PO₄·2H₂O + Na₂HPO₄·7H₂O, 20 mM total, 500 L, target pH 7.00 at 25 °C, I = 0.15 mol/L with NaCl",
    sheet: { rows: RECIPE_SALT_SHEET, cell: "B5" },
    expected: 7,
    status: "identity",
    unit: "pH",
    tolerance: T_IDENTITY_RECIPE,
  },
  {
    id: "ID-RECIPE-SALT-I",
    group: "9. Identities (results fed back through AQ.PH)",
    source: "definition of AQ.RECIPE with a target ionic strength: the amounts it lists give the target ionic strength (AQ.IONIC)",
    conditions: "NaH₂PO₄·2H₂O + Na₂HPO₄·7H₂O, 20 mM total, 500 L, target pH 7.00 at 25 °C, I = 0.15 mol/L with NaCl",
    sheet: { rows: RECIPE_SALT_SHEET, cell: "D5" },
    expected: 0.15,
    status: "identity",
    unit: "mol/L",
    tolerance: T_IDENTITY_RECIPE,
  },
  {
    id: "ID-RECIPE-TITRANT",
    group: "9. Identities (results fed back through AQ.PH)",
    source: "definition of AQ.RECIPE with a titrant stock: the form and the litres of stock it lists give the target pH",
    conditions: "Tris base + 1 M hydrochloric acid, 50 mM Tris, 1 L, target pH 7.50 at 25 °C",
    sheet: {
      rows: [
        ['=AQ.RECIPE("Tris","HCl 1 M",7.5,0.05,1)', null, null, null, "mol/L"],
        [null, null, null, null, "=B2/1"],
        [null, null, null, null, "=D3*1/1"],
        ["pH", "=AQ.PH(A2:A3,E2:E3)", null, null, null],
      ],
      cell: "B4",
    },
    expected: 7.5,
    status: "identity",
    unit: "pH",
    tolerance: T_IDENTITY_RECIPE,
  },
);

IDENTITY_CASES.push({
  id: "ID-UNITS-SALINE",
  group: "9. Identities (results fed back through AQ.PH)",
  source:
    "definition of unit text: 0.9 % w/v is 0.9 g per 100 mL (common practice), 9 g/L, so it must give the same osmolarity as 9 g/L divided by the library's molar mass of NaCl (CIAAW atomic weights)",
  conditions: "normal saline, NaCl 0.9 % w/v, 25 °C; the difference of the two cells",
  sheet: {
    rows: [
      ['=AQ.OSMOLARITY("NaCl","0.9 % w/v")'],
      ['=AQ.OSMOLARITY("NaCl",9/AQ.MOLARMASS("NaCl"))'],
      ["=A1-A2"],
    ],
    cell: "A3",
  },
  expected: 0,
  status: "identity",
  unit: "osmol/L",
  tolerance: { value: 1e-12, reason: "the same number reached by two routes: a difference of rounding only" },
});

export const CASES: ValidationCase[] = [...GROUPS.flatMap(([group, key]) => casesOfGroup(group, key)), ...IDENTITY_CASES];

// ---- helpers ----------------------------------------------------------------------------------------

function arrayOf(items: (string | number)[]): string {
  return items.length === 1 ? String(items[0]) : `{${items.join(";")}}`;
}

