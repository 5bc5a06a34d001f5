import { useState, type SubmitEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import type { AuditFilter } from "../api/get-audit";

export type AuditFilterFields = Omit<AuditFilter, "limit" | "offset">;

const FIELDS: Array<[keyof AuditFilterFields, string, string]> = [
  ["action", "Action", "e.g. model-version.approved"],
  ["entityType", "Entity type", "e.g. run"],
  ["entityId", "Entity id", ""],
  ["actorId", "Actor id", ""],
  ["from", "From (date)", "YYYY-MM-DD"],
  ["to", "To (date)", "YYYY-MM-DD"],
];

/** Filters for the audit log; dates are checked before the query is sent. */
export function AuditFilters({ value, onApply }: { value: AuditFilterFields; onApply: (f: AuditFilterFields) => void }) {
  const [draft, setDraft] = useState<AuditFilterFields>(value);
  const [errors, setErrors] = useState<Partial<Record<keyof AuditFilterFields, string>>>({});
  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const next: typeof errors = {};
    for (const k of ["from", "to"] as const) if (draft[k] && !/^\d{4}-\d{2}-\d{2}$/.test(draft[k])) next[k] = "Use a date like 2026-03-31";
    setErrors(next);
    if (Object.keys(next).length === 0) onApply(Object.fromEntries(Object.entries(draft).filter(([, v]) => v)));
  }
  return (
    <form noValidate onSubmit={submit} className="grid gap-3 sm:grid-cols-3 lg:grid-cols-[repeat(6,minmax(0,1fr))_auto]">
      {FIELDS.map(([k, label, placeholder]) => (
        <Field key={k} label={label} error={errors[k]}>
          {(p) => <Input {...p} placeholder={placeholder} value={draft[k] ?? ""} onChange={(e) => setDraft((d) => ({ ...d, [k]: e.target.value }))} />}
        </Field>
      ))}
      <div className="flex items-end gap-2">
        <Button type="submit" variant="secondary">
          Filter
        </Button>
        <Button
          variant="ghost"
          onClick={() => {
            setDraft({});
            onApply({});
          }}
        >
          Clear
        </Button>
      </div>
    </form>
  );
}
