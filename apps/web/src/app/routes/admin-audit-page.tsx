import { useMe } from "@/features/auth/api/get-me";
import { auditCsvUrl, useAudit } from "@/features/admin/api/get-audit";
import { AdminTabs } from "@/features/admin/components/admin-tabs";
import { AuditTable } from "@/features/admin/components/audit-table";
import { ListControls } from "@/components/lists/list-controls";
import { listFieldErrors } from "@/components/lists/list-field-errors";
import { PagedList } from "@/components/lists/paged-list";
import { useListQuery } from "@/components/lists/use-list-query";
import { Button, buttonClass } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/states";

const AUDIT_SORTS = [
  { value: "createdAt:desc", label: "Newest first" },
  { value: "createdAt:asc", label: "Oldest first" },
  { value: "action:asc", label: "Action A–Z" },
  { value: "entityType:asc", label: "Kind of thing" },
];

const ENTITY_TYPES = ["run", "pathway", "model-version", "peril-profile", "portfolio", "user", "organisation", "mail"];

export default function AdminAuditPage() {
  const me = useMe();
  // Sign-ins are most of a busy day's trail; they are hidden (and counted) unless asked for.
  const list = useListQuery({
    defaultSort: "createdAt:desc",
    filterKeys: ["actor", "entity", "action", "entityType", "from", "to", "hideSignIns"],
    defaultFilters: { hideSignIns: "true" },
  });
  const { q, sort, limit, offset, filters } = list.state;
  const query = {
    q,
    sort,
    limit,
    offset,
    actor: filters.actor,
    entity: filters.entity,
    action: filters.action,
    entityType: filters.entityType,
    from: filters.from,
    to: filters.to,
    hideSignIns: filters.hideSignIns === "true",
  };
  const audit = useAudit(query);
  const hidden = audit.data?.hiddenSignIns ?? 0;
  return (
    <>
      <PageHeader
        kicker="Admin"
        title="Audit log"
        description="Append-only, with who and when: state changes (drafts, submissions, approvals and rejections, retirements, runs, uploads), exports, invitations and role changes, and every sign-in or refused sign-in, with the IP address. Names are today's names of the people and things involved. Times are UTC in the CSV."
        actions={
          <a className={buttonClass("secondary")} href={auditCsvUrl(query)} download>
            Download CSV
          </a>
        }
      />
      <AdminTabs permissions={me.data?.permissions ?? []} />
      <Card className="mb-4">
        <CardBody>
          <ListControls
            noun="the audit log"
            state={list.state}
            onChange={list.update}
            errors={listFieldErrors(audit.error)}
            searchHint="Summary, action or a person's name or email"
            sortOptions={AUDIT_SORTS}
            texts={[
              { key: "actor", label: "Who", placeholder: "Name or email" },
              { key: "entity", label: "About", placeholder: "Name of a run, pathway, version…" },
              { key: "action", label: "Action", placeholder: "e.g. model-version.approved" },
            ]}
            selects={[{ key: "entityType", label: "Kind of thing", options: ENTITY_TYPES.map((t) => ({ value: t, label: t })) }]}
            toggles={[{ key: "hideSignIns", label: "Hide sign-ins" }]}
            dates
          />
        </CardBody>
      </Card>
      {hidden > 0 && (
        <p className="mb-2 flex items-center gap-2 text-sm text-muted">
          {hidden.toLocaleString("en-GB")} successful sign-in{hidden === 1 ? "" : "s"} hidden.
          <Button variant="ghost" size="sm" onClick={() => list.update({ filters: { hideSignIns: "false" } })}>
            Show them
          </Button>
        </p>
      )}
      <Card>
        <PagedList result={audit} noun="events" state={list.state} onOffset={list.setOffset} empty={<EmptyState title="No events match" />}>
          {(items) => <AuditTable events={items} />}
        </PagedList>
      </Card>
    </>
  );
}
