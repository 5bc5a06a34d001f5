import { useParams } from "react-router-dom";
import { useQueryClient } from "@tanstack/react-query";
import { paths } from "@/config/paths";
import { useMe } from "@/features/auth/api/get-me";
import { exportsRootKey } from "@/features/exports/api/get-exports";
import { useModelVersion } from "@/features/model-versions/api/get-model-version";
import { useRun } from "@/features/runs/api/get-run";
import { RunLoadError } from "@/features/runs/components/run-load-error";
import { versionStateWhenRunMade } from "@/features/runs/lib/version-status-at-run";
import { useRunResult } from "@/features/runs/api/get-run-result";
import { CancelRunAction } from "@/features/runs/components/cancel-run-action";
import { ExportPanel } from "@/features/runs/components/export-panel";
import { ReplayPanel } from "@/features/runs/components/replay-panel";
import { RunStatementsPanel } from "@/features/runs/components/run-statements-panel";
import { ResultView } from "@/features/runs/components/result-view";
import { RunManifest } from "@/features/runs/components/run-manifest";
import { RunProgress } from "@/features/runs/components/run-progress";
import { RunPerilSection } from "@/features/peril/components/run-peril-section";
import { ChartSourceProvider, runSourceLine } from "@/components/charts/chart-source";
import { ApprovedSeal, ExploratoryStamp, StatusBadge } from "@/components/ui/badges";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";

export default function RunPage() {
  const { runId = "" } = useParams();
  const me = useMe();
  const run = useRun(runId);
  const succeeded = run.data?.status === "succeeded";
  const result = useRunResult(runId, succeeded);
  const queryClient = useQueryClient();
  // Only an exploratory run's banner needs the version (its submission and decision times).
  const version = useModelVersion(run.data?.exploratory ? run.data.modelVersion.id : undefined);
  const can = (p: string) => me.data?.permissions.includes(p) ?? false;

  if (run.isPending) return <LoadingState label="Loading run…" />;
  if (run.isError) return <RunLoadError error={run.error} retry={() => void run.refetch()} />;
  const r = run.data;
  const active = r.status === "queued" || r.status === "running";

  // Every chart downloaded from this page names the run, its model version and result hash.
  const chartSource = {
    lines: [runSourceLine(r, r.manifest.resultHash ?? "not recorded", r.exploratory), `Engine ${r.manifest.engineVersion ?? "version not recorded"} · ${r.members.toLocaleString("en-GB")} members · seed ${r.seed}`],
    fileLabel: r.name || r.id.slice(0, 8),
  };

  return (
    <ChartSourceProvider source={chartSource}>
      <PageHeader
        kicker={
          <span className="flex items-center gap-2">
            Run{" "}
            {/* The seal belongs to an approved run's result: a run that did not finish has none, only its state. */}
            {r.exploratory ? <ExploratoryStamp size="sm" /> : succeeded ? <ApprovedSeal size="sm" /> : <StatusBadge status={r.cancelRequested && active ? "cancelling…" : r.status} />}
          </span>
        }
        title={r.name || `Run ${r.id.slice(0, 8)}`}
        description={
          r.exploratory
            ? "Made with a model version that was not approved when the run was made: exploratory, not for filing."
            : succeeded
              ? "Made with an approved model version."
              : `Uses an approved model version; this run is ${r.status === "cancelled" ? "cancelled and has no result" : r.status === "failed" ? "failed and has no result" : "not finished"}.`
        }
        actions={
          <>
            <ButtonLink to={paths.runCompare.build(r.id)} variant="secondary">
              Compare…
            </ButtonLink>
            {active && can("runs:create") && r.createdBy === me.data?.user.id && <CancelRunAction run={r} />}
          </>
        }
      />
      {r.exploratory && (
        <div className="stamp-exploratory mb-6 rounded-md px-4 py-2 text-sm font-medium">
          EXPLORATORY — model version “{r.modelVersion.name} v{r.modelVersion.versionNumber}” was {versionStateWhenRunMade(version.data, r.createdAt)} when this run was made. Do not use for filings.
        </div>
      )}
      {!succeeded && (
        <Card className="mb-6">
          <CardBody className="max-w-md">
            <RunProgress run={r} />
            {active && <p className="mt-2 text-sm text-muted">The page updates on its own while the ensemble runs.</p>}
            {r.status === "cancelled" && <p className="mt-2 text-sm text-muted">This run was cancelled before it finished.</p>}
          </CardBody>
        </Card>
      )}
      {succeeded &&
        (result.isPending ? (
          <LoadingState label="Loading result…" />
        ) : result.isError ? (
          <ErrorState error={result.error} retry={() => result.refetch()} />
        ) : (
          <ResultView run={r} result={result.data} />
        ))}
      {succeeded && result.data && <RunPerilSection run={r} result={result.data} />}
      <div className="mt-6 grid gap-6 xl:grid-cols-[2fr_1fr]">
        <Card>
          <CardHeader title="Manifest" subtitle="Everything needed to reproduce this run." />
          <CardBody>
            <RunManifest run={r} />
          </CardBody>
        </Card>
        <div className="flex flex-col gap-6">
          {succeeded && (
            <Card>
              <CardHeader title="Export" />
              <CardBody>
                <ExportPanel
                  runId={r.id}
                  exploratory={r.exploratory}
                  canWorkbook={can("exports:create")}
                  hasPerils={r.perilProfileIds.length > 0}
                  onExported={() => queryClient.invalidateQueries({ queryKey: exportsRootKey })}
                />
              </CardBody>
            </Card>
          )}
          {succeeded && (
            <Card>
              <CardHeader title="Reliance and limitations" subtitle="Statements recorded with these results." />
              <CardBody>
                <RunStatementsPanel runId={r.id} canRecord={can("runs:create")} />
              </CardBody>
            </Card>
          )}
          {succeeded && (
            <Card>
              <CardHeader title="Replay" />
              <CardBody>
                <ReplayPanel runId={r.id} canReplay={can("runs:create")} />
              </CardBody>
            </Card>
          )}
        </div>
      </div>
    </ChartSourceProvider>
  );
}
