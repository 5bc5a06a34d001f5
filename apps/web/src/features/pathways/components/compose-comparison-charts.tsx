import { useState } from "react";
import { AGENT_LABELS, agentSeries, type ForcingAgent, type PathwayData } from "@plumeline/contracts";
import { LineChart } from "@/components/charts/line-chart";
import { alignOnYears } from "../lib/align-years";
import { forcingTotal } from "../lib/forcing-total";

const BASE_COLOR = "var(--pl-muted)";
const COMPOSED_COLOR = "var(--pl-series-1)";
const UNIT_LABEL = { erf: "W m-2", ppm: "ppm", ppb: "ppb" } as const;
/** Agent charts shown before "Show all": an extension changes every agent, and eleven charts per step bury the next step. */
const FIRST_AGENT_CHARTS = 4;

/**
 * Base pathway against a composed state: net forcing, then one small chart per agent the step
 * changed, each in its own unit. Years only one side covers show as a gap on the other.
 */
export function ComposeComparisonCharts({
  base,
  baseLabel,
  composed,
  composedLabel,
  changed,
  titlePrefix,
}: {
  base: PathwayData;
  baseLabel: string;
  composed: PathwayData;
  composedLabel: string;
  changed: ForcingAgent[];
  titlePrefix: string;
}) {
  const before = forcingTotal(base);
  const after = forcingTotal(composed);
  const totals = alignOnYears([
    { startYear: base.startYear, values: before.total },
    { startYear: composed.startYear, values: after.total },
  ]);
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? changed : changed.slice(0, FIRST_AGENT_CHARTS);
  const concentrations = [...new Set([...before.concentrationAgents, ...after.concentrationAgents])];
  return (
    <div className="flex flex-col gap-4">
      <LineChart
        title={`${titlePrefix}: net forcing`}
        years={totals.years}
        series={[
          { id: "base", label: baseLabel, values: totals.values[0]!, color: BASE_COLOR },
          { id: "composed", label: composedLabel, values: totals.values[1]!, color: COMPOSED_COLOR },
        ]}
        yLabel="Net forcing (W m-2)"
        height={200}
      />
      {concentrations.length > 0 && (
        <p className="text-xs text-muted">
          Net forcing adds the agents given as ERF only; {concentrations.map((a) => AGENT_LABELS[a as ForcingAgent]).join(", ")}{" "}
          {concentrations.length === 1 ? "is" : "are"} given as concentrations, which the engine turns into forcing with the model version's
          expression.
        </p>
      )}
      {changed.length > 0 && (
        <div className="grid gap-4 lg:grid-cols-2">
          {shown.map((agent) => {
            const a = agentSeries(base.agents, agent);
            const b = agentSeries(composed.agents, agent);
            const unit = UNIT_LABEL[(b ?? a)!.quantity];
            const aligned = alignOnYears([
              { startYear: base.startYear, values: a?.values ?? [] },
              { startYear: composed.startYear, values: b?.values ?? [] },
            ]);
            return (
              <LineChart
                key={agent}
                title={`${titlePrefix}: ${AGENT_LABELS[agent]} (${unit})`}
                years={aligned.years}
                series={[
                  { id: "base", label: a ? baseLabel : `${baseLabel} (absent)`, values: aligned.values[0]!, color: BASE_COLOR },
                  {
                    id: "composed",
                    label: b ? composedLabel : `${composedLabel} (absent)`,
                    values: aligned.values[1]!,
                    color: COMPOSED_COLOR,
                  },
                ]}
                yLabel={`${AGENT_LABELS[agent]} (${unit})`}
                height={170}
              />
            );
          })}
        </div>
      )}
      {changed.length > FIRST_AGENT_CHARTS && (
        <div>
          <button
            type="button"
            className="text-sm font-medium text-accent underline"
            aria-expanded={showAll}
            onClick={() => setShowAll((v) => !v)}
          >
            {showAll ? `Show the first ${FIRST_AGENT_CHARTS} changed agents only` : `Show all ${changed.length} changed agents`}
          </button>
        </div>
      )}
    </div>
  );
}
