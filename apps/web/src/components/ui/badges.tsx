import { cx } from "./cx";

/** Loud, hatched mark for results made with an unapproved model version (exploratory: never for filing). */
export function ExploratoryStamp({ size = "md", className }: { size?: "sm" | "md" | "lg"; className?: string }) {
  return (
    <span
      className={cx(
        "stamp-exploratory inline-flex items-center gap-1 rounded-sm font-mono font-semibold uppercase tracking-[0.18em]",
        size === "sm" && "px-1.5 py-0 text-[10px]",
        size === "md" && "px-2 py-0.5 text-xs",
        size === "lg" && "-rotate-1 px-3 py-1 text-sm",
        className,
      )}
      title="Made with a model version that is not approved: exploratory, not for filing"
    >
      <span aria-hidden>◭</span> Exploratory
    </span>
  );
}

/** Quiet seal for results from an approved model version. */
export function ApprovedSeal({ size = "md", className }: { size?: "sm" | "md"; className?: string }) {
  return (
    <span
      className={cx(
        "inline-flex items-center gap-1 rounded-full border border-ok/60 bg-ok-soft font-semibold uppercase tracking-[0.14em] text-ok",
        size === "sm" ? "px-1.5 text-[10px]" : "px-2 py-0.5 text-xs",
        className,
      )}
      title="Made with an approved model version"
    >
      <svg aria-hidden viewBox="0 0 12 12" className="h-3 w-3">
        <circle cx="6" cy="6" r="5" fill="none" stroke="currentColor" strokeWidth="1.3" />
        <path d="M3.6 6.2 5.2 7.7 8.4 4.5" fill="none" stroke="currentColor" strokeWidth="1.4" />
      </svg>
      Approved
    </span>
  );
}

const statusTone: Record<string, string> = {
  draft: "border-line-strong text-muted bg-surface-2",
  "in-review": "border-accent/50 text-accent bg-accent-soft",
  approved: "border-ok/60 text-ok bg-ok-soft",
  rejected: "border-danger/60 text-danger bg-danger-soft",
  retired: "border-line text-faint bg-surface-2 line-through",
  queued: "border-line-strong text-muted bg-surface-2",
  running: "border-accent/50 text-accent bg-accent-soft",
  succeeded: "border-ok/60 text-ok bg-ok-soft",
  finished: "border-ok/60 text-ok bg-ok-soft",
  done: "border-ok/60 text-ok bg-ok-soft",
  failed: "border-danger/60 text-danger bg-danger-soft",
  cancelled: "border-line text-faint bg-surface-2",
  "cancelling…": "border-danger/40 text-danger bg-surface-2",
  canceled: "border-line text-faint bg-surface-2",
};

export function StatusBadge({ status }: { status: string }) {
  return (
    <span className={cx("inline-flex items-center rounded-full border px-2 text-xs font-medium", statusTone[status] ?? statusTone.draft)}>
      {status.replace("-", " ")}
    </span>
  );
}

export function RoleBadge({ role }: { role: string }) {
  return <span className="rounded bg-surface-2 px-1.5 py-0.5 font-mono text-[11px] uppercase tracking-wider text-muted">{role}</span>;
}
