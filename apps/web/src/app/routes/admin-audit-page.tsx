import { useState } from "react";
import { useMe } from "@/features/auth/api/get-me";
import { useAudit } from "@/features/admin/api/get-audit";
import { AdminTabs } from "@/features/admin/components/admin-tabs";
import { AuditFilters, type AuditFilterFields } from "@/features/admin/components/audit-filters";
import { Button } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDateTime } from "@/lib/format";

const PAGE = 50;

export default function AdminAuditPage() {
  const me = useMe();
  const [filter, setFilter] = useState<AuditFilterFields>({});
  const [offset, setOffset] = useState(0);
  const audit = useAudit({ ...filter, limit: PAGE, offset });
  return (
    <>
      <PageHeader kicker="Admin" title="Audit log" description="Append-only, with who and when: state changes (drafts, submissions, approvals and rejections, retirements, runs, uploads), exports, invitations and role changes, and every sign-in (auth.signed-in) or refused sign-in (auth.sign-in-failed), with the IP address." />
      <AdminTabs permissions={me.data?.permissions ?? []} />
      <Card className="mb-4">
        <CardBody>
          <AuditFilters
            value={filter}
            onApply={(f) => {
              setFilter(f);
              setOffset(0);
            }}
          />
        </CardBody>
      </Card>
      <Card>
        {audit.isPending ? (
          <LoadingState />
        ) : audit.isError ? (
          <div className="p-4">
            <ErrorState error={audit.error} />
          </div>
        ) : audit.data.items.length === 0 ? (
          <div className="p-4">
            <EmptyState title="No events match" />
          </div>
        ) : (
          <>
            <Table>
              <thead>
                <tr>
                  <Th>When</Th>
                  <Th>Who</Th>
                  <Th>Action</Th>
                  <Th>Entity</Th>
                  <Th>Summary</Th>
                </tr>
              </thead>
              <tbody>
                {audit.data.items.map((e) => (
                  <tr key={e.id}>
                    <Td className="num whitespace-nowrap text-xs">{formatDateTime(e.createdAt)}</Td>
                    <Td className="text-xs">{e.actorEmail ?? "system"}</Td>
                    <Td>
                      <code className="text-xs">{e.action}</code>
                    </Td>
                    <Td className="text-xs text-muted">
                      {e.entityType}
                      {e.entityId && <span className="num block max-w-40 truncate">{e.entityId}</span>}
                    </Td>
                    <Td className="min-w-72 text-sm [overflow-wrap:anywhere]">{e.summary}</Td>
                  </tr>
                ))}
              </tbody>
            </Table>
            <div className="flex items-center justify-between px-4 py-3 text-sm text-muted">
              <span>
                {offset + 1}–{offset + audit.data.items.length} of {audit.data.total}
              </span>
              <div className="flex gap-2">
                <Button variant="secondary" size="sm" disabled={offset === 0} onClick={() => setOffset(Math.max(0, offset - PAGE))}>
                  Newer
                </Button>
                <Button variant="secondary" size="sm" disabled={offset + PAGE >= audit.data.total} onClick={() => setOffset(offset + PAGE)}>
                  Older
                </Button>
              </div>
            </div>
          </>
        )}
      </Card>
    </>
  );
}
