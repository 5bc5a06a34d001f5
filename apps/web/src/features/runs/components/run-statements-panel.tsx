import { useState, type SubmitEvent } from "react";
import { createRunStatementBodySchema, RUN_STATEMENT_MAX_LENGTH, type RunStatementKind } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";
import { Segmented } from "@/components/ui/segmented";
import { ErrorState, InlineError, LoadingState } from "@/components/ui/states";
import { formatDateTime } from "@/lib/format";
import { useRecordRunStatement, useRunStatements } from "../api/run-statements";

const KIND_LABEL: Record<RunStatementKind, string> = { reliance: "Reliance", limitation: "Limitation" };
const KIND_HINT: Record<RunStatementKind, string> = {
  reliance: "What you rely on, e.g. “Baseline AAL and 1-in-200 losses from the firm's 2025 catastrophe model.”",
  limitation: "Where the results must not be used, e.g. “Not for reserving; exposure growth not included.”",
};

/**
 * Reliance and limitation statements recorded with the run's results. They go into the
 * workbook (Manifest and Cautions sheets) and cannot be edited: a correction is a new one.
 */
export function RunStatementsPanel({ runId, canRecord }: { runId: string; canRecord: boolean }) {
  const statements = useRunStatements(runId);
  const record = useRecordRunStatement();
  const [kind, setKind] = useState<RunStatementKind>("reliance");
  const [text, setText] = useState("");
  const [error, setError] = useState<string>();

  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = createRunStatementBodySchema.safeParse({ kind, text });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    record.mutate({ runId, ...parsed.data }, { onSuccess: () => setText("") });
  }

  return (
    <div className="flex flex-col gap-3 text-sm">
      <p className="text-muted">Written into the workbook's Manifest and Cautions sheets. Statements cannot be edited; record a new one to correct.</p>
      {statements.isPending ? (
        <LoadingState label="Loading statements…" className="p-0" />
      ) : statements.isError ? (
        <ErrorState error={statements.error} retry={() => statements.refetch()} />
      ) : statements.data.length === 0 ? (
        <p className="text-muted">None recorded yet.</p>
      ) : (
        <ul aria-label="Recorded statements" className="flex flex-col gap-2">
          {statements.data.map((s) => (
            <li key={s.id} className="rounded-md border border-line px-3 py-2">
              <p className="text-xs font-semibold tracking-wider text-muted uppercase">{KIND_LABEL[s.kind]}</p>
              <p className="whitespace-pre-line text-text">{s.text}</p>
              <p className="mt-1 text-xs text-faint">
                {s.createdByName ?? s.createdBy}, {formatDateTime(s.createdAt)}
              </p>
            </li>
          ))}
        </ul>
      )}
      {canRecord ? (
        <form noValidate onSubmit={submit} className="flex flex-col gap-2 border-t border-line pt-3">
          <div>
            <Segmented label="Kind of statement" value={kind} onChange={setKind} options={(["reliance", "limitation"] as const).map((k) => ({ value: k, label: KIND_LABEL[k] }))} />
          </div>
          <Field label={`${KIND_LABEL[kind]} statement`} hint={KIND_HINT[kind]} error={error}>
            {(p) => <Textarea {...p} value={text} maxLength={RUN_STATEMENT_MAX_LENGTH} onChange={(e) => setText(e.target.value)} />}
          </Field>
          <InlineError error={record.error} />
          <div>
            <Button type="submit" size="sm" variant="secondary" disabled={record.isPending}>
              {record.isPending ? "Recording…" : "Record statement"}
            </Button>
          </div>
        </form>
      ) : (
        <p className="text-xs text-faint">Recording statements needs the analyst or actuary role.</p>
      )}
    </div>
  );
}
