/**
 * Documented limits of one run. The engine holds O(members) arrays, never members x years;
 * at 2,000,000 members W1 peaks at 719 MB RSS, 840 MB with every per-year summary, more with
 * horizons — see the measurement beside MAX_MEMBERS in the shared contracts, which hold the
 * same limit.
 */
export const MAX_MEMBERS = 2_000_000;
/** Longest pathway accepted, in years. */
export const MAX_PATHWAY_YEARS = 1000;
