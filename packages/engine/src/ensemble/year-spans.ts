/**
 * How many reported years the simulation writes before they are summarised (a "span"), so
 * each member block can run through several years while its inputs are in cache
 * (advance-year.ts). The slots of a span hold 3 values per member-year (anomaly, forcing,
 * imbalance); the span shrinks with the ensemble so those slots stay within RING_BYTES
 * (memory stays O(members), never members × all years). 192 MiB: W1 at 1,000,000 members
 * gets spans of 4 years (2 at 128 MiB, ~25 % slower) with a peak RSS near 790 MB.
 */
const RING_BYTES = 192 * 2 ** 20;
export const MAX_SPAN_YEARS = 16;

/** Years per span for `members`, with `spansInRing` spans of slots held at once. */
export function spanYears(members: number, spansInRing: number): number {
  const fit = Math.floor(RING_BYTES / (3 * 8 * members * spansInRing));
  return Math.max(1, Math.min(MAX_SPAN_YEARS, fit));
}
