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
 * thread and two) with a third fewer page faults. 192 MiB: W1 at 1,000,000 members gets
 * spans of 4 years on two threads (2 at 128 MiB, ~25 % slower).
 */
const RING_BYTES = 192 * 2 ** 20;
const MAX_RING_YEARS = 8;

/** Years the first pass runs each member block through at a time (it writes no slots). */
export const BASELINE_SPAN_YEARS = 16;

/** Years per span for `members`, with `spansInRing` spans of slots held at once. */
export function spanYears(members: number, spansInRing: number): number {
  const fit = Math.floor(RING_BYTES / (3 * 8 * members * spansInRing));
  return Math.max(1, Math.min(Math.floor(MAX_RING_YEARS / spansInRing), fit));
}
