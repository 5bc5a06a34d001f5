import { Link } from "react-router-dom";
import type { ModelVersionSummary } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { formatDateTime } from "@/lib/format";
import { useModelVersion } from "../api/get-model-version";

/**
 * The author's rejected versions that nothing has been drafted from yet: each with who
 * rejected it, when, and their reason (read from the version itself: the list carries no
 * comments), a link to it and a way to draft the correction. The mail says the same; this is
 * where the author looks.
 */
export function ReturnedToYou({ versions }: { versions: ModelVersionSummary[] }) {
  if (versions.length === 0) return null;
  return (
    <Card className="border-l-4 border-l-danger" aria-labelledby="returned-to-you">
      <CardHeader id="returned-to-you" title="Returned to you" subtitle="Rejected by a reviewer, with their reason. Draft a corrected version from it." />
      <CardBody>
        <ul className="flex flex-col gap-4">
          {versions.slice(0, 5).map((v) => (
            <ReturnedItem key={v.id} summary={v} />
          ))}
        </ul>
      </CardBody>
    </Card>
  );
}

function ReturnedItem({ summary }: { summary: ModelVersionSummary }) {
  const full = useModelVersion(summary.id);
  const reason = full.data?.decisionComment;
  return (
    <li className="flex flex-col gap-1 text-sm">
      <Link to={paths.modelVersion.build(summary.id)} className="font-medium text-accent hover:underline">
        {summary.name} v{summary.versionNumber}
      </Link>
      <span className="text-muted">
        Rejected by {summary.decidedByName ?? "a reviewer"} · {formatDateTime(summary.decidedAt)}
      </span>
      <blockquote className="border-l-2 border-line pl-3 whitespace-pre-wrap text-ink" aria-label={`Reason for rejecting ${summary.name} v${summary.versionNumber}`}>
        {full.isPending ? "Loading the reason…" : full.isError ? "The reason could not be loaded; open the version to read it." : reason || "No reason recorded."}
      </blockquote>
      <div>
        <ButtonLink to={paths.modelVersionNew.build(summary.id)} size="sm" variant="secondary">
          Draft a correction
        </ButtonLink>
      </div>
    </li>
  );
}
