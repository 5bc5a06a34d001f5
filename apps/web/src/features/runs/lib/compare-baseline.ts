import type { Run } from "@plumeline/contracts";

/** Every run states its baseline in its spec; older specs without one used the default. */
const DEFAULT_BASELINE: [number, number] = [1850, 1900];

export function runBaseline(run: Run | undefined): [number, number] | undefined {
  if (!run) return undefined;
  const spec = (run.manifest.spec ?? {}) as { baseline?: [number, number] };
  return spec.baseline ?? DEFAULT_BASELINE;
}

/**
 * The warming axis label for runs drawn on one scale. With one shared baseline the axis
 * names it, as the run page does; with different baselines the anomalies are measured
 * from different zeros, so the label says so and `mismatch` asks the view to warn.
 */
export function compareAxis(...baselines: Array<[number, number] | undefined>): { label: string; mismatch: boolean } {
  if (baselines.length === 0 || baselines.some((b) => !b)) return { label: "Warming above baseline (K)", mismatch: false };
  const [first] = baselines as Array<[number, number]>;
  if (baselines.every((b) => b![0] === first![0] && b![1] === first![1]))
    return { label: `Warming above ${first![0]}–${first![1]} (K)`, mismatch: false };
  return { label: "Warming above each run's baseline (K)", mismatch: true };
}

/**
 * The years the compared runs' charts span: from the earliest baseline start (where the run
 * page's charts start; nothing before it is an anomaly anyone asked about) to the last year
 * every run has. Each run's first year bounds it too, so no axis starts before any data.
 */
export function compareYears(runs: Array<{ years: number[]; baseline?: [number, number] }>): [number, number] {
  if (runs.length === 0) throw new RangeError("compareYears needs at least one run");
  const firstData = Math.max(...runs.map((r) => r.years[0]!));
  const baselineStart = Math.min(...runs.map((r) => r.baseline?.[0] ?? r.years[0]!));
  const to = Math.min(...runs.map((r) => r.years.at(-1)!));
  return [Math.max(firstData, baselineStart), to];
}
