import type { TwoLayerPropagator } from "../two-layer-propagator.js";

/**
 * Test helper: steps a propagator through yearly forcing that is piecewise linear between
 * forcingAt(k) at the start and forcingAt(k + 1) at the end of year k; returns (T, T0) at
 * the end of each year 1 … years.
 */
export function stepYears(
  propagator: TwoLayerPropagator,
  forcingAt: (year: number) => number,
  years: number,
): { upper: Float64Array; deep: Float64Array } {
  const upper = new Float64Array(years + 1);
  const deep = new Float64Array(years + 1);
  let t = 0;
  let t0 = 0;
  for (let k = 0; k < years; k++) {
    const start = forcingAt(k);
    const rise = forcingAt(k + 1) - start;
    const nextT = propagator.a11 * t + propagator.a12 * t0 + propagator.b1 * start + propagator.r1 * rise;
    const nextT0 = propagator.a21 * t + propagator.a22 * t0 + propagator.b2 * start + propagator.r2 * rise;
    t = nextT;
    t0 = nextT0;
    upper[k + 1] = t;
    deep[k + 1] = t0;
  }
  return { upper, deep };
}
