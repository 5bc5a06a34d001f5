import { useState } from "react";
import { submitModelVersionBodySchema, type ChangeClass } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";
import { useTransitionModelVersion } from "../api/transition-model-version";

/**
 * The server's refusal of a minor filing: which thresholds the preview passed, and the way on
 * (class it as major). The numbers are the reviewer's preview's, so the author sees what they will.
 */
function MaterialityRefusal({ messages, onReclass }: { messages: string[]; onReclass: () => void }) {
  return (
    <div role="alert" className="rounded-md border border-danger/40 bg-danger-soft px-4 py-3 text-sm">
      <p className="font-semibold text-danger">Not a minor change under the firm's materiality policy</p>
      <ul className="mt-1 list-disc pl-5 text-text">
        {messages.slice(0, 12).map((m) => (
          <li key={m}>fired: {m}</li>
        ))}
      </ul>
      {messages.length > 12 && <p className="mt-1 text-text">…and {messages.length - 12} more.</p>}
      <p className="mt-2 text-text">Class it as a major change to submit it for full validation, or change the draft.</p>
      <Button variant="secondary" size="sm" className="mt-2" onClick={onReclass}>
        Class as major
      </Button>
    </div>
  );
}

/**
 * The author sends a draft for independent review, classing the change as major or minor. A
 * minor filing is checked against the materiality policy first (the server runs the preview),
 * which takes seconds, so the button says so.
 */
export function SubmitPanel({ versionId }: { versionId: string }) {
  const transition = useTransitionModelVersion();
  const [changeClass, setChangeClass] = useState<ChangeClass | "">("");
  const [note, setNote] = useState("");
  const [error, setError] = useState<string>();
  function submit() {
    const parsed = submitModelVersionBodySchema.safeParse({ changeClass: changeClass || undefined, note: note || undefined });
    if (!parsed.success) {
      setError(changeClass ? parsed.error.issues[0]?.message : "Choose whether this is a major or a minor change");
      return;
    }
    setError(undefined);
    transition.mutate({ action: "submit", id: versionId, ...parsed.data });
  }
  return (
    <div className="flex flex-col gap-3">
      <fieldset aria-describedby={error ? "change-class-error" : undefined}>
        <legend className="mb-1 text-sm font-medium text-ink">Change class</legend>
        <div className="flex flex-col gap-1 text-sm">
          <label className="flex items-start gap-2">
            <input type="radio" name="changeClass" checked={changeClass === "major"} onChange={() => setChangeClass("major")} className="mt-1 accent-[var(--pl-accent)]" />
            <span>
              <strong>Major</strong> — changes results materially (new ranges, new constraint); needs full independent validation.
            </span>
          </label>
          <label className="flex items-start gap-2">
            <input type="radio" name="changeClass" checked={changeClass === "minor"} onChange={() => setChangeClass("minor")} className="mt-1 accent-[var(--pl-accent)]" />
            <span>
              <strong>Minor</strong> — corrections, notes, defaults; no material effect on results.
            </span>
          </label>
        </div>
        {error && (
          <p id="change-class-error" role="alert" className="mt-1 text-xs font-medium text-danger">
            {error}
          </p>
        )}
      </fieldset>
      <Field label="Note to the reviewer (optional)">{(p) => <Textarea {...p} value={note} onChange={(e) => setNote(e.target.value)} maxLength={2000} rows={2} />}</Field>
      {isApiError(transition.error) && transition.error.code === "materiality_threshold_exceeded" ? (
        <MaterialityRefusal
          messages={transition.error.details.map((d) => d.message)}
          onReclass={() => {
            setChangeClass("major");
            transition.reset();
          }}
        />
      ) : (
        transition.error && <ErrorState error={transition.error} />
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={submit} disabled={transition.isPending}>
          {transition.isPending ? (changeClass === "minor" ? "Checking materiality…" : "Submitting…") : "Submit for review"}
        </Button>
        {changeClass === "minor" && (
          <span className="text-xs text-muted">A minor change is first previewed against its parent on every pinned pathway (a few seconds per pathway).</span>
        )}
      </div>
    </div>
  );
}
