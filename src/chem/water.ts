/**
 * Ionization constant of water, Kw = a(H⁺)·a(OH⁻), as a function of temperature.
 *
 * Formula (engine default): Marshall & Franck, "Ion product of water substance, 0–1000 °C, 1–10,000
 * bars. New international formulation and its background", J. Phys. Chem. Ref. Data 10, 295 (1981),
 * eq. 4:  log10 Kw = A + B/T + C/T² + D/T³ + (E + F/T + G/T²)·log10 ρ,
 * A = −4.098, B = −3245.2 K, C = 2.2362e5 K², D = −3.984e7 K³, E = 13.957, F = −1262.3 K, G = 8.5641e5 K²,
 * ρ in g/cm³ (here the saturated-liquid density, water-density.ts), Kw in (mol/kg)².
 * This is the equation behind the CRC Handbook table "Ionization constant of normal and heavy water";
 * it reproduces that table within 0.0005 over 0–100 °C (test/chem/water.test.ts).
 *
 * Alternative (exported for comparison): IAPWS R11-07, Bandura & Lvov, "The ionization constant of
 * water over wide ranges of temperature and density", J. Phys. Chem. Ref. Data 35, 15 (2006), eq. 3.
 * It rests on newer data and departs from the 1981 formulation by up to 0.015 in pKw at 60–100 °C
 * (test/chem/water.test.ts prints the difference). The engine keeps Marshall–Franck so that its pKw
 * is the one in the handbook tables users check against.
 *
 * Notes: molality scale; the engine uses it on the molarity scale (≤ 0.3 % apart at 0–100 °C for
 * dilute solutions, < 0.002 in pKw).
 */
import { ZERO_CELSIUS_K } from "./physical-constants";
import { waterDensity } from "./water-density";

/** pKw by Marshall & Franck (1981) at temperature T (K) and water density ρ (g/cm³). */
export function pKwMarshallFranck(temperatureK: number, density: number): number {
  const T = temperatureK;
  const logKw =
    -4.098 -
    3245.2 / T +
    2.2362e5 / (T * T) -
    3.984e7 / (T * T * T) +
    (13.957 - 1262.3 / T + 8.5641e5 / (T * T)) * Math.log10(density);
  return -logKw;
}

/** pKw by IAPWS R11-07 (Bandura & Lvov 2006) at temperature T (K) and water density ρ (g/cm³). */
export function pKwIapws2006(temperatureK: number, density: number): number {
  const T = temperatureK;
  const rho = density;
  const n = 6;
  const a0 = -0.864671;
  const a1 = 8659.19;
  const a2 = -22786.2;
  const b0 = 0.642044;
  const b1 = -56.8534;
  const b2 = -0.375754;
  const molarMassWater = 18.015268; // g/mol
  const z = rho * Math.exp(a0 + a1 / T + (a2 / (T * T)) * Math.pow(rho, 2 / 3));
  const pKwGas = 0.61415 + 48251.33 / T - 67707.93 / (T * T) + 10102100 / (T * T * T);
  return (
    -2 * n * (Math.log10(1 + z) - (z / (z + 1)) * rho * (b0 + b1 / T + b2 * rho)) +
    pKwGas +
    2 * Math.log10(molarMassWater / 1000)
  );
}

let cachedT = NaN;
let cachedPKw = NaN;

/** pKw of liquid water at saturation pressure, temperature in °C (0–100), Marshall & Franck (1981). */
export function pKw(temperatureC: number): number {
  if (temperatureC === cachedT) return cachedPKw;
  const T = temperatureC + ZERO_CELSIUS_K;
  const value = pKwMarshallFranck(T, waterDensity(T));
  cachedT = temperatureC;
  cachedPKw = value;
  return value;
}

/** Kw = 10^−pKw, (mol/L)², temperature in °C. */
export function kw(temperatureC: number): number {
  return Math.pow(10, -pKw(temperatureC));
}
