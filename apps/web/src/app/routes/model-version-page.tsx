import { Link, useParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { useMe } from "@/features/auth/api/get-me";
import { useModelVersion } from "@/features/model-versions/api/get-model-version";
import { useModelVersionDiff } from "@/features/model-versions/api/get-model-version-diff";
import { AssumptionsTable } from "@/features/model-versions/components/assumptions-table";
import { DiffTable } from "@/features/model-versions/components/diff-table";
import { ImpactPanel } from "@/features/model-versions/components/impact-panel";
import { PinnedPerilProfilesList, profileNames } from "@/features/model-versions/components/pinned-peril-profiles";
import { diffProfileIds } from "@/features/model-versions/lib/diff-profile-ids";
import { usePerilProfilesByIds } from "@/app/use-peril-profiles-by-ids";
import { usePinnedPathways } from "@/app/use-pinned-pathways";
import { ReviewWaitNote } from "@/features/model-versions/components/review-wait-note";
import { SubmitPanel } from "@/features/model-versions/components/submit-panel";
import { StatusBadge } from "@/components/ui/badges";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";
import { formatDateTime } from "@/lib/format";

export default function ModelVersionPage() {
  const { versionId = "" } = useParams();
  const me = useMe();
  const version = useModelVersion(versionId);
  const diff = useModelVersionDiff(versionId);
  const profiles = usePerilProfilesByIds([...(version.data?.perilProfileIds ?? []), ...diffProfileIds(diff.data)]);
  const pinned = usePinnedPathways(version.data?.pathwayIds ?? []);
  if (version.isPending) return <LoadingState />;
  if (version.isError) return <ErrorState error={version.error} retry={() => version.refetch()} />;
  const v = version.data;
  const can = (p: string) => me.data?.permissions.includes(p) ?? false;
  const own = v.authorId === me.data?.user.id;
  // The diff is taken against the parent by default, and names it.
  const parent = v.parentId && diff.data?.against?.id === v.parentId ? diff.data.against : null;
  const c = v.model.constraint;

  return (
    <>
      <PageHeader
        kicker={
          <span className="flex items-center gap-2">
            Model version <StatusBadge status={v.status} />
          </span>
        }
        title={`${v.name} v${v.versionNumber}`}
        description={
          <>
            Drafted by {v.authorName ?? "–"} · {formatDateTime(v.createdAt)}
            {/* The number counts within the version's own line, so a renamed copy's parent is named here. */}
            {parent && (
              <>
                {" · from "}
                <Link to={paths.modelVersion.build(parent.id)} className="text-accent underline">
                  {parent.name} v{parent.versionNumber}
                </Link>
              </>
            )}
            {v.changeClass ? ` · ${v.changeClass} change` : ""}
          </>
        }
        actions={
          <>
            {can("model-versions:write") && v.status === "draft" && own && (
              <ButtonLink to={paths.modelVersionEdit.build(v.id)} variant="secondary">
                Edit draft
              </ButtonLink>
            )}
            {can("model-versions:write") && (
              <ButtonLink to={paths.modelVersionNew.build(v.id)} variant="secondary">
                New draft from this
              </ButtonLink>
            )}
            {can("model-versions:decide") && (v.status === "in-review" || v.status === "approved") && (
              <ButtonLink to={paths.modelVersionReview.build(v.id)} variant="primary">
                {v.status === "in-review" ? "Review" : "Retire…"}
              </ButtonLink>
            )}
            {can("runs:create") && v.status !== "rejected" && v.status !== "retired" && (
              <ButtonLink to={paths.runNew.build(v.id)} variant={v.status === "approved" ? "primary" : "secondary"}>
                Run with this version
              </ButtonLink>
            )}
          </>
        }
      />
      <ReviewWaitNote version={v} isAuthor={own} />
      {(v.decisionComment || v.submissionNote) && (
        <Card className="mb-6">
          <CardBody className="grid gap-3 text-sm md:grid-cols-2">
            {v.submissionNote && (
              <div>
                <p className="text-muted">Note on submission</p>
                <p>{v.submissionNote}</p>
              </div>
            )}
            {v.decisionComment && (
              <div>
                <p className="text-muted">
                  Decision by {v.decidedByName ?? "–"}, {formatDateTime(v.decidedAt)}
                </p>
                <p>{v.decisionComment}</p>
              </div>
            )}
          </CardBody>
        </Card>
      )}
      {v.status === "draft" && own && can("model-versions:write") && (
        <Card className="mb-6">
          <CardHeader
            title="Send for review"
            subtitle="A manager other than you decides. You cannot edit the version while it is in review."
          />
          <CardBody>
            <SubmitPanel versionId={v.id} />
          </CardBody>
        </Card>
      )}
      <div className="grid gap-6">
        <Card>
          <CardHeader
            title="Assumptions"
            subtitle={`Concentration expression: ${v.model.forcingExpression}. ${c ? `Constrained by ${c.observed} ± ${c.sd} K over ${c.from}–${c.to}.` : "No observational constraint."}`}
          />
          <CardBody>
            <AssumptionsTable model={v.model} />
            {v.model.correlations.length > 0 && (
              <p className="mt-3 text-sm text-muted">
                Rank correlations: {v.model.correlations.map((x) => `${x.between[0]} ↔ ${x.between[1]} ${x.rank}`).join("; ")}
              </p>
            )}
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Changes against the parent" />
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
            subtitle="A preview ensemble of this version and its parent, side by side, on every pinned pathway."
          />
          <CardBody>
            {pinned === null ? (
              <LoadingState />
            ) : (
              <ImpactPanel versionId={v.id} parentId={v.parentId} autoStart={false} pathways={pinned} changeClass={v.changeClass} />
            )}
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Pinned peril profiles" />
          <CardBody>
            <PinnedPerilProfilesList ids={v.perilProfileIds} profiles={profiles} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Notes" />
          <CardBody>
            <p className="whitespace-pre-wrap text-sm">{v.notes || "—"}</p>
            <p className="mt-3 text-xs text-muted">
              Run defaults: percentiles {v.defaults.percentiles.join(", ")} · thresholds {v.defaults.thresholds.join(", ")} K · horizons{" "}
              {v.defaults.horizons.join(", ")} · baseline {v.defaults.baseline.join("–")}
            </p>
          </CardBody>
        </Card>
      </div>
    </>
  );
}
