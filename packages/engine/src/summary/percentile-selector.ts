/**
 * Exact percentiles of one ensemble quantity without sorting it: linear interpolation
 * between order statistics (R type 7, NumPy's default; Hyndman & Fan 1996 definition 7),
 * found by a bucket pass. Weighted percentiles use the weighted analogue of type 7 from
 * weighted-positions.ts.
 *
 * Method: one pass counts members (and, weighted, sums weights) into B equal-width buckets
 * over [min, max]. Bucket index floor((v − min)·B/(max − min)) is monotone in v, so the
 * buckets partition the sorted order; cumulative counts say which buckets hold the wanted
 * order statistics. A second pass copies only the members of those few buckets, which are
 * sorted and read. Cost O(n + b log b) per call, b = members in the wanted buckets (about
 * n/B each); the result is identical to sorting everything, because the same order
 * statistics are read and interpolated with the same expression as quantileSorted (d3).
 *
 * Example: values [3, 1, 2, 4], p = 0.5 -> 2.5 (same as d3.quantile([3, 1, 2, 4], 0.5)).
 */
import { BucketBuffers } from "./bucket-buffers.js";
import { orderStatistics, selectUnweighted } from "./select-by-buckets.js";
import { selectNear } from "./select-near-guesses.js";
import { selectWeighted } from "./select-weighted.js";

/**
 * The three algorithms live in their own files over shared scratch (bucket-buffers.ts):
 * select-by-buckets.ts (count, then gather the wanted buckets), select-near-guesses.ts (one
 * pass that copies the buckets near guessed percentiles) and select-weighted.ts (weighted
 * positions). This class keeps one set of buffers between calls.
 */
export class PercentileSelector {
  private readonly buffers = new BucketBuffers();

  /**
   * Writes the percentiles `probs` (each in [0, 1]) of values[0..n) into out[0..probs.length).
   * min/max must be the exact extremes of values[0..n) (callers get them in a pass they make
   * anyway). weights: null for an unweighted ensemble; otherwise non-negative weights whose
   * sum is totalWeight. Returns Σ values (weighted: Σ w·v) in index order, taken during the
   * counting pass so callers get the mean for free (0 when min = max: no pass is made).
   */
  select(
    values: Float64Array,
    n: number,
    probs: ArrayLike<number>,
    out: Float64Array,
    min: number,
    max: number,
    weights: Float64Array | null = null,
    totalWeight = 0,
  ): number {
    if (n === 0) throw new RangeError("values must not be empty");
    if (!(max > min)) {
      for (let i = 0; i < probs.length; i++) out[i] = min;
      return 0;
    }
    if (weights) return selectWeighted(this.buffers, values, n, probs, out, min, max, weights, totalWeight);
    return selectUnweighted(this.buffers, values, n, probs, out, min, max);
  }

  /**
   * select() for an unweighted ensemble in one pass over the values when good guesses of the
   * percentiles are at hand (select-near-guesses.ts). Same result as select(); guesses only
   * change speed. Returns Σ values in index order.
   */
  selectNear(
    values: Float64Array,
    n: number,
    probs: ArrayLike<number>,
    out: Float64Array,
    min: number,
    max: number,
    guess: ArrayLike<number>,
    spread: ArrayLike<number>,
  ): number {
    return selectNear(this.buffers, values, n, probs, out, min, max, guess, spread);
  }

  /**
   * Exact order statistics: out[j] = the ranks[j]-th smallest of values[0..n) (0-based),
   * as a full sort would give. min/max as for select().
   */
  orderStatistics(values: Float64Array, n: number, ranks: number[], out: Float64Array, min: number, max: number): void {
    orderStatistics(this.buffers, values, n, ranks, out, min, max);
  }
}
