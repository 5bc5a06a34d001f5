import { useState } from "react";
import { paths } from "@/config/paths";
import { useMe } from "@/features/auth/api/get-me";
import { useRuns } from "@/features/runs/api/get-runs";
import { RunsTable } from "@/features/runs/components/runs-table";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { Segmented } from "@/components/ui/segmented";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

export default function RunsPage() {
  const me = useMe();
  const [mine, setMine] = useState(false);
  const runs = useRuns({ mine });
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
      <div className="mb-3">
        <Segmented
          label="Which runs"
          value={mine ? "mine" : "all"}
          onChange={(v) => setMine(v === "mine")}
          options={[
            { value: "all", label: "All runs" },
            { value: "mine", label: "Mine" },
          ]}
        />
      </div>
      <Card>
        {runs.isPending ? (
          <LoadingState label="Loading runs…" />
        ) : runs.isError ? (
          <div className="p-4">
            <ErrorState error={runs.error} retry={() => runs.refetch()} />
          </div>
        ) : runs.data.length === 0 ? (
          <div className="p-4">
            <EmptyState title="No runs yet" action={canCreate ? <ButtonLink to={paths.runNew.build()}>Start a run</ButtonLink> : undefined}>
              Runs you and your colleagues start appear here with live progress.
            </EmptyState>
          </div>
        ) : (
          <RunsTable runs={runs.data} currentUserId={me.data!.user.id} canCreate={canCreate} />
        )}
      </Card>
    </>
  );
}
