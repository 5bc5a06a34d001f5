import { paths } from "@/config/paths";
import { useCan } from "@/features/auth/use-permission";
import { usePathways } from "@/features/pathways/api/get-pathways";
import { PathwaysTable } from "@/features/pathways/components/pathways-table";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

export default function PathwaysPage() {
  const pathways = usePathways();
  const canWrite = useCan("pathways:write");
  return (
    <>
      <PageHeader
        kicker="Pathways"
        title="Forcing pathways"
        description="Each pathway gives forcing or concentrations per agent and year, with where it came from and which vintage."
        actions={
          canWrite && (
            <>
              <ButtonLink to={paths.pathwayCompose.build()} variant="secondary">
                Compose a pathway
              </ButtonLink>
              <ButtonLink to={paths.pathwayUpload.build()} variant="primary">
                Upload CSV / XLSX
              </ButtonLink>
            </>
          )
        }
      />
      <Card>
        {pathways.isPending ? (
          <LoadingState label="Loading pathways…" />
        ) : pathways.isError ? (
          <div className="p-4">
            <ErrorState error={pathways.error} retry={() => pathways.refetch()} />
          </div>
        ) : pathways.data.length === 0 ? (
          <div className="p-4">
            <EmptyState title="No pathways yet">Upload a CSV or XLSX file, or compose one from an existing pathway.</EmptyState>
          </div>
        ) : (
          <PathwaysTable pathways={pathways.data} />
        )}
      </Card>
    </>
  );
}
