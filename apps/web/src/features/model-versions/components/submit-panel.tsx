import { useState } from "react";
import { submitModelVersionBodySchema, type ChangeClass } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { useTransitionModelVersion } from "../api/transition-model-version";

/** The author sends a draft for independent review, classing the change as major or minor. */
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
      {transition.error && <ErrorState error={transition.error} />}
      <div>
        <Button onClick={submit} disabled={transition.isPending}>
          {transition.isPending ? "Submitting…" : "Submit for review"}
        </Button>
      </div>
    </div>
  );
}
