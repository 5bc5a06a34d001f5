import { Link } from "react-router-dom";
import type { ModelVersionSummary } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { StatusBadge } from "@/components/ui/badges";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDate } from "@/lib/format";

export function ModelVersionsTable({ versions }: { versions: ModelVersionSummary[] }) {
  return (
    <Table aria-label="Model versions">
      <thead>
        <tr>
          <Th>Version</Th>
          <Th>Status</Th>
          <Th>Change</Th>
          <Th>Author</Th>
          <Th>Decided by</Th>
          <Th>Updated</Th>
        </tr>
      </thead>
      <tbody>
        {versions.map((v) => (
          <tr key={v.id} className="hover:bg-surface-2/60">
            <Td>
              <Link to={paths.modelVersion.build(v.id)} className="font-medium text-accent hover:underline">
                {v.name}
              </Link>{" "}
              <span className="num text-muted">v{v.versionNumber}</span>
            </Td>
            <Td>
              <StatusBadge status={v.status} />
            </Td>
            <Td className="text-muted">{v.changeClass ?? "–"}</Td>
            <Td>{v.authorName ?? "–"}</Td>
            <Td>{v.decidedByName ? `${v.decidedByName}, ${formatDate(v.decidedAt)}` : "–"}</Td>
            <Td className="whitespace-nowrap text-muted">{formatDate(v.updatedAt)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
