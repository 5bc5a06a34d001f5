import type { EnsemblePlan } from "./ensemble-plan.js";

/**
 * Total forcing of members [lo, hi) in year t: fixedTotal[t] + Σ_j scale_j[m]·base_j[t]
 * over the agents whose scale varies, written to out[m − offset]; also folds the extremes of
 * the forcing into extremes[at] (min) and extremes[at + 1] (max), so the summary needs no
 * extra pass and a year written block by block gets the extremes of all its blocks.
 */
export type ForcingKernel = (t: number, lo: number, hi: number, out: Float64Array, offset: number, extremes: Float64Array, at: number) => void;

/*
 * Layout, chosen by measurement: each varying scale is read straight from its sampled
 * column (struct of arrays; padding slots read an all-zero column), and each width of 0, 4,
 * 8 or 12 slots has its own fully unrolled loop (one function holding all the loops kept
 * being deoptimised by V8). Padding adds exact zeros (0·0 = 0), so sums are the same as
 * without it. Each loop is a closure over its pathway's columns, made once per pathway and
 * thread: while it is the only closure made from its source, V8 specialises the code to
 * those arrays (block-steppers.ts explains why), ~2.6 against ~5.1 ns per member-year for
 * W1's eight agents (one thread, warm, same process). Cost O((hi − lo) · width).
 */
const made = new WeakMap<EnsemblePlan, ForcingKernel[]>();

/** The forcing kernel of pathway `pathwayIndex` of `plan`. */
export function forcingKernel(plan: EnsemblePlan, pathwayIndex: number): ForcingKernel {
  let kernels = made.get(plan);
  if (!kernels) made.set(plan, (kernels = []));
  return (kernels[pathwayIndex] ??= makeForcingKernel(plan, pathwayIndex));
}

function makeForcingKernel(plan: EnsemblePlan, pathwayIndex: number): ForcingKernel {
  const pathway = plan.pathways[pathwayIndex]!;
  const fixed = pathway.fixedTotal;
  const s = plan.slotScales[pathwayIndex]!;
  const c = pathway.slotBase;
  const years = pathway.years;
  const width = pathway.scaleWidth;
  if (width === 0) return forcingWidth0(fixed);
  if (width === 4) return forcingWidth4(fixed, s, c, years);
  if (width === 8) return forcingWidth8(fixed, s, c, years);
  return forcingWidth12(fixed, s, c, years);
}

function foldExtremes(extremes: Float64Array, at: number, min: number, max: number): void {
  if (min < extremes[at]!) extremes[at] = min;
  if (max > extremes[at + 1]!) extremes[at + 1] = max;
}

function forcingWidth0(fixed: Float64Array): ForcingKernel {
  return (t, lo, hi, out, offset, extremes, at) => {
    const f = fixed[t]!;
    for (let m = lo; m < hi; m++) out[m - offset] = f;
    foldExtremes(extremes, at, f, f);
  };
}

function forcingWidth4(fixed: Float64Array, s: Float64Array[], c: Float64Array, years: number): ForcingKernel {
  const s0 = s[0]!, s1 = s[1]!, s2 = s[2]!, s3 = s[3]!;
  return (t, lo, hi, out, offset, extremes, at) => {
    const base = fixed[t]!;
    const c0 = c[t]!, c1 = c[years + t]!, c2 = c[2 * years + t]!, c3 = c[3 * years + t]!;
    let min = Infinity;
    let max = -Infinity;
    for (let m = lo; m < hi; m++) {
      const f =
        base +
        s0[m]! * c0 + s1[m]! * c1 + s2[m]! * c2 + s3[m]! * c3;
      out[m - offset] = f;
      if (f < min) min = f;
      if (f > max) max = f;
    }
    foldExtremes(extremes, at, min, max);
  };
}

function forcingWidth8(fixed: Float64Array, s: Float64Array[], c: Float64Array, years: number): ForcingKernel {
  const s0 = s[0]!, s1 = s[1]!, s2 = s[2]!, s3 = s[3]!;
  const s4 = s[4]!, s5 = s[5]!, s6 = s[6]!, s7 = s[7]!;
  return (t, lo, hi, out, offset, extremes, at) => {
    const base = fixed[t]!;
    const c0 = c[t]!, c1 = c[years + t]!, c2 = c[2 * years + t]!, c3 = c[3 * years + t]!;
    const c4 = c[4 * years + t]!, c5 = c[5 * years + t]!, c6 = c[6 * years + t]!, c7 = c[7 * years + t]!;
    let min = Infinity;
    let max = -Infinity;
    for (let m = lo; m < hi; m++) {
      const f =
        base +
        s0[m]! * c0 + s1[m]! * c1 + s2[m]! * c2 + s3[m]! * c3 +
        s4[m]! * c4 + s5[m]! * c5 + s6[m]! * c6 + s7[m]! * c7;
      out[m - offset] = f;
      if (f < min) min = f;
      if (f > max) max = f;
    }
    foldExtremes(extremes, at, min, max);
  };
}

function forcingWidth12(fixed: Float64Array, s: Float64Array[], c: Float64Array, years: number): ForcingKernel {
  const s0 = s[0]!, s1 = s[1]!, s2 = s[2]!, s3 = s[3]!;
  const s4 = s[4]!, s5 = s[5]!, s6 = s[6]!, s7 = s[7]!;
  const s8 = s[8]!, s9 = s[9]!, s10 = s[10]!, s11 = s[11]!;
  return (t, lo, hi, out, offset, extremes, at) => {
    const base = fixed[t]!;
    const c0 = c[t]!, c1 = c[years + t]!, c2 = c[2 * years + t]!, c3 = c[3 * years + t]!;
    const c4 = c[4 * years + t]!, c5 = c[5 * years + t]!, c6 = c[6 * years + t]!, c7 = c[7 * years + t]!;
    const c8 = c[8 * years + t]!, c9 = c[9 * years + t]!, c10 = c[10 * years + t]!, c11 = c[11 * years + t]!;
    let min = Infinity;
    let max = -Infinity;
    for (let m = lo; m < hi; m++) {
      const f =
        base +
        s0[m]! * c0 + s1[m]! * c1 + s2[m]! * c2 + s3[m]! * c3 +
        s4[m]! * c4 + s5[m]! * c5 + s6[m]! * c6 + s7[m]! * c7 +
        s8[m]! * c8 + s9[m]! * c9 + s10[m]! * c10 + s11[m]! * c11;
      out[m - offset] = f;
      if (f < min) min = f;
      if (f > max) max = f;
    }
    foldExtremes(extremes, at, min, max);
  };
}
