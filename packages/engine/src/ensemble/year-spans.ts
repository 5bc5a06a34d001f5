/**
 * How many reported years the simulation writes before they are summarised (a "span"), so
 * each member block can run through several years while its inputs are in cache
 * (advance-year.ts). The slots of a span hold 3 values per member-year (anomaly, forcing,
 * imbalance); the ring of slots holds at most MAX_RING_YEARS years over all its spans and
 * at most RING_BYTES (memory stays O(members), never members × all years).
 *
 * Why 8 years (measured, W1 at 100,000 members on 2 cores): with 16-year spans the slots
 * were 32 arrays of 800 kB on two threads, whose first touch costs a page fault per 4 kB
 * (about 11 µs each on these machines), while spans of 4 or 8 years ran W1 as fast (one
 * thread and two) with a third fewer page faults.
 *
 * Why 96 MiB: it caps the ring only above ~520,000 members on two threads (spans of 4 years
 * up to there, so W1 at 100,000 members is as before). A 1,000,000-member run with every
 * summary on then gets spans of 2 years and 92 MiB of slots, against 4 years and 183 MiB at
 * 192 MiB: 92 MiB less in a million-member API run, which has to fit in 1 GiB with the
 * server around it. Measured, W1 at 1,000,000 members on 2 cores, pairs of runs (busy
 * machine, load 3–4): 3.47 and 3.48 s against 3.29 and 3.34 s at 192 MiB, ~4–6 % slower.
 * The span changes no number: each year is summarised the same way whatever the span.
 */
const RING_BYTES = 96 * 2 ** 20;
const MAX_RING_YEARS = 8;

/** Years the first pass runs each member block through at a time (it writes no slots). */
export const BASELINE_SPAN_YEARS = 16;

/** Years per span for `members`, with `spansInRing` spans of slots held at once. */
export function spanYears(members: number, spansInRing: number): number {
  const fit = Math.floor(RING_BYTES / (3 * 8 * members * spansInRing));
  return Math.max(1, Math.min(Math.floor(MAX_RING_YEARS / spansInRing), fit));
}
