import type { ReactNode } from "react";
import { ApiError, isApiError } from "@/lib/api-error";
import { cx } from "./cx";

export function Spinner({ className }: { className?: string }) {
  return (
    <span
      aria-hidden
      className={cx("inline-block h-4 w-4 animate-spin rounded-full border-2 border-line-strong border-t-ember-600", className)}
    />
  );
}

export function LoadingState({ label = "Loading…", className }: { label?: string; className?: string }) {
  return (
    <div role="status" className={cx("flex items-center gap-2 p-6 text-sm text-muted", className)}>
      <Spinner /> {label}
    </div>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="flex flex-col items-center gap-2 rounded-md border border-dashed border-line-strong px-6 py-8 text-center">
      <svg aria-hidden viewBox="0 0 40 24" className="h-6 w-10 text-line-strong">
        <path d="M2 20 C 12 18, 22 12, 38 4" fill="none" stroke="currentColor" strokeWidth="2" strokeDasharray="3 3" />
      </svg>
      <p className="font-medium text-ink">{title}</p>
      {children && <div className="max-w-md text-sm text-muted">{children}</div>}
      {action}
    </div>
  );
}

/** Explains a failure in words a user can act on; a 403 shows the server's reason. */
export function ErrorState({ error, title, retry }: { error: unknown; title?: string; retry?: () => void }) {
  const e = isApiError(error) ? error : null;
  const heading =
    title ??
    (e?.status === 403
      ? "Not allowed"
      : e?.status === 404
        ? "Not found"
        : e?.status === 0
          ? "Server unreachable"
          : "Something went wrong");
  const message = e ? e.message : error instanceof Error ? error.message : "Unexpected error";
  return (
    <div role="alert" className="rounded-md border border-danger/40 bg-danger-soft px-4 py-3 text-sm">
      <p className="font-semibold text-danger">{heading}</p>
      <p className="mt-0.5 text-text">{message}</p>
      {e && e.details.length > 0 && (
        <ul className="mt-2 list-disc pl-5 text-text">
          {e.details.slice(0, 12).map((d, i) => (
            <li key={i}>
              {d.path && <code className="font-mono text-xs">{d.path}</code>} {d.message}
            </li>
          ))}
        </ul>
      )}
      {retry && (
        <button type="button" onClick={retry} className="mt-2 text-sm font-medium text-accent underline">
          Try again
        </button>
      )}
    </div>
  );
}

export function InlineError({ error }: { error: unknown }) {
  if (!error) return null;
  const message = error instanceof ApiError || error instanceof Error ? error.message : typeof error === "string" ? error : "Something went wrong.";
  return (
    <p role="alert" className="text-sm font-medium text-danger">
      {message}
    </p>
  );
}
