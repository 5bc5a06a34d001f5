import { useSearchParams } from "react-router-dom";
import { MODEL_VERSION_STATUSES, type ModelVersionStatus } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { useCan } from "@/features/auth/use-permission";
import { useModelVersions } from "@/features/model-versions/api/get-model-versions";
import { ModelVersionsTable } from "@/features/model-versions/components/model-versions-table";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { Segmented } from "@/components/ui/segmented";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

export default function ModelVersionsPage() {
  const [params, setParams] = useSearchParams();
  const raw = params.get("status");
  const status = (MODEL_VERSION_STATUSES as readonly string[]).includes(raw ?? "") ? (raw as ModelVersionStatus) : undefined;
  const versions = useModelVersions(status);
  const canWrite = useCan("model-versions:write");
  return (
    <>
      <PageHeader
        kicker="Model versions"
        title="Model versions"
        description="The uncertainty assumptions, versioned. Drafts go to review; a manager who did not write them approves or rejects; approved versions can be retired."
        actions={
          canWrite && (
            <ButtonLink to={paths.modelVersionNew.build()} variant="primary">
              New draft
            </ButtonLink>
          )
        }
      />
      <div className="mb-3">
        <Segmented
          label="Status"
          value={status ?? "all"}
          onChange={(v) => setParams(v === "all" ? {} : { status: v })}
          options={[{ value: "all", label: "All" }, ...MODEL_VERSION_STATUSES.map((s) => ({ value: s, label: s.replace("-", " ") }))]}
        />
      </div>
      <Card>
        {versions.isPending ? (
          <LoadingState />
        ) : versions.isError ? (
          <div className="p-4">
            <ErrorState error={versions.error} retry={() => versions.refetch()} />
          </div>
        ) : versions.data.length === 0 ? (
          <div className="p-4">
            <EmptyState title={status ? `No ${status.replace("-", " ")} versions` : "No model versions yet"} />
          </div>
        ) : (
          <ModelVersionsTable versions={versions.data} />
        )}
      </Card>
    </>
  );
}
