import { useState } from "react";
import { useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { useModelVersion } from "@/features/model-versions/api/get-model-version";
import { modelVersionPickerSource, useModelVersions } from "@/features/model-versions/api/get-model-versions";
import { pathwayPickerSource, usePathways } from "@/features/pathways/api/get-pathways";
import { perilProfilePickerSource } from "@/features/peril/api/get-peril-profiles";
import { usePortfolios } from "@/features/peril/api/get-portfolios";
import { PerilRunPicker, type PerilRunChoice } from "@/features/peril/components/peril-run-picker";
import { RunForm } from "@/features/runs/components/run-form";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

/**
 * Composes the run form with the pickers of versions, pathways and peril profiles (three
 * features, joined here). The pickers search the whole lists; this page only asks whether
 * anything exists and which version to start with: the one a link names, else the newest approved.
 */
export default function RunNewPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const linked = useModelVersion(params.get("version") ?? undefined);
  const anyVersion = useModelVersions({ limit: 1 });
  const newestApproved = useModelVersions({ status: "approved", limit: 1 });
  const anyPathway = usePathways({ limit: 1 });
  const portfolios = usePortfolios();
  const [lens, setLens] = useState<PerilRunChoice>({ perilProfileIds: [], portfolioId: null });
  // isLoading, not isPending: without a linked version that query never runs and stays pending.
  const loading = [anyVersion, newestApproved, anyPathway].some((q) => q.isPending) || linked.isLoading;
  const failed = [anyVersion, newestApproved, anyPathway].find((q) => q.isError);
  return (
    <>
      <PageHeader
        kicker="Runs"
        title="New run"
        description="Pick a model version and pathways, then queue the ensemble. Seed and settings are recorded so the run can be replayed."
      />
      <Card>
        <CardBody>
          {loading ? (
            <LoadingState />
          ) : failed ? (
            <ErrorState error={failed.error} />
          ) : anyVersion.data?.total === 0 || anyPathway.data?.total === 0 ? (
            <EmptyState title="Nothing to run yet">
              A run needs at least one model version that is not rejected or retired, and at least one pathway.
            </EmptyState>
          ) : (
            <RunForm
              versionSource={modelVersionPickerSource}
              pathwaySource={pathwayPickerSource}
              initialVersion={linked.data ?? newestApproved.data?.items[0]}
              onCreated={(run) => navigate(paths.run.build(run.id))}
              lens={lens}
              lensFields={
                portfolios.data && (
                  <PerilRunPicker profileSource={perilProfilePickerSource} portfolios={portfolios.data} value={lens} onChange={setLens} />
                )
              }
            />
          )}
        </CardBody>
      </Card>
    </>
  );
}
