/**
 * Member indices sorted by value, ties by index: the order weighted-spearman.ts's mid-ranks
 * and first-order-index.ts's classes take (−0 and +0 count as one value, as a comparator
 * sort on `a − b` has them). Values must not be NaN.
 *
 * Method: a least-significant-digit radix sort of each value's 64 bits made sortable as
 * unsigned integers (sign bit flipped for positives, every bit for negatives), four passes
 * of 16 bits, each pass stable and the first one starting from index order, so ties keep
 * index order. A pass whose digit is the same for every value is skipped. Why: the
 * sensitivity budget sorts every input and every horizon's warming, on the thread that
 * assembles the result while the helpers wait; a native sort of the values followed by a
 * binary search per member took ~25 ms per 100,000-member column (0.58 s of a constrained
 * three-pathway run), this takes a few.
 *
 * `scratch`: working arrays for a caller sorting many columns in turn (at 1,000,000 members
 * ~20 MB that would otherwise wait for the collector); see sortScratch. `order`: where to
 * write the result (every element is written). Cost O(n).
 */
export function sortOrder(
  values: ArrayLike<number>,
  scratch: SortScratch = sortScratch(values.length),
  order: Uint32Array = new Uint32Array(values.length),
): Uint32Array {
  const n = values.length;
  if (scratch.keys.length !== n) throw new RangeError(`scratch must be sized for ${n} values, not ${scratch.keys.length}`);
  if (order.length !== n) throw new RangeError(`order must hold ${n} members, not ${order.length}`);
  // Each value's bits as (low, high) 32-bit words, made sortable in place.
  const doubles = scratch.keys;
  for (let m = 0; m < n; m++) doubles[m] = values[m]! === 0 ? 0 : values[m]!;
  let words = new Uint32Array(doubles.buffer, doubles.byteOffset, 2 * n);
  for (let m = 0; m < n; m++) {
    const high = words[2 * m + 1]!;
    if (high >>> 31 === 1) {
      words[2 * m] = ~words[2 * m]! >>> 0;
      words[2 * m + 1] = ~high >>> 0;
    } else words[2 * m + 1] = (high | 0x80000000) >>> 0;
  }
  let members = order;
  for (let m = 0; m < n; m++) members[m] = m;
  let otherWords = scratch.otherWords;
  let otherMembers = scratch.otherMembers;
  const counts = scratch.counts;
  for (let pass = 0; pass < 4; pass++) {
    const word = pass >> 1;
    const shift = 16 * (pass & 1);
    counts.fill(0);
    for (let m = 0; m < n; m++) counts[(words[2 * m + word]! >>> shift) & 0xffff]!++;
    if (counts[(words[word]! >>> shift) & 0xffff] === n) continue; // one digit for all: order unchanged
    let start = 0;
    for (let d = 0; d < 65536; d++) {
      const count = counts[d]!;
      counts[d] = start;
      start += count;
    }
    for (let k = 0; k < n; k++) {
      const to = counts[(words[2 * k + word]! >>> shift) & 0xffff]!++;
      otherWords[2 * to] = words[2 * k]!;
      otherWords[2 * to + 1] = words[2 * k + 1]!;
      otherMembers[to] = members[k]!;
    }
    [words, otherWords] = [otherWords, words];
    [members, otherMembers] = [otherMembers, members];
  }
  if (members !== order) order.set(members);
  return order;
}

/** Working arrays of sortOrder for n values; reusable for any number of calls of that size. */
export interface SortScratch {
  /** The values' bits, n doubles (also lent out: sortOrder only needs it during a call). */
  keys: Float64Array;
  /** The other side of each radix pass: 2n words and n members. */
  otherWords: Uint32Array;
  otherMembers: Uint32Array;
  /** Per 16-bit digit, its count and then its next place. */
  counts: Int32Array;
}

/** sortOrder's working arrays for n values; `keys` may be an array the caller lends between calls. */
export function sortScratch(n: number, keys: Float64Array = new Float64Array(n)): SortScratch {
  return { keys, otherWords: new Uint32Array(2 * n), otherMembers: new Uint32Array(n), counts: new Int32Array(65536) };
}
