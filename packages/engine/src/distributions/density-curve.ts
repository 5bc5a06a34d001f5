import { densityOf, quantileOf } from "./evaluate-distribution.js";
import type { Distribution } from "./types.js";
import { validateDistribution } from "./validate-distribution.js";

/**
 * Density curve for a live preview: `points` evenly spaced x from the 0.5 % to the 99.5 %
 * quantile, with the density at each.
 *
 * A fixed distribution has no density: the curve is the single point { x: [value],
 * density: [0] } and the preview draws a spike there. Cost O(points).
 *
 * Example: `densityCurve({ type: "uniform", min: 0, max: 1 }, 3)`
 * → { x: [0.005, 0.5, 0.995], density: [1, 1, 1] }.
 */
export function densityCurve(d: Distribution, points = 101): { x: number[]; density: number[] } {
  validateDistribution(d, "distribution");
  if (!Number.isInteger(points) || points < 2) throw new RangeError("points must be an integer ≥ 2");
  if (d.type === "fixed") return { x: [d.value], density: [0] };
  const from = quantileOf(d, 0.005);
  const to = quantileOf(d, 0.995);
  const step = (to - from) / (points - 1);
  const x: number[] = [];
  const density: number[] = [];
  for (let i = 0; i < points; i++) {
    const at = i === points - 1 ? to : from + i * step;
    x.push(at);
    density.push(densityOf(d, at));
  }
  return { x, density };
}
