/**
 * Documented limits of one run. The engine holds O(members) arrays, never members x years;
 * at 2,000,000 members W1 peaks at 719 MB RSS, 840 MB with every per-year summary, more with
 * horizons — see the measurement beside MAX_MEMBERS in the shared contracts, which hold the
 * same limit.
 */
export const MAX_MEMBERS = 2_000_000;
/** Longest pathway accepted, in years. */
export const MAX_PATHWAY_YEARS = 1000;
/**
 * Bounds on a run's lists, the same as the shared contracts': each threshold, horizon and
 * percentile multiplies the summaries computed and stored for every pathway.
 */
export const MAX_THRESHOLDS = 20;
export const MAX_HORIZONS = 20;
export const MAX_PERCENTILES = 25;
export const MAX_PATHWAYS_PER_RUN = 12;
/** Plausible calendar years of a pathway: a typo like 1e15 is refused. */
export const MIN_YEAR = 1000;
export const MAX_YEAR = 3000;
