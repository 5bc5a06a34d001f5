/**
 * How many reported years the simulation writes before they are summarised (a "span"), so
 * each member block can run through several years while its inputs are in cache
 * (advance-year.ts). The slots of a span hold 3 values per member-year (anomaly, forcing,
 * imbalance): at most MAX_SPAN_YEARS years and at most RING_BYTES (memory stays
 * O(members), never members × all years). Every thread simulates a span, then summarises
 * its years, then moves to the next span; one span of slots exists at a time.
 *
 * Why 8 years (measured, W1 at 100,000 members on 2 cores): with 16-year spans held twice
 * (so that threads could simulate the next span while others summarised the last) the
 * slots were 32 arrays of 800 kB, whose first touch costs a page fault per 4 kB (about 11 µs
 * each on these machines); spans of 4 or 8 years ran W1 as fast with a third fewer page
 * faults, and one span of 8 years as fast as two of 4 (0.571–0.632 s against 0.583–0.683 s,
 * interleaved, load ~3.7): the threads' wait at the end of a span is a year's summary at most.
 *
 * Why 48 MiB: it caps the span only above ~260,000 members. A 1,000,000-member run with every
 * summary on gets spans of 2 years and 46 MiB of slots (against 4 years and 183 MiB before
 * this round): it has to fit in 1 GiB with the API server around it. Measured, W1 at
 * 1,000,000 members on 2 cores (busy machine, load 3–4): spans of 2 years ~4–6 % slower than
 * spans of 4. The span changes no number: each year is summarised the same way whatever
 * the span.
 */
const RING_BYTES = 48 * 2 ** 20;
const MAX_SPAN_YEARS = 8;

/** Years the first pass runs each member block through at a time (it writes no slots). */
export const BASELINE_SPAN_YEARS = 16;

/** Years per span for `members`. */
export function spanYears(members: number): number {
  const fit = Math.floor(RING_BYTES / (3 * 8 * members));
  return Math.max(1, Math.min(MAX_SPAN_YEARS, fit));
}
