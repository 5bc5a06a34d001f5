/**
 * Documented limits of one run. 2,000,000 members keeps engine memory well under 1 GiB
 * (the engine holds O(members) arrays, never members x years); the same limit is in the
 * shared contracts (MAX_MEMBERS).
 */
export const MAX_MEMBERS = 2_000_000;
/** Longest pathway accepted, in years. */
export const MAX_PATHWAY_YEARS = 1000;
