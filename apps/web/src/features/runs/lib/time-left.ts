/** One observation of a run's progress (0–1) at a time in ms (the browser's clock). */
export interface ProgressSample {
  at: number;
  progress: number;
}

/**
 * Seconds left, from the rate seen since the first observation: (1 − p) / rate, where rate =
 * (p − p₀) / (t − t₀). Both samples come from this browser's clock, so a server clock that is
 * off does not skew it. Null until there is enough to go on: at least 2 s watched and some
 * progress made, and never once the run has finished.
 */
export function secondsLeft(first: ProgressSample | null, latest: ProgressSample): number | null {
  if (!first || latest.progress >= 1) return null;
  const watchedMs = latest.at - first.at;
  const moved = latest.progress - first.progress;
  if (watchedMs < 2000 || moved <= 0) return null;
  return ((1 - latest.progress) * watchedMs) / moved / 1000;
}

/** "about 40 s", "about 3 min", "less than 5 s" — an estimate, worded as one. */
export function formatTimeLeft(seconds: number): string {
  if (seconds < 5) return "less than 5 s left";
  if (seconds < 90) return `about ${Math.round(seconds / 5) * 5} s left`;
  return `about ${Math.round(seconds / 60)} min left`;
}
