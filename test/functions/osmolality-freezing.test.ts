/**
 * AQ.OSMOLALITY through the spreadsheet engine against a published freezing-point table
 * (test/reference/crc-freezing-point-electrolytes.json; docs/references.md, section 11): the salt at
 * the tabulated molality, 0 °C, ΔT = Kf·Osm; and a sucrose solution's freezing point (sucrose-freezing-point.json). Rows beyond the tolerance are known deviations of the
 * Davies model, asserted to stay within their bound.
 */
import { evaluateFormula } from "../../src/cli/evaluate";
import data from "../../src/chem/data/osmotic.json";
import { waterDensity } from "../../src/chem/water-density";
import { casesOf } from "../reference";

/** Cryoscopic constant of water, K·kg/mol: R·Tf²·M/ΔfusH (ΔfusH = 6.0095 kJ/mol at 0 °C, common practice). */
const KF = (8.314462618 * 273.15 ** 2 * 0.018015) / 6009.5;

const VOLUME: Record<string, number> = {
  NaCl: data.substances["sodium-chloride"].volume.value,
  KCl: data.substances["potassium-chloride"].volume.value,
  sucrose: data.substances.sucrose.volume.value,
};

/** mol/L giving `molality` mol/kg, with the water mass AQ.OSMOLALITY uses: w = ρw(T)·(1 − c·V). */
function molarFromMolal(salt: string, molality: number): number {
  let c = molality;
  for (let i = 0; i < 20; i++) c = molality * waterDensity(273.15) * (1 - (c * VOLUME[salt]) / 1000);
  return c;
}

describe("AQ.OSMOLALITY against the CRC freezing-point table (0 °C)", () => {
  test("Kf from the enthalpy of fusion is the textbook 1.86 K·kg/mol", () => {
    expect(Math.abs(KF - 1.86)).toBeLessThan(0.001);
  });

  // the salts of the CRC table, and sucrose (test/reference/sucrose-freezing-point.json), whose φ above 1 it checks
  const cases = [...casesOf("crc-freezing-point-electrolytes"), ...casesOf("sucrose-freezing-point")];
  test.each(cases.map((c) => [c.id, c] as const))("%s", (_id, c) => {
    const [salt, molality] = c.mixture![0];
    const r = evaluateFormula(`=AQ.OSMOLALITY("${salt}",${molarFromMolal(salt, molality)},0)`);
    if (typeof r.value !== "number") throw new Error(`${c.id}: ${r.error} ${r.message}`);
    const dT = KF * r.value;
    const off = Math.abs(dT - c.expected);
    const where = `${c.label}: ΔT ${dT.toFixed(4)} K against ${c.printed} K`;
    if (c.knownDeviation) {
      expect({ where, beyondTolerance: off > c.tolerance.value, withinBound: off <= c.knownDeviation.bound }).toEqual({ where, beyondTolerance: true, withinBound: true });
    } else {
      expect({ where, within: off <= c.tolerance.value }).toEqual({ where, within: true });
    }
  });
});
