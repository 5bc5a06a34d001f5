import { useMemo } from "react";
import { scaleBand, scaleLinear } from "d3";
import { AxisBottom, AxisLeftBand } from "./axes";
import { ChartFrame, DataTable } from "./chart-frame";
import { useChartWidth } from "./use-chart-width";

export interface VarianceShareRow {
  input: string;
  label: string;
  /** First-order share (0–1) of the variance of warming at the horizon. */
  share: number;
  /** Rank correlation (Spearman, weighted under a constraint) of the input with warming, –1 to 1. */
  rankCorrelation: number;
}

export const INTERACTIONS_LABEL = "Interactions (remainder)";

/** Shares as they are drawn: the inputs largest first, then what the first-order shares leave over. */
export function varianceBudget(rows: VarianceShareRow[]): { sorted: VarianceShareRow[]; sum: number; remainder: number } {
  const sorted = [...rows].sort((a, b) => b.share - a.share);
  const sum = sorted.reduce((s, r) => s + r.share, 0);
  // Estimated shares can add up to a little more than 1 by sampling noise; the remainder is then 0, never negative.
  return { sorted, sum, remainder: Math.max(0, 1 - sum) };
}

const pct = (share: number) => (share > 0 && share < 0.005 ? "< 1 %" : `${Math.round(share * 100)} %`);
const signed = (v: number) => `${v > 0 ? "+" : v < 0 ? "−" : ""}${Math.abs(v).toFixed(2)}`;

/**
 * What drives the spread of warming at one horizon: each uncertain input's first-order share
 * of the variance (a Sobol main effect, Saltelli et al. 2008, Global Sensitivity Analysis: The
 * Primer, ch. 4 — cited from memory), on one 0–100 % axis so the bars add up to at most 100 %; the rest is labelled
 * as interactions. Beside each bar, the input's rank correlation with warming, whose sign says
 * in which direction the input pushes.
 */
export function VarianceShareBars({ title, horizon, rows }: { title: string; horizon: number; rows: VarianceShareRow[] }) {
  const [ref, width] = useChartWidth<HTMLDivElement>();
  const { sorted, sum, remainder } = varianceBudget(rows);
  const labels = [...sorted.map((r) => r.label), INTERACTIONS_LABEL];
  // Wide enough for the longest input name, "Other well-mixed gases scale" (28 characters at ~6.5 px).
  const labelWidth = 190;
  const correlationWidth = 64;
  const m = { top: 22, right: 12 + correlationWidth, bottom: 44, left: labelWidth };
  const rowH = 24;
  const innerHeight = labels.length * rowH;
  const innerWidth = Math.max(10, width - m.left - m.right);
  const x = useMemo(() => scaleLinear().domain([0, 1]).range([0, innerWidth]), [innerWidth]);
  const labelKey = labels.join("\n");
  const yb = useMemo(() => scaleBand().domain(labelKey.split("\n")).range([0, innerHeight]).padding(0.25), [labelKey, innerHeight]);
  const overshoot = sum > 1;

  return (
    <ChartFrame
      title={title}
      units="% of the variance of warming (first-order share); rank correlation from –1 to 1"
      legend={[
        { label: "share explained by the input on its own", color: "var(--pl-ember-400)", kind: "swatch" },
        { label: `${INTERACTIONS_LABEL} (what the shares leave)`, color: "var(--pl-line-strong)", dash: "3 2" },
      ]}
      description={`Share of the variance of warming in ${horizon} that each input explains on its own; what the shares leave is interactions between inputs. Rank correlation beside each: its sign says which way the input pushes warming.`}
      table={
        <DataTable
          caption={title}
          columns={["Input", "Share of variance (first order)", "Rank correlation (Spearman)"]}
          rows={[...sorted.map((r) => [r.label, pct(r.share), signed(r.rankCorrelation)]), [INTERACTIONS_LABEL, pct(remainder), "–"]]}
        />
      }
    >
      <div ref={ref} className="w-full">
        <svg
          width={width}
          height={innerHeight + m.top + m.bottom}
          role="img"
          aria-label={`${title}: share of the variance of warming (%) by input, with rank correlations`}
        >
          <g transform={`translate(${m.left},${m.top})`}>
            <text x={innerWidth + 8} y={-8} className="fill-muted text-[11px]">
              Rank corr.
            </text>
            <AxisLeftBand scale={yb} labelWidth={labelWidth} />
            <AxisBottom
              scale={x}
              height={innerHeight}
              width={innerWidth}
              label="Share of the variance of warming (%)"
              ticks={5}
              format={(v) => `${Math.round(v * 100)}`}
            />
            {sorted.map((r) => (
              <g key={r.input} data-input={r.input}>
                <rect
                  data-role="share"
                  x={x(0)}
                  width={x(r.share) - x(0)}
                  y={yb(r.label)}
                  height={yb.bandwidth()}
                  fill="var(--pl-ember-400)"
                />
                <text x={x(r.share) + 4} y={yb(r.label)! + yb.bandwidth() / 2} dy="0.32em" className="fill-muted text-[11px] num">
                  {pct(r.share)}
                </text>
                <text
                  data-role="rank-correlation"
                  x={innerWidth + 8}
                  y={yb(r.label)! + yb.bandwidth() / 2}
                  dy="0.32em"
                  className="fill-text text-[11px] num"
                >
                  {signed(r.rankCorrelation)}
                </text>
              </g>
            ))}
            <g data-input="interactions">
              <rect
                data-role="share"
                x={x(0)}
                width={x(remainder) - x(0)}
                y={yb(INTERACTIONS_LABEL)}
                height={yb.bandwidth()}
                fill="none"
                stroke="var(--pl-line-strong)"
                strokeDasharray="3 2"
              />
              <text
                x={x(remainder) + 4}
                y={yb(INTERACTIONS_LABEL)! + yb.bandwidth() / 2}
                dy="0.32em"
                className="fill-muted text-[11px] num"
              >
                {pct(remainder)}
              </text>
            </g>
          </g>
        </svg>
      </div>
      {overshoot && (
        <p role="note" className="text-xs text-muted">
          The estimated first-order shares add up to {Math.round(sum * 100)} %, above 100 % only by sampling noise of the estimate: no share
          is left for interactions at this ensemble size.
        </p>
      )}
    </ChartFrame>
  );
}
