import { EXPORT_FORMATS } from "@plumeline/contracts";
import { useMe } from "@/features/auth/api/get-me";
import { useExports } from "@/features/exports/api/get-exports";
import { ExportsTable } from "@/features/exports/components/exports-table";
import { Card, CardBody } from "@/components/ui/card";
import { ListControls } from "@/components/lists/list-controls";
import { listFieldErrors } from "@/components/lists/list-field-errors";
import { PagedList } from "@/components/lists/paged-list";
import { useListQuery } from "@/components/lists/use-list-query";
import { PageHeader } from "@/components/ui/page-header";
import { Segmented } from "@/components/ui/segmented";
import { EmptyState } from "@/components/ui/states";

const EXPORT_SORTS = [
  { value: "createdAt:desc", label: "Newest first" },
  { value: "createdAt:asc", label: "Oldest first" },
  { value: "fileName:asc", label: "File name A–Z" },
  { value: "format:asc", label: "Format" },
  { value: "byteSize:desc", label: "Largest first" },
];

export default function ExportsPage() {
  // Your own exports first: "mine" is on unless the URL says otherwise.
  const list = useListQuery({ defaultSort: "createdAt:desc", filterKeys: ["mine", "format", "author", "from", "to"], defaultFilters: { mine: "true" } });
  const { q, sort, limit, offset, filters } = list.state;
  const mine = filters.mine === "true";
  const exports = useExports({ q, sort, limit, offset, mine, format: (filters.format || undefined) as (typeof EXPORT_FORMATS)[number] | undefined, author: filters.author, from: filters.from, to: filters.to });
  const me = useMe();
  const canDownload = me.data?.permissions.includes("exports:create") ?? false;
  return (
    <>
      <PageHeader kicker="Exports" title="Exports" description="Every report, workbook and CSV handed out, with its checksum, so a figure in a report can be traced to its run. Any past file downloads again, rebuilt from the stored result and checked against its checksum." />
      <div className="mb-3">
        <Segmented
          label="Whose exports"
          value={mine ? "mine" : "all"}
          onChange={(v) => list.update({ filters: { mine: v === "mine" ? "true" : "false" } })}
          options={[
            { value: "mine", label: "Mine" },
            { value: "all", label: "Everyone's" },
          ]}
        />
      </div>
      <Card className="mb-4">
        <CardBody>
          <ListControls
            noun="exports"
            state={list.state}
            onChange={list.update}
            errors={listFieldErrors(exports.error)}
            searchHint="File name, table or the run's name"
            sortOptions={EXPORT_SORTS}
            selects={[{ key: "format", label: "Format", options: EXPORT_FORMATS.map((f) => ({ value: f, label: f.toUpperCase() })) }]}
            texts={mine ? [] : [{ key: "author", label: "Exported by", placeholder: "Name or email" }]}
            dates
          />
        </CardBody>
      </Card>
      <Card>
        <PagedList
          result={exports}
          noun="exports"
          state={list.state}
          onOffset={list.setOffset}
          empty={
            list.filtered ? (
              <EmptyState title="No exports match these filters" />
            ) : (
              <EmptyState title="No exports yet">Open a finished run and download its workbook or a CSV table.</EmptyState>
            )
          }
        >
          {(items) => <ExportsTable exports={items} canDownload={canDownload} />}
        </PagedList>
      </Card>
    </>
  );
}
