import { useState } from "react";
import { Link } from "react-router-dom";
import { decideModelVersionBodySchema, type ModelVersion } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { useTransitionModelVersion } from "../api/transition-model-version";

/** What a manager's step did, and who heard about it — the page otherwise only changes a badge. */
const OUTCOME: Record<"approve" | "reject" | "retire", string> = {
  approve: "Approved. The author was mailed; runs of this version now count as approved, not exploratory.",
  reject: "Rejected. The author was mailed with your comment and can draft a corrected version from this one.",
  retire: "Retired. Its runs stay reproducible; new runs can no longer use it.",
};

function DecisionOutcome({ action }: { action: "approve" | "reject" | "retire" }) {
  return (
    <p role="status" className="rounded-md border border-ok/40 bg-ok-soft px-3 py-2 text-sm text-ink">
      {OUTCOME[action]}{" "}
      <Link to={paths.desk.build()} className="font-medium text-accent hover:underline">
        Back to the desk
      </Link>
    </p>
  );
}

/**
 * A manager's decision with a comment. The author can never decide on their own version:
 * the buttons are disabled and say why (the API refuses it too).
 */
export function DecisionPanel({ version, currentUserId }: { version: ModelVersion; currentUserId: string }) {
  const transition = useTransitionModelVersion();
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string>();
  const own = version.authorId === currentUserId;
  const step = transition.isSuccess ? transition.variables.action : undefined;
  const outcome = step && step !== "submit" ? <DecisionOutcome action={step} /> : null;
  // The comment belongs to one decision: once it is recorded the box empties, so an approval's
  // words are never offered again as the reason for retiring the version.
  const onDecided = { onSuccess: () => setComment("") };

  function decide(action: "approve" | "reject") {
    const parsed = decideModelVersionBodySchema.safeParse({ comment });
    if (!parsed.success) {
      setError(comment.trim() ? parsed.error.issues[0]?.message : "Write a comment: it is recorded with the decision");
      return;
    }
    setError(undefined);
    transition.mutate({ action, id: version.id, comment: parsed.data.comment }, onDecided);
  }

  if (version.status === "approved")
    return (
      <div className="flex flex-col gap-3">
        {outcome}
        <p className="text-sm text-muted">Retiring keeps every run of this version reproducible but stops new runs using it.</p>
        <Field label="Why retire it (optional)">{(p) => <Textarea {...p} value={comment} onChange={(e) => setComment(e.target.value)} rows={2} />}</Field>
        {transition.error && <ErrorState error={transition.error} />}
        <div>
          <Button variant="danger" disabled={own || transition.isPending} onClick={() => transition.mutate({ action: "retire", id: version.id, comment: comment || undefined }, onDecided)}>
            Retire version
          </Button>
          {own && <p className="mt-1 text-xs text-muted">You wrote this version, so another manager must retire it.</p>}
        </div>
      </div>
    );

  if (version.status !== "in-review")
    return (
      <div className="flex flex-col gap-3">
        {outcome}
        <p className="text-sm text-muted">This version is {version.status}; there is nothing to decide.</p>
      </div>
    );

  return (
    <div className="flex flex-col gap-3">
      {own && (
        <p role="note" className="rounded-md border border-ember-400 bg-ember-50 px-3 py-2 text-sm text-ember-800">
          You are the author of this version. Separation of duties: another manager must approve or reject it.
        </p>
      )}
      <Field label="Comment" error={error} hint="Recorded in the audit trail and mailed to the author.">
        {(p) => <Textarea {...p} value={comment} onChange={(e) => setComment(e.target.value)} rows={3} disabled={own} maxLength={4000} />}
      </Field>
      {transition.error && <ErrorState error={transition.error} />}
      <div className="flex gap-2">
        <Button onClick={() => decide("approve")} disabled={own || transition.isPending} title={own ? "You cannot approve your own version" : undefined}>
          Approve
        </Button>
        <Button variant="danger" onClick={() => decide("reject")} disabled={own || transition.isPending} title={own ? "You cannot reject your own version" : undefined}>
          Reject
        </Button>
      </div>
    </div>
  );
}
