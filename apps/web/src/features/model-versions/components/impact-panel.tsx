import { useState } from "react";
import { IMPACT_DEFAULT_MEMBERS } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { ErrorState, LoadingState } from "@/components/ui/states";
import { formatInteger } from "@/lib/format";
import { useModelVersionImpact } from "../api/get-model-version-impact";
import { ImpactPathwayPicker, type PathwayOption } from "./impact-pathway-picker";
import { ImpactSummaryView } from "./impact-summary-view";

/**
 * "Effect on key outputs": asks the server for a preview of the version against its parent on
 * every pathway the version pins (or those the reader picks) and shows it side by side, with
 * the materiality thresholds it passes. On the review page it starts at once (the manager needs
 * it to decide); elsewhere it waits for a click, because each preview costs seconds of CPU.
 */
export function ImpactPanel({
  versionId,
  parentId,
  autoStart,
  pathways = [],
  changeClass,
}: {
  versionId: string;
  parentId: string | null;
  autoStart: boolean;
  /** The version's pinned pathways, named (empty: the server falls back to the seeded middle pathway). */
  pathways?: PathwayOption[];
  changeClass?: "major" | "minor" | null;
}) {
  const [started, setStarted] = useState(autoStart);
  const all = pathways.map((p) => p.id);
  const [chosen, setChosen] = useState<string[] | null>(null);
  const picked = chosen ?? all;
  // All pinned pathways is the server's default: no list is sent, so the author's, the gate's and the reviewer's previews share a cache entry.
  const body = chosen && chosen.length < all.length ? { pathwayIds: chosen } : {};
  const impact = useModelVersionImpact(versionId, body, { enabled: started && parentId !== null });
  if (parentId === null)
    return <p className="text-sm text-muted">This version has no parent, so there is nothing to compare its outputs with.</p>;
  const count = Math.max(picked.length, 1);
  const cost = `two ${formatInteger(IMPACT_DEFAULT_MEMBERS)}-member preview ensembles on ${count} pathway${count === 1 ? "" : "s"}`;
  const picker = pathways.length > 1 && <ImpactPathwayPicker key={picked.join(",")} options={pathways} chosen={picked} onApply={setChosen} />;
  if (!started)
    return (
      <div className="flex flex-col gap-3">
        {picker}
        <div className="flex flex-wrap items-center gap-3">
          <Button variant="secondary" onClick={() => setStarted(true)}>
            Preview the effect against the parent
          </Button>
          <span className="text-sm text-muted">Runs {cost} on the server; about 3–4 s per pathway.</span>
        </div>
      </div>
    );
  return (
    <div className="flex flex-col gap-4">
      {picker}
      {impact.isPending ? (
        <LoadingState label={`Running ${cost}… this takes a few seconds (about 3–4 s per pathway).`} />
      ) : impact.isError ? (
        <ErrorState title="The preview could not be made" error={impact.error} retry={() => void impact.refetch()} />
      ) : (
        <ImpactSummaryView impact={impact.data} changeClass={changeClass} />
      )}
    </div>
  );
}
