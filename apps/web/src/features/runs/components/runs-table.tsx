import { Link } from "react-router-dom";
import type { RunSummary } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { ApprovedSeal, ExploratoryStamp } from "@/components/ui/badges";
import { Button } from "@/components/ui/button";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDateTime, formatInteger } from "@/lib/format";
import { useCancelRun } from "../api/cancel-run";
import { isActive } from "../api/get-runs";
import { RunProgress } from "./run-progress";

/** Runs with live progress; the owner (with runs:create) may cancel a queued or running one. */
export function RunsTable({ runs, currentUserId, canCreate, compact = false }: { runs: RunSummary[]; currentUserId: string; canCreate: boolean; compact?: boolean }) {
  const cancel = useCancelRun();
  return (
    <Table>
      <thead>
        <tr>
          <Th>Run</Th>
          <Th>Model version</Th>
          {!compact && <Th numeric>Members</Th>}
          {!compact && <Th>Started by</Th>}
          <Th>Status</Th>
          {!compact && <Th>Created</Th>}
          <Th>
            <span className="sr-only">Actions</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {runs.map((r) => (
          <tr key={r.id} className="hover:bg-surface-2/60">
            <Td>
              <Link to={paths.run.build(r.id)} className="font-medium text-accent hover:underline">
                {r.name || `Run ${r.id.slice(0, 8)}`}
              </Link>
              <div className="mt-0.5">{r.exploratory ? <ExploratoryStamp size="sm" /> : <ApprovedSeal size="sm" />}</div>
            </Td>
            <Td>
              <Link to={paths.modelVersion.build(r.modelVersion.id)} className="hover:underline">
                {r.modelVersion.name} <span className="text-muted">v{r.modelVersion.versionNumber}</span>
              </Link>
            </Td>
            {!compact && <Td numeric>{formatInteger(r.members)}</Td>}
            {!compact && <Td>{r.createdByName ?? "–"}</Td>}
            <Td>
              <RunProgress run={r} />
            </Td>
            {!compact && <Td className="whitespace-nowrap text-muted">{formatDateTime(r.createdAt)}</Td>}
            <Td className="text-right">
              {canCreate && r.createdBy === currentUserId && isActive(r) && (
                <Button
                  variant="secondary"
                  size="sm"
                  disabled={cancel.isPending && cancel.variables === r.id}
                  onClick={() => cancel.mutate(r.id)}
                  aria-label={`Cancel ${r.name}`}
                >
                  Cancel
                </Button>
              )}
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
