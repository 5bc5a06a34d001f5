import { requireConcentration } from "./checks.js";

/*
 * The AR6 simplified expressions: Meinshausen et al. (2020), Geosci. Model Dev. 13,
 * 3571–3605, doi:10.5194/gmd-13-3571-2020, a re-fit of the Etminan et al. (2016) line-by-line
 * results used by IPCC AR6 WGI Chapter 7 Section 7.3.2 (coefficients of AR6 Table 7.SM.1).
 * The form and coefficients are written from memory, not checked against Table 7.SM.1; they
 * reproduce four published AR6 headline numbers (TS Section TS.2.2 and Section 7.3.2.1) to 3 significant figures (CO2 2.16, CH4 0.54,
 * N2O 0.21 W m⁻² for 1750–2019; 3.93 W m⁻² for 2×CO2), which is strong support.
 * Each gas's SARF is written relative to the fit's own pre-industrial state
 * (C0 = 277.15 ppm, N0 = 273.87 ppb, M0 = 731.41 ppb); the forcing between two states is
 * the difference of the two values.
 */
const CO2_A1 = -2.4785e-7;
const CO2_B1 = 7.5906e-4;
const CO2_C1 = -2.1492e-3;
const CO2_D1 = 5.2488;
const N2O_A2 = -3.4197e-4;
const N2O_B2 = 2.5455e-4;
const N2O_C2 = -2.4357e-4;
const N2O_D2 = 0.12173;
const CH4_A3 = -8.9603e-5;
const CH4_B3 = -1.2462e-4;
const CH4_D3 = 0.045194;
const FIT_C0 = 277.15;
const FIT_N0 = 273.87;
const FIT_M0 = 731.41;
/** CO2 concentration where the quadratic α′ peaks, C0 − b1/(2·a1) ≈ 1808 ppm. */
const CO2_ALPHA_MAX = FIT_C0 - CO2_B1 / (2 * CO2_A1);

/** SARF → ERF tropospheric-adjustment factors, AR6 WGI Ch. 7 Section 7.3.2 (from memory). */
export const AR6_ADJUSTMENT = { co2: 1.05, ch4: 0.86, n2o: 1.07 } as const;

function co2SarfFromFitReference(c: number, n: number): number {
  let alphaPrime: number;
  if (c >= CO2_ALPHA_MAX) alphaPrime = CO2_D1 - (CO2_B1 * CO2_B1) / (4 * CO2_A1);
  else if (c > FIT_C0) alphaPrime = CO2_D1 + CO2_A1 * (c - FIT_C0) ** 2 + CO2_B1 * (c - FIT_C0);
  else alphaPrime = CO2_D1;
  return (alphaPrime + CO2_C1 * Math.sqrt(n)) * Math.log(c / FIT_C0);
}

function ch4SarfFromFitReference(m: number, n: number): number {
  return (CH4_A3 * Math.sqrt(m) + CH4_B3 * Math.sqrt(n) + CH4_D3) * (Math.sqrt(m) - Math.sqrt(FIT_M0));
}

function n2oSarfFromFitReference(n: number, c: number, m: number): number {
  return (N2O_A2 * Math.sqrt(c) + N2O_B2 * Math.sqrt(n) + N2O_C2 * Math.sqrt(m) + N2O_D2) * (Math.sqrt(n) - Math.sqrt(FIT_N0));
}

/**
 * CO2 SARF between two states (AR6 form): (α′(C) + c1·√N)·ln(C/C0fit) minus the same at
 * the reference state. α′ = d1 + a1(C−C0)² + b1(C−C0) between C0fit and ≈1808 ppm, constant
 * outside. N2O at the reference state defaults to the current one. Cost O(1).
 *
 * Example: `co2SarfAr6(554.3, 277.15, 273.87)` → 3.746 (3 d.p.; computed from the expression).
 */
export function co2SarfAr6(c: number, c0: number, n: number, n0 = n): number {
  requireConcentration(c, "c");
  requireConcentration(c0, "c0");
  requireConcentration(n, "n");
  requireConcentration(n0, "n0");
  return co2SarfFromFitReference(c, n) - co2SarfFromFitReference(c0, n0);
}

/**
 * CH4 SARF between two states (AR6 form): (a3√M + b3√N + d3)(√M − √M0fit) minus the same at
 * the reference. Cost O(1).
 *
 * Example: `ch4SarfAr6(1866.3, 729.2, 332.1, 270.1)` → 0.633 (3 d.p.; computed from the expression).
 */
export function ch4SarfAr6(m: number, m0: number, n: number, n0 = n): number {
  requireConcentration(m, "m");
  requireConcentration(m0, "m0");
  requireConcentration(n, "n");
  requireConcentration(n0, "n0");
  return ch4SarfFromFitReference(m, n) - ch4SarfFromFitReference(m0, n0);
}

/**
 * N2O SARF between two states (AR6 form): (a2√C + b2√N + c2√M + d2)(√N − √N0fit) minus the
 * same at the reference. Cost O(1).
 *
 * Example: `n2oSarfAr6(332.1, 270.1, 409.9, 1866.3, 278.3, 729.2)` → 0.195 (3 d.p.; computed from the expression).
 */
export function n2oSarfAr6(n: number, n0: number, c: number, m: number, c0 = c, m0 = m): number {
  requireConcentration(n, "n");
  requireConcentration(n0, "n0");
  requireConcentration(c, "c");
  requireConcentration(m, "m");
  requireConcentration(c0, "c0");
  requireConcentration(m0, "m0");
  return n2oSarfFromFitReference(n, c, m) - n2oSarfFromFitReference(n0, c0, m0);
}

/**
 * CO2 ERF (AR6): co2SarfAr6 × 1.05. Example: `co2ErfAr6(409.9, 278.3, 332.1, 270.1)` → 2.158
 * (3 d.p.; AR6 assessed 2.16 for 1750–2019).
 */
export function co2ErfAr6(c: number, c0: number, n: number, n0 = n): number {
  return AR6_ADJUSTMENT.co2 * co2SarfAr6(c, c0, n, n0);
}

/**
 * CH4 ERF (AR6): ch4SarfAr6 × 0.86. Example: `ch4ErfAr6(1866.3, 729.2, 332.1, 270.1)` → 0.544
 * (3 d.p.; AR6 assessed 0.54).
 */
export function ch4ErfAr6(m: number, m0: number, n: number, n0 = n): number {
  return AR6_ADJUSTMENT.ch4 * ch4SarfAr6(m, m0, n, n0);
}

/**
 * N2O ERF (AR6): n2oSarfAr6 × 1.07. Example: `n2oErfAr6(332.1, 270.1, 409.9, 1866.3, 278.3, 729.2)`
 * → 0.209 (3 d.p.; AR6 assessed 0.21).
 */
export function n2oErfAr6(n: number, n0: number, c: number, m: number, c0 = c, m0 = m): number {
  return AR6_ADJUSTMENT.n2o * n2oSarfAr6(n, n0, c, m, c0, m0);
}
