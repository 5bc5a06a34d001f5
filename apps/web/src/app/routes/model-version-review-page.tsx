import { useParams } from "react-router-dom";
import { useMe } from "@/features/auth/api/get-me";
import { useModelVersion } from "@/features/model-versions/api/get-model-version";
import { useModelVersionDiff } from "@/features/model-versions/api/get-model-version-diff";
import { AssumptionsTable } from "@/features/model-versions/components/assumptions-table";
import { DecisionPanel } from "@/features/model-versions/components/decision-panel";
import { DiffTable } from "@/features/model-versions/components/diff-table";
import { ImpactPanel } from "@/features/model-versions/components/impact-panel";
import { profileNames } from "@/features/model-versions/components/pinned-peril-profiles";
import { diffProfileIds } from "@/features/model-versions/lib/diff-profile-ids";
import { usePerilProfilesByIds } from "@/app/use-peril-profiles-by-ids";
import { usePinnedPathways } from "@/app/use-pinned-pathways";
import { StatusBadge } from "@/components/ui/badges";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";

export default function ModelVersionReviewPage() {
  const { versionId = "" } = useParams();
  const me = useMe();
  const version = useModelVersion(versionId);
  const diff = useModelVersionDiff(versionId);
  const profiles = usePerilProfilesByIds(diffProfileIds(diff.data));
  const pinned = usePinnedPathways(version.data?.pathwayIds ?? []);
  if (version.isPending) return <LoadingState />;
  if (version.isError) return <ErrorState error={version.error} />;
  const v = version.data;
  return (
    <>
      <PageHeader
        kicker={
          <span className="flex items-center gap-2">
            Review <StatusBadge status={v.status} />
          </span>
        }
        title={`${v.name} v${v.versionNumber}`}
        description={`By ${v.authorName ?? "–"}${v.changeClass ? ` · classed as a ${v.changeClass} change` : ""}${v.submissionNote ? ` · “${v.submissionNote}”` : ""}`}
      />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,2fr)_minmax(18rem,1fr)]">
        <div className="flex min-w-0 flex-col gap-6">
          <Card>
            <CardHeader title="What changed" />
            <CardBody>
              {diff.isPending ? (
                <LoadingState />
              ) : diff.isError ? (
                <ErrorState error={diff.error} />
              ) : (
                <DiffTable diff={diff.data} profileNames={profileNames(profiles)} />
              )}
            </CardBody>
          </Card>
          <Card>
            <CardHeader
              title="Effect on key outputs"
              subtitle="The same preview ensemble of this version and the one it replaces, side by side, on every pinned pathway."
            />
            <CardBody>
              {pinned === null ? (
                <LoadingState />
              ) : (
                <ImpactPanel versionId={v.id} parentId={v.parentId} autoStart pathways={pinned} changeClass={v.changeClass} />
              )}
            </CardBody>
          </Card>
          <Card>
            <CardHeader title="Assumptions as submitted" />
            <CardBody>
              <AssumptionsTable model={v.model} />
            </CardBody>
          </Card>
          <Card>
            <CardHeader title="Author's notes" />
            <CardBody>
              <p className="whitespace-pre-wrap text-sm">{v.notes || "—"}</p>
            </CardBody>
          </Card>
        </div>
        <Card className="self-start xl:sticky xl:top-6">
          <CardHeader title={v.status === "approved" ? "Retire" : "Decision"} />
          <CardBody>{me.data && <DecisionPanel version={v} currentUserId={me.data.user.id} />}</CardBody>
        </Card>
      </div>
    </>
  );
}
