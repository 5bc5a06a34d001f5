import { paths } from "@/config/paths";
import { useCan } from "@/features/auth/use-permission";
import { usePathways } from "@/features/pathways/api/get-pathways";
import { PathwaysTable } from "@/features/pathways/components/pathways-table";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { ListControls } from "@/components/lists/list-controls";
import { listFieldErrors } from "@/components/lists/list-field-errors";
import { PagedList } from "@/components/lists/paged-list";
import { useListQuery } from "@/components/lists/use-list-query";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/states";

const PATHWAY_SORTS = [
  { value: "createdAt:desc", label: "Newest first" },
  { value: "createdAt:asc", label: "Oldest first" },
  { value: "name:asc", label: "Name A–Z" },
  { value: "name:desc", label: "Name Z–A" },
  { value: "startYear:asc", label: "Earliest start" },
  { value: "endYear:desc", label: "Latest end" },
];

export default function PathwaysPage() {
  const list = useListQuery({ defaultSort: "createdAt:desc", filterKeys: ["locked", "author", "from", "to"] });
  const { q, sort, limit, offset, filters } = list.state;
  const pathways = usePathways({ q, sort, limit, offset, locked: (filters.locked || undefined) as "true" | "false" | undefined, author: filters.author, from: filters.from, to: filters.to });
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
      <Card className="mb-4">
        <CardBody>
          <ListControls
            noun="pathways"
            state={list.state}
            onChange={list.update}
            errors={listFieldErrors(pathways.error)}
            searchHint="Name, description, source or vintage"
            sortOptions={PATHWAY_SORTS}
            selects={[{ key: "locked", label: "Locked", options: [{ value: "true", label: "Locked (used by a record)" }, { value: "false", label: "Not locked" }] }]}
            texts={[{ key: "author", label: "Added by", placeholder: "Name or email" }]}
            dates
          />
        </CardBody>
      </Card>
      <Card>
        <PagedList
          result={pathways}
          noun="pathways"
          state={list.state}
          onOffset={list.setOffset}
          empty={
            list.filtered ? (
              <EmptyState title="No pathways match these filters" />
            ) : (
              <EmptyState title="No pathways yet">Upload a CSV or XLSX file, or compose one from an existing pathway.</EmptyState>
            )
          }
        >
          {(items) => <PathwaysTable pathways={items} />}
        </PagedList>
      </Card>
    </>
  );
}
