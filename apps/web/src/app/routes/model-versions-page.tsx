import { MODEL_VERSION_STATUSES, type ModelVersionStatus } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { useCan } from "@/features/auth/use-permission";
import { useModelVersions } from "@/features/model-versions/api/get-model-versions";
import { ModelVersionsTable } from "@/features/model-versions/components/model-versions-table";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { ListControls } from "@/components/lists/list-controls";
import { listFieldErrors } from "@/components/lists/list-field-errors";
import { PagedList } from "@/components/lists/paged-list";
import { useListQuery } from "@/components/lists/use-list-query";
import { PageHeader } from "@/components/ui/page-header";
import { Segmented } from "@/components/ui/segmented";
import { EmptyState } from "@/components/ui/states";

const VERSION_SORTS = [
  { value: "updatedAt:desc", label: "Recently changed" },
  { value: "createdAt:desc", label: "Newest first" },
  { value: "createdAt:asc", label: "Oldest first" },
  { value: "name:asc", label: "Name A–Z" },
  { value: "name:desc", label: "Name Z–A" },
  { value: "versionNumber:desc", label: "Highest version number" },
  { value: "status:asc", label: "Status" },
];

export default function ModelVersionsPage() {
  const list = useListQuery({ defaultSort: "updatedAt:desc", filterKeys: ["status", "author", "from", "to"] });
  const { q, sort, limit, offset, filters } = list.state;
  // An unknown status in the URL is sent as written: the API refuses it and the page names the field.
  const status = filters.status === "" ? undefined : (filters.status as ModelVersionStatus);
  const versions = useModelVersions({ q, sort, limit, offset, status, author: filters.author, from: filters.from, to: filters.to });
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
          onChange={(v) => list.update({ filters: { status: v === "all" ? "" : v } })}
          options={[{ value: "all", label: "All" }, ...MODEL_VERSION_STATUSES.map((s) => ({ value: s, label: s.replace("-", " ") }))]}
        />
      </div>
      <Card className="mb-4">
        <CardBody>
          <ListControls
            noun="model versions"
            state={list.state}
            onChange={list.update}
            errors={listFieldErrors(versions.error)}
            searchHint="Name or notes"
            sortOptions={VERSION_SORTS}
            texts={[{ key: "author", label: "Author", placeholder: "Name or email" }]}
            dates
          />
        </CardBody>
      </Card>
      <Card>
        <PagedList
          result={versions}
          noun="model versions"
          state={list.state}
          onOffset={list.setOffset}
          empty={<EmptyState title={list.filtered ? (status && !list.state.q && !filters.author && !filters.from && !filters.to ? `No ${status.replace("-", " ")} versions` : "No model versions match these filters") : "No model versions yet"} />}
        >
          {(items) => <ModelVersionsTable versions={items} />}
        </PagedList>
      </Card>
    </>
  );
}
