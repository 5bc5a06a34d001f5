import { Link } from "react-router-dom";
import { AGENT_LABELS, type ForcingAgent, type PathwaySummary } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDate } from "@/lib/format";

const agentNames = (p: PathwaySummary) => p.agents.map((a) => AGENT_LABELS[a as ForcingAgent] ?? a).join(", ");

export function PathwaysTable({ pathways }: { pathways: PathwaySummary[] }) {
  return (
    <Table>
      <thead>
        <tr>
          <Th>Pathway</Th>
          <Th>Source</Th>
          <Th>Vintage</Th>
          <Th numeric>Years</Th>
          <Th>Agents</Th>
          <Th>Added</Th>
        </tr>
      </thead>
      <tbody>
        {pathways.map((p) => (
          <tr key={p.id} className="hover:bg-surface-2/60">
            <Td>
              <Link to={paths.pathway.build(p.id)} className="font-medium text-accent hover:underline">
                {p.name}
              </Link>
              {p.locked && (
                <span className="ml-2 rounded bg-surface-2 px-1.5 text-[10px] uppercase tracking-wider text-muted" title="Pinned by an approved model version or used by a run: no longer editable">
                  locked
                </span>
              )}
              {p.description && <p className="mt-0.5 line-clamp-1 text-xs text-muted">{p.description}</p>}
            </Td>
            {/* "Where it came from" is the column analysts read: it gets the room, and the
                vintage wraps instead of taking a third of a laptop-wide table. */}
            <Td className="min-w-64 max-w-96 text-xs text-muted">
              <span className="line-clamp-3" title={p.source}>
                {p.source}
              </span>
            </Td>
            <Td className="min-w-32 max-w-48">{p.vintage}</Td>
            <Td numeric className="whitespace-nowrap">
              {p.startYear}–{p.endYear}
            </Td>
            {/* The count reads at a glance; the names stay, clamped, with the full list on hover. */}
            <Td className="min-w-40 max-w-56 text-xs text-muted">
              <span className="line-clamp-2" title={agentNames(p)}>
                <span className="font-medium text-text">{p.agents.length}:</span> {agentNames(p)}
              </span>
            </Td>
            <Td className="whitespace-nowrap text-muted">{formatDate(p.createdAt)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
