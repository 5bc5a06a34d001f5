import { AGENT_LABELS, FORCING_AGENTS, type ForcingAgent, type HorizonResult, type PathwayResult } from "@plumeline/contracts";
import type { AgentForcing } from "@/components/charts/forcing-breakdown-chart";
import type { FanSeries } from "@/components/charts/fan-chart";
import { crossingBins, crossingBinsPerYear, type CrossingDistribution } from "@/components/charts/crossing-histogram";
import type { ExceedanceCurve } from "@/components/charts/exceedance-chart";
import type { SensitivityBar } from "@/components/charts/sensitivity-bars";
import type { VarianceShareRow } from "@/components/charts/variance-share-bars";
import { inputLabel } from "@/lib/input-labels";

/**
 * Turns the engine's result JSON into the plain arrays the charts take. The fan chart needs
 * the five standard percentiles; a run that asked for others still shows its table.
 */
const FAN_KEYS = ["p5", "p17", "p50", "p83", "p95"] as const;

export function hasFanPercentiles(series: Record<string, number[]>): boolean {
  return FAN_KEYS.every((k) => Array.isArray(series[k]));
}

export function toFanSeries(p: PathwayResult, quantity: "temperature" | "forcing" | "imbalance" = "temperature"): FanSeries {
  const s = p[quantity];
  return { id: p.id, name: p.name, years: p.years, p5: s.p5!, p17: s.p17!, p50: s.p50!, p83: s.p83!, p95: s.p95! };
}

/**
 * The result page's fan series: the pathway in focus keeps filled bands; every other one shows
 * only its median by default (with many pathways, outlined bands became a tangle of lines),
 * or its bands as outlines (edges, dashed median) when `otherBands` is asked for.
 */
export function toFocusedFanSeries(pathways: PathwayResult[], focusId: string, otherBands = false): FanSeries[] {
  return pathways.map((p) => ({ ...toFanSeries(p), treatment: p.id === focusId ? "filled" : otherBands ? "outline" : "median" }));
}

export function toExceedanceCurves(p: PathwayResult): ExceedanceCurve[] {
  return Object.entries(p.exceedance)
    .map(([threshold, probability]) => ({ threshold: Number(threshold), probability }))
    .sort((a, b) => a.threshold - b.threshold);
}

/**
 * A threshold's first-crossing distribution for the histogram. When the result carries
 * per-year first-crossing shares (`crossingShare`, newer engines) the bars are those years;
 * otherwise the members between consecutive percentiles are spread evenly over their years.
 */
export function toCrossing(p: PathwayResult, threshold: string): CrossingDistribution {
  const c = p.crossing[threshold] ?? {};
  const percentiles: Record<string, number | null> = {};
  for (const [k, v] of Object.entries(c)) if (/^p\d/.test(k)) percentiles[k] = v;
  const perYear = p.crossingShare?.[threshold];
  const usePerYear = Array.isArray(perYear) && perYear.length === p.years.length;
  return {
    threshold: Number(threshold),
    percentiles,
    never: c.never ?? 0,
    lastYear: p.years.at(-1),
    bins: usePerYear ? crossingBinsPerYear(p.years, perYear) : crossingBins(percentiles),
    binSource: usePerYear ? "per-year" : "percentiles",
  };
}

export function toAgentForcing(h: HorizonResult): { agents: AgentForcing[]; total: AgentForcing | undefined } {
  const agents = FORCING_AGENTS.filter((a) => h.forcingByAgent[a]).map((a: ForcingAgent) => {
    const set = h.forcingByAgent[a]!;
    return { agent: a, label: AGENT_LABELS[a], p5: set.p5 ?? set.p50!, p50: set.p50!, p95: set.p95 ?? set.p50! };
  });
  const f = h.forcing;
  const total = f.p50 !== undefined ? { agent: "total", label: "Total", p5: f.p5 ?? f.p50, p50: f.p50, p95: f.p95 ?? f.p50 } : undefined;
  return { agents, total };
}

export function toSensitivityBars(p: PathwayResult, horizon: number): SensitivityBar[] {
  return p.sensitivity.filter((s) => s.horizon === horizon).map((s) => ({ input: s.input, label: inputLabel(s.input), index: s.index }));
}

/**
 * The variance budget at a horizon, or null when the result predates variance shares (engines
 * before 0.3.0 gave rank correlations only) — then the page falls back to the correlations.
 */
export function toVarianceShareRows(p: PathwayResult, horizon: number): VarianceShareRow[] | null {
  const entries = p.sensitivity.filter((s) => s.horizon === horizon);
  if (entries.length === 0 || entries.some((s) => s.varianceShare === undefined)) return null;
  return entries.map((s) => ({ input: s.input, label: inputLabel(s.input), share: s.varianceShare!, rankCorrelation: s.index }));
}

/** Sorted percentile keys of a set: ["p5", "p17", "p50", …]. */
export function percentileKeys(set: Record<string, unknown>): string[] {
  return Object.keys(set)
    .filter((k) => /^p\d+(\.\d+)?$/.test(k))
    .sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
}
