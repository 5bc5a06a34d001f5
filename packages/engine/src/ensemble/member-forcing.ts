import type { EnsemblePlan } from "./ensemble-plan.js";
import type { PathwayForcing } from "./pathway-forcing.js";

/**
 * Total forcing of members [lo, hi) in year t: fixedTotal[t] + Σ_j scale[m, j]·base_j[t]
 * over the agents whose scale varies, written to out[m − offset]; also folds the extremes of
 * the forcing into extremes[at] (min) and extremes[at + 1] (max), so the summary needs no
 * extra pass and a year written block by block gets the extremes of all its blocks.
 *
 * Layout, chosen by measurement: the varying scales are stored member-major, padded to a
 * width of 4, 8 or 12 with zeros, and each width has its own fully unrolled loop. In V8
 * that is about 2.4x faster than the C reference's agents-outer loop (one multiply-add pass
 * per agent), which V8 does not vectorise. Padding adds exact zeros (0·b = 0), so sums are
 * unchanged. Cost O((hi − lo) · width).
 */
export function memberForcing(
  plan: EnsemblePlan,
  pathway: PathwayForcing,
  t: number,
  lo: number,
  hi: number,
  out: Float64Array,
  extremes: Float64Array,
  at: number,
  offset = 0,
): void {
  const fixed = pathway.fixedTotal[t]!;
  const s = plan.state.memberScales;
  const c = pathway.slotBase;
  const years = pathway.years;
  // One small function per width: a single function holding all four loops kept being
  // deoptimised by V8 (about 1,600 times per W1 run) and ran mostly unoptimised.
  const width = pathway.scaleWidth;
  if (width === 0) forcingWidth0(fixed, lo, hi, out, offset, extremes, at);
  else if (width === 4) forcingWidth4(fixed, s, c, years, t, lo, hi, out, offset, extremes, at);
  else if (width === 8) forcingWidth8(fixed, s, c, years, t, lo, hi, out, offset, extremes, at);
  else forcingWidth12(fixed, s, c, years, t, lo, hi, out, offset, extremes, at);
}

function foldExtremes(extremes: Float64Array, at: number, min: number, max: number): void {
  if (min < extremes[at]!) extremes[at] = min;
  if (max > extremes[at + 1]!) extremes[at + 1] = max;
}

function forcingWidth0(fixed: number, lo: number, hi: number, out: Float64Array, offset: number, extremes: Float64Array, at: number): void {
  for (let m = lo; m < hi; m++) out[m - offset] = fixed;
  foldExtremes(extremes, at, fixed, fixed);
}

function forcingWidth4(
  fixed: number,
  s: Float64Array,
  c: Float64Array,
  years: number,
  t: number,
  lo: number,
  hi: number,
  out: Float64Array,
  offset: number,
  extremes: Float64Array,
  at: number,
): void {
  const c0 = c[t]!, c1 = c[years + t]!, c2 = c[2 * years + t]!, c3 = c[3 * years + t]!;
  let min = Infinity;
  let max = -Infinity;
  for (let m = lo; m < hi; m++) {
    const o = m * 4;
    const f = fixed + s[o]! * c0 + s[o + 1]! * c1 + s[o + 2]! * c2 + s[o + 3]! * c3;
    out[m - offset] = f;
    if (f < min) min = f;
    if (f > max) max = f;
  }
  foldExtremes(extremes, at, min, max);
}

function forcingWidth8(
  fixed: number,
  s: Float64Array,
  c: Float64Array,
  years: number,
  t: number,
  lo: number,
  hi: number,
  out: Float64Array,
  offset: number,
  extremes: Float64Array,
  at: number,
): void {
  const c0 = c[t]!, c1 = c[years + t]!, c2 = c[2 * years + t]!, c3 = c[3 * years + t]!;
  const c4 = c[4 * years + t]!, c5 = c[5 * years + t]!, c6 = c[6 * years + t]!, c7 = c[7 * years + t]!;
  let min = Infinity;
  let max = -Infinity;
  for (let m = lo; m < hi; m++) {
    const o = m * 8;
    const f =
      fixed +
      s[o]! * c0 + s[o + 1]! * c1 + s[o + 2]! * c2 + s[o + 3]! * c3 +
      s[o + 4]! * c4 + s[o + 5]! * c5 + s[o + 6]! * c6 + s[o + 7]! * c7;
    out[m - offset] = f;
    if (f < min) min = f;
    if (f > max) max = f;
  }
  foldExtremes(extremes, at, min, max);
}

function forcingWidth12(
  fixed: number,
  s: Float64Array,
  c: Float64Array,
  years: number,
  t: number,
  lo: number,
  hi: number,
  out: Float64Array,
  offset: number,
  extremes: Float64Array,
  at: number,
): void {
  const c0 = c[t]!, c1 = c[years + t]!, c2 = c[2 * years + t]!, c3 = c[3 * years + t]!;
  const c4 = c[4 * years + t]!, c5 = c[5 * years + t]!, c6 = c[6 * years + t]!, c7 = c[7 * years + t]!;
  const c8 = c[8 * years + t]!, c9 = c[9 * years + t]!, c10 = c[10 * years + t]!, c11 = c[11 * years + t]!;
  let min = Infinity;
  let max = -Infinity;
  for (let m = lo; m < hi; m++) {
    const o = m * 12;
    const f =
      fixed +
      s[o]! * c0 + s[o + 1]! * c1 + s[o + 2]! * c2 + s[o + 3]! * c3 +
      s[o + 4]! * c4 + s[o + 5]! * c5 + s[o + 6]! * c6 + s[o + 7]! * c7 +
      s[o + 8]! * c8 + s[o + 9]! * c9 + s[o + 10]! * c10 + s[o + 11]! * c11;
    out[m - offset] = f;
    if (f < min) min = f;
    if (f > max) max = f;
  }
  foldExtremes(extremes, at, min, max);
}

/** Copies the varying agent scales of members [lo, hi) into the member-major matrix of a pathway. */
export function fillMemberScales(plan: EnsemblePlan, pathway: PathwayForcing, lo: number, hi: number): void {
  const width = pathway.scaleWidth;
  const s = plan.state.memberScales;
  pathway.slotColumns.forEach((column, j) => {
    const values = plan.columns[column]!;
    for (let m = lo; m < hi; m++) s[m * width + j] = values[m]!;
  });
  for (let j = pathway.slotColumns.length; j < width; j++) for (let m = lo; m < hi; m++) s[m * width + j] = 0;
}
