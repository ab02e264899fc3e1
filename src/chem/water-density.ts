/**
 * Density of liquid water on the saturation curve.
 *
 * Formula: ρ′/ρc = 1 + b1·τ^(1/3) + b2·τ^(2/3) + b3·τ^(5/3) + b4·τ^(16/3) + b5·τ^(43/3) + b6·τ^(110/3),
 * τ = 1 − T/Tc, Tc = 647.096 K, ρc = 322 kg/m³.
 *
 * Method: the saturated-liquid density equation of Wagner & Pruß, "International equations for the
 * saturation properties of ordinary water substance. Revised according to the International
 * Temperature Scale of 1990", J. Phys. Chem. Ref. Data 22, 783 (1993), eq. 2.6 (IAPWS SR1-86, 1992
 * revision). Valid from the triple point to the critical point.
 *
 * Notes: at 0–100 °C the saturation pressure is below 0.1 MPa, so this is the density of water in an
 * open vessel to within 0.005 %. Checked end to end by the pKw table test (pKw depends on log ρ).
 */

const TC = 647.096; // K
const RHO_C = 322; // kg/m³
const B = [1.99274064, 1.09965342, -0.510839303, -1.75493479, -45.5170352, -6.7469445e5];
const E = [1 / 3, 2 / 3, 5 / 3, 16 / 3, 43 / 3, 110 / 3];

/** Density of saturated liquid water, g/cm³ (= kg/L), at temperature T in kelvin (273.16–647.096 K). */
export function waterDensity(temperatureK: number): number {
  const tau = 1 - temperatureK / TC;
  let s = 1;
  for (let i = 0; i < B.length; i++) s += B[i] * Math.pow(tau, E[i]);
  return (RHO_C * s) / 1000;
}
