import { createContext, useContext, type ReactNode } from "react";

/**
 * Where the charts on a page come from, for the footnote of every downloaded chart: one line
 * per run (its name, model version and result hash), so a chart pasted into a board pack
 * still says which result it shows. Pages provide it; charts never fetch it.
 */
export interface ChartSource {
  /** Footnote lines, one per run (or per input, on pages that show no run). */
  lines: string[];
  /** Short name put into downloaded file names (the run's name), if any. */
  fileLabel?: string;
}

const ChartSourceContext = createContext<ChartSource | null>(null);

export function ChartSourceProvider({ source, children }: { source: ChartSource; children: ReactNode }) {
  return <ChartSourceContext.Provider value={source}>{children}</ChartSourceContext.Provider>;
}

export function useChartSource(): ChartSource | null {
  return useContext(ChartSourceContext);
}

/** The footnote line for one run: name, model version name and number, result hash. */
export function runSourceLine(
  run: { name: string; modelVersion: { name: string; versionNumber: number } },
  resultHash: string,
  exploratory = false,
): string {
  return `Run “${run.name}” · model version ${run.modelVersion.name} v${run.modelVersion.versionNumber}${exploratory ? " (exploratory)" : ""} · result hash ${resultHash}`;
}
