import { useSearchParams } from "react-router-dom";
import { useMe } from "@/features/auth/api/get-me";
import { useOutbox, useOutboxMessage } from "@/features/admin/api/get-outbox";
import { AdminTabs } from "@/features/admin/components/admin-tabs";
import { Card, CardBody } from "@/components/ui/card";
import { cx } from "@/components/ui/cx";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";
import { formatDateTime } from "@/lib/format";

export default function AdminOutboxPage() {
  const me = useMe();
  const [params, setParams] = useSearchParams();
  const selected = params.get("message") ?? undefined;
  const outbox = useOutbox();
  const message = useOutboxMessage(selected);
  return (
    <>
      <PageHeader kicker="Admin" title="Outbox" description="Mail the app sent: invitations, review requests, decisions, finished and failed runs." />
      <AdminTabs permissions={me.data?.permissions ?? []} />
      {outbox.isPending ? (
        <LoadingState />
      ) : outbox.isError ? (
        <ErrorState error={outbox.error} />
      ) : outbox.data.length === 0 ? (
        <EmptyState title="No mail yet" />
      ) : (
        <div className="grid gap-4 lg:grid-cols-[22rem_1fr]">
          <Card className="max-h-[70vh] overflow-auto">
            <ul>
              {outbox.data.map((m) => (
                <li key={m.id}>
                  <button
                    type="button"
                    onClick={() => setParams({ message: String(m.id) })}
                    aria-current={String(m.id) === selected ? "true" : undefined}
                    className={cx("w-full border-b border-line px-4 py-2.5 text-left hover:bg-surface-2", String(m.id) === selected && "bg-accent-soft")}
                  >
                    <p className="truncate text-sm font-medium">{m.subject}</p>
                    <p className="truncate text-xs text-muted">to {m.to.join(", ")}</p>
                    <p className="text-[11px] text-faint">{formatDateTime(m.receivedAt)}</p>
                  </button>
                </li>
              ))}
            </ul>
          </Card>
          <Card>
            <CardBody>
              {!selected ? (
                <p className="text-sm text-muted">Choose a message to read it.</p>
              ) : message.isPending ? (
                <LoadingState />
              ) : message.isError ? (
                <ErrorState error={message.error} />
              ) : (
                <article>
                  <h2 className="text-lg font-semibold">{message.data.subject}</h2>
                  <p className="mt-1 text-xs text-muted">
                    From {message.data.from} to {message.data.to.join(", ")} · {formatDateTime(message.data.receivedAt)}
                  </p>
                  {/* Plain text only: mail HTML is never injected into the app. */}
                  <pre className="mt-4 whitespace-pre-wrap font-sans text-sm">{message.data.text}</pre>
                </article>
              )}
            </CardBody>
          </Card>
        </div>
      )}
    </>
  );
}
