import { useState } from "react";
import { useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { useModelVersionChoices } from "@/features/model-versions/api/get-model-versions";
import { usePathwayChoices } from "@/features/pathways/api/get-pathways";
import { usePerilProfileChoices } from "@/features/peril/api/get-peril-profiles";
import { usePortfolios } from "@/features/peril/api/get-portfolios";
import { PerilRunPicker, type PerilRunChoice } from "@/features/peril/components/peril-run-picker";
import { RunForm } from "@/features/runs/components/run-form";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

/** Composes the run form with the versions and pathways it offers (two features, joined here). */
export default function RunNewPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const versions = useModelVersionChoices();
  const pathways = usePathwayChoices();
  const usable = versions.data?.filter((v) => v.status !== "rejected" && v.status !== "retired") ?? [];
  const perilProfiles = usePerilProfileChoices();
  const portfolios = usePortfolios();
  const [lens, setLens] = useState<PerilRunChoice>({ perilProfileIds: [], portfolioId: null });
  return (
    <>
      <PageHeader kicker="Runs" title="New run" description="Pick a model version and pathways, then queue the ensemble. Seed and settings are recorded so the run can be replayed." />
      <Card>
        <CardBody>
          {versions.isPending || pathways.isPending ? (
            <LoadingState />
          ) : versions.isError || pathways.isError ? (
            <ErrorState error={versions.error ?? pathways.error} />
          ) : usable.length === 0 || pathways.data.length === 0 ? (
            <EmptyState title="Nothing to run yet">A run needs at least one model version that is not rejected or retired, and at least one pathway.</EmptyState>
          ) : (
            <RunForm
              versions={usable}
              pathways={pathways.data}
              initialVersionId={params.get("version") ?? undefined}
              onCreated={(run) => navigate(paths.run.build(run.id))}
              lens={lens}
              lensFields={perilProfiles.data && portfolios.data && <PerilRunPicker profiles={perilProfiles.data} portfolios={portfolios.data} value={lens} onChange={setLens} />}
            />
          )}
        </CardBody>
      </Card>
    </>
  );
}
