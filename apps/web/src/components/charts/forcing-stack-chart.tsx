import { useMemo } from "react";
import { area, line, scaleLinear, stack, stackOffsetDiverging, stackOrderNone } from "d3";
import { AxisBottom, AxisLeft } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { DEFAULT_MARGINS, innerSize } from "./margins";
import { agentColor } from "./palette";
import { useChartWidth } from "./use-chart-width";

export interface AgentSeries {
  agent: string;
  label: string;
  /** Effective radiative forcing per year (W m-2). */
  values: number[];
}

/**
 * Forcing by agent over time, stacked: warming agents pile up above zero and cooling agents
 * below (diverging offset), with the net total drawn as a line on top.
 */
export function ForcingStackChart({
  title,
  years,
  agents,
  height = 340,
}: {
  title: string;
  years: number[];
  agents: AgentSeries[];
  height?: number;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const m = DEFAULT_MARGINS;
  const { innerWidth, innerHeight } = innerSize(width, height, m);
  const rows = useMemo(() => years.map((_, k) => Object.fromEntries(agents.map((a) => [a.agent, a.values[k] ?? 0]))), [years, agents]);
  const total = useMemo(() => years.map((_, k) => agents.reduce((s, a) => s + (a.values[k] ?? 0), 0)), [years, agents]);
  const layers = useMemo(
    () =>
      stack<Record<string, number>>()
        .keys(agents.map((a) => a.agent))
        .offset(stackOffsetDiverging)
        .order(stackOrderNone)(rows),
    [rows, agents],
  );
  const lo = Math.min(0, ...layers.flatMap((l) => l.map((d) => d[0])));
  const hi = Math.max(0, ...layers.flatMap((l) => l.map((d) => d[1])));
  const x = useMemo(
    () =>
      scaleLinear()
        .domain([years[0]!, years[years.length - 1]!])
        .range([0, innerWidth]),
    [years, innerWidth],
  );
  const y = useMemo(() => scaleLinear().domain([lo, hi]).range([innerHeight, 0]).nice(), [lo, hi, innerHeight]);
  const labelOf = new Map(agents.map((a) => [a.agent, a.label]));

  return (
    <ChartFrame
      title={title}
      units="W m-2 (effective radiative forcing)"
      legend={[
        ...agents.map((a) => ({ label: a.label, color: agentColor(a.agent), kind: "swatch" as const })),
        { label: "Total", color: "var(--pl-ink)" },
      ]}
      description="Stacked effective radiative forcing by agent (warming above zero, cooling below); the line is the net total."
      table={
        <DataTable
          caption={title}
          columns={["Year", ...agents.map((a) => `${a.label} (W m-2)`), "Total (W m-2)"]}
          rows={years
            .map((yr, k) => ({ yr, k }))
            .filter(({ yr, k }) => yr % 10 === 0 || k === years.length - 1)
            .map(({ yr, k }) => [yr, ...agents.map((a) => (a.values[k] ?? 0).toFixed(3)), total[k]!.toFixed(3)])}
        />
      }
    >
      <div className="flex flex-wrap gap-x-3 gap-y-1 text-xs">
        {agents.map((a) => (
          <span key={a.agent} className="flex items-center gap-1.5">
            <span aria-hidden className="h-2.5 w-2.5 rounded-sm" style={{ background: agentColor(a.agent) }} />
            {a.label}
          </span>
        ))}
        <span className="flex items-center gap-1.5">
          <span aria-hidden className="h-0.5 w-4 bg-ink" /> Total
        </span>
      </div>
      <div ref={ref} className="w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: forcing (W m-2) against year`}>
          <g transform={`translate(${m.left},${m.top})`}>
            <AxisLeft scale={y} width={innerWidth} label="Effective radiative forcing (W m-2)" />
            <AxisBottom scale={x} height={innerHeight} width={innerWidth} label="Year" ticks={Math.max(2, Math.floor(innerWidth / 80))} />
            {layers.map((layer) => (
              <path
                key={layer.key}
                data-agent={layer.key}
                d={
                  area<(typeof layer)[number]>()
                    .x((_, k) => x(years[k]!))
                    .y0((d) => y(d[0]))
                    .y1((d) => y(d[1]))(layer) ?? ""
                }
                fill={agentColor(layer.key)}
                fillOpacity={0.85}
              >
                <title>{labelOf.get(layer.key)}</title>
              </path>
            ))}
            <path
              data-role="total"
              d={
                line<number>()
                  .x((_, k) => x(years[k]!))
                  .y((v) => y(v))(total) ?? ""
              }
              fill="none"
              stroke="var(--pl-ink)"
              strokeWidth={1.8}
            />
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
