/**
 * Scratch shared by the percentile selector's three algorithms (select-by-buckets.ts,
 * select-near-guesses.ts, select-weighted.ts): per-bucket counts and weights, where each
 * wanted bucket's members go in the gathered buffer, and that buffer. Kept between calls so
 * a summariser allocates once per run.
 *
 * Buckets: B equal-width buckets over [min, max], bucket index floor((v − min)·B/(max − min))
 * (the top one clamped), monotone in v, so the buckets partition the sorted order.
 */

/**
 * n/32 buckets up to this many: about 32 members per bucket even at 1,000,000 members
 * (with 4,096 the wanted buckets held ~250 members each and W1 at 1M summarised ~40 %
 * slower); the count array (128 kB) still fits a core's L2 cache.
 */
const MAX_BUCKETS = 32768;

export class BucketBuffers {
  counts = new Int32Array(0);
  bucketWeights = new Float64Array(0);
  slotOfBucket = new Int32Array(0);
  /** Scratch per bucket (write before read, so never cleared): where a bucket's run starts or is filled to. */
  bucketStart = new Int32Array(0);
  bucketCursor = new Int32Array(0);
  /** Buckets holding a wanted order statistic, ascending (set by locateRanks). */
  readonly wantedBuckets: number[] = [];
  gathered = new Float64Array(0);
  gatheredWeights = new Float64Array(0);
  order = new Uint32Array(0);
  hinted = new Uint8Array(0);
  readonly tally = new Float64Array(1);
  early = new Float64Array(0);

  prepare(n: number): number {
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

  interpolate(n: number, probs: ArrayLike<number>, located: number[], out: Float64Array): void {
    for (let j = 0; j < probs.length; j++) {
      const h = (n - 1) * probs[j]!;
      const lo = Math.floor(h);
      const value0 = this.gathered[located[2 * j]!]!;
      const value1 = this.gathered[located[2 * j + 1]!]!;
      // Same expression as d3-array quantileSorted.
      out[j] = value0 + (value1 - value0) * (h - lo);
    }
  }

  locateRanks(ranks: number[], buckets: number): number[] {
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

  ensureGathered(size: number): void {
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
  gatherAndSort(
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
        // Member indices sorted by value, ties by index, so weights pair deterministically.
        const idx = order.subarray(start, start + count);
        sortIndicesByValue(idx, values);
        for (let k = 0; k < count; k++) {
          const m = idx[k]!;
          gathered[start + k] = values[m]!;
          this.gatheredWeights[start + k] = weights[m]!;
        }
      }
      return;
    }
    gatherWanted(values, n, min, scale, last, slot, cursor, gathered);
    for (const [start, count] of starts) gathered.subarray(start, start + count).sort();
  }
}

/** Up to this many members a bucket is sorted by insertion (a bucket holds ~32 unless the values bunch up). */
const INSERTION_SORT_MAX = 64;

/**
 * Sorts idx — member indices in ascending order, as the gathering pass lists them — by
 * values[idx], stably, so tied values keep ascending member order. Why not a comparator
 * sort: on the weighted summaries of a constrained 100,000-member run it took ~1.3 s of
 * ~9 s of CPU. A bucket of a few dozen members is sorted by insertion in place; a big one
 * (values bunched by an outlier, as in early years when most members are near zero) by a
 * native sort of its values, then each member in index order takes the next place of its
 * value. (Not statistics/sort-order.ts's radix sort: its passes run over 65,536 digits,
 * far more than a bucket's members.) Values must not be NaN.
 */
export function sortIndicesByValue(idx: Uint32Array, values: Float64Array): void {
  const count = idx.length;
  if (count > INSERTION_SORT_MAX) {
    const sorted = new Float64Array(count);
    for (let k = 0; k < count; k++) sorted[k] = values[idx[k]!]!;
    sorted.sort();
    // Per value's first place: how many of its members are placed (ties can be thousands).
    const placedAt = new Uint32Array(count);
    const placed = new Uint32Array(count);
    for (let k = 0; k < count; k++) {
      const v = values[idx[k]!]!;
      let low = 0;
      let high = count - 1;
      while (low < high) {
        const middle = (low + high) >>> 1;
        if (sorted[middle]! < v) low = middle + 1;
        else high = middle;
      }
      placed[low + placedAt[low]!++] = idx[k]!;
    }
    idx.set(placed);
    return;
  }
  for (let i = 1; i < count; i++) {
    const m = idx[i]!;
    const v = values[m]!;
    let j = i - 1;
    while (j >= 0 && values[idx[j]!]! > v) {
      idx[j + 1] = idx[j]!;
      j--;
    }
    idx[j + 1] = m;
  }
}

/** Ranks (0-based) each percentile reads: floor(h) and floor(h) + 1 (capped at n − 1), h = (n − 1)p. */
export function wantedRanks(n: number, probs: ArrayLike<number>): number[] {
  const wanted: number[] = [];
  for (let j = 0; j < probs.length; j++) {
    const lo = Math.floor((n - 1) * probs[j]!);
    wanted.push(lo, Math.min(lo + 1, n - 1));
  }
  return wanted;
}

/*
 * The two hot loops live in small functions of their own: inside the class methods V8
 * optimised them on-stack and then deoptimised at the code after the loop, over a thousand
 * times per W1 run, so most years were counted by unoptimised code.
 */

/** Counts values[0..n) into buckets floor((v − min)·scale) (the top one clamped to last); returns Σ v in index order. */
export function countIntoBuckets(values: Float64Array, n: number, min: number, scale: number, last: number, counts: Int32Array): number {
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

