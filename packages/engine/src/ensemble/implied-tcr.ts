import type { MemberClimate } from "./member-climate.js";

/** Years of the 1 %/yr CO2 experiment at which TCR is read (AR6 definition: "at year 70"). */
export const TCR_YEAR = 70;

/**
 * Each member's transient climate response: the upper-layer warming at year 70 of a
 * 1 %/yr CO2 increase, whose forcing F2x·t·ln(1.01)/ln 2 rises linearly (CHECKS.md §5.2).
 * Each year uses the member's exact propagator for a forcing rising linearly within the
 * year (b·F at the year's start plus r·ΔF), so the result equals the closed form of
 * Geoffroy et al. 2013a for a linear forcing. Cost O(members × 70).
 */
export function impliedTcr(climate: MemberClimate): Float64Array {
  const n = climate.lambda.length;
  const tcr = new Float64Array(n);
  const rise = Math.log(1.01) / Math.LN2;
  for (let m = 0; m < n; m++) {
    const step = climate.f2x[m]! * rise;
    const a11 = climate.a11[m]!;
    const a12 = climate.a12[m]!;
    const a21 = climate.a21[m]!;
    const a22 = climate.a22[m]!;
    const b1 = climate.b1[m]!;
    const b2 = climate.b2[m]!;
    const r1 = climate.r1[m]!;
    const r2 = climate.r2[m]!;
    let upper = 0;
    let deep = 0;
    for (let year = 0; year < TCR_YEAR; year++) {
      const start = step * year;
      const nextUpper = a11 * upper + a12 * deep + b1 * start + r1 * step;
      deep = a21 * upper + a22 * deep + b2 * start + r2 * step;
      upper = nextUpper;
    }
    tcr[m] = upper;
  }
  return tcr;
}
