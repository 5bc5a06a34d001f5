/**
 * The share of a run's progress bar that set-up fills (validating, sampling every input,
 * building each member's propagator and each pathway's forcing) before the first year is
 * simulated. Set-up reports as it goes so a large run's progress moves from its first
 * second; without it a million-member run sat at 0 % for seconds while it sampled.
 * 0.15 is about what set-up takes of a multi-pathway run on two threads (measured, W1 at
 * 100,000 members: a third of a one-pathway run, less with each further pathway); it only
 * shapes the bar and the time-left estimate, never a number of the result.
 */
export const SETUP_SHARE = 0.15;

/** Progress of the whole run from set-up's own fraction (0–1). */
export const setupProgress = (fraction: number): number => SETUP_SHARE * Math.min(1, Math.max(0, fraction));

/** Progress of the whole run from the simulated share of its years (0–1). */
export const simulationProgress = (fraction: number): number => SETUP_SHARE + (1 - SETUP_SHARE) * Math.min(1, Math.max(0, fraction));
