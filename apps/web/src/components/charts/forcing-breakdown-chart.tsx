import { useMemo } from "react";
import { scaleBand, scaleLinear } from "d3";
import { AxisBottom, AxisLeftBand } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { agentColor } from "./palette";
import { useChartWidth } from "./use-chart-width";

export interface AgentForcing {
  agent: string;
  label: string;
  p5: number;
  p50: number;
  p95: number;
}

/**
 * Effective radiative forcing by agent at one year: a bar to the median, a bracket from
 * 5 % to 95 %. Warming agents extend right of zero, cooling agents left.
 */
export function ForcingBreakdownChart({
  title,
  year,
  agents,
  total,
}: {
  title: string;
  year: number;
  agents: AgentForcing[];
  total?: AgentForcing;
}) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const rows = useMemo(() => (total ? [...agents, total] : agents), [agents, total]);
  const labelWidth = 150;
  const m = { top: 8, right: 20, bottom: 44, left: labelWidth };
  const rowH = 26;
  const height = m.top + m.bottom + rows.length * rowH;
  const innerWidth = Math.max(10, width - m.left - m.right);
  const innerHeight = rows.length * rowH;
  const lo = Math.min(0, ...rows.map((r) => r.p5));
  const hi = Math.max(0, ...rows.map((r) => r.p95));
  const x = useMemo(() => scaleLinear().domain([lo, hi]).range([0, innerWidth]).nice(), [lo, hi, innerWidth]);
  const yb = useMemo(
    () =>
      scaleBand()
        .domain(rows.map((r) => r.label))
        .range([0, innerHeight])
        .padding(0.3),
    [rows, innerHeight],
  );

  return (
    <ChartFrame
      title={title}
      units="W m-2 (effective radiative forcing)"
      legend={[
        ...rows.map((r) => ({
          label: r.label,
          color: total && r === total ? "var(--pl-ink)" : agentColor(r.agent),
          kind: "swatch" as const,
        })),
        { label: "5th–95th percentile bracket (bars are medians)", color: "var(--pl-ink)" },
      ]}
      description={`Effective radiative forcing in ${year}: median bar with its 5–95 % bracket.`}
      table={
        <DataTable
          caption={title}
          columns={["Agent", "5 % (W m-2)", "median (W m-2)", "95 % (W m-2)"]}
          rows={rows.map((r) => [r.label, r.p5.toFixed(3), r.p50.toFixed(3), r.p95.toFixed(3)])}
        />
      }
    >
      <div ref={ref} className="w-full">
        <svg width={width} height={height} role="img" aria-label={`${title}: forcing (W m-2) by agent`}>
          <g transform={`translate(${m.left},${m.top})`}>
            {x.ticks(6).map((t) => (
              <line key={t} x1={x(t)} x2={x(t)} y2={innerHeight} stroke="var(--pl-line)" strokeDasharray={t === 0 ? undefined : "2 3"} />
            ))}
            <AxisLeftBand scale={yb} labelWidth={labelWidth} />
            <AxisBottom scale={x} height={innerHeight} width={innerWidth} label="Effective radiative forcing (W m-2)" ticks={6} />
            {rows.map((r) => {
              const top = yb(r.label)!;
              const bw = yb.bandwidth();
              const isTotal = total && r === total;
              return (
                <g key={r.agent} data-agent={r.agent}>
                  <rect
                    data-role="median-bar"
                    x={Math.min(x(0), x(r.p50))}
                    width={Math.abs(x(r.p50) - x(0))}
                    y={top}
                    height={bw}
                    fill={isTotal ? "var(--pl-ink)" : agentColor(r.agent)}
                    fillOpacity={isTotal ? 0.8 : 0.85}
                  />
                  <g data-role="bracket" stroke="var(--pl-ink)" strokeWidth={1.3}>
                    <line x1={x(r.p5)} x2={x(r.p95)} y1={top + bw / 2} y2={top + bw / 2} />
                    <line x1={x(r.p5)} x2={x(r.p5)} y1={top + 2} y2={top + bw - 2} />
                    <line x1={x(r.p95)} x2={x(r.p95)} y1={top + 2} y2={top + bw - 2} />
                  </g>
                </g>
              );
            })}
          </g>
        </svg>
      </div>
    </ChartFrame>
  );
}
