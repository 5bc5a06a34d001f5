import type { ForcingAgent } from "@plumeline/contracts";
import { ForcingStackChart } from "@/components/charts/forcing-stack-chart";
import { LineChart } from "@/components/charts/line-chart";
import { EmptyState } from "@/components/ui/states";
import { splitPathwaySeries } from "../lib/pathway-series";

type Agents = Partial<Record<ForcingAgent, { erf: number[] } | { ppm: number[] } | { ppb: number[] }>>;

/** Forcing by agent stacked over time with the total; concentrations (ppm/ppb) drawn beside it. */
export function PathwayCharts({ name, startYear, agents }: { name: string; startYear: number; agents: Agents }) {
  const { years, forcing, ppm, ppb } = splitPathwaySeries(startYear, agents);
  if (years.length === 0) return <EmptyState title="This pathway holds no series" />;
  return (
    <div className="flex flex-col gap-6">
      {forcing.length > 0 ? (
        <ForcingStackChart title={`Forcing by agent — ${name}`} years={years} agents={forcing} />
      ) : (
        <p className="text-sm text-muted">Every agent is given as a concentration; the engine turns them into forcing with the model version's expression.</p>
      )}
      {(ppm.length > 0 || ppb.length > 0) && (
        <div className="grid gap-6 lg:grid-cols-2">
          {ppm.length > 0 && <LineChart title="Concentrations (ppm)" years={years} series={ppm} yLabel="Concentration (ppm)" />}
          {ppb.length > 0 && <LineChart title="Concentrations (ppb)" years={years} series={ppb} yLabel="Concentration (ppb)" />}
        </div>
      )}
      {(ppm.length > 0 || ppb.length > 0) && forcing.length > 0 && (
        <p className="text-xs text-muted">Agents given as concentrations are not in the stacked total: the engine converts them to forcing with the expression the model version names.</p>
      )}
    </div>
  );
}
