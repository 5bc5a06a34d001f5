import { RUN_STATUSES, type RunStatus } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { useMe } from "@/features/auth/api/get-me";
import { useRuns } from "@/features/runs/api/get-runs";
import { RunsTable } from "@/features/runs/components/runs-table";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/states";
import { ListControls } from "@/components/lists/list-controls";
import { listFieldErrors } from "@/components/lists/list-field-errors";
import { PagedList } from "@/components/lists/paged-list";
import { useListQuery } from "@/components/lists/use-list-query";

const RUN_SORTS = [
  { value: "createdAt:desc", label: "Newest first" },
  { value: "createdAt:asc", label: "Oldest first" },
  { value: "name:asc", label: "Name A–Z" },
  { value: "name:desc", label: "Name Z–A" },
  { value: "status:asc", label: "Status" },
  { value: "members:desc", label: "Most members" },
  { value: "members:asc", label: "Fewest members" },
];

export default function RunsPage() {
  const me = useMe();
  const list = useListQuery({ defaultSort: "createdAt:desc", filterKeys: ["status", "author", "from", "to", "mine"] });
  const { q, sort, limit, offset, filters } = list.state;
  const runs = useRuns({ q, sort, limit, offset, status: (filters.status || undefined) as RunStatus | undefined, author: filters.author, from: filters.from, to: filters.to, mine: filters.mine === "true" });
  const canCreate = me.data?.permissions.includes("runs:create") ?? false;
  return (
    <>
      <PageHeader
        kicker="Runs"
        title="Run queue and results"
        description="Ensembles queue here and report progress while they run. Open a finished run for its fan chart, tables and exports."
        actions={
          <>
            <ButtonLink to={paths.runCompare.build()} variant="secondary">
              Compare runs
            </ButtonLink>
            {canCreate && (
              <ButtonLink to={paths.runNew.build()} variant="primary">
                New run
              </ButtonLink>
            )}
          </>
        }
      />
      <Card className="mb-4">
        <CardBody>
        <ListControls
          noun="runs"
          state={list.state}
          onChange={list.update}
          errors={listFieldErrors(runs.error)}
          searchHint="Part of a run's name"
          sortOptions={RUN_SORTS}
          selects={[{ key: "status", label: "Status", options: RUN_STATUSES.map((s) => ({ value: s, label: s })) }]}
          texts={[{ key: "author", label: "Started by", placeholder: "Name or email" }]}
          toggles={[{ key: "mine", label: "Only mine" }]}
          dates
        />
        </CardBody>
      </Card>
      <Card>
        <PagedList
          result={runs}
          noun="runs"
          state={list.state}
          onOffset={list.setOffset}
          empty={
            <EmptyState title={list.filtered ? "No runs match these filters" : "No runs yet"} action={canCreate ? <ButtonLink to={paths.runNew.build()}>Start a run</ButtonLink> : undefined}>
              Runs you and your colleagues start appear here with live progress.
            </EmptyState>
          }
        >
          {(items) => <RunsTable runs={items} currentUserId={me.data!.user.id} canCreate={canCreate} />}
        </PagedList>
      </Card>
    </>
  );
}
