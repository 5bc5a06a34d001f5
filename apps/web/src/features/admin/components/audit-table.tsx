import type { AuditEvent } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDateTime } from "@/lib/format";

/**
 * Audit rows with people and things named: the actor's name above the address they used,
 * the entity's kind above its name (the raw id stays, small, for tracing).
 */
export function AuditTable({ events }: { events: AuditEvent[] }) {
  return (
    <Table>
      <thead>
        <tr>
          <Th>When</Th>
          <Th>Who</Th>
          <Th>Action</Th>
          <Th>About</Th>
          <Th>Summary</Th>
        </tr>
      </thead>
      <tbody>
        {events.map((e) => (
          <tr key={e.id}>
            <Td className="num whitespace-nowrap text-xs">{formatDateTime(e.createdAt)}</Td>
            <Td className="text-xs">
              {e.actorName && <span className="block font-medium text-ink">{e.actorName}</span>}
              <span className="text-muted">{e.actorEmail ?? "system"}</span>
            </Td>
            <Td>
              <code className="text-xs">{e.action}</code>
            </Td>
            <Td className="text-xs">
              <span className="text-muted">{e.entityType}</span>
              {e.entityName && <span className="block max-w-48 truncate font-medium text-ink">{e.entityName}</span>}
              {e.entityId && <span className="num block max-w-40 truncate text-faint">{e.entityId}</span>}
            </Td>
            <Td className="min-w-72 text-sm [overflow-wrap:anywhere]">{e.summary}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
