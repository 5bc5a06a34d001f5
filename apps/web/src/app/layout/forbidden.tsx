import { Link } from "react-router-dom";
import { paths } from "@/config/paths";

/** What a user sees when they open a page their role may not use: the reason, not a failure. */
export function Forbidden({ purpose, holders, role }: { purpose?: string; holders?: string; role: string }) {
  return (
    <div className="mx-auto mt-16 max-w-lg rounded-lg border border-line bg-surface p-8 text-center shadow-card">
      <p className="text-xs font-semibold uppercase tracking-[0.14em] text-ember-600">Not available to your role</p>
      <h1 className="mt-2 text-xl font-semibold">
        {purpose ?? "This page"} needs {holders ?? "another role"}
      </h1>
      <p className="mt-2 text-sm text-muted">
        You are signed in as <strong>{role}</strong>. Plumeline separates duties by role; if you need this, ask an administrator.
      </p>
      <Link to={paths.desk.build()} className="mt-5 inline-block text-sm font-medium text-accent underline">
        Back to your desk
      </Link>
    </div>
  );
}
