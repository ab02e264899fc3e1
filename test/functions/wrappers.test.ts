/**
 * The AQ functions called exactly as Excel calls them: ranges as rows of columns (even one cell),
 * omitted optional arguments as null, empty cells as "" — through the CustomFunctions stand-in that
 * jest installs. Checks argument handling and error mapping; the chemistry itself is tested against
 * published values in test/chem and through the spreadsheet engine in test/cli and test/docs.
 */
import { AQ } from "../support/aq-values";
import { CATALOGUE } from "../../src/functions/catalogue";
import { referenceCase } from "../reference";

function errorOf(call: () => unknown): { code: string; message: string } {
  try {
    call();
  } catch (e) {
    expect(e).toBeInstanceOf(CustomFunctions.Error);
    const err = e as CustomFunctions.Error;
    return { code: err.code, message: err.message ?? "" };
  }
  throw new Error("expected the call to fail");
}

const KHP = [["potassium hydrogen phthalate"]];

describe("argument shapes as Excel passes them", () => {
  test("omitted optionals arrive as null and take the documented defaults (25 °C, Davies)", () => {
    const withNulls = AQ.PH(KHP, [[0.05]], null, null as unknown as string);
    const explicit = AQ.PH(KHP, [[0.05]], 25, "davies");
    expect(withNulls).toBe(explicit);
    // Hamer, Pinching & Acree (1946): 0.05 mol/kg KHP, pH(S) at 25 °C, with its tolerance (test/reference/ph-standards.json).
    const khp = referenceCase("ph-standards", "STD25-KHP");
    expect(Math.abs(withNulls - khp.expected)).toBeLessThanOrEqual(khp.tolerance.value);
  });

  test("blank rows in both ranges are skipped, in columns or rows", () => {
    const column = AQ.PH([["KH2PO4"], [""], ["Na2HPO4"]], [[0.025], [""], [0.025]]);
    const row = AQ.PH([["KH2PO4", "", "Na2HPO4"]], [[0.025, "", 0.025]]);
    const compact = AQ.PH([["KH2PO4"], ["Na2HPO4"]], [[0.025], [0.025]]);
    expect(column).toBe(compact);
    expect(row).toBe(compact);
  });

  test("a blank amount read as 0 (number ranges) beside a blank name is skipped too", () => {
    expect(AQ.PH([["KH2PO4"], [""]], [[0.05], [0]])).toBe(AQ.PH([["KH2PO4"]], [[0.05]]));
  });

  test("unit text and numbers give the same result; temperature as unit text", () => {
    const a = AQ.PH([["Tris"], ["Tris HCl"]], [["50 mM"], ["50 mmol/L"]], "37 degC");
    const b = AQ.PH([["Tris"], ["Tris HCl"]], [[0.05], [0.05]], 37);
    expect(a).toBe(b);
  });

  test("mass units take the molar mass from the library: 0.9 % w/v saline = 9 g/L NaCl", () => {
    // NaCl 58.43977 g/mol from CIAAW standard atomic weights (Na 22.98976928, Cl 35.45 abridged);
    // 1 % w/v = 1 g per 100 mL (common practice). Ionic strength of a 1:1 salt = its molarity.
    const ionic = AQ.IONIC([["NaCl"]], [["0.9 % w/v"]], null);
    expect(ionic).toBeCloseTo(9 / (22.98976928 + 35.45), 5);
    expect(AQ.IONIC([["NaCl"]], [["9 g/L"]], null)).toBe(ionic);
    expect(AQ.IONIC([["NaCl"]], [["9 mg/mL"]], null)).toBe(ionic);
  });

  test("names are case- and spacing-insensitive", () => {
    expect(AQ.PH([["  tris   hcl "]], [[0.01]])).toBe(AQ.PH([["Tris HCl"]], [[0.01]]));
  });
});

describe("errors are spreadsheet error values with a message", () => {
  test.each([
    ["unknown name, with suggestions", () => AQ.PH([["sodium acetat"]], [[0.1]]), /Unknown substance 'sodium acetat'.*sodium acetate/],
    ["mismatched ranges", () => AQ.PH([["KH2PO4"], ["Na2HPO4"]], [[0.025]]), /2×1.*1×1/],
    ["negative amount", () => AQ.PH([["NaCl"]], [[-0.1]]), /negative/],
    ["text that is not a quantity", () => AQ.PH([["NaCl"]], [["lots"]]), /amount of 'NaCl'/],
    ["amount without a name", () => AQ.PH([["NaCl"], [""]], [[0.1], [0.2]]), /no substance name/],
    ["name without an amount", () => AQ.PH([["NaCl"], ["KCl"]], [[0.1], [""]]), /no amount for 'KCl'/],
    ["empty mixture", () => AQ.PH([[""]], [[""]]), /empty/],
    ["temperature out of range", () => AQ.PH([["NaCl"]], [[0.1]], 120), /outside 0–100 °C/],
    ["unknown activity model", () => AQ.PH([["NaCl"]], [[0.1]], null, "bromley"), /The activity model "bromley" is not known: use "davies", "ideal", "debye-huckel" or "pitzer"/],
    ["PKA step that does not exist", () => AQ.PKA("phosphate", 4), /step 4 does not exist/],
    ["PKA of a polyprotic system without a step", () => AQ.PKA("citric acid", null as unknown as number), /give step 1 to 3/],
    ["MOLARMASS of an unknown form", () => AQ.MOLARMASS("unobtainium"), /Unknown substance/],
    // A concentration typed into a name: the message names the substance and says to give the name alone.
    ["a mass fraction typed into a name", () => AQ.PH([["HCl 37 % w/w"], ["Tris base"]], [[0.01], [0.05]]), /'HCl 37 % w\/w' is hydrochloric acid with a concentration: give the name alone/],
    ["a stock concentration typed into a name", () => AQ.PH([["1 M NaOH"]], [[0.01]]), /'1 M NaOH' is sodium hydroxide with a concentration: give the name alone/],
  ])("%s → #VALUE!", (_what, call, message) => {
    const err = errorOf(call);
    expect(err.code).toBe("#VALUE!");
    expect(err.message).toMatch(message);
    expect(err.message.length).toBeLessThanOrEqual(250);
    expect(err.message).not.toMatch(/\n/);
  });

  test("a species not in the mixture → #N/A listing the species it has", () => {
    const err = errorOf(() => AQ.SPECIES([["acetic acid"]], [[0.1]], "NH4+"));
    expect(err.code).toBe("#N/A");
    expect(err.message).toMatch(/species .NH4\+. is not in this mixture; it has: H\+, OH-/);
  });

  test("a target the titrant cannot reach → #N/A saying which way it goes", () => {
    const err = errorOf(() => AQ.ADJUST([["acetic acid"], ["sodium acetate"]], [[0.05], [0.05]], 4, "NaOH"));
    expect(err.code).toBe("#N/A");
    expect(err.message).toMatch(/raises the pH/);
  });
});

describe("results", () => {
  test("every scalar function returns a finite number or text; every table a rectangular matrix", () => {
    const mix: [unknown[][], unknown[][]] = [[["KH2PO4"], ["Na2HPO4"]], [[0.025], [0.025]]];
    const calls: Record<string, () => unknown> = {
      PH: () => AQ.PH(...mix),
      BETA: () => AQ.BETA(...mix),
      CHECK: () => AQ.CHECK(...mix),
      IONIC: () => AQ.IONIC(...mix),
      OSMOLARITY: () => AQ.OSMOLARITY(...mix),
      OSMOLALITY: () => AQ.OSMOLALITY(...mix),
      SPECIES: () => AQ.SPECIES(...mix),
      PKA: () => AQ.PKA("phosphate", 2),
      MOLARMASS: () => AQ.MOLARMASS("Na2HPO4·7H2O"),
      CONSTANTS_ID: () => AQ.CONSTANTS_ID(),
      ADJUST: () => AQ.ADJUST(...mix, 7.2, "NaOH"),
      CAPACITY: () => AQ.CAPACITY(...mix, 0.1),
      RECIPE: () => AQ.RECIPE("KH2PO4", "Na2HPO4", 6.865, 0.05, 1),
      CURVE: () => AQ.CURVE(...mix, "NaOH", 0.1, 0.1, 0.03, 7),
      PHRANGE: () => AQ.PHRANGE(...mix, 0.02),
    };
    expect(Object.keys(calls).sort()).toEqual(CATALOGUE.map((c) => c.id).sort());
    for (const entry of CATALOGUE) {
      const value = calls[entry.id]!();
      if (entry.result !== "matrix") { // "column": one mixture gives one value (a 1×1 table, unwrapped by support/aq-values)
        expect({ id: entry.id, ok: (typeof value === "number" && Number.isFinite(value)) || typeof value === "string" }).toEqual({ id: entry.id, ok: true });
      } else {
        const rows = value as unknown[][];
        const width = rows[0]!.length;
        for (const row of rows) expect({ id: entry.id, width: row.length }).toEqual({ id: entry.id, width });
        for (const cell of rows.flat()) {
          expect({ id: entry.id, ok: (typeof cell === "number" && Number.isFinite(cell)) || typeof cell === "string" }).toEqual({ id: entry.id, ok: true });
        }
      }
    }
  });

  test("MOLARMASS matches the CIAAW-based spot check for Na2HPO4·7H2O (test/reference/molar-masses.json)", () => {
    const c = referenceCase("molar-masses", "MM-NA2HPO4-7H2O");
    expect(Math.abs(AQ.MOLARMASS(c.substance!) - c.expected)).toBeLessThanOrEqual(c.tolerance.value);
  });

  test("CONSTANTS_ID is the library version and fingerprint", () => {
    expect(AQ.CONSTANTS_ID()).toMatch(/^PL-\d+\.\d+\.\d+-[0-9a-f]{8,12}$/);
  });
});
