import { Button } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/states";
import { useReplayRun, useReplays } from "../api/replay-run";
import { RunProgress } from "./run-progress";

/**
 * Re-runs the stored spec and shows whether the new hash equals the recorded one. A replay is
 * queued like a run and shows its progress the same way; one at a time per person.
 */
export function ReplayPanel({ runId, canReplay }: { runId: string; canReplay: boolean }) {
  const replays = useReplays(runId);
  const replay = useReplayRun(runId);
  const latest = replays.data?.[0];
  const active = latest?.status === "queued" || latest?.status === "running";
  return (
    <div className="flex flex-col gap-2 text-sm">
      <p className="text-muted">Replay runs the recorded spec and seed again and compares the result hash with the one stored. It waits in the queue with the runs.</p>
      {canReplay ? (
        <div>
          <Button variant="secondary" size="sm" onClick={() => replay.mutate()} disabled={replay.isPending || active}>
            {replay.isPending ? "Queuing…" : active ? "Replaying…" : "Replay and compare"}
          </Button>
        </div>
      ) : (
        <p className="text-xs text-faint">Replaying needs the analyst or actuary role.</p>
      )}
      {latest && active && <RunProgress run={{ ...latest, name: "the replay" }} />}
      {latest && latest.status === "succeeded" && (
        <div role="status" className={latest.matched ? "rounded-md border border-ok/50 bg-ok-soft px-3 py-2" : "rounded-md border border-danger/50 bg-danger-soft px-3 py-2"}>
          <p className={latest.matched ? "font-semibold text-ok" : "font-semibold text-danger"}>
            {latest.matched ? "Identical: the replay reproduced the stored result." : "Different: the replay did not reproduce the stored result."}
          </p>
          <p className="num mt-1 break-all text-xs text-muted">stored {latest.resultHash ?? "–"}</p>
          <p className="num break-all text-xs text-muted">replay {latest.replayHash ?? "–"}</p>
          <p className="text-xs text-muted">engine {latest.engineVersion ?? "–"}</p>
        </div>
      )}
      {latest && (latest.status === "failed" || latest.status === "cancelled") && <p className="text-xs text-danger">The last replay did not finish: {latest.error ?? latest.status}.</p>}
      {replay.error && <ErrorState error={replay.error} />}
      {replays.error && <ErrorState error={replays.error} retry={() => replays.refetch()} />}
    </div>
  );
}
