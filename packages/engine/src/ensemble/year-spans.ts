/**
 * How many reported years the simulation writes before they are summarised (a "span"), so
 * each member block can run through several years while its inputs are in cache
 * (advance-year.ts). The slots of a span hold 3 values per member-year (anomaly, forcing,
 * imbalance); the span shrinks with the ensemble so those slots stay within RING_BYTES
 * (memory stays O(members), never members × all years). 96 MiB: up to ~200,000 members the
 * span is the full 16 years (so W1 at 100,000 members is as before); a run of 1,000,000
 * members with every summary on gets spans of 2 years and 92 MiB of slots, against 4 years
 * and 183 MiB at 192 MiB. Measured (W1 at 1,000,000 members, 2 cores, medians of 3
 * interleaved): ~4 % slower than spans of 4, for 92 MiB less in a million-member API run,
 * which has to fit in 1 GiB with the server around it. The span changes no number (each
 * year is summarised the same way whatever the span).
 */
const RING_BYTES = 96 * 2 ** 20;
export const MAX_SPAN_YEARS = 16;

/** Years per span for `members`, with `spansInRing` spans of slots held at once. */
export function spanYears(members: number, spansInRing: number): number {
  const fit = Math.floor(RING_BYTES / (3 * 8 * members * spansInRing));
  return Math.max(1, Math.min(MAX_SPAN_YEARS, fit));
}
