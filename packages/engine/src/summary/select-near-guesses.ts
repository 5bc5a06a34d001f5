import { BucketBuffers, wantedRanks } from "./bucket-buffers.js";

/*
 * Unweighted percentiles in one pass over the values when good guesses are at hand (the
 * same quantity's percentiles in recent years): the buckets near the guesses are copied
 * while counting, so the second pass of select-by-buckets.ts is needed only when a wanted
 * order statistic falls outside them. Exact whatever the guesses.
 */

/**
 * select() for an unweighted ensemble in one pass over the values when good guesses of the
 * percentiles are at hand (e.g. the same quantity's percentiles in a recent year):
 * guess[j] ± spread[j] marks the buckets whose members are copied during the counting
 * pass. If every wanted order statistic falls in a marked bucket, those buckets are
 * sorted and read; otherwise the missing buckets are gathered by a second pass, as
 * select() does. Either way the result is exactly select()'s: guesses only change speed.
 * Returns Σ values in index order.
 */
export function selectNear(
  buffers: BucketBuffers,
  values: Float64Array,
  n: number,
  probs: ArrayLike<number>,
  out: Float64Array,
  min: number,
  max: number,
  guess: ArrayLike<number>,
  spread: ArrayLike<number>,
): number {
  if (n === 0) throw new RangeError("values must not be empty");
  if (!(max > min)) {
    for (let i = 0; i < probs.length; i++) out[i] = min;
    return 0;
  }
  const buckets = buffers.prepare(n);
  const scale = buckets / (max - min);
  const last = buckets - 1;
  if (buffers.hinted.length < buckets) buffers.hinted = new Uint8Array(buckets);
  const hinted = buffers.hinted;
  hinted.fill(0, 0, buckets);
  const ranges: number[] = [];
  for (let j = 0; j < probs.length; j++) {
    // Two buckets either side of the guess on top of its spread.
    const from = Math.max(0, Math.min(last, Math.floor((guess[j]! - spread[j]! - min) * scale) - 2));
    const to = Math.max(0, Math.min(last, Math.floor((guess[j]! + spread[j]! - min) * scale) + 2));
    if (!(from <= to)) continue; // a NaN guess marks nothing
    ranges.push(from, to);
    hinted.fill(1, from, to + 1);
  }
  if (buffers.early.length < n) buffers.early = new Float64Array(n);
  // Hinted buckets start their count at HINT_MARK, so one array both counts and says
  // which values to copy (a second array read per value measured ~30 % slower).
  const counts = buffers.counts;
  for (let r = 0; r < ranges.length; r += 2) counts.fill(HINT_MARK, ranges[r], ranges[r + 1]! + 1);
  const copied = countAndCopyHinted(values, n, min, scale, last, counts, buffers.early, buffers.tally);
  for (let r = 0; r < ranges.length; r += 2)
    for (let b = ranges[r]!; b <= ranges[r + 1]!; b++) if (counts[b]! >= HINT_MARK) counts[b]! -= HINT_MARK;
  const sum = buffers.tally[0]!;
  const wanted = wantedRanks(n, probs);
  const located = buffers.locateRanks(wanted, buckets);
  const slot = buffers.slotOfBucket;
  const wantedBuckets = buffers.wantedBuckets;
  if (wantedBuckets.some((b) => hinted[b] === 0)) buffers.gatherAndSort(values, null, n, min, scale, last);
  else {
    const cursor = buffers.bucketCursor;
    for (const b of wantedBuckets) cursor[b] = slot[b]!;
    const gathered = buffers.gathered;
    const early = buffers.early;
    for (let i = 0; i < copied; i++) {
      const v = early[i]!;
      // The counting pass's own bucket expression, so each value lands in the same bucket.
      let b = ((v - min) * scale) | 0;
      if (b > last) b = last;
      if (slot[b]! >= 0) gathered[cursor[b]!++] = v;
    }
    for (const b of wantedBuckets) gathered.subarray(slot[b], slot[b]! + counts[b]!).sort();
  }
  buffers.interpolate(n, probs, located, out);
  return sum;
}

/** Start of a hinted bucket's count: above any member count (MAX_MEMBERS is 2,000,000), far below 2^31. */
const HINT_MARK = 1 << 24;

/**
 * Counting pass that also copies each value whose bucket count started at HINT_MARK to
 * copy; writes Σ v (index order) to total[0] and returns how many were copied.
 */
function countAndCopyHinted(
  values: Float64Array,
  n: number,
  min: number,
  scale: number,
  last: number,
  counts: Int32Array,
  copy: Float64Array,
  total: Float64Array,
): number {
  let sum = 0;
  let k = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i]!;
    sum += v;
    let b = ((v - min) * scale) | 0;
    if (b > last) b = last;
    const c = counts[b]! + 1;
    counts[b] = c;
    if (c > HINT_MARK) copy[k++] = v;
  }
  total[0] = sum;
  return k;
}
