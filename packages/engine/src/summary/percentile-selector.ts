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
import { weightedPosition } from "./weighted-positions.js";

/**
 * n/32 buckets up to this many: about 32 members per bucket even at 1,000,000 members
 * (with 4,096 the wanted buckets held ~250 members each and W1 at 1M summarised ~40 %
 * slower); the count array (128 kB) still fits a core's L2 cache.
 */
const MAX_BUCKETS = 32768;

export class PercentileSelector {
  private counts = new Int32Array(0);
  private bucketWeights = new Float64Array(0);
  private slotOfBucket = new Int32Array(0);
  /** Scratch per bucket (write before read, so never cleared): where a bucket's run starts or is filled to. */
  private bucketStart = new Int32Array(0);
  private bucketCursor = new Int32Array(0);
  /** Buckets holding a wanted order statistic, ascending (set by locateRanks). */
  private readonly wantedBuckets: number[] = [];
  private gathered = new Float64Array(0);
  private gatheredWeights = new Float64Array(0);
  private order = new Uint32Array(0);
  private hinted = new Uint8Array(0);
  private readonly tally = new Float64Array(1);
  private early = new Float64Array(0);

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
    if (weights) return this.selectWeighted(values, n, probs, out, min, max, weights, totalWeight);
    return this.selectUnweighted(values, n, probs, out, min, max);
  }

  /**
   * select() for an unweighted ensemble in one pass over the values when good guesses of the
   * percentiles are at hand (e.g. the same quantity's percentiles in a recent year):
   * guess[j] ± spread[j] marks the buckets whose members are copied during the counting
   * pass. If every wanted order statistic falls in a marked bucket, those buckets are
   * sorted and read; otherwise the missing buckets are gathered by a second pass, as
   * select() does. Either way the result is exactly select()'s: guesses only change speed.
   * Returns Σ values in index order.
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
    if (n === 0) throw new RangeError("values must not be empty");
    if (!(max > min)) {
      for (let i = 0; i < probs.length; i++) out[i] = min;
      return 0;
    }
    const buckets = this.prepare(n);
    const scale = buckets / (max - min);
    const last = buckets - 1;
    if (this.hinted.length < buckets) this.hinted = new Uint8Array(buckets);
    const hinted = this.hinted;
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
    if (this.early.length < n) this.early = new Float64Array(n);
    // Hinted buckets start their count at HINT_MARK, so one array both counts and says
    // which values to copy (a second array read per value measured ~30 % slower).
    const counts = this.counts;
    for (let r = 0; r < ranges.length; r += 2) counts.fill(HINT_MARK, ranges[r], ranges[r + 1]! + 1);
    const copied = countAndCopyHinted(values, n, min, scale, last, counts, this.early, this.tally);
    for (let r = 0; r < ranges.length; r += 2)
      for (let b = ranges[r]!; b <= ranges[r + 1]!; b++) if (counts[b]! >= HINT_MARK) counts[b]! -= HINT_MARK;
    const sum = this.tally[0]!;
    const wanted = wantedRanks(n, probs);
    const located = this.locateRanks(wanted, buckets);
    const slot = this.slotOfBucket;
    const wantedBuckets = this.wantedBuckets;
    if (wantedBuckets.some((b) => hinted[b] === 0)) this.gatherAndSort(values, null, n, min, scale, last);
    else {
      const cursor = this.bucketCursor;
      for (const b of wantedBuckets) cursor[b] = slot[b]!;
      const gathered = this.gathered;
      const early = this.early;
      for (let i = 0; i < copied; i++) {
        const v = early[i]!;
        // The counting pass's own bucket expression, so each value lands in the same bucket.
        let b = ((v - min) * scale) | 0;
        if (b > last) b = last;
        if (slot[b]! >= 0) gathered[cursor[b]!++] = v;
      }
      for (const b of wantedBuckets) gathered.subarray(slot[b], slot[b]! + counts[b]!).sort();
    }
    this.interpolate(n, probs, located, out);
    return sum;
  }

  /**
   * Exact order statistics: out[j] = the ranks[j]-th smallest of values[0..n) (0-based),
   * as a full sort would give. min/max as for select().
   */
  orderStatistics(values: Float64Array, n: number, ranks: number[], out: Float64Array, min: number, max: number): void {
    if (!(max > min)) {
      for (let j = 0; j < ranks.length; j++) out[j] = min;
      return;
    }
    const buckets = this.prepare(n);
    const counts = this.counts;
    const scale = buckets / (max - min);
    const last = buckets - 1;
    countIntoBuckets(values, n, min, scale, last, counts);
    const located = this.locateRanks(ranks, buckets);
    this.gatherAndSort(values, null, n, min, scale, last);
    for (let j = 0; j < ranks.length; j++) out[j] = this.gathered[located[j]!]!;
  }

  private prepare(n: number): number {
    const buckets = Math.max(16, Math.min(MAX_BUCKETS, n >> 5));
    if (this.counts.length < buckets) {
      this.counts = new Int32Array(buckets);
      this.bucketWeights = new Float64Array(buckets);
      this.slotOfBucket = new Int32Array(buckets);
      this.bucketStart = new Int32Array(buckets);
      this.bucketCursor = new Int32Array(buckets);
    }
    this.counts.fill(0, 0, buckets);
    this.slotOfBucket.fill(-1, 0, buckets);
    return buckets;
  }

  private selectUnweighted(
    values: Float64Array,
    n: number,
    probs: ArrayLike<number>,
    out: Float64Array,
    min: number,
    max: number,
  ): number {
    const buckets = this.prepare(n);
    const counts = this.counts;
    const scale = buckets / (max - min);
    const last = buckets - 1;
    const sum = countIntoBuckets(values, n, min, scale, last, counts);
    const located = this.locateRanks(wantedRanks(n, probs), buckets);
    this.gatherAndSort(values, null, n, min, scale, last);
    this.interpolate(n, probs, located, out);
    return sum;
  }

  /** R-7 between the two order statistics of each percentile, read from the sorted buckets. */
  private interpolate(n: number, probs: ArrayLike<number>, located: number[], out: Float64Array): void {
    for (let j = 0; j < probs.length; j++) {
      const h = (n - 1) * probs[j]!;
      const lo = Math.floor(h);
      const value0 = this.gathered[located[2 * j]!]!;
      const value1 = this.gathered[located[2 * j + 1]!]!;
      // Same expression as d3-array quantileSorted.
      out[j] = value0 + (value1 - value0) * (h - lo);
    }
  }

  /** For each wanted rank: its index in the gathered buffer once wanted buckets are sorted. */
  private locateRanks(ranks: number[], buckets: number): number[] {
    const counts = this.counts;
    const slot = this.slotOfBucket;
    const order = ranks.map((r, i) => [r, i] as const).sort((a, b) => a[0] - b[0]);
    const bucketOfRank = new Array<number>(ranks.length);
    const rankInBucket = new Array<number>(ranks.length);
    let bucket = 0;
    let before = 0;
    for (const [rank, i] of order) {
      while (bucket < buckets - 1 && before + counts[bucket]! <= rank) before += counts[bucket++]!;
      bucketOfRank[i] = bucket;
      rankInBucket[i] = rank - before;
      slot[bucket] = 1;
    }
    // Lay the wanted buckets out one after another in the gathered buffer.
    let offset = 0;
    const start = this.bucketStart;
    this.wantedBuckets.length = 0;
    for (let b = 0; b < buckets; b++) {
      if (slot[b]! < 0) continue;
      slot[b] = offset;
      start[b] = offset;
      offset += counts[b]!;
      this.wantedBuckets.push(b);
    }
    this.ensureGathered(offset);
    return ranks.map((_, i) => start[bucketOfRank[i]!]! + rankInBucket[i]!);
  }

  private ensureGathered(size: number): void {
    if (this.gathered.length < size) {
      const grown = Math.max(size, this.gathered.length * 2, 1024);
      this.gathered = new Float64Array(grown);
      this.gatheredWeights = new Float64Array(grown);
      this.order = new Uint32Array(grown);
    }
  }

  /**
   * Copies the members of the wanted buckets into the gathered buffer and sorts each
   * bucket's stretch; with weights, the weights follow their values (ties keep member order).
   */
  private gatherAndSort(
    values: Float64Array,
    weights: Float64Array | null,
    n: number,
    min: number,
    scale: number,
    last: number,
  ): void {
    const slot = this.slotOfBucket;
    const counts = this.counts;
    const cursor = this.bucketCursor;
    const starts: Array<[number, number]> = [];
    for (let b = 0; b <= last; b++) {
      if (slot[b]! >= 0) {
        cursor[b] = slot[b]!;
        starts.push([slot[b]!, counts[b]!]);
      }
    }
    const gathered = this.gathered;
    if (weights) {
      const order = this.order;
      for (let i = 0; i < n; i++) {
        const v = values[i]!;
        let b = ((v - min) * scale) | 0;
        if (b > last) b = last;
        if (slot[b]! >= 0) order[cursor[b]!++] = i;
      }
      for (const [start, count] of starts) {
        const idx = order.subarray(start, start + count);
        // Sort member indices by value, ties by index, so weights pair deterministically.
        const sortedIdx = Array.from(idx).sort((a, b) => values[a]! - values[b]! || a - b);
        for (let k = 0; k < count; k++) {
          const m = sortedIdx[k]!;
          gathered[start + k] = values[m]!;
          this.gatheredWeights[start + k] = weights[m]!;
        }
      }
      return;
    }
    gatherWanted(values, n, min, scale, last, slot, cursor, gathered);
    for (const [start, count] of starts) gathered.subarray(start, start + count).sort();
  }

  private selectWeighted(
    values: Float64Array,
    n: number,
    probs: ArrayLike<number>,
    out: Float64Array,
    min: number,
    max: number,
    weights: Float64Array,
    totalWeight: number,
  ): number {
    const buckets = this.prepare(n);
    const counts = this.counts;
    const sums = this.bucketWeights;
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
    const slot = this.slotOfBucket;
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
      this.ensureGathered(offset);
      this.gatherAndSort(values, weights, n, min, scale, last);
      if (this.interpolateWeighted(probs, out, meanWeight, span, buckets)) return sum;
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
  private interpolateWeighted(
    probs: ArrayLike<number>,
    out: Float64Array,
    meanWeight: number,
    span: number,
    buckets: number,
  ): boolean {
    const slot = this.slotOfBucket;
    const counts = this.counts;
    const sums = this.bucketWeights;
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
        const w = this.gatheredWeights[start + k]!;
        if (w === 0) continue;
        const value = this.gathered[start + k]!;
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
}

/*
 * The two hot loops live in small functions of their own: inside the class methods V8
 * optimised them on-stack and then deoptimised at the code after the loop, over a thousand
 * times per W1 run, so most years were counted by unoptimised code.
 */

/** Counts values[0..n) into buckets floor((v − min)·scale) (the top one clamped to last); returns Σ v in index order. */
/** Ranks (0-based) each percentile reads: floor(h) and floor(h) + 1 (capped at n − 1), h = (n − 1)p. */
function wantedRanks(n: number, probs: ArrayLike<number>): number[] {
  const wanted: number[] = [];
  for (let j = 0; j < probs.length; j++) {
    const lo = Math.floor((n - 1) * probs[j]!);
    wanted.push(lo, Math.min(lo + 1, n - 1));
  }
  return wanted;
}

function countIntoBuckets(values: Float64Array, n: number, min: number, scale: number, last: number, counts: Int32Array): number {
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i]!;
    sum += v;
    const b = ((v - min) * scale) | 0;
    counts[b > last ? last : b]!++;
  }
  return sum;
}

/** Copies each value whose bucket is wanted (slot ≥ 0) to gathered[cursor[bucket]++], in index order. */
function gatherWanted(
  values: Float64Array,
  n: number,
  min: number,
  scale: number,
  last: number,
  slot: Int32Array,
  cursor: Int32Array,
  gathered: Float64Array,
): void {
  for (let i = 0; i < n; i++) {
    const v = values[i]!;
    let b = ((v - min) * scale) | 0;
    if (b > last) b = last;
    if (slot[b]! >= 0) gathered[cursor[b]!++] = v;
  }
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
