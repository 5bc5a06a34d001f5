import { BucketBuffers } from "./bucket-buffers.js";
import { weightedPosition } from "./weighted-positions.js";

/*
 * Weighted percentiles (the weighted analogue of type 7, weighted-positions.ts) by buckets:
 * the counting pass also sums each bucket's weight; buckets around each percentile's
 * position are gathered, sorted by value (ties by member), and walked with the exact weight
 * below each member; the read buckets are widened until every percentile is bracketed.
 */

export function selectWeighted(
  buffers: BucketBuffers,
  values: Float64Array,
  n: number,
  probs: ArrayLike<number>,
  out: Float64Array,
  min: number,
  max: number,
  weights: Float64Array,
  totalWeight: number,
): number {
  const buckets = buffers.prepare(n);
  const counts = buffers.counts;
  const sums = buffers.bucketWeights;
  sums.fill(0, 0, buckets);
  const scale = buckets / (max - min);
  const last = buckets - 1;
  let sum = 0;
  let positive = 0;
  let onlyPositive = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i]!;
    const w = weights[i]!;
    sum += w * v;
    if (w > 0) {
      positive++;
      onlyPositive = v;
    }
    let b = ((v - min) * scale) | 0;
    if (b > last) b = last;
    counts[b]!++;
    sums[b]! += w;
  }
  if (positive === 0) throw new RangeError("weights must have a positive sum");
  if (positive === 1) {
    for (let j = 0; j < probs.length; j++) out[j] = onlyPositive;
    return sum;
  }
  const meanWeight = totalWeight / positive;
  const span = totalWeight - meanWeight;
  // Per percentile, the first bucket after which a lower bound of the next position exceeds
  // p; that bucket and its neighbours are read, and widened if the bracketing pair of
  // members turns out not to lie inside one gathered run.
  const slot = buffers.slotOfBucket;
  const crossing = new Array<number>(probs.length);
  for (let j = 0; j < probs.length; j++) {
    const p = probs[j]!;
    let cumulative = 0;
    let b = 0;
    for (; b < last; b++) {
      cumulative += sums[b]!;
      if ((cumulative - meanWeight / 2) / span > p) break;
    }
    crossing[j] = b;
  }
  let spread = 1;
  for (;;) {
    slot.fill(-1, 0, buckets);
    for (const b of crossing) {
      for (let k = Math.max(0, b - spread); k <= Math.min(last, b + spread); k++) slot[k] = 1;
    }
    let offset = 0;
    for (let b = 0; b < buckets; b++) {
      if (slot[b]! < 0) continue;
      slot[b] = offset;
      offset += counts[b]!;
    }
    buffers.ensureGathered(offset);
    buffers.gatherAndSort(values, weights, n, min, scale, last);
    if (interpolateWeighted(buffers, probs, out, meanWeight, span, buckets)) return sum;
    spread *= 4;
  }
}

/**
 * Walks the wanted buckets in value order, computing each positive-weight member's position
 * from the exact weight below it, and interpolates as weightedQuantileSorted does. A member's
 * predecessor is known unless a bucket that was not read, holding positive weight, lies in
 * between; a percentile whose bracketing pair straddles such a gap makes this return false
 * (the caller widens the read buckets). Buckets holding only zero weights are no gap.
 */
export function interpolateWeighted(
  buffers: BucketBuffers,
  probs: ArrayLike<number>,
  out: Float64Array,
  meanWeight: number,
  span: number,
  buckets: number,
): boolean {
  const slot = buffers.slotOfBucket;
  const counts = buffers.counts;
  const sums = buffers.bucketWeights;
  const done = new Array<boolean>(probs.length).fill(false);
  let unresolved = false;
  let cumulative = 0;
  let previousKnown = true;
  let previousPosition = Number.NEGATIVE_INFINITY;
  let previousValue = 0;
  let lastPositiveGathered = false;
  for (let b = 0; b < buckets; b++) {
    if (slot[b]! < 0) {
      if (sums[b]! > 0) {
        cumulative += sums[b]!;
        previousKnown = false;
        lastPositiveGathered = false;
      }
      continue;
    }
    const start = slot[b]!;
    const count = counts[b]!;
    for (let k = 0; k < count; k++) {
      const w = buffers.gatheredWeights[start + k]!;
      if (w === 0) continue;
      const value = buffers.gathered[start + k]!;
      cumulative += w;
      const position = weightedPosition(cumulative, w, meanWeight, span);
      for (let j = 0; j < probs.length; j++) {
        if (done[j]) continue;
        const p = probs[j]!;
        if (p > position) continue;
        if (!previousKnown) unresolved = true;
        else if (previousPosition === Number.NEGATIVE_INFINITY) out[j] = value;
        else out[j] = previousValue + ((p - previousPosition) / (position - previousPosition)) * (value - previousValue);
        done[j] = true;
      }
      previousPosition = position;
      previousValue = value;
      previousKnown = true;
      lastPositiveGathered = true;
    }
  }
  // Beyond the last position: the largest value of positive weight, if it was read.
  for (let j = 0; j < probs.length; j++) {
    if (done[j]) continue;
    if (lastPositiveGathered) out[j] = previousValue;
    else unresolved = true;
  }
  return !unresolved;
}
