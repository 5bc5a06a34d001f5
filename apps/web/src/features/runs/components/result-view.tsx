import { useEffect, useLayoutEffect, useMemo, useState } from "react";
import type { Run, RunResult } from "@plumeline/contracts";
import { FanChart } from "@/components/charts/fan-chart";
import { ExceedanceChart } from "@/components/charts/exceedance-chart";
import { CrossingHistogram } from "@/components/charts/crossing-histogram";
import { ForcingBreakdownChart } from "@/components/charts/forcing-breakdown-chart";
import { SensitivityBars } from "@/components/charts/sensitivity-bars";
import { VarianceShareBars } from "@/components/charts/variance-share-bars";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Cautions } from "@/components/ui/cautions";
import { PanelErrorBoundary } from "@/components/ui/panel-error-boundary";
import { Segmented } from "@/components/ui/segmented";
import { EmptyState } from "@/components/ui/states";
import { RESULT_ARRIVED_MARK } from "../api/get-run-result";
import { hasFanPercentiles, toAgentForcing, toCrossing, toExceedanceCurves, toFocusedFanSeries, toSensitivityBars, toVarianceShareRows } from "../lib/result-adapters";
import { ConstraintPanel } from "./constraint-panel";
import { HorizonTable } from "./horizon-table";

export const CHARTS_RENDERED_MARK = "plumeline:charts-rendered";
export const RESULT_TO_CHARTS_MEASURE = "plumeline:result-to-charts";

interface RunSpecShape {
  baseline?: [number, number];
  model?: { constraint?: { from: number; to: number; observed: number; sd: number } | null };
}

/**
 * Records how long the charts took to appear after the result arrived: a mark once the DOM
 * holds every chart (layout effect) and a measure from the arrival mark, exposed on
 * window.__plumelinePerf for the browser check.
 */
function useRenderTiming(runId: string) {
  useLayoutEffect(() => {
    const arrived = performance.getEntriesByName(RESULT_ARRIVED_MARK, "mark").at(-1);
    if (!arrived) return;
    performance.mark(CHARTS_RENDERED_MARK);
    const measure = performance.measure(RESULT_TO_CHARTS_MEASURE, RESULT_ARRIVED_MARK, CHARTS_RENDERED_MARK);
    // Also after the next paint, which is what a user sees.
    requestAnimationFrame(() =>
      setTimeout(() => {
        const painted = performance.now() - arrived.startTime;
        (window as unknown as { __plumelinePerf?: unknown }).__plumelinePerf = { runId, domMs: measure.duration, paintedMs: painted };
        performance.clearMarks(RESULT_ARRIVED_MARK);
      }, 0),
    );
  }, [runId]);
}

export function ResultView({ run, result }: { run: Run; result: RunResult }) {
  useRenderTiming(run.id);
  const spec = (run.manifest.spec ?? {}) as RunSpecShape;
  const baseline = spec.baseline ?? [1850, 1900];
  const constraint = spec.model?.constraint ?? null;
  const [pathwayId, setPathwayId] = useState(result.pathways[0]?.id ?? "");
  const [otherBands, setOtherBands] = useState(false);
  const pathway = result.pathways.find((p) => p.id === pathwayId) ?? result.pathways[0];
  const horizons = useMemo(() => pathway?.horizons.map((h) => h.year) ?? [], [pathway]);
  const [horizon, setHorizon] = useState<number>(horizons.at(-1) ?? 0);
  const thresholds = pathway ? Object.keys(pathway.crossing).sort((a, b) => Number(a) - Number(b)) : [];
  const [threshold, setThreshold] = useState(thresholds[1] ?? thresholds[0] ?? "");
  useEffect(() => {
    if (!horizons.includes(horizon) && horizons.length) setHorizon(horizons.at(-1)!);
  }, [horizons, horizon]);

  if (!pathway) return <EmptyState title="This result holds no pathways" />;
  const fanReady = result.pathways.every((p) => hasFanPercentiles(p.temperature));
  const h = pathway.horizons.find((x) => x.year === horizon) ?? pathway.horizons.at(-1);
  const forcing = h ? toAgentForcing(h) : null;
  const shares = toVarianceShareRows(pathway, horizon);
  const baselineLabel = `${baseline[0]}–${baseline[1]}`;

  return (
    <div className="flex flex-col gap-6">
      <Cautions />
      {result.pathways.length > 1 && (
        <div className="flex flex-wrap items-center gap-3">
          <span className="text-sm font-medium text-ink">Pathway in focus</span>
          <Segmented label="Pathway" value={pathway.id} onChange={setPathwayId} options={result.pathways.map((p) => ({ value: p.id, label: p.name }))} />
          <span className="text-xs text-muted">filled in the chart; the tables and panels below show it</span>
          <label className="flex items-center gap-1.5 text-xs text-muted">
            <input type="checkbox" checked={otherBands} onChange={(e) => setOtherBands(e.target.checked)} />
            Show the other pathways' bands
          </label>
        </div>
      )}
      <Card>
        <CardHeader
          title="Warming over time"
          subtitle={`Global mean surface temperature anomaly against ${baselineLabel}, ${result.members.toLocaleString("en-GB")} members${
            constraint ? `, weighted by observed warming ${constraint.from}–${constraint.to} (effective members ${Math.round(result.effectiveMembers).toLocaleString("en-GB")})` : ""
          }.`}
        />
        <CardBody>
          <PanelErrorBoundary resetKey={result.resultHash}>
            {fanReady ? (
              <FanChart
                title={`Warming above ${baselineLabel} (K)`}
                series={toFocusedFanSeries(result.pathways, pathway.id, otherBands)}
                description={
                  result.pathways.length > 1
                    ? `Filled: ${pathway.name} (in focus), median line with 17th–83rd and 5th–95th percentile bands. ${
                        otherBands ? "Outlined: the other pathways — solid edges 17th–83rd, dotted edges 5th–95th percentile, dashed median." : "Lines: the other pathways' medians."
                      } Hover or use arrow keys to read a year.`
                    : undefined
                }
                yLabel={`Warming above ${baselineLabel} (K)`}
                unit="K"
                fromYear={baseline[0]}
                thresholds={thresholds.map(Number)}
                observedWindow={constraint ? { from: constraint.from, to: constraint.to, observed: constraint.observed, sd: constraint.sd } : null}
                height={400}
              />
            ) : (
              <EmptyState title="No fan chart for these percentiles">The fan chart needs the 5/17/50/83/95 percentiles; the tables below show what the run asked for.</EmptyState>
            )}
          </PanelErrorBoundary>
        </CardBody>
      </Card>

      <Card>
        <CardHeader title={`Horizons — ${pathway.name}`} subtitle="Percentiles of warming (K); small figures give the ± half-width of each percentile's 95 % Monte Carlo interval." />
        <CardBody>
          <HorizonTable pathway={pathway} />
        </CardBody>
      </Card>

      <div className="grid gap-6 xl:grid-cols-2">
        <Card>
          <CardBody>
            <PanelErrorBoundary resetKey={pathway.id}>
              <ExceedanceChart title={`Chance of exceeding each threshold — ${pathway.name}`} years={pathway.years} curves={toExceedanceCurves(pathway)} fromYear={baseline[0]} />
            </PanelErrorBoundary>
          </CardBody>
        </Card>
        <Card>
          <CardBody>
            <div className="mb-3 flex items-center gap-2">
              <span className="text-xs text-muted">Threshold</span>
              <Segmented label="Threshold" value={threshold} onChange={setThreshold} options={thresholds.map((t) => ({ value: t, label: `${t} K` }))} />
            </div>
            <PanelErrorBoundary resetKey={`${pathway.id}-${threshold}`}>
              {threshold && <CrossingHistogram title={`First year above ${threshold} K — ${pathway.name}`} crossing={toCrossing(pathway, threshold)} />}
            </PanelErrorBoundary>
            <p className="mt-2 text-xs text-muted">
              Crossing rule: a member crosses in the first year its annual warming (against {baselineLabel}) is above the threshold; “never” counts members that stay at or below it up to {pathway.years.at(-1)}.
            </p>
          </CardBody>
        </Card>
      </div>

      <div className="flex flex-wrap items-center gap-3">
        <span className="text-sm font-medium text-ink">Year for forcing and sensitivity</span>
        <Segmented label="Horizon year" value={horizon} onChange={setHorizon} options={horizons.map((y) => ({ value: y, label: String(y) }))} />
      </div>
      <div className="grid gap-6 xl:grid-cols-2">
        <Card>
          <CardBody>
            <PanelErrorBoundary resetKey={`${pathway.id}-${horizon}`}>
              {forcing && forcing.agents.length > 0 ? (
                <ForcingBreakdownChart title={`Forcing by agent in ${h!.year} — ${pathway.name}`} year={h!.year} agents={forcing.agents} total={forcing.total} />
              ) : (
                <EmptyState title="No forcing breakdown at this year" />
              )}
            </PanelErrorBoundary>
          </CardBody>
        </Card>
        <Card>
          <CardBody>
            <PanelErrorBoundary resetKey={`${pathway.id}-${horizon}-s`}>
              {shares ? (
                <VarianceShareBars title={`What drives the spread in ${horizon} — ${pathway.name}`} horizon={horizon} rows={shares} />
              ) : toSensitivityBars(pathway, horizon).length > 0 ? (
                <>
                  <SensitivityBars title={`What drives the spread in ${horizon} — ${pathway.name}`} horizon={horizon} bars={toSensitivityBars(pathway, horizon)} />
                  <p className="mt-2 text-xs text-muted">This result predates variance shares (engine before 0.3.0): rank correlations only. Run it again for each input's share of the variance.</p>
                </>
              ) : (
                <EmptyState title="No sensitivity budget at this horizon" />
              )}
            </PanelErrorBoundary>
          </CardBody>
        </Card>
      </div>

      <Card>
        <CardHeader title="Observational constraint" subtitle="How weighting members by observed warming narrows the ensemble." />
        <CardBody>
          <ConstraintPanel pathway={pathway} members={result.members} implied={result.implied} />
        </CardBody>
      </Card>
    </div>
  );
}
