import type { PathwayResult } from "@plumeline/contracts";

/** One run's figures at one horizon, with its differences from the reference (first) run. */
export interface CompareHorizonRow {
  runLabel: string;
  pathwayName: string;
  reference: boolean;
  median: number;
  /** p95 − p5, in K. */
  width: number;
  /** Chance of warming above each threshold, 0–1, keyed by threshold ("1.5", "2"). */
  exceedance: Record<string, number>;
  /** Against the reference run; null on the reference row itself. */
  medianDiff: number | null;
  widthDiff: number | null;
  /** Percentage points (0.05 -> 5 pp). */
  exceedanceDiffPp: Record<string, number> | null;
}

export interface CompareHorizon {
  year: number;
  thresholds: string[];
  rows: CompareHorizonRow[];
}

export interface CompareInput {
  label: string;
  pathway: PathwayResult;
}

/**
 * The horizons every compared run has, each with one row per run and its differences from the
 * first run: median and 5–95 width in K, exceedance in percentage points (a difference of two
 * probabilities is in points, not a per cent of a per cent). Thresholds are those all runs report.
 */
export function compareHorizons(runs: CompareInput[]): CompareHorizon[] {
  const [ref] = runs;
  if (!ref) return [];
  const years = ref.pathway.horizons.map((h) => h.year).filter((y) => runs.every((r) => r.pathway.horizons.some((h) => h.year === y)));
  return years.map((year) => {
    const at = runs.map((r) => r.pathway.horizons.find((h) => h.year === year)!);
    const thresholds = Object.keys(at[0]!.exceedance)
      .filter((t) => at.every((h) => typeof h.exceedance[t] === "number"))
      .sort((a, b) => Number(a) - Number(b));
    const figures = at.map((h) => {
      const { p5, p50, p95 } = h.temperature;
      if (p5 === undefined || p50 === undefined || p95 === undefined)
        throw new RangeError(`horizon ${year} lacks the 5th, 50th or 95th percentile needed to compare`);
      return { median: p50, width: p95 - p5, exceedance: Object.fromEntries(thresholds.map((t) => [t, h.exceedance[t]!])) };
    });
    const base = figures[0]!;
    return {
      year,
      thresholds,
      rows: figures.map((f, i) => ({
        runLabel: runs[i]!.label,
        pathwayName: runs[i]!.pathway.name,
        reference: i === 0,
        ...f,
        medianDiff: i === 0 ? null : f.median - base.median,
        widthDiff: i === 0 ? null : f.width - base.width,
        exceedanceDiffPp: i === 0 ? null : Object.fromEntries(thresholds.map((t) => [t, (f.exceedance[t]! - base.exceedance[t]!) * 100])),
      })),
    };
  });
}

/** A signed difference for a table: "+0.12", "−0.05" (true minus sign), "0.00" when it rounds to zero. */
export function formatSigned(v: number, digits: number, unit = ""): string {
  const rounded = Number(v.toFixed(digits));
  const suffix = unit ? ` ${unit}` : "";
  if (rounded === 0) return `${(0).toFixed(digits)}${suffix}`;
  return `${rounded > 0 ? "+" : "−"}${Math.abs(rounded).toFixed(digits)}${suffix}`;
}
