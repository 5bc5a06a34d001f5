import type { MemberClimate } from "./member-climate.js";

/** Years of the 1 %/yr CO2 experiment at which TCR is read (AR6 definition: "at year 70"). */
export const TCR_YEAR = 70;

/**
 * Each member's transient climate response: the upper-layer warming at year 70 of a
 * 1 %/yr CO2 increase, whose forcing F2x_felt·t·ln(1.01)/ln 2 rises linearly (F2x_felt = scale_co2 · F2x,
 * the forcing the member feels at doubled CO2, doubling-forcing.ts; Geoffroy et al. 2013a, linear forcing).
 * Each year uses the member's exact propagator for a forcing rising linearly within the
 * year (b·F at the year's start plus r·ΔF), so the result equals the closed form of
 * Geoffroy et al. 2013a for a linear forcing. Cost O(members × 70).
 */
export function impliedTcr(climate: MemberClimate): Float64Array {
  return impliedTcrInto(climate, new Float64Array(climate.lambda.length), 0, climate.lambda.length);
}

/** impliedTcr for members [lo, hi), into out[lo, hi) (members are independent: any range, any thread). */
export function impliedTcrInto(climate: MemberClimate, out: Float64Array, lo: number, hi: number): Float64Array {
  // Two members per loop: their recurrences are independent, so the CPU overlaps them
  // (one member's 70 steps are a chain of dependent multiply-adds). Same operations per
  // member in the same order, so the same numbers.
  let m = lo;
  for (; m + 1 < hi; m += 2) tcrOfPair(climate, m, out);
  if (m < hi) out[m] = tcrOf(climate, m);
  return out;
}

const RISE = Math.log(1.01) / Math.LN2;

function tcrOf(c: MemberClimate, m: number): number {
  const step = c.doublingForcing[m]! * RISE;
  const a11 = c.a11[m]!,
    a12 = c.a12[m]!,
    a21 = c.a21[m]!,
    a22 = c.a22[m]!;
  const b1 = c.b1[m]!,
    b2 = c.b2[m]!,
    r1 = c.r1[m]!,
    r2 = c.r2[m]!;
  let upper = 0;
  let deep = 0;
  for (let year = 0; year < TCR_YEAR; year++) {
    const start = step * year;
    const nextUpper = a11 * upper + a12 * deep + b1 * start + r1 * step;
    deep = a21 * upper + a22 * deep + b2 * start + r2 * step;
    upper = nextUpper;
  }
  return upper;
}

function tcrOfPair(c: MemberClimate, m: number, out: Float64Array): void {
  const k = m + 1;
  const stepM = c.doublingForcing[m]! * RISE;
  const stepK = c.doublingForcing[k]! * RISE;
  const a11m = c.a11[m]!,
    a12m = c.a12[m]!,
    a21m = c.a21[m]!,
    a22m = c.a22[m]!;
  const b1m = c.b1[m]!,
    b2m = c.b2[m]!,
    r1m = c.r1[m]!,
    r2m = c.r2[m]!;
  const a11k = c.a11[k]!,
    a12k = c.a12[k]!,
    a21k = c.a21[k]!,
    a22k = c.a22[k]!;
  const b1k = c.b1[k]!,
    b2k = c.b2[k]!,
    r1k = c.r1[k]!,
    r2k = c.r2[k]!;
  let upperM = 0,
    deepM = 0,
    upperK = 0,
    deepK = 0;
  for (let year = 0; year < TCR_YEAR; year++) {
    const startM = stepM * year;
    const startK = stepK * year;
    const nextUpperM = a11m * upperM + a12m * deepM + b1m * startM + r1m * stepM;
    const nextUpperK = a11k * upperK + a12k * deepK + b1k * startK + r1k * stepK;
    deepM = a21m * upperM + a22m * deepM + b2m * startM + r2m * stepM;
    deepK = a21k * upperK + a22k * deepK + b2k * startK + r2k * stepK;
    upperM = nextUpperM;
    upperK = nextUpperK;
  }
  out[m] = upperM;
  out[k] = upperK;
}
