import { useRef } from "react";
import type { RunSummary } from "@plumeline/contracts";
import { ProgressBar } from "@/components/ui/progress-bar";
import { StatusBadge } from "@/components/ui/badges";
import { formatTimeLeft, secondsLeft, type ProgressSample } from "../lib/time-left";

type ProgressOf = Pick<RunSummary, "status" | "progress" | "error" | "name"> & { cancelRequested?: boolean };

/**
 * Status, live progress with an estimated time left (once there is a rate to go on) and, for a
 * failed run, its error, in one cell. A run whose cancel is waiting for its worker reads
 * "cancelling…" until the worker confirms.
 */
export function RunProgress({ run }: { run: ProgressOf }) {
  const active = run.status === "queued" || run.status === "running";
  const first = useRef<ProgressSample | null>(null);
  const now = Date.now();
  if (run.status !== "running") first.current = null;
  else if (!first.current && run.progress > 0) first.current = { at: now, progress: run.progress };
  const left = run.status === "running" && !run.cancelRequested ? secondsLeft(first.current, { at: now, progress: run.progress }) : null;
  return (
    <div className="flex min-w-40 flex-col gap-1">
      <div className="flex items-center justify-between gap-2">
        {run.cancelRequested && active ? <StatusBadge status="cancelling…" /> : <StatusBadge status={run.status} />}
        {active && (
          <span className="num text-xs text-muted">
            {Math.round(run.progress * 100)} %{left !== null && <span className="ml-1 text-faint">· {formatTimeLeft(left)}</span>}
          </span>
        )}
      </div>
      {active && <ProgressBar value={run.progress} running={run.status === "running"} label={`Progress of ${run.name}`} />}
      {run.status === "failed" && run.error && <p className="text-xs text-danger">{run.error}</p>}
    </div>
  );
}
