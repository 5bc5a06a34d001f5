import { useState } from "react";
import type { RunSummary } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { useCancelRun } from "../api/cancel-run";

/**
 * Cancel with a confirmation step (the computed work is thrown away). Once confirmed it reads
 * "Cancelling…" at once and stays so until the worker has stopped (the run then shows its
 * final state); asking twice is harmless, the server ignores the second request.
 */
export function CancelRunAction({ run }: { run: Pick<RunSummary, "id" | "name" | "status" | "cancelRequested"> }) {
  const cancel = useCancelRun();
  const [confirming, setConfirming] = useState(false);
  if (cancel.isPending || run.cancelRequested) {
    return (
      <Button variant="danger" disabled aria-live="polite">
        Cancelling…
      </Button>
    );
  }
  if (!confirming) {
    return (
      <Button variant="danger" onClick={() => setConfirming(true)}>
        Cancel run
      </Button>
    );
  }
  return (
    <div role="group" aria-label={`Confirm: cancel ${run.name}`} className="flex max-w-sm flex-col gap-2">
      <p className="text-sm">
        {run.status === "running" ? "Stop this run? The members computed so far are discarded and there will be no result." : "Take this run out of the queue? It will not start."}
      </p>
      <div className="flex gap-2">
        <Button
          size="sm"
          variant="danger"
          onClick={() => {
            setConfirming(false);
            cancel.mutate(run.id);
          }}
        >
          Yes, cancel the run
        </Button>
        <Button size="sm" variant="secondary" onClick={() => setConfirming(false)}>
          Keep it running
        </Button>
      </div>
      {cancel.error && <p className="text-xs text-danger">{cancel.error.message}</p>}
    </div>
  );
}
