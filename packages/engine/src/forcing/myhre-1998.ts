import { requireConcentration } from "./checks.js";

/**
 * CO2 radiative forcing by the simplified logarithmic expression, ΔF = 5.35·ln(C/C0) W m⁻²
 * (C, C0 in ppm). A stratospheric-temperature-adjusted RF; 2×CO2 gives 3.7083 (quoted 3.71).
 * Cost O(1).
 * Reference: Myhre, Highwood, Shine & Stordal (1998), Geophys. Res. Lett. 25(14), 2715–2718;
 * IPCC TAR WGI Ch. 6, Section 6.3.5 "Simplified Expressions".
 *
 * Example: `co2ForcingMyhre(556, 278)` → 3.7083 (4 d.p.).
 */
export function co2ForcingMyhre(c: number, c0: number): number {
  requireConcentration(c, "c");
  requireConcentration(c0, "c0");
  return 5.35 * Math.log(c / c0);
}

/**
 * CH4–N2O band-overlap term of the TAR expressions (M, N in ppb):
 * f(M, N) = 0.47·ln[1 + 2.01×10⁻⁵·(MN)^0.75 + 5.31×10⁻¹⁵·M·(MN)^1.52].
 * Reference: IPCC TAR WGI Table 6.2 (table number from memory).
 *
 * Example: `methaneNitrousOverlapTar(722, 270)` → 0.0805 (4 d.p.).
 */
export function methaneNitrousOverlapTar(m: number, n: number): number {
  const product = m * n;
  return 0.47 * Math.log(1 + 2.01e-5 * product ** 0.75 + 5.31e-15 * m * product ** 1.52);
}

/**
 * CH4 radiative forcing, TAR simplified expression:
 * ΔF = 0.036·(√M − √M0) − [f(M, N0) − f(M0, N0)] W m⁻², M in ppb, overlap at the reference N0.
 * Cost O(1). Reference: IPCC TAR WGI Section 6.3.5 / Table 6.2 (expression from memory).
 *
 * Example: `ch4ForcingTar(1803, 722, 270)` → 0.492 (3 d.p.; AR5 quotes 0.48).
 */
export function ch4ForcingTar(m: number, m0: number, n0: number): number {
  requireConcentration(m, "m");
  requireConcentration(m0, "m0");
  requireConcentration(n0, "n0");
  return 0.036 * (Math.sqrt(m) - Math.sqrt(m0)) - (methaneNitrousOverlapTar(m, n0) - methaneNitrousOverlapTar(m0, n0));
}

/**
 * N2O radiative forcing, TAR simplified expression:
 * ΔF = 0.12·(√N − √N0) − [f(M0, N) − f(M0, N0)] W m⁻², N in ppb, overlap at the reference M0.
 * Cost O(1). Reference: IPCC TAR WGI Section 6.3.5 / Table 6.2 (expression from memory).
 *
 * Example: `n2oForcingTar(324, 270, 722)` → 0.177 (3 d.p.; AR5 quotes 0.17).
 */
export function n2oForcingTar(n: number, n0: number, m0: number): number {
  requireConcentration(n, "n");
  requireConcentration(n0, "n0");
  requireConcentration(m0, "m0");
  return 0.12 * (Math.sqrt(n) - Math.sqrt(n0)) - (methaneNitrousOverlapTar(m0, n) - methaneNitrousOverlapTar(m0, n0));
}
