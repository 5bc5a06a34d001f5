import type { Run } from "@plumeline/contracts";

/** Every run states its baseline in its spec; older specs without one used the default. */
const DEFAULT_BASELINE: [number, number] = [1850, 1900];

export function runBaseline(run: Run | undefined): [number, number] | undefined {
  if (!run) return undefined;
  const spec = (run.manifest.spec ?? {}) as { baseline?: [number, number] };
  return spec.baseline ?? DEFAULT_BASELINE;
}

/**
 * The warming axis label for two runs drawn on one scale. With one shared baseline the axis
 * names it, as the run page does; with two different baselines the anomalies are measured
 * from different zeros, so the label says so and `mismatch` asks the view to warn.
 */
export function compareAxis(a: [number, number] | undefined, b: [number, number] | undefined): { label: string; mismatch: boolean } {
  if (!a || !b) return { label: "Warming above baseline (K)", mismatch: false };
  if (a[0] === b[0] && a[1] === b[1]) return { label: `Warming above ${a[0]}–${a[1]} (K)`, mismatch: false };
  return { label: "Warming above each run's baseline (K)", mismatch: true };
}
