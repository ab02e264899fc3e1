/** pKw(T) against the CRC table and the IAPWS check value. */
import { pKw, kw, pKwIapws2006, pKwMarshallFranck, waterDensity } from "../../src/chem";
import { expectAbs, expectRel } from "./fixtures";

// CRC Handbook, "Ionization constant of normal and heavy water", after Marshall & Franck,
// J. Phys. Chem. Ref. Data 10, 295 (1981) (REFERENCES §2, status V). Saturated vapour pressure.
const CRC: [number, number][] = [
  [0, 14.938], [5, 14.727], [10, 14.528], [15, 14.34], [20, 14.163], [25, 13.995], [30, 13.836],
  [35, 13.685], [40, 13.542], [45, 13.405], [50, 13.275], [60, 13.034], [80, 12.613], [100, 12.265],
];

describe("pKw(T), Marshall & Franck (1981) at saturated-liquid density", () => {
  // ±0.001: the table is printed to 0.001 (±0.0005 rounding) and the density equation is not the
  // one the table was computed with (another ±0.0005 at most).
  test.each(CRC)("%s °C: CRC table %s", (t, expected) => {
    expectAbs(pKw(t), expected, 0.001, `pKw(${t} °C)`);
  });

  test("kw is 10^−pKw", () => {
    expectRel(kw(37), Math.pow(10, -pKw(37)), 1e-14, "kw(37 °C)");
  });
});

describe("IAPWS R11-07 (Bandura & Lvov, J. Phys. Chem. Ref. Data 35, 15 (2006))", () => {
  test("check value: ρ = 1000 kg/m³, T = 300 K → pKw 13.906565 (REFERENCES §2, V)", () => {
    // ±1e-6: the release prints 6 decimals.
    expectAbs(pKwIapws2006(300, 1.0), 13.906565, 1e-6, "pKwIapws2006(300 K, 1 g/cm³)");
  });

  // ±0.02: the 2006 formulation rests on newer data and departs from the 1981 table by up to 0.015
  // at 60–100 °C (0.009 at 0 °C); this bounds that known difference, it does not claim agreement.
  test.each(CRC)("%s °C: within 0.02 of the CRC table %s", (t, expected) => {
    const T = t + 273.15;
    expectAbs(pKwIapws2006(T, waterDensity(T)), expected, 0.02, `IAPWS pKw(${t} °C)`);
  });

  test("the two formulations agree at 25 °C within 0.001 (both fitted to the same 25 °C data)", () => {
    const T = 298.15;
    expectAbs(pKwIapws2006(T, waterDensity(T)), pKwMarshallFranck(T, waterDensity(T)), 0.001, "IAPWS vs M&F at 25 °C");
  });
});
