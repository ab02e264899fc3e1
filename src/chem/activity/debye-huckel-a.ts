/**
 * Debye–Hückel constant A(T), log10 basis, (mol/kg)^(−1/2), and the relative permittivity of water.
 *
 * Formula: A = (2π N_A ρw)^(1/2) · (e² / (4π ε0 εr k T))^(3/2) / ln 10 (the limiting-law slope of
 * Debye–Hückel theory, log10 γ = −A z² √I; e.g. Robinson & Stokes, Electrolyte Solutions, 2nd ed.
 * (1959), ch. 9), with ρw the saturated-liquid density (../water-density.ts, kg/m³ here) and the
 * constants of ../physical-constants.ts.
 *
 * εr(t) = 87.740 − 0.40008 t + 9.398e-4 t² − 1.410e-6 t³ (t in °C, 0–100 °C): Malmberg & Maryott,
 * "Dielectric constant of water from 0° to 100 °C", J. Res. Natl. Bur. Stand. 56, 1 (1956), eq. 2.
 *
 * Notes: gives 0.4918 at 0 °C, 0.5108 at 25 °C, 0.5448 at 60 °C. The older tabulation of Freeze &
 * Cherry, Groundwater (1979), App. IV lies 0.002–0.004 lower at every temperature with the same slope
 * (test/chem/debye-huckel-a.test.ts).
 */
import {
  AVOGADRO,
  BOLTZMANN,
  ELEMENTARY_CHARGE,
  LN10,
  VACUUM_PERMITTIVITY,
  ZERO_CELSIUS_K,
} from "../physical-constants";
import { waterDensity } from "../water-density";

/** Relative permittivity of liquid water at temperature t in °C (Malmberg & Maryott 1956). */
export function waterPermittivity(temperatureC: number): number {
  const t = temperatureC;
  return 87.74 - 0.40008 * t + 9.398e-4 * t * t - 1.41e-6 * t * t * t;
}

let cachedT = NaN;
let cachedA = NaN;

/** Debye–Hückel A, log10 basis, (kg/mol)^(1/2), at temperature t in °C (0–100). */
export function debyeHuckelA(temperatureC: number): number {
  if (temperatureC === cachedT) return cachedA;
  const T = temperatureC + ZERO_CELSIUS_K;
  const rho = waterDensity(T) * 1000; // kg/m³
  const er = waterPermittivity(temperatureC);
  const e2 = ELEMENTARY_CHARGE * ELEMENTARY_CHARGE;
  const bjerrumFactor = e2 / (4 * Math.PI * VACUUM_PERMITTIVITY * er * BOLTZMANN * T); // m
  const value = (Math.sqrt(2 * Math.PI * AVOGADRO * rho) * Math.pow(bjerrumFactor, 1.5)) / LN10;
  cachedT = temperatureC;
  cachedA = value;
  return value;
}
