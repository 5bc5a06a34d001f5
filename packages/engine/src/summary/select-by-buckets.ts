import { BucketBuffers, countIntoBuckets, wantedRanks } from "./bucket-buffers.js";

/**
 * Unweighted R type 7 percentiles by buckets (percentile-selector.ts): one pass counts the
 * members into buckets, cumulative counts say which buckets hold the two order statistics
 * each percentile reads, a second pass copies only those buckets' members, which are sorted
 * and read. Same numbers as sorting everything. Returns Σ values in index order.
 */
export function selectUnweighted(
  buffers: BucketBuffers,
  values: Float64Array,
  n: number,
  probs: ArrayLike<number>,
  out: Float64Array,
  min: number,
  max: number,
): number {
  const buckets = buffers.prepare(n);
  const counts = buffers.counts;
  const scale = buckets / (max - min);
  const last = buckets - 1;
  const sum = countIntoBuckets(values, n, min, scale, last, counts);
  const located = buffers.locateRanks(wantedRanks(n, probs), buckets);
  buffers.gatherAndSort(values, null, n, min, scale, last);
  buffers.interpolate(n, probs, located, out);
  return sum;
}

/**
 * Exact order statistics: out[j] = the ranks[j]-th smallest of values[0..n) (0-based),
 * as a full sort would give. min/max as for select().
 */
export function orderStatistics(
  buffers: BucketBuffers,
  values: Float64Array, n: number, ranks: number[], out: Float64Array, min: number, max: number): void {
  if (!(max > min)) {
    for (let j = 0; j < ranks.length; j++) out[j] = min;
    return;
  }
  const buckets = buffers.prepare(n);
  const counts = buffers.counts;
  const scale = buckets / (max - min);
  const last = buckets - 1;
  countIntoBuckets(values, n, min, scale, last, counts);
  const located = buffers.locateRanks(ranks, buckets);
  buffers.gatherAndSort(values, null, n, min, scale, last);
  for (let j = 0; j < ranks.length; j++) out[j] = buffers.gathered[located[j]!]!;
}
