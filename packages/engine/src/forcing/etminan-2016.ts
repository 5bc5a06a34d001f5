import { requireConcentration } from "./checks.js";

/*
 * Etminan, Myhre, Highwood & Shine (2016), "Radiative forcing of carbon dioxide, methane, and
 * nitrous oxide: a significant revision of the methane radiative forcing", Geophys. Res.
 * Lett. 43(24), 12,614–12,623, doi:10.1002/2016GL071930, Table 1.
 * Coefficients as quoted from Table 1 by public codes (not checked against the paper); the CO2
 * constant 5.36 and the form from memory — together they
 * reproduce the paper's abstract (CH4 0.61 W m⁻² for 1750–2011; CO2 within 1 % of AR5 and
 * about 10 % higher at 2000 ppm). The brackets are LINEAR in the mean concentrations
 * (with square-root means the CH4 check misses 0.61). Stated validity (from memory): CO2 180–2000 ppm,
 * CH4 340–3500 ppb, N2O 200–525 ppb; outside these the expressions still evaluate but are
 * extrapolations (not rejected).
 */
const CO2_A1 = -2.4e-7;
const CO2_B1 = 7.2e-4;
const CO2_C1 = -2.1e-4;
const N2O_A2 = -8.0e-6;
const N2O_B2 = 4.2e-6;
const N2O_C2 = -4.9e-6;
const CH4_A3 = -1.3e-6;
const CH4_B3 = -8.2e-6;

/**
 * CO2 RF (Etminan 2016): ΔF = [a1(C−C0)² + b1|C−C0| + c1·N̄ + 5.36]·ln(C/C0) W m⁻², C in ppm,
 * N̄ the mean N2O (ppb) of the perturbed and reference states. Cost O(1).
 *
 * Example: `co2ForcingEtminan(556, 278, 270)` → 3.802 (3 d.p.; computed from the expression).
 */
export function co2ForcingEtminan(c: number, c0: number, nBar: number): number {
  requireConcentration(c, "c");
  requireConcentration(c0, "c0");
  requireConcentration(nBar, "nBar");
  const change = c - c0;
  return (CO2_A1 * change * change + CO2_B1 * Math.abs(change) + CO2_C1 * nBar + 5.36) * Math.log(c / c0);
}

/**
 * CH4 RF (Etminan 2016): ΔF = [a3·M̄ + b3·N̄ + 0.043]·(√M − √M0) W m⁻², M in ppb, M̄ = (M + M0)/2
 * computed here, N̄ the mean N2O (ppb). Includes shortwave absorption. Cost O(1).
 *
 * Example: `ch4ForcingEtminan(1803, 722, 297)` → 0.607 (3 d.p.; abstract: 0.61).
 */
export function ch4ForcingEtminan(m: number, m0: number, nBar: number): number {
  requireConcentration(m, "m");
  requireConcentration(m0, "m0");
  requireConcentration(nBar, "nBar");
  const mBar = (m + m0) / 2;
  return (CH4_A3 * mBar + CH4_B3 * nBar + 0.043) * (Math.sqrt(m) - Math.sqrt(m0));
}

/**
 * N2O RF (Etminan 2016): ΔF = [a2·C̄ + b2·N̄ + c2·M̄ + 0.117]·(√N − √N0) W m⁻², N in ppb,
 * N̄ = (N + N0)/2 computed here, C̄ (ppm) and M̄ (ppb) the mean CO2 and CH4. Cost O(1).
 *
 * Example: `n2oForcingEtminan(324, 270, 334.25, 1262.5)` → 0.172 (3 d.p.; computed from the expression).
 */
export function n2oForcingEtminan(n: number, n0: number, cBar: number, mBar: number): number {
  requireConcentration(n, "n");
  requireConcentration(n0, "n0");
  requireConcentration(cBar, "cBar");
  requireConcentration(mBar, "mBar");
  const nBar = (n + n0) / 2;
  return (N2O_A2 * cBar + N2O_B2 * nBar + N2O_C2 * mBar + 0.117) * (Math.sqrt(n) - Math.sqrt(n0));
}
