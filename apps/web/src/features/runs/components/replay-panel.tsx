import { Button } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/states";
import { useReplayRun } from "../api/replay-run";

/** Re-runs the stored spec and shows whether the new hash equals the recorded one. */
export function ReplayPanel({ runId, canReplay }: { runId: string; canReplay: boolean }) {
  const replay = useReplayRun();
  return (
    <div className="flex flex-col gap-2 text-sm">
      <p className="text-muted">Replay runs the recorded spec and seed again and compares the result hash with the one stored.</p>
      {canReplay ? (
        <div>
          <Button variant="secondary" size="sm" onClick={() => replay.mutate(runId)} disabled={replay.isPending}>
            {replay.isPending ? "Replaying…" : "Replay and compare"}
          </Button>
        </div>
      ) : (
        <p className="text-xs text-faint">Replaying needs the analyst or actuary role.</p>
      )}
      {replay.data && (
        <div role="status" className={replay.data.matched ? "rounded-md border border-ok/50 bg-ok-soft px-3 py-2" : "rounded-md border border-danger/50 bg-danger-soft px-3 py-2"}>
          <p className={replay.data.matched ? "font-semibold text-ok" : "font-semibold text-danger"}>
            {replay.data.matched ? "Identical: the replay reproduced the stored result." : "Different: the replay did not reproduce the stored result."}
          </p>
          <p className="num mt-1 break-all text-xs text-muted">stored {replay.data.resultHash ?? "–"}</p>
          <p className="num break-all text-xs text-muted">replay {replay.data.replayHash}</p>
          <p className="text-xs text-muted">engine {replay.data.engineVersion}</p>
        </div>
      )}
      {replay.error && <ErrorState error={replay.error} />}
    </div>
  );
}
