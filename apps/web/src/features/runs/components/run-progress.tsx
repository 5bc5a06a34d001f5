import type { RunSummary } from "@plumeline/contracts";
import { ProgressBar } from "@/components/ui/progress-bar";
import { StatusBadge } from "@/components/ui/badges";

/** Status, live progress and (for a failed run) its error, in one cell. */
export function RunProgress({ run }: { run: Pick<RunSummary, "status" | "progress" | "error" | "name"> }) {
  const active = run.status === "queued" || run.status === "running";
  return (
    <div className="flex min-w-40 flex-col gap-1">
      <div className="flex items-center justify-between gap-2">
        <StatusBadge status={run.status} />
        {active && <span className="num text-xs text-muted">{Math.round(run.progress * 100)} %</span>}
      </div>
      {active && <ProgressBar value={run.progress} running={run.status === "running"} label={`Progress of ${run.name}`} />}
      {run.status === "failed" && run.error && <p className="text-xs text-danger">{run.error}</p>}
    </div>
  );
}
