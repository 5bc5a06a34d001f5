import type { PathwayResult, RunResult } from "@plumeline/contracts";
import { PercentileStrips, type PercentileStrip } from "@/components/charts/percentile-strips";
import { formatInteger } from "@/lib/format";

const strip = (id: string, label: string, set: Record<string, number>, color?: string): PercentileStrip | null =>
  ["p5", "p17", "p50", "p83", "p95"].every((k) => typeof set[k] === "number")
    ? { id, label, p5: set.p5!, p17: set.p17!, p50: set.p50!, p83: set.p83!, p95: set.p95!, color }
    : null;

/** Prior vs weighted ECS and window warming, and the Kish effective sample size. */
export function ConstraintPanel({ pathway, members, implied }: { pathway: PathwayResult; members: number; implied: RunResult["implied"] }) {
  const c = pathway.constraint;
  if (!c) {
    const ecs = strip("ecs", "ECS (sampled)", implied.ecs);
    const tcr = strip("tcr", "TCR (implied)", implied.tcr, "var(--pl-series-2)");
    return (
      <div className="flex flex-col gap-3">
        <p className="text-sm text-muted">This model version applies no observational constraint: every member carries equal weight. The implied sensitivities of the ensemble are shown.</p>
        {ecs && tcr && <PercentileStrips title="Implied climate sensitivity" strips={[ecs, tcr]} axisLabel="Warming (K)" />}
      </div>
    );
  }
  const ecsStrips = [strip("ecs-prior", "ECS, unweighted", c.ecsPrior, "var(--pl-faint)"), strip("ecs-post", "ECS, weighted", c.ecsPosterior)].filter(
    (s): s is PercentileStrip => s !== null,
  );
  const windowStrips = [
    strip("w-prior", "Simulated, unweighted", c.windowWarmingPrior, "var(--pl-faint)"),
    strip("w-post", "Simulated, weighted", c.windowWarmingPosterior),
    { id: "obs", label: "Observed ± 1.645 sd", p5: c.observed - 1.645 * c.sd, p17: c.observed - 0.954 * c.sd, p50: c.observed, p83: c.observed + 0.954 * c.sd, p95: c.observed + 1.645 * c.sd, color: "var(--pl-accent)" },
  ].filter((s): s is PercentileStrip => s !== null);
  const share = c.effectiveMembers / members;
  return (
    <div className="grid gap-6 lg:grid-cols-[16rem_1fr_1fr]">
      <dl className="grid content-start gap-3 text-sm">
        <div>
          <dt className="text-muted">Observed window</dt>
          <dd className="num text-ink">
            {c.from}–{c.to}: {c.observed.toFixed(2)} ± {c.sd.toFixed(2)} K
          </dd>
        </div>
        <div>
          <dt className="text-muted">Effective sample size (Kish)</dt>
          <dd className="num text-2xl font-semibold text-ink">{formatInteger(c.effectiveMembers)}</dd>
          <dd className="text-xs text-muted">
            of {formatInteger(members)} members ({(share * 100).toFixed(1)} %)
            {share < 0.1 && <span className="block font-medium text-danger">Few effective members: weighted percentiles are noisy.</span>}
          </dd>
        </div>
      </dl>
      {ecsStrips.length > 0 && <PercentileStrips title="ECS before and after weighting" strips={ecsStrips} axisLabel="Equilibrium climate sensitivity (K)" />}
      <PercentileStrips title={`Warming ${c.from}–${c.to}: simulated vs observed`} strips={windowStrips} axisLabel="Warming over the window (K)" />
    </div>
  );
}
