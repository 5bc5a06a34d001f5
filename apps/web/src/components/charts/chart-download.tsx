import { useState, type RefObject } from "react";
import { buildChartSvg, chartFileName, downloadPng, downloadSvg, type LegendEntry } from "./chart-export";
import { useChartSource } from "./chart-source";

/**
 * "Download SVG / PNG" for the chart inside `frame`: the chart as a file with its title, units,
 * legend and a footnote naming the run(s), model version and result hash the page provides.
 */
export function ChartDownload({
  frame,
  title,
  units,
  legend,
}: {
  frame: RefObject<HTMLElement | null>;
  title: string;
  units: string;
  legend: LegendEntry[];
}) {
  const source = useChartSource();
  const [error, setError] = useState<string | null>(null);

  function build() {
    const chart = frame.current?.querySelector<SVGSVGElement>("svg[role='img']");
    if (!chart) throw new Error("The chart is not drawn yet; show the chart, then download it");
    const footnote = [
      ...(source?.lines.length ? source.lines : ["Source not stated on this page."]),
      `Made with Plumeline on ${new Date().toISOString().slice(0, 10)}.`,
    ];
    return buildChartSvg(chart, { title, units, legend, footnote });
  }

  async function save(kind: "svg" | "png") {
    setError(null);
    try {
      const { svg, width, height } = build();
      const name = chartFileName(title, source?.fileLabel, kind);
      if (kind === "svg") downloadSvg(svg, name);
      else await downloadPng(svg, width, height, name);
    } catch (e) {
      setError(e instanceof Error ? e.message : "The chart could not be downloaded");
    }
  }

  return (
    <span className="flex items-center gap-1" role="group" aria-label={`Download “${title}”`}>
      <span className="text-xs text-muted">Download</span>
      {(["svg", "png"] as const).map((kind) => (
        <button
          key={kind}
          type="button"
          className="rounded border border-line px-2 py-0.5 text-xs text-muted hover:bg-surface-2"
          aria-label={`Download chart as ${kind.toUpperCase()}`}
          onClick={() => void save(kind)}
        >
          {kind.toUpperCase()}
        </button>
      ))}
      {error && (
        <span role="alert" className="text-xs text-danger">
          {error}
        </span>
      )}
    </span>
  );
}
