import { Link } from "react-router-dom";
import { paths } from "@/config/paths";
import { useMe } from "@/features/auth/api/get-me";
import { useExports } from "@/features/exports/api/get-exports";
import { ExportsTable } from "@/features/exports/components/exports-table";
import { useModelVersionChoices } from "@/features/model-versions/api/get-model-versions";
import { ModelVersionsTable } from "@/features/model-versions/components/model-versions-table";
import { ReturnedToYou } from "@/features/model-versions/components/returned-to-you";
import { ReviewQueue } from "@/features/model-versions/components/review-queue";
import { useRuns } from "@/features/runs/api/get-runs";
import { RunsTable } from "@/features/runs/components/runs-table";
import { ExploratoryStamp } from "@/components/ui/badges";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { PanelErrorBoundary } from "@/components/ui/panel-error-boundary";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

const GREETING: Record<string, string> = {
  analyst: "Build pathways and assumptions, run ensembles, study the spread.",
  actuary: "Run approved versions, read the tables, export workbooks.",
  manager: "Review what analysts submit; approve, reject or retire.",
  admin: "Manage people and roles; read the audit trail and the outbox.",
};

/** The home desk, composed from the features the role may use. */
export default function DeskPage() {
  const me = useMe();
  const perms = me.data?.permissions ?? [];
  const can = (p: string) => perms.includes(p);
  const user = me.data!.user;
  return (
    <>
      <PageHeader
        kicker="Desk"
        title={`Good to see you, ${user.name.split(" ")[0]}`}
        description={GREETING[user.role]}
        actions={
          can("runs:create") && (
            <ButtonLink to={paths.runNew.build()} variant="primary">
              New run
            </ButtonLink>
          )
        }
      />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex min-w-0 flex-col gap-6">
          {can("model-versions:decide") && (
            <PanelErrorBoundary>
              <ReviewsWaiting userId={user.id} />
            </PanelErrorBoundary>
          )}
          {can("model-versions:write") && (
            <PanelErrorBoundary>
              <ReturnedToMe />
            </PanelErrorBoundary>
          )}
          {can("runs:read") && (
            <PanelErrorBoundary>
              <MyRuns userId={user.id} canCreate={can("runs:create")} mine={can("runs:create")} />
            </PanelErrorBoundary>
          )}
          {can("model-versions:write") && (
            <PanelErrorBoundary>
              <MyDrafts />
            </PanelErrorBoundary>
          )}
        </div>
        <div className="flex min-w-0 flex-col gap-6">
          {can("runs:read") && (
            <PanelErrorBoundary>
              <ExploratoryFlags />
            </PanelErrorBoundary>
          )}
          {can("runs:read") && (
            <PanelErrorBoundary>
              <RecentExports />
            </PanelErrorBoundary>
          )}
          {can("users:manage") && (
            <Card>
              <CardHeader title="Administration" />
              <CardBody className="flex flex-wrap gap-2">
                <ButtonLink to={paths.adminUsers.build()}>Users and roles</ButtonLink>
                <ButtonLink to={paths.adminAudit.build()}>Audit log</ButtonLink>
                <ButtonLink to={paths.adminOutbox.build()}>Outbox</ButtonLink>
                {can("settings:manage") && <ButtonLink to={paths.adminSettings.build()}>Review policy</ButtonLink>}
              </CardBody>
            </Card>
          )}
        </div>
      </div>
    </>
  );
}

function MyRuns({ userId, canCreate, mine }: { userId: string; canCreate: boolean; mine: boolean }) {
  const runs = useRuns({ mine, limit: 8 });
  return (
    <Card>
      <CardHeader title={mine ? "My runs" : "Recent runs"} subtitle="Progress updates on its own while runs are going." actions={<Link to={paths.runs.build()} className="text-sm text-accent">All runs →</Link>} />
      {runs.isPending ? (
        <LoadingState />
      ) : runs.isError ? (
        <CardBody>
          <ErrorState error={runs.error} />
        </CardBody>
      ) : runs.data.items.length === 0 ? (
        <CardBody>
          {/* Someone who cannot start runs gets one quiet line, not a call-to-action box. */}
          {canCreate ? (
            <EmptyState title="No runs yet" action={<ButtonLink to={paths.runNew.build()}>Start a run</ButtonLink>} />
          ) : (
            <p className="text-sm text-muted">No runs yet.</p>
          )}
        </CardBody>
      ) : (
        <RunsTable runs={runs.data.items} currentUserId={userId} canCreate={canCreate} compact />
      )}
    </Card>
  );
}

function ReviewsWaiting({ userId }: { userId: string }) {
  const versions = useModelVersionChoices({ status: "in-review" });
  return (
    <Card className="border-l-4 border-l-accent">
      <CardHeader title="Waiting for your review" subtitle="Versions others submitted, for you to approve or reject." />
      {versions.isPending ? (
        <LoadingState />
      ) : versions.isError ? (
        <CardBody>
          <ErrorState error={versions.error} />
        </CardBody>
      ) : (
        <ReviewQueue versions={versions.data} userId={userId} />
      )}
    </Card>
  );
}

/** My rejected versions nothing has been drafted from yet (a child means someone already acted on it). */
function ReturnedToMe() {
  const versions = useModelVersionChoices({ mine: "true", status: "rejected", undrafted: "true" });
  if (!versions.data) return null;
  return <ReturnedToYou versions={versions.data} />;
}

function MyDrafts() {
  // Drafts, submissions and returns: one request per status, of my own versions only, so none
  // is cut off by other people's more recent work.
  const draft = useModelVersionChoices({ mine: "true", status: "draft" });
  const inReview = useModelVersionChoices({ mine: "true", status: "in-review" });
  const rejected = useModelVersionChoices({ mine: "true", status: "rejected" });
  const parts = [draft, inReview, rejected];
  const mine = parts.flatMap((part) => part.data ?? []).sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  if (parts.some((part) => part.isPending) || mine.length === 0) return null;
  return (
    <Card>
      <CardHeader title="My model versions in progress" />
      <ModelVersionsTable versions={mine} />
    </Card>
  );
}

/** How many exploratory results the desk lists (the runs page lists them all). */
const EXPLORATORY_SHOWN = 6;

function ExploratoryFlags() {
  const runs = useRuns({ status: "succeeded", exploratory: "true", limit: EXPLORATORY_SHOWN });
  if (runs.isPending) return null;
  if (runs.isError) return <ErrorState error={runs.error} />;
  const { items, total } = runs.data;
  return (
    <Card>
      <CardHeader title="Exploratory results" subtitle="Made with versions that were not approved: not for filing." />
      <CardBody>
        {items.length === 0 ? (
          <p className="text-sm text-muted">No exploratory results. Every finished run used an approved version.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {items.map((r) => (
              <li key={r.id} className="flex items-center justify-between gap-2 text-sm">
                <Link to={paths.run.build(r.id)} className="truncate text-accent hover:underline">
                  {r.name}
                </Link>
                <ExploratoryStamp size="sm" />
              </li>
            ))}
            {total > items.length && <li className="text-sm text-muted">and {total - items.length} older ones on the Runs page</li>}
          </ul>
        )}
      </CardBody>
    </Card>
  );
}

function RecentExports() {
  const exports = useExports({ mine: true, limit: 5 });
  return (
    <Card>
      <CardHeader title="My recent exports" actions={<Link to={paths.exports.build()} className="text-sm text-accent">All exports →</Link>} />
      {exports.isPending ? (
        <LoadingState />
      ) : exports.isError ? (
        <CardBody>
          <ErrorState error={exports.error} />
        </CardBody>
      ) : exports.data.items.length === 0 ? (
        <CardBody>
          <p className="text-sm text-muted">Nothing exported yet.</p>
        </CardBody>
      ) : (
        <ExportsTable exports={exports.data.items} compact />
      )}
    </Card>
  );
}
