import { useState } from "react";
import { IMPACT_DEFAULT_MEMBERS } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { ErrorState, LoadingState } from "@/components/ui/states";
import { formatInteger } from "@/lib/format";
import { useModelVersionImpact } from "../api/get-model-version-impact";
import { ImpactSummaryView } from "./impact-summary-view";

/**
 * "Effect on key outputs": asks the server for a preview of the version against its parent
 * and shows it side by side. On the review page it starts at once (the manager needs it to
 * decide); elsewhere it waits for a click, because each preview costs a few seconds of CPU.
 */
export function ImpactPanel({ versionId, parentId, autoStart }: { versionId: string; parentId: string | null; autoStart: boolean }) {
  const [started, setStarted] = useState(autoStart);
  const impact = useModelVersionImpact(versionId, {}, { enabled: started && parentId !== null });
  if (parentId === null)
    return <p className="text-sm text-muted">This version has no parent, so there is nothing to compare its outputs with.</p>;
  if (!started)
    return (
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="secondary" onClick={() => setStarted(true)}>
          Preview the effect against the parent
        </Button>
        <span className="text-sm text-muted">Runs two {formatInteger(IMPACT_DEFAULT_MEMBERS)}-member ensembles on the server; takes a few seconds.</span>
      </div>
    );
  if (impact.isPending) return <LoadingState label={`Running two ${formatInteger(IMPACT_DEFAULT_MEMBERS)}-member preview ensembles… this takes a few seconds.`} />;
  if (impact.isError) return <ErrorState title="The preview could not be made" error={impact.error} retry={() => void impact.refetch()} />;
  return <ImpactSummaryView impact={impact.data} />;
}
