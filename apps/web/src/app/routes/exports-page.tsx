import { useState } from "react";
import { useMe } from "@/features/auth/api/get-me";
import { useExports } from "@/features/exports/api/get-exports";
import { ExportsTable } from "@/features/exports/components/exports-table";
import { Card } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { Segmented } from "@/components/ui/segmented";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

export default function ExportsPage() {
  const [mine, setMine] = useState(true);
  const exports = useExports(mine);
  const me = useMe();
  const canDownload = me.data?.permissions.includes("exports:create") ?? false;
  return (
    <>
      <PageHeader kicker="Exports" title="Exports" description="Every report, workbook and CSV handed out, with its checksum, so a figure in a report can be traced to its run. Any past file downloads again, rebuilt from the stored result and checked against its checksum." />
      <div className="mb-3">
        <Segmented
          label="Whose exports"
          value={mine ? "mine" : "all"}
          onChange={(v) => setMine(v === "mine")}
          options={[
            { value: "mine", label: "Mine" },
            { value: "all", label: "Everyone's" },
          ]}
        />
      </div>
      <Card>
        {exports.isPending ? (
          <LoadingState />
        ) : exports.isError ? (
          <div className="p-4">
            <ErrorState error={exports.error} retry={() => exports.refetch()} />
          </div>
        ) : exports.data.length === 0 ? (
          <div className="p-4">
            <EmptyState title="No exports yet">Open a finished run and download its workbook or a CSV table.</EmptyState>
          </div>
        ) : (
          <ExportsTable exports={exports.data} canDownload={canDownload} />
        )}
      </Card>
    </>
  );
}
